export * from './templatePages.ts';
export * from './toTemplatePdf.ts';
