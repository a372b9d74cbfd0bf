import type { Vec2 } from './engraveInput.ts';
import { formatNumber } from './formatNumber.ts';
import type { CoolantMode, GcodeRecord } from './gcodeRecords.ts';
import type { Vec3 } from './rampedPasses.ts';

/**
 * The blocks every milling program (engrave.ngc, cut.ngc) starts and ends
 * with, and the way it enters a cut, so the two programs behave alike.
 *
 * Start: `G21 G90 G17 G94 G40 G49 G80 G54` (mm, absolute, XY plane, feed per
 * minute, no cutter or length compensation, no canned cycle, first work
 * offset), `G0 Z<safe>`, optionally `T<n> M6`, then the spindle (below).
 * End: `G0 Z<safe>`, `G0 X<park> Y<park>`, `M9` when coolant ran, `M5`, `M2`.
 */

/** The machine settings both milling programs share. */
export interface MillMachineSettings {
  readonly safeZMm: number;
  readonly clearanceZMm: number;
  readonly entryZMm: number;
  readonly spindleDwellS: number;
  readonly toolWords: boolean;
  readonly coolant: CoolantMode | 'off';
  readonly parkXMm: number | undefined;
  readonly parkYMm: number | undefined;
}

/** The opening blocks, up to and including the first spindle start. */
export function millStart(s: MillMachineSettings, tool: number, spindleRpm: number): GcodeRecord[] {
  return [
    { kind: 'modal', words: 'G21 G90 G17 G94 G40 G49 G80 G54' },
    { kind: 'rapid', to: { z: s.safeZMm } },
    ...(s.toolWords ? [{ kind: 'toolChange', tool } as const] : []),
    ...spindleOn(s, spindleRpm),
  ];
}

/** `S<rpm> M3`, `G4 P<dwell>` (so the spindle is at speed before it cuts) and the coolant. */
export function spindleOn(s: MillMachineSettings, spindleRpm: number): GcodeRecord[] {
  return [
    { kind: 'spindle', mode: 'cw', s: spindleRpm },
    ...(s.spindleDwellS > 0 ? [{ kind: 'dwell', seconds: s.spindleDwellS } as const] : []),
    ...(s.coolant !== 'off' ? [{ kind: 'coolant', mode: s.coolant } as const] : []),
  ];
}

/** `M9` (when coolant ran) and `M5`: before a tool change or the end. */
export function spindleOff(s: MillMachineSettings): GcodeRecord[] {
  return [...(s.coolant !== 'off' ? [{ kind: 'coolant', mode: 'off' } as const] : []), { kind: 'spindle', mode: 'off' }];
}

/** Where the tool parks at the end: the settings' park position, by default X0 and the stock's far edge. */
export function parkPoint(s: MillMachineSettings, stockLengthMm: number): Vec2 {
  return [s.parkXMm ?? 0, s.parkYMm ?? stockLengthMm];
}

/** The closing blocks: up to safe height, park, coolant and spindle off, M2. */
export function millEnd(s: MillMachineSettings, stockLengthMm: number): GcodeRecord[] {
  const [x, y] = parkPoint(s, stockLengthMm);
  return [{ kind: 'rapid', to: { z: s.safeZMm } }, { kind: 'rapid', to: { x, y } }, ...spindleOff(s), { kind: 'end' }];
}

/**
 * Enter a cut and run it: rapid over its first point at the current height,
 * down to the clearance height if above it, rapid on down to the entry height
 * just above the stock, feed onto the stock top at the cutting feed, then the
 * feed moves of `path` (which starts on the stock top at Z0), ramps at
 * `rampFeed`, level moves at `feed`, and finally rapid up to the clearance height.
 *
 * @param z the current tool height, mm
 * @returns the tool height afterwards (the clearance height)
 */
export function enterAndCut(
  body: GcodeRecord[],
  s: MillMachineSettings,
  path: readonly Vec3[],
  z: number,
  feeds: { readonly feedMmPerMin: number; readonly rampFeedMmPerMin: number; readonly plungeMmPerMin: number },
): number {
  const [x0, y0] = path[0];
  body.push({ kind: 'rapid', to: { x: x0, y: y0 } });
  if (z > s.clearanceZMm) body.push({ kind: 'rapid', to: { z: s.clearanceZMm } });
  if (s.entryZMm < s.clearanceZMm) body.push({ kind: 'rapid', to: { z: s.entryZMm } });
  // The last entryZMm is air over a faced plate: fed at the cutting feed, so a plate standing a little proud of Z0 is met at a feed, never at a rapid.
  if (s.entryZMm > 0) body.push({ kind: 'feed', to: { z: 0 }, feedMmPerMin: feeds.feedMmPerMin });
  for (let i = 1; i < path.length; i += 1) {
    const [x, y, zz] = path[i];
    const level = zz === path[i - 1][2];
    const xy = x !== path[i - 1][0] || y !== path[i - 1][1];
    body.push({ kind: 'feed', to: { x, y, ...(level ? {} : { z: zz }) }, feedMmPerMin: level ? feeds.feedMmPerMin : xy ? feeds.rampFeedMmPerMin : feeds.plungeMmPerMin });
  }
  body.push({ kind: 'rapid', to: { z: s.clearanceZMm } });
  return s.clearanceZMm;
}

/** Header comments on the dwell, tool words, coolant and park position. */
export function machineComments(s: MillMachineSettings, stockLengthMm: number): GcodeRecord[] {
  const [x, y] = parkPoint(s, stockLengthMm);
  const f = (v: number): string => formatNumber(v, 3, true);
  const coolant = s.coolant === 'off' ? 'no coolant words' : s.coolant === 'mist' ? 'mist coolant M7, off with M9' : 'flood coolant M8, off with M9';
  return [
    {
      kind: 'comment',
      text: `spindle start: dwell G4 P${f(s.spindleDwellS)} s to reach speed; ${s.toolWords ? 'tool words T M6 written' : 'no T M6 at the start: load the tool by hand'}; ${coolant}`,
    },
    { kind: 'comment', text: `end: park at X${f(x)} Y${f(y)} at safe Z` },
  ];
}
