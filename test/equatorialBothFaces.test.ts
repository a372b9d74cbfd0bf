import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { ezdxfDump, type DxfDump } from './helpers/ezdxf.ts';
import { runRs274 } from './helpers/rs274.ts';
import { runCli } from './helpers/runCli.ts';

/**
 * An equatorial plate engraved on both faces (face.side both), one build:
 * - the hour lines of each face are uniform, 15° of turn about the rod per
 *   hour of hour angle (common practice: an equatorial face is parallel to
 *   the equator, so the rod's shadow turns with the Sun's hour angle), and
 *   the two faces turn opposite ways as drawn (each is seen from its own
 *   side);
 * - plate.dxf read back with ezdxf: the lower face's layers, mirrored about
 *   the flip axis x = width / 2, lie on the upper face's lines of the same
 *   times (the shadow of the rod points the same way through the plate at a
 *   given hour angle, so the two lines lie one over the other), and the
 *   outline and holes are their own mirror images, so they register after
 *   the turn;
 * - both sides' engraving programs pass `rs274 -g` (LinuxCNC's interpreter)
 *   and name the side and the flip in their headers;
 * - `umbrafab check` runs the year for both faces, each lit about half of it,
 *   and passes; a lower-face line moved 0.5 mm in plate.dxf fails, naming
 *   the lower face.
 */

const ROOT = resolve(import.meta.dirname, '..');
const SPEC = join(ROOT, 'fixtures/planar/equatorial-both.yaml');

interface MarkRow {
  readonly label: string;
  readonly hourAngleDeg: number;
  readonly x0Mm: number;
  readonly y0Mm: number;
  readonly x1Mm: number;
  readonly y1Mm: number;
}

let out: string;
let report: { plate: { widthMm: number; lengthMm: number; substyleX: number; faceOriginY: number }; marks: MarkRow[]; lowerFace: { marks: MarkRow[]; flipAxisXMm: number }; files: string[] };
let dump: DxfDump;

beforeAll(async () => {
  out = mkdtempSync(join(tmpdir(), 'umbrafab-eqboth-'));
  // Both engraving programs, so each side has an RS-274/NGC program for rs274 as well as the laser's.
  const spec = join(out, 'spec.yaml');
  writeFileSync(spec, `${readFileSync(SPEC, 'utf8')}engrave: { programs: both }\n`);
  const b = await runCli(['build', spec, '--out', out, '--force']);
  expect(b.code, b.err).toBe(0);
  report = JSON.parse(readFileSync(join(out, 'report.json'), 'utf8'));
  dump = ezdxfDump(join(out, 'plate.dxf'));
}, 120_000);

/** The direction of a mark from the rod, degrees. */
const angleOf = (m: MarkRow) => (Math.atan2(m.y1Mm - m.y0Mm, m.x1Mm - m.x0Mm) * 180) / Math.PI;
const wrap = (d: number) => ((((d + 180) % 360) + 360) % 360) - 180;

describe('equatorial plate engraved on both faces (face.side both)', () => {
  it('writes each side once: one outline, both faces as their own layers and programs, report and install for both', () => {
    for (const f of ['plate.dxf', 'engrave.ngc', 'engrave-lower.ngc', 'engrave-laser.gcode', 'engrave-laser-lower.gcode', 'template.pdf', 'install.md', 'stand.dxf', 'report.json']) expect(report.files).toContain(f);
    expect(dump.errors).toEqual([]);
    const on = (layer: string) => dump.entities.filter((e) => e.layer === layer);
    // One plate outline and five holes (four corners, the rod), drawn once.
    expect(on('CUT_PROFILE').filter((e) => e.type === 'LWPOLYLINE')).toHaveLength(1);
    expect(on('CUT_PROFILE').filter((e) => e.type === 'CIRCLE')).toHaveLength(5);
    expect(on('LINE_SCORE')).toHaveLength(report.marks.length);
    expect(on('LINE_SCORE_LOWER')).toHaveLength(report.lowerFace.marks.length);
    expect(on('TEXT_ENGRAVE_LOWER').length).toBeGreaterThan(100);
    const lowerLayer = dump.layerTable.find((l) => l.name === 'LINE_SCORE_LOWER');
    expect(lowerLayer?.on).toBe(true);
    expect(report.lowerFace.flipAxisXMm).toBeCloseTo(report.plate.widthMm / 2, 9);
    expect(report.plate.substyleX).toBeCloseTo(report.plate.widthMm / 2, 9);
    const install = readFileSync(join(out, 'install.md'), 'utf8');
    expect(install).toMatch(/engraved on both faces/);
    expect(install).toMatch(/flip axis, the vertical centre line through the rod hole/);
    expect(install).toMatch(/clear of every engraved line of both faces/);
    // A preview of each face: the lower one as seen from below, captioned so.
    for (const f of ['preview.svg', 'preview-lower.svg']) expect(report.files).toContain(f);
    const lowerSvg = readFileSync(join(out, 'preview-lower.svg'), 'utf8');
    expect(lowerSvg).toContain('LOWER FACE seen from below');
    expect(lowerSvg).not.toBe(readFileSync(join(out, 'preview.svg'), 'utf8'));
  });

  it("each face's lines are 15° of turn about the rod per hour (common practice), the two faces turning opposite ways", () => {
    let worst = 0;
    const senses: number[] = [];
    for (const marks of [report.marks, report.lowerFace.marks]) {
      const noon = marks.find((m) => m.hourAngleDeg === 0)!;
      const turn = (m: MarkRow) => wrap(angleOf(m) - angleOf(noon));
      const sense = Math.sign(turn(marks.find((m) => m.hourAngleDeg === 45)!));
      senses.push(sense);
      for (const m of marks) {
        worst = Math.max(worst, Math.abs(turn(m) - sense * m.hourAngleDeg));
        // Each line lies on a ray from the rod's centre (the sine of the angle between them; report.json rounds to 1e-6 mm).
        expect(Math.abs(m.x0Mm * (m.y1Mm - m.y0Mm) - m.y0Mm * (m.x1Mm - m.x0Mm)) / (Math.hypot(m.x0Mm, m.y0Mm) * Math.hypot(m.x1Mm - m.x0Mm, m.y1Mm - m.y0Mm))).toBeLessThan(1e-6);
      }
    }
    console.log(`equatorial both faces: ${report.marks.length} upper and ${report.lowerFace.marks.length} lower lines, worst turn error ${worst.toExponential(2)}°`);
    expect(worst).toBeLessThan(1e-5);
    expect(senses[0]).toBe(-senses[1]);
  });

  it('plate.dxf (ezdxf): the lower face mirrored about the flip axis lies on the upper face, and the outline and holes register', () => {
    const W = report.plate.widthMm;
    const lines = (layer: string) => dump.entities.filter((e) => e.layer === layer && e.type === 'LWPOLYLINE').map((e) => e.points!.map(([x, y]) => [x, y] as const));
    const upper = lines('LINE_SCORE');
    const lower = lines('LINE_SCORE_LOWER');
    let worst = 0;
    for (const l of lower) {
      const mirrored = l.map(([x, y]) => [W - x, y] as const);
      // The nearest upper line: the same time's line, under it through the plate.
      const d = Math.min(...upper.map((u) => Math.max(...mirrored.map(([x, y], i) => Math.hypot(x - u[i][0], y - u[i][1])))));
      worst = Math.max(worst, d);
    }
    console.log(`equatorial both faces: ${lower.length} lower lines mirrored onto the upper face's, worst ${worst.toExponential(2)} mm`);
    expect(worst).toBeLessThan(1e-5);
    const circles = dump.entities.filter((e) => e.layer === 'CUT_PROFILE' && e.type === 'CIRCLE');
    for (const c of circles) {
      const twin = circles.find((o) => Math.abs(o.center![0] - (W - c.center![0])) < 1e-6 && Math.abs(o.center![1] - c.center![1]) < 1e-6 && Math.abs(o.radius! - c.radius!) < 1e-9);
      expect(twin, `hole at ${c.center} has its mirror image`).toBeDefined();
    }
    const outline = dump.entities.find((e) => e.layer === 'CUT_PROFILE' && e.type === 'LWPOLYLINE')!.points!;
    const xs = outline.map((p) => p[0]);
    expect(Math.min(...xs) + Math.max(...xs)).toBeCloseTo(W, 6);
  });

  it("both sides' programs pass rs274 -g and name the side and the flip", () => {
    for (const [name, side] of [['engrave.ngc', 'SIDE 1 of 2: UPPER FACE'], ['engrave-lower.ngc', 'SIDE 2 of 2: LOWER FACE']] as const) {
      const text = readFileSync(join(out, name), 'utf8');
      expect(text).toContain(`(umbrafab ${name}:`);
      expect(text).toContain(side);
      expect(text).toMatch(/FLIP: turn the plate over about the flip axis x = [\d.]+ mm/);
      const { commands } = runRs274(text, name); // throws on an rs274 error
      expect(commands.filter((c) => c.kind === 'STRAIGHT_FEED').length).toBeGreaterThan(100);
    }
    for (const [name, side] of [['engrave-laser.gcode', 'SIDE 1 of 2'], ['engrave-laser-lower.gcode', 'SIDE 2 of 2']] as const) {
      const text = readFileSync(join(out, name), 'utf8');
      expect(text).toContain(`(umbrafab ${name}:`);
      expect(text).toContain(side);
    }
  });

  it('check runs the year for both faces, each lit about half of it, and passes; a lower-face line moved 0.5 mm fails', async () => {
    const r = await runCli(['check', SPEC, '--out', join(out, 'check'), '--force']);
    expect(r.code, r.err).toBe(0);
    expect(r.out).toMatch(/umbrafab check: equatorial upper face/);
    expect(r.out).toMatch(/umbrafab check: equatorial lower face/);
    expect(r.out.match(/pass: every line and curve within tolerance/g)).toHaveLength(2);
    const json = JSON.parse(readFileSync(join(out, 'check', 'check.json'), 'utf8'));
    const noonDays = [json, json.lowerFace].map((f: { marks: { hourAngleDeg: number; litDays: number }[] }) => f.marks.find((m) => m.hourAngleDeg === 0)!.litDays);
    console.log(`equatorial both faces: noon line lit on ${noonDays[0]} (upper) and ${noonDays[1]} (lower) days of ${json.year}; worst ${json.worst.errorMm} mm (upper), ${json.lowerFace.worst.errorMm} mm (lower)`);
    // Each face sees the Sun from its equinox to the next (about 186 and 179 days in the north, common practice); together the whole year.
    for (const d of noonDays) expect(d).toBeGreaterThan(170), expect(d).toBeLessThan(195);
    expect(noonDays[0] + noonDays[1]).toBeGreaterThanOrEqual(365);

    // Move one lower-face line square to itself in plate.dxf: the lower face's check must fail on that line.
    const target = report.lowerFace.marks[report.lowerFace.marks.length >> 1];
    const W = report.plate.widthMm;
    const { faceOriginY } = report.plate;
    // The lower face's coordinates on the turned plate: x from the flip axis.
    const ends = [[target.x0Mm + W / 2, target.y0Mm + faceOriginY], [target.x1Mm + W / 2, target.y1Mm + faceOriginY]];
    const len = Math.hypot(ends[1][0] - ends[0][0], ends[1][1] - ends[0][1]);
    const across = [(-(ends[1][1] - ends[0][1]) / len) * 0.5, ((ends[1][0] - ends[0][0]) / len) * 0.5];
    const lines = readFileSync(join(out, 'plate.dxf'), 'utf8').split('\n');
    let layer = '';
    let moved = 0;
    for (let i = 0; i + 3 < lines.length; i += 2) {
      const code = lines[i].trim();
      if (code === '8') layer = lines[i + 1].trim();
      if (code === '10' && layer === 'LINE_SCORE_LOWER') {
        const [x, y] = [Number(lines[i + 1]), Number(lines[i + 3])];
        if (ends.some(([px, py]) => Math.abs(px - x) < 1e-5 && Math.abs(py - y) < 1e-5)) {
          lines[i + 1] = String(x + across[0]);
          lines[i + 3] = String(y + across[1]);
          moved++;
        }
      }
    }
    expect(moved).toBe(2);
    const file = join(out, 'moved.dxf');
    writeFileSync(file, lines.join('\n'));
    const clean = await runCli(['check', SPEC, '--plate', join(out, 'plate.dxf')]);
    expect(clean.code, clean.err).toBe(0);
    const bad = await runCli(['check', SPEC, '--plate', file]);
    console.log(`equatorial both faces: lower line ${target.label} moved 0.5 mm -> ${bad.err.trim()}`);
    expect(bad.code).toBe(1);
    expect(bad.err).toContain(`mark ${target.label} plusF on the lower face is`);
  }, 120_000);
});
