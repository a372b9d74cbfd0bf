import { SpecError } from '../errors.ts';
import { cornerHoles } from '../plate/cornerHoles.ts';
import { gnomonTabs, type GnomonTab } from '../plate/gnomonTabs.ts';
import { laidOutPlate, type LaidOutPlate } from '../plate/laidOutPlate.ts';
import { DEG } from '../guards.ts';
import { clipPolyline } from '../polar/clipPolyline.ts';
import { dateLineEntries } from '../polar/calendarLines.ts';
import { timeLayout, type TimeLayout } from '../polar/layoutDial.ts';
import { numeralText } from '../text/numeralText.ts';
import { numeralBlock, numeralStrokeMm } from '../text/numeralBlock.ts';
import { formatClock, parseClock } from '../spec/parseClock.ts';
import type { DialSpec } from '../spec/schema.ts';
import type { FaceType } from '../spec/sections/faceSection.ts';
import { strokeText, strokeTextWidthMm } from '../text/strokeText.ts';
import type { Circle, Hemisphere, MarkKind, TextBlock, Vec2 } from '../types.ts';
import { litDeclinations } from './faceSeesSun.ts';
import { hourLine } from './hourLine.ts';
import { planarSiteDateLine } from './planarDateLine.ts';
import { planarFace } from './planarFace.ts';
import { planarMeanTimeCurve } from './planarMeanTimeCurve.ts';
import type { FaceOrientation, FinEdge, PlanarFace } from './planarTypes.ts';
import { plateFrame, substyleFromVerticalRad } from './plateFrame.ts';
import { isEquatorialFace, isParallelFace, type PlanarGnomon } from './styleEdgeAnchor.ts';
import { clipToCurveField, curveFieldOf, type CurveField } from './curveField.ts';
import { lineHourAngleDeg } from '../clock/lineHourAngle.ts';
import { METRIC_SIZES, screwForHole } from '../stand/metricFasteners.ts';
import { OBLIQUITY_J2000_RAD } from '../calendar/obliquity.ts';
import { equatorialSeatRailWidthMm } from './equatorialStand.ts';
import { markKindAt } from '../clock/markKind.ts';

/** Gap between bands (line ends, numerals, title), mm. */
const BAND_GAP_MM = 3;
/** Least style height for a fin rising from a root: below it the fin would be more than 11 gnomon heights long. */
export const MIN_STYLE_HEIGHT_DEG = 5;
/** How far beyond the solstice's date line an equatorial face's hour lines reach with a nodus, in rod heights (ours: about a month of date either side of the solstice, δ down to 21.4°). */
const EQUATORIAL_NODUS_BAND = 0.25;
/** First hour-angle step of the date lines, degrees (then halved to the chord tolerance, `planarSiteDateLine`). */
const DATE_LINE_STEP_DEG = 0.25;

/** One line on a planar face, face coordinates of the plate frame (see `plateFrame`), mm. */
export interface PlanarMark {
  readonly label: string;
  /** the clock reading the line stands for, minutes after midnight */
  readonly minutes: number;
  readonly kind: MarkKind;
  /** hour angle at which the shadow lies on this line, degrees */
  readonly hourAngleDeg: number;
  /** the style edge whose shadow it is */
  readonly edge: FinEdge;
  /** the line's two ends, the first nearer the root */
  readonly a: Vec2;
  readonly b: Vec2;
  readonly widthMm: number;
  /** set when the line lies in the gnomon's footprint (the noon band): listed, not engraved */
  readonly underGnomon?: true;
}

/** A date line or a mean-time curve, clipped to the marks' field. */
export interface PlanarCurve {
  readonly label: string;
  readonly kind: 'date' | 'meanTime';
  readonly widthMm: number;
  readonly paths: readonly (readonly Vec2[])[];
}

/**
 * The gnomon of a planar face, in the fin's own plane: `u` along the plate's
 * y axis (the substyle) from the face origin, `v` the height above the face.
 * A `fin` is a polygon standing on the substyle (its style edge from
 * `styleFrom` to `styleTo`); a `rod` (equatorial faces) is a round pin
 * square to the face through its centre.
 */
export interface PlanarGnomonLayout {
  readonly kind: 'fin' | 'rod';
  /** the tip's (ψ > 0) or the style's (ψ = 0) height above the face, mm */
  readonly heightMm: number;
  /** fin thickness or rod diameter, mm */
  readonly thicknessMm: number;
  readonly styleHeightDeg: number;
  /** fin outline [u, v], counter-clockwise, mm (the rod: its side view, one face's half) */
  readonly profile: readonly Vec2[];
  readonly styleFrom: Vec2;
  readonly styleTo: Vec2;
  /** face y of the footprint's two ends, mm */
  readonly y0Mm: number;
  readonly y1Mm: number;
  readonly tabs: readonly GnomonTab[];
  /** the nodus, measured along the style from its anchor (root, or the point above the face origin), mm; null without one */
  readonly nodusAlongStyleMm: number | null;
}

/** A planar face's plate: the plate every face layout lays out (`LaidOutPlate`). */
export type PlanarPlateLayout = LaidOutPlate;

/** An hour on the spec's grid that the face cannot show, and why. */
export interface LeftOutHour {
  readonly label: string;
  readonly hourAngleDeg: number;
  readonly reason: string;
}

/** The complete layout of a non-polar planar face: plain data. */
export interface PlanarLayout {
  readonly kind: 'planar';
  readonly spec: DialSpec;
  readonly faceType: Exclude<FaceType, 'polar'>;
  readonly hemisphere: Hemisphere;
  /** the face in the plate's frame (drawing axes along the substyle) */
  readonly face: PlanarFace;
  readonly gnomonModel: PlanarGnomon;
  /** angle of the plate's y axis from the face's line of steepest ascent, degrees, clockwise seen from the front */
  readonly plateTurnDeg: number;
  readonly substyleHourAngleDeg: number;
  readonly marks: readonly PlanarMark[];
  readonly leftOut: readonly LeftOutHour[];
  readonly curves: readonly PlanarCurve[];
  readonly numerals: readonly TextBlock[];
  readonly title: readonly TextBlock[];
  readonly gnomon: PlanarGnomonLayout;
  readonly plate: PlanarPlateLayout;
  readonly time: TimeLayout;
  readonly notes: readonly string[];
  /**
   * face.side both: the plate's lower face, laid out in its own frame (seen
   * from below; its spec's face.side is 'lower') on the same plate: the
   * same size, holes and outline, the rod on the flip axis x = width / 2,
   * so turning the plate over about that axis brings the lower face's
   * drawing onto the plate's outline and holes. Absent for one face.
   */
  readonly lowerFace?: PlanarLayout;
}

/** What a face needs of the plate beyond its own engraving (face.side both: both faces' room, shared). */
interface PlateRoom {
  /** the engraving's box in face coordinates, mm */
  readonly engraved: Box;
  readonly titleWidthMm: number;
  /** the clear border around it, mm (`plateMarginMm`) */
  readonly marginMm: number;
}

/** The face orientation a spec asks for (null for the polar plate). */
export function faceOrientationOf(spec: DialSpec): FaceOrientation | null {
  const f = spec.face;
  if (!f || f.type === 'polar') return null;
  return {
    type: f.type,
    latitudeRad: spec.site.latitude * DEG,
    declinationRad: f.wallDeclination * DEG,
    reclinationRad: f.reclination * DEG,
    facing: f.facing,
    side: f.side === 'lower' ? 'lower' : 'upper',
  };
}

/**
 * Lay out a horizontal, vertical (declining, reclining), meridian or
 * equatorial face from a validated spec, by the general method (docs/design.md §8,
 * `hourLine`): every mark of the `hours` grid whose hour the face can see
 * at some time of the year (`litDeclinations`; the others are left out and
 * listed in `leftOut` and the notes), a thick fin's two roots, the noon band
 * at H₀, numerals beyond the line ends, date lines and mean-time curves for
 * a nodus, the standard-time shift of `dial.reads`.
 *
 * Proportions: with ψ > 0 the fin's style rises from the root to its tip,
 * `gnomon.height` above the face, over the substyle at R = h / tan ψ from
 * the root; the hour lines end on the circle of radius R (the classic
 * proportion: the tip above the end of the noon line), each as long as its
 * `marks.*.length` allows. With ψ = 0 (meridian) the fin is a rectangle at
 * `gnomon.height`, lines parallel to the substyle at h · tan(H − H₀), as on
 * the polar plate. An equatorial face has a rod through its centre; its
 * lines are 15° apart and the rod's shadow is a band centred on them.
 *
 * @example layoutPlanar(parseSpec({ site, face: { type: 'horizontal' } })).marks.length
 */
export function layoutPlanar(spec: DialSpec): PlanarLayout {
  const f = spec.face;
  if (f?.type === 'equatorial' && f.side === 'both') return layoutBothFaces(spec);
  return layoutFace(spec);
}

/**
 * face.side both: the upper face and the lower face on one plate. Each face
 * is laid out alone first; the plate then takes both engravings (the lower
 * face's x turned over, as it lies on the plate) made symmetric about the
 * rod, so the rod's hole lies on the plate's vertical centre line, the flip
 * axis, and the outline and the holes are their own mirror images. Both
 * faces are then laid out again on that plate. A mid-length row of holes
 * (holes.count 2) is refused: its seat rail would cross the lower face.
 */
function layoutBothFaces(spec: DialSpec): PlanarLayout {
  if (spec.holes.count === 2) {
    throw new SpecError('holes.count', 2, 'allowed: 0 or 4 for an equatorial plate engraved on both faces (face.side both)', 'the seat rail under a mid-length row of holes would lie across the lower face');
  }
  const sideSpec = (side: 'upper' | 'lower'): DialSpec => ({ ...spec, face: { ...spec.face!, side } });
  const [upperSpec, lowerSpec] = [sideSpec('upper'), sideSpec('lower')];
  const rooms = [plateRoomOf(upperSpec), plateRoomOf(lowerSpec)];
  const [u, l] = [rooms[0].engraved, rooms[1].engraved];
  const halfWidth = Math.max(Math.abs(u.xMinMm), Math.abs(u.xMaxMm), Math.abs(l.xMinMm), Math.abs(l.xMaxMm));
  // The rod's hole with 3 mm around it stays inside the box too, so the end seat rails (beyond the border) never reach the rod.
  const rodRoom = spec.gnomon.thickness / 2 + spec.process.clearance + 3;
  const room: PlateRoom = {
    engraved: { xMinMm: -halfWidth, xMaxMm: halfWidth, yMinMm: Math.min(u.yMinMm, l.yMinMm, -rodRoom), yMaxMm: Math.max(u.yMaxMm, l.yMaxMm, rodRoom) },
    titleWidthMm: Math.max(rooms[0].titleWidthMm, rooms[1].titleWidthMm),
    marginMm: plateMarginMm(spec, 'equatorial'),
  };
  const upper = layoutFace(upperSpec, room);
  const lower = layoutFace(lowerSpec, room);
  return { ...upper, spec, notes: [...upper.notes.map((n) => `upper face: ${n}`), ...lower.notes.map((n) => `lower face: ${n}`)], lowerFace: lower };
}

/** The room a face's engraving takes (its layout alone). */
function plateRoomOf(spec: DialSpec): PlateRoom {
  let room: PlateRoom | undefined;
  layoutFace(spec, undefined, (r) => (room = r));
  return room!;
}

/**
 * One face: `room` (face.side both) sizes the plate for both faces instead
 * of this face's engraving alone; `onRoom` hears this face's own room.
 */
function layoutFace(spec: DialSpec, room?: PlateRoom, onRoom?: (r: PlateRoom) => void): PlanarLayout {
  const orientation = faceOrientationOf(spec);
  if (!orientation) throw new Error('layoutPlanar: the polar plate is laid out by layoutDial');
  const faceType = orientation.type as Exclude<FaceType, 'polar'>;
  const hemisphere: Hemisphere = spec.site.latitude >= 0 ? 'north' : 'south';
  const wallFace = planarFace(orientation);
  const face = plateFrame(wallFace);
  const psiDeg = face.styleHeightRad / DEG;
  const parallel = isParallelFace(face);
  const equatorial = isEquatorialFace(face);
  const notes: string[] = [];
  const h = spec.gnomon.height;
  const t = spec.gnomon.thickness;
  const model: PlanarGnomon = { thicknessMm: t, heightMm: h };
  if (!parallel && !equatorial && psiDeg < MIN_STYLE_HEIGHT_DEG) {
    const why = `the style would stand ${psiDeg.toFixed(2)}° from this face, so its fin would be ${(1 / Math.tan(face.styleHeightRad)).toFixed(0)} times as long as it is high`;
    // A level face's style rises at the latitude itself: only the site can change it.
    if (faceType === 'horizontal') throw new SpecError('site.latitude', spec.site.latitude, `allowed: for a horizontal face, a latitude at least ${MIN_STYLE_HEIGHT_DEG}° from the equator (its style rises at |latitude|), or exactly 0`, why);
    throw new SpecError(
      faceType === 'vertical' ? 'face.wallDeclination' : 'face.type',
      faceType === 'vertical' ? spec.face?.wallDeclination : faceType,
      `allowed: a face whose style height is at least ${MIN_STYLE_HEIGHT_DEG}° (a wall within about ${(90 - MIN_STYLE_HEIGHT_DEG / Math.cos(spec.site.latitude * DEG)).toFixed(0)}° of the equator-ward horizon), or face.type meridian for a wall facing due east or west`,
      why,
    );
  }
  const time = timeLayout(spec);
  const H0deg = face.substyleHourAngleRad / DEG;

  // Marks: the hours' grid, each hour the face can see at some date.
  const from = parseClock('hours.from', spec.hours.from);
  const to = parseClock('hours.to', spec.hours.to);
  const step = spec.hours.step;
  const R = parallel ? 0 : equatorial ? equatorialLineRadiusMm(spec) : h / Math.tan(face.styleHeightRad);
  const marks: PlanarMark[] = [];
  const leftOut: LeftOutHour[] = [];
  for (let m = Math.ceil(from / step) * step; m <= to; m += step) {
    const Hdeg = lineHourAngleDeg(m, time.hourAngleShiftDeg);
    const label = formatClock(m);
    const kind = markKindAt(m);
    const H = Hdeg * DEG;
    if (!litDeclinations(wallFace, H)) {
      leftOut.push({ label, hourAngleDeg: Hdeg, reason: 'the face never sees the sun at this hour (behind the face or below the horizon all year)' });
      continue;
    }
    if (parallel && Math.abs(Hdeg - H0deg) > spec.hours.maxHourAngle) {
      leftOut.push({ label, hourAngleDeg: Hdeg, reason: `its line would lie ${Math.abs(Math.tan(H - face.substyleHourAngleRad)).toFixed(1)} gnomon heights from the style, beyond hours.maxHourAngle ${spec.hours.maxHourAngle}° from the substyle's hour` });
      continue;
    }
    const set = hourLine(face, model, H);
    if (!set) {
      leftOut.push({ label, hourAngleDeg: Hdeg, reason: 'the line lies at infinity' });
      continue;
    }
    const len = spec.marks[kind].length;
    const w = spec.marks[kind].width;
    for (const { edge, line } of set.lines) {
      const [px, py] = line.point;
      const [dx, dy] = line.direction;
      let a: Vec2;
      let b: Vec2;
      if (parallel) {
        // Parallel to the substyle, centred on the face origin's level like the polar plate.
        a = [px - (dx * len) / 2 - (dx * (px * dx + py * dy)), py - (dy * len) / 2 - dy * (px * dx + py * dy)];
        b = [a[0] + dx * len, a[1] + dy * len];
      } else {
        const rIn = Math.max(R - len, R * 0.2, t + 2);
        a = [px + dx * rIn, py + dy * rIn];
        b = [px + dx * R, py + dy * R];
      }
      marks.push({ label, minutes: m, kind, hourAngleDeg: Hdeg, edge, a, b, widthMm: w });
    }
  }
  if (marks.length === 0) {
    throw new SpecError('hours.from', spec.hours.from, `allowed: hours the face can show; this ${faceType} face shows none of ${spec.hours.from}–${spec.hours.to}`, leftOut[0]?.reason);
  }
  if (leftOut.length) {
    notes.push(`${leftOut.length} time(s) of the ${spec.hours.from}–${spec.hours.to} grid left out: ${summariseLeftOut(leftOut)}`);
  }

  // The gnomon.
  const gnomon = gnomonOf(spec, face, parallel, equatorial, R, marks);
  // Lines in the gnomon's footprint (the noon band's two edges on a fin face) are listed, not engraved.
  const inFoot = (p: Vec2, w: number) => Math.abs(p[0]) - w / 2 < t / 2 && p[1] >= gnomon.y0Mm - 1e-9 && p[1] <= gnomon.y1Mm + 1e-9;
  marks.forEach((m, i) => {
    if (!equatorial && inFoot(m.a, m.widthMm) && inFoot(m.b, m.widthMm)) marks[i] = { ...m, underGnomon: true };
  });

  // Numerals beyond the outer end of each whole hour's line.
  const numerals = fitNumerals(spec, marks, parallel, notes);

  // Date lines and mean-time curves, clipped to the marks' field.
  const field = curveFieldOf(marks, equatorial);
  const curves = spec.gnomon.nodus ? planarCurves(spec, face, model, gnomon, marks, time, field, notes) : [];
  if (!spec.gnomon.nodus && spec.dial.meanTimeCurves) {
    throw new SpecError('dial.meanTimeCurves', true, 'allowed: false unless gnomon.nodus is true (the curves are read off the nodus shadow)');
  }

  // Plate: the engraving's bounding box, margins (wide enough for the holes), the title below.
  const textH = spec.dial.textHeight;
  const titleLines = titleText(spec, faceType, psiDeg);
  const titleHeight = (titleLines.length - 1) * 1.7 * textH + textH;
  const titleWidth = Math.max(...titleLines.map((l) => strokeTextWidthMm(l, textH)));
  const ownEngraved = boundsOf([
    ...marks.flatMap((m) => [m.a, m.b]),
    ...numerals.flatMap((n) => n.strokes.flatMap((s) => s.points)),
    [-t / 2, gnomon.y0Mm],
    [t / 2, gnomon.y1Mm],
  ]);
  onRoom?.({ engraved: ownEngraved, titleWidthMm: titleWidth, marginMm: plateMarginMm(spec, faceType) });
  const engraved = room?.engraved ?? ownEngraved;
  const margin = room?.marginMm ?? plateMarginMm(spec, faceType);
  const contentW = Math.max(engraved.xMaxMm - engraved.xMinMm, room?.titleWidthMm ?? titleWidth) + 2 * margin;
  const contentL = engraved.yMaxMm - engraved.yMinMm + BAND_GAP_MM + titleHeight + 2 * margin;
  const widthMm = spec.plate.width === 'auto' ? Math.ceil(contentW) : spec.plate.width;
  const lengthMm = spec.plate.length === 'auto' ? Math.ceil(contentL) : spec.plate.length;
  if (widthMm < contentW) throw new SpecError('plate.width', spec.plate.width, `allowed: at least ${Math.ceil(contentW)} mm for these lines, numerals, title and margins (or "auto")`);
  if (lengthMm < contentL) throw new SpecError('plate.length', spec.plate.length, `allowed: at least ${Math.ceil(contentL)} mm for these lines, numerals, title and margins (or "auto")`);
  const centreX = (engraved.xMinMm + engraved.xMaxMm) / 2;
  const substyleX = widthMm / 2 - centreX;
  const titleTop = (lengthMm - contentL) / 2 + margin + titleHeight;
  const faceOriginY = titleTop + BAND_GAP_MM - engraved.yMinMm;
  const title = titleLines.map((text, i) => {
    const stroke = Math.max(0.2, Math.min(spec.marks.quarter.width, textH / 10));
    return { role: 'title' as const, text, heightMm: textH, strokeWidthMm: stroke, strokes: strokeText(text, { heightMm: textH, at: [centreX, titleTop - faceOriginY - textH - i * 1.7 * textH], align: 'center' }) };
  });

  const rodHole: Circle[] = gnomon.kind === 'rod' ? [{ kind: 'circle', cx: substyleX, cy: faceOriginY, radiusMm: t / 2 + spec.process.clearance }] : [];
  const plate = laidOutPlate(spec, { widthMm, lengthMm, substyleX, faceOriginY }, gnomon.tabs, [...cornerHoles(spec.holes, widthMm, lengthMm), ...rodHole]);
  const plateTurnDeg = substyleFromVerticalRad(wallFace, face) / DEG;
  if (faceType === 'vertical' && Math.abs(plateTurnDeg) > 1e-9) {
    notes.push(`the substyle stands ${Math.abs(plateTurnDeg).toFixed(2)}° from the plumb line, turned ${plateTurnDeg > 0 ? 'clockwise' : 'anticlockwise'} seen from in front: the plate's long edges follow the substyle (the plumb line is drawn on the reference layer)`);
  }
  return {
    kind: 'planar',
    spec,
    faceType,
    hemisphere,
    face,
    gnomonModel: model,
    plateTurnDeg,
    substyleHourAngleDeg: H0deg,
    marks,
    leftOut,
    curves,
    numerals,
    title,
    gnomon,
    plate,
    time,
    notes,
  };
}

/**
 * How far an equatorial face's hour lines reach from the rod, mm: the rod's
 * height h; with a nodus at the rod's tip, beyond the solstice's date line.
 * On an equatorial face the Sun stands δ above the face's plane, so the
 * nodus shadow lies h · cot |δ| from the rod: the date lines are circles
 * about it, the nearest the solstice's at h / tan ε (ε the obliquity, 2.3 h),
 * every other date farther out (the equinox at infinity). The lines then
 * end EQUATORIAL_NODUS_BAND × h beyond that circle, so the solstice's circle
 * and the solstice loops of the mean-time curves lie in their field.
 */
function equatorialLineRadiusMm(spec: DialSpec): number {
  const h = spec.gnomon.height;
  return spec.gnomon.nodus ? h / Math.tan(OBLIQUITY_J2000_RAD) + EQUATORIAL_NODUS_BAND * h : h;
}

/**
 * The clear border around the engraving, mm: plate.margin, widened to take
 * the mounting holes (their edge 2 mm clear of the engraving's box). On an
 * equatorial face the screws' pan heads or washers lie on an engraved face
 * (the upper face's, or the lower face's when it hangs under its rails), so
 * the border also keeps the engraving's box a washer radius + 1 mm from each
 * hole's centre; with both faces engraved, the seat rails under the plate's
 * two ends cover a band of the lower face as wide as a rail, and the border
 * is at least that band + 2 mm.
 */
function plateMarginMm(spec: DialSpec, faceType: Exclude<FaceType, 'polar'>): number {
  const holes = spec.holes;
  const fixed = holes.count > 0 ? holes.inset + holes.diameter / 2 + 2 : 0;
  if (faceType !== 'equatorial') return Math.max(spec.plate.margin, fixed);
  const washer = holes.count > 0 ? holes.inset + (screwForHole(holes.diameter) ?? METRIC_SIZES[0]).washerOdMm / 2 + 1 : 0;
  const rails = spec.face?.side === 'both' ? equatorialSeatRailWidthMm(spec) + 2 : 0;
  return Math.max(spec.plate.margin, fixed, washer, rails);
}

function summariseLeftOut(left: readonly LeftOutHour[]): string {
  const shown = left.slice(0, 6).map((l) => l.label).join(', ');
  return `${shown}${left.length > 6 ? `, … (${left.length} in all)` : ''} — ${left[0].reason}`;
}

function gnomonOf(spec: DialSpec, face: PlanarFace, parallel: boolean, equatorial: boolean, R: number, marks: readonly PlanarMark[]): PlanarGnomonLayout {
  const h = spec.gnomon.height;
  const t = spec.gnomon.thickness;
  const psiDeg = face.styleHeightRad / DEG;
  if (equatorial) {
    return { kind: 'rod', heightMm: h, thicknessMm: t, styleHeightDeg: psiDeg, profile: [[-t / 2, 0], [t / 2, 0], [t / 2, h], [-t / 2, h]], styleFrom: [0, 0], styleTo: [0, h], y0Mm: -t / 2, y1Mm: t / 2, tabs: [], nodusAlongStyleMm: spec.gnomon.nodus ? h : null };
  }
  if (parallel) {
    const ys = marks.flatMap((m) => [m.a[1], m.b[1]]);
    const y0 = Math.min(...ys) - spec.gnomon.overhang;
    const y1 = Math.max(...ys) + spec.gnomon.overhang;
    return { kind: 'fin', heightMm: h, thicknessMm: t, styleHeightDeg: 0, profile: [[y0, 0], [y1, 0], [y1, h], [y0, h]], styleFrom: [y0, h], styleTo: [y1, h], y0Mm: y0, y1Mm: y1, tabs: gnomonTabs(spec, y0, y1, 'footprint'), nodusAlongStyleMm: spec.gnomon.nodus ? spec.gnomon.nodusY : null };
  }
  // ψ > 0: a triangle on the substyle from the root (u = 0) to the tip's foot (u = ±R).
  const sense = face.up[0] * face.substyle[0] + face.up[1] * face.substyle[1] + face.up[2] * face.substyle[2] >= 0 ? 1 : -1;
  const uTip = sense * R;
  const profile: Vec2[] = sense > 0 ? [[0, 0], [uTip, 0], [uTip, h]] : [[uTip, 0], [0, 0], [uTip, h]];
  const y0 = Math.min(0, uTip);
  const y1 = Math.max(0, uTip);
  // The nodus: the style's point over the middle of the footprint, moved along it by gnomon.nodusY.
  const along = (R / 2 + spec.gnomon.nodusY) / Math.cos(face.styleHeightRad);
  if (spec.gnomon.nodus && !(along > 0 && along <= R / Math.cos(face.styleHeightRad))) {
    throw new SpecError('gnomon.nodusY', spec.gnomon.nodusY, `allowed: from ${(-R / 2).toFixed(1)} to ${(R / 2).toFixed(1)} mm: the nodus must lie on the style (0 = over the footprint's middle)`);
  }
  return { kind: 'fin', heightMm: h, thicknessMm: t, styleHeightDeg: psiDeg, profile, styleFrom: [0, 0], styleTo: [uTip, h], y0Mm: y0, y1Mm: y1, tabs: gnomonTabs(spec, y0 + R * 0.1, y1 - R * 0.1, 'footprint'), nodusAlongStyleMm: spec.gnomon.nodus ? along : null };
}

/** Numerals at the asked height, or smaller (to 0.1 mm) until no two neighbours come closer than half a height. */
function fitNumerals(spec: DialSpec, marks: readonly PlanarMark[], parallel: boolean, notes: string[]): TextBlock[] {
  const want = spec.dial.numeralHeight;
  let h = want;
  for (let i = 0; i < 4; i++) {
    const blocks = hourNumerals(spec, marks, h, parallel);
    const boxes = blocks.map((b) => boundsOf(b.strokes.flatMap((s) => s.points)));
    let worst = Infinity;
    for (let j = 0; j < boxes.length; j++) {
      for (let k = j + 1; k < boxes.length; k++) {
        const [p, q] = [boxes[j], boxes[k]];
        const gap = Math.max(q.xMinMm - p.xMaxMm, p.xMinMm - q.xMaxMm, q.yMinMm - p.yMaxMm, p.yMinMm - q.yMaxMm);
        worst = Math.min(worst, gap);
      }
    }
    if (worst >= 0.8 * h || h <= 1.5) break;
    h = Math.max(1.5, Math.floor(h * Math.max(0.5, (worst + h) / (1.8 * h)) * 10) / 10);
  }
  if (h < want) notes.push(`numerals reduced from ${want} mm to ${h} mm so that neighbours do not touch`);
  return hourNumerals(spec, marks, h, parallel);
}

function hourNumerals(spec: DialSpec, marks: readonly PlanarMark[], heightMm: number, parallel: boolean): TextBlock[] {
  const stroke = numeralStrokeMm(spec.marks.hour.width, heightMm);
  const byMinutes = new Map<number, PlanarMark[]>();
  for (const m of marks) if (m.kind === 'hour') byMinutes.set(m.minutes, [...(byMinutes.get(m.minutes) ?? []), m]);
  const out: TextBlock[] = [];
  for (const [minutes, ms] of byMinutes) {
    const text = numeralText(Math.floor(minutes / 60), spec.dial.numerals);
    const bx = ms.reduce((s, m) => s + m.b[0], 0) / ms.length;
    const by = ms.reduce((s, m) => s + m.b[1], 0) / ms.length;
    const ax = ms.reduce((s, m) => s + m.a[0], 0) / ms.length;
    const ay = ms.reduce((s, m) => s + m.a[1], 0) / ms.length;
    const len = Math.hypot(bx - ax, by - ay) || 1;
    // Beyond the outer end (ψ = 0: beyond the end nearer the equator-ward side, as on the polar plate).
    const [ux, uy] = parallel ? [(ax - bx) / len, (ay - by) / len] : [(bx - ax) / len, (by - ay) / len];
    const [ex, ey] = parallel ? [ax, ay] : [bx, by];
    const half = Math.max(strokeTextWidthMm(text, heightMm) / 2, heightMm / 2);
    const reach = BAND_GAP_MM + Math.abs(ux) * half + Math.abs(uy) * (heightMm / 2);
    const cx = ex + ux * reach;
    const cy = ey + uy * reach;
    out.push(numeralBlock(text, heightMm, stroke, [cx, cy - heightMm / 2]));
  }
  return out;
}

/**
 * The date lines and mean-time curves of a face with a nodus, clipped to the
 * hour lines' field (`curveFieldOf`: their box, or an equatorial face's disc); one asked for that is not drawn is named in `notes`
 * with the reason (its nodus shadow falls wholly beyond that field, as a
 * summer date line below a wall dial's lines; or the face never sees the Sun
 * at that clock time), so no line goes missing unsaid.
 */
function planarCurves(spec: DialSpec, face: PlanarFace, model: PlanarGnomon, gnomon: PlanarGnomonLayout, marks: readonly PlanarMark[], time: TimeLayout, field: CurveField, notes: string[]): PlanarCurve[] {
  const along = gnomon.nodusAlongStyleMm ?? undefined;
  const hs = marks.map((m) => m.hourAngleDeg);
  const hMin = Math.min(...hs);
  const hMax = Math.max(...hs);
  const hours: number[] = [];
  for (let d = hMin; d <= hMax + 1e-9; d += DATE_LINE_STEP_DEG) hours.push(d * DEG);
  const width = spec.marks.quarter.width;
  const out: PlanarCurve[] = [];
  const beyond: string[] = [];
  const unlit: string[] = [];
  const keep = (label: string, kind: PlanarCurve['kind'], runs: readonly { readonly points: readonly Vec2[] }[]) => {
    const paths = runs.flatMap((r) => clipToCurveField(r.points, field));
    if (paths.length) out.push({ label, kind, widthMm: width, paths });
    else (runs.some((r) => r.points.length > 1) ? beyond : unlit).push(label);
  };
  const seen: number[] = [];
  for (const e of dateLineEntries(spec)) {
    if (seen.some((d) => Math.abs(d - e.declinationRad) < 0.1 * DEG)) continue;
    seen.push(e.declinationRad);
    keep(e.label, 'date', planarSiteDateLine(face, model, { declinationRad: e.declinationRad, distanceAu: e.distanceAu, hourAngles: hours, alongStyleMm: along }));
  }
  if (spec.dial.meanTimeCurves) {
    const whole = [...new Set(marks.filter((m) => m.kind === 'hour').map((m) => m.minutes))];
    for (const minutes of whole) {
      const runs = planarMeanTimeCurve(face, model, { clockMinutes: minutes, year: spec.calendar.year, shiftDeg: spec.site.longitude - time.standardMeridianDeg, standardMeridianDeg: time.standardMeridianDeg, alongStyleMm: along });
      keep(`${formatClock(minutes)} mean time`, 'meanTime', runs);
    }
  }
  if (beyond.length) notes.push(`${beyond.length} date line(s) or curve(s) not drawn: the nodus shadow falls beyond the hour lines' field all along them (${beyond.join(', ')})`);
  if (unlit.length) notes.push(`${unlit.length} date line(s) or curve(s) not drawn: the face never sees the Sun along them, on that date or at that clock time (${unlit.join(', ')})`);
  return out;
}

interface Box {
  readonly xMinMm: number;
  readonly xMaxMm: number;
  readonly yMinMm: number;
  readonly yMaxMm: number;
}

function boundsOf(points: readonly Vec2[]): Box {
  let xMinMm = Infinity;
  let xMaxMm = -Infinity;
  let yMinMm = Infinity;
  let yMaxMm = -Infinity;
  for (const [x, y] of points) {
    xMinMm = Math.min(xMinMm, x);
    xMaxMm = Math.max(xMaxMm, x);
    yMinMm = Math.min(yMinMm, y);
    yMaxMm = Math.max(yMaxMm, y);
  }
  return { xMinMm, xMaxMm, yMinMm, yMaxMm };
}

const TYPE_TITLES: Readonly<Record<Exclude<FaceType, 'polar'>, string>> = {
  horizontal: 'HORIZONTAL DIAL',
  vertical: 'WALL DIAL',
  meridian: 'MERIDIAN DIAL',
  equatorial: 'EQUATORIAL DIAL',
};

function titleText(spec: DialSpec, type: Exclude<FaceType, 'polar'>, psiDeg: number): string[] {
  const lat = spec.site.latitude;
  const lon = spec.site.longitude;
  const pos = `${Math.abs(lat).toFixed(3)}${lat >= 0 ? 'N' : 'S'} ${Math.abs(lon).toFixed(3)}${lon >= 0 ? 'E' : 'W'}`;
  const f = spec.face!;
  const kind = type === 'vertical'
    ? `${TYPE_TITLES[type]} DECL ${Math.abs(f.wallDeclination).toFixed(1)}${f.wallDeclination > 0 ? 'W' : f.wallDeclination < 0 ? 'E' : ''}${f.reclination ? ` RECL ${f.reclination.toFixed(1)}` : ''}`
    : type === 'meridian' ? `${TYPE_TITLES[type]} FACING ${f.facing.toUpperCase()}` : type === 'equatorial' ? `${TYPE_TITLES[type]} ${f.side.toUpperCase()} FACE` : TYPE_TITLES[type];
  return [spec.name, spec.site.place ? `${spec.site.place}  ${pos}` : pos, `${kind}  STYLE ${psiDeg.toFixed(2)} DEG`, spec.dial.reads === 'solar' ? 'READS APPARENT SOLAR TIME' : 'READS STANDARD TIME'];
}

