// @umbrafab/fabricate's public names: what the CLI, the tests and the scripts
// import from '@umbrafab/fabricate'. Each name comes from the file that
// defines it; a name nothing outside this package uses stays unexported.
// A new writer another package needs gets its name here.

export { toDxf } from './dxf/toDxf.ts';

export { toSvg, type SvgOptions } from './svg/toSvg.ts';
export { previewFrame, plateToPreview } from './svg/previewFrame.ts';

export { toReportJson } from './report/toReportJson.ts';

export { resolveEngraveSettings, MATERIAL_NAMES, MATERIAL_PRESETS } from './engrave/materialPresets.ts';
export { vbitDepthMm } from './engrave/vbitDepth.ts';
export { engraveProgramsFor, type EngraveProgram } from './engrave/engravePrograms.ts';
export { engraveSettingsFromSpec } from './engrave/engraveSettingsFromSpec.ts';
export { engravingPlanKey, planEngraving, writeEngraving, engraveFromSpec, engraveFileName, joinEngravings, type EngraveFace, type EngravingFiles, type EngravingReport, type SpecEngraving } from './engrave/engraveFromSpec.ts';
export { twoFaceEngraving, type TwoFaceEngraving } from './engrave/twoFaceEngraving.ts';
export { clipToPlate } from './engrave/clipToPlate.ts';
export { cutFromParts, cutFromSpec, writesCutProgram, type CutProgram, type CuttingReport } from './engrave/cutFromSpec.ts';

export { toStl } from './stl/toStl.ts';
export { stlHeader } from './stl/stlHeader.ts';

export { toDxfR12 } from './dxf/toDxfR12.ts';

export { toCutSvg } from './svg/toCutSvg.ts';

export { cutDrawing, nominalProfiles, type CutDrawing, type CutProfiles } from './cut/cutDrawing.ts';
export { offsetProfiles } from './cut/offsetProfiles.ts';
export { piecesDrawing } from './cut/piecesDrawing.ts';

export { toInstallMd } from './install/toInstallMd.ts';
export { escapeMarkdownText } from './install/markdownText.ts';

export {
  toTemplatePdf,
  templateTiles,
  toPartsTemplatePdf,
  partsTemplateTiles,
  CALIBRATION_BAR_MM,
  CALIBRATION_BAR_RGB,
  PRINT_AT_FULL_SIZE,
  templateDrawings,
  type TemplatePart,
  type TemplateDrawingSheets,
} from './template/toTemplatePdf.ts';
export { BORDER_MM as TEMPLATE_BORDER_MM } from './template/templatePages.ts';

export { toPng, toPngAsync, svgWidthMm, svgHeightMm } from './pictures/toPng.ts';
export { toAssemblySvg } from './pictures/toAssemblySvg.ts';
export { fitPixelBudget, MAX_PICTURE_PIXELS } from './pictures/fitPixelBudget.ts';

export { toCheckJson } from './check/toCheckJson.ts';
export { toCheckSvg } from './check/toCheckSvg.ts';
export { toPlanarCheckSvg } from './check/toPlanarCheckSvg.ts';
export { checkFailureLine } from './check/checkSummaryText.ts';
export { checkTableText } from './check/checkTableText.ts';
export { planarCheckText } from './check/planarCheckText.ts';

export { toPlanarInstallMd } from './install/toPlanarInstallMd.ts';
export { templateSectionMd, type TemplateGuide } from './install/templateSectionMd.ts';

export { assertToolFits } from './process/assertToolFits.ts';

export { resolveStrokeMode, cutFileBase, partCutFiles, formatMm, lowerFaceNote, type PartCutReport } from './cut/partCutFiles.ts';
