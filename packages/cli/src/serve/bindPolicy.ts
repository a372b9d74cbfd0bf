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
 * Which Host headers the server answers (its guard against DNS rebinding: a
 * page on another site reaching the server through a name of the attacker's
 * that resolves to this machine). `names` null: no check at all.
 */
export interface HostCheck {
  /** host names allowed besides loopback (lower case); null: every Host is answered */
  readonly names: readonly string[] | null;
  /** also answer a Host that is an IP address literal (remote serving: a rebinding page always names its own domain) */
  readonly ipLiterals: boolean;
}

/** One `--allowed-host` value: a DNS name (letters, digits, dots, hyphens) or "*" for none checked. */
const HOST_NAME = /^(?=.{1,253}$)[a-z0-9]([a-z0-9-]{0,61}[a-z0-9])?(\.[a-z0-9]([a-z0-9-]{0,61}[a-z0-9])?)*\.?$/;

/**
 * Decide where to bind and which Host headers to answer. A loopback host is
 * always allowed; any other address (a LAN address, 0.0.0.0, ::) only with
 * `allowRemote`, and then with a warning to print: the page can save the
 * spec file and the server has no login, so anyone who can reach the port
 * can use it. The Host check stays on with `allowRemote`: requests must name
 * the server by an IP address, a loopback name or one of `allowedHosts`;
 * `allowedHosts: ['*']` turns it off, and the warning then says that any web
 * page a visitor of the server's network opens can reach it.
 * @throws UsageError for a non-loopback host without allowRemote, or an allowed host that is not a DNS name
 * @example bindPolicy({ host: '0.0.0.0', allowRemote: true, allowedHosts: ['dial.lan'] }).hostCheck // { names: ['dial.lan'], ipLiterals: true }
 */
export function bindPolicy(options: { readonly host?: string; readonly allowRemote?: boolean; readonly allowedHosts?: readonly string[] }): { host: string; warning?: string; hostCheck: HostCheck } {
  const host = (options.host ?? DEFAULT_HOST).trim();
  if (host === '') throw new UsageError('--host: got ""; allowed: a loopback address such as 127.0.0.1 (the default)');
  const given = (options.allowedHosts ?? []).map((h) => h.trim().toLowerCase());
  for (const h of given) {
    if (h !== '*' && !HOST_NAME.test(h)) throw new UsageError(`--allowed-host: got ${JSON.stringify(h)}; allowed: a host name such as dial.example.lan (letters, digits, dots, hyphens), or "*" to turn the Host check off`);
  }
  const off = given.includes('*');
  if (given.length && !options.allowRemote) throw new UsageError('--allowed-host: only with --allow-remote; allowed: a loopback --host needs no extra names (127.0.0.1, localhost and [::1] are always answered)');
  const hostCheck: HostCheck = off ? { names: null, ipLiterals: true } : { names: given, ipLiterals: options.allowRemote === true };
  const checkOff = 'the Host check is OFF (--allowed-host "*"): any web page that anyone who can reach this server opens in a browser can reach it through DNS rebinding and use it';
  if (isLoopbackHost(host)) return off ? { host, hostCheck, warning: `warning: ${checkOff}` } : { host, hostCheck };
  if (!options.allowRemote) {
    throw new UsageError(
      `--host: ${host} is not a loopback address; allowed: 127.0.0.1 (the default), ::1 or localhost; to serve the page to other machines add --allow-remote (the page has no login: anyone who can reach it can build files and overwrite the spec file)`,
    );
  }
  const names = ['an IP address', 'localhost', ...given].join(', ');
  const check = off
    ? checkOff
    : `requests must name the server by ${names} (add a name with --allowed-host; this guards against DNS rebinding)`;
  return {
    host,
    hostCheck,
    warning: `warning: serving on ${host}, not only on this machine (--allow-remote): anyone who can reach this port can use the page, build files and overwrite the spec file; ${check}; stop the server when done`,
  };
}
