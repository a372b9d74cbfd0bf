import { createHash } from 'node:crypto';
import { existsSync } from 'node:fs';
import type { IncomingMessage, ServerResponse } from 'node:http';
import { isIP } from 'node:net';
import { basename, dirname } from 'node:path';
import { isSpecError, parseSpec, type DialSpec } from '@umbrafab/geometry';
import { writeFilesAtomic } from '../writeFilesAtomic.ts';
import { isLoopbackHost, type HostCheck } from './bindPolicy.ts';
import { isPlanarContext, type BuildCache } from './buildCache.ts';
import { formValuesToSpec, specToFormValues, type FormValue } from './formValues.ts';
import { HttpError } from './httpError.ts';
import { plateToPreview, previewFrame } from '@umbrafab/fabricate';
import { BodyAbortedError, MAX_BODY_BYTES, readJsonBody } from './readJsonBody.ts';
import { planarSceneMeshes, sceneMeshes } from './sceneMeshes.ts';
import { specFields } from './specFields.ts';
import { parseSpecText, readSpecText } from '../readSpec.ts';
import { starterSpecYaml } from '../starterSpec.ts';
import { derivedValues, type DerivedValue } from './derivedValues.ts';
import { describeChange, editSpecText } from './editSpecText.ts';
import { STATIC_ASSETS } from './staticAssets.ts';
import { planarSummaryRows, summaryRows } from './summaryRows.ts';
import { sunView, type SunQuery } from './sunView.ts';

/** Everything a request may use; fixed when the server starts. */
export interface ServeContext {
  readonly builds: BuildCache;
  /** the spec file given on the command line (absolute), the only file "save spec" may write; null if none */
  readonly specPath: string | null;
  /** how the page names that file (as typed on the command line) */
  readonly specLabel: string | null;
  /** the spec the page opens with (raw, before validation) */
  readonly initialSpec: unknown;
  /** the calendar year of the starter spec (used when the spec file does not exist yet) */
  readonly starterYear: number;
  /** the problem with the initial spec file, if it could not be read */
  readonly initialError: string | null;
  /** the port actually bound (for the Host header check) */
  readonly port: () => number;
  /** which Host headers are answered (DNS-rebinding guard), from bindPolicy */
  readonly hostCheck: HostCheck;
  readonly maxBodyBytes?: number;
  readonly log: (line: string) => void;
}

const FILE_TYPES: Readonly<Record<string, string>> = {
  dxf: 'application/dxf',
  svg: 'image/svg+xml',
  json: 'application/json',
  stl: 'model/stl',
  pdf: 'application/pdf',
  png: 'image/png',
  ngc: 'text/plain; charset=utf-8',
  gcode: 'text/plain; charset=utf-8',
  txt: 'text/plain; charset=utf-8',
  csv: 'text/csv; charset=utf-8',
  yaml: 'text/yaml; charset=utf-8',
};

let pageCsp: string | undefined;

/**
 * Serve one request. Routes (nothing else exists; any other URL is 404):
 * - GET the page's files and three.js from a fixed table (STATIC_ASSETS);
 * - GET  /api/setup: the form's fields (from the spec schema), its first values, the save target;
 * - POST /api/view {fields}: validate with parseSpec (422 with the CLI's message when invalid) and return the views:
 *   preview.svg as the build writes it, the numbers, the placed parts for 3D;
 * - GET  /api/files/<id>: the full build's file list (buildAnyFiles, as `umbrafab build`; run once per spec on first request);
 * - GET  /api/files/<id>/<name>: one file of that build, its bytes exactly;
 * - POST /api/sun {fields, date, time, kind}: the sun and the gnomon's shadow;
 * - POST /api/save {fields, preview?}: edit the spec file given on the command line, only the changed fields (preview: list them, write nothing).
 */
export async function handleRequest(ctx: ServeContext, req: IncomingMessage, res: ServerResponse): Promise<void> {
  try {
    checkHost(ctx, req);
    const url = new URL(req.url ?? '/', 'http://page.invalid');
    const path = url.pathname;
    const method = req.method ?? 'GET';
    if (method === 'GET' || method === 'HEAD') {
      const asset = STATIC_ASSETS[path];
      if (asset) {
        const bytes = await asset.read();
        return send(res, 200, asset.type, bytes, path === '/' ? { 'Content-Security-Policy': csp(bytes) } : {});
      }
      if (path === '/api/setup') return sendJson(res, 200, setup(ctx));
      if (path.startsWith('/api/files/')) return await sendBuildFile(ctx, res, path);
      throw new HttpError(404, `${path}: no such page or file`);
    }
    if (method !== 'POST') throw new HttpError(405, `${method}: allowed: GET or POST`);
    checkOrigin(req);
    const body = await readJsonBody(req, ctx.maxBodyBytes ?? MAX_BODY_BYTES);
    if (path === '/api/view') return sendJson(res, 200, await view(ctx, body));
    if (path === '/api/sun') return sendJson(res, 200, await sun(ctx, body));
    if (path === '/api/save') return sendJson(res, 200, save(ctx, body));
    throw new HttpError(404, `${path}: no such action`);
  } catch (e) {
    if (isSpecError(e)) return sendJson(res, 422, refusal(e.field, e.message));
    if (e instanceof HttpError) {
      // A body we did not read to the end: answer, then close the connection (Node ends the socket after the response).
      if (e.status === 413) res.setHeader('Connection', 'close');
      return sendJson(res, e.status, refusal(null, e.message));
    }
    if (e instanceof BodyAbortedError) {
      // A slow or vanished upload: one line in the log, and the connection is already closed or closing.
      ctx.log(`umbrafab serve: ${e.message}`);
      if (!res.headersSent && !res.destroyed) return sendJson(res, 408, refusal(null, 'request body: did not arrive in time'));
      return;
    }
    ctx.log(`umbrafab serve: internal error: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`);
    return sendJson(res, 500, refusal(null, `internal error: ${e instanceof Error ? e.message : String(e)}`));
  }
}

/**
 * Answer only a Host naming this server: a loopback name or address, and with
 * --allow-remote an IP address literal or a name given with --allowed-host,
 * with this server's port. A page on another site that reaches us through a
 * rebound DNS name sends its own name, and is refused.
 */
function checkHost(ctx: ServeContext, req: IncomingMessage): void {
  const { names, ipLiterals } = ctx.hostCheck;
  if (names === null) return;
  const host = String(req.headers.host ?? '');
  const m = /^(\[[^\]]+\]|[^:]+)(?::(\d+))?$/.exec(host);
  const name = m ? m[1].replace(/^\[|\]$/g, '').toLowerCase().replace(/\.$/, '') : '';
  const known = m !== null && (isLoopbackHost(name) || (ipLiterals && isIP(name) !== 0) || names.some((n) => n.replace(/\.$/, '') === name));
  if (!known || (m[2] !== undefined && Number(m[2]) !== ctx.port())) {
    const allowed = ['127.0.0.1', 'localhost', '[::1]', ...(ipLiterals ? ['an IP address of this machine'] : []), ...names].join(', ');
    throw new HttpError(403, `Host ${JSON.stringify(host)}: allowed: ${allowed}, with this server's port`);
  }
}

/** A POST from another site's page carries its Origin: refuse it (the page itself sends its own origin or none). */
function checkOrigin(req: IncomingMessage): void {
  const origin = req.headers.origin;
  if (origin === undefined) return;
  let host = '';
  try {
    host = new URL(origin).host;
  } catch {
    /* "null" or junk: refused below */
  }
  if (host !== req.headers.host) throw new HttpError(403, `Origin ${origin}: allowed: this page only`);
}

function setup(ctx: ServeContext) {
  let derived: Record<string, DerivedValue> | null = null;
  try {
    derived = derivedValues(parseSpec(ctx.initialSpec));
  } catch (e) {
    if (!isSpecError(e)) throw e;
  }
  return {
    ok: true,
    fields: specFields(),
    values: specToFormValues(ctx.initialSpec),
    derived,
    specFile: ctx.specLabel,
    canSave: ctx.specPath !== null,
    initialError: ctx.initialError,
    limits: { maxBodyBytes: ctx.maxBodyBytes ?? MAX_BODY_BYTES },
  };
}

function fieldsOf(body: unknown, allowedKeys: readonly string[]): Record<string, FormValue> {
  if (body === null || typeof body !== 'object' || Array.isArray(body)) throw new HttpError(400, 'request body: allowed: a JSON object');
  const extra = Object.keys(body).filter((k) => !allowedKeys.includes(k));
  if (extra.length) throw new HttpError(400, `request body: unknown key ${JSON.stringify(extra[0])}; allowed: ${allowedKeys.join(', ')}`);
  const fields = (body as { fields?: unknown }).fields;
  if (fields === null || typeof fields !== 'object' || Array.isArray(fields)) throw new HttpError(400, 'request body: "fields" must be an object of form values');
  return fields as Record<string, FormValue>;
}

function specFrom(fields: Record<string, FormValue>): DialSpec {
  return parseSpec(formValuesToSpec(fields));
}

async function view(ctx: ServeContext, body: unknown) {
  const spec = specFrom(fieldsOf(body, ['fields']));
  const b = await ctx.builds.views(spec);
  const c = b.ctx;
  const planar = isPlanarContext(c);
  return {
    ok: true,
    id: b.id,
    svg: b.previewSvg,
    frame: previewFrame(c.drawing, b.previewOptions),
    summary: planar ? planarSummaryRows(c.layout) : summaryRows(c.layout),
    derived: derivedValues(spec, c.layout),
    notes: c.layout.notes,
    scene: planar ? planarSceneMeshes(c.layout) : sceneMeshes(c.layout),
    filesUrl: `/api/files/${b.id}`,
  };
}

async function fileList(ctx: ServeContext, id: string) {
  const b = ctx.builds.get(id);
  if (!b) throw new HttpError(404, `build ${id}: not a recent build (change a field to build again)`);
  const files = await b.full();
  return { ok: true, id, files: files.map((f) => ({ name: f.name, bytes: f.bytes.length, url: `/api/files/${id}/${encodeURIComponent(f.name)}` })) };
}

async function sun(ctx: ServeContext, body: unknown) {
  const fields = fieldsOf(body, ['fields', 'date', 'time', 'kind']);
  const q = body as SunQuery;
  const b = await ctx.builds.views(specFrom(fields));
  const { layout } = b.ctx;
  const view = sunView(layout, { date: q.date, time: q.time, kind: q.kind });
  const frame = previewFrame(b.ctx.drawing, b.previewOptions);
  const { plate } = layout;
  const shadowPreview = view.shadowFace.map((poly) => poly.map(([x, y]) => plateToPreview(frame, [x + plate.substyleX, y + plate.faceOriginY])));
  return { ok: true, id: b.id, sun: view, shadowPreview };
}

/**
 * "save spec": edit the user's file in place, writing only the fields the form
 * changed (comments, order and untouched fields stay); atomic. With
 * `preview: true` it only lists the changes, which the page shows before
 * saving. Nothing changed: nothing is written.
 */
function save(ctx: ServeContext, body: unknown) {
  const fields = fieldsOf(body, ['fields', 'preview']);
  if (ctx.specPath === null) throw new HttpError(409, 'save spec: no spec file was named when the server started; allowed: start it as `umbrafab serve my-dial.yaml` to save to that file');
  parseSpec(formValuesToSpec(fields)); // refuse to save a spec the CLI would refuse
  const current = existsSync(ctx.specPath) ? readSpecText(ctx.specPath) : starterSpecYaml(ctx.starterYear); // capped, like every spec read
  const raw = parseSpecText(current, ctx.specLabel ?? 'spec') ?? {};
  const edit = editSpecText(current, raw, fields);
  const changes = edit.changes.map((c) => ({ ...c, text: describeChange(c) }));
  if ((body as { preview?: unknown }).preview === true) return { ok: true, file: ctx.specLabel, preview: true, changes };
  if (edit.changes.length === 0 && existsSync(ctx.specPath)) return { ok: true, file: ctx.specLabel, changes, bytes: Buffer.byteLength(current), written: false };
  parseSpec(parseSpecText(edit.text, ctx.specLabel ?? 'spec')); // the edited file itself must build
  writeFilesAtomic(dirname(ctx.specPath), [{ name: basename(ctx.specPath), bytes: new TextEncoder().encode(edit.text) }], true);
  ctx.log(`umbrafab serve: saved ${changes.length} changed field(s) to ${ctx.specLabel}${changes.length ? `: ${changes.map((c) => c.text).join('; ')}` : ''}`);
  return { ok: true, file: ctx.specLabel, changes, bytes: Buffer.byteLength(edit.text), written: true };
}

async function sendBuildFile(ctx: ServeContext, res: ServerResponse, path: string): Promise<void> {
  const list = /^\/api\/files\/([0-9a-f]{16})$/.exec(path);
  if (list) return sendJson(res, 200, await fileList(ctx, list[1]));
  const m = /^\/api\/files\/([0-9a-f]{16})\/([^/]+)$/.exec(path);
  let name = '';
  try {
    name = m ? decodeURIComponent(m[2]) : '';
  } catch {
    /* bad escape: not found */
  }
  const b = m ? ctx.builds.get(m[1]) : undefined;
  const file = b ? (await b.full()).find((f) => f.name === name) : undefined;
  if (!file) throw new HttpError(404, `${path}: no such file in a recent build (build again and download from the list)`);
  const ext = file.name.split('.').pop() ?? '';
  send(res, 200, FILE_TYPES[ext] ?? 'application/octet-stream', file.bytes, { 'Content-Disposition': `attachment; filename="${file.name.replace(/[^\w.-]/g, '_')}"` });
}

function sendJson(res: ServerResponse, status: number, value: unknown): void {
  send(res, status, 'application/json; charset=utf-8', Buffer.from(JSON.stringify(value)));
}

function send(res: ServerResponse, status: number, type: string, bytes: Uint8Array, extra: Record<string, string> = {}): void {
  res.writeHead(status, {
    'Content-Type': type,
    'Content-Length': String(bytes.length),
    'Cache-Control': 'no-store',
    'X-Content-Type-Options': 'nosniff',
    'Referrer-Policy': 'no-referrer',
    ...extra,
  });
  res.end(res.req.method === 'HEAD' ? undefined : bytes);
}

/** The page's Content-Security-Policy: its own scripts and the one inline import map (by hash), nothing from elsewhere. */
function csp(indexHtml: Uint8Array): string {
  if (!pageCsp) {
    const html = new TextDecoder().decode(indexHtml);
    const map = /<script type="importmap">([\s\S]*?)<\/script>/.exec(html)?.[1] ?? '';
    const hash = createHash('sha256').update(map).digest('base64');
    pageCsp = `default-src 'self'; script-src 'self' 'sha256-${hash}'; style-src 'self' 'unsafe-inline'; img-src 'self' data: blob:; connect-src 'self'; object-src 'none'; base-uri 'none'; frame-ancestors 'none'; form-action 'none'`;
  }
  return pageCsp;
}

// The answers the page's modules read (src/serve/page/api.ts), typed from the functions that build them.
/** GET /api/setup */
export type SetupAnswer = ReturnType<typeof setup>;
/** POST /api/view */
export type ViewAnswer = Awaited<ReturnType<typeof view>>;
/** GET /api/files/<id> */
export type FileListAnswer = Awaited<ReturnType<typeof fileList>>;
/** POST /api/sun */
export type SunAnswer = Awaited<ReturnType<typeof sun>>;
/** POST /api/save (with or without preview) */
export type SaveAnswer = ReturnType<typeof save>;
/** Every refused request (4xx, 5xx): the problem, naming the spec field when it is one. */
export interface Refusal {
  readonly ok: false;
  readonly error: { readonly field: string | null; readonly message: string };
}

function refusal(field: string | null, message: string): Refusal {
  return { ok: false, error: { field, message } };
}
