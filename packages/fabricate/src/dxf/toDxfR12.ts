import { drawingBounds, type CutDrawing } from '../cut/cutDrawing.ts';
import { roundTo } from '../process/roundTo.ts';
import { asciiText } from './toDxf.ts';
import { DXF_LAYERS } from './cutLayers.ts';

/**
 * A cutting drawing as DXF Release 12 (AC1009) for older controllers, using
 * only LINE, ARC and POLYLINE entities (AutoCAD R12 DXF Reference: LINE
 * 10/20/11/21; POLYLINE 66 = 1, 70 = 1 closed, VERTEX 10/20 and 42 bulge,
 * SEQEND): every closed or open path is a POLYLINE, a hole is a closed
 * POLYLINE of two half-circle vertices (bulge 1), a two-point path a LINE.
 * Header: $ACADVER AC1009, $INSUNITS 4 (mm), $MEASUREMENT 1, $EXTMIN and
 * $EXTMAX. R12 layers have no plot flag: reference layers are switched off
 * (negative colour, group 62). Notes go at the head of the file as 999
 * comments, not as entities.
 * @example toDxfR12(cutDrawing(part, { profiles: nominalProfiles(part), strokes: 'centre-lines', notes: [] }))
 */
export function toDxfR12(drawing: CutDrawing, options: { readonly decimals?: number } = {}): string {
  const dec = options.decimals ?? 6;
  const n = (v: number) => String(roundTo(v, dec));
  const out: string[] = [];
  const tag = (code: number, value: string | number) => out.push(String(code), typeof value === 'number' ? n(value) : value);
  for (const note of drawing.notes) tag(999, asciiText(note));
  const [x0, y0, x1, y1] = drawingBounds(drawing.entities.filter((e) => e.kind !== 'note'));
  tag(0, 'SECTION');
  tag(2, 'HEADER');
  tag(9, '$ACADVER');
  tag(1, 'AC1009');
  tag(9, '$INSUNITS');
  tag(70, '4');
  tag(9, '$MEASUREMENT');
  tag(70, '1');
  tag(9, '$EXTMIN');
  tag(10, x0);
  tag(20, y0);
  tag(30, 0);
  tag(9, '$EXTMAX');
  tag(10, x1);
  tag(20, y1);
  tag(30, 0);
  tag(0, 'ENDSEC');
  tag(0, 'SECTION');
  tag(2, 'TABLES');
  tag(0, 'TABLE');
  tag(2, 'LTYPE');
  tag(70, '1');
  tag(0, 'LTYPE');
  tag(2, 'CONTINUOUS');
  tag(70, '0');
  tag(3, 'Solid line');
  tag(72, '65');
  tag(73, '0');
  tag(40, 0);
  tag(0, 'ENDTAB');
  tag(0, 'TABLE');
  tag(2, 'LAYER');
  tag(70, String(drawing.layers.length + 1));
  const layer = (name: string, color: number) => {
    tag(0, 'LAYER');
    tag(2, name);
    tag(70, '0');
    tag(62, String(color));
    tag(6, 'CONTINUOUS');
  };
  layer('0', 7);
  for (const key of drawing.layers) {
    const l = DXF_LAYERS[key];
    layer(l.name, l.plots ? l.color : -l.color);
  }
  tag(0, 'ENDTAB');
  tag(0, 'ENDSEC');
  tag(0, 'SECTION');
  tag(2, 'ENTITIES');
  const polyline = (layerName: string, vertices: readonly (readonly [number, number, number])[], closed: boolean) => {
    tag(0, 'POLYLINE');
    tag(8, layerName);
    tag(66, '1');
    tag(10, 0);
    tag(20, 0);
    tag(30, 0);
    tag(70, closed ? '1' : '0');
    for (const [x, y, b] of vertices) {
      tag(0, 'VERTEX');
      tag(8, layerName);
      tag(10, x);
      tag(20, y);
      tag(30, 0);
      if (b !== 0) tag(42, b);
    }
    tag(0, 'SEQEND');
    tag(8, layerName);
  };
  for (const e of drawing.entities) {
    const name = DXF_LAYERS[e.layer].name;
    switch (e.kind) {
      case 'polyline':
        if (e.points.length === 2 && !e.closed) {
          tag(0, 'LINE');
          tag(8, name);
          tag(10, e.points[0][0]);
          tag(20, e.points[0][1]);
          tag(30, 0);
          tag(11, e.points[1][0]);
          tag(21, e.points[1][1]);
          tag(31, 0);
        } else {
          polyline(name, e.points.map(([x, y]) => [x, y, 0] as const), e.closed);
        }
        break;
      case 'circle':
        // Two half circles: bulge = tan(180°/4) = 1 (R12 DXF Reference, VERTEX group 42).
        polyline(name, [[e.cx - e.r, e.cy, 1], [e.cx + e.r, e.cy, 1]], true);
        break;
      case 'note':
        break;
      default: {
        const never: never = e;
        throw new Error(`unknown DXF entity ${JSON.stringify(never)}`);
      }
    }
  }
  tag(0, 'ENDSEC');
  tag(0, 'EOF');
  return out.join('\n') + '\n';
}
