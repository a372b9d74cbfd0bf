import { describe, expect, it } from 'vitest';
import { engraveProgramsFor } from './engravePrograms.ts';

describe('engraveProgramsFor', () => {
  it('auto follows the process (docs/design.md §5: a waterjet cannot score, so a router engraves)', () => {
    expect(engraveProgramsFor('auto', 'router')).toEqual(['ngc']);
    expect(engraveProgramsFor('auto', 'laser')).toEqual(['laser']);
    expect(engraveProgramsFor('auto', 'waterjet')).toEqual(['ngc']);
    expect(engraveProgramsFor('auto', 'print')).toEqual([]);
  });

  it('an explicit choice overrides the process', () => {
    for (const m of ['router', 'laser', 'waterjet', 'print'] as const) {
      expect(engraveProgramsFor('ngc', m)).toEqual(['ngc']);
      expect(engraveProgramsFor('laser', m)).toEqual(['laser']);
      expect(engraveProgramsFor('both', m)).toEqual(['ngc', 'laser']);
      expect(engraveProgramsFor('none', m)).toEqual([]);
    }
  });
});
