export * from './types.ts';
export * from './obliquity.ts';
export * from './declinationTowardPoleRad.ts';
export * from './dateLinePoints.ts';
export * from './standardDateLines.ts';
export * from './declinationOnDate.ts';
export * from './meanTimeCurve.ts';
export * from './penumbraWidth.ts';
