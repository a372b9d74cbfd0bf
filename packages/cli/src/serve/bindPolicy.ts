import { isIP } from 'node:net';
import { UsageError } from '../commands/commandTypes.ts';

/** The address the page is served on when none is asked for: loopback only. */
export const DEFAULT_HOST = '127.0.0.1';

/** The page's port when --port is not given. */
export const DEFAULT_PORT = 7370;

/** Is this a loopback address or name (127.0.0.0/8, ::1, localhost)? Only loopback binds are safe by default. */
export function isLoopbackHost(host: string): boolean {
  const h = host.replace(/^\[|\]$/g, '').toLowerCase();
  if (h === 'localhost' || h === '::1' || h === '0:0:0:0:0:0:0:1') return true;
  if (h.startsWith('::ffff:')) return isLoopbackHost(h.slice(7));
  return isIP(h) === 4 && h.split('.')[0] === '127';
}

/**
 * Decide where to bind. A loopback host is always allowed; any other address
 * (a LAN address, 0.0.0.0, ::) only with `allowRemote`, and then with a
 * warning to print: the page can save the spec file and the server has no
 * login, so anyone who can reach the port can use it.
 * @throws UsageError for a non-loopback host without allowRemote
 * @example bindPolicy({ host: '0.0.0.0', allowRemote: true }).warning // 'warning: …'
 */
export function bindPolicy(options: { readonly host?: string; readonly allowRemote?: boolean }): { host: string; warning?: string } {
  const host = (options.host ?? DEFAULT_HOST).trim();
  if (host === '') throw new UsageError('--host: got ""; allowed: a loopback address such as 127.0.0.1 (the default)');
  if (isLoopbackHost(host)) return { host };
  if (!options.allowRemote) {
    throw new UsageError(
      `--host: ${host} is not a loopback address; allowed: 127.0.0.1 (the default), ::1 or localhost; to serve the page to other machines add --allow-remote (the page has no login: anyone who can reach it can build files and overwrite the spec file)`,
    );
  }
  return {
    host,
    warning: `warning: serving on ${host}, not only on this machine (--allow-remote): anyone who can reach this port can use the page, build files and overwrite the spec file; stop the server when done`,
  };
}
