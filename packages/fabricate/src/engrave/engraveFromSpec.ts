import type { DialSpec, PlateDrawing } from '@umbrafab/geometry';
import { checkMillJob } from './checkMillJob.ts';
import type { EngraveJob } from './engraveInput.ts';
import { engraveJobFromDrawing } from './engraveJobFromDrawing.ts';
import { ENGRAVE_FILE_NAMES, engraveProgramsFor, type EngraveProgram } from './engravePrograms.ts';
import { engraveSettingsFromSpec } from './engraveSettingsFromSpec.ts';
import type { TimeEstimate } from './estimateTime.ts';
import { rampSlope, type EngraveSettings } from './materialPresets.ts';
import { parkPoint } from './millProgram.ts';
import { polylineLengthMm } from './polylineLength.ts';
import { specSummaryLines } from './specSummaryLines.ts';
import { laserFillPasses, type LaserFill } from './laserFill.ts';
import { planLaser, toLaserGcode, type LaserPlan } from './toLaserGcode.ts';
import { planNgc, toNgc, type NgcPlan } from './toNgc.ts';

/**
 * The engraving programs of one spec and their figures for report.json
 * (`engraving:`): the job built from the plate drawing, the spec's settings
 * over the material preset, the checks that name spec fields, then the
 * writers. Plain data in, text out; the CLI writes the files.
 */

/** Rapid travel figures, mm, and how far the ordered travel is above the bound. */
export interface RapidTravelReport {
  readonly inputOrder: number;
  readonly ordered: number;
  readonly lowerBound: number;
  /** ordered / lowerBound (1 when both are 0): at most this far from the shortest possible. */
  readonly ratioToBound: number;
}

export interface NgcReport {
  readonly file: string;
  /** Deepest V-bit groove, mm below the stock top. */
  readonly vbitDepthMmMax: number;
  /** Deepest groove the sheet allows, mm. */
  readonly depthLimitMm: number;
  /** Most depth passes of any cut (step-down). */
  readonly passes: number;
  readonly cuts: number;
  readonly timeEstimateS: number;
  readonly timeBreakdownS: { readonly cutting: number; readonly plunge: number; readonly rapid: number; readonly retract: number; readonly dwell: number };
  readonly rapidTravelMm: RapidTravelReport;
  /** XY length of one pass of every cut = the length cut at final depth, mm. */
  readonly cuttingLengthMm: number;
  /** XY feed length over all passes, mm. */
  readonly feedLengthMm: number;
  readonly tool: {
    readonly vbitAngleDeg: number;
    readonly vbitTipMm: number;
    readonly vbitMaxWidthMm: number;
    readonly flatEndMillMm?: number;
    readonly flatDepthMm?: number;
  };
  readonly spindleRpm: number;
  readonly feedMmPerMin: number;
  readonly plungeMmPerMin: number;
  readonly stepDownMm: number;
  readonly safeZMm: number;
  readonly clearanceZMm: number;
  readonly entryZMm: number;
  /** Ramp angle into the cut, degrees. */
  readonly rampAngleDeg: number;
  readonly spindleDwellS: number;
  readonly parkMm: readonly [number, number];
}

export interface LaserReport {
  readonly file: string;
  /** Every stroke (centre line or fill pass) is traced once. */
  readonly passes: 1;
  /** 'fill': lines wider than the beam burned as wide as drawn; 'score': centre lines only. */
  readonly mode: 'fill' | 'score';
  /** The fill, when mode is 'fill'. */
  readonly fill?: {
    readonly beamMm: number;
    readonly intervalMm: number;
    readonly regions: number;
    readonly rings: number;
    readonly scoredLines: number;
    /** Area of the union of the wide lines, less the holes and slots, mm². */
    readonly filledAreaMm2: number;
  };
  readonly strokes: number;
  readonly timeEstimateS: number;
  readonly timeBreakdownS: { readonly burning: number; readonly travel: number };
  readonly rapidTravelMm: RapidTravelReport;
  /** XY length burned, mm. */
  readonly cuttingLengthMm: number;
  readonly powerPct: number;
  readonly powerS: number;
  readonly maxS: number;
  readonly speedMmPerMin: number;
}

export interface EngravingReport {
  readonly programs: readonly EngraveProgram[];
  /** The preset the settings start from (plate.material), when a program is written. */
  readonly preset?: string;
  /** Sum of the engraved geometry's lengths (every line and text stroke once, without the parts over holes and slots), mm. */
  readonly geometryLengthMm?: number;
  /** Length of the drawing's lines and strokes left out because they cross a hole or gnomon slot, mm. */
  readonly overThroughCutsMm?: number;
  readonly ngc?: NgcReport;
  readonly laser?: LaserReport;
}

export interface SpecEngraving {
  readonly files: readonly { readonly name: string; readonly text: string }[];
  readonly report: EngravingReport;
  /** The job the programs were written from (for tests and previews). */
  readonly job?: EngraveJob;
}

function travel(t: { readonly inputOrder: number; readonly ordered: number; readonly lowerBound: number }): RapidTravelReport {
  const ratio = t.lowerBound > 0 ? t.ordered / t.lowerBound : 1;
  return { inputOrder: t.inputOrder, ordered: t.ordered, lowerBound: t.lowerBound, ratioToBound: ratio };
}

/** Header lines: how to remake the file. */
export function engraveTitleLines(spec: DialSpec): readonly string[] {
  return ['to remake: umbrafab build on a spec with these fields [normalised, defaults filled in]', ...specSummaryLines(spec)];
}

function ngcReport(job: EngraveJob, s: EngraveSettings, plan: NgcPlan): NgcReport {
  const cuts = plan.toolpaths.cuts;
  const e: TimeEstimate = plan.estimate;
  const usesFlat = cuts.some((c) => c.tool === 'flat');
  return {
    file: ENGRAVE_FILE_NAMES.ngc,
    vbitDepthMmMax: cuts.filter((c) => c.tool === 'vbit').reduce((m, c) => Math.max(m, c.depthPassesMm[c.depthPassesMm.length - 1]), 0),
    depthLimitMm: plan.toolpaths.depthLimitMm,
    passes: cuts.reduce((m, c) => Math.max(m, c.depthPassesMm.length), 0),
    cuts: cuts.length,
    timeEstimateS: e.totalS,
    timeBreakdownS: { cutting: e.cuttingS, plunge: e.plungeS, rapid: e.rapidS, retract: e.retractS, dwell: e.dwellS },
    rapidTravelMm: travel(plan.toolpaths.rapidTravelMm),
    cuttingLengthMm: cuts.reduce((sum, c) => sum + polylineLengthMm(c.points, c.closed), 0),
    feedLengthMm: e.cuttingMm,
    tool: {
      vbitAngleDeg: s.vbitAngleDeg,
      vbitTipMm: s.vbitTipMm,
      vbitMaxWidthMm: s.vbitMaxWidthMm,
      ...(usesFlat ? { flatEndMillMm: s.flatEndMillMm, flatDepthMm: s.flatDepthMm } : {}),
    },
    spindleRpm: s.spindleRpm,
    feedMmPerMin: s.feedMmPerMin,
    plungeMmPerMin: s.plungeMmPerMin,
    stepDownMm: s.stepDownMm,
    safeZMm: s.safeZMm,
    clearanceZMm: s.clearanceZMm,
    entryZMm: s.entryZMm,
    rampAngleDeg: (Math.atan(rampSlope(s)) * 180) / Math.PI,
    spindleDwellS: s.spindleDwellS,
    parkMm: parkPoint(s, job.stock.lengthMm),
  };
}

function laserReport(s: EngraveSettings, plan: LaserPlan, fill: LaserFill | undefined): LaserReport {
  const e = plan.estimate;
  return {
    file: ENGRAVE_FILE_NAMES.laser,
    passes: 1,
    mode: fill ? 'fill' : 'score',
    ...(fill
      ? { fill: { beamMm: fill.beamMm, intervalMm: fill.intervalMm, regions: fill.regions, rings: fill.rings, scoredLines: fill.scored, filledAreaMm2: fill.filledAreaMm2 } }
      : {}),
    strokes: plan.strokes.length,
    timeEstimateS: e.totalS,
    timeBreakdownS: { burning: e.cuttingS, travel: e.rapidS + e.retractS },
    rapidTravelMm: travel(plan.rapidTravelMm),
    cuttingLengthMm: e.cuttingMm,
    powerPct: s.laserPowerPct,
    powerS: plan.powerS,
    maxS: s.laserMaxS,
    speedMmPerMin: s.laserSpeedMmPerMin,
  };
}

/**
 * A spec's engraving up to its header: the checked job (no title), the
 * planned programs (ordered toolpaths, laser fill) and the report section.
 * Everything the programs hold but their header comments, so specs that
 * share a drawing and an engravingPlanKey share one plan (umbrafab batch).
 */
export interface EngravingPlan {
  /** absent when the spec asks for no program */
  readonly settings?: EngraveSettings;
  /** the job with an empty title; absent when the spec asks for no program */
  readonly job?: EngraveJob;
  readonly ngc?: NgcPlan;
  readonly laser?: LaserPlan;
  readonly report: EngravingReport;
}

/** What planEngraving reads of a spec (besides the drawing): specs with the same key get the same plan. */
export function engravingPlanKey(spec: DialSpec): string {
  const { engrave, process, plate, cutFiles } = spec;
  return JSON.stringify({ engrave, method: process.method, thickness: plate.thickness, material: plate.material, chordTolerance: cutFiles.chordTolerance });
}

/**
 * Plan the engraving programs a spec asks for (engrave.programs, see
 * engraveProgramsFor) from its plate drawing: checks, toolpaths, fill,
 * figures; writeEngraving adds the header and writes the text. With `only`,
 * just those of them (the others planned elsewhere, joinEngravings puts the
 * parts together).
 *
 * @throws SpecError as engraveFromSpec
 */
export async function planEngraving(spec: DialSpec, drawing: PlateDrawing, only?: readonly EngraveProgram[]): Promise<EngravingPlan> {
  const programs = engraveProgramsFor(spec.engrave.programs, spec.process.method).filter((p) => !only || only.includes(p));
  if (programs.length === 0) return { report: { programs } };
  const settings = engraveSettingsFromSpec(spec);
  const job = engraveJobFromDrawing(drawing, { thicknessMm: spec.plate.thickness, material: spec.plate.material }, []);
  let ngc: NgcPlan | undefined;
  let laser: LaserPlan | undefined;
  let ngcFigures: NgcReport | undefined;
  let laserFigures: LaserReport | undefined;
  for (const program of programs) {
    if (program === 'ngc') {
      checkMillJob(job, settings, spec);
      ngc = planNgc(job, settings);
      ngcFigures = ngcReport(job, settings, ngc);
    } else {
      const fill =
        spec.engrave.laserFill === 'fill'
          ? await laserFillPasses(job, {
              beamMm: spec.engrave.laserBeamMm,
              intervalMm: spec.engrave.laserFillIntervalMm ?? spec.engrave.laserBeamMm,
              chordToleranceMm: spec.cutFiles.chordTolerance,
              holes: drawing.holes,
              slots: drawing.slots,
            })
          : undefined;
      laser = planLaser(job, settings, {}, fill);
      laserFigures = laserReport(settings, laser, fill);
    }
  }
  const geometryLengthMm = job.paths.reduce((sum, p) => sum + polylineLengthMm(p.points, p.closed), 0);
  const drawnMm =
    drawing.lines.reduce((sum, l) => sum + polylineLengthMm(l.path.points, l.path.closed), 0) +
    drawing.text.reduce((sum, t) => sum + t.strokes.reduce((s2, p) => s2 + polylineLengthMm(p.points, p.closed), 0), 0);
  const overThroughCutsMm = Math.max(0, drawnMm - geometryLengthMm);
  const report: EngravingReport = { programs, preset: settings.material, geometryLengthMm, overThroughCutsMm, ngc: ngcFigures, laser: laserFigures };
  return { settings, job, ngc, laser, report };
}

/**
 * One face of a plate engraved on both faces (an equatorial face.side
 * both): the programs' file names take `fileSuffix` before the extension
 * (engrave-lower.ngc) and their header, after its first line, holds
 * `headerLines` (which side this is, the turn between the two).
 */
export interface EngraveFace {
  readonly fileSuffix: string;
  readonly headerLines: readonly string[];
}

/** A program's file name, with a face's suffix before the extension. */
export function engraveFileName(program: EngraveProgram, face?: EngraveFace): string {
  const name = ENGRAVE_FILE_NAMES[program];
  if (!face) return name;
  const dot = name.lastIndexOf('.');
  return `${name.slice(0, dot)}${face.fileSuffix}${name.slice(dot)}`;
}

/**
 * The program texts of a plan under a spec's header (engraveTitleLines):
 * only the header is written anew, the body text is the plan's. With a
 * `face`, its lines open the header and the files are named for it.
 */
export function writeEngraving(plan: EngravingPlan, spec: DialSpec, face?: EngraveFace): SpecEngraving {
  const { settings } = plan;
  if (!plan.job || !settings) return { files: [], report: plan.report };
  const job: EngraveJob = { ...plan.job, title: engraveTitleLines(spec) };
  const sided = (program: EngraveProgram): EngraveJob => (face ? { ...job, side: { fileName: engraveFileName(program, face), lines: face.headerLines } } : job);
  const files: { name: string; text: string }[] = [];
  for (const program of plan.report.programs) {
    if (program === 'ngc' && plan.ngc) files.push({ name: engraveFileName('ngc', face), text: toNgc(sided('ngc'), settings, {}, plan.ngc) });
    if (program === 'laser' && plan.laser) files.push({ name: engraveFileName('laser', face), text: toLaserGcode(sided('laser'), settings, {}, plan.laser) });
  }
  const r = plan.report;
  const report: EngravingReport = face
    ? { ...r, ...(r.ngc ? { ngc: { ...r.ngc, file: engraveFileName('ngc', face) } } : {}), ...(r.laser ? { laser: { ...r.laser, file: engraveFileName('laser', face) } } : {}) }
    : r;
  return { files, report, job };
}

/**
 * Build the engraving programs a spec asks for (engrave.programs, see
 * engraveProgramsFor) from its plate drawing.
 *
 * @param spec the normalised spec (parseSpec)
 * @param drawing plateDrawing(layoutDial(spec)), plate coordinates as plate.dxf
 * @param face one face of a plate engraved on both (file names, header lines)
 * @returns the files (engrave.ngc, engrave-laser.gcode) and the report section
 * @throws SpecError (field, value, allowed) for a material without a preset, a
 *   V-bit too narrow for the widest line, a groove deeper than the sheet
 *   allows; feeds of zero never get here (the schema rejects them)
 * @example (await engraveFromSpec(spec, plateDrawing(layoutDial(spec)))).files.map((f) => f.name)
 */
export async function engraveFromSpec(spec: DialSpec, drawing: PlateDrawing, face?: EngraveFace, only?: readonly EngraveProgram[]): Promise<SpecEngraving> {
  return writeEngraving(await planEngraving(spec, drawing, only), spec, face);
}

/** What a build keeps of an engraving: its files and report.json's section. */
export type EngravingFiles = Pick<SpecEngraving, 'files' | 'report'>;

/**
 * One engraving from parts planned apart (engraveFromSpec's `only`, one
 * program each, e.g. on two threads): the files in `programs` order and the
 * report engraveFromSpec gives for all of them at once. The figures every
 * program shares (preset, lengths) come from the same job in every part.
 */
export function joinEngravings(parts: readonly EngravingFiles[], programs: readonly EngraveProgram[]): EngravingFiles {
  const partOf = (program: EngraveProgram): EngravingFiles => {
    const found = parts.filter((p) => p.report.programs.includes(program));
    if (found.length !== 1) throw new Error(`joinEngravings: program ${program} is in ${found.length} parts, not one`);
    return found[0];
  };
  if (programs.length === 0 || parts.some((p) => p.report.programs.length !== 1)) throw new Error('joinEngravings: needs one part of one program for each program');
  const r = partOf(programs[0]).report;
  return {
    files: programs.flatMap((p) => partOf(p).files),
    report: { ...r, programs, ngc: programs.includes('ngc') ? partOf('ngc').report.ngc : undefined, laser: programs.includes('laser') ? partOf('laser').report.laser : undefined },
  };
}
