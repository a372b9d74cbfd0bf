export * from './toCheckJson.ts';
export * from './toCheckSvg.ts';
export * from './checkTableText.ts';
export * from './planarCheckText.ts';
