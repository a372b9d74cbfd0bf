/**
 * Page geometry of the 1:1 paper template: paper sizes, the printable
 * window and how a plate is tiled over sheets. Plain numbers, mm.
 */

/** Paper sizes, mm: ISO 216 A4 210 × 297; ANSI/ASME Y14.1 Letter 8.5 × 11 in = 215.9 × 279.4. */
export const PAPER_MM = { A4: [210, 297], Letter: [215.9, 279.4] } as const;
export type PaperName = keyof typeof PAPER_MM;

/** Points per millimetre: 72 pt per inch (ISO 32000-1 §8.3.2.3, default user space unit 1/72 in), 25.4 mm per inch. */
export const PT_PER_MM = 72 / 25.4;

/** Band kept at the top of every sheet for the heading lines, mm. */
export const HEADER_MM = 16;
/** Band kept at the bottom for the calibration bar and the page number, mm. */
export const FOOTER_MM = 18;
/** Free border drawn around the plate on the template (room for the alignment marks), mm. */
export const BORDER_MM = 10;

export interface TileLayout {
  readonly paper: PaperName;
  readonly orientation: 'portrait' | 'landscape';
  /** sheet size, mm */
  readonly pageWidthMm: number;
  readonly pageHeightMm: number;
  /** drawing window on each sheet: left, top (from the sheet's top edge), width and height, mm */
  readonly window: { readonly x: number; readonly y: number; readonly w: number; readonly h: number };
  readonly columns: number;
  readonly rows: number;
  /** content offsets of each column's and row's window (content x right, y down from the top), mm */
  readonly colStartMm: readonly number[];
  readonly rowStartMm: readonly number[];
  readonly overlapMm: number;
}

/**
 * Tile a content area (the plate plus BORDER_MM all round, `contentW × contentH` mm)
 * over sheets: one sheet when it fits, else columns and rows whose windows
 * overlap by `overlapMm`. `orientation: 'auto'` picks the one needing fewer
 * sheets (portrait on a tie).
 */
export function tileLayout(contentW: number, contentH: number, paper: PaperName, orientation: 'auto' | 'portrait' | 'landscape', overlapMm: number, marginMm: number): TileLayout {
  const make = (o: 'portrait' | 'landscape'): TileLayout => {
    const [a, b] = PAPER_MM[paper];
    const pw = o === 'portrait' ? a : b;
    const ph = o === 'portrait' ? b : a;
    const window = { x: marginMm, y: marginMm + HEADER_MM, w: pw - 2 * marginMm, h: ph - 2 * marginMm - HEADER_MM - FOOTER_MM };
    // a bug, not bad input: the schema caps template.margin at 30 mm, which leaves room on both papers
    if (!(window.w > overlapMm + 10 && window.h > overlapMm + 10)) {
      throw new Error(`template.margin = ${marginMm} mm is not allowed: it leaves no room to draw on ${paper} ${o} sheets`);
    }
    const starts = (content: number, win: number): number[] => {
      if (content <= win) return [(content - win) / 2];
      const n = Math.ceil((content - overlapMm) / (win - overlapMm));
      // Spread the spare length evenly so the outer sheets keep the same border.
      const total = n * win - (n - 1) * overlapMm;
      const lead = (total - content) / 2;
      return Array.from({ length: n }, (_, i) => i * (win - overlapMm) - lead);
    };
    const colStartMm = starts(contentW, window.w);
    const rowStartMm = starts(contentH, window.h);
    return { paper, orientation: o, pageWidthMm: pw, pageHeightMm: ph, window, columns: colStartMm.length, rows: rowStartMm.length, colStartMm, rowStartMm, overlapMm };
  };
  if (orientation !== 'auto') return make(orientation);
  const p = make('portrait');
  const l = make('landscape');
  return l.columns * l.rows < p.columns * p.rows ? l : p;
}
