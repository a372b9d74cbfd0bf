import type { EngraveJob } from './engraveInput.ts';
import { validateEngraveJob } from './engraveInput.ts';
import { estimateTime, type TimeEstimate } from './estimateTime.ts';
import { formatNumber } from './formatNumber.ts';
import { serializeProgram, type GcodeRecord } from './gcodeRecords.ts';
import type { EngraveSettings } from './materialPresets.ts';
import type { LaserFill, LaserPass } from './laserFill.ts';
import { orderPaths } from './orderPaths.ts';
import { parkPoint } from './millProgram.ts';
import { figureComments, safetyComments, stockComments } from './headerComments.ts';
import { resolveWriterOptions, type GcodeWriterOptions } from './writerOptions.ts';

/**
 * engrave-laser.gcode: a laser program in the GRBL laser-mode dialect (GRBL
 * 1.1 "Laser Mode" notes, $32=1; memory): `M4` dynamic power, power as S
 * words (S = power % × laserMaxS / 100), `G1` at the laser speed with the
 * beam on, `S0` before every `G0` travel so the beam is off during travel
 * even on a controller that does not blank G0 itself, no Z words at all (focus
 * is set by hand), end `S0`, the park move `G0 X Y` (engrave.parkXMm/parkYMm,
 * default X0 at the stock's far edge), `M5`, `M2`. No `%` lines: GRBL senders
 * do not all accept them. Every path is traced once along its
 * centre line (a score line), or, with a LaserFill (laserFillPasses), the
 * fill passes that burn every line as wide as it is drawn.
 *
 * The same text is valid RS-274/NGC (S words and M4 are spindle words there)
 * and is checked with `rs274 -g`.
 */

export interface LaserPlan {
  /** Ordered single-pass strokes (the job's centre lines, or the fill passes). */
  readonly strokes: readonly LaserPass[];
  readonly body: readonly GcodeRecord[];
  readonly estimate: TimeEstimate;
  readonly rapidTravelMm: { readonly inputOrder: number; readonly ordered: number; readonly lowerBound: number };
  /** The S word written while the beam is on. */
  readonly powerS: number;
  /** The fill the passes came from; undefined = centre-line scoring. */
  readonly fill?: LaserFill;
}

/**
 * Build the laser program's records and figures (what toLaserGcode writes).
 * @param options decimals (default 3), optimizeOrder (default true)
 */
export function planLaser(job: EngraveJob, settings: EngraveSettings, options: GcodeWriterOptions = {}, fill?: LaserFill): LaserPlan {
  validateEngraveJob(job);
  const o = resolveWriterOptions(options);
  const s = settings;
  const powerS = (s.laserPowerPct * s.laserMaxS) / 100;
  const strokes: readonly LaserPass[] = fill ? fill.passes : job.paths.map((p) => ({ points: p.points, closed: p.closed, operation: p.operation, label: p.label }));
  const ordered = orderPaths(strokes, { optimize: o.optimizeOrder });
  const body: GcodeRecord[] = [{ kind: 'modal', words: 'G21 G90 G17 G94' }, { kind: 'spindle', mode: 'ccw', s: 0 }];
  ordered.paths.forEach((p, n) => {
    body.push({ kind: 'comment', text: `stroke ${n + 1}/${ordered.paths.length}: ${p.operation} ${p.label}` });
    body.push({ kind: 'rapid', to: { x: p.points[0][0], y: p.points[0][1] } });
    body.push({ kind: 'power', s: powerS });
    const trace = p.closed ? [...p.points.slice(1), p.points[0]] : p.points.slice(1);
    for (const [x, y] of trace) body.push({ kind: 'feed', to: { x, y }, feedMmPerMin: s.laserSpeedMmPerMin });
    body.push({ kind: 'power', s: 0 });
  });
  // Park with the beam off (S0 above) so the part is free to lift out.
  const [px, py] = parkPoint(s, job.stock.lengthMm);
  body.push({ kind: 'rapid', to: { x: px, y: py } }, { kind: 'spindle', mode: 'off' }, { kind: 'end' });
  const estimate = estimateTime(body, { rapidMmPerMin: s.rapidMmPerMin });
  return { strokes: ordered.paths, body, estimate, rapidTravelMm: ordered.rapidTravelMm, powerS, fill };
}

/**
 * Write engrave-laser.gcode for a job.
 *
 * @param settings uses laserPowerPct, laserSpeedMmPerMin, laserMaxS, rapidMmPerMin
 * @param options decimals (default 3), optimizeOrder (default true)
 * @returns program text, '\n' line ends, byte-stable for the same input
 * @example toLaserGcode(job, resolveEngraveSettings('acrylic'))
 */
export function toLaserGcode(job: EngraveJob, settings: EngraveSettings, options: GcodeWriterOptions = {}, planned?: LaserPlan, fill?: LaserFill): string {
  const o = resolveWriterOptions(options);
  // A caller that already planned (for the report's figures) passes the plan, so the paths are ordered once.
  const plan = planned ?? planLaser(job, settings, o, fill);
  const f = fill ?? planned?.fill;
  const s = settings;
  const header: GcodeRecord[] = [
    { kind: 'comment', text: `umbrafab ${job.side?.fileName ?? 'engrave-laser.gcode'}: laser scoring program, GRBL laser mode [$32=1]` },
    ...(job.side?.lines ?? []).map((text): GcodeRecord => ({ kind: 'comment', text })),
    ...stockComments(job, 'laser'),
    ...safetyComments('laser'),
    {
      kind: 'comment',
      text: `laser: M4 dynamic power, ${formatNumber(s.laserPowerPct, 3, true)} % = S${formatNumber(plan.powerS, 3, true)} of S${formatNumber(s.laserMaxS, 3, true)}, speed ${formatNumber(s.laserSpeedMmPerMin, 3, true)} mm/min, S0 during travel`,
    },
    {
      kind: 'comment',
      text: f
        ? `fill: beam ${formatNumber(f.beamMm, 3, true)} mm, concentric passes every ${formatNumber(f.intervalMm, 3, true)} mm inside the union of the lines [each line as wide as drawn, overlaps burned once]; ${f.scored} lines no wider than the beam scored along their centre; ${plan.strokes.length} passes`
        : `${plan.strokes.length} strokes, each traced once along its centre line [scoring: engrave.laserFill score]`,
    },
    ...figureComments({ rapidTravelMm: plan.rapidTravelMm, estimate: plan.estimate, title: job.title, process: 'laser' }),
  ];
  return serializeProgram(header, plan.body, o.decimals);
}
