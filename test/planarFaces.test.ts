import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { checkPlanar, layoutPlanar, parseSpec, planarGnomonSolid, type PlanarLayout } from '@umbrafab/geometry';
import { buildAnyFiles } from '@umbrafab/cli';
import { runAdmesh } from './helpers/admesh.ts';
import { ezdxfDump } from './helpers/ezdxf.ts';

const FIXTURES = ['garden-horizontal', 'wall-declining', 'wall-reclining', 'meridian-east', 'equatorial', 'equatorial-lower'];
const specOf = (name: string) => parseSpec(parse(readFileSync(new URL(`../fixtures/planar/${name}.yaml`, import.meta.url), 'utf8')));

describe('every planar face type: build, read back, check on the real gnomon', () => {
  for (const name of FIXTURES) {
    it(`${name}: plate.dxf passes ezdxf's audit, gnomon.stl is watertight (admesh), the year's check is within 0.001 mm`, async () => {
      const spec = specOf(name);
      const built = await buildAnyFiles(spec);
      const again = await buildAnyFiles(spec);
      expect(again.files.map((f) => Buffer.from(f.bytes).toString('base64'))).toEqual(built.files.map((f) => Buffer.from(f.bytes).toString('base64')));
      const dir = mkdtempSync(join(tmpdir(), 'umbrafab-planar-'));
      for (const f of built.files) writeFileSync(join(dir, f.name), f.bytes);
      // Outside readers: ezdxf (Debian python3-ezdxf) audit, admesh (Debian) on the gnomon.
      const dxf = ezdxfDump(join(dir, 'plate.dxf'));
      expect(dxf.errors).toEqual([]);
      expect(dxf.insunits).toBe(4);
      const layout = built.layout as PlanarLayout;
      expect(dxf.entities.filter((e) => e.layer !== 'REFERENCE_NO_CUT').length).toBeGreaterThan(layout.marks.length / 2);
      const mesh = runAdmesh(join(dir, 'gnomon.stl'));
      expect(mesh.facetsWith1DisconnectedEdge + mesh.facetsWith2DisconnectedEdges + mesh.facetsWith3DisconnectedEdges).toBe(0);
      expect(mesh.backwardsEdges).toBe(0);
      expect(mesh.parts).toBe(1);
      const part = planarGnomonSolid(layout);
      // Closed-form volume of the prism: profile area × thickness (a 32-gon rod: the polygon's area × length).
      const expected = part.kind === 'fin' ? part.profileAreaMm2 * part.thicknessMm : 16 * (part.thicknessMm / 2) ** 2 * Math.sin((2 * Math.PI) / 32) * (part.belowFaceMm + layout.gnomon.heightMm);
      expect(Math.abs(mesh.volumeMm3 - expected) / expected).toBeLessThan(1e-3);

      const check = checkPlanar(layout);
      const reached = check.marks.filter((m) => m.reachedDays > 0);
      console.log(`${name}: ${layout.faceType}, style ${layout.gnomon.styleHeightDeg.toFixed(2)}°, ${check.marks.length} lines (${reached.length} reached), ${check.sunPositions} sun positions, worst ${check.worst ? `${check.worst.errorMm.toExponential(2)} mm / ${check.worst.errorS.toExponential(2)} s (${check.worst.label} ${check.worst.edge}, ${check.worst.date})` : 'none'}; curves ${check.curves.map((c) => `${c.label} ${c.worstMm.toExponential(2)} mm / ${c.worstS.toFixed(2)} s over ${c.samples}`).join('; ') || 'none'}`);
      expect(check.pass).toBe(true);
      expect(reached.length).toBe(check.marks.length);
      for (const m of check.marks) expect(Math.abs(m.errorMm.worst)).toBeLessThanOrEqual(0.001);
      // With a nodus: every date line and mean-time curve drawn is checked, each within 0.001 mm of the simulated nodus shadow.
      expect(check.curves.length).toBe(layout.curves.length);
      if (spec.gnomon.nodus) expect(check.curves.length).toBeGreaterThan(0);
      for (const c of check.curves) expect(c.worstMm, c.label).toBeLessThanOrEqual(0.001);
      expect(check.stepMinutes).toBe(1);
      expect(check.everyDays).toBe(1);
    });
  }

  it('a line moved by 0.01 mm is caught (tolerance 0.001 mm)', () => {
    const layout = layoutPlanar(specOf('wall-declining'));
    const marks = layout.marks.filter((m) => !m.underGnomon);
    const k = marks.findIndex((m) => m.label === '15:00');
    const m = marks[k];
    const dx = m.b[0] - m.a[0];
    const dy = m.b[1] - m.a[1];
    const l = Math.hypot(dx, dy);
    const shift = (p: readonly [number, number]): [number, number] => [p[0] - (dy / l) * 0.01, p[1] + (dx / l) * 0.01];
    const moved = marks.map((x, i) => (i === k ? { ...x, a: shift(x.a), b: shift(x.b) } : x));
    const check = checkPlanar(layout, { marks: moved, toleranceMm: 0.001, everyDays: 10 });
    expect(check.pass).toBe(false);
    expect(check.failures.map((f) => f.label)).toEqual(['15:00']);
    expect(Math.abs(check.failures[0].errorMm)).toBeGreaterThan(0.0099);
    expect(Math.abs(check.failures[0].errorMm)).toBeLessThan(0.0101);
  });

  // The same faces given a nodus, date lines and mean-time curves (the
  // declining wall has them in its fixture): the check's curves against the
  // project's own simulated nodus shadow, the Sun from astronomy-engine
  // (sunTrack, topocentric, every day of the year).
  for (const name of ['garden-horizontal', 'wall-reclining', 'meridian-east']) {
    it(`${name} with a nodus: every date line and mean-time curve within 0.001 mm of the simulated shadow`, () => {
      const raw = parse(readFileSync(new URL(`../fixtures/planar/${name}.yaml`, import.meta.url), 'utf8'));
      const layout = layoutPlanar(parseSpec({ ...raw, gnomon: { ...raw.gnomon, nodus: true }, dial: { ...raw.dial, meanTimeCurves: true }, calendar: { ...raw.calendar, lines: ['solstices', 'equinox'] } }));
      const check = checkPlanar(layout, { toleranceMm: 0.001 });
      console.log(`${name} + nodus: ${check.curves.map((c) => `${c.label} ${c.worstMm.toExponential(2)} mm / ${c.worstS.toFixed(3)} s over ${c.samples}`).join('; ')}`);
      expect(check.curves.filter((c) => c.kind === 'meanTime').length).toBeGreaterThan(3);
      expect(check.curves.filter((c) => c.kind === 'date').length).toBeGreaterThan(0);
      for (const c of check.curves) expect(c.worstMm, c.label).toBeLessThanOrEqual(0.001);
      expect(check.pass).toBe(true);
    });
  }

  it('a stretch of a mean-time curve moved by 0.05 mm is caught, the other curves still pass (tolerance 0.001 mm)', () => {
    const layout = layoutPlanar(specOf('wall-declining'));
    const k = layout.curves.findIndex((c) => c.label === '12:00 mean time');
    const curve = layout.curves[k];
    const path = curve.paths[0];
    // Move ten vertices from the middle of the first run square to the run, by 0.05 mm.
    const i0 = Math.floor(path.length / 2) - 5;
    const moved = path.map((p, i): readonly [number, number] => {
      if (i < i0 || i >= i0 + 10) return p;
      const [a, b] = [path[i0 - 1], path[i0 + 10]];
      const l = Math.hypot(b[0] - a[0], b[1] - a[1]);
      return [p[0] - ((b[1] - a[1]) / l) * 0.05, p[1] + ((b[0] - a[0]) / l) * 0.05];
    });
    const curves = layout.curves.map((c, j) => (j === k ? { ...c, paths: [moved, ...c.paths.slice(1)] } : c));
    const check = checkPlanar(layout, { curves, toleranceMm: 0.001 });
    expect(check.pass).toBe(false);
    expect(check.curves.filter((c) => !c.pass).map((c) => c.label)).toEqual(['12:00 mean time']);
    const hit = check.curves.find((c) => c.label === '12:00 mean time')!;
    expect(hit.worstMm).toBeGreaterThan(0.04);
    expect(hit.worstMm).toBeLessThan(0.0502);
  });

  it('a declining wall leaves out the hours it cannot see and says so', () => {
    const layout = layoutPlanar(specOf('wall-declining'));
    expect(layout.leftOut.map((l) => l.label)).toEqual(['06:00', '06:30', '07:00']);
    expect(layout.notes.join(' ')).toMatch(/left out: 06:00, 06:30, 07:00/);
  });

  it('a date line whose nodus shadow falls beyond the hour lines is named in the notes, not dropped unsaid (wall and level faces at one site)', () => {
    const raw = parse(readFileSync(new URL('../fixtures/planar/wall-declining.yaml', import.meta.url), 'utf8'));
    const short = layoutPlanar(parseSpec(raw));
    // On a wall at 47.4° N the summer Sun stands high: the June nodus shadow lies well below lines of the default length.
    expect(short.curves.map((c) => c.label)).not.toContain('June solstice');
    expect(short.curves.map((c) => c.label)).toContain('December solstice');
    expect(short.notes.join(' ')).toMatch(/not drawn: the nodus shadow falls beyond the hour lines' field all along them \(June solstice/);
    // Laid level at the same site the proportions turn round: the high June Sun's short shadow falls among the lines, the low Sun's long ones beyond them.
    const level = layoutPlanar(parseSpec({ ...raw, face: { type: 'horizontal' } }));
    expect(level.curves.map((c) => c.label)).toContain('June solstice');
    expect(level.curves.map((c) => c.label)).not.toContain('December solstice');
    expect(level.notes.join(' ')).toMatch(/not drawn: the nodus shadow falls beyond the hour lines' field all along them \(March equinox, December solstice/);
  });

  it('the polar default is untouched: a spec without face builds the polar plate; a planar spec is refused by polar-only paths', async () => {
    const raw = parse(readFileSync(new URL('../fixtures/demo.yaml', import.meta.url), 'utf8'));
    const polar = await buildAnyFiles(parseSpec(raw));
    // The polar layout (marks at xMm along the style), not a planar one.
    expect('xMm' in polar.layout.marks[0]).toBe(true);
    expect('kind' in polar.layout && polar.layout.kind === 'planar').toBe(false);
    expect((polar.report.spec as Record<string, unknown>).face).toBeUndefined();
    const { layoutDial } = await import('@umbrafab/geometry');
    expect(() => layoutDial(specOf('garden-horizontal'))).toThrow(/face\.type/);
  });
});
