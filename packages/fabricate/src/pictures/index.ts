export * from './toPng.ts';
export * from './toAssemblySvg.ts';
