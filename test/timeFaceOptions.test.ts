import { Body, HourAngle, Observer } from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { layoutDial, parseSpec, timeFaceExtras } from '@umbrafab/geometry';
import { buildFiles } from '@umbrafab/cli';

const site = { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' };

describe('face options for clock time', () => {
  it('dial.summerNumerals adds a row reading one hour later, and refuses a zone without daylight saving', () => {
    const plain = layoutDial(parseSpec({ site, hours: { from: '08:00', to: '16:00' } }));
    const dual = layoutDial(parseSpec({ site, hours: { from: '08:00', to: '16:00' }, dial: { summerNumerals: true } }));
    const n = plain.numerals.length;
    expect(dual.numerals.length).toBe(2 * n);
    expect(dual.numerals.slice(n).map((b) => b.text)).toEqual(['9', '10', '11', '12', '1', '2', '3', '4', '5']);
    expect(dual.plate.lengthMm).toBeGreaterThan(plain.plate.lengthMm);
    expect(() => layoutDial(parseSpec({ site: { latitude: 22.57, longitude: 88.36, timezone: 'Asia/Kolkata' }, dial: { summerNumerals: true } }))).toThrow(/dial\.summerNumerals/);
  });

  it('marks.followPenumbra widens marks as 1/cos² H (docs/design.md §3), capped at half the gap to a neighbour', () => {
    const plain = layoutDial(parseSpec({ site, hours: { step: 60 } }));
    const wide = layoutDial(parseSpec({ site, hours: { step: 60 }, marks: { followPenumbra: true } }));
    let exact = 0;
    wide.marks.forEach((m, i) => {
      const want = plain.marks[i].widthMm / Math.cos((m.hourAngleDeg * Math.PI) / 180) ** 2;
      const cap = 0.5 * Math.min(...wide.marks.filter((o) => Math.abs(o.xMm - m.xMm) > 1e-9).map((o) => Math.abs(o.xMm - m.xMm)));
      expect(m.widthMm).toBeCloseTo(Math.min(want, Math.max(cap, plain.marks[i].widthMm)), 9);
      if (Math.abs(m.widthMm - want) < 1e-9) exact++;
    });
    expect(exact).toBeGreaterThan(4);
  });

  it('dial.meanTimeCurves draws a figure-of-eight per whole hour, reaching x = t/2 + h·tan((λ−λs) + E/4) at the EoT maximum', async () => {
    const spec = parseSpec({ site, dial: { reads: 'standard', meanTimeCurves: true }, hours: { from: '08:00', to: '16:00' }, gnomon: { nodus: true }, calendar: { year: 2027 } });
    const built = await buildFiles(spec);
    const curves = built.report.meanTimeCurves;
    expect(curves.map((c) => c.clockTime)).toEqual(['08:00', '09:00', '10:00', '11:00', '12:00', '13:00', '14:00', '15:00', '16:00']);
    // 13:00: H = 15° − 3.41° + E/4 (docs/design.md §3), with E at its 2027
    // maximum taken from astronomy-engine (an outside ephemeris): at 12:00 UT
    // the Sun's hour angle at Greenwich is apparent − mean time = E.
    const greenwich = new Observer(0, 0, 0);
    let eMaxMin = -Infinity;
    for (let day = 0; day < 365; day++) {
      const ha = HourAngle(Body.Sun, new Date(Date.UTC(2027, 0, 1 + day, 12)), greenwich);
      eMaxMin = Math.max(eMaxMin, (ha > 12 ? ha - 24 : ha) * 60);
    }
    const xs = curves.find((c) => c.clockTime === '13:00')!.polylines.flat().map((p) => p[0]);
    const h = 50;
    const t = 3;
    const xMax = t / 2 + h * Math.tan(((15 - 3.41 + eMaxMin / 4) * Math.PI) / 180);
    console.log(`E max 2027 (astronomy-engine HourAngle at 12:00 UT): ${eMaxMin.toFixed(3)} min; curve reaches ${Math.max(...xs).toFixed(3)} mm vs ${xMax.toFixed(3)} mm`);
    expect(Math.abs(Math.max(...xs) - xMax)).toBeLessThan(0.05); // sampled every 2 days
    const extras = timeFaceExtras(built.layout);
    expect(extras.lines.filter((l) => l.label.startsWith('mean time')).length).toBeGreaterThanOrEqual(9);
  });

  it('calendar.table engraves the equation of time as a table or a graph in single-stroke text', async () => {
    for (const table of ['table', 'graph'] as const) {
      const built = await buildFiles(parseSpec({ site, calendar: { year: 2027, table } }));
      const labels = timeFaceExtras(built.layout).text.map((b) => b.text);
      expect(labels[0]).toBe('E MIN: CLOCK = DIAL - E + 13.6, +1 H IN SUMMER');
      if (table === 'table') expect(labels).toEqual(expect.arrayContaining(['+16', '-14'])); // Nov 1 and Feb 15 (common practice)
    }
  });
});
