import { existsSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { resolve } from 'node:path';
import { SpecError } from '@umbrafab/geometry';
import { parseSpecText, readSpecText } from '../readSpec.ts';
import { starterSpecYaml } from '../starterSpec.ts';
import { bindPolicy, DEFAULT_PORT } from './bindPolicy.ts';
import { buildCache } from './buildCache.ts';
import { fullBuilder } from './fullBuilder.ts';
import { handleRequest } from './handleRequest.ts';
import { MAX_BODY_BYTES } from './readJsonBody.ts';
import { specFields } from './specFields.ts';

/** Options of `startServer`. */
export interface ServeOptions {
  /** spec file to open and the only file "save spec" writes (may not exist yet); none: start from the starter spec, saving disabled */
  readonly specPath?: string;
  /** address to bind, default 127.0.0.1; anything but loopback needs `allowRemote` */
  readonly host?: string;
  /** port, default 7370; 0 picks a free one */
  readonly port?: number;
  readonly allowRemote?: boolean;
  /** with allowRemote: host names the page may be reached by besides IP addresses and localhost; ['*'] turns the Host check off */
  readonly allowedHosts?: readonly string[];
  /** how long a request may take to arrive, ms, default 30000 */
  readonly requestTimeoutMs?: number;
  /** largest request body, bytes, default MAX_BODY_BYTES (256 KiB) */
  readonly maxBodyBytes?: number;
  /** where warnings and save notices go */
  readonly log?: (line: string) => void;
}

/** A running page server. */
export interface RunningServer {
  /** the address to open, e.g. "http://127.0.0.1:7370/" */
  readonly url: string;
  readonly host: string;
  readonly port: number;
  /** a warning to show (non-loopback bind), if any */
  readonly warning?: string;
  readonly close: () => Promise<void>;
}

export { DEFAULT_PORT } from './bindPolicy.ts';

/**
 * Start the local page server (node:http). Refuses a non-loopback host
 * unless `allowRemote`; reads the spec file once at start (a missing file
 * opens the starter spec and is created by the first save); writes nothing
 * except on an explicit save.
 * @throws UsageError for a refused host; the listen error (e.g. EADDRINUSE) otherwise
 * @example const s = await startServer({ specPath: 'dial.yaml', port: 0 }); console.log(s.url); await s.close();
 */
export async function startServer(options: ServeOptions = {}): Promise<RunningServer> {
  const { host, warning, hostCheck } = bindPolicy(options);
  const log = options.log ?? ((l: string) => process.stderr.write(l + '\n'));
  const specPath = options.specPath ? resolve(options.specPath) : null;
  let initialSpec: unknown;
  let initialError: string | null = null;
  const starterYear = Number(specFields().find((f) => f.key === 'calendar.year')?.default ?? 2027);
  const starter = () => parseSpecText(starterSpecYaml(starterYear));
  if (specPath && existsSync(specPath)) {
    try {
      initialSpec = parseSpecText(readSpecText(specPath), options.specPath);
    } catch (e) {
      if (!(e instanceof SpecError) && !(e instanceof Error && 'code' in e)) throw e;
      initialError = e.message;
      initialSpec = starter();
    }
  } else initialSpec = starter();

  let server: Server | undefined;
  const builder = fullBuilder();
  const ctx = {
    builds: buildCache(builder),
    specPath,
    specLabel: options.specPath ?? null,
    initialSpec,
    initialError,
    starterYear,
    port: () => (server?.address() as AddressInfo | null)?.port ?? 0,
    hostCheck,
    maxBodyBytes: options.maxBodyBytes ?? MAX_BODY_BYTES,
    log,
  };
  const requestTimeout = options.requestTimeoutMs ?? 30_000;
  // Node checks for timed-out requests every connectionsCheckingInterval (30 s by default): check often enough to keep the limit.
  const srv = createServer({ requestTimeout, headersTimeout: Math.min(10_000, requestTimeout), connectionsCheckingInterval: Math.max(100, Math.min(1_000, requestTimeout / 2)) }, (req, res) => void handleRequest(ctx, req, res));
  server = srv;
  await new Promise<void>((ok, fail) => {
    srv.once('error', fail);
    srv.listen(options.port ?? DEFAULT_PORT, host, () => {
      srv.off('error', fail);
      ok();
    });
  });
  const port = (srv.address() as AddressInfo).port;
  const shown = host.includes(':') ? `[${host}]` : host;
  return {
    url: `http://${shown}:${port}/`,
    host,
    port,
    ...(warning ? { warning } : {}),
    close: () =>
      new Promise<void>((ok) => {
        srv.closeAllConnections();
        srv.close(() => void builder.close().then(ok));
      }),
  };
}
