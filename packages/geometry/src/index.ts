// @umbrafab/geometry's public names: what the other packages, the tests and
// the scripts import from '@umbrafab/geometry'. Each name comes from the file
// that defines it; a name nothing outside this package uses stays unexported.
// A new function another package needs gets its name here.

export type { Vec2, Path, RoundedRect, Circle, Hemisphere, Mark, MarkKind } from './types.ts';
export { isSpecError, formatValue, SpecError } from './errors.ts';
export { DEG, assertFinite, assertInteger, assertNonNegative, assertPositive, assertRange } from './guards.ts';
export { chordSag } from './calendar/refineByChord.ts';

export { METHODS, type ProcessMethod, specSchema, type DialSpec } from './spec/schema.ts';
export { parseSpec } from './spec/parseSpec.ts';
export { parseClock } from './spec/parseClock.ts';
export { DERIVED_DEFAULTS } from './spec/derivedDefaults.ts';
export { didYouMean } from './spec/didYouMean.ts';

export { markOffsetEastMm, eastToFaceX } from './polar/markOffset.ts';
export { layoutDial, type TimeLayout, type DialLayout, type LayoutOptions } from './polar/layoutDial.ts';
export { countMarks, markCountText } from './polar/markCount.ts';

export { plateDrawing, type DrawnLine, type DrawnText, type LowerFaceDrawing, type PlateDrawing } from './plate/plateDrawing.ts';

export { manifoldEngine } from './parts/manifoldEngine.ts';
export { shoelaceArea } from './parts/ring2d.ts';

export type { SheetPart } from './sheet/sheetPart.ts';
export { reliefToolRadius, plateSheetPart, finSheetPart, sheetParts, slotReliefs } from './sheet/sheetParts.ts';
export { nestSheet } from './sheet/nestSheet.ts';
export { arcSegments } from './sheet/arcPoints.ts';

export { drawingStrokes, strokeOutlines, strokePolygons, strokeUnion, type Stroke, type StrokeOutlines } from './outline/strokeOutlines.ts';

export { CUT_LAYER_NAMES, type CutLayerKey } from './plate/cutLayerNames.ts';

export type { StrokeDrawing } from './spec/sections/cutFilesSection.ts';

export { markField, nodusFootY } from './polar/markField.ts';
export { calendarLines } from './polar/calendarLines.ts';
export { meanTimeLines } from './polar/meanTimeLines.ts';
export { timeFaceExtras } from './polar/timeFaceExtras.ts';

export { installSheet, type InstallSheet } from './install/installSheet.ts';

export { parseLocalDate } from './sun/localDate.ts';
export { equationOfTimeMin } from './sun/equationOfTimeMin.ts';
export { equationOfTimeTable } from './sun/equationOfTimeTable.ts';
export { offsetHoursAt } from './sun/zoneOffsets.ts';
export { sunTrack, sunOnDay, instantAtHourAngle, type SunTrack } from './sun/sunTrack.ts';
export { sunAtHourAngle, sunAtClock } from './sun/sunAtTime.ts';

export type { FacePolyline } from './calendar/types.ts';

export type { Mesh, Vec3 } from './parts/mesh.ts';
export { meshVolumeMm3 } from './parts/meshVolumeMm3.ts';
export { meshBounds } from './parts/meshBounds.ts';
export { validateMesh } from './parts/validateMesh.ts';
export { gnomonLaidFlat } from './parts/gnomonLaidFlat.ts';
export { gnomonSolid, type GnomonPart } from './parts/gnomonSolid.ts';
export { wedgeSolid, WEDGE_MAX_TILT_DEG, type WedgePart } from './parts/wedgeSolid.ts';
export { partsPlan, type PartsPlan } from './parts/partsPlan.ts';
export { dialGnomon, dialWedge, gnomonOnPlate, faceToWedge, mapMesh } from './parts/dialParts.ts';
export { bodySolid } from './parts/bodySolid.ts';
export { MATERIAL_DENSITIES, materialDensity, isFilament, type MaterialDensity } from './parts/materials.ts';
export { partMass, totalMass, type PartMass } from './parts/partMass.ts';
export { filamentUse, type FilamentUse } from './parts/filamentUse.ts';
export { fitsBed, type SplitPart } from './parts/splitForBed.ts';
export { printedPlate, printedWedge, fitToBed } from './parts/printedParts.ts';
export { printedBody } from './parts/printedBody.ts';
export { sheetPlateVolumeMm3 } from './parts/sheetPlateVolume.ts';

export { dialFrame, toDialFrame } from './shadow/dialFrame.ts';
export { gnomonForLayout } from './shadow/gnomonForLayout.ts';
export { styleEdges } from './shadow/styleEdges.ts';
export { shadowOnLine } from './shadow/castShadow.ts';
export { shadowOnFace } from './shadow/shadowOnFace.ts';
export { planarFaceVector, planarShadowOnFace } from './shadow/planarShadowOnFace.ts';
export { marksFromPlate, type PlateLine } from './shadow/marksFromPlate.ts';
export { checkDial, isFaceLit, type MarkCheck, type CheckResult } from './shadow/checkDial.ts';
export { checkPlanar, type PlanarCheckResult } from './shadow/checkPlanar.ts';
export { type CheckSummary, type MarkFailure, type MarkSummary } from './shadow/checkSummary.ts';
export { type CurveCheck, type DrawnCurve } from './shadow/curveCheck.ts';
export { drawnCurvesFromLayout } from './shadow/polarCurveCheck.ts';
export { curvesFromPlate, type PlateCurves } from './shadow/curvesFromPlate.ts';
export { planarMarksFromPlate } from './shadow/planarMarksFromPlate.ts';
export { lowerFacePlateLines } from './shadow/plateLine.ts';

export type { AssemblyPartName, FaceFrame, PictureItem, PlacedPart } from './assembly/assemblyTypes.ts';
export { placeAssembly, faceToWorld } from './assembly/placeAssembly.ts';
export { defaultPictureDate, sunForPicture, type PictureSun } from './assembly/sunForPicture.ts';
export { viewAssembly, type AssemblyPicture } from './assembly/viewAssembly.ts';
export { placePlanarAssembly, type PlanarAssembly, type PlanarMounting } from './assembly/placePlanarAssembly.ts';
export { viewPlanarAssembly, type PlanarAssemblyPicture } from './assembly/viewPlanarAssembly.ts';
export { planarPictureSun } from './assembly/planarPictureSun.ts';
export { projectToPicture, viewScene, type PlacedScene, type ScenePicture, type Backdrop } from './assembly/viewScene.ts';

export type { FlatStand, PartPlacement } from './stand/standTypes.ts';
export { METRIC_SIZES } from './stand/metricFasteners.ts';
export { mountingFixings } from './stand/mountingFixings.ts';
export { flatStand, type SizedStand } from './stand/flatStand.ts';
export { standSolid } from './stand/standSolid.ts';
export { fastenerTable, wedgeFastenerRows, type FastenerRow } from './stand/fastenerTable.ts';
export { pieceRows, type PlacedPiece } from './stand/pieceRows.ts';
export { sheetPartAreaMm2 } from './stand/sheetPartAreaMm2.ts';

export { faceOrientationOf, layoutPlanar, type LeftOutHour, type PlanarGnomonLayout, type PlanarLayout } from './planar/layoutPlanar.ts';
export type { FinEdge } from './planar/planarTypes.ts';
export type { FaceType } from './spec/sections/faceSection.ts';
export { planarPlateDrawing } from './planar/planarPlateDrawing.ts';
export { planarGnomonSolid, type PlanarGnomonPart } from './planar/planarGnomonSolid.ts';
export { LOWER_FACE_STAND_NOTE, planarInstallSheet, type PlanarInstallSheet } from './planar/planarInstallSheet.ts';
export { pillarFixing, PILLAR_LEVELLING_GAP_MM, type PillarFixing } from './planar/pillarFixing.ts';
export { wallDeclinationFromShadow, type ShadowReading } from './planar/wallDeclinationFromShadow.ts';
export { MIN_THREADS_ENGAGED, tappedScrewLength, wallMount, WALL_MOUNT_RIM_MM, WALL_ANCHOR_HOLE_MM, type MountDialFixing, type WallMountFixing } from './planar/wallMount.ts';
export { equatorialStand, equatorialStandApplies, type EquatorialStand, type EquatorialFixing } from './planar/equatorialStand.ts';
export { standUnionSolid, PRINT_FUSE_MM } from './stand/standUnionSolid.ts';
export { placePoint } from './stand/placeStandPart.ts';
