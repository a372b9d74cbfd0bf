import { SpecError } from '../errors.ts';
import { cornerHoles } from '../plate/cornerHoles.ts';
import { gnomonTabs, type GnomonTab } from '../plate/gnomonTabs.ts';
import { laidOutPlate, type LaidOutPlate } from '../plate/laidOutPlate.ts';
import { DEG } from '../guards.ts';
import type { DialSpec } from '../spec/schema.ts';
import { formatClock, parseClock } from '../spec/parseClock.ts';
import { standardMeridianDeg, zoneYearOffsets } from '../sun/zoneOffsets.ts';
import { strokeText, strokeTextWidthMm } from '../text/strokeText.ts';
import type { Circle, Hemisphere, Mark, MarkKind, TextBlock } from '../types.ts';
import { castingEdge, eastToFaceX, markOffsetEastMm } from './markOffset.ts';
import { numeralText } from '../text/numeralText.ts';
import { hourCentres } from './hourCentres.ts';
import { numeralBlock, numeralStrokeMm } from '../text/numeralBlock.ts';
import { penumbraMarkWidths } from './penumbraWidths.ts';
import { summerNumerals } from './summerNumerals.ts';
import { markKindAt } from '../clock/markKind.ts';
import { lineHourAngleDeg } from '../clock/lineHourAngle.ts';

/** Gap between the end of the marks (or gnomon) and the numerals, and between bands, mm. */
const BAND_GAP_MM = 3;
/** Least free space kept between a hole's edge and any engraving, mm. */
const HOLE_CLEAR_MM = 2;
/** Least gap between neighbouring numerals as a fraction of their height. */
const NUMERAL_GAP_FRACTION = 0.5;
/** Title line pitch as a multiple of the text height. */
const LINE_PITCH = 1.7;

export interface GnomonLayout {
  readonly heightMm: number;
  readonly thicknessMm: number;
  /** Face y of the style's two ends, mm. */
  readonly y0Mm: number;
  readonly y1Mm: number;
  /** Tabs through the plate, face y of each centre and length along the style, mm. */
  readonly tabs: readonly GnomonTab[];
}

/** The polar plate: the plate every face layout lays out (`LaidOutPlate`). */
export type PlateLayout = LaidOutPlate;

export interface TimeLayout {
  readonly reads: 'solar' | 'standard';
  readonly standardOffsetMin: number;
  readonly standardMeridianDeg: number;
  /**
   * Minutes to add to apparent solar time (after the equation of time) to get
   * standard time: 4·(λs − λ) min (docs/design.md §3; 4 minutes of time per degree).
   * Positive when the site lies west of its standard meridian.
   */
  readonly longitudeCorrectionMin: number;
  /** Shift applied to every line's hour angle, degrees: λ − λs for a standard-time dial, 0 for solar. */
  readonly hourAngleShiftDeg: number;
}

/** The complete face layout: plain data, face coordinates unless named plate. */
export interface DialLayout {
  readonly spec: DialSpec;
  readonly hemisphere: Hemisphere;
  readonly marks: readonly Mark[];
  readonly numerals: readonly TextBlock[];
  readonly title: readonly TextBlock[];
  readonly gnomon: GnomonLayout;
  readonly plate: PlateLayout;
  readonly time: TimeLayout;
  /** Adjustments the layout made on its own (e.g. smaller numerals), for the report. */
  readonly notes: readonly string[];
}

interface MarkTime {
  readonly minutes: number;
  readonly kind: MarkKind;
  readonly hourAngleDeg: number;
}

/** Options of `layoutDial`. */
export interface LayoutOptions {
  /** lowest and highest latitude a shared plate serves, degrees (same hemisphere) */
  readonly latitudeRangeDeg?: readonly [number, number];
}

/**
 * Lay out a polar dial face from a validated spec (docs/design.md §2–3).
 *
 * Marks every `hours.step` minutes from `hours.from` to `hours.to`: whole
 * hours, half hours and quarters at their three lengths, all starting from the
 * equator-ward end of the hour marks. A line's hour angle is
 * H = 15°·(T − 12 h) for a solar-time dial, plus (λ − λs) for a standard-time
 * dial (docs/design.md §3). Its x follows the tan law with the gnomon's thickness; the
 * noon line of a solar dial is the two edges of the noon band. Hours with
 * |H| ≥ 90° or beyond `hours.maxHourAngle`, or that fall off a fixed plate,
 * are refused with the widest range that fits.
 *
 * @param options.latitudeRangeDeg a plate that serves several latitudes (umbrafab batch): the title states this
 *   range instead of site.latitude (default: none, the title states site.latitude)
 * @example layoutDial(parseSpec({ site: { latitude: 41.2, longitude: -8.6, timezone: 'Europe/Lisbon' } }))
 */
export function layoutDial(spec: DialSpec, options: LayoutOptions = {}): DialLayout {
  if (spec.face && spec.face.type !== 'polar') {
    throw new SpecError('face.type', spec.face.type, 'allowed here: "polar" (this command draws the polar plate; `umbrafab build` and `umbrafab check` take every face type)');
  }
  const hemisphere: Hemisphere = spec.site.latitude >= 0 ? 'north' : 'south';
  const notes: string[] = [];
  const time = timeLayout(spec);
  checkKerfAgainstMarks(spec);
  const times = markTimes(spec, time.hourAngleShiftDeg);
  const marks = placeMarks(spec, times, hemisphere);
  const spanBottom = -spec.marks.hour.length / 2;
  const gnomon = gnomonLayout(spec, spanBottom - spec.gnomon.overhang, Math.max(...marks.map((m) => m.y1Mm)) + spec.gnomon.overhang);
  const band = numeralBand(spec, marks, Math.min(spanBottom, gnomon.y0Mm) - BAND_GAP_MM, notes);
  const titleLines = titleText(spec, time, options.latitudeRangeDeg);
  const across = plateAcross(spec, times, marks, band.numerals, titleLines);
  const along = plateAlong(spec, marks, gnomon, band, titleLines);
  const substyleX = across.widthMm / 2;
  const title = titleBlocks(titleLines, spec, {
    leftX: -across.widthMm / 2 + across.titleLeftInset,
    rightLimitX: -spec.gnomon.thickness / 2 - spec.process.clearance - BAND_GAP_MM,
    topY: along.titleTopY,
    notes,
  });
  const plate = laidOutPlate(spec, { widthMm: across.widthMm, lengthMm: along.lengthMm, substyleX, faceOriginY: along.faceOriginY }, gnomon.tabs, holeCircles(spec, across.widthMm, along.lengthMm));
  checkHolesClear(spec, plate, marks, band.numerals, title);
  return { spec, hemisphere, marks, numerals: band.numerals, title, gnomon, plate, time, notes };
}

/**
 * The marks in face coordinates, sorted across the face: each time's line
 * (both edges of the noon band at H = 0) at the tan law's x with the
 * gnomon's thickness, its kind's length from the equator-ward end of the
 * hour marks (whose span is centred on y = 0), widths widened to the
 * penumbra when `marks.followPenumbra`; a line under the fin (the noon band
 * of a solar dial lies exactly at the fin's faces, ±t/2) cannot be seen or
 * read, so it is flagged `underGnomon`: kept in the report, not engraved.
 */
function placeMarks(spec: DialSpec, times: readonly MarkTime[], hemisphere: Hemisphere): Mark[] {
  const h = spec.gnomon.height;
  const t = spec.gnomon.thickness;
  const lengths = spec.marks;
  const spanBottom = -lengths.hour.length / 2;
  const marks: Mark[] = [];
  for (const mt of times) {
    const Hrad = mt.hourAngleDeg * DEG;
    const edges = mt.hourAngleDeg === 0 ? (['west', 'east'] as const) : [castingEdge(Hrad)];
    for (const edge of edges) {
      const m = lengths[mt.kind];
      marks.push({
        label: formatClock(mt.minutes),
        minutes: mt.minutes,
        kind: mt.kind,
        hourAngleDeg: mt.hourAngleDeg,
        style: edge,
        xMm: eastToFaceX(markOffsetEastMm(Hrad, h, t, edge), hemisphere),
        y0Mm: spanBottom,
        y1Mm: spanBottom + m.length,
        widthMm: m.width,
      });
    }
  }
  marks.sort((a, b) => a.xMm - b.xMm || a.y1Mm - b.y1Mm);
  const widened = spec.marks.followPenumbra ? penumbraMarkWidths(marks) : marks;
  return widened.map((m) => (Math.abs(m.xMm) - m.widthMm / 2 < t / 2 ? { ...m, underGnomon: true } : m));
}

/** The numeral band below the marks: its top, the numerals (hours, then summer-time ones) and the lowest y any of them reaches. */
interface NumeralBand {
  readonly topY: number;
  readonly numerals: readonly TextBlock[];
  readonly bottomY: number;
}

/**
 * One numeral per whole hour, centred on its line (on the noon band's
 * middle), hanging from `topY` at the largest height that keeps neighbours
 * apart, and the summer-time numerals below them.
 */
function numeralBand(spec: DialSpec, marks: readonly Mark[], topY: number, notes: string[]): NumeralBand {
  const numeralHeight = fitNumeralHeight(spec, marks, notes);
  const numeralBase = topY - numeralHeight;
  const summer = summerNumerals(spec, marks, numeralHeight, numeralBase);
  return { topY, numerals: [...hourNumerals(spec, marks, numeralHeight, numeralBase), ...summer.blocks], bottomY: summer.bottomY };
}

/**
 * The plate's width across the style: the engraving's half-width plus the
 * margin, room for the mounting holes clear of it, and (an auto plate) the
 * title block at full size left of the gnomon.
 * @throws SpecError naming `plate.width` when a fixed plate is too narrow (with the widest hours that fit)
 */
function plateAcross(spec: DialSpec, times: readonly MarkTime[], marks: readonly Mark[], numerals: readonly TextBlock[], titleLines: readonly string[]): { readonly widthMm: number; readonly titleLeftInset: number } {
  const holes = spec.holes;
  const t = spec.gnomon.thickness;
  const markHalfExtent = Math.max(...marks.map((m) => Math.abs(m.xMm) + m.widthMm / 2));
  const numeralHalfExtent = Math.max(0, ...numerals.map((n) => halfExtentX(n)));
  const engravingHalf = Math.max(markHalfExtent, numeralHalfExtent);
  const holeNeed = holes.count > 0 ? engravingHalf + HOLE_CLEAR_MM + holes.diameter / 2 + holes.inset : 0;
  const textH = spec.dial.textHeight;
  const titleLeftInset = holes.count === 4 ? holes.inset + holes.diameter / 2 + HOLE_CLEAR_MM : spec.plate.margin;
  const titleNeed = titleLeftInset + Math.max(...titleLines.map((l) => strokeTextWidthMm(l, textH))) + t / 2 + spec.process.clearance + BAND_GAP_MM;
  const autoHalfWidth = Math.max(engravingHalf + spec.plate.margin, holeNeed, titleNeed);
  const widthMm = spec.plate.width === 'auto' ? Math.ceil(2 * autoHalfWidth) : spec.plate.width;
  if (spec.plate.width !== 'auto' && widthMm / 2 < Math.max(engravingHalf + spec.plate.margin, holeNeed)) {
    throw plateTooNarrow(spec, times, widthMm, Math.max(engravingHalf + spec.plate.margin, holeNeed));
  }
  return { widthMm, titleLeftInset };
}

/**
 * The plate's length along the style: margin, numerals, marks and gnomon,
 * title, margin; the content centred on a longer fixed plate. Gives the
 * plate y of the face origin and the face y of the title block's top.
 * @throws SpecError naming `plate.length` when a fixed plate is too short
 */
function plateAlong(spec: DialSpec, marks: readonly Mark[], gnomon: GnomonLayout, band: NumeralBand, titleLines: readonly string[]): { readonly lengthMm: number; readonly faceOriginY: number; readonly titleTopY: number } {
  const textH = spec.dial.textHeight;
  const titleBandHeight = (titleLines.length - 1) * LINE_PITCH * textH + textH;
  const engravedTop = Math.max(Math.max(...marks.map((m) => m.y1Mm)), gnomon.y1Mm);
  const bottomNeed = spec.plate.margin + (band.topY - band.bottomY);
  const titleBottom = engravedTop + BAND_GAP_MM;
  const contentLength = bottomNeed + (titleBottom - band.topY) + titleBandHeight + spec.plate.margin;
  const lengthMm = spec.plate.length === 'auto' ? Math.ceil(contentLength) : spec.plate.length;
  if (spec.plate.length !== 'auto' && lengthMm < contentLength) {
    throw new SpecError(
      'plate.length',
      spec.plate.length,
      `allowed: at least ${Math.ceil(contentLength)} mm for these marks, numerals, title and margins (or "auto")`,
      `the layout needs ${contentLength.toFixed(1)} mm along the style but the plate is ${lengthMm} mm`,
    );
  }
  const faceOriginY = (lengthMm - contentLength) / 2 + spec.plate.margin + (0 - band.bottomY);
  return { lengthMm, faceOriginY, titleTopY: titleBottom + titleBandHeight };
}

export function timeLayout(spec: DialSpec): TimeLayout {
  const offset = Math.round(zoneYearOffsets(spec.site.timezone, spec.calendar.year).standardOffsetHours * 60);
  const meridian = standardMeridianDeg(spec.site.timezone, spec.calendar.year);
  const standard = spec.dial.reads === 'standard';
  return {
    reads: spec.dial.reads,
    standardOffsetMin: offset,
    standardMeridianDeg: meridian,
    longitudeCorrectionMin: 4 * (meridian - spec.site.longitude),
    hourAngleShiftDeg: standard ? spec.site.longitude - meridian : 0,
  };
}

/** The clock times to mark and their hour angles; refuses hours a polar face cannot show. */
function markTimes(spec: DialSpec, shiftDeg: number): MarkTime[] {
  const from = parseClock('hours.from', spec.hours.from);
  const to = parseClock('hours.to', spec.hours.to);
  const step = spec.hours.step;
  for (const [field, v] of [['hours.from', from], ['hours.to', to]] as const) {
    if (v % step !== 0) {
      throw new SpecError(field, formatClock(v), `allowed: a time on the ${step}-minute grid of hours.step (e.g. ${formatClock(Math.round(v / step) * step)})`);
    }
  }
  const maxH = spec.hours.maxHourAngle;
  const out: MarkTime[] = [];
  for (let m = from; m <= to; m += step) {
    const H = lineHourAngleDeg(m, shiftDeg);
    if (Math.abs(H) > maxH) {
      const field = m < 12 * 60 ? 'hours.from' : 'hours.to';
      const why =
        Math.abs(H) >= 90
          ? `the sun's rays run parallel to (or behind) a polar face at |hour angle| >= 90°, so the line would be infinitely far from the style`
          : `its line would lie ${Math.abs(Math.tan(H * DEG)).toFixed(2)} gnomon heights from the style, beyond hours.maxHourAngle ${maxH}°`;
      throw new SpecError(field, field === 'hours.from' ? spec.hours.from : spec.hours.to, `allowed: the widest range that fits is ${widestRange(spec, shiftDeg, (Hd) => Math.abs(Hd) <= maxH)}`, `${formatClock(m)} (hour angle ${H.toFixed(1)}°) cannot be shown: ${why}`);
    }
    out.push({ minutes: m, kind: markKindAt(m), hourAngleDeg: H });
  }
  return out;
}

/** "07:00–17:00": the widest run of grid times around noon whose hour angle passes `ok`. */
function widestRange(spec: DialSpec, shiftDeg: number, ok: (hourAngleDeg: number) => boolean): string {
  const step = spec.hours.step;
  const noon = Math.round((12 * 60 - (shiftDeg / 15) * 60) / step) * step;
  if (!ok(lineHourAngleDeg(noon, shiftDeg))) return 'none (no mark fits)';
  let lo = noon;
  while (lo - step >= 0 && ok(lineHourAngleDeg(lo - step, shiftDeg))) lo -= step;
  let hi = noon;
  while (hi + step < 24 * 60 && ok(lineHourAngleDeg(hi + step, shiftDeg))) hi += step;
  return `${formatClock(lo)}–${formatClock(hi)}`;
}

function plateTooNarrow(spec: DialSpec, times: readonly MarkTime[], widthMm: number, needHalf: number): SpecError {
  const h = spec.gnomon.height;
  const t = spec.gnomon.thickness;
  const w = Math.max(spec.marks.hour.width, spec.marks.half.width, spec.marks.quarter.width);
  const slack = needHalf - Math.max(...times.map((mt) => t / 2 + h * Math.abs(Math.tan(mt.hourAngleDeg * DEG)) + w / 2));
  const fits = (Hd: number) => t / 2 + h * Math.abs(Math.tan(Hd * DEG)) + w / 2 + slack <= widthMm / 2;
  const off = times.filter((mt) => !fits(mt.hourAngleDeg)).map((mt) => formatClock(mt.minutes));
  const shift = spec.dial.reads === 'standard' ? times[0].hourAngleDeg - 15 * (times[0].minutes / 60 - 12) : 0;
  return new SpecError(
    'plate.width',
    spec.plate.width,
    `allowed: at least ${Math.ceil(2 * needHalf)} mm (or "auto"), or narrow hours to ${widestRange(spec, shift, fits)}`,
    `the lines for ${off.join(', ')} fall off a ${widthMm} mm plate (with margins, numerals and mounting holes)`,
  );
}

/** Laser score lines and waterjet etch outlines cannot be narrower than the cut itself. */
function checkKerfAgainstMarks(spec: DialSpec): void {
  const { method, kerf } = spec.process;
  if (method !== 'laser' && method !== 'waterjet') return;
  // Only the kinds the step draws; the message names the narrowest of them.
  const kinds = spec.hours.step === 60 ? (['hour'] as const) : spec.hours.step === 30 ? (['hour', 'half'] as const) : (['hour', 'half', 'quarter'] as const);
  const kind = kinds.reduce((a, b) => (spec.marks[b].width < spec.marks[a].width ? b : a));
  const w = spec.marks[kind].width;
  if (kerf > w) {
    throw new SpecError('process.kerf', kerf, `allowed: at most the narrowest mark width (marks.${kind}.width = ${w} mm) for ${method}; widen the marks or use another process`, `a ${kerf} mm ${method} kerf is wider than the ${w} mm ${kind} marks`);
  }
}

function gnomonLayout(spec: DialSpec, y0: number, y1: number): GnomonLayout {
  const tabs = gnomonTabs(spec, y0, y1, 'style');
  return { heightMm: spec.gnomon.height, thicknessMm: spec.gnomon.thickness, y0Mm: y0, y1Mm: y1, tabs };
}

/** The largest numeral height ≤ the asked one at which neighbouring numerals keep a gap. */
function fitNumeralHeight(spec: DialSpec, marks: readonly Mark[], notes: string[]): number {
  const want = spec.dial.numeralHeight;
  const centres = numeralCentres(spec, marks);
  let fit = want;
  for (let i = 1; i < centres.length; i++) {
    const a = centres[i - 1];
    const b = centres[i];
    const unitHalf = (strokeTextWidthMm(a.text, 1) + strokeTextWidthMm(b.text, 1)) / 2;
    const maxH = (b.x - a.x) / (unitHalf + NUMERAL_GAP_FRACTION);
    fit = Math.min(fit, maxH);
  }
  if (fit < want) {
    const rounded = Math.floor(fit * 10) / 10;
    if (rounded < 1.5) {
      throw new SpecError('dial.numeralHeight', want, 'allowed: a taller gnomon or fewer hours: the numerals near noon have no room even at 1.5 mm');
    }
    notes.push(`numerals reduced from ${want} mm to ${rounded} mm so that neighbours near noon do not touch`);
    return rounded;
  }
  return want;
}

/** The hour numerals' centres across the face and their text, left to right. */
function numeralCentres(spec: DialSpec, marks: readonly Mark[]): { x: number; text: string }[] {
  return hourCentres(marks)
    .map(({ label, xMm }) => ({ x: xMm, text: numeralText(Number(label.slice(0, 2)), spec.dial.numerals) }))
    .sort((a, b) => a.x - b.x);
}

/** One numeral per whole hour on the band's baseline `baseY`. */
function hourNumerals(spec: DialSpec, marks: readonly Mark[], heightMm: number, baseY: number): TextBlock[] {
  const stroke = numeralStrokeMm(spec.marks.hour.width, heightMm);
  return numeralCentres(spec, marks).map((c) => numeralBlock(c.text, heightMm, stroke, [c.x, baseY]));
}

function halfExtentX(block: TextBlock): number {
  let m = 0;
  for (const s of block.strokes) for (const [x] of s.points) m = Math.max(m, Math.abs(x));
  return m + block.strokeWidthMm / 2;
}

function titleText(spec: DialSpec, time: TimeLayout, latitudeRange?: readonly [number, number]): string[] {
  const lat = spec.site.latitude;
  const lon = spec.site.longitude;
  const one = (v: number) => `${Math.abs(v).toFixed(3)}${v >= 0 ? 'N' : 'S'}`;
  const latText = latitudeRange ? `${one(Math.min(...latitudeRange))} TO ${one(Math.max(...latitudeRange))}` : one(lat);
  const lonText = `${Math.abs(lon).toFixed(3)}${lon >= 0 ? 'E' : 'W'}`;
  const lines = [spec.name];
  lines.push(spec.site.place ? `${spec.site.place}  ${latText} ${lonText}` : `LAT ${latText}  LON ${lonText}`);
  lines.push(`GNOMON H ${spec.gnomon.height.toFixed(1)} T ${spec.gnomon.thickness.toFixed(1)} MM`);
  lines.push(time.reads === 'solar' ? 'READS APPARENT SOLAR TIME' : `READS STANDARD TIME UTC${formatOffset(time.standardOffsetMin)}`);
  return lines;
}

function formatOffset(min: number): string {
  const sign = min < 0 ? '-' : '+';
  const a = Math.abs(min);
  return `${sign}${String(Math.floor(a / 60)).padStart(2, '0')}:${String(a % 60).padStart(2, '0')}`;
}

function titleBlocks(
  lines: readonly string[],
  spec: DialSpec,
  box: { leftX: number; rightLimitX: number; topY: number; notes: string[] },
): TextBlock[] {
  const want = spec.dial.textHeight;
  const room = box.rightLimitX - box.leftX;
  const widest = Math.max(...lines.map((l) => strokeTextWidthMm(l, 1)));
  let height = Math.min(want, room / widest);
  if (height < want) {
    height = Math.floor(height * 10) / 10;
    if (height < 1.5) {
      throw new SpecError('name', spec.name, 'allowed: a shorter name or a wider plate: the title block has no room beside the gnomon', `the title block needs ${(widest * 1.5).toFixed(0)} mm but ${room.toFixed(0)} mm is free`);
    }
    box.notes.push(`title text reduced from ${want} mm to ${height} mm to fit beside the gnomon`);
  }
  const stroke = Math.max(0.2, Math.min(spec.marks.quarter.width, height / 10));
  return lines.map((text, i) => {
    const base = box.topY - height - i * LINE_PITCH * want;
    return { role: 'title' as const, text, heightMm: height, strokeWidthMm: stroke, strokes: strokeText(text, { heightMm: height, at: [box.leftX, base] }) };
  });
}

function holeCircles(spec: DialSpec, widthMm: number, lengthMm: number): Circle[] {
  const { count, diameter, inset } = spec.holes;
  const r = diameter / 2;
  if (count === 0) return [];
  if (2 * inset >= widthMm || 2 * inset >= lengthMm || inset < r + 1) {
    throw new SpecError('holes.inset', inset, `allowed: from ${r + 1} mm (the hole radius plus 1 mm) to less than half the plate's smaller side`);
  }
  return cornerHoles(spec.holes, widthMm, lengthMm);
}

/** Every hole keeps HOLE_CLEAR_MM of free stock to every mark and glyph. */
function checkHolesClear(spec: DialSpec, plate: PlateLayout, marks: readonly Mark[], numerals: readonly TextBlock[], title: readonly TextBlock[]): void {
  const toPlate = (x: number, y: number): [number, number] => [x + plate.substyleX, y + plate.faceOriginY];
  for (const hole of plate.holes) {
    const need = hole.radiusMm + HOLE_CLEAR_MM;
    for (const m of marks) {
      const [x, y0] = toPlate(m.xMm, m.y0Mm);
      const y1 = y0 + (m.y1Mm - m.y0Mm);
      const dy = hole.cy < y0 ? y0 - hole.cy : hole.cy > y1 ? hole.cy - y1 : 0;
      if (Math.hypot(Math.abs(hole.cx - x) - m.widthMm / 2, dy) < need && Math.abs(hole.cx - x) < need + m.widthMm / 2) {
        throw new SpecError('holes.inset', spec.holes.inset, 'allowed: an inset that keeps the holes clear of the marks (or holes.count: 0, or a wider plate)', `a mounting hole at (${hole.cx.toFixed(1)}, ${hole.cy.toFixed(1)}) mm cuts into the ${m.label} line`);
      }
    }
    for (const block of [...numerals, ...title]) {
      for (const s of block.strokes) {
        for (const [fx, fy] of s.points) {
          const [x, y] = toPlate(fx, fy);
          if (Math.hypot(x - hole.cx, y - hole.cy) < need) {
            throw new SpecError('holes.inset', spec.holes.inset, 'allowed: an inset that keeps the holes clear of the text (or holes.count: 0, or a wider plate)', `a mounting hole at (${hole.cx.toFixed(1)}, ${hole.cy.toFixed(1)}) mm cuts into the text "${block.text}"`);
          }
        }
      }
    }
  }
}
