import Drawing from 'dxf-writer';
import Handle from 'dxf-writer/src/Handle.js';
import { drawingBounds, type CutDrawing } from '../cut/cutDrawing.ts';
import { roundTo } from '../process/roundTo.ts';
import { DXF_LAYERS } from './cutLayers.ts';

export interface DxfOptions {
  /** Decimal places written for coordinates (default 6, i.e. 1 nm). */
  readonly decimals?: number;
}

/**
 * A cutting drawing as ASCII DXF (AutoCAD 2007 / AC1021 text format, as
 * written by dxf-writer): millimetres ($INSUNITS = 4, $MEASUREMENT = 1
 * metric), $EXTMIN / $EXTMAX the drawing's extents, every entity at z = 0,
 * one layer per operation (DXF_LAYERS). Reference layers are off (negative
 * colour, LAYER group 62) and non-plotting (LAYER group 290 = 0). Closed
 * profiles are closed LWPOLYLINEs (group 70 = 1), holes CIRCLEs, notes TEXT.
 * Group codes per the AutoCAD DXF Reference (HEADER section; LAYER table;
 * LWPOLYLINE 10/20, 70; CIRCLE 10/20/40; TEXT 10/20/40/1).
 *
 * The one serialiser of plate.dxf, gnomon.dxf and sheet.dxf.
 * @example toDxf(cutDrawing(part, { profiles: nominalProfiles(part), strokes: 'centre-lines', notes: [] }))
 */
export function toDxf(drawing: CutDrawing, options: DxfOptions = {}): string {
  const decimals = options.decimals ?? 6;
  const r = (v: number) => roundTo(v, decimals);
  // dxf-writer numbers its objects from a module-wide counter; restart it (here, and
  // only here) so the same drawing always gets the same handles: byte-identical files.
  Handle.seed = 0;
  const d = new Drawing();
  d.setUnits('Millimeters');
  d.header('MEASUREMENT', [[70, 1]]);
  const [x0, y0, x1, y1] = drawingBounds(drawing.entities);
  d.header('EXTMIN', [[10, r(x0)], [20, r(y0)], [30, 0]]);
  d.header('EXTMAX', [[10, r(x1)], [20, r(y1)], [30, 0]]);
  for (const key of drawing.layers) {
    const layer = DXF_LAYERS[key];
    d.addLayer(layer.name, layer.plots ? layer.color : -layer.color, 'CONTINUOUS');
    if (!layer.plots) nonPlotting(d, layer.name);
  }
  for (const e of drawing.entities) {
    d.setActiveLayer(DXF_LAYERS[e.layer].name);
    switch (e.kind) {
      case 'polyline':
        d.drawPolyline(e.points.map(([x, y]) => [r(x), r(y)]) as [number, number][], e.closed);
        break;
      case 'circle':
        d.drawCircle(r(e.cx), r(e.cy), r(e.r));
        break;
      case 'note':
        d.drawText(r(e.x), r(e.y), e.heightMm, 0, asciiText(e.text));
        break;
      default: {
        const never: never = e;
        throw new Error(`unknown DXF entity ${JSON.stringify(never)}`);
      }
    }
  }
  return d.toDxfString();
}

/** Text for a DXF group value: printable ASCII only, one line (DXF strings end at the line break). */
export function asciiText(s: string): string {
  return s.replace(/[^\x20-\x7e]/g, '?').slice(0, 250);
}

/**
 * Mark a layer of a dxf-writer drawing non-plotting: its LAYER record gets
 * group 290 = 0 (plotting flag, AutoCAD DXF Reference, LAYER), written
 * before the plot-style handle (390) as the reference orders them.
 */
function nonPlotting(d: Drawing, name: string): void {
  const layer = (d as unknown as { layers: Record<string, { tags(m: TagSink): void }> }).layers[name];
  const own = layer.tags.bind(layer);
  layer.tags = (m: TagSink) =>
    own({
      ...m,
      push: (code: number, value: unknown) => {
        if (code === 390) m.push(290, 0);
        m.push(code, value);
      },
      point: m.point?.bind(m),
    } as TagSink);
}

interface TagSink {
  push(code: number, value: unknown): void;
  point?(x: number, y: number, z?: number): void;
}
