import { mkdirSync, mkdtempSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { stringify } from 'yaml';
import { describe, expect, it } from 'vitest';
import { parseSpec } from '@umbrafab/geometry';
import { runCli } from './helpers/runCli.ts';

const good = {
  name: 'Parts bad input',
  site: { latitude: 44.2, longitude: 7.1, timezone: 'Europe/Rome' },
  process: { method: 'print' },
};

function patched(patch: Record<string, unknown>): unknown {
  const copy = structuredClone(good) as unknown as Record<string, Record<string, unknown>>;
  for (const [path, value] of Object.entries(patch)) {
    const keys = path.split('.');
    let node: Record<string, unknown> = copy;
    for (const k of keys.slice(0, -1)) node = (node[k] ??= {}) as Record<string, unknown>;
    node[keys.at(-1)!] = value;
  }
  return copy;
}

const cases: { name: string; spec: unknown; field: string; message: RegExp }[] = [
  { name: 'a tab longer than the sheet is thick', spec: patched({ 'plate.thickness': 3, 'parts.tabDepth': 4 }), field: 'parts.tabDepth', message: /a 4 mm tab is longer than the 3 mm sheet is thick; allowed: at most plate.thickness = 3 mm/ },
  { name: 'a clearance bigger than the tab', spec: patched({ 'gnomon.thickness': 3, 'process.clearance': 1.5 }), field: 'process.clearance', message: /gap around the tab at least as wide as the tab.*allowed: less than 1.5 mm per side/ },
  { name: 'a wedge that cannot be printed (seat vertical at 89.5°)', spec: patched({ 'site.latitude': 89.5 }), field: 'site.latitude', message: /site\.latitude: got 89\.5, so the latitude wedge cannot be made \(wedge\.latitudeDeg: got 89\.5\); allowed: \|latitude\| at most 89° for a printable wedge/ },
  { name: 'a wedge base too thin for its countersinks', spec: patched({ 'parts.wedge.base': 2 }), field: 'parts.wedge.countersink', message: /straight bore/ },
  { name: 'wedge holes that do not fit a narrow wedge', spec: patched({ 'hours.from': '09:00', 'hours.to': '15:00', 'parts.wedge.holes': 6, 'parts.wedge.countersink': 60, 'parts.wedge.holeDiameter': 30, 'parts.wedge.base': 40 }), field: 'parts.wedge.holes', message: /parts\.wedge\.holes: got 6, so the latitude wedge cannot be made \(wedge\.holes\.count: 6 holes of 60\.00 mm do not fit\); allowed: as many holes as fit across seatWidthMm/ },
  { name: 'a printed wedge wall thinner than two extrusion widths', spec: patched({ 'parts.print.wall': 0.5 }), field: 'parts.print.wall', message: /got 0.5; allowed: 0 \(a solid wedge\) or a number from 0.8 mm/ },
  { name: 'an unknown filament', spec: patched({ 'parts.print.filament': 'nylon' }), field: 'parts.print.filament', message: /allowed: "auto", "pla", "petg", "asa"/ },
  { name: 'a wedge taller than the print bed', spec: patched({ 'site.latitude': 70, 'parts.print.bed': { width: 220, depth: 220, height: 100 } }), field: 'parts.print.bed', message: /wedge\.stl cannot be split to fit: it stands [\d.]+ mm tall and the bed takes 100 mm/ },
  { name: 'a cut gnomon thicker than the sheet', spec: patched({ 'process.method': 'laser', 'parts.gnomonFrom': 'sheet', 'plate.thickness': 3, 'gnomon.thickness': 6 }), field: 'gnomon.thickness', message: /gnomon.thickness 6 mm contradicts plate.thickness 3 mm.*parts.gnomonFrom/ },
  { name: 'a sheet gnomon on a printed dial', spec: patched({ 'parts.gnomonFrom': 'sheet' }), field: 'parts.gnomonFrom', message: /allowed: "separate" with process.method "print"/ },
  { name: 'an unknown part file', spec: patched({ 'parts.write': ['gnomon.stl', 'base.stl'] }), field: 'parts.write', message: /got \["gnomon.stl","base.stl"\]; allowed: "auto" or a list of "gnomon.stl", "gnomon.dxf", "plate.stl", "wedge.stl", "stand.dxf", "stand.stl", "body.stl"/ },
  { name: 'a part file listed twice', spec: patched({ 'parts.write': ['wedge.stl', 'wedge.stl'] }), field: 'parts.write', message: /at most once/ },
  { name: 'grooves deeper than half the body', spec: patched({ 'parts.write': ['body.stl'], 'parts.grooveDepth': 2 }), field: 'parts.grooveDepth', message: /at most half the plate thickness/ },
  { name: 'a nodus notch bigger than the style', spec: patched({ 'parts.nodus': true, 'parts.nodusSize': 50, 'gnomon.height': 20 }), field: 'parts.nodusSize', message: /notch that fits the style/ },
  { name: 'a misspelt parts field', spec: patched({ 'parts.bodyWedgee': true }), field: 'parts.bodyWedgee', message: /did you mean parts.bodyWedge\?/ },
];

describe('gnomon stock rule (parts.gnomonFrom)', () => {
  const laser = { site: good.site, process: { method: 'laser' } };
  it('cut processes take t = plate.thickness by default', () => {
    const s = parseSpec({ ...laser, plate: { thickness: 6 } });
    expect([s.parts.gnomonFrom, s.gnomon.thickness]).toEqual(['sheet', 6]);
    expect(parseSpec({ ...laser, plate: { thickness: 6 }, gnomon: { thickness: 6 } }).parts.gnomonFrom).toBe('sheet');
  });
  it('an explicit different gnomon.thickness without parts.gnomonFrom means a separate gnomon', () => {
    const s = parseSpec({ ...laser, plate: { thickness: 3 }, gnomon: { thickness: 6 } });
    expect([s.parts.gnomonFrom, s.gnomon.thickness]).toEqual(['separate', 6]);
  });
  it('print makes the gnomon separately', () => {
    expect(parseSpec({ site: good.site, process: { method: 'print' }, gnomon: { thickness: 5 } }).parts.gnomonFrom).toBe('separate');
  });
});

describe('umbrafab build: bad parts input gets exit 1 and an error naming the field', () => {
  it.each(cases)('$name → $field', async (c) => {
    const root = mkdtempSync(join(tmpdir(), 'umbrafab-parts-bad-'));
    const out = join(root, 'out');
    mkdirSync(out);
    const spec = join(root, 'spec.yaml');
    writeFileSync(spec, stringify(c.spec));
    const r = await runCli(['build', spec, '--out', out]);
    expect(r.code, r.err).toBe(1);
    expect(r.err).toContain(c.field);
    expect(r.err).toMatch(c.message);
    expect(r.err).not.toMatch(/\n\s+at /);
    expect(readdirSync(out)).toEqual([]);
  });
});
