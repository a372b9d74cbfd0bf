export * from './dialFrame.ts';
export * from './gnomonForLayout.ts';
export * from './styleEdges.ts';
export * from './castShadow.ts';
export * from './shadowOnFace.ts';
export * from './drawnMarks.ts';
export * from './marksFromPlate.ts';
export * from './checkDial.ts';
