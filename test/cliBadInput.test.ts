import { mkdirSync, mkdtempSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { stringify } from 'yaml';
import { describe, expect, it } from 'vitest';
import { runCli } from './helpers/runCli.ts';

const good = {
  name: 'Bad input bench',
  site: { latitude: 44.2, longitude: 7.1, timezone: 'Europe/Rome' },
  gnomon: { height: 50, thickness: 3 },
  hours: { from: '07:00', to: '17:00' },
  process: { method: 'laser' },
};

type Case = { name: string; text?: string; spec?: unknown; file?: 'missing' | 'folder'; field: string | RegExp; message: RegExp };

function withPatch(path: string, value: unknown): unknown {
  const copy = structuredClone(good) as Record<string, unknown>;
  const keys = path.split('.');
  let node = copy;
  for (const k of keys.slice(0, -1)) node = (node[k] ??= {}) as Record<string, unknown>;
  node[keys.at(-1)!] = value;
  return copy;
}

// Every case: exit code 1, a message naming the field and the value, and the output folder untouched.
const cases: Case[] = [
  { name: 'latitude 95', spec: withPatch('site.latitude', 95), field: 'site.latitude', message: /got 95; allowed: a number from -90° to 90°/ },
  { name: 'gnomon height 0', spec: withPatch('gnomon.height', 0), field: 'gnomon.height', message: /got 0; allowed: a number greater than 0/ },
  { name: 'negative thickness', spec: withPatch('gnomon.thickness', -2), field: 'gnomon.thickness', message: /got -2/ },
  { name: 'hours in the wrong order', spec: withPatch('hours.to', '06:30'), field: 'hours.to', message: /06:30 is not after hours.from 07:00/ },
  { name: '06:00 on a polar dial', spec: withPatch('hours.from', '06:00'), field: 'hours.from', message: /06:00 \(hour angle -90.0°\) cannot be shown.*widest range that fits is 07:00–17:00/ },
  { name: 'an unknown time zone', spec: withPatch('site.timezone', 'Europe/Atlantis'), field: 'site.timezone', message: /unknown time zone "Europe\/Atlantis"/ },
  { name: 'an unknown method', spec: withPatch('process.method', 'plasma'), field: 'process.method', message: /got "plasma"; allowed: "laser", "waterjet", "router", "print"/ },
  { name: 'kerf wider than a mark', spec: withPatch('process.kerf', 0.5), field: 'process.kerf', message: /0.5 mm laser kerf is wider than the 0.4 mm quarter marks/ },
  { name: 'text where a number goes', spec: withPatch('gnomon.height', 'tall'), field: 'gnomon.height', message: /got "tall"/ },
  { name: 'a misspelt field', spec: withPatch('gnomon.hieght', 40), field: 'gnomon.hieght', message: /did you mean gnomon.height\?/ },
  { name: 'a missing required field', spec: { site: { latitude: 10, timezone: 'UTC' } }, field: 'site.longitude', message: /missing required field/ },
  { name: 'a time that is not HH:MM', spec: withPatch('hours.from', '7 am'), field: 'hours.from', message: /got "7 am"; allowed: a time "HH:MM"/ },
  { name: 'a time off the step grid', spec: withPatch('hours.from', '07:10'), field: 'hours.from', message: /15-minute grid/ },
  { name: 'a plate too narrow', spec: withPatch('plate.width', 150), field: 'plate.width', message: /fall off a 150 mm plate/ },
  { name: 'a plate too short', spec: withPatch('plate.length', 40), field: 'plate.length', message: /needs .* mm along the style/ },
  { name: 'an unknown material', spec: withPatch('plate.material', 'cheese'), field: 'plate.material', message: /got "cheese"; allowed: "aluminium"/ },
  { name: 'hole count 3', spec: withPatch('holes.count', 3), field: 'holes.count', message: /allowed: 0, 2 or 4/ },
  { name: 'tabs longer than the style', spec: withPatch('gnomon.tabLength', 200), field: 'gnomon.tabLength', message: /at most 80 %/ },
  { name: 'a spec that is a list', text: '- 1\n- 2\n', field: '(spec)', message: /must be a mapping/ },
  { name: 'broken YAML', text: 'site:\n  latitude: [12\n', field: 'spec file', message: /not valid YAML at line/ },
  { name: 'a duplicated key', text: 'site:\n  latitude: 1\n  latitude: 2\n', field: 'spec file', message: /not valid YAML/ },
  { name: 'a missing file', file: 'missing', field: 'spec file', message: /no such file/ },
  { name: 'a folder instead of a file', file: 'folder', field: 'spec file', message: /folder, not a file/ },
];

describe('umbrafab build: bad input', () => {
  it('has at least 15 cases', () => expect(cases.length).toBeGreaterThanOrEqual(15));

  it.each(cases)('$name → exit 1, names $field, output folder untouched', async (c) => {
    const root = mkdtempSync(join(tmpdir(), 'umbrafab-bad-'));
    const out = join(root, 'out');
    mkdirSync(out);
    writeFileSync(join(out, 'keep.txt'), 'already here');
    const before = snapshot(out);
    let specPath = join(root, 'spec.yaml');
    if (c.file === 'missing') specPath = join(root, 'nope.yaml');
    else if (c.file === 'folder') specPath = root;
    else writeFileSync(specPath, c.text ?? stringify(c.spec));
    const r = await runCli(['build', specPath, '--out', out]);
    expect(r.code).toBe(1);
    expect(r.err).toContain(typeof c.field === 'string' ? c.field : '');
    expect(r.err).toMatch(c.message);
    expect(r.err).not.toMatch(/\n\s+at /); // no stack trace
    expect(snapshot(out)).toEqual(before);
  });

  it('refuses to overwrite existing files without --force, and leaves them as they were', async () => {
    const root = mkdtempSync(join(tmpdir(), 'umbrafab-force-'));
    const spec = join(root, 'spec.yaml');
    writeFileSync(spec, stringify(good));
    const out = join(root, 'out');
    expect((await runCli(['build', spec, '--out', out])).code).toBe(0);
    writeFileSync(join(out, 'plate.dxf'), 'hand edited');
    const before = snapshot(out);
    const r = await runCli(['build', spec, '--out', out]);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/--out: .* already holds plate.dxf.*--force/);
    expect(snapshot(out)).toEqual(before);
    expect((await runCli(['build', spec, '--out', out, '--force'])).code).toBe(0);
    expect(readFileSync(join(out, 'plate.dxf'), 'utf8')).toMatch(/^0\nSECTION/);
  });

  it('exits 1 on an unknown option and prints help on --help', async () => {
    expect((await runCli(['build', 'x.yaml', '--bogus'])).code).toBe(1);
    const h = await runCli(['build', '--help']);
    expect(h.code).toBe(0);
  });
});

function snapshot(dir: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const f of readdirSync(dir).sort()) out[f] = `${statSync(join(dir, f)).size}:${readFileSync(join(dir, f), 'utf8')}`;
  return out;
}
