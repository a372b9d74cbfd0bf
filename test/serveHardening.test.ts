import { readFileSync } from 'node:fs';
import { connect } from 'node:net';
import { request } from 'node:http';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parse as parseYaml } from 'yaml';
import { parseSpec } from '@umbrafab/geometry';
import { bindPolicy, buildCache, fullBuilder, startServer, type FullBuilder, type RunningServer } from '@umbrafab/cli';

const ROOT = resolve(import.meta.dirname, '..');
const DEMO = join(ROOT, 'fixtures/demo.yaml');

/** GET /api/setup with a chosen Host header (fetch would set its own), loopback only. */
function getWithHost(server: RunningServer, host: string): Promise<number> {
  return new Promise((ok, fail) => {
    const req = request({ host: '127.0.0.1', port: server.port, path: '/api/setup', headers: { Host: host } }, (res) => {
      res.resume();
      res.on('end', () => ok(res.statusCode ?? 0));
    });
    req.on('error', fail);
    req.end();
  });
}

describe('serve: the Host check with --allow-remote', () => {
  it('stays on with an explicit list of names; "*" turns it off with a warning that says what that means', () => {
    expect(bindPolicy({}).hostCheck).toEqual({ names: [], ipLiterals: false });
    expect(bindPolicy({ host: '127.0.0.1', allowRemote: true })).toEqual({ host: '127.0.0.1', hostCheck: { names: [], ipLiterals: true } });
    const lan = bindPolicy({ host: '0.0.0.0', allowRemote: true, allowedHosts: ['Dial.Example.LAN'] });
    expect(lan.hostCheck).toEqual({ names: ['dial.example.lan'], ipLiterals: true });
    expect(lan.warning).toMatch(/requests must name the server by an IP address, localhost, dial\.example\.lan \(add a name with --allowed-host; this guards against DNS rebinding\)/);
    const off = bindPolicy({ host: '0.0.0.0', allowRemote: true, allowedHosts: ['*'] });
    expect(off.hostCheck.names).toBeNull();
    expect(off.warning).toMatch(/the Host check is OFF \(--allowed-host "\*"\): any web page that anyone who can reach this server opens in a browser can reach it through DNS rebinding/);
    expect(bindPolicy({ host: '127.0.0.1', allowRemote: true, allowedHosts: ['*'] }).warning).toMatch(/^warning: the Host check is OFF/);
    expect(() => bindPolicy({ host: '0.0.0.0', allowRemote: true, allowedHosts: ['evil.example/x'] })).toThrow(/--allowed-host: got "evil\.example\/x"; allowed: a host name/);
    expect(() => bindPolicy({ allowedHosts: ['dial.lan'] })).toThrow(/--allowed-host: only with --allow-remote/);
  });

  it('answers loopback names, IP literals and the listed names with its port; refuses any other name (a rebinding page)', async () => {
    const server = await startServer({ specPath: DEMO, host: '127.0.0.1', port: 0, allowRemote: true, allowedHosts: ['dial.example.lan'], log: () => {} });
    try {
      const p = server.port;
      for (const host of [`127.0.0.1:${p}`, `localhost:${p}`, `[::1]:${p}`, `dial.example.lan:${p}`, `DIAL.example.lan:${p}`, `192.168.1.20:${p}`, `[fe80::1]:${p}`]) expect(await getWithHost(server, host), host).toBe(200);
      for (const host of [`attacker.example:${p}`, `dial.example.lan.attacker.example:${p}`, `dial.example.lan:${p + 1}`, 'attacker.example', `127.0.0.1.attacker.example:${p}`]) expect(await getWithHost(server, host), JSON.stringify(host)).toBe(403);
    } finally {
      await server.close();
    }
    const open = await startServer({ specPath: DEMO, port: 0, allowRemote: true, allowedHosts: ['*'], log: () => {} });
    try {
      expect(await getWithHost(open, `attacker.example:${open.port}`)).toBe(200);
      expect(open.warning).toMatch(/Host check is OFF/);
    } finally {
      await open.close();
    }
  });
});

describe('serve: request bodies', () => {
  it('a JSON body with a UTF-8 byte order mark is accepted, with the same answer as without', async () => {
    const server = await startServer({ specPath: DEMO, port: 0, log: () => {} });
    try {
      const setup = (await (await fetch(server.url + 'api/setup')).json()) as { values: Record<string, unknown> };
      const body = JSON.stringify({ fields: setup.values });
      const post = (b: string | Buffer) => fetch(server.url + 'api/view', { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: b });
      const plain = await post(body);
      const bom = await post(Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(body)]));
      expect(plain.status).toBe(200);
      expect(bom.status).toBe(200);
      expect(((await bom.json()) as { id: string }).id).toBe(((await plain.json()) as { id: string }).id);
    } finally {
      await server.close();
    }
  });

  it('a slow upload that times out logs one line, no stack trace, and gets 408', async () => {
    const logs: string[] = [];
    const server = await startServer({ port: 0, log: (l) => logs.push(l), requestTimeoutMs: 1000 });
    try {
      const reply = await new Promise<string>((ok, fail) => {
        const sock = connect(server.port, '127.0.0.1');
        let got = '';
        sock.on('data', (d) => (got += d));
        sock.on('close', () => ok(got));
        sock.on('error', fail);
        sock.write(`POST /api/view HTTP/1.1\r\nHost: 127.0.0.1:${server.port}\r\nContent-Type: application/json\r\nContent-Length: 100\r\n\r\n{"fie`);
      });
      expect(reply).toMatch(/^HTTP\/1\.1 408 /);
      expect(logs).toHaveLength(1);
      expect(logs[0]).toMatch(/^umbrafab serve: POST \/api\/view: the request body stopped after 5 bytes \(aborted\)$/);
    } finally {
      await server.close();
    }
  });
});

describe('serve: memory goes back after a build', () => {
  it('the build cache keeps finished builds only up to its byte budget (older ones are built again on request)', async () => {
    const built: string[] = [];
    const fake: FullBuilder = {
      running: () => false,
      warm: () => {},
      build: async (spec) => {
        built.push(spec.name);
        return [{ name: 'big.bin', bytes: new Uint8Array(400) }];
      },
      close: async () => {},
    };
    const cache = buildCache(fake, 12, 1000);
    const base = parseSpec(parseYaml(readFileSync(DEMO, 'utf8')));
    const entries = [];
    for (const name of ['a', 'b', 'c']) {
      const e = await cache.views({ ...base, name });
      await e.full();
      entries.push(e);
    }
    expect(built).toEqual(['a', 'b', 'c']); // 1200 bytes held > 1000: "a" was dropped
    await entries[2].full();
    await entries[1].full();
    expect(built).toEqual(['a', 'b', 'c']);
    await entries[0].full();
    expect(built).toEqual(['a', 'b', 'c', 'a']);
  });

  it('the build worker stops when idle and starts again for the next build, with the same bytes', async () => {
    const builder = fullBuilder({ idleMs: 300 });
    try {
      const spec = parseSpec({ ...parseYaml(readFileSync(DEMO, 'utf8')), pictures: { write: false }, template: { write: false } });
      const first = await builder.build(spec);
      expect(builder.running()).toBe(true);
      for (let i = 0; i < 50 && builder.running(); i++) await new Promise((r) => setTimeout(r, 100));
      expect(builder.running()).toBe(false);
      const second = await builder.build(spec);
      expect(second.map((f) => f.name)).toEqual(first.map((f) => f.name));
      second.forEach((f, i) => expect(Buffer.from(f.bytes).equals(Buffer.from(first[i].bytes)), f.name).toBe(true));
    } finally {
      await builder.close();
    }
  });
});
