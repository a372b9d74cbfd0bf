import { closeSync, constants, fstatSync, openSync, readSync } from 'node:fs';

/** How long `readTextCapped` waits for a pipe or device that has no data yet, ms. */
export const READ_IDLE_LIMIT_MS = 5_000;

/** Why a capped read stopped early: the caller turns this into its own message. */
export class CappedReadError extends Error {
  readonly reason: 'too-large' | 'folder' | 'idle' | 'io';
  readonly code?: string;
  constructor(reason: CappedReadError['reason'], message: string, code?: string) {
    super(message);
    this.name = 'CappedReadError';
    this.reason = reason;
    if (code !== undefined) this.code = code;
  }
}

/**
 * Read at most `maxBytes` of a file as UTF-8 text, and stop there: a regular
 * file larger than the cap is refused from its size before any byte is read;
 * a device or a pipe (`/dev/zero`, a FIFO, `<(…)`) is read only up to the cap
 * plus one byte, so memory stays bounded whatever the source. The file is
 * opened non-blocking, so a FIFO with no writer does not hang the open: it
 * reads as empty; a pipe that stays silent for READ_IDLE_LIMIT_MS is given up.
 *
 * @throws CappedReadError (too-large, folder, idle) or one with reason "io" and the errno code
 * @example readTextCapped('dial.yaml', 1 << 20)
 */
export function readTextCapped(path: string, maxBytes: number): string {
  let fd: number;
  try {
    fd = openSync(path, constants.O_RDONLY | constants.O_NONBLOCK);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    throw new CappedReadError('io', (e as Error).message, code);
  }
  try {
    const st = fstatSync(fd);
    if (st.isDirectory()) throw new CappedReadError('folder', 'this is a folder, not a file', 'EISDIR');
    if (st.isFile() && st.size > maxBytes) throw new CappedReadError('too-large', `${st.size} bytes`);
    const buf = Buffer.allocUnsafe(maxBytes + 1);
    let got = 0;
    let idleSince = 0;
    while (got <= maxBytes) {
      let n: number;
      try {
        n = readSync(fd, buf, got, buf.length - got, null);
      } catch (e) {
        const code = (e as NodeJS.ErrnoException).code;
        if (code !== 'EAGAIN' && code !== 'EWOULDBLOCK') throw new CappedReadError('io', (e as Error).message, code);
        // A pipe with a writer but no data yet: wait a little, give up after the idle limit.
        const now = Date.now();
        if (idleSince === 0) idleSince = now;
        else if (now - idleSince > READ_IDLE_LIMIT_MS) throw new CappedReadError('idle', `no data for ${READ_IDLE_LIMIT_MS / 1000} s`);
        Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, 10);
        continue;
      }
      if (n === 0) break;
      idleSince = 0;
      got += n;
    }
    if (got > maxBytes) throw new CappedReadError('too-large', `more than ${maxBytes} bytes`);
    return buf.toString('utf8', 0, got);
  } finally {
    closeSync(fd);
  }
}
