import { describe, expect, it } from 'vitest';
import { expectClose } from '../../../../test/helpers/closeTo.ts';
import { estimateTime, formatDuration } from './estimateTime.ts';
import type { GcodeRecord } from './gcodeRecords.ts';

describe('estimateTime', () => {
  it('sums length over rate per move kind (hand values)', () => {
    const records: GcodeRecord[] = [
      { kind: 'rapid', to: { z: 5 } }, // 5 mm retract-class move at 3000 mm/min: 0.1 s
      { kind: 'rapid', to: { x: 30, y: 40 } }, // 50 mm at 3000: 1 s
      { kind: 'feed', to: { z: -1 }, feedMmPerMin: 60 }, // 6 mm plunge at 60: 6 s
      { kind: 'feed', to: { x: 130 }, feedMmPerMin: 600 }, // 100 mm at 600: 10 s
      { kind: 'comment', text: 'ignored' },
    ];
    const t = estimateTime(records, { rapidMmPerMin: 3000 });
    expectClose(t.retractS, 0.1, 1e-12, 'retract', ' s');
    expectClose(t.rapidS, 1, 1e-12, 'rapid', ' s');
    expectClose(t.plungeS, 6, 1e-12, 'plunge', ' s');
    expectClose(t.cuttingS, 10, 1e-12, 'cutting', ' s');
    expectClose(t.totalS, 17.1, 1e-12, 'total', ' s');
    expect([t.cuttingMm, t.plungeMm, t.rapidMm, t.retractMm]).toEqual([100, 6, 50, 5]);
  });

  it('starts from the given position', () => {
    const t = estimateTime([{ kind: 'rapid', to: { z: 5 } }], { rapidMmPerMin: 3000, start: { x: 0, y: 0, z: 5 } });
    expect(t.totalS).toBe(0);
  });

  it('formats durations', () => {
    expect(formatDuration(45.4)).toBe('45 s');
    expect(formatDuration(192)).toBe('3 min 12 s');
    expect(formatDuration(3725)).toBe('1 h 02 min 05 s');
  });
});
