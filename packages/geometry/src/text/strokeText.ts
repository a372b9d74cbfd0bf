import futural from './hershey/futural.json' with { type: 'json' };
import type { Path, Vec2 } from '../types.ts';

/**
 * Single-stroke text from the Hershey "futural" (Roman simplex) font, as
 * vendored from the `hersheytext` package in `hershey/futural.json` (its
 * provenance and licences in `hershey/README.md`; the Hershey fonts were
 * created by Dr. A. V. Hershey at the U.S. National Bureau of Standards). Glyph data:
 * an SVG-like "M x,y L x,y …" path on a grid whose cap height runs from y=1
 * (top) to y=22 (baseline), y downward; `o` is half the advance width.
 * Characters are indexed from "!" (code 33), as the package's own reader does.
 */
interface Glyph {
  readonly d: string;
  readonly o: number;
}

const FONT: readonly Glyph[] = futural.chars;
const CAP_TOP = 1;
const BASELINE = 22;
const CAP_UNITS = BASELINE - CAP_TOP;
const SPACE_UNITS = 12;

export interface StrokeTextOptions {
  /** Cap height, mm. */
  readonly heightMm: number;
  /** Anchor point, mm: the baseline's start ('left'), middle ('center') or end ('right'). */
  readonly at: Vec2;
  readonly align?: 'left' | 'center' | 'right';
}

function glyphOf(ch: string): Glyph | undefined {
  return FONT[ch.charCodeAt(0) - 33];
}

/** Advance width of `text` at cap height `heightMm`, mm. */
export function strokeTextWidthMm(text: string, heightMm: number): number {
  let units = 0;
  for (const ch of text) units += ch === ' ' ? SPACE_UNITS : 2 * (glyphOf(ch)?.o ?? SPACE_UNITS / 2);
  return (units * heightMm) / CAP_UNITS;
}

/**
 * Lay out `text` as open polylines (one per pen-down stroke), y up.
 * Characters missing from the font are drawn as a space.
 * @example strokeText('XII', { heightMm: 8, at: [0, 0], align: 'center' })
 */
export function strokeText(text: string, opts: StrokeTextOptions): Path[] {
  const s = opts.heightMm / CAP_UNITS;
  const width = strokeTextWidthMm(text, opts.heightMm);
  const align = opts.align ?? 'left';
  let penX = opts.at[0] - (align === 'center' ? width / 2 : align === 'right' ? width : 0);
  const baseY = opts.at[1];
  const out: Path[] = [];
  for (const ch of text) {
    const g = ch === ' ' ? undefined : glyphOf(ch);
    if (!g) {
      penX += SPACE_UNITS * s;
      continue;
    }
    for (const stroke of parseGlyph(g.d)) {
      const points = stroke.map(([gx, gy]): Vec2 => [penX + gx * s, baseY + (BASELINE - gy) * s]);
      if (points.length >= 2) out.push({ kind: 'path', points, closed: false });
    }
    penX += 2 * g.o * s;
  }
  return out;
}

/** "M4,1 L4,22 M9,1 L1,22" → [[ [4,1],[4,22] ], [ [9,1],[1,22] ]]. */
function parseGlyph(d: string): Vec2[][] {
  const strokes: Vec2[][] = [];
  for (const part of d.split('M').map((p) => p.trim()).filter(Boolean)) {
    const nums = part.replace('L', ' ').trim().split(/[\s,]+/).map(Number);
    const pts: Vec2[] = [];
    for (let i = 0; i + 1 < nums.length; i += 2) pts.push([nums[i], nums[i + 1]]);
    strokes.push(pts);
  }
  return strokes;
}
