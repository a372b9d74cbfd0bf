import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { layoutDial, parseSpec, plateDrawing, sheetParts, SpecError, timeFaceExtras } from '@umbrafab/geometry';
import { buildFiles, readSpecFile } from '@umbrafab/cli';
import { cutFromSpec } from '@umbrafab/fabricate';
import { expectClose } from './helpers/closeTo.ts';
import { canonTimes, checkMillStartEnd, feedRuns, motions, runRs274, xyLength } from './helpers/rs274.ts';
import { shapelyCheck } from './helpers/cutCheck.ts';

// Outside validators: Debian's linuxcnc-uspace `rs274 -g` (the standalone
// RS274NGC interpreter) reads cut.ngc, and every check below reads its
// canonical machine commands, not the program text; the tool paths' geometry
// against the nominal parts is measured with shapely (Debian python3-shapely,
// test/helpers/cut_check.py).

const ROOT = resolve(import.meta.dirname, '..');
const EPS_MM = 1e-4; // rs274 prints 4 decimals

const CASES = [
  { name: 'the demo on a router (aluminium 3 mm, climb)', file: 'fixtures/specs/cut-demo-router.yaml', patch: {} },
  { name: 'brass 5 mm (golden spec)', file: 'fixtures/golden-specs/router-brass.yaml', patch: {} },
  {
    name: 'demo, conventional, 3.2 mm holes drilled, 2 tabs, mist coolant, tool words',
    file: 'fixtures/specs/cut-demo-router.yaml',
    patch: { holes: { diameter: 3.2 }, engrave: { toolWords: true, coolant: 'mist', cut: { direction: 'conventional', tabs: 2, tabWidthMm: 6, tabHeightMm: 1 } } },
  },
] as const;

type Json = Record<string, any>;

function merge(a: Json, b: Json): Json {
  const out: Json = { ...a };
  for (const [k, v] of Object.entries(b)) out[k] = v && typeof v === 'object' && !Array.isArray(v) && typeof a[k] === 'object' ? merge(a[k], v) : v;
  return out;
}

describe.each(CASES)('cut.ngc: $name', ({ file, patch }) => {
  const raw = readSpecFile(join(ROOT, file)) as unknown as Json;
  const spec = parseSpec(merge(raw, patch));
  const layout = layoutDial(spec);
  const extras = timeFaceExtras(layout);
  const drawing = plateDrawing(layout, extras.lines, extras.text);
  const built = buildFiles(spec);
  const c = spec.engrave.cut;
  const t = spec.plate.thickness;
  const toolR = spec.process.kerf / 2;

  it('is written for a router, passes rs274, and meets the depth, tab, order and offset checks', async () => {
    const b = await built;
    const f = b.files.find((x) => x.name === 'cut.ngc');
    expect(f, 'cut.ngc').toBeDefined();
    const text = new TextDecoder().decode(f!.bytes);
    const report = b.report.cutting as Json;
    const { commands } = runRs274(text, 'cut.ngc'); // throws on an rs274 error
    const ms = motions(commands);
    const e = spec.engrave;
    checkMillStartEnd(text, commands, { safeZMm: e.safeZMm, spindleRpm: report.spindleRpm, spindleDwellS: e.spindleDwellS, park: [e.parkXMm ?? 0, e.parkYMm ?? drawing.lengthMm], coolant: e.coolant }, (ok, what) => expect(ok, what).toBe(true));
    if (e.toolWords) expect(commands.find((k) => k.kind === 'CHANGE_TOOL')).toEqual({ kind: 'CHANGE_TOOL', tool: 3 });
    // The offset is in the paths: no cutter compensation words outside the comments.
    expect(text.replace(/\([^)]*\)/g, '')).not.toMatch(/G4[12]\b/);

    // Deepest Z = -(thickness + breakthrough), and nothing below it.
    const planned = -(t + c.breakthroughMm);
    const deepest = ms.reduce((lo, m) => Math.min(lo, m.to.z), Infinity);
    expectClose(deepest, planned, 0.001, 'deepest Z', ' mm');
    expect(deepest).toBeGreaterThanOrEqual(planned - EPS_MM);

    // One feed run per operation (a drilled hole: one per peck), in the report's order.
    const runs = feedRuns(ms);
    const ops = report.operations as { part: string; feature: string; operation: string }[];
    const drills = ops.filter((o) => o.operation === 'drill').length;
    expect(runs.length).toBe(ops.length + drills * (report.passes - 1));
    const copies = sheetParts(layout, drawing).flatMap((p) => Array.from({ length: p.quantity ?? 1 }, (_, k) => ((p.quantity ?? 1) === 1 ? p : { ...p, name: `${p.name}-${k + 1}` })));
    const placed = copies.map((part, i) => ({ part, originMm: report.parts[i].originMm as [number, number] }));
    expect(report.parts.map((p: Json) => p.name)).toEqual(placed.map((p) => p.part.name));

    // Geometry with shapely: every run at its final depth keeps the tool centre
    // one tool radius from the nominal edge it cuts (the offset computed here,
    // chords within 0.005 mm and rs274's 4 decimals), never inside a part.
    const checks = shapelyCheck(placed, runs, planned);
    let worst = 0;
    const opOfRun = ops.flatMap((o) => (o.operation === 'drill' ? Array.from({ length: report.passes as number }, () => o) : [o]));
    checks.forEach((k, i) => {
      expect(k.inPart, `run ${i} (${k.part} ${k.side}) has tool-centre points inside the part`).toBe(0);
      if (k.distMin === null || k.distMax === null) return;
      // A drilled hole is the tool's size within 0.05 mm (DRILL_MATCH_MM): the centre sits (d - D)/2 from its edge.
      const want = opOfRun[i]?.operation === 'drill' ? spec.holes.diameter / 2 : toolR;
      worst = Math.max(worst, Math.abs(k.distMin - want), Math.abs(k.distMax - want));
    });
    console.log(`${file}: tool-centre distance from the nominal edges ${toolR} mm within ${worst.toExponential(2)} mm over ${checks.length} runs`);
    expect(worst).toBeLessThanOrEqual(0.01);

    // Inside features before the profile around them: for every part, each run
    // inside it comes before the run along its outline; the outline runs go
    // the milling direction's way (climb with M3: outer counter-clockwise).
    const partNames = placed.map((p) => p.part.name);
    for (const name of partNames) {
      const idx = checks.map((k, i) => ({ k, i })).filter(({ k }) => k.part === name);
      const outside = idx.filter(({ k }) => k.side === 'outside');
      expect(outside.length, `${name}: one outer profile`).toBe(1);
      for (const { i } of idx.filter(({ k }) => k.side === 'inside')) expect(i).toBeLessThan(outside[0].i);
      expect(Math.sign(outside[0].k.area)).toBe(c.direction === 'climb' ? 1 : -1);
      // Cut-outs and helically bored holes run the other way round.
      for (const { k } of idx.filter(({ k }) => k.side === 'inside' && k.points > 2)) expect(Math.sign(k.area)).toBe(c.direction === 'climb' ? -1 : 1);
    }
    // The report's list of operations matches what shapely finds, run by run.
    expect(checks.map((k) => `${k.part} ${k.side}`)).toEqual(opOfRun.map((o) => `${o.part} ${o.operation === 'outside loop' ? 'outside' : 'inside'}`));

    // Holding tabs: in each outer profile, the deepest passes rise to the tab top
    // (Z = -thickness + tab height) over tabWidth + tool diameter, tabs of them per pass.
    const zTab = -t + c.tabHeightMm;
    const raised = c.tabWidthMm + spec.process.kerf;
    for (const [ri, k] of checks.entries()) {
      if (k.side !== 'outside') continue;
      const run = runs[ri];
      // A stretch: level moves at the tab top, entered by a vertical rise and left by a vertical descent.
      const stretches: number[] = [];
      let len = -1;
      run.forEach((m, j) => {
        const onTab = Math.abs(m.from.z - zTab) < EPS_MM && Math.abs(m.to.z - zTab) < EPS_MM && xyLength(m) > 0;
        if (onTab) {
          if (len < 0) {
            const up = run[j - 1];
            expect(up && xyLength(up) === 0 && up.to.z > up.from.z, `${k.part}: the tool rises straight up onto each tab`).toBe(true);
            len = 0;
          }
          len += xyLength(m);
        } else if (len >= 0) {
          expect(xyLength(m) === 0 && m.to.z < m.from.z, `${k.part}: the tool goes straight down after each tab`).toBe(true);
          stretches.push(len);
          len = -1;
        }
      });
      // Every lap deeper than the tab top lifts over every tab: the passes are
      // (t + breakthrough)·k/n, k = 1…n (equal steps), each one lap of the loop.
      const n = report.passes as number;
      const deeper = Array.from({ length: n }, (_, i) => ((t + c.breakthroughMm) * (i + 1)) / n).filter((d) => d > t - c.tabHeightMm + 1e-9).length;
      expect(stretches.length, `${k.part}: tab stretches`).toBe(c.tabs * deeper);
      for (const s of stretches) expectClose(s, raised, 0.01, `${k.part} tab stretch`, ' mm');
      // The tool is below the tab top elsewhere in the final pass: the tabs are the only bridges.
      expect(run.some((m) => Math.abs(m.to.z - planned) < EPS_MM)).toBe(true);
    }
    expect(report.tabs.placed).toBe(c.tabs * placed.length);

    // The program's own time estimate agrees with rs274's moves at the spec's rapid rate.
    const times = canonTimes(commands, e.rapidMmPerMin);
    console.log(`${file}: cut.ngc ${times.totalS.toFixed(1)} s (estimate ${report.timeEstimateS.toFixed(1)} s): cutting ${times.cuttingS.toFixed(1)} s, plunges ${times.plungeS.toFixed(1)} s, rapids ${times.rapidS.toFixed(1)} s; ${runs.length} runs, deepest ${deepest.toFixed(4)} mm`);
    expectClose(times.totalS, report.timeEstimateS, 0.005 * times.totalS, 'estimate vs rs274 time', ' s');
  });
});

describe('cut.ngc refuses a tool wider than a feature', () => {
  it('names the field, the feature and both sizes (SpecError, exit 1)', async () => {
    const raw = readSpecFile(join(ROOT, 'fixtures/specs/cut-demo-router.yaml')) as unknown as Json;
    const spec = parseSpec(merge(raw, { holes: { diameter: 3 } }));
    const layout = layoutDial(spec);
    const err = await cutFromSpec(spec, layout, plateDrawing(layout)).then(
      () => null,
      (x: unknown) => x,
    );
    expect(err).toBeInstanceOf(SpecError);
    const e = err as SpecError;
    expect(e.field).toBe('process.kerf');
    expect(e.message).toMatch(/3\.175 mm tool is not narrower than the plate's hole 1 \(Ø 3\.000 mm\), which is 3\.000 mm wide/);
  });

  it('is not written for other processes, nor with engrave.cut.write: false', async () => {
    const demo = await buildFiles(readSpecFile(join(ROOT, 'fixtures/demo.yaml')));
    expect(demo.files.map((f) => f.name)).not.toContain('cut.ngc');
    const raw = readSpecFile(join(ROOT, 'fixtures/specs/cut-demo-router.yaml')) as unknown as Json;
    const off = await buildFiles(parseSpec(merge(raw, { engrave: { cut: { write: false } } })));
    expect(off.files.map((f) => f.name)).not.toContain('cut.ngc');
  });
});
