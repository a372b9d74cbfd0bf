import { shoelaceArea, type Circle, type SheetPart } from '@umbrafab/geometry';
import type { Vec2 } from './engraveInput.ts';
import { estimateTime, type TimeEstimate } from './estimateTime.ts';
import type { GcodeRecord } from './gcodeRecords.ts';
import { rampSlope, rampFeedMmPerMin } from './materialPresets.ts';
import { enterAndCut, millEnd, millStart, type MillMachineSettings } from './millProgram.ts';
import { rampedPasses, type Vec3 } from './rampedPasses.ts';
import { stepDownPasses } from './stepDownPasses.ts';
import type { ToolCentreLoop } from './toolCentrePaths.ts';
import { DRILL_MATCH_MM, type CutSettings } from './cutSettings.ts';

/**
 * The router cutting program's plan: every hole, cut-out and outer profile of
 * the job's flat parts as tool moves, inside features of a part before its
 * outer profile, the parts in the order given.
 *
 * - A hole whose diameter is the tool's (within DRILL_MATCH_MM) is drilled:
 *   pecks of one step-down each at the plunge feed, lifting to the entry
 *   height between pecks to clear the chips. A larger hole is bored
 *   helically: the tool centre circles at (hole radius − tool radius),
 *   descending at most one step-down and at most the ramp slope per turn
 *   (G2 for climb, G3 for conventional), then one full turn at the final
 *   depth and out to the centre.
 * - A cut-out (slot) and an outer profile are closed tool-centre loops
 *   (toolCentrePaths), cut with rampedPasses: a straight lead-in from the
 *   waste side onto the loop at Z0, a ramp down along the loop to each
 *   depth, one full turn at the final depth, a lead-out into the waste.
 * - Holding tabs on outer profiles: in every pass deeper than the tab top
 *   (Z = −thickness + tabHeightMm) the tool rises to the tab top over
 *   tabWidthMm + the tool diameter along the loop, so a bridge tabWidthMm
 *   wide and tabHeightMm high holds the part. Tabs sit at the middles of the
 *   profile's longest straight edges (at most one per edge, on edges long
 *   enough), the loop starts on an edge without a tab.
 * Depth: thickness + breakthroughMm in equal passes of at most stepDownMm.
 */

/** One part on the stock: the part in its own frame, and where its origin lies in work coordinates. */
export interface PlacedPart {
  readonly part: SheetPart;
  readonly originMm: Vec2;
}

/** What the planner needs for one part: its placement and its tool-centre loops (part frame). */
export interface PartLoops extends PlacedPart {
  readonly outer: ToolCentreLoop;
  readonly slots: readonly ToolCentreLoop[];
}

export type CutOperation =
  | { readonly kind: 'drill'; readonly part: string; readonly label: string; readonly centre: Vec2; readonly diameterMm: number }
  | { readonly kind: 'helix'; readonly part: string; readonly label: string; readonly centre: Vec2; readonly diameterMm: number; readonly pathRadiusMm: number }
  | {
      readonly kind: 'loop';
      readonly part: string;
      readonly label: string;
      readonly side: 'inner' | 'outer';
      /** The tool-centre loop in cutting direction, starting where the lead-in joins it, work coordinates. */
      readonly points: readonly Vec2[];
      /** Raised stretches along the loop, [from, to] in mm of loop length from points[0]. */
      readonly tabs: readonly (readonly [number, number])[];
      /** The lead-in (and lead-out) point on the waste side. */
      readonly leadPoint: Vec2;
    };

export interface CutPlan {
  readonly operations: readonly CutOperation[];
  readonly body: readonly GcodeRecord[];
  readonly estimate: TimeEstimate;
  readonly depthPassesMm: readonly number[];
  readonly finalDepthMm: number;
  readonly tabTopZMm: number;
  /** Work-coordinate bounds of every tool-centre move, mm. */
  readonly boundsMm: { readonly min: Vec2; readonly max: Vec2 };
}

function cumulative(loop: readonly Vec2[]): number[] {
  const cum = [0];
  for (let i = 1; i <= loop.length; i += 1) {
    const a = loop[i - 1];
    const b = loop[i % loop.length];
    cum.push(cum[i - 1] + Math.hypot(b[0] - a[0], b[1] - a[1]));
  }
  return cum;
}

/** The loop restarted at arc length s (a vertex inserted there). */
function startAt(loop: readonly Vec2[], s: number): Vec2[] {
  const cum = cumulative(loop);
  let i = 0;
  while (i < loop.length - 1 && cum[i + 1] <= s) i += 1;
  const a = loop[i];
  const b = loop[(i + 1) % loop.length];
  const len = cum[i + 1] - cum[i];
  const t = len > 0 ? (s - cum[i]) / len : 0;
  const p: Vec2 = [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];
  const rest = [...loop.slice(i + 1), ...loop.slice(0, i + 1)];
  const out = t > 1e-9 && t < 1 - 1e-9 ? [p, ...rest] : t >= 1 - 1e-9 ? [...rest] : [...loop.slice(i), ...loop.slice(0, i)];
  return out.filter((q, k) => k === 0 || Math.hypot(q[0] - out[k - 1][0], q[1] - out[k - 1][1]) > 1e-9);
}

/**
 * Tab centres (arc length along `loop`) and the arc length to start the loop at:
 * the middles of the longest edges at least `needMm` long, one tab per edge;
 * the start on the longest remaining edge (or a quarter along the longest edge).
 */
function placeTabs(loop: readonly Vec2[], count: number, needMm: number): { readonly centres: number[]; readonly startS: number } {
  const cum = cumulative(loop);
  const edges = loop.map((_, i) => ({ i, len: cum[i + 1] - cum[i], mid: (cum[i] + cum[i + 1]) / 2 })).sort((a, b) => b.len - a.len || a.i - b.i);
  const tabEdges = edges.filter((e) => e.len >= needMm).slice(0, count);
  const free = edges.find((e) => !tabEdges.includes(e) && e.len > 1e-6);
  const startS = free ? free.mid : edges[0].mid - edges[0].len / 4;
  return { centres: tabEdges.map((e) => e.mid), startS };
}

/** Where the tool starts and ends an operation (near enough for ordering: a loop ends close to its start). */
function entryOf(op: CutOperation): Vec2 {
  return op.kind === 'loop' ? op.leadPoint : op.kind === 'helix' ? [op.centre[0] + op.pathRadiusMm, op.centre[1]] : op.centre;
}
function exitOf(op: CutOperation): Vec2 {
  return op.kind === 'loop' ? op.leadPoint : op.centre;
}

/** Greedy nearest-neighbour order from `start` (ties to the earlier one): short rapids between a part's inside features. */
function nearestFirst(ops: readonly CutOperation[], start: Vec2): CutOperation[] {
  const left = [...ops];
  const out: CutOperation[] = [];
  let at = start;
  while (left.length > 0) {
    let best = 0;
    for (let i = 1; i < left.length; i += 1) {
      const d = (p: Vec2): number => Math.hypot(p[0] - at[0], p[1] - at[1]);
      if (d(entryOf(left[i])) < d(entryOf(left[best]))) best = i;
    }
    const [op] = left.splice(best, 1);
    out.push(op);
    at = exitOf(op);
  }
  return out;
}

/**
 * A point `lead` mm off the loop on its waste side (outside an outer loop,
 * inside an inner one), square to the move a→b, at a (or at b when `atEnd`).
 */
function wastePoint(loop: readonly Vec2[], side: 'inner' | 'outer', a: Vec2, b: Vec2, lead: number, atEnd = false): Vec2 {
  const len = Math.hypot(b[0] - a[0], b[1] - a[1]) || 1;
  const left: Vec2 = [-(b[1] - a[1]) / len, (b[0] - a[0]) / len];
  const insideSign = shoelaceArea(loop) > 0 ? 1 : -1;
  const w = side === 'inner' ? insideSign : -insideSign;
  const p = atEnd ? b : a;
  return [p[0] + w * left[0] * lead, p[1] + w * left[1] * lead];
}

/** Clamp the loop path's Z to `zTab` over the tab stretches (loop arc length, the path following the loop from its start), splitting moves at the tab edges. */
function raiseOverTabs(path: readonly Vec3[], loopLengthMm: number, tabs: readonly (readonly [number, number])[], zTab: number): Vec3[] {
  if (tabs.length === 0) return [...path];
  const inTab = (s: number): boolean => {
    const u = ((s % loopLengthMm) + loopLengthMm) % loopLengthMm;
    return tabs.some(([a, b]) => u > a + 1e-9 && u < b - 1e-9);
  };
  const out: Vec3[] = [path[0]];
  let s = 0;
  for (let i = 1; i < path.length; i += 1) {
    const a = path[i - 1];
    const b = path[i];
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
    // Tab edges crossed by this move, in order.
    const cuts: number[] = [];
    if (len > 0) {
      const lap0 = Math.floor(s / loopLengthMm);
      const lap1 = Math.floor((s + len) / loopLengthMm);
      for (let lap = lap0; lap <= lap1; lap += 1) {
        for (const [ta, tb] of tabs) {
          for (const edge of [ta, tb]) {
            const at = lap * loopLengthMm + edge;
            if (at > s + 1e-9 && at < s + len - 1e-9) cuts.push(at);
          }
        }
      }
      cuts.sort((x, y) => x - y);
    }
    // Pieces of the move between tab edges, each with its raw start and end.
    let prev = s;
    for (const at of [...cuts, s + len]) {
      const t0 = len > 0 ? (prev - s) / len : 0;
      const t1 = len > 0 ? (at - s) / len : 1;
      const lerp = (t: number): Vec3 => [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t, a[2] + (b[2] - a[2]) * t];
      const p0 = lerp(t0);
      const p1 = lerp(t1);
      const tab = inTab((prev + at) / 2);
      const z0 = tab ? Math.max(p0[2], zTab) : p0[2];
      const z1 = tab ? Math.max(p1[2], zTab) : p1[2];
      const last = out[out.length - 1];
      // Up onto a tab or back down after it: a vertical move at the tab edge.
      if (z0 !== last[2]) out.push([last[0], last[1], z0]);
      out.push([p1[0], p1[1], z1]);
      prev = at;
    }
    s += len;
  }
  // A tab edge after the last move leaves the tool raised: nothing to add (the lead-out lifts anyway).
  return out.filter((q, k) => k === 0 || q[0] !== out[k - 1][0] || q[1] !== out[k - 1][1] || q[2] !== out[k - 1][2]);
}

/**
 * Plan cut.ngc for parts placed on one stock.
 *
 * @param parts the parts with their tool-centre loops (toolCentrePaths), in cutting order
 * @throws Error for a hole narrower than the tool (check with assertToolFits first)
 */
export interface PlanCutOptions {
  readonly thicknessMm: number;
  readonly settings: CutSettings;
  /** The machine settings shared with engrave.ngc (heights, dwell, coolant, park, tool words). */
  readonly machine: MillMachineSettings;
  /** The spec's ramp angle (engrave.rampAngleDeg); undefined = from the cutting feeds. */
  readonly rampAngleDeg: number | undefined;
  /** For the default park position (X0 on the far edge of the stock), mm. */
  readonly stockLengthMm: number;
  /** G0 rate for the time estimate, mm/min. */
  readonly rapidMmPerMin: number;
}

export function planCut(parts: readonly PartLoops[], o: PlanCutOptions): CutPlan {
  const { thicknessMm, settings: s, machine: m, rampAngleDeg, stockLengthMm } = o;
  const r = s.toolDiameterMm / 2;
  const finalDepth = thicknessMm + s.breakthroughMm;
  const depths = stepDownPasses(finalDepth, s.stepDownMm);
  const slope = rampSlope({ rampAngleDeg, feedMmPerMin: s.feedMmPerMin, plungeMmPerMin: s.plungeMmPerMin });
  const rampFeed = rampFeedMmPerMin(s, slope);
  const zTab = -thicknessMm + s.tabHeightMm;
  const climb = s.direction === 'climb';
  const ops: CutOperation[] = [];
  let at: Vec2 = [0, 0];
  for (const { part, originMm, outer, slots } of parts) {
    const move = (p: Vec2): Vec2 => [p[0] + originMm[0], p[1] + originMm[1]];
    const holes = part.inner.filter((f): f is Circle => f.kind === 'circle');
    const inner: CutOperation[] = [];
    holes.forEach((h, i) => {
      const d = 2 * h.radiusMm;
      const label = `hole ${i + 1} (diameter ${d.toFixed(3)} mm)`;
      const centre = move([h.cx, h.cy]);
      if (Math.abs(d - s.toolDiameterMm) <= DRILL_MATCH_MM) inner.push({ kind: 'drill', part: part.name, label, centre, diameterMm: d });
      else if (d > s.toolDiameterMm) inner.push({ kind: 'helix', part: part.name, label, centre, diameterMm: d, pathRadiusMm: h.radiusMm - r });
      // a bug: assertToolFits refuses a tool wider than a hole first (process.kerf)
      else throw new Error(`the ${part.name}'s ${label} is narrower than the ${s.toolDiameterMm} mm tool`);
    });
    const loop = (l: ToolCentreLoop, label: string, tabsWanted: number): CutOperation => {
      // Climb with M3: outer loops counter-clockwise, inner ones clockwise (see MillingDirection).
      const wantCcw = (l.side === 'outer') === climb;
      const ring = (shoelaceArea(l.points) > 0) === wantCcw ? l.points.map(move) : [...l.points].reverse().map(move);
      const raisedMm = s.tabWidthMm + s.toolDiameterMm;
      const { centres, startS } = placeTabs(ring, tabsWanted, raisedMm + s.toolDiameterMm);
      const points = startAt(ring, startS);
      const L = cumulative(points)[points.length];
      const tabs = centres
        .map((c) => (((c - startS) % L) + L) % L)
        .sort((a, b) => a - b)
        .map((c): [number, number] => [c - raisedMm / 2, c + raisedMm / 2]);
      const xs = points.map((p) => p[0]);
      const ys = points.map((p) => p[1]);
      const room = l.side === 'inner' ? 0.4 * Math.min(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys)) : s.leadInMm;
      const lead = Math.min(s.leadInMm, room);
      return { kind: 'loop', part: part.name, label, side: l.side, points, tabs, leadPoint: wastePoint(points, l.side, points[0], points[1], lead) };
    };
    slots.forEach((l, i) => inner.push(loop(l, `cut-out ${i + 1}`, 0)));
    ops.push(...nearestFirst(inner, at));
    const profile = loop(outer, 'outer profile', s.tabCount);
    ops.push(profile);
    at = exitOf(profile);
  }

  const body: GcodeRecord[] = [...millStart(m, CUT_TOOL_NUMBER, s.spindleRpm)];
  let z = m.safeZMm;
  const feeds = { feedMmPerMin: s.feedMmPerMin, rampFeedMmPerMin: rampFeed, plungeMmPerMin: s.plungeMmPerMin };
  const f3 = (v: number): string => v.toFixed(3);
  ops.forEach((op, n) => {
    const head = `cut ${n + 1}/${ops.length}: ${op.part} ${op.label}`;
    switch (op.kind) {
      case 'drill': {
        body.push({ kind: 'comment', text: `${head}: drilled, ${depths.length} pecks to ${f3(finalDepth)} mm` });
        body.push({ kind: 'rapid', to: { x: op.centre[0], y: op.centre[1] } });
        if (z > m.clearanceZMm) body.push({ kind: 'rapid', to: { z: m.clearanceZMm } });
        body.push({ kind: 'rapid', to: { z: m.entryZMm } });
        depths.forEach((d, k) => {
          if (k > 0) body.push({ kind: 'rapid', to: { z: Math.min(m.entryZMm, -depths[k - 1] + 0.2) } });
          body.push({ kind: 'feed', to: { z: -d }, feedMmPerMin: s.plungeMmPerMin });
          body.push({ kind: 'rapid', to: { z: m.entryZMm } });
        });
        body.push({ kind: 'rapid', to: { z: m.clearanceZMm } });
        z = m.clearanceZMm;
        break;
      }
      case 'helix': {
        const rho = op.pathRadiusMm;
        const perTurn = Math.min(s.stepDownMm, 2 * Math.PI * rho * slope);
        const turns = Math.max(1, Math.ceil(finalDepth / perTurn - 1e-9));
        body.push({ kind: 'comment', text: `${head}: bored helically, tool centre on a ${f3(2 * rho)} mm circle, ${turns} turns down to ${f3(finalDepth)} mm and one at depth` });
        const start: Vec2 = [op.centre[0] + rho, op.centre[1]];
        body.push({ kind: 'rapid', to: { x: start[0], y: start[1] } });
        if (z > m.clearanceZMm) body.push({ kind: 'rapid', to: { z: m.clearanceZMm } });
        body.push({ kind: 'rapid', to: { z: m.entryZMm } });
        if (m.entryZMm > 0) body.push({ kind: 'feed', to: { z: 0 }, feedMmPerMin: s.feedMmPerMin });
        // Climb in a hole with M3: clockwise (G2).
        const clockwise = climb;
        for (let k = 1; k <= turns + 1; k += 1) {
          const zz = -Math.min(finalDepth, (finalDepth * k) / turns);
          body.push({ kind: 'arc', clockwise, to: { x: start[0], y: start[1], z: zz }, centre: op.centre, from: start, feedMmPerMin: k <= turns ? rampFeed : s.feedMmPerMin });
        }
        body.push({ kind: 'feed', to: { x: op.centre[0], y: op.centre[1] }, feedMmPerMin: s.feedMmPerMin });
        body.push({ kind: 'rapid', to: { z: m.clearanceZMm } });
        z = m.clearanceZMm;
        break;
      }
      case 'loop': {
        const L = cumulative(op.points)[op.points.length];
        const ramped = rampedPasses(op.points, true, depths, slope).path;
        const path = raiseOverTabs(ramped, L, op.tabs, zTab);
        const tabText = op.tabs.length > 0 ? `, ${op.tabs.length} holding tabs ${f3(s.tabWidthMm)} mm wide, ${f3(s.tabHeightMm)} mm high` : '';
        body.push({ kind: 'comment', text: `${head}: ${op.side === 'outer' ? 'outside' : 'inside'} the line, ${s.direction}, ${depths.length} passes to ${f3(finalDepth)} mm${tabText}` });
        // Lead-in from the waste side at Z0, the loop, then the lead-out back into the waste at depth.
        const end = path[path.length - 1];
        const before = [...path].reverse().find((q) => q[0] !== end[0] || q[1] !== end[1]) ?? path[0];
        const lead = Math.hypot(op.leadPoint[0] - op.points[0][0], op.leadPoint[1] - op.points[0][1]);
        const out = wastePoint(op.points, op.side, [before[0], before[1]], [end[0], end[1]], lead, true);
        const full: Vec3[] = [[op.leadPoint[0], op.leadPoint[1], 0], ...path, ...(lead > 0 ? [[out[0], out[1], end[2]] as const] : [])];
        z = enterAndCut(body, m, full, z, feeds);
        break;
      }
      default: {
        const never: never = op;
        throw new Error(`unknown cut operation ${JSON.stringify(never)}`);
      }
    }
  });
  body.push(...millEnd(m, stockLengthMm));
  const estimate = estimateTime(body, { rapidMmPerMin: o.rapidMmPerMin, start: { x: 0, y: 0, z: m.safeZMm } });
  let min: Vec2 = [Infinity, Infinity];
  let max: Vec2 = [-Infinity, -Infinity];
  for (const rec of body) {
    if ((rec.kind === 'feed' || rec.kind === 'arc') && rec.to.x !== undefined && rec.to.y !== undefined) {
      min = [Math.min(min[0], rec.to.x), Math.min(min[1], rec.to.y)];
      max = [Math.max(max[0], rec.to.x), Math.max(max[1], rec.to.y)];
    }
  }
  for (const op of ops) {
    if (op.kind === 'helix') {
      min = [Math.min(min[0], op.centre[0] - op.pathRadiusMm), Math.min(min[1], op.centre[1] - op.pathRadiusMm)];
      max = [Math.max(max[0], op.centre[0] + op.pathRadiusMm), Math.max(max[1], op.centre[1] + op.pathRadiusMm)];
    }
  }
  return { operations: ops, body, estimate, depthPassesMm: depths, finalDepthMm: finalDepth, tabTopZMm: zTab, boundsMm: { min, max } };
}

/** The end mill's tool number in the T words (engrave.ngc uses T1 for the V-bit, T2 for its flat mill). */
export const CUT_TOOL_NUMBER = 3;
