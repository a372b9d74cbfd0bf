export * from './assemblyTypes.ts';
export * from './clipPolygon.ts';
export * from './placeAssembly.ts';
export * from './sunForPicture.ts';
export * from './gnomonShadowOnFace.ts';
export * from './viewAssembly.ts';
