export * from './process/roundTo.ts';
export * from './process/kerfCompensate.ts';
export * from './process/rectVertices.ts';
export * from './dxf/toDxf.ts';
export * from './svg/toSvg.ts';
export * from './report/toReportJson.ts';
export * from './engrave/index.ts';
