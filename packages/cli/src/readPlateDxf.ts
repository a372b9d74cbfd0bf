import { readFileSync } from 'node:fs';
import DxfParser from 'dxf-parser';
import { SpecError, type PlateLine, type Vec2 } from '@umbrafab/geometry';

/** What a plate drawing holds for `umbrafab check --plate`. */
export interface PlateDxf {
  /** every LINE, LWPOLYLINE and POLYLINE, with its layer, plate coordinates (mm) */
  readonly lines: readonly PlateLine[];
  /** $INSUNITS of the header (4 = millimetres), or null when the file does not say */
  readonly insunits: number | null;
}

/**
 * Read a DXF drawing of the plate (as written by `umbrafab build`, or after
 * editing in a CAD program) with the npm `dxf-parser`: LINE, LWPOLYLINE and
 * POLYLINE entities with their layer (group code 8) and vertices (10/20);
 * closed polylines have flag 70 bit 1 (AutoCAD DXF Reference). The drawing
 * must be in millimetres: $INSUNITS 4, or absent (then millimetres are
 * assumed, as plate.dxf conventions say).
 *
 * @throws SpecError naming --plate when the file cannot be read or parsed, or is not in mm
 */
export function readPlateDxf(path: string): PlateDxf {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    throw new SpecError('--plate', path, 'allowed: the path of a readable DXF file (the plate.dxf of umbrafab build)', code === 'ENOENT' ? 'no such file' : String((e as Error).message));
  }
  return parsePlateDxf(text, path);
}

/** Parse DXF text (see readPlateDxf); `source` names the file in errors. */
export function parsePlateDxf(text: string, source = 'plate.dxf'): PlateDxf {
  let dxf: ReturnType<DxfParser['parseSync']>;
  try {
    dxf = new DxfParser().parseSync(text);
  } catch (e) {
    throw new SpecError('--plate', source, 'allowed: an ASCII DXF file', `not readable as DXF: ${String((e as Error).message).split('\n')[0]}`);
  }
  if (!dxf) throw new SpecError('--plate', source, 'allowed: an ASCII DXF file', 'not readable as DXF');
  const units = dxf.header?.$INSUNITS;
  const insunits = typeof units === 'number' ? units : null;
  if (insunits !== null && insunits !== 4) {
    throw new SpecError('--plate', source, 'allowed: a drawing in millimetres ($INSUNITS 4)', `the drawing declares $INSUNITS ${insunits}`);
  }
  const lines: PlateLine[] = [];
  for (const e of dxf.entities ?? []) {
    const ent = e as unknown as { type: string; layer?: string; vertices?: { x: number; y: number }[]; shape?: boolean };
    if (ent.type !== 'LINE' && ent.type !== 'LWPOLYLINE' && ent.type !== 'POLYLINE') continue;
    const points: Vec2[] = (ent.vertices ?? []).filter((v) => Number.isFinite(v.x) && Number.isFinite(v.y)).map((v) => [v.x, v.y]);
    if (points.length < 2) continue;
    lines.push({ layer: ent.layer ?? '0', points, closed: ent.shape === true });
  }
  return { lines, insunits };
}
