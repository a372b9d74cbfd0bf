import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { calendarLines, parseSpec } from '@umbrafab/geometry';
import { buildFiles } from '@umbrafab/cli';
import { ezdxfDump, type DxfDump } from './helpers/ezdxf.ts';

const cases = [
  { name: 'north, standard time, zodiac + a custom date, thick fin', raw: { site: { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' }, dial: { reads: 'standard' }, hours: { from: '08:00', to: '16:00' }, gnomon: { nodus: true, thickness: 3 }, calendar: { year: 2027, lines: ['zodiac'], dates: [{ date: '06-14', label: 'WEDDING' }] } } },
  { name: 'south, solar time, solstices + equinox, nodus placed off-centre', raw: { site: { latitude: -33.9, longitude: 18.4, timezone: 'Africa/Johannesburg' }, gnomon: { nodus: true, nodusY: 8, height: 60, thickness: 6 }, plate: { thickness: 6 }, calendar: { year: 2026 } } },
];

type Report = {
  plate: { substyleX: number; faceOriginY: number };
  gnomon: { heightMm: number; thicknessMm: number };
  hemisphere: 'north' | 'south';
  time: { nodusYMm: number };
  calendar: { label: string; declinationDeg: number; points: [number, number][] }[];
};

async function build(raw: object): Promise<{ report: Report; dump: DxfDump }> {
  const built = await buildFiles(parseSpec(raw));
  const dir = mkdtempSync(join(tmpdir(), 'umbrafab-time-'));
  const file = join(dir, 'plate.dxf');
  writeFileSync(file, built.files.find((f) => f.name === 'plate.dxf')!.bytes);
  const report = JSON.parse(new TextDecoder().decode(built.files.find((f) => f.name === 'report.json')!.bytes)) as Report;
  return { report, dump: ezdxfDump(file) };
}

const built = await Promise.all(cases.map((c) => build(c.raw)));

describe.each(cases.map((c, i) => ({ ...c, i })))('date lines: $name', ({ i }) => {
  const { report, dump } = built[i];
  const h = report.gnomon.heightMm;
  const t = report.gnomon.thicknessMm;
  const sign = report.hemisphere === 'north' ? 1 : -1;

  it('lie on y = −tan δ · √(h² + (|x| − t/2)²) from the nodus foot (report.json) within 0.01 mm', () => {
    // docs/design.md §2: the handbook hyperbola of a nodus on a polar face, measured from the casting style edge
    // (A. E. Waugh, Sundials: Their Theory and Construction, Dover 1973 — memory), δ toward the elevated pole.
    expect(report.calendar.length).toBeGreaterThan(0);
    let worst = 0;
    let n = 0;
    for (const line of report.calendar) {
      const tanD = Math.tan((sign * line.declinationDeg * Math.PI) / 180);
      for (const [x, y] of line.points) {
        expect(Math.abs(x)).toBeGreaterThanOrEqual(t / 2 - 1e-9);
        worst = Math.max(worst, Math.abs(y - -tanD * Math.hypot(h, Math.abs(x) - t / 2)));
        n++;
      }
    }
    console.log(`date lines vs the hyperbola formula: worst ${worst.toExponential(2)} mm over ${n} points`);
    expect(worst).toBeLessThanOrEqual(0.01);
  });

  it('are in plate.dxf (read by ezdxf) at substyleX + x, faceOriginY + nodusY + y within 0.01 mm', () => {
    // Source: ezdxf (Debian python3-ezdxf) reading back the DXF; audit clean.
    expect(dump.errors).toEqual([]);
    const verts = dump.entities.filter((e) => e.layer === 'LINE_SCORE').flatMap((e) => e.points ?? []);
    const key = (x: number, y: number) => `${Math.round(x * 10)},${Math.round(y * 10)}`;
    const grid = new Map<string, [number, number][]>();
    for (const [x, y] of verts) {
      const k = key(x, y);
      grid.set(k, [...(grid.get(k) ?? []), [x, y]]);
    }
    let worst = 0;
    for (const line of report.calendar) {
      for (const [x, y] of line.points) {
        const px = report.plate.substyleX + x;
        const py = report.plate.faceOriginY + report.time.nodusYMm + y;
        let best = Infinity;
        for (let dx = -1; dx <= 1; dx++) {
          for (let dy = -1; dy <= 1; dy++) {
            for (const [vx, vy] of grid.get(`${Math.round(px * 10) + dx},${Math.round(py * 10) + dy}`) ?? []) best = Math.min(best, Math.hypot(vx - px, vy - py));
          }
        }
        worst = Math.max(worst, best);
      }
    }
    console.log(`date lines report.json vs plate.dxf: worst ${worst.toExponential(2)} mm`);
    expect(worst).toBeLessThanOrEqual(0.01);
  });

  it('has the solstice lines at ±23.44° of declination', () => {
    // Solstice declination = ±ε, ε ≈ 23.44° (obliquity of the ecliptic; IAU 2006 84381.406″ at J2000 — memory;
    // 23.436° of date in 2026–27 plus nutation), from astronomy-engine's SearchSunLongitude moments.
    const june = report.calendar.find((l) => l.label === 'June solstice')!;
    const dec = report.calendar.find((l) => l.label === 'December solstice')!;
    expect(Math.abs(june.declinationDeg - 23.44)).toBeLessThan(0.005);
    expect(Math.abs(dec.declinationDeg + 23.44)).toBeLessThan(0.005);
    // With δ = ±23.44° exactly the points move by under 0.01 mm within 60 mm of the style (sec²δ·Δδ·√(h²+u²)).
    for (const [line, d] of [[june, 23.44], [dec, -23.44]] as const) {
      const tanD = Math.tan((sign * d * Math.PI) / 180);
      for (const [x, y] of line.points.filter(([x]) => Math.abs(x) - t / 2 <= 60)) expect(Math.abs(y - -tanD * Math.hypot(h, Math.abs(x) - t / 2))).toBeLessThanOrEqual(0.01);
    }
    // Local summer lies toward the equator-ward end (y < 0) in both hemispheres (docs/design.md §2).
    const summer = report.hemisphere === 'north' ? june : dec;
    expect(Math.max(...summer.points.map((p) => p[1]))).toBeLessThan(0);
  });
});

describe('date-line options', () => {
  it('refuses custom dates and mean-time curves without a nodus, naming the field', async () => {
    const site = { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' };
    await expect(buildFiles(parseSpec({ site, calendar: { dates: [{ date: '06-14', label: 'X' }] } }))).rejects.toThrow(/calendar\.dates/);
    await expect(buildFiles(parseSpec({ site, dial: { meanTimeCurves: true } }))).rejects.toThrow(/dial\.meanTimeCurves/);
    await expect(buildFiles(parseSpec({ site, gnomon: { nodus: true, nodusY: 99 } }))).rejects.toThrow(/gnomon\.nodusY/);
    await expect(buildFiles(parseSpec({ site, gnomon: { nodus: true }, calendar: { year: 2027, dates: [{ date: '02-29', label: 'X' }] } }))).rejects.toThrow(/calendar\.dates\.0\.date/);
    expect(() => parseSpec({ site, calendar: { lines: ['solstice'] } })).toThrow(/calendar\.lines/);
  });

  it('labels the date lines in single-stroke text and leaves no date line without a nodus', async () => {
    const site = { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' };
    const off = await buildFiles(parseSpec({ site }));
    expect(off.report.calendar).toEqual([]);
    const on = await buildFiles(parseSpec({ site, gnomon: { nodus: true } }));
    const svg = new TextDecoder().decode(on.files.find((f) => f.name === 'preview.svg')!.bytes);
    expect(svg).toContain('date line June solstice');
    const labels = calendarLines(on.layout).flatMap((l) => l.engravedLabels);
    const unlabelled = on.report.unlabelledDateLines;
    console.log(`labels placed: ${labels.length - unlabelled.length} of ${labels.length}; without room: ${unlabelled.join('; ') || 'none'}`);
    expect(labels.length - unlabelled.length).toBeGreaterThan(0);
  });
});
