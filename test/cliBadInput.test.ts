import { mkdirSync, mkdtempSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse as parseYaml, stringify } from 'yaml';
import { describe, expect, it } from 'vitest';
import { runCli } from './helpers/runCli.ts';

const good = {
  name: 'Bad input bench',
  site: { latitude: 44.2, longitude: 7.1, timezone: 'Europe/Rome' },
  gnomon: { height: 50, thickness: 3 },
  hours: { from: '07:00', to: '17:00' },
  process: { method: 'laser' },
};

type Case = { name: string; text?: string; spec?: unknown; file?: 'missing' | 'folder'; field: string | RegExp; message: RegExp; not?: RegExp };

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
  { name: 'a missing file', file: 'missing', field: 'spec file', message: /no such file: \/.*nope\.yaml/ },
  { name: 'a folder instead of a file', file: 'folder', field: 'spec file', message: /\/umbrafab-bad-\w+ is a folder, not a file/ },
  // Every problem listed, each with field, value and what is allowed.
  { name: 'several problems at once', spec: { ...withPatch('site.latitude', 95) as object, gnomon: { height: 0, hieght: 3 } }, field: 'site.latitude', message: /3 problems in the spec:\n  site\.latitude: got 95; allowed: a number from -90° to 90°\n  gnomon\.height: got 0; allowed: a number greater than 0 mm up to 1000 mm\n  gnomon\.hieght: unknown field \(did you mean gnomon\.height\?\); known fields here: height/ },
  { name: 'an empty file', text: '', field: 'spec file', message: /spec\.yaml is empty; allowed: a dial spec with at least a site: section/, not: /null/ },
  { name: 'a file of comments only', text: '# nothing yet\n', field: 'spec file', message: /holds only comments, no fields/, not: /null/ },
  { name: 'NaN', text: 'site: { latitude: .nan, longitude: 7.1, timezone: Europe/Rome }\n', field: 'site.latitude', message: /got NaN \(not a number\); allowed: a number from -90° to 90°/, not: /null/ },
  { name: 'Infinity and -Infinity', text: 'site: { latitude: 44, longitude: .inf, timezone: Europe/Rome }\ngnomon: { height: -.inf }\n', field: 'site.longitude', message: /site\.longitude: got Infinity \(not a finite number\).*\n  gnomon\.height: got -Infinity \(not a finite number\)/, not: /null/ },
  { name: 'an empty value', text: 'site: { latitude: , longitude: 7.1, timezone: Europe/Rome }\n', field: 'site.latitude', message: /got an empty value; allowed: a number/, not: /null/ },
  { name: 'a zone on the far side of the world', spec: { site: { latitude: 51.5, longitude: 180, timezone: 'Europe/London' } }, field: 'site.timezone', message: /"Europe\/London" keeps clocks on the 0° meridian, 180° \(12 h\) from site\.longitude 180°/, not: /hourAngleRad/ },
  { name: 'a date in another form', spec: withPatch('install.date', '01/04/2027'), field: 'install.date', message: /got "01\/04\/2027"; allowed: a date "YYYY-MM-DD" in quotes.*write "2027-04-01" \(day first\) or "2027-01-04" \(month first\)/ },
  { name: 'a date with one-digit month', spec: withPatch('pictures.date', '2027-6-21'), field: 'pictures.date', message: /for "2027-6-21" write "2027-06-21"/ },
  { name: 'a misspelt time zone', spec: withPatch('site.timezone', 'Europe/Athen'), field: 'site.timezone', message: /unknown time zone "Europe\/Athen" \(did you mean "Europe\/Athens"\?\)/ },
  { name: 'a time with a one-digit hour out of range', spec: withPatch('hours.to', '25:00'), field: 'hours.to', message: /allowed: a time "HH:MM" \(or "H:MM"\)/ },
  { name: 'the starter\'s site placeholder', spec: { site: { latitude: 'EDIT ME', longitude: 'EDIT ME', timezone: 'EDIT ME' } }, field: 'site.latitude', message: /3 problems.*\n  site\.latitude: still the starter spec's placeholder "EDIT ME": fill in your site; allowed: your site's latitude/ },
  { name: 'a kerf wider than the narrowest drawn mark', spec: { ...withPatch('process.method', 'waterjet') as object, marks: { hour: { width: 0.8 }, half: { width: 0.6 }, quarter: { width: 0.4 } } }, field: 'process.kerf', message: /0\.9 mm waterjet kerf is wider than the 0\.4 mm quarter marks/ },
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
    if (c.not) expect(r.err).not.toMatch(c.not);
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

  it.each([
    { argv: ['biuld', 'x.yaml'], message: /^umbrafab: unknown command "biuld" \(did you mean build\?\); allowed: build, batch, check, init, serve/ },
    { argv: ['build', 'x.yaml', '--otu', 'o'], message: /^umbrafab: unknown option --otu \(did you mean --out\?\); allowed: umbrafab build <spec> with the options --help, --out, --force/ },
    { argv: ['batch', 'x.yaml', '--lattitudes', '3'], message: /unknown option --lattitudes \(did you mean --latitudes\?\)/ },
    { argv: ['build', 'x.yaml', 'y.yaml'], message: /extra argument "y\.yaml"/ },
  ])('command line: $argv → exit 1, $message', async ({ argv, message }) => {
    const r = await runCli(argv);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(message);
  });

  it.each(['laser', 'waterjet', 'router', 'print'])('init, then process.method %s: refuses the untouched site, builds once it is filled in', async (method) => {
    const root = mkdtempSync(join(tmpdir(), `umbrafab-init-${method}-`));
    const file = join(root, 'dial.yaml');
    expect((await runCli(['init', file, '--year', '2027'])).code).toBe(0);
    const starter = readFileSync(file, 'utf8');
    // No field whose default follows another is written (only named in the header with its rule).
    const written = parseYaml(starter);
    for (const key of ['process.kerf', 'process.clearance', 'parts.gnomonFrom', 'gnomon.thickness', 'marks.hour.width', 'marks.half.width', 'marks.quarter.width']) {
      expect(key.split('.').reduce((o: any, k) => o?.[k], written), key).toBeUndefined();
      expect(starter).toContain(`#   ${key}: `);
    }
    const switched = starter.replace(/method: laser/, `method: ${method}`);
    writeFileSync(file, switched);
    const refused = await runCli(['build', file, '--out', join(root, 'never')]);
    expect(refused.code).toBe(1);
    expect(refused.err).toMatch(/site\.latitude: still the starter spec's placeholder "EDIT ME": fill in your site/);
    expect(refused.err).toMatch(/site\.timezone: still the starter spec's placeholder/);
    writeFileSync(file, switched.replace('latitude: EDIT ME', 'latitude: 43.55').replace('longitude: EDIT ME', 'longitude: -5.92').replace('timezone: EDIT ME', 'timezone: Europe/Madrid'));
    const built = await runCli(['build', file, '--out', join(root, 'out')]);
    expect(built.err).toBe('');
    expect(built.code).toBe(0);
    expect(built.out).toMatch(new RegExp(`${method} kerf`));
  });

  it('refuses --out naming a file, by name, before building', async () => {
    const root = mkdtempSync(join(tmpdir(), 'umbrafab-outfile-'));
    const spec = join(root, 'spec.yaml');
    writeFileSync(spec, stringify(good));
    const file = join(root, 'taken.txt');
    writeFileSync(file, 'mine');
    for (const cmd of [['build', spec, '--out', file], ['batch', spec, '--latitudes', '30', '--out', file], ['check', spec, '--out', join(file, 'sub')]]) {
      const r = await runCli(cmd);
      expect(r.code, cmd.join(' ')).toBe(1);
      expect(r.err).toMatch(/^umbrafab: --out: .*taken\.txt(\/sub)? (is a file, not a folder|lies under .*taken\.txt, which is a file)/);
      expect(r.err).not.toMatch(/EEXIST|ENOTDIR/);
    }
    expect(readFileSync(file, 'utf8')).toBe('mine');
  });

  it('accepts "H:MM" clock times and builds the same files as "HH:MM"', async () => {
    const root = mkdtempSync(join(tmpdir(), 'umbrafab-clock-'));
    writeFileSync(join(root, 'a.yaml'), stringify(withPatch('hours.from', '7:00')));
    writeFileSync(join(root, 'b.yaml'), stringify(withPatch('hours.from', '07:00')));
    expect((await runCli(['build', join(root, 'a.yaml'), '--out', join(root, 'a')])).code).toBe(0);
    expect((await runCli(['build', join(root, 'b.yaml'), '--out', join(root, 'b')])).code).toBe(0);
    for (const f of readdirSync(join(root, 'b'))) expect(readFileSync(join(root, 'a', f)).equals(readFileSync(join(root, 'b', f))), f).toBe(true);
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
