import { closeSync, existsSync, fsyncSync, mkdirSync, openSync, readdirSync, renameSync, rmSync, writeSync } from 'node:fs';
import { join } from 'node:path';

/** A file to write: a name inside the output folder and its bytes. */
export interface OutputFile {
  readonly name: string;
  readonly bytes: Uint8Array;
}

/** A problem with the output folder the user can fix (maps to exit code 1). */
export class OutputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'OutputError';
  }
}

/**
 * Write every file into `dir` so that no final name ever holds a partial file:
 * each file goes to a unique temporary name in the same folder, is flushed
 * (fsync), then renamed over its final name (rename is atomic within one
 * file system, POSIX rename(2)). Refuses, before writing anything, when a
 * final name exists and `force` is false. On any failure the temporary files
 * are removed and files already renamed stay complete.
 */
export function writeFilesAtomic(dir: string, files: readonly OutputFile[], force: boolean): void {
  const clash = files.filter((f) => existsSync(join(dir, f.name)));
  if (clash.length && !force) {
    throw new OutputError(`--out: ${dir} already holds ${clash.map((f) => f.name).join(', ')}; allowed: an empty or new folder, or --force to replace them`);
  }
  try {
    mkdirSync(dir, { recursive: true });
  } catch (e) {
    throw new OutputError(`--out: cannot create ${dir}: ${(e as Error).message}`);
  }
  removeStaleTemps(dir);
  const stamp = `${process.pid}-${Date.now().toString(36)}`;
  const temps: string[] = [];
  try {
    for (const f of files) {
      testPause('UMBRAFAB_TEST_PAUSE_AFTER_TEMPS', temps.length);
      const tmp = join(dir, `.${f.name}.tmp-${stamp}`);
      temps.push(tmp);
      const fd = openSync(tmp, 'wx', 0o644);
      try {
        let off = 0;
        while (off < f.bytes.length) off += writeSync(fd, f.bytes, off);
        fsyncSync(fd);
      } finally {
        closeSync(fd);
      }
    }
    testPause('UMBRAFAB_TEST_PAUSE_AFTER_TEMPS', temps.length);
    files.forEach((f, i) => {
      testPause('UMBRAFAB_TEST_PAUSE_AFTER_RENAMES', i);
      renameSync(temps[i], join(dir, f.name));
    });
  } catch (e) {
    for (const t of temps) rmSync(t, { force: true });
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === 'ENOSPC' ? 'the disk is full' : code === 'EACCES' || code === 'EPERM' || code === 'EROFS' ? 'the folder is not writable' : (e as Error).message;
    throw new OutputError(`--out: could not write into ${dir}: ${why}; nothing was left half-written`);
  }
}

const TEMP_NAME = /^\..+\.tmp-(\d+)-[0-9a-z]+$/;

/**
 * Remove temporary files left in `dir` by an umbrafab process that no longer
 * runs (killed mid-write). Only names of our own pattern are touched, and
 * only when their process id is gone (kill(pid, 0) fails with ESRCH).
 */
export function removeStaleTemps(dir: string): string[] {
  let names: string[];
  try {
    names = readdirSync(dir);
  } catch {
    return [];
  }
  const removed: string[] = [];
  for (const name of names) {
    const m = TEMP_NAME.exec(name);
    if (!m) continue;
    const pid = Number(m[1]);
    let alive = true;
    try {
      process.kill(pid, 0);
    } catch (e) {
      alive = (e as NodeJS.ErrnoException).code !== 'ESRCH';
    }
    if (!alive) {
      rmSync(join(dir, name), { force: true });
      removed.push(name);
    }
  }
  return removed;
}

/**
 * Test hook for the crash-safety tests: when the environment variable `name`
 * equals `count`, say so on stderr and block, so a test can SIGKILL the
 * process at a known point of the write. Does nothing otherwise.
 */
function testPause(name: string, count: number): void {
  const at = process.env[name];
  if (at === undefined || Number(at) !== count) return;
  process.stderr.write(`umbrafab-test: paused at ${name}=${count}\n`);
  Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, 120_000);
}
