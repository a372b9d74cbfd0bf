export * from './toPng.ts';
export * from './toAssemblySvg.ts';
export * from './fitPixelBudget.ts';
