export * from './standTypes.ts';
export * from './metricFasteners.ts';
export * from './mountingFixings.ts';
export * from './standDimensions.ts';
export * from './flatStand.ts';
export * from './sheetPartMesh.ts';
export * from './placeStandPart.ts';
export * from './standSolid.ts';
