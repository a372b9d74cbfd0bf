import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { parse as parseYaml } from 'yaml';
import { describe, expect, it } from 'vitest';
import { Body, Equator, Horizon, MakeTime, Observer } from './checkAstronomy.ts';
import { faceToWorld, layoutPlanar, parseSpec, planarPictureSun, planarPlateDrawing, projectToPicture, viewPlanarAssembly, type Vec2, type Vec3 } from '@umbrafab/geometry';

const ROOT = resolve(import.meta.dirname, '..');
const DEG = Math.PI / 180;
const TIME = '10:00';

/** Unit vector (east, north, up) from astronomy-engine Horizon azimuth/altitude, degrees. */
const enu = (az: number, alt: number): Vec3 => [Math.cos(alt * DEG) * Math.sin(az * DEG), Math.cos(alt * DEG) * Math.cos(az * DEG), Math.sin(alt * DEG)];

// The fin's (or rod's) shadow drawn on the face in assembly.svg's picture must lie on the face's own line for
// the reading shown. The line is the project's layout (layoutPlanar's mark for 10:00, held to Waugh 1973's
// formulae in hourLine.test.ts); the sun is astronomy-engine's (Equator + Horizon, topocentric, no refraction)
// at the instant the picture names, not the project's own sun track.
describe.each(['garden-horizontal', 'wall-declining', 'wall-reclining', 'meridian-east', 'equatorial', 'equatorial-lower'])('the assembly picture of fixtures/planar/%s.yaml', (name) => {
  const spec = parseSpec({ ...parseYaml(readFileSync(join(ROOT, `fixtures/planar/${name}.yaml`), 'utf8')), pictures: { time: TIME } });
  const layout = layoutPlanar(spec);
  const drawing = planarPlateDrawing(layout);
  const date = `${spec.calendar.year}-${(spec.site.latitude >= 0) !== (spec.face?.side === 'lower') ? '06' : '12'}-21`;

  it(`draws the gnomon's shadow on the face along the ${TIME} line (sun from astronomy-engine)`, () => {
    const { sun, note } = planarPictureSun(layout, date, TIME);
    expect(note).toBeNull();
    const observer = new Observer(spec.site.latitude, spec.site.longitude, 0);
    const time = MakeTime(new Date(sun.utc));
    const eq = Equator(Body.Sun, time, observer, true, true);
    const hor = Horizon(time, observer, eq.ra, eq.dec);
    const astro = enu(hor.azimuth, hor.altitude);
    const sunAngle = Math.acos(Math.min(1, astro[0] * sun.direction[0] + astro[1] * sun.direction[1] + astro[2] * sun.direction[2])) / DEG;
    // The picture's own sun agrees with astronomy-engine's (the same model through sunTrack); the shadow below is cast from astronomy-engine's.
    expect(sunAngle, 'picture sun vs astronomy-engine, degrees').toBeLessThan(1e-3);
    const pic = viewPlanarAssembly(layout, drawing, { ...sun, direction: astro })!;
    expect(pic).not.toBeNull();

    // The face shadow as painted (picture mm), mapped back onto the face by the view's own projection.
    const item = pic.items.find((i) => i.kind === 'shadow' && i.on === 'face');
    expect(item && item.kind === 'shadow' && item.polygons.length, 'a face shadow in the picture').toBeTruthy();
    const polygons = item!.kind === 'shadow' ? item!.polygons : [];
    const at = (x: number, y: number) => projectToPicture(pic.view, faceToWorld(pic.assembly.face, [x, y, 0]));
    const o = at(0, 0);
    const ex = [at(1, 0)[0] - o[0], at(1, 0)[1] - o[1]];
    const ey = [at(0, 1)[0] - o[0], at(0, 1)[1] - o[1]];
    const det = ex[0] * ey[1] - ex[1] * ey[0];
    const toFace = ([px, py]: Vec2): Vec2 => {
      const [dx, dy] = [px - o[0], py - o[1]];
      return [(dx * ey[1] - dy * ey[0]) / det, (ex[0] * dy - ex[1] * dx) / det];
    };
    const pts = polygons.flat().map(toFace);

    const mark = layout.marks.find((m) => m.label === TIME && !m.underGnomon);
    expect(mark, `a ${TIME} line`).toBeDefined();
    const { a, b } = mark!;
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
    const u: Vec2 = [(b[0] - a[0]) / len, (b[1] - a[1]) / len];
    const offset = (p: Vec2) => (p[1] - a[1]) * u[0] - (p[0] - a[0]) * u[1];
    const along = (p: Vec2) => (p[0] - a[0]) * u[0] + (p[1] - a[1]) * u[1];
    const offs = pts.map(offset);
    if (layout.gnomon.kind === 'rod') {
      // A band centred on the line: its two sides ± the rod's radius, near the rod and out along the line.
      const far = Math.max(...pts.map(along));
      const centring = (sel: (p: Vec2) => boolean) => {
        const o2 = pts.filter(sel).map(offset);
        return Math.abs(Math.max(...o2) + Math.min(...o2)) / 2;
      };
      const worst = Math.max(centring(() => true), centring((p) => along(p) > 0.7 * far));
      console.log(`${name}: rod shadow band off the ${TIME} line by ${worst.toExponential(2)} mm (half-width ${(Math.max(...offs) / 2 - Math.min(...offs) / 2).toFixed(3)} mm, ${far.toFixed(1)} mm long)`);
      expect(far).toBeGreaterThan(20);
      expect(worst).toBeLessThan(0.01);
      return;
    }
    // A fin: the shadow lies on the fin's side of the line, and its edge runs along it.
    const side = Math.sign(offs.reduce((s, v) => (Math.abs(v) > Math.abs(s) ? v : s), 0));
    const wrongSide = Math.max(0, ...offs.map((v) => -side * v));
    const onLine = pts.filter((p) => Math.abs(offset(p)) < 0.01);
    const ends = onLine.map(along);
    const [p0, p1] = [onLine[ends.indexOf(Math.min(...ends))], onLine[ends.indexOf(Math.max(...ends))]];
    const edgeDeg = Math.abs(Math.atan2((p1[0] - p0[0]) * u[1] - (p1[1] - p0[1]) * u[0], (p1[0] - p0[0]) * u[0] + (p1[1] - p0[1]) * u[1])) / DEG;
    console.log(`${name}: shadow edge ${(Math.max(...ends) - Math.min(...ends)).toFixed(1)} mm along the ${TIME} line, ${edgeDeg.toExponential(2)}° from it, ${wrongSide.toExponential(2)} mm beyond it; sun ${sunAngle.toExponential(2)}° from astronomy-engine's`);
    expect(Math.max(...ends) - Math.min(...ends), 'shadow edge length along the line, mm').toBeGreaterThan(20);
    expect(edgeDeg, 'shadow edge direction vs the hour line, degrees').toBeLessThan(0.01);
    expect(wrongSide, 'shadow beyond the line, mm').toBeLessThan(0.01);
  });
});
