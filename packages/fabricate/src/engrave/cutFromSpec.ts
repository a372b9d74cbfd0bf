import { sheetParts, SpecError, type DialLayout, type DialSpec, type PlateDrawing, type SheetPart } from '@umbrafab/geometry';
import { assertToolFits } from '../process/assertToolFits.ts';
import { CUT_PRESETS, DRILL_MATCH_MM, checkCutSettings, type CutSettings } from './cutSettings.ts';
import { engraveSettingsFromSpec } from './engraveSettingsFromSpec.ts';
import { formatDuration } from './estimateTime.ts';
import { formatNumber } from './formatNumber.ts';
import { serializeGcode, type GcodeRecord } from './gcodeRecords.ts';
import { engraveTitleLines } from './engraveFromSpec.ts';
import type { MaterialName } from './materialPresets.ts';
import { machineComments } from './millProgram.ts';
import { CUT_TOOL_NUMBER, planCut, type CutPlan, type PartLoops } from './planCut.ts';
import { toolCentrePaths } from './toolCentrePaths.ts';

/** The file name of the router cutting program. */
export const CUT_FILE_NAME = 'cut.ngc';

/** Clear space between two parts' tool paths on the stock, on top of the tool diameter and the lead-ins, mm. */
export const PART_GAP_MM = 5;

/** report.json `cutting`: what cut.ngc does. */
export interface CuttingReport {
  readonly file: string;
  readonly toolDiameterMm: number;
  readonly depthMm: number;
  readonly breakthroughMm: number;
  readonly passes: number;
  readonly stepDownMm: number;
  readonly direction: CutSettings['direction'];
  readonly tabs: { readonly perProfile: number; readonly widthMm: number; readonly heightMm: number; readonly placed: number };
  readonly operations: readonly { readonly part: string; readonly feature: string; readonly operation: 'drill' | 'helical bore' | 'inside loop' | 'outside loop' }[];
  readonly parts: readonly { readonly name: string; readonly originMm: readonly [number, number] }[];
  /** Tool-centre extent in work coordinates, mm: the stock must reach past it by the tool radius. */
  readonly toolPathBoundsMm: { readonly min: readonly [number, number]; readonly max: readonly [number, number] };
  readonly timeEstimateS: number;
  readonly timeBreakdownS: { readonly cutting: number; readonly plunge: number; readonly rapid: number; readonly retract: number; readonly dwell: number };
  readonly spindleRpm: number;
  readonly feedMmPerMin: number;
  readonly plungeMmPerMin: number;
}

/** The cutting settings of a spec: the material's cutting preset with the `engrave.cut` fields over it, the tool = process.kerf. */
export function cutSettingsFromSpec(spec: DialSpec): CutSettings {
  const c = spec.engrave.cut;
  const preset = CUT_PRESETS[spec.plate.material as MaterialName];
  if (!preset) {
    throw new SpecError('plate.material', spec.plate.material, `allowed for cut.ngc: ${Object.keys(CUT_PRESETS).join(', ')}; or engrave.cut.write: false`, `${JSON.stringify(spec.plate.material)} has no cutting preset`);
  }
  if (!(c.tabHeightMm < spec.plate.thickness)) {
    throw new SpecError('engrave.cut.tabHeightMm', c.tabHeightMm, `allowed: less than plate.thickness (${spec.plate.thickness} mm)`, 'a holding tab must be lower than the sheet');
  }
  const s: CutSettings = {
    spindleRpm: c.spindleRpm ?? preset.spindleRpm,
    feedMmPerMin: c.feedMmPerMin ?? preset.feedMmPerMin,
    plungeMmPerMin: c.plungeMmPerMin ?? preset.plungeMmPerMin,
    stepDownMm: c.stepDownMm ?? preset.stepDownMm,
    toolDiameterMm: spec.process.kerf,
    breakthroughMm: c.breakthroughMm,
    tabCount: c.tabs,
    tabWidthMm: c.tabWidthMm,
    tabHeightMm: c.tabHeightMm,
    leadInMm: c.leadInMm ?? spec.process.kerf / 2,
    direction: c.direction,
  };
  checkCutSettings(s, spec.plate.thickness);
  return s;
}

/** Whether a build writes cut.ngc: a router job with engrave.cut.write. */
export function writesCutProgram(spec: DialSpec): boolean {
  return spec.process.method === 'router' && spec.engrave.cut.write;
}

function bounds(part: SheetPart): { min: [number, number]; max: [number, number] } {
  const xs = part.outer.points.map((p) => p[0]);
  const ys = part.outer.points.map((p) => p[1]);
  return { min: [Math.min(...xs), Math.min(...ys)], max: [Math.max(...xs), Math.max(...ys)] };
}

/**
 * cut.ngc for a router job: the job's flat parts (sheetParts: the plate and
 * the sheet gnomon, nominal, with the inside-corner reliefs for the tool)
 * placed on one stock, the plate at the work origin of plate.dxf and
 * engrave.ngc (its lower-left corner), each further part (the stand parts
 * too, and each copy of a part needed more than once) to the right of the
 * previous one with the tool diameter, both lead-ins and PART_GAP_MM between
 * their tool paths. The tool (process.kerf) is checked against every hole,
 * slot and gap first (assertToolFits; a hole the tool's size is drilled).
 *
 * @returns the file and the report's `cutting` section, or null when the build writes no cut.ngc
 * @throws SpecError naming process.kerf, the feature and both sizes when the tool does not fit
 */
export async function cutFromSpec(spec: DialSpec, layout: DialLayout, drawing: PlateDrawing): Promise<CutProgram | null> {
  if (!writesCutProgram(spec)) return null;
  return cutFromParts(spec, sheetParts(layout, drawing, { reliefToolRadiusMm: 0 }), sheetParts(layout, drawing));
}

/** cut.ngc and the report's `cutting` section. */
export interface CutProgram {
  readonly file: { readonly name: string; readonly text: string };
  readonly report: CuttingReport;
}

/**
 * cut.ngc from a job's flat parts, any face type (`cutFromSpec` for the
 * polar plate; the other planar faces pass their plate, sheet fin and wall
 * mount): `bareParts` before the inside-corner relief for the tool-fit
 * check, `reliefParts` as cut, the plate first (at the work origin).
 */
export async function cutFromParts(spec: DialSpec, bareParts: readonly SheetPart[], reliefParts: readonly SheetPart[]): Promise<CutProgram> {
  const s = cutSettingsFromSpec(spec);
  const machine = engraveSettingsFromSpec(spec);
  const tol = spec.cutFiles.chordTolerance;
  // The fit check reads the parts before relief; holes the tool's own size are drilled, so they pass.
  const bare = bareParts.map((p) => ({
    ...p,
    inner: p.inner.filter((f) => !(f.kind === 'circle' && Math.abs(2 * f.radiusMm - s.toolDiameterMm) <= DRILL_MATCH_MM)),
  }));
  assertToolFits(bare, s.toolDiameterMm, 'process.kerf');
  // A part the job needs several of (quantity) is cut that many times, copies named part-1, part-2, …
  const parts = reliefParts.flatMap((p) => {
    const n = p.quantity ?? 1;
    return n === 1 ? [p] : Array.from({ length: n }, (_, k) => ({ ...p, name: `${p.name}-${k + 1}` }));
  });
  const r = s.toolDiameterMm / 2;
  const placed: PartLoops[] = [];
  let nextX = 0;
  for (const part of parts) {
    const b = bounds(part);
    const originMm: [number, number] = placed.length === 0 ? [0, 0] : [nextX - b.min[0], -b.min[1]];
    const loops = await toolCentrePaths(part, r, tol);
    placed.push({ part, originMm, ...loops });
    nextX = originMm[0] + b.max[0] + 2 * (s.toolDiameterMm + s.leadInMm) + PART_GAP_MM;
  }
  const plate = parts[0];
  const stockLengthMm = bounds(plate).max[1];
  const plan = planCut(placed, {
    thicknessMm: spec.plate.thickness,
    settings: s,
    machine,
    rampAngleDeg: machine.rampAngleDeg,
    stockLengthMm,
    rapidMmPerMin: machine.rapidMmPerMin,
  });
  const text = serializeGcode([...cutHeader(spec, s, machine, placed, plan, stockLengthMm), ...plan.body], 3, { percent: true });
  const e = plan.estimate;
  const report: CuttingReport = {
    file: CUT_FILE_NAME,
    toolDiameterMm: s.toolDiameterMm,
    depthMm: plan.finalDepthMm,
    breakthroughMm: s.breakthroughMm,
    passes: plan.depthPassesMm.length,
    stepDownMm: s.stepDownMm,
    direction: s.direction,
    tabs: {
      perProfile: s.tabCount,
      widthMm: s.tabWidthMm,
      heightMm: s.tabHeightMm,
      placed: plan.operations.reduce((n, op) => n + (op.kind === 'loop' ? op.tabs.length : 0), 0),
    },
    operations: plan.operations.map((op) => ({
      part: op.part,
      feature: op.label,
      operation: op.kind === 'drill' ? 'drill' : op.kind === 'helix' ? 'helical bore' : op.side === 'outer' ? 'outside loop' : 'inside loop',
    })),
    parts: placed.map((p) => ({ name: p.part.name, originMm: p.originMm })),
    toolPathBoundsMm: plan.boundsMm,
    timeEstimateS: e.totalS,
    timeBreakdownS: { cutting: e.cuttingS, plunge: e.plungeS, rapid: e.rapidS, retract: e.retractS, dwell: e.dwellS },
    spindleRpm: s.spindleRpm,
    feedMmPerMin: s.feedMmPerMin,
    plungeMmPerMin: s.plungeMmPerMin,
  };
  return { file: { name: CUT_FILE_NAME, text }, report };
}

function cutHeader(spec: DialSpec, s: CutSettings, machine: ReturnType<typeof engraveSettingsFromSpec>, placed: readonly PartLoops[], plan: CutPlan, stockLengthMm: number): GcodeRecord[] {
  const mm = (v: number): string => formatNumber(v, 3);
  const t = (v: number): string => formatNumber(v, 3, true);
  const sec = (v: number): string => `${formatNumber(v, 0)} s`;
  const e = plan.estimate;
  const margin = s.toolDiameterMm / 2 + PART_GAP_MM;
  const lo = plan.boundsMm.min;
  const hi = plan.boundsMm.max;
  const lines = [
    'umbrafab cut.ngc: router cutting program, RS-274/NGC: holes, cut-outs, then the outer profiles',
    'units: millimetres [G21], absolute coordinates [G90], XY plane [G17], feed in mm/min [G94]; tool offset computed here, no G41/G42',
    'work origin: X0 Y0 = lower-left corner of the plate [as in plate.dxf and engrave.ngc], Z0 = top of the stock',
    `stock: ${spec.plate.material}, ${mm(spec.plate.thickness)} mm thick, covering at least X ${mm(lo[0] - margin)} to ${mm(hi[0] + margin)}, Y ${mm(lo[1] - margin)} to ${mm(hi[1] + margin)} mm [tool paths plus tool radius plus ${t(PART_GAP_MM)} mm], on a sacrificial spoilboard`,
    ...placed.map((p) => `part ${p.part.name}: its lower-left corner at X${mm(p.originMm[0])} Y${mm(p.originMm[1])}`),
    'CAUTION: follow the machine maker\'s instructions; dry-run this program above the stock first [raise Z0 by more than the stock thickness]',
    'CAUTION: clamp or screw the stock down outside every tool path; guard the machine; wear eye and hearing protection',
    'CAUTION: feeds and speeds are common-practice starting points, not tuned to your machine; cut the tabs and deburr the edges after',
    `T${CUT_TOOL_NUMBER}: flat end mill diameter ${mm(s.toolDiameterMm)} mm [process.kerf] - ${machine.toolWords ? 'loaded by the T M6 below' : 'load before start'}; set Z0 on the top of the stock`,
    `spindle ${formatNumber(s.spindleRpm, 0)} rpm, feed ${t(s.feedMmPerMin)} mm/min, plunge ${t(s.plungeMmPerMin)} mm/min, ${plan.depthPassesMm.length} passes of at most ${mm(s.stepDownMm)} mm`,
    `depth ${mm(plan.finalDepthMm)} mm = thickness ${mm(spec.plate.thickness)} + breakthrough ${mm(s.breakthroughMm)} into the spoilboard; ${s.direction} milling`,
    `holding tabs: ${s.tabCount} per outer profile, ${mm(s.tabWidthMm)} mm wide, ${mm(s.tabHeightMm)} mm high [the tool rises to Z${mm(plan.tabTopZMm)} over ${mm(s.tabWidthMm + s.toolDiameterMm)} mm]`,
    `safe Z ${mm(machine.safeZMm)} mm, clearance Z ${mm(machine.clearanceZMm)} mm, entry Z ${mm(machine.entryZMm)} mm; ramps and helices, no plunges but the drilled holes; lead-in and lead-out ${mm(s.leadInMm)} mm on the waste side`,
  ];
  return [
    ...lines.map((text): GcodeRecord => ({ kind: 'comment', text })),
    ...machineComments(machine, stockLengthMm),
    {
      kind: 'comment',
      text: `estimated time: ${formatDuration(e.totalS)} [${sec(e.totalS)}: cutting ${sec(e.cuttingS)}, plunges ${sec(e.plungeS)}, rapids ${sec(e.rapidS + e.retractS)}, dwells ${sec(e.dwellS)}; ignores acceleration, so the job takes longer]`,
    },
    ...engraveTitleLines(spec).map((line): GcodeRecord => ({ kind: 'comment', text: `spec: ${line}` })),
  ];
}
