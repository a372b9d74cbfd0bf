import { describe, expect, it } from 'vitest';
import type { SunView } from '../sunView.ts';
import { fileSizeText, filesStateText, minutesToTime, queryTime, shadowPathData, sunRows, sunStateLine, timeToMinutes } from './format.ts';

describe('the page formatting', () => {
  it('writes shadow polygons as one closed SVG path each, 4 decimals; none is empty', () => {
    expect(shadowPathData([])).toBe('');
    expect(
      shadowPathData([
        [
          [1, 2],
          [3.123456, 4],
          [5, 6.00006],
        ],
        [
          [0, 0],
          [1, 0],
          [1, 1],
        ],
      ]),
    ).toBe('M1.0000 2.0000 L3.1235 4.0000 L5.0000 6.0001 Z M0.0000 0.0000 L1.0000 0.0000 L1.0000 1.0000 Z');
  });

  it('sizes files in bytes below 2 KiB and in KiB from there', () => {
    expect(fileSizeText(0)).toBe('0 B');
    expect(fileSizeText(2047)).toBe('2047 B');
    expect(fileSizeText(2048)).toBe('2.0 KiB');
    expect(fileSizeText(123_456)).toBe('120.6 KiB');
    expect(filesStateText([{ bytes: 1024 }, { bytes: 512 }])).toBe('2 files, 1.5 KiB');
  });

  it('turns the slider minutes and the time box into each other', () => {
    expect(minutesToTime(0)).toBe('00:00');
    expect(minutesToTime(14 * 60 + 30)).toBe('14:30');
    expect(minutesToTime(1200)).toBe('20:00');
    expect(timeToMinutes('14:30')).toBe(870);
    expect(timeToMinutes('09:05:30')).toBe(545);
    expect(timeToMinutes('')).toBeNull();
    expect(timeToMinutes('14')).toBeNull();
    expect(queryTime('15:00:00')).toBe('15:00');
    for (let m = 240; m <= 1200; m += 7) expect(timeToMinutes(minutesToTime(m))).toBe(m);
  });

  it("words the sun's state and rows", () => {
    const s = {
      query: { date: '2027-03-20', time: '15:00', kind: 'apparent' },
      utc: '2027-03-20T14:02:03.456Z',
      clock: '15:02:03',
      daylightSaving: false,
      apparent: '15:00:00',
      hourAngleDeg: 45,
      declinationDeg: -0.1234,
      altitudeDeg: 30.126,
      sunWorld: [0, 0, 1],
      sunFace: [0, 0, 1],
      state: 'lit',
      shadowFace: [],
    } satisfies SunView;
    expect(sunStateLine(s)).toBe('the sun is on the face · 2027-03-20 · apparent 15:00:00 · clock 15:02:03');
    expect(sunStateLine({ ...s, state: 'below', daylightSaving: true })).toBe('the sun is below the horizon · 2027-03-20 · apparent 15:00:00 · clock 15:02:03 (summer time)');
    expect(sunRows({ ...s, daylightSaving: true })).toEqual([
      { label: 'hour angle', value: '45.000°' },
      { label: 'declination', value: '-0.123°' },
      { label: 'altitude', value: '30.13°' },
      { label: 'local clock', value: '15:02:03 summer' },
      { label: 'apparent solar', value: '15:00:00' },
      { label: 'UTC', value: '2027-03-20 14:02:03Z' },
    ]);
  });
});
