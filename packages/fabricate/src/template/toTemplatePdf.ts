import type PDFDocument from 'pdfkit';
import type { Circle, Mark, Path, PlateDrawing, RoundedRect, SheetPart, Vec2 } from '@umbrafab/geometry';
import { roundTo } from '../process/roundTo.ts';
import { BORDER_MM, FOOTER_MM, PT_PER_MM, tileLayout, type PaperName, type TileLayout } from './templatePages.ts';

/** What the template shows: the plate drawing and the numbers a maker checks with a ruler. */
export interface TemplateInput {
  readonly drawing: PlateDrawing;
  readonly marks: readonly Mark[];
  readonly gnomonHeightMm: number;
  readonly gnomonThicknessMm: number;
  /** dial name, printed in the heading */
  readonly title: string;
  /** further flat parts (the gnomon fin, the stand's parts) drawn at 1:1 after the check triangle, each on its own sheets */
  readonly parts?: readonly TemplatePart[];
}

/** Options of `toTemplatePdf` (the spec's `template:` section). */
export interface TemplateOptions {
  readonly paper: PaperName;
  readonly orientation: 'auto' | 'portrait' | 'landscape';
  readonly overlapMm: number;
  readonly marginMm: number;
}

export const TEMPLATE_DEFAULTS: TemplateOptions = { paper: 'A4', orientation: 'auto', overlapMm: 15, marginMm: 10 };

/** Length of the calibration bar, mm. */
export const CALIBRATION_BAR_MM = 100;
/** Fill colour of the calibration bar: drawn as one rectangle in this colour alone, so a reader can find and measure it. */
export const CALIBRATION_BAR_RGB = '#1a1a80';
/** The instruction on every sheet. */
export const PRINT_AT_FULL_SIZE = 'Print at 100 % (actual size), no scaling: the bar below must measure exactly 100 mm.';

/** A fixed creation date keeps the file byte-stable (pdfkit derives the file ID from it). */
const FIXED_DATE = new Date(Date.UTC(2000, 0, 1));
const INK = '#000000';
const GREY = '#808080';

/** A row of the offset table. */
export interface MarkOffsetRow {
  readonly label: string;
  readonly kind: string;
  /** side of the gnomon seen face-on, pole-ward end up */
  readonly side: 'left' | 'right';
  /** from the style edge (the gnomon's side face) to the middle of the line, mm */
  readonly fromStyleEdgeMm: number;
  /** from the gnomon's centre plane, mm (the report's |xMm|) */
  readonly fromCentreMm: number;
  /** where the line starts and ends, from the plate's lower edge, mm */
  readonly fromLowerEdgeMm: readonly [number, number];
}

/** Offsets of every mark from its style edge: |x| − t/2 (docs/design.md §2: x = ±(t/2 + h·|tan H|)). */
export function markOffsetRows(marks: readonly Mark[], thicknessMm: number, faceOriginY: number): MarkOffsetRow[] {
  return [...marks]
    .sort((a, b) => a.hourAngleDeg - b.hourAngleDeg || (a.style === 'west' ? -1 : 1))
    .map((m) => ({
      label: m.label,
      kind: m.kind,
      side: m.xMm < 0 || (m.xMm === 0 && m.style === 'west') ? 'left' : 'right',
      fromStyleEdgeMm: roundTo(Math.abs(m.xMm) - thicknessMm / 2, 2),
      fromCentreMm: roundTo(Math.abs(m.xMm), 2),
      fromLowerEdgeMm: [roundTo(m.y0Mm + faceOriginY, 1), roundTo(m.y1Mm + faceOriginY, 1)],
    }));
}

/**
 * template.pdf: the plate face at true 1:1 scale for printing on A4 or
 * Letter, to glue on the stock, scribe, centre-punch and check with a ruler.
 *
 * - Drawing sheets: the outline, every mark at its true width, numerals and
 *   title as their single strokes, drill marks (circle and cross) with the
 *   diameter, slot outlines, the dashed reference lines (substyle, gnomon
 *   footprint, 45° check). A plate larger than the window is tiled over
 *   columns × rows of sheets overlapping by `overlapMm`; alignment crosses in
 *   the overlaps appear on both neighbours at the same place on the plate.
 * - Every sheet: the line PRINT_AT_FULL_SIZE and a 100 mm calibration bar.
 * - Table sheets: every mark's offset from the style edge, the holes and slots.
 * - The 45° check triangle, legs = gnomon height, at 1:1.
 * Units: mm, drawn in a user space scaled by 72/25.4 pt per mm (ISO 32000-1
 * §8.3.2.3); fonts are the standard Helvetica (no embedding). No timestamps.
 *
 * @example await toTemplatePdf({ drawing, marks, gnomonHeightMm: 50, gnomonThicknessMm: 3, title: 'Demo' })
 */
export async function toTemplatePdf(input: TemplateInput, options: Partial<TemplateOptions> = {}): Promise<Uint8Array> {
  const o = { ...TEMPLATE_DEFAULTS, ...options };
  const d = input.drawing;
  const tiles = templateTiles(d, o);
  const rows = markOffsetRows(input.marks, input.gnomonThicknessMm, d.faceOriginY);
  const rowsPerSheet = tableRowsPerSheet(tiles);
  const tablePages = Math.max(1, Math.ceil(rows.length / rowsPerSheet));
  const sheets: Sheet[] = [...tileSheets(d, tiles, 'plate')];
  for (let p = 0; p < tablePages; p++) {
    sheets.push({
      heading: `offsets of the lines from the style edge${tablePages > 1 ? ` (${p + 1}/${tablePages})` : ''}`,
      draw: (doc) => offsetTable(doc, tiles, rows.slice(p * rowsPerSheet, (p + 1) * rowsPerSheet), input, p === tablePages - 1),
    });
  }
  sheets.push({ heading: '45° check triangle at 1:1', draw: (doc) => checkTriangle(doc, tiles, input.gnomonHeightMm, input.gnomonThicknessMm) });
  const parts = input.parts ?? [];
  const partTiles = partsTiling(parts, tiles, o);
  parts.forEach((tp, i) => sheets.push(...tileSheets(partShape(tp.part), partTiles[i], tp.label)));
  return renderSheets(input.title, tiles, o.marginMm, sheets);
}

/** One drawing of a template and the sheets it takes (1-based, in page order). */
export interface TemplateDrawingSheets {
  readonly label: string;
  readonly firstSheet: number;
  readonly lastSheet: number;
}

/**
 * The page plan of `toTemplatePdf`: how many sheets in all, and which
 * sheets show the plate and each further part (the offset tables and the
 * check triangle lie between them). Exported for the report and install.md.
 */
export function templateDrawings(
  input: Pick<TemplateInput, 'drawing' | 'marks' | 'gnomonThicknessMm' | 'parts'>,
  options: Partial<TemplateOptions> = {},
): { readonly pages: number; readonly drawings: readonly TemplateDrawingSheets[]; readonly tableSheets: readonly [number, number]; readonly checkSheet: number } {
  const o = { ...TEMPLATE_DEFAULTS, ...options };
  const tiles = templateTiles(input.drawing, o);
  const plateSheets = tiles.columns * tiles.rows;
  const tablePages = Math.max(1, Math.ceil(markOffsetRows(input.marks, input.gnomonThicknessMm, input.drawing.faceOriginY).length / tableRowsPerSheet(tiles)));
  const drawings: TemplateDrawingSheets[] = [{ label: 'plate', firstSheet: 1, lastSheet: plateSheets }];
  let next = plateSheets + tablePages + 2;
  const parts = input.parts ?? [];
  partsTiling(parts, tiles, o).forEach((t, i) => {
    drawings.push({ label: parts[i].label, firstSheet: next, lastSheet: next + t.columns * t.rows - 1 });
    next += t.columns * t.rows;
  });
  return { pages: next - 1, drawings, tableSheets: [plateSheets + 1, plateSheets + tablePages], checkSheet: plateSheets + tablePages + 1 };
}

/** Each further part's sheet tiling: its own extent plus the border, on the plate's paper and orientation. */
function partsTiling(parts: readonly TemplatePart[], plate: TileLayout, o: TemplateOptions): TileLayout[] {
  return parts.map((tp) => {
    const s = partShape(tp.part);
    return tileLayout(s.widthMm + 2 * BORDER_MM, s.lengthMm + 2 * BORDER_MM, o.paper, plate.orientation, o.overlapMm, o.marginMm);
  });
}

/** A further flat part on the template (a gnomon fin, a wall mount), drawn at 1:1 on its own sheets. */
export interface TemplatePart {
  /** what the sheet's heading calls it, e.g. 'gnomon fin' */
  readonly label: string;
  /** the part at nominal size in its own frame (SheetPart) */
  readonly part: SheetPart;
}

/** What the template of a face with further flat parts shows: the plate, a table of the line ends, then each part. */
export interface PartsTemplateInput {
  readonly drawing: PlateDrawing;
  /** dial name, printed in the heading */
  readonly title: string;
  /** lines printed above the table of line ends (the face, the style root, the gnomon) */
  readonly intro: readonly string[];
  readonly parts: readonly TemplatePart[];
  /** the plate drawing's heading (default 'plate') */
  readonly plateLabel?: string;
}

/**
 * template.pdf for a face whose lines are not parallel (horizontal, wall,
 * meridian, equatorial): the plate tiled at 1:1 as `toTemplatePdf` draws it
 * (outline, lines at true width, numerals, drill marks, slots, dashed
 * reference lines, alignment crosses in the overlaps), a table of every
 * straight line's two ends and the holes and slots from the plate's
 * lower-left corner, then every further part (`parts`: the gnomon fin's
 * profile, a wall mount) at 1:1, each tiled the same way on sheets of the
 * plate's paper and orientation, its holes as drill marks and its
 * reference lines dashed. Every sheet carries PRINT_AT_FULL_SIZE and the
 * 100 mm calibration bar. Byte-stable.
 *
 * @example await toPartsTemplatePdf({ drawing, title: 'Demo', intro: [], parts: [{ label: 'gnomon fin', part: fin }] })
 */
export async function toPartsTemplatePdf(input: PartsTemplateInput, options: Partial<TemplateOptions> = {}): Promise<Uint8Array> {
  const o = { ...TEMPLATE_DEFAULTS, ...options };
  const d = input.drawing;
  const layout = partsTemplateTiles(input, o);
  const tiles = layout.plate;
  const rows = lineEndRows(d);
  const rowsPerSheet = tableRowsPerSheet(tiles);
  const tablePages = Math.max(1, Math.ceil(rows.length / rowsPerSheet));
  const sheets: Sheet[] = [...tileSheets(d, tiles, input.plateLabel ?? 'plate')];
  for (let p = 0; p < tablePages; p++) {
    sheets.push({
      heading: `ends of the lines, from the plate's lower-left corner${d.lowerFace ? ' (lower face: of the turned plate)' : ''}${tablePages > 1 ? ` (${p + 1}/${tablePages})` : ''}`,
      draw: (doc) => lineEndTable(doc, tiles, rows.slice(p * rowsPerSheet, (p + 1) * rowsPerSheet), input, p === tablePages - 1),
    });
  }
  input.parts.forEach((tp, i) => sheets.push(...tileSheets(partShape(tp.part), layout.parts[i], tp.label)));
  return renderSheets(input.title, tiles, o.marginMm, sheets);
}

/** The sheet tilings of `toPartsTemplatePdf`: the plate's, and each part's on the same paper and orientation (exported for reports and tests). */
export function partsTemplateTiles(input: Pick<PartsTemplateInput, 'drawing' | 'parts'>, options: Partial<TemplateOptions> = {}): { readonly plate: TileLayout; readonly parts: readonly TileLayout[]; readonly pages: number } {
  const o = { ...TEMPLATE_DEFAULTS, ...options };
  const plate = templateTiles(input.drawing, o);
  const parts = partsTiling(input.parts, plate, o);
  const tablePages = Math.max(1, Math.ceil(lineEndRows(input.drawing).length / tableRowsPerSheet(plate)));
  const pages = plate.columns * plate.rows + tablePages + parts.reduce((n, t) => n + t.columns * t.rows, 0);
  return { plate, parts, pages };
}

/** One straight line of a plate drawing with its two ends, plate coordinates (mm from the lower-left corner). */
export interface LineEndRow {
  readonly label: string;
  readonly kind: string;
  readonly fromMm: Vec2;
  readonly toMm: Vec2;
}

/** Every straight line of a drawing (two points; curves left out) with its ends rounded to 0.1 mm. */
export function lineEndRows(drawing: PlateDrawing): LineEndRow[] {
  const r = ([x, y]: Vec2): Vec2 => [roundTo(x, 1), roundTo(y, 1)];
  const rows = (lines: PlateDrawing['lines'], prefix: string) =>
    lines.filter((l) => l.kind !== 'curve' && l.path.points.length === 2).map((l) => ({ label: `${prefix}${l.label}`, kind: l.kind, fromMm: r(l.path.points[0]), toMm: r(l.path.points[1]) }));
  // A plate engraved on both faces: the lower face's lines after the upper's, in the turned plate's frame.
  return [...rows(drawing.lines, ''), ...(drawing.lowerFace ? rows(drawing.lowerFace.lines, 'lower ') : [])];
}

/** The sheet tiling used for a drawing (exported for reports and tests). */
export function templateTiles(drawing: PlateDrawing, options: Partial<TemplateOptions> = {}): TileLayout {
  const o = { ...TEMPLATE_DEFAULTS, ...options };
  return tileLayout(drawing.widthMm + 2 * BORDER_MM, drawing.lengthMm + 2 * BORDER_MM, o.paper, o.orientation, o.overlapMm, o.marginMm);
}

type Doc = InstanceType<typeof PDFDocument>;

/** One sheet of a template: its heading and what is drawn on it (in mm, inside the sheet frame). */
interface Sheet {
  readonly heading: string;
  readonly draw: (doc: Doc) => void;
}

/** What one tiled drawing shows (the plate, or a further flat part) in its own frame: mm, origin at the lower-left corner of its extent. */
interface TiledShape {
  readonly widthMm: number;
  readonly lengthMm: number;
  readonly outline: RoundedRect | Path;
  readonly holes: readonly Circle[];
  readonly slots: readonly RoundedRect[];
  /** inner cut-outs drawn as outlines (a part's joints and windows) */
  readonly cutouts?: readonly Path[];
  readonly lines: PlateDrawing['lines'];
  readonly text: PlateDrawing['text'];
  readonly reference: PlateDrawing['reference'];
}

/** A flat part as a tiled shape: moved so its outline's lower-left corner is the origin. */
function partShape(part: SheetPart): TiledShape {
  const xs = part.outer.points.map((p) => p[0]);
  const ys = part.outer.points.map((p) => p[1]);
  const [x0, y0] = [Math.min(...xs), Math.min(...ys)];
  const move = (p: Path): Path => ({ ...p, points: p.points.map(([x, y]): Vec2 => [x - x0, y - y0]) });
  return {
    widthMm: Math.max(...xs) - x0,
    lengthMm: Math.max(...ys) - y0,
    outline: move(part.outer),
    holes: part.inner.filter((f): f is Circle => f.kind === 'circle').map((c) => ({ ...c, cx: c.cx - x0, cy: c.cy - y0 })),
    slots: [],
    cutouts: part.inner.filter((f): f is Path => f.kind === 'path').map(move),
    lines: (part.lines ?? []).map((l) => ({ ...l, path: move(l.path) })),
    text: (part.text ?? []).map((t) => ({ ...t, strokes: t.strokes.map(move) })),
    reference: (part.reference ?? []).map((r) => ({ ...r, path: move(r.path) })),
  };
}

/** The drawing sheets of one shape: one per tile, headed '<label> at 1:1' and, when tiled, its column and row. */
function tileSheets(shape: TiledShape, tiles: TileLayout, label: string): Sheet[] {
  const sheets: Sheet[] = [];
  const n = tiles.columns * tiles.rows;
  for (let r = 0; r < tiles.rows; r++) {
    for (let c = 0; c < tiles.columns; c++) {
      const heading = n > 1 ? `${label} at 1:1, column ${c + 1} of ${tiles.columns}, row ${r + 1} of ${tiles.rows} (glue the overlaps so the crosses coincide)` : `${label} at 1:1`;
      sheets.push({ heading, draw: (doc) => drawTile(doc, shape, tiles, c, r) });
    }
  }
  return sheets;
}

/** Rows of a table that fit one sheet's window. */
function tableRowsPerSheet(tiles: TileLayout): number {
  return Math.max(5, Math.floor((tiles.window.h - 30) / 4.6));
}

/** Lay out the sheets in one PDF (every sheet the size of `tiles`'s page), each with its frame and 'sheet n of N'. */
async function renderSheets(title: string, tiles: TileLayout, marginMm: number, sheets: readonly Sheet[]): Promise<Uint8Array> {
  const { default: PDFKit } = await import('pdfkit'); // the PDF writer loads only when a template is written
  const doc = new PDFKit({
    autoFirstPage: false,
    size: [tiles.pageWidthMm * PT_PER_MM, tiles.pageHeightMm * PT_PER_MM],
    margins: { top: 0, bottom: 0, left: 0, right: 0 },
    info: { Title: `${title} - 1:1 template`, Creator: 'umbrafab', Producer: 'umbrafab (pdfkit)', CreationDate: FIXED_DATE },
    compress: true,
  });
  const chunks: Uint8Array[] = [];
  doc.on('data', (c: Uint8Array) => chunks.push(c));
  const done = new Promise<void>((resolve, reject) => {
    doc.on('end', () => resolve());
    doc.on('error', reject);
  });
  sheets.forEach((sheet, i) => {
    doc.addPage();
    doc.save();
    doc.scale(PT_PER_MM);
    sheetFrame(doc, tiles, marginMm, `${title} - ${sheet.heading}`, `sheet ${i + 1} of ${sheets.length}`);
    sheet.draw(doc);
    doc.restore();
  });
  doc.end();
  await done;
  const total = chunks.reduce((s, c) => s + c.length, 0);
  const out = new Uint8Array(total);
  let off = 0;
  for (const c of chunks) (out.set(c, off), (off += c.length));
  return out;
}

/** Heading, the full-size instruction, the calibration bar and the sheet number. */
function sheetFrame(doc: Doc, t: TileLayout, margin: number, heading: string, pageText: string): void {
  doc.fillColor(INK).font('Helvetica-Bold').fontSize(3.6).text(heading, margin, margin, { lineBreak: false });
  doc.font('Helvetica').fontSize(3.2).text(PRINT_AT_FULL_SIZE, margin, margin + 6, { lineBreak: false });
  // Calibration bar: one rectangle of CALIBRATION_BAR_MM x 4 mm in its own colour, white 10 mm segments over it.
  const x = margin;
  const y = t.pageHeightMm - margin - FOOTER_MM + 5;
  doc.rect(x, y, CALIBRATION_BAR_MM, 4).fill(CALIBRATION_BAR_RGB);
  for (let i = 1; i < 10; i += 2) doc.rect(x + i * 10, y + 0.6, 10, 2.8).fill('#ffffff');
  doc.fillColor(INK).fontSize(2.6);
  for (const v of [0, 50, 100]) doc.text(`${v}`, x + v - (v === 0 ? 0 : v === 50 ? 1.5 : 3), y + 5.2, { lineBreak: false });
  doc.text('calibration bar: 100 mm', x + 20, y - 3.6, { lineBreak: false });
  doc.fontSize(3).text(pageText, t.pageWidthMm - margin - 25, y + 1, { lineBreak: false });
}

/** One tile of the plate drawing, clipped to the sheet's window. */
function drawTile(doc: Doc, d: TiledShape, t: TileLayout, c: number, r: number): void {
  const w = t.window;
  // Plate (x right, y up, mm) → sheet (mm, y down).
  const X = (x: number) => w.x + (x + BORDER_MM - t.colStartMm[c]);
  const Y = (y: number) => w.y + (d.lengthMm + BORDER_MM - y - t.rowStartMm[r]);
  const pathOf = (p: Path) => {
    p.points.forEach(([x, y], i) => (i === 0 ? doc.moveTo(X(x), Y(y)) : doc.lineTo(X(x), Y(y))));
    if (p.closed) doc.closePath();
  };
  doc.save();
  doc.rect(w.x, w.y, w.w, w.h).clip();
  // Outline.
  doc.lineWidth(0.3).strokeColor(INK);
  if (d.outline.kind === 'rect') roundRectPath(doc, d.outline, X, Y);
  else pathOf(d.outline);
  doc.stroke();
  // Reference lines, dashed.
  doc.lineWidth(0.15).strokeColor(GREY).dash(1.5, { space: 1 });
  for (const ref of d.reference) {
    pathOf(ref.path);
    doc.stroke();
  }
  doc.undash();
  // Marks at true width, filled.
  for (const l of d.lines) {
    const pts = l.path.points;
    if (pts.length === 2) {
      const [a, b] = pts;
      const len = Math.hypot(b[0] - a[0], b[1] - a[1]) || 1;
      const nx = (-(b[1] - a[1]) / len) * (l.widthMm / 2);
      const ny = ((b[0] - a[0]) / len) * (l.widthMm / 2);
      const q: Vec2[] = [[a[0] - nx, a[1] - ny], [b[0] - nx, b[1] - ny], [b[0] + nx, b[1] + ny], [a[0] + nx, a[1] + ny]];
      doc.polygon(...q.map(([x, y]) => [X(x), Y(y)])).fill(INK);
    } else {
      doc.lineWidth(l.widthMm).strokeColor(INK);
      pathOf(l.path);
      doc.stroke();
    }
  }
  // Numerals and title as single strokes.
  doc.lineCap('round').lineJoin('round').strokeColor(INK);
  for (const tx of d.text) {
    doc.lineWidth(tx.strokeWidthMm);
    for (const s of tx.strokes) {
      pathOf(s);
      doc.stroke();
    }
  }
  doc.lineCap('butt').lineJoin('miter');
  // Drill marks: circle, centre cross, diameter.
  doc.lineWidth(0.2).strokeColor(INK);
  for (const h of d.holes) {
    doc.circle(X(h.cx), Y(h.cy), h.radiusMm).stroke();
    const k = h.radiusMm * 1.6;
    doc.moveTo(X(h.cx) - k, Y(h.cy)).lineTo(X(h.cx) + k, Y(h.cy)).moveTo(X(h.cx), Y(h.cy) - k).lineTo(X(h.cx), Y(h.cy) + k).stroke();
    // The label beside the cross's arm on the side toward the part's middle, so it stays inside the outline.
    const label = `drill ${fmt(2 * h.radiusMm)}`;
    doc.fillColor(INK).fontSize(2.4);
    const lx = h.cx > d.widthMm / 2 ? X(h.cx) - k - 0.6 - doc.widthOfString(label) : X(h.cx) + k + 0.6;
    doc.text(label, lx, Y(h.cy) + 0.6, { lineBreak: false });
  }
  // Slots: outline and centre cross.
  for (const s of d.slots) {
    roundRectPath(doc, s, X, Y);
    doc.stroke();
    doc.moveTo(X(s.cx - s.widthMm), Y(s.cy)).lineTo(X(s.cx + s.widthMm), Y(s.cy)).stroke();
  }
  // A part's other cut-outs: their outlines.
  for (const p of d.cutouts ?? []) {
    pathOf(p);
    doc.stroke();
  }
  // Alignment crosses in every overlap (drawn in plate position, so both neighbours carry them).
  doc.lineWidth(0.15).strokeColor(INK);
  const contentW = d.widthMm + 2 * BORDER_MM;
  const contentH = d.lengthMm + 2 * BORDER_MM;
  const cross = (cx: number, cy: number) => {
    const sx = w.x + cx - t.colStartMm[c];
    const sy = w.y + cy - t.rowStartMm[r];
    doc.circle(sx, sy, 2.5).stroke();
    doc.moveTo(sx - 4, sy).lineTo(sx + 4, sy).moveTo(sx, sy - 4).lineTo(sx, sy + 4).stroke();
  };
  const along = (len: number) => {
    const n = Math.max(2, Math.ceil(len / 60) + 1);
    return Array.from({ length: n }, (_, i) => BORDER_MM / 2 + (i * (len - BORDER_MM)) / (n - 1));
  };
  for (let k = 1; k < t.columns; k++) {
    const xm = (t.colStartMm[k] + t.colStartMm[k - 1] + w.w) / 2;
    for (const y of along(contentH)) cross(xm, y);
  }
  for (let k = 1; k < t.rows; k++) {
    const ym = (t.rowStartMm[k] + t.rowStartMm[k - 1] + w.h) / 2;
    for (const x of along(contentW)) cross(x, ym);
  }
  doc.restore();
}

function offsetTable(doc: Doc, t: TileLayout, rows: readonly MarkOffsetRow[], input: TemplateInput, withHoles: boolean): void {
  const w = t.window;
  const d = input.drawing;
  let y = w.y;
  doc.fillColor(INK).font('Helvetica').fontSize(3);
  const intro = [
    `Distances to the middle of each line, mm. "From style edge" is measured from the side of the gnomon (its centre plane +/- ${fmt(input.gnomonThicknessMm / 2)} mm),`,
    `"from centre" from the gnomon's centre plane (the substyle), across the plate. Sides as seen face-on with the pole-ward end up.`,
    `Gnomon: height ${fmt(input.gnomonHeightMm)} mm, thickness ${fmt(input.gnomonThicknessMm)} mm. Lines run along the style between the two distances from the plate's lower edge.`,
  ];
  for (const l of intro) (doc.text(l, w.x, y, { lineBreak: false }), (y += 4.4));
  y += 2;
  const cols = [0, 22, 40, 56, 86, 112];
  const head = ['line', 'kind', 'side', 'from style edge', 'from centre', 'from lower edge'];
  doc.font('Helvetica-Bold');
  head.forEach((h, i) => doc.text(h, w.x + cols[i], y, { lineBreak: false }));
  doc.font('Helvetica');
  y += 4.6;
  for (const r of rows) {
    const cells = [r.label, r.kind, r.side, fmt(r.fromStyleEdgeMm, 2), fmt(r.fromCentreMm, 2), `${fmt(r.fromLowerEdgeMm[0], 1)} to ${fmt(r.fromLowerEdgeMm[1], 1)}`];
    cells.forEach((cell, i) => doc.text(cell, w.x + cols[i], y, { lineBreak: false }));
    doc.lineWidth(0.1).strokeColor('#c0c0c0').moveTo(w.x, y + 3.6).lineTo(w.x + 150, y + 3.6).stroke();
    y += 4.6;
  }
  if (withHoles) holesList(doc, w.x, y, d);
}

/** The heading 'Holes and slots' and one line for each, below `y`. */
function holesList(doc: Doc, x: number, y: number, d: PlateDrawing): void {
  y += 4;
  doc.font('Helvetica-Bold').text('Holes and slots (centres from the plate\'s lower-left corner), mm', x, y, { lineBreak: false });
  doc.font('Helvetica');
  y += 4.6;
  d.holes.forEach((h, i) => {
    doc.text(`hole ${i + 1}: drill ${fmt(2 * h.radiusMm)} at x ${fmt(h.cx, 2)}, y ${fmt(h.cy, 2)}`, x, y, { lineBreak: false });
    y += 4.4;
  });
  d.slots.forEach((s, i) => {
    doc.text(`slot ${i + 1}: ${fmt(s.widthMm, 2)} x ${fmt(s.heightMm, 2)} centred at x ${fmt(s.cx, 2)}, y ${fmt(s.cy, 2)}`, x, y, { lineBreak: false });
    y += 4.4;
  });
}

function lineEndTable(doc: Doc, t: TileLayout, rows: readonly LineEndRow[], input: PartsTemplateInput, withHoles: boolean): void {
  const w = t.window;
  let y = w.y;
  doc.fillColor(INK).font('Helvetica').fontSize(3);
  const intro = [
    ...input.intro,
    'Ends of every straight line, mm from the plate\'s lower-left corner: x to the right, y up the plate as drawn on the plate sheets.',
  ];
  for (const l of intro) (doc.text(l, w.x, y, { lineBreak: false }), (y += 4.4));
  y += 2;
  const cols = [0, 26, 46, 86];
  doc.font('Helvetica-Bold');
  ['line', 'kind', 'from (x, y)', 'to (x, y)'].forEach((h, i) => doc.text(h, w.x + cols[i], y, { lineBreak: false }));
  doc.font('Helvetica');
  y += 4.6;
  const xy = (p: Vec2) => `${fmt(p[0], 1)}, ${fmt(p[1], 1)}`;
  for (const r of rows) {
    [r.label, r.kind, xy(r.fromMm), xy(r.toMm)].forEach((cell, i) => doc.text(cell, w.x + cols[i], y, { lineBreak: false }));
    doc.lineWidth(0.1).strokeColor('#c0c0c0').moveTo(w.x, y + 3.6).lineTo(w.x + 130, y + 3.6).stroke();
    y += 4.6;
  }
  if (withHoles) holesList(doc, w.x, y, input.drawing);
}

/** A right triangle with two legs of the gnomon height: its hypotenuse makes 45° with both. */
function checkTriangle(doc: Doc, t: TileLayout, h: number, thickness: number): void {
  const w = t.window;
  doc.fillColor(INK).font('Helvetica').fontSize(3);
  const lines = [
    `Cut out this triangle (legs ${fmt(h)} mm = the gnomon height, angle 45°).`,
    'Stand it on the face with leg A upright against the side of the gnomon: the top corner must reach the style edge,',
    `and corner C on the face marks the dashed 45° check line, ${fmt(h)} mm from the style edge (${fmt(h + thickness / 2)} mm from the centre plane):`,
    'on a solar-time dial that is the 09:00 and 15:00 line (hour angle 45°, tan 45° = 1).',
  ];
  let y = w.y;
  for (const l of lines) (doc.text(l, w.x, y, { lineBreak: false }), (y += 4.4));
  y += 4;
  if (h + 10 > w.w || h + 10 > w.h - (y - w.y)) {
    doc.text(`The triangle (${fmt(h)} mm legs) is larger than this sheet: draw it from these measurements.`, w.x, y, { lineBreak: false });
    return;
  }
  const x0 = w.x + 5;
  const y0 = y + h;
  doc.lineWidth(0.3).strokeColor(INK).moveTo(x0, y0).lineTo(x0 + h, y0).lineTo(x0, y0 - h).closePath().stroke();
  doc.lineWidth(0.2).rect(x0, y0 - 5, 5, 5).stroke();
  doc.fontSize(3.2).text('A', x0 - 4, y0 - h / 2, { lineBreak: false });
  doc.text('B', x0 + h / 2, y0 + 1.2, { lineBreak: false });
  doc.text('C', x0 + h + 1, y0 - 3, { lineBreak: false });
  doc.text('45°', x0 + h - 12, y0 - 4, { lineBreak: false });
}

function roundRectPath(doc: Doc, r: RoundedRect, X: (x: number) => number, Y: (y: number) => number): void {
  const c = Math.min(r.cornerRadiusMm, r.widthMm / 2, r.heightMm / 2);
  const x0 = r.cx - r.widthMm / 2;
  const yTop = r.cy + r.heightMm / 2;
  if (c > 0) doc.roundedRect(X(x0), Y(yTop), r.widthMm, r.heightMm, c);
  else doc.rect(X(x0), Y(yTop), r.widthMm, r.heightMm);
}

function fmt(v: number, dec = 1): string {
  return roundTo(v, dec).toFixed(dec);
}
