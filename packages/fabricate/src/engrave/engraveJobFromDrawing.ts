import type { PlateDrawing } from '@umbrafab/geometry';
import { clipToPlate } from './clipToPlate.ts';
import type { EngraveJob, EngraveOperation, EngravePath } from './engraveInput.ts';

/** The stock facts a drawing does not hold. */
export interface EngraveStockInput {
  /** Sheet thickness, mm (spec plate.thickness). */
  readonly thicknessMm: number;
  /** Sheet material (spec plate.material). */
  readonly material: string;
}

/**
 * The engraving job of a plate drawing: everything the face carries, in plate
 * coordinates (origin at the plate's lower-left corner, as plate.dxf):
 * - every drawn line, each with its own width: the hour, half and quarter
 *   marks (operation 'marks', label e.g. 'hour 09:00 west') and any curve the
 *   drawing holds, such as date lines or mean-time curves (operation
 *   'curves', labelled as in the drawing, e.g. 'date line June solstice');
 * - every stroke of the numerals and of the title text (operation 'text',
 *   label 'numeral 10' / 'title Windlecombe Quay'), at the text's stroke width.
 *
 * Cut profiles (outline, holes, slots) and reference lines are not engraved,
 * and any part of a path over a mounting hole or a gnomon slot is left out
 * (clipToPlate), so no tool moves over a through-cut; such a path becomes its
 * pieces, labelled 'piece k/n'. The drawing is not modified.
 *
 * @param drawing plateDrawing(layout)
 * @param stock the sheet thickness and material
 * @param title header lines for the programs (e.g. specSummaryLines(spec))
 * @example engraveJobFromDrawing(drawing, { thicknessMm: 3, material: 'aluminium' }, ['demo']).paths.length
 */
export function engraveJobFromDrawing(drawing: PlateDrawing, stock: EngraveStockInput, title: readonly string[]): EngraveJob {
  const clip = (path: Omit<EngravePath, 'points' | 'closed'>, points: EngravePath['points'], closed: boolean): EngravePath[] => {
    const r = clipToPlate(points, closed, drawing.holes, drawing.slots);
    if (!r.touched) return [{ ...path, points, closed }];
    const n = r.pieces.length;
    return r.pieces.map((piece, k) => ({ ...path, points: piece, closed: false, label: n > 1 ? `${path.label} piece ${k + 1}/${n}` : path.label }));
  };
  const lines = drawing.lines.flatMap((line): EngravePath[] => {
    const operation: EngraveOperation = line.kind === 'curve' ? 'curves' : 'marks';
    const label = line.kind === 'curve' ? line.label : `${line.kind} ${line.label}`;
    return clip({ widthMm: line.widthMm, operation, label }, line.path.points, line.path.closed);
  });
  const text = drawing.text.flatMap((block) =>
    block.strokes.flatMap((stroke, i): EngravePath[] =>
      clip(
        {
          widthMm: block.strokeWidthMm,
          operation: 'text',
          label: `${block.role} ${block.text}${block.strokes.length > 1 ? ` stroke ${i + 1}/${block.strokes.length}` : ''}`,
        },
        stroke.points,
        stroke.closed,
      ),
    ),
  );
  return {
    paths: [...lines, ...text],
    stock: { widthMm: drawing.widthMm, lengthMm: drawing.lengthMm, thicknessMm: stock.thicknessMm, material: stock.material },
    title,
  };
}
