import { partsPlan } from '../parts/partsPlan.ts';
import type { SheetPartSource } from '../sheet/sheetParts.ts';
import { flatStand } from './flatStand.ts';

/**
 * The flat-pack stand's parts for the job's list of sheet parts, when the
 * build cuts the stand (stand.dxf in parts.write, the default for laser,
 * waterjet and router), relieved for the same tool as the plate.
 */
export const standParts: SheetPartSource = ({ layout, reliefToolRadiusMm, chordToleranceMm }) =>
  partsPlan(layout).files.includes('stand.dxf') ? flatStand(layout, { reliefToolRadiusMm, chordToleranceMm }).parts : [];
