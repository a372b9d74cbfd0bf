import { describe, expect, test } from 'vitest';
import { checkDial, checkPlanar, layoutDial, layoutPlanar, parseSpec } from '@umbrafab/geometry';
import { checkFailureLine } from './checkSummaryText.ts';
import { checkTableText } from './checkTableText.ts';
import { planarCheckText } from './planarCheckText.ts';
import { toCheckJson } from './toCheckJson.ts';
import { toCheckSvg } from './toCheckSvg.ts';

const layout = layoutDial(parseSpec({ site: { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' }, hours: { from: '09:00', to: '15:00', step: 60 } }));
const clean = checkDial(layout, { everyDays: 30 });
const tilted = checkDial(layout, { everyDays: 30, tiltErrorDeg: 3 });

describe('check writers', () => {
  test('check.json: rounded to 6 places, byte-stable, nulls kept for unlit days', () => {
    const a = toCheckJson(clean);
    expect(a).toBe(toCheckJson(checkDial(layout, { everyDays: 30 })));
    const j = JSON.parse(a);
    expect(j.marks.length).toBe(clean.marks.length);
    expect(j.days.length).toBe(13);
    expect(a.endsWith('}\n')).toBe(true);
    expect(/\d\.\d{7,}/.test(a)).toBe(false);
  });

  test('check.svg: one polyline per reached mark, the tolerance band, byte-stable', () => {
    const svg = toCheckSvg(tilted);
    expect(svg).toBe(toCheckSvg(tilted));
    expect(svg.match(/<path class="(am|pm|noon)"/g)?.length).toBe(tilted.marks.filter((m) => m.reachedDays > 0).length);
    expect(svg).toMatch(/\+0\.05 mm tolerance/);
    expect(svg).toMatch(/FAIL<\/text>/);
  });

  test('table: a row per mark, PASS when clean, one FAIL line per failing mark naming it and the day', () => {
    const t = checkTableText(clean).split('\n');
    expect(t.filter((l) => /^\d\d:\d\d (west|east)/.test(l)).length).toBe(clean.marks.length);
    expect(t.at(-1)).toMatch(/^PASS/);
    const f = checkTableText(tilted);
    expect(f.match(/^FAIL: mark \d\d:\d\d (west|east): shadow [+-]\d+\.\d{3} mm \([+-]\d+\.\d s\) off the line on 2027-\d\d-\d\d/gm)?.length).toBe(tilted.failures.length);
  });

  test('table with a nodus: a row per date line and curve, a FAIL line naming a curve beyond the tolerance', () => {
    const nodus = layoutDial(parseSpec({ site: { latitude: 50.62, longitude: -3.41, timezone: 'Europe/London' }, hours: { from: '09:00', to: '15:00', step: 60 }, gnomon: { nodus: true }, dial: { meanTimeCurves: true, reads: 'standard' } }));
    const ok = checkDial(nodus, { everyDays: 30 });
    const t = checkTableText(ok).split('\n');
    expect(ok.curves.length).toBeGreaterThan(3);
    for (const c of ok.curves) expect(t.some((l) => l.startsWith(c.label) && l.includes(c.worstDate ?? '-'))).toBe(true);
    expect(t.find((l) => l.startsWith('worst curve:'))).toMatch(/mm \(\d+\.\d{3} s\) on .*; \d+ date line\(s\) and curve\(s\) \(from the layout\), tolerance 0\.050 mm/);
    expect(t.at(-1)).toMatch(/^PASS: every lit mark, date line and mean-time curve/);
    const tight = checkDial(nodus, { everyDays: 30, toleranceMm: 1e-6 });
    const bad = tight.curves.filter((c) => !c.pass);
    expect(bad.length).toBeGreaterThan(0);
    expect(checkTableText(tight).match(/^FAIL: curve .+: nodus shadow \d+\.\d{4} mm \(\d+\.\d s\) off the drawn curve on 2027-\d\d-\d\d; beyond 0\.000 mm$/gm)?.length).toBe(bad.length);
    expect(JSON.parse(toCheckJson(ok)).curves.length).toBe(ok.curves.length);
  });

  test('planar table: the date lines and curves as the polar table has them, a FAIL line naming each curve beyond the tolerance', () => {
    const wall = layoutPlanar(parseSpec({ site: { latitude: 47.4, longitude: 8.5, timezone: 'Europe/Zurich' }, face: { type: 'vertical', wallDeclination: 24.5 }, gnomon: { height: 90, thickness: 4, nodus: true }, dial: { meanTimeCurves: true }, hours: { from: '07:00', to: '17:00', step: 60 }, calendar: { lines: ['solstices', 'equinox'] } }));
    const ok = checkPlanar(wall, { everyDays: 30 });
    expect(ok.curves.length).toBeGreaterThan(3);
    const t = planarCheckText(ok).split('\n');
    const header = t.findIndex((l) => /^curve +samples +worst mm +worst s +worst day$/.test(l));
    expect(header).toBeGreaterThan(0);
    ok.curves.forEach((c, i) => expect(t[header + 2 + i].startsWith(c.label) && t[header + 2 + i].endsWith(c.worstDate ?? '-')).toBe(true));
    expect(t.find((l) => l.startsWith('worst curve:'))).toMatch(/; \d+ date line\(s\) and curve\(s\), tolerance 0\.050 mm$/);
    expect(t).toContain('pass: every line and curve within tolerance' + (ok.worst ? `; worst line ${ok.worst.label} ${ok.worst.edge} ${Math.abs(ok.worst.errorMm) < 0.0005 ? ok.worst.errorMm.toExponential(1) : ok.worst.errorMm.toFixed(3)} mm on ${ok.worst.date}` : ''));
    const tight = checkPlanar(wall, { everyDays: 30, toleranceMm: 1e-6 });
    const bad = tight.curves.filter((c) => !c.pass);
    expect(bad.length).toBeGreaterThan(0);
    const text = planarCheckText(tight);
    for (const c of bad) expect(text).toContain(`FAIL: curve ${c.label}: nodus shadow `);
    expect(text.match(/^FAIL: curve /gm)?.length).toBe(bad.length);
  });

  test("umbrafab check's failure line (checkFailureLine): one wording and one precision for the polar and the planar check", () => {
    // The same shape either way: "mark <label> <edge>", the error to 4 decimals (a tenth of the 0.001 mm a mark is held to), the day, the count.
    const shape = /^umbrafab check: mark \d\d:\d\d \w+( on the lower face)? is \d+\.\d{4} mm off the simulated shadow on 2027-\d\d-\d\d \(tolerance [\d.]+ mm\); \d+ mark\(s\) fail$/;
    const polar = checkFailureLine(tilted, (f) => f.style);
    const p0 = tilted.failures[0];
    expect(polar).toMatch(shape);
    expect(polar).toContain(`mark ${p0.label} ${p0.style} is ${Math.abs(p0.errorMm).toFixed(4)} mm off the simulated shadow on ${p0.date} (tolerance ${tilted.toleranceMm} mm); ${tilted.failures.length} mark(s) fail`);
    // A planar face with one hour line moved 0.5 mm sideways (as an edited plate.dxf would have it).
    const wall = layoutPlanar(parseSpec({ site: { latitude: 47.4, longitude: 8.5, timezone: 'Europe/Zurich' }, face: { type: 'vertical', wallDeclination: 24.5 }, gnomon: { height: 90, thickness: 4 }, hours: { from: '09:00', to: '15:00', step: 60 } }));
    const k = wall.marks.findIndex((m) => m.label === '10:00');
    const marks = wall.marks.map((m, i) => (i === k ? { ...m, a: [m.a[0] + 0.5, m.a[1]] as const, b: [m.b[0] + 0.5, m.b[1]] as const } : m));
    const moved = checkPlanar(wall, { everyDays: 30, marks });
    const q0 = moved.failures[0];
    expect(q0.label).toBe('10:00');
    const planar = checkFailureLine(moved, (f) => f.edge, ' on the lower face');
    expect(planar).toMatch(shape);
    expect(planar).toContain(`mark 10:00 ${q0.edge} on the lower face is ${Math.abs(q0.errorMm).toFixed(4)} mm off the simulated shadow on ${q0.date} (tolerance ${moved.toleranceMm} mm); 1 mark(s) fail`);
  });
});
