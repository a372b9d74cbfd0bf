import { describe, expect, it } from 'vitest';
import { describeMeridianTurn } from './describeMeridianTurn.ts';

// Direction logic (docs/design.md §4): an east declination turns the whole needle clockwise seen from
// above, so its north end points east of true north and its south end west of true south.
describe('describeMeridianTurn', () => {
  it('north: as describeDeclination (raised end to true north)', () => {
    expect(describeMeridianTurn(12.44, 'north')).toBe("magnetic north lies 12.4° east of true north: turn the dial 12.4° west of the compass's north to face true north");
  });
  it('south, east declination: the raised end goes east of the compass\'s south', () => {
    expect(describeMeridianTurn(22.8, 'south')).toBe(
      "magnetic north lies 22.8° east of true north, so the compass's south end points 22.8° west of true south: turn the dial until its raised end points 22.8° east of the compass's south, at true south",
    );
  });
  it('south, west declination mirrors it; near zero the two meridians coincide', () => {
    expect(describeMeridianTurn(-27.1, 'south')).toMatch(/south end points 27\.1° east of true south: turn the dial until its raised end points 27\.1° west of the compass's south/);
    expect(describeMeridianTurn(0.04, 'south')).toMatch(/compass's south, which is true south/);
    expect(describeMeridianTurn(-5, 'south')).not.toMatch(/true north$/);
  });
});
