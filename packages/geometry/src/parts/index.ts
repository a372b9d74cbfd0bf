export type { Mesh, Triangle, Vec3 } from './mesh.ts';
export { meshVolumeMm3 } from './meshVolumeMm3.ts';
export { meshBounds, type MeshBounds } from './meshBounds.ts';
export { validateMesh } from './validateMesh.ts';
export { gnomonLaidFlat } from './gnomonLaidFlat.ts';
export { triangulatePolygon } from './triangulatePolygon.ts';
export { gnomonSolid, GNOMON_DEFAULTS, type GnomonOptions, type GnomonPart, type GnomonTab, type GnomonNotch } from './gnomonSolid.ts';
export {
  wedgeSolid,
  WEDGE_DEFAULTS,
  WEDGE_MAX_TILT_DEG,
  WEDGE_MIN_SEAT_MM,
  WEDGE_MIN_WALL_MM,
  WEDGE_SLAB_BELOW_DEG,
  type WedgeOptions,
  type WedgePart,
  type WedgeHoles,
  type WedgeHole,
  type WedgeCountersink,
  type WedgeArrow,
} from './wedgeSolid.ts';
export { partsPlan, type PartsPlan } from './partsPlan.ts';
export { dialGnomon, dialWedge, gnomonOnPlate, faceToWedge, mapMesh } from './dialParts.ts';
export { bodySolid, type BodyPart } from './bodySolid.ts';
export { manifoldEngine } from './manifoldEngine.ts';
export { meshFromManifold, manifoldFromMesh } from './manifoldMesh.ts';
export { widenPolyline, circlePolygon, ROUND_SEGMENTS } from './widenPolyline.ts';
export {
  MATERIAL_DENSITIES,
  DENSITY_MATERIALS,
  FILAMENTS,
  materialDensity,
  isFilament,
  type MaterialDensity,
  type DensityMaterial,
  type Filament,
} from './materials.ts';
export { partMass, totalMass, type PartMass } from './partMass.ts';
export { filamentUse, FILAMENT_DIAMETER_MM, type FilamentUse } from './filamentUse.ts';
export { plateSolid, type PlatePart } from './plateSolid.ts';
export { groovedPlate, type GroovedPlate } from './groovedPlate.ts';
export { roundedRectPolygon } from '../outline/roundedRect.ts';
export { HEAT_SET_INSERTS, INSERT_POCKET_EXTRA_MM, insertForHole, type HeatSetInsert } from './heatSetInsert.ts';
export { seatPockets, type SeatPocket } from './seatPockets.ts';
export { wedgeShell, WEDGE_SHELL_DEFAULTS, type WedgeShellOptions, type WedgeShellPart, type SolidBand } from './wedgeShell.ts';
export {
  splitForBed,
  planBedCuts,
  fitsBed,
  DOVETAIL_KEY,
  KEY_PITCH_MM,
  type BedSize,
  type DovetailKey,
  type ForbiddenBands,
  type CutPlan,
  type CutPlanResult,
  type SplitPart,
  type SplitPiece,
} from './splitForBed.ts';
export { printedPlate, printedWedge, fitToBed, type PrintedWedge } from './printedParts.ts';
export { sheetPlateVolumeMm3 } from './sheetPlateVolume.ts';
export { manifoldScope, type Keep } from './manifoldScope.ts';
