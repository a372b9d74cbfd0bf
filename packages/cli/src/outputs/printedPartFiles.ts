import { meshBounds, type Mesh, type PartsPlan, type SplitPart } from '@umbrafab/geometry';
import { stlHeader, toStl } from '@umbrafab/fabricate';
import type { OutputFile } from '../writeFilesAtomic.ts';
import { meshFigures } from './meshFigures.ts';
import type { BedSplitSection } from './partsSections.ts';

/** File name of piece i of n of a split part: plate.stl → plate-1-of-2.stl. */
function pieceName(file: string, i: number, n: number): string {
  return file.replace(/\.stl$/, `-${i}-of-${n}.stl`);
}

/** The print bed as the notes and refusals write it, e.g. '220 x 220 x 250 mm'. */
export const bedText = (plan: PartsPlan): string => `${plan.print.bed.widthMm} x ${plan.print.bed.depthMm} x ${plan.print.bed.heightMm} mm`;

/**
 * The STL files of a printed part: the whole part when it fits the bed,
 * else one file per piece (and a note saying so); with the report's
 * `split` section for a split part.
 * @example printedPartFiles('plate.stl', plate.mesh, null, 'umbrafab plate', plan).files[0].name // 'plate.stl'
 */
export function printedPartFiles(file: string, mesh: Mesh, split: SplitPart | null, header: string, plan: PartsPlan): { files: OutputFile[]; split: BedSplitSection | null; notes: string[] } {
  if (split === null) return { files: [{ name: file, bytes: toStl(mesh, { header: stlHeader([header]) }) }], split: null, notes: [] };
  const n = split.pieces.length;
  const names = split.pieces.map((p) => pieceName(file, p.index, n));
  const b = meshBounds(mesh);
  const note = `${file}: ${(b.max[0] - b.min[0]).toFixed(1)} x ${(b.max[1] - b.min[1]).toFixed(1)} x ${(b.max[2] - b.min[2]).toFixed(1)} mm does not fit the ${bedText(plan)} print bed: cut into ${n} pieces (${names.join(', ')}) joined by ${split.keys} dovetail keys; glue the keys`;
  const files = split.pieces.map((p, k) => ({ name: names[k], bytes: toStl(p.mesh, { header: stlHeader([`${header}, piece ${p.index} of ${n}`]) }) }));
  return {
    files,
    split: {
      bedMm: plan.print.bed,
      xCutsMm: split.plan.xCutsMm,
      yCutsMm: split.plan.yCutsMm,
      dovetailKeys: split.keys,
      keyClearancePerSideMm: split.clearanceMm,
      wholeVolumeMm3: split.wholeVolumeMm3,
      keyGapVolumeMm3: split.gapVolumeMm3,
      piecesVolumeMm3: split.pieces.reduce((s, p) => s + p.volumeMm3, 0),
      pieces: split.pieces.map((p, k) => ({ file: names[k], cell: p.cell, ...meshFigures(p.mesh) })),
    },
    notes: [note],
  };
}
