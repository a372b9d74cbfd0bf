import { spawn } from 'node:child_process';
import { copyFileSync, existsSync, mkdtempSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { request } from 'node:http';
import { networkInterfaces, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse as parseYaml } from 'yaml';
import { parseSpec, specSchema } from '@umbrafab/geometry';
import { buildFiles, readSpecFile, bindPolicy, isLoopbackHost, formValuesToSpec, specToFormValues, MAX_BODY_BYTES, specFields, startServer, type RunningServer } from '@umbrafab/cli';
import { runCli } from './helpers/runCli.ts';

const ROOT = resolve(import.meta.dirname, '..');
const BIN = join(ROOT, 'packages/cli/bin/umbrafab.js');
const DEMO = join(ROOT, 'fixtures/demo.yaml');
const SOLAR = join(ROOT, 'fixtures/specs/serve-solar.yaml');
/** One spec per process and a nodus spec, each leaving the defaults that follow other fields to them. */
const PAGE_SPECS = ['serve-solar', 'page-waterjet-north', 'page-router-thick', 'page-print', 'page-nodus'] as const;

/** A raw HTTP request (no URL clean-up, unlike fetch), so "../" reaches the server as sent. */
function raw(
  server: RunningServer,
  opts: { method?: string; path: string; headers?: Record<string, string>; body?: Buffer | string; chunks?: Buffer[] },
): Promise<{ status: number; body: Buffer; headers: Record<string, unknown> }> {
  return new Promise((ok, fail) => {
    let answered = false;
    const req = request({ host: '127.0.0.1', port: server.port, method: opts.method ?? 'GET', path: opts.path, headers: opts.headers }, (res) => {
      answered = true;
      const parts: Buffer[] = [];
      res.on('data', (c: Buffer) => parts.push(c));
      res.on('end', () => ok({ status: res.statusCode ?? 0, body: Buffer.concat(parts), headers: res.headers }));
      res.on('error', fail);
    });
    // Writing the rest of a refused body may fail once the server has answered and closed: the answer is what counts.
    req.on('error', (e) => (answered ? undefined : fail(e)));
    if (opts.chunks) {
      for (const c of opts.chunks) req.write(c);
      req.end();
    } else req.end(opts.body);
  });
}

async function postJson(server: RunningServer, path: string, value: unknown) {
  const res = await fetch(server.url + path.slice(1), { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(value) });
  return { status: res.status, json: (await res.json()) as any };
}

/** Every file under a folder with its size and mtime, to prove nothing was written. */
function snapshot(dir: string): string[] {
  return readdirSync(dir, { recursive: true, withFileTypes: false })
    .map(String)
    .sort()
    .map((f) => {
      const s = statSync(join(dir, f));
      return `${f} ${s.size} ${s.mtimeMs}`;
    });
}

describe('serve: where it listens', () => {
  it('treats only 127.0.0.0/8, ::1 and localhost as loopback', () => {
    for (const h of ['127.0.0.1', '127.4.5.6', '::1', '[::1]', 'localhost', '::ffff:127.0.0.1']) expect(isLoopbackHost(h), h).toBe(true);
    for (const h of ['0.0.0.0', '::', '192.168.1.20', '10.0.0.1', 'example.org', '128.0.0.1']) expect(isLoopbackHost(h), h).toBe(false);
  });

  it('refuses a non-loopback host without --allow-remote, and warns with it', () => {
    expect(bindPolicy({})).toEqual({ host: '127.0.0.1', hostCheck: { names: [], ipLiterals: false } });
    expect(() => bindPolicy({ host: '0.0.0.0' })).toThrow(/--host: 0\.0\.0\.0 is not a loopback address; allowed: 127\.0\.0\.1.*--allow-remote/);
    expect(() => bindPolicy({ host: '192.168.1.20', allowRemote: false })).toThrow(/not a loopback address/);
    const remote = bindPolicy({ host: '0.0.0.0', allowRemote: true });
    expect(remote.host).toBe('0.0.0.0');
    expect(remote.warning).toMatch(/^warning: serving on 0\.0\.0\.0, not only on this machine \(--allow-remote\)/);
  });

  it('the serve command exits 1 for --host 0.0.0.0 alone, naming the option to add', async () => {
    const r = await runCli(['serve', DEMO, '--host', '0.0.0.0', '--port', '0']);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/^umbrafab: --host: 0\.0\.0\.0 is not a loopback address.*--allow-remote/);
    expect(r.out).toBe('');
  });

  it('the serve command prints the address, and the warning for an explicit remote bind, then stops on SIGTERM', async () => {
    const child = spawn(process.execPath, [BIN, 'serve', DEMO, '--host', '0.0.0.0', '--allow-remote', '--port', '0'], { cwd: ROOT });
    let out = '';
    let err = '';
    child.stderr.on('data', (c) => (err += c));
    await new Promise<void>((ok, fail) => {
      child.stdout.on('data', (c) => {
        out += c;
        if (out.includes('\n')) ok();
      });
      child.on('exit', () => fail(new Error(`serve exited early: ${err}`)));
    });
    const code = new Promise<number | null>((ok) => child.on('exit', (c) => ok(c)));
    child.kill('SIGTERM');
    expect(out).toMatch(/^umbrafab: the dial page is at http:\/\/0\.0\.0\.0:\d+\/ \(Ctrl-C to stop\)/);
    expect(err).toMatch(/umbrafab: warning: serving on 0\.0\.0\.0, not only on this machine/);
    expect(await code).toBe(0);
  });

  it('binds 127.0.0.1 by default: a non-loopback address of this machine gets no answer', async () => {
    const server = await startServer({ port: 0, log: () => {} });
    try {
      expect(server.host).toBe('127.0.0.1');
      expect(server.url).toBe(`http://127.0.0.1:${server.port}/`);
      const lan = Object.values(networkInterfaces()).flat().find((a) => a && a.family === 'IPv4' && !a.internal);
      if (lan) {
        const reached = await new Promise<boolean>((ok) => {
          const req = request({ host: lan.address, port: server.port, path: '/' }, () => ok(true));
          req.on('error', () => ok(false));
          req.end();
        });
        expect(reached, `reached via ${lan.address}`).toBe(false);
      }
    } finally {
      await server.close();
    }
  });
});

describe('serve: requests', () => {
  let dir: string;
  let specFile: string;
  let server: RunningServer;
  let values: Record<string, unknown>;
  const logs: string[] = [];

  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'umbrafab-serve-'));
    specFile = join(dir, 'dial.yaml');
    copyFileSync(DEMO, specFile);
    server = await startServer({ specPath: specFile, port: 0, log: (l) => logs.push(l) });
    values = ((await (await fetch(server.url + 'api/setup')).json()) as any).values;
  });
  afterAll(async () => server?.close());

  it('builds the form from the one spec schema: every field, its describe() text, unit and default', async () => {
    const setup = (await (await fetch(server.url + 'api/setup')).json()) as any;
    const keys = setup.fields.map((f: any) => f.key);
    expect(keys).toEqual(specFields().map((f) => f.key));
    const byKey = new Map(setup.fields.map((f: any) => [f.key, f]));
    expect(byKey.get('gnomon.height')).toMatchObject({ kind: 'number', unit: 'mm', default: 50, description: specSchema.shape.gnomon.unwrap().shape.height.description });
    expect(byKey.get('site.latitude')).toMatchObject({ kind: 'number', unit: '°', required: true, min: -90, max: 90 });
    expect(byKey.get('plate.width')).toMatchObject({ kind: 'numberOrAuto', default: 'auto' });
    expect(byKey.get('process.method')).toMatchObject({ kind: 'choice', choices: ['laser', 'waterjet', 'router', 'print'] });
    expect(setup.canSave).toBe(true);
  });

  it('form values round-trip to the same validated spec as the file', () => {
    const fromFile = parseSpec(parseYaml(readFileSync(DEMO, 'utf8')));
    expect(parseSpec(formValuesToSpec(specToFormValues(parseYaml(readFileSync(DEMO, 'utf8')))))).toEqual(fromFile);
  });

  it('gives the CLI\'s own message for a bad field (422, field named)', async () => {
    for (const [key, value, field] of [
      ['site.latitude', 95, 'site.latitude'],
      ['hours.from', '05:00', 'hours.from'],
      ['gnomon.height', 0, 'gnomon.height'],
    ] as const) {
      const bad = join(dir, `bad-${field}.yaml`);
      const rawSpec = parseYaml(readFileSync(DEMO, 'utf8'));
      const [section, name] = key.split('.');
      rawSpec[section][name] = value;
      writeFileSync(bad, JSON.stringify(rawSpec));
      const cli = await runCli(['build', bad, '--out', join(dir, 'never')]);
      expect(cli.code).toBe(1);
      const r = await postJson(server, '/api/view', { fields: { ...values, [key]: value } });
      expect(r.status).toBe(422);
      expect(r.json.error.field).toBe(field);
      expect(`umbrafab: ${r.json.error.message}`).toBe(cli.err);
    }
  });

  it('serves every output file byte for byte as buildFiles and `umbrafab build` write them', async () => {
    const r = await postJson(server, '/api/view', { fields: values });
    expect(r.status).toBe(200);
    const list = (await (await fetch(server.url + r.json.filesUrl.slice(1))).json()) as any;
    const direct = await buildFiles(readSpecFile(DEMO));
    const out = join(dir, 'cli-out');
    expect((await runCli(['build', DEMO, '--out', out])).code).toBe(0);
    expect(list.files.map((f: any) => f.name)).toEqual(direct.files.map((f) => f.name));
    for (const f of list.files) {
      const res = await fetch(server.url + f.url.slice(1));
      expect(res.status, f.name).toBe(200);
      expect(res.headers.get('content-disposition')).toBe(`attachment; filename="${f.name}"`);
      const got = Buffer.from(await res.arrayBuffer());
      expect(got.equals(Buffer.from(direct.files.find((d) => d.name === f.name)!.bytes)), `${f.name} vs buildFiles`).toBe(true);
      expect(got.equals(readFileSync(join(out, f.name))), `${f.name} vs umbrafab build`).toBe(true);
    }
    expect(r.json.svg).toBe(readFileSync(join(out, 'preview.svg'), 'utf8'));
  });

  it('refuses a body over the limit with 413, whether announced or streamed', async () => {
    const big = Buffer.alloc(MAX_BODY_BYTES + 1, 0x20);
    const announced = await raw(server, { method: 'POST', path: '/api/view', headers: { 'Content-Type': 'application/json', 'Content-Length': String(big.length) }, body: big });
    expect(announced.status).toBe(413);
    expect(JSON.parse(announced.body.toString()).error.message).toMatch(/allowed: at most 262144 bytes/);
    const streamed = await raw(server, {
      method: 'POST',
      path: '/api/save',
      headers: { 'Content-Type': 'application/json', 'Transfer-Encoding': 'chunked' },
      chunks: Array.from({ length: 40 }, () => Buffer.alloc(8 * 1024, 0x20)),
    });
    expect(streamed.status).toBe(413);
    expect(readFileSync(specFile, 'utf8')).toBe(readFileSync(DEMO, 'utf8'));
  });

  it('refuses a non-JSON body (415) and unknown body keys (400)', async () => {
    const form = await raw(server, { method: 'POST', path: '/api/save', headers: { 'Content-Type': 'application/x-www-form-urlencoded' }, body: 'fields=1' });
    expect(form.status).toBe(415);
    const extra = await postJson(server, '/api/save', { fields: values, path: '../evil.yaml' });
    expect(extra.status).toBe(400);
    expect(extra.json.error.message).toMatch(/unknown key "path"/);
    expect(existsSync(join(dir, '..', 'evil.yaml'))).toBe(false);
  });

  it('never reads a path from a request: traversal attempts are 404 and leak nothing', async () => {
    const id = (await postJson(server, '/api/view', { fields: values })).json.id;
    expect((await raw(server, { path: `/api/files/${id}/plate.dxf` })).status).toBe(200);
    const secret = readFileSync(join(ROOT, 'package.json'), 'utf8');
    for (const path of [
      '/../package.json',
      '/%2e%2e/%2e%2e/package.json',
      '/page/../../../../package.json',
      '/vendor/../../../../../package.json',
      '/vendor/..%2f..%2f..%2fpackage.json',
      `/api/files/${id}/..%2F..%2F..%2F..%2Fpackage.json`,
      `/api/files/${id}/%2e%2e%2f%2e%2e%2fpackage.json`,
      `/api/files/${id}/../../../package.json`,
      `/api/files/${id}/plate.dxf%00`,
      '/api/files/0000000000000000/plate.dxf',
      '/etc/passwd',
      '//etc/passwd',
      '/page.js/../../package.json',
      '/index.html',
      '/startServer.ts',
    ]) {
      const r = await raw(server, { path });
      expect(r.status, path).toBe(404);
      expect(r.body.toString()).not.toContain('umbrafab-workspace');
      expect(r.body.toString()).not.toContain(secret.slice(0, 40));
    }
  });

  it('refuses another site: a foreign Host header (DNS rebinding) or a foreign Origin on a POST', async () => {
    const host = await raw(server, { path: '/api/setup', headers: { Host: 'attacker.example:80' } });
    expect(host.status).toBe(403);
    const origin = await raw(server, {
      method: 'POST',
      path: '/api/save',
      headers: { 'Content-Type': 'application/json', Origin: 'http://attacker.example' },
      body: JSON.stringify({ fields: values }),
    });
    expect(origin.status).toBe(403);
    expect(readFileSync(specFile, 'utf8')).toBe(readFileSync(DEMO, 'utf8'));
  });

  it('writes no file while building, drawing the sun and downloading', async () => {
    const before = snapshot(dir);
    const parentBefore = readdirSync(join(dir, '..')).filter((n) => n.startsWith('umbrafab-serve-')).length;
    const b = await postJson(server, '/api/view', { fields: { ...values, 'gnomon.height': 44 } });
    await postJson(server, '/api/sun', { fields: values, date: '2027-06-21', time: '10:00', kind: 'clock' });
    const list = (await (await fetch(server.url + b.json.filesUrl.slice(1))).json()) as any;
    for (const f of list.files) expect((await fetch(server.url + f.url.slice(1))).status).toBe(200);
    expect(snapshot(dir)).toEqual(before);
    expect(readdirSync(join(dir, '..')).filter((n) => n.startsWith('umbrafab-serve-')).length).toBe(parentBefore);
    expect(existsSync(join(ROOT, 'out', 'dial'))).toBe(false);
  });

  it('"save spec" edits the spec file only: the changed fields, listed first; comments and other lines kept', async () => {
    const original = readFileSync(specFile, 'utf8');
    const changed = { ...values, 'gnomon.height': 42, 'site.latitude': 48.5 };
    const preview = await postJson(server, '/api/save', { fields: changed, preview: true });
    expect(preview.status).toBe(200);
    expect(preview.json.changes.map((c: any) => c.key)).toEqual(['site.latitude', 'gnomon.height']);
    expect(preview.json.changes[1].text).toMatch(/^gnomon\.height: \d+(\.\d+)? → 42$/);
    expect(readFileSync(specFile, 'utf8')).toBe(original); // a preview writes nothing
    const r = await postJson(server, '/api/save', { fields: changed });
    expect(r.status).toBe(200);
    expect(r.json.written).toBe(true);
    const text = readFileSync(specFile, 'utf8');
    const a = original.split('\n');
    const b = text.split('\n');
    expect(b.length).toBe(a.length);
    const differ = a.map((line, i) => [line, b[i]]).filter(([x, y]) => x !== y);
    expect(differ.length).toBe(2);
    for (const [before, after] of differ) {
      expect(after.replace(/\d+(\.\d+)?/, 'N')).toBe(before.replace(/\d+(\.\d+)?/, 'N')); // same key, same comment, new number
    }
    expect(readSpecFile(specFile)).toEqual(parseSpec(formValuesToSpec(changed)));
    expect(readdirSync(dir).filter((n) => n.startsWith('.'))).toEqual([]); // no temporary file left
    expect(logs.some((l) => l.includes('saved 2 changed field(s)') && l.includes('gnomon.height'))).toBe(true);
    // An invalid spec is not saved.
    const bad = await postJson(server, '/api/save', { fields: { ...values, 'site.latitude': 123 } });
    expect(bad.status).toBe(422);
    expect(readFileSync(specFile, 'utf8')).toBe(text);
    // Unchanged again: nothing to write, the bytes stay.
    const same = await postJson(server, '/api/save', { fields: changed });
    expect(same.json).toMatchObject({ written: false, changes: [] });
    expect(readFileSync(specFile, 'utf8')).toBe(text);
    writeFileSync(specFile, original);
  });

  it('"save spec" with the form unchanged leaves the file byte for byte; emptying a field takes it out', async () => {
    for (const name of PAGE_SPECS) {
      const file = join(dir, `${name}.yaml`);
      copyFileSync(join(ROOT, 'fixtures/specs', `${name}.yaml`), file);
      const before = readFileSync(file);
      const s = await startServer({ specPath: file, port: 0, log: () => {} });
      try {
        const setup = (await (await fetch(s.url + 'api/setup')).json()) as any;
        const r = await postJson(s, '/api/save', { fields: setup.values });
        expect(r.json, name).toMatchObject({ ok: true, written: false, changes: [] });
        expect(readFileSync(file).equals(before), name).toBe(true);
        if (name === 'page-router-thick') {
          const gone = await postJson(s, '/api/save', { fields: { ...setup.values, 'gnomon.height': '' } });
          expect(gone.json.changes.map((c: any) => c.key)).toEqual(['gnomon.height']);
          const text = readFileSync(file, 'utf8');
          expect(text).not.toMatch(/^gnomon:/m); // the section held only that field
          expect(text).toContain('a 12 mm hardwood plate cut on a\n# router;'); // comments stay
          expect(readSpecFile(file).gnomon.height).toBe(50);
        }
      } finally {
        await s.close();
      }
    }
  });

  it('has nowhere to save when no spec file was named (409)', async () => {
    const bare = await startServer({ port: 0, log: () => {} });
    try {
      const setup = (await (await fetch(bare.url + 'api/setup')).json()) as any;
      expect(setup.canSave).toBe(false);
      const r = await postJson(bare, '/api/save', { fields: setup.values });
      expect(r.status).toBe(409);
      expect(r.json.error.message).toMatch(/no spec file was named/);
    } finally {
      await bare.close();
    }
  });
});

describe('serve: the page builds what `umbrafab build` builds, for every process', () => {
  it.each(PAGE_SPECS)('%s: the setup values unchanged give every file byte for byte', async (name) => {
    const spec = join(ROOT, 'fixtures/specs', `${name}.yaml`);
    const out = mkdtempSync(join(tmpdir(), `umbrafab-page-${name}-`));
    const server = await startServer({ specPath: spec, port: 0, log: () => {} });
    try {
      const cli = await runCli(['build', spec, '--out', out, '--force']);
      expect(cli.code, cli.err).toBe(0);
      const setup = (await (await fetch(server.url + 'api/setup')).json()) as any;
      // Defaults that follow another field are shown as derived, not filled in.
      for (const f of setup.fields.filter((x: any) => x.derived)) {
        expect(setup.fields.find((x: any) => x.key === f.key).default, f.key).toBeUndefined();
        expect(setup.derived[f.key].follows, f.key).toEqual(f.derived.follows);
      }
      const built = readSpecFile(spec);
      expect(setup.derived['process.kerf'].value).toBe(built.process.kerf);
      expect(setup.derived['gnomon.thickness'].value).toBe(built.gnomon.thickness);
      expect(setup.derived['marks.hour.width'].value).toBe(built.marks.hour.width);
      const r = await postJson(server, '/api/view', { fields: setup.values });
      expect(r.status, JSON.stringify(r.json.error)).toBe(200);
      expect(r.json.derived['process.kerf'].value).toBe(built.process.kerf);
      const list = (await (await fetch(server.url + r.json.filesUrl.slice(1))).json()) as any;
      expect(list.files.map((f: any) => f.name).sort()).toEqual(readdirSync(out).sort());
      for (const f of list.files) {
        const got = Buffer.from(await (await fetch(server.url + f.url.slice(1))).arrayBuffer());
        expect(got.equals(readFileSync(join(out, f.name))), `${name}: ${f.name} vs umbrafab build`).toBe(true);
      }
    } finally {
      await server.close();
    }
  });
});

describe('serve: the sun through the geometry package', () => {
  let server: RunningServer;
  let values: Record<string, unknown>;
  beforeAll(async () => {
    server = await startServer({ specPath: SOLAR, port: 0, log: () => {} });
    values = ((await (await fetch(server.url + 'api/setup')).json()) as any).values;
  });
  afterAll(async () => server?.close());

  it('15:00 apparent time on the March equinox: hour angle 45°, shadow edge on the 15:00 line (t/2 + h)', async () => {
    // March equinox 2027: 20 March, about 20:25 UT (memory); the declination that day is within 0.4° of zero.
    const r = await postJson(server, '/api/sun', { fields: values, date: '2027-03-20', time: '15:00', kind: 'apparent' });
    expect(r.status).toBe(200);
    const sun = r.json.sun;
    expect(sun.state).toBe('lit');
    expect(sun.hourAngleDeg).toBeCloseTo(45, 6);
    expect(Math.abs(sun.declinationDeg)).toBeLessThan(0.4);
    const b = await postJson(server, '/api/view', { fields: values });
    const mark = b.json.summary.find((s: any) => s.key === 'mark15');
    // The 45° check (common practice, docs/design.md §2): at |H| = 45° the line lies one gnomon height from its style edge.
    expect(mark.value).toMatch(/^51\.5 mm/);
    const edge = Math.max(...sun.shadowFace.flat().map((p: number[]) => p[0]));
    expect(edge).toBeCloseTo(3 / 2 + 50, 6);
  });

  it('names the bad date or time like any spec field', async () => {
    const r = await postJson(server, '/api/sun', { fields: values, date: '2027-02-30', time: '15:00', kind: 'apparent' });
    expect(r.status).toBe(422);
    expect(r.json.error.field).toBe('date');
    const night = await postJson(server, '/api/sun', { fields: values, date: '2027-12-21', time: '02:00', kind: 'clock' });
    expect(night.json.sun.state).toBe('below');
    expect(night.json.sun.shadowFace).toEqual([]);
  });
});
