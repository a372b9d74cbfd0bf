/**
 * Move every vertex on the centre-line layers (LINE_SCORE, MARK_CENTRE_NO_CUT) of
 * a DXF's text that lies at one of the plate points (within 1e-5 mm) by (dx, dy):
 * a drawing edited by hand, for the check --plate tests. Returns the edited text
 * and how many vertices moved.
 */
export function moveDxfVertices(dxf: string, points: readonly (readonly [number, number])[], [dx, dy]: readonly [number, number]): { text: string; moved: number } {
  const lines = dxf.split('\n');
  let layer = '';
  let moved = 0;
  for (let i = 0; i + 3 < lines.length; i += 2) {
    const code = lines[i].trim();
    if (code === '0') layer = '';
    if (code === '8') layer = lines[i + 1].trim();
    if ((code === '10' || code === '11') && (layer === 'LINE_SCORE' || layer === 'MARK_CENTRE_NO_CUT')) {
      const x = Number(lines[i + 1]);
      const y = Number(lines[i + 3]);
      if (points.some(([px, py]) => Math.abs(px - x) < 1e-5 && Math.abs(py - y) < 1e-5)) {
        lines[i + 1] = String(x + dx);
        lines[i + 3] = String(y + dy);
        moved++;
      }
    }
  }
  return { text: lines.join('\n'), moved };
}
