import type { EngraveJob } from './engraveInput.ts';
import { estimateTime, type TimeEstimate } from './estimateTime.ts';
import { formatNumber } from './formatNumber.ts';
import { serializeProgram, type GcodeRecord } from './gcodeRecords.ts';
import { rampFeedMmPerMin, rampSlope, type EngraveSettings } from './materialPresets.ts';
import { enterAndCut, machineComments, millEnd, millStart, spindleOff, spindleOn } from './millProgram.ts';
import { figureComments, safetyComments, stockComments } from './headerComments.ts';
import { buildToolpaths, type EngraveTool, type EngraveToolpaths } from './toolpaths.ts';
import { resolveWriterOptions, type GcodeWriterOptions } from './writerOptions.ts';

/**
 * engrave.ngc: an RS-274/NGC milling program (NIST RS274NGC interpreter,
 * version 3, NISTIR 6556, 2000, as read by LinuxCNC; memory), checked by
 * Debian's `rs274 -g`.
 *
 * Program shape:
 * - `%` on the first and the last line (tape delimiters);
 * - header comments: units, work origin, stock, material, tools, feeds, time
 *   estimate, rapid travel, cautions, then the spec summary lines;
 * - millStart: `G21 G90 G17 G94 G40 G49 G80 G54`, `G0 Z<safe>` before any XY
 *   move, `T1 M6` when engrave.toolWords, `S<rpm> M3`, `G4 P<dwell>` so the
 *   spindle is at speed, `M7`/`M8` when engrave.coolant asks;
 * - per cut (enterAndCut): `G0 X Y` at the clearance height, `G0 Z<entry>`
 *   just above the stock, `G1 Z0` at the cutting feed, then the passes in the
 *   cut (rampedPasses): the tool ramps down along the line and runs the depth
 *   passes back and forth (loops the same way round) without lifting, then
 *   `G0 Z<clearance>`;
 * - tool change to the flat end mill (T2 M6) at safe height, spindle and
 *   coolant off, when there are flat-mill cuts (V-bit = T1);
 * - millEnd: `G0 Z<safe>`, the park move `G0 X Y`, `M9`, `M5`, `M2`.
 */

const TOOL_NUMBER: Readonly<Record<EngraveTool, number>> = { vbit: 1, flat: 2 };

/** A milling program before serialisation, with its figures. */
export interface NgcPlan {
  readonly toolpaths: EngraveToolpaths;
  /** The program body (everything but the header comments). */
  readonly body: readonly GcodeRecord[];
  readonly estimate: TimeEstimate;
}

/**
 * Build the milling program's records and figures (what toNgc writes).
 * @param options decimals (default 3), optimizeOrder (default true)
 */
export function planNgc(job: EngraveJob, settings: EngraveSettings, options: GcodeWriterOptions = {}): NgcPlan {
  const o = resolveWriterOptions(options);
  const s = settings;
  const toolpaths = buildToolpaths(job, s, { optimizeOrder: o.optimizeOrder });
  const rampFeed = rampFeedMmPerMin(s, rampSlope(s));
  const body: GcodeRecord[] = [];
  let tool: EngraveTool | undefined;
  let z = s.safeZMm;
  toolpaths.cuts.forEach((cut, n) => {
    if (cut.tool !== tool) {
      if (tool === undefined) body.push(...millStart(s, TOOL_NUMBER[cut.tool], s.spindleRpm));
      else {
        body.push({ kind: 'rapid', to: { z: s.safeZMm } }, ...spindleOff(s));
        body.push({ kind: 'comment', text: `tool change: load T${TOOL_NUMBER[cut.tool]}, ${toolName(cut.tool, s)}; set Z0 on the top of the stock again` });
        body.push({ kind: 'toolChange', tool: TOOL_NUMBER[cut.tool] }, ...spindleOn(s, s.spindleRpm));
        z = s.safeZMm;
      }
      tool = cut.tool;
    }
    const finalDepth = cut.depthPassesMm[cut.depthPassesMm.length - 1];
    body.push({
      kind: 'comment',
      text: `cut ${n + 1}/${toolpaths.cuts.length}: ${cut.operation} ${cut.label}, width ${fmt(cut.widthMm)} mm, depth ${fmt(finalDepth)} mm in ${cut.depthPassesMm.length} pass${cut.depthPassesMm.length > 1 ? 'es' : ''}`,
    });
    z = enterAndCut(body, s, cut.path, z, { feedMmPerMin: cut.feedMmPerMin, rampFeedMmPerMin: Math.min(rampFeed, cut.feedMmPerMin), plungeMmPerMin: cut.plungeMmPerMin });
  });
  if (tool === undefined) body.push(...millStart(s, 1, s.spindleRpm));
  body.push(...millEnd(s, job.stock.lengthMm));
  // The machine is assumed to start over the origin at safe height.
  const estimate = estimateTime(body, { rapidMmPerMin: s.rapidMmPerMin, start: { x: 0, y: 0, z: s.safeZMm } });
  return { toolpaths, body, estimate };
}

function fmt(value: number): string {
  return formatNumber(value, 3);
}

function toolName(tool: EngraveTool, s: EngraveSettings): string {
  switch (tool) {
    case 'vbit':
      return `V-bit ${formatNumber(s.vbitAngleDeg, 3, true)}° included angle, tip ${fmt(s.vbitTipMm)} mm, diameter ${fmt(s.vbitMaxWidthMm)} mm`;
    case 'flat':
      return `flat end mill diameter ${fmt(s.flatEndMillMm ?? 0)} mm`;
    default: {
      const never: never = tool;
      throw new Error(`unknown tool ${String(never)}`);
    }
  }
}

/**
 * Write engrave.ngc for a job.
 *
 * @param job the paths in plate coordinates and the stock
 * @param settings resolveEngraveSettings(material, overrides)
 * @param options decimals (default 3), optimizeOrder (default true)
 * @returns program text, '\n' line ends, byte-stable for the same input
 * @throws Error naming the field for a V-bit too narrow, a depth the stock does not allow, a bad path
 * @example toNgc(job, resolveEngraveSettings('brass'))
 */
export function toNgc(job: EngraveJob, settings: EngraveSettings, options: GcodeWriterOptions = {}, planned?: NgcPlan): string {
  const o = resolveWriterOptions(options);
  // A caller that already planned (for the report's figures) passes the plan, so the paths are ordered once.
  const plan = planned ?? planNgc(job, settings, o);
  const s = settings;
  const cuts = plan.toolpaths.cuts;
  const usesFlat = cuts.some((c) => c.tool === 'flat');
  const maxPasses = cuts.reduce((m, c) => Math.max(m, c.depthPassesMm.length), 0);
  const header: GcodeRecord[] = [
    { kind: 'comment', text: `umbrafab ${job.side?.fileName ?? 'engrave.ngc'}: engraving program, RS-274/NGC` },
    ...(job.side?.lines ?? []).map((text): GcodeRecord => ({ kind: 'comment', text })),
    ...stockComments(job, 'mill'),
    ...safetyComments('mill'),
    { kind: 'comment', text: `T1: ${toolName('vbit', s)} - load before start` },
    ...(usesFlat ? [{ kind: 'comment', text: `T2: ${toolName('flat', s)}, depth ${fmt(s.flatDepthMm)} mm` } as const] : []),
    {
      kind: 'comment',
      text: `spindle ${formatNumber(s.spindleRpm, 0)} rpm, feed ${formatNumber(s.feedMmPerMin, 3, true)} mm/min, plunge ${formatNumber(s.plungeMmPerMin, 3, true)} mm/min, step-down at most ${fmt(s.stepDownMm)} mm`,
    },
    { kind: 'comment', text: `safe Z ${fmt(s.safeZMm)} mm, clearance Z ${fmt(s.clearanceZMm)} mm, entry Z ${fmt(s.entryZMm)} mm, ramp ${formatNumber((Math.atan(rampSlope(s)) * 180) / Math.PI, 1)} deg into the cut, no plunges into the stock` },
    ...machineComments(s, job.stock.lengthMm),
    {
      kind: 'comment',
      text: `${cuts.length} cuts, deepest ${fmt(plan.toolpaths.maxDepthMm)} mm [limit ${fmt(plan.toolpaths.depthLimitMm)} mm], at most ${maxPasses} passes`,
    },
    ...figureComments({ rapidTravelMm: plan.toolpaths.rapidTravelMm, estimate: plan.estimate, title: job.title, process: 'mill' }),
  ];
  return serializeProgram(header, plan.body, o.decimals, { percent: true });
}
