import type { EngraveJob, Vec2 } from './engraveInput.ts';
import { estimateTime, type TimeEstimate } from './estimateTime.ts';
import { formatNumber } from './formatNumber.ts';
import { serializeGcode, type GcodeRecord } from './gcodeRecords.ts';
import type { EngraveSettings } from './materialPresets.ts';
import { figureComments, safetyComments, stockComments } from './headerComments.ts';
import { buildToolpaths, type EngraveCut, type EngraveTool, type EngraveToolpaths } from './toolpaths.ts';
import { resolveWriterOptions, type GcodeWriterOptions } from './writerOptions.ts';

/**
 * engrave.ngc: an RS-274/NGC milling program (NIST RS274NGC interpreter,
 * version 3, NISTIR 6556, 2000, as read by LinuxCNC; memory), checked by
 * Debian's `rs274 -g`.
 *
 * Program shape:
 * - header comments: units, work origin, stock, material, tools, feeds, time
 *   estimate, rapid travel, then the spec summary lines;
 * - `G21 G90 G17 G94 G40 G49 G80 G54`: mm, absolute, XY plane, feed per
 *   minute, no cutter or length compensation, no canned cycle, first work
 *   offset;
 * - `G0 Z<safe>` before any XY move, then `S<rpm> M3`;
 * - per cut: `G0 X Y` at the current height, `G0 Z<clearance>`, then per pass
 *   `G1 Z-<depth> F<plunge>` and `G1 X Y F<feed>` along the path (open paths
 *   back and forth, loops the same way round), then `G0 Z<clearance>`;
 * - tool change to the flat end mill (T2 M6) at safe height, spindle off,
 *   when there are flat-mill cuts (V-bit = T1, loaded before the start);
 * - end: `G0 Z<safe>`, `M5`, `M2`.
 */

const TOOL_NUMBER: Readonly<Record<EngraveTool, number>> = { vbit: 1, flat: 2 };

/** A milling program before serialisation, with its figures. */
export interface NgcPlan {
  readonly toolpaths: EngraveToolpaths;
  /** The program body (everything but the header comments). */
  readonly body: readonly GcodeRecord[];
  readonly estimate: TimeEstimate;
}

function passPoints(cut: EngraveCut, pass: number): readonly Vec2[] {
  const pts = cut.points;
  if (cut.closed) return [...pts.slice(1), pts[0]];
  return pass % 2 === 0 ? pts.slice(1) : [...pts].reverse().slice(1);
}

/**
 * Build the milling program's records and figures (what toNgc writes).
 * @param options decimals (default 3), optimizeOrder (default true)
 */
export function planNgc(job: EngraveJob, settings: EngraveSettings, options: GcodeWriterOptions = {}): NgcPlan {
  const o = resolveWriterOptions(options);
  const s = settings;
  const toolpaths = buildToolpaths(job, s, { optimizeOrder: o.optimizeOrder });
  const body: GcodeRecord[] = [
    { kind: 'modal', words: 'G21 G90 G17 G94 G40 G49 G80 G54' },
    { kind: 'rapid', to: { z: s.safeZMm } },
  ];
  let tool: EngraveTool | undefined;
  let z = s.safeZMm;
  toolpaths.cuts.forEach((cut, n) => {
    if (cut.tool !== tool) {
      if (tool !== undefined) {
        body.push({ kind: 'rapid', to: { z: s.safeZMm } }, { kind: 'spindle', mode: 'off' });
        body.push({ kind: 'comment', text: `tool change: load T${TOOL_NUMBER[cut.tool]}, ${toolName(cut.tool, s)}; set Z0 on the top of the stock again` });
        body.push({ kind: 'toolChange', tool: TOOL_NUMBER[cut.tool] });
        z = s.safeZMm;
      }
      body.push({ kind: 'spindle', mode: 'cw', s: s.spindleRpm });
      tool = cut.tool;
    }
    const finalDepth = cut.depthPassesMm[cut.depthPassesMm.length - 1];
    body.push({
      kind: 'comment',
      text: `cut ${n + 1}/${toolpaths.cuts.length}: ${cut.operation} ${cut.label}, width ${fmt(cut.widthMm)} mm, depth ${fmt(finalDepth)} mm in ${cut.depthPassesMm.length} pass${cut.depthPassesMm.length > 1 ? 'es' : ''}`,
    });
    const [x0, y0] = cut.points[0];
    body.push({ kind: 'rapid', to: { x: x0, y: y0 } });
    if (z !== s.clearanceZMm) body.push({ kind: 'rapid', to: { z: s.clearanceZMm } });
    cut.depthPassesMm.forEach((depth, pass) => {
      body.push({ kind: 'feed', to: { z: -depth }, feedMmPerMin: cut.plungeMmPerMin });
      for (const [x, y] of passPoints(cut, pass)) body.push({ kind: 'feed', to: { x, y }, feedMmPerMin: cut.feedMmPerMin });
    });
    body.push({ kind: 'rapid', to: { z: s.clearanceZMm } });
    z = s.clearanceZMm;
  });
  body.push({ kind: 'rapid', to: { z: s.safeZMm } }, { kind: 'spindle', mode: 'off' }, { kind: 'end' });
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
    { kind: 'comment', text: 'umbrafab engrave.ngc: engraving program, RS-274/NGC' },
    ...stockComments(job, 'mill'),
    ...safetyComments('mill'),
    { kind: 'comment', text: `T1: ${toolName('vbit', s)} - load before start` },
    ...(usesFlat ? [{ kind: 'comment', text: `T2: ${toolName('flat', s)}, depth ${fmt(s.flatDepthMm)} mm` } as const] : []),
    {
      kind: 'comment',
      text: `spindle ${formatNumber(s.spindleRpm, 0)} rpm, feed ${formatNumber(s.feedMmPerMin, 3, true)} mm/min, plunge ${formatNumber(s.plungeMmPerMin, 3, true)} mm/min, step-down at most ${fmt(s.stepDownMm)} mm`,
    },
    { kind: 'comment', text: `safe Z ${fmt(s.safeZMm)} mm, clearance Z ${fmt(s.clearanceZMm)} mm` },
    {
      kind: 'comment',
      text: `${cuts.length} cuts, deepest ${fmt(plan.toolpaths.maxDepthMm)} mm [limit ${fmt(plan.toolpaths.depthLimitMm)} mm], at most ${maxPasses} passes`,
    },
    ...figureComments({ rapidTravelMm: plan.toolpaths.rapidTravelMm, estimate: plan.estimate, title: job.title, process: 'mill' }),
  ];
  return serializeGcode([...header, ...plan.body], o.decimals);
}
