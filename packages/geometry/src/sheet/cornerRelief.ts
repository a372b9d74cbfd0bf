import { SpecError } from '../errors.ts';
import type { Path, RoundedRect, Vec2 } from '../types.ts';
import { arcPoints, CHORD_TOLERANCE_MM } from './arcPoints.ts';
import { dropRepeats } from '../outline/dropRepeats.ts';
import { roundedRectPath } from '../outline/roundedRect.ts';

/**
 * How much larger than the tool a relief's radius is, mm: the tool then
 * clears the nominal corner with this much to spare instead of grazing it
 * (common practice: reliefs are cut a little over the tool size).
 */
export const RELIEF_OVERSIZE_MM = 0.05;

/** Which relief a slot got: none (its corners are round enough), dog-bones at the four corners, or round ends. */
export type SlotRelief = 'none' | 'dogbone' | 'round-ends';

/**
 * A slot (nominal rounded rectangle, axis-aligned) with corner relief for a
 * round tool of radius `toolRadiusMm` cutting inside it, as a closed
 * counter-clockwise polyline (arcs within `toleranceMm`).
 *
 * - Corners already rounded to at least the relief radius ρ = r + 0.05 mm
 *   need nothing.
 * - Dog-bones (common practice for routed joints): at each corner a
 *   half-circle of radius ρ whose centre lies on the corner's bisector at ρ
 *   from the corner, so the circle passes through the corner; it meets each
 *   wall at ρ·√2 from the corner. Used when both sides are at least
 *   2·ρ·√2 long.
 * - Round ends, for a slot too narrow for two dog-bones on its short side:
 *   each short side becomes a half-circle of radius (short side)/2 centred
 *   on it, which passes through both nominal corners (the T-bones of the
 *   two corners merged). A round tool no wider than the slot cuts it fully.
 *
 * Either way the nominal rectangle lies inside the relieved slot, and a round
 * tool of radius r reaches every point of it.
 *
 * @throws Error when the tool is wider than the slot's short side (check
 *   with the tool-fit check first, which names the spec field)
 * @example relievedSlot({ kind: 'rect', cx: 0, cy: 0, widthMm: 3.2, heightMm: 15.2, cornerRadiusMm: 0 }, 1.5875).relief // 'round-ends'
 */
export function relievedSlot(slot: RoundedRect, toolRadiusMm: number, toleranceMm = CHORD_TOLERANCE_MM): { readonly path: Path; readonly relief: SlotRelief } {
  const rho = toolRadiusMm + RELIEF_OVERSIZE_MM;
  const w = slot.widthMm;
  const h = slot.heightMm;
  const short = Math.min(w, h);
  if (!(toolRadiusMm > 0) || slot.cornerRadiusMm >= rho) return { path: roundedRectPath(slot, toleranceMm), relief: 'none' };
  // a bug, not bad input: a tool too wide for a slot is refused first (fabricate's assertToolFits, on process.kerf)
  if (2 * toolRadiusMm > short) throw new Error(`relievedSlot: a tool of ${2 * toolRadiusMm} mm does not fit the ${short} mm slot`);
  const x0 = slot.cx - w / 2;
  const x1 = slot.cx + w / 2;
  const y0 = slot.cy - h / 2;
  const y1 = slot.cy + h / 2;
  const s = rho * Math.SQRT2;
  const pts: Vec2[] = [];
  if (short >= 2 * s) {
    // Counter-clockwise corners; at each, the incoming and outgoing wall directions.
    const corners: readonly (readonly [Vec2, Vec2, Vec2])[] = [
      [[x0, y0], [0, 1], [1, 0]],
      [[x1, y0], [-1, 0], [0, 1]],
      [[x1, y1], [0, -1], [-1, 0]],
      [[x0, y1], [1, 0], [0, -1]],
    ];
    for (const [p, back, fwd] of corners) {
      // back: from the corner along the wall just walked; fwd: along the next wall.
      const b: Vec2 = [(back[0] + fwd[0]) / Math.SQRT2, (back[1] + fwd[1]) / Math.SQRT2];
      const c: Vec2 = [p[0] + rho * b[0], p[1] + rho * b[1]];
      const a0 = Math.atan2(back[1] * s + p[1] - c[1], back[0] * s + p[0] - c[0]);
      // Two quarter-turns, so the nominal corner itself is a vertex (the chords never cut it).
      pts.push(...arcPoints(c, rho, a0, Math.PI / 2, toleranceMm), ...arcPoints(c, rho, a0 + Math.PI / 2, Math.PI / 2, toleranceMm));
    }
    return { path: { kind: 'path', closed: true, points: dropRepeats(pts) }, relief: 'dogbone' };
  }
  const half = short / 2;
  if (w <= h) {
    pts.push(...arcPoints([slot.cx, y0], half, Math.PI, Math.PI, toleranceMm), ...arcPoints([slot.cx, y1], half, 0, Math.PI, toleranceMm));
  } else {
    pts.push(...arcPoints([x1, slot.cy], half, -Math.PI / 2, Math.PI, toleranceMm), ...arcPoints([x0, slot.cy], half, Math.PI / 2, Math.PI, toleranceMm));
  }
  return { path: { kind: 'path', closed: true, points: dropRepeats(pts) }, relief: 'round-ends' };
}

/**
 * The gnomon's outline with T-bone relief at the tab roots, for a round tool
 * of radius `toolRadiusMm` cutting around it (common practice for routed
 * tabs): at each inside corner on the face line (z = `faceZ`), where a tab's
 * side meets the fin's foot, a half-circle notch of radius ρ = r + 0.05 mm
 * into the fin, centred on the face line ρ from the corner, so its circle
 * touches the tab's side at the corner. The tab keeps its full width; the
 * fin's foot keeps its line and sits flat on the plate.
 *
 * @param profile counter-clockwise outline (the fin's (y, z) profile, or the same moved)
 * @throws SpecError (process.kerf) when two reliefs would meet along the foot
 * @example relieveTabRoots(gnomon.profile, 1.5875, 0).length
 */
export function relieveTabRoots(profile: readonly Vec2[], toolRadiusMm: number, faceZ: number, toleranceMm = CHORD_TOLERANCE_MM): Vec2[] {
  if (!(toolRadiusMm > 0)) return [...profile];
  const rho = toolRadiusMm + RELIEF_OVERSIZE_MM;
  const n = profile.length;
  const onFace = (p: Vec2) => Math.abs(p[1] - faceZ) < 1e-9;
  const out: Vec2[] = [];
  for (let i = 0; i < n; i++) {
    const { a, p, b, reflex } = cornerOf(profile, i);
    if (!reflex || !onFace(p)) {
      out.push(p);
      continue;
    }
    // Reflex corner on the face line: one neighbour runs along the foot, the other down the tab's side.
    const foot = onFace(a) ? a : b;
    const dir = Math.sign(foot[0] - p[0]);
    const room = Math.abs(foot[0] - p[0]);
    const footIsRelievedToo = isTabRoot(profile, profile.indexOf(foot), faceZ);
    const need = (footIsRelievedToo ? 4 : 2) * rho;
    if (room < need) {
      throw new SpecError(
        'process.kerf',
        2 * toolRadiusMm,
        `allowed: a router tool narrower than ${(2 * (room / (footIsRelievedToo ? 4 : 2) - RELIEF_OVERSIZE_MM)).toFixed(3)} mm, so the tab-root reliefs fit the ${room.toFixed(3)} mm of gnomon foot beside the tab corner at ${p[0].toFixed(3)} mm along the fin (or cutFiles.relief: off)`,
      );
    }
    const c: Vec2 = [p[0] + dir * rho, faceZ];
    // The arc runs from the notch's far end on the foot, over the top, to the corner p;
    // walked as is when the foot comes before the corner in the outline, reversed otherwise.
    const arc = arcPoints(c, rho, dir > 0 ? 0 : Math.PI, dir > 0 ? Math.PI : -Math.PI, toleranceMm);
    out.push(...(foot === a ? arc : [...arc].reverse()));
  }
  return dropRepeats(out);
}

/** Whether vertex i of a counter-clockwise outline is a reflex corner on the face line. */
function isTabRoot(profile: readonly Vec2[], i: number, faceZ: number): boolean {
  const { p, reflex } = cornerOf(profile, i);
  return reflex && Math.abs(p[1] - faceZ) < 1e-9;
}

/** Vertex i of a counter-clockwise outline with its neighbours, and whether it is a reflex (inside) corner. */
function cornerOf(profile: readonly Vec2[], i: number): { readonly a: Vec2; readonly p: Vec2; readonly b: Vec2; readonly reflex: boolean } {
  const n = profile.length;
  const a = profile[(i - 1 + n) % n];
  const p = profile[i];
  const b = profile[(i + 1) % n];
  return { a, p, b, reflex: (p[0] - a[0]) * (b[1] - p[1]) - (p[1] - a[1]) * (b[0] - p[0]) < 0 };
}

/**
 * The fin's nodus V-notch as a round tool cuts it: a router cannot reach the
 * notch's sharp bottom, so for a tool of radius r the V (opening s on the
 * style edge, 90° at its bottom) becomes a half-circle notch centred on the
 * middle of the opening, of radius max(ρ, s/2) with ρ = r + 0.05 mm. The V
 * lies inside the half-circle (its corners are on it, Thales), and the
 * middle of the opening, the point the nodus is read by (the style point
 * above the notch's bottom), stays where it is. Every reflex corner above
 * the face line (z > `faceZ`) whose neighbours are level with each other
 * is such a notch (call it before `relieveTabRoots`, whose arcs would look
 * like one); other outlines are returned as they are.
 *
 * @param profile counter-clockwise outline, the style edge level (z constant) across the notch
 * @throws SpecError (process.kerf) when the half-circle would run past the style's ends
 * @example relieveNodusNotch(flatFin, 1.5875, 5)
 */
export function relieveNodusNotch(profile: readonly Vec2[], toolRadiusMm: number, faceZ: number, toleranceMm = CHORD_TOLERANCE_MM): Vec2[] {
  if (!(toolRadiusMm > 0)) return [...profile];
  const rho = toolRadiusMm + RELIEF_OVERSIZE_MM;
  const n = profile.length;
  const out: Vec2[] = [];
  for (let i = 0; i < n; i++) {
    const { a, p, b, reflex } = cornerOf(profile, i);
    if (!reflex || !(p[1] > faceZ + 1e-9) || Math.abs(a[1] - b[1]) > 1e-9) {
      out.push(p);
      continue;
    }
    // p is the notch's bottom, a and b the ends of its opening on the style edge: a was pushed last, b comes next.
    if (i === 0 || i === n - 1) throw new Error('relieveNodusNotch: the outline must not start or end inside the notch');
    const c: Vec2 = [(a[0] + b[0]) / 2, a[1]];
    const R = Math.max(rho, Math.abs(a[0] - b[0]) / 2);
    const before = profile[(i - 2 + n) % n];
    const after = profile[(i + 2) % n];
    const lo = Math.min(before[0], after[0]);
    const hi = Math.max(before[0], after[0]);
    if (c[0] - R < lo + 1e-9 || c[0] + R > hi - 1e-9) {
      throw new SpecError('process.kerf', 2 * toolRadiusMm, `allowed: a router tool narrower than ${(2 * (Math.min(c[0] - lo, hi - c[0]) - RELIEF_OVERSIZE_MM)).toFixed(3)} mm, so the round nodus notch (radius ${R.toFixed(3)} mm) stays within the style (or cutFiles.relief: off)`);
    }
    // Replace a, p, b by the half-circle from a's side, down through the bottom, to b's side.
    out.pop();
    const start = a[0] > c[0] ? 0 : Math.PI;
    out.push(...arcPoints(c, R, start, a[0] > c[0] ? -Math.PI : Math.PI, toleranceMm));
    i++; // b is the arc's last point
  }
  return dropRepeats(out);
}

