import { randomBytes } from 'node:crypto';
import { closeSync, copyFileSync, fsyncSync, linkSync, lstatSync, mkdirSync, openSync, readdirSync, readFileSync, readlinkSync, renameSync, rmSync, symlinkSync, writeSync } from 'node:fs';
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

/** Is there any directory entry at `path` (a file, a folder, or a symlink even when it points nowhere)? lstat(2), not stat. */
export function entryExists(path: string): boolean {
  return lstatSync(path, { throwIfNoEntry: false }) !== undefined;
}

/**
 * The journal of one write, `.umbrafab-<token>.journal` in the output folder.
 * `token` is 128 random bits, written both in every helper file's name and in
 * the journal itself: a later run removes a helper file only when its name
 * carries the token of a journal whose content names that same token and
 * whose process is gone, so no file of anyone else is ever touched.
 */
interface Journal {
  readonly tool: 'umbrafab';
  readonly token: string;
  readonly pid: number;
  /** writing: finals untouched; switching: renames under way (roll back); done: the new set is complete (roll forward) */
  readonly phase: 'writing' | 'switching' | 'done';
  readonly names: readonly string[];
  /** the names that held an entry before this write (backed up as hard links) */
  readonly existed: readonly string[];
}

const JOURNAL_NAME = /^\.umbrafab-([0-9a-f]{32})\.journal(?:\.tmp)?$/;
const HELPER_NAME = /^\..+\.umbrafab-([0-9a-f]{32})\.(tmp|old)$/;
const journalName = (token: string) => `.umbrafab-${token}.journal`;
const tempName = (name: string, token: string) => `.${name}.umbrafab-${token}.tmp`;
const backupName = (name: string, token: string) => `.${name}.umbrafab-${token}.old`;

/**
 * Write every file into `dir` so that the set switches as one:
 * 1. a journal is written (phase "writing"), then each file under a temporary
 *    name in the same folder, flushed (fsync);
 * 2. each final name that already holds an entry is kept as a hard link
 *    (the backup), the journal turns to "switching", and the temporary
 *    files are renamed over their final names (rename(2) is atomic within
 *    one file system);
 * 3. the journal turns to "done", then the backups and the journal go.
 * A failure is rolled back in place (the backups renamed back, new names
 * removed) and the message says what state the folder is in. After a
 * SIGKILL the folder may hold a mix until the next umbrafab write into it,
 * which first finishes or rolls back what the dead process left: the whole
 * old set before "done", the whole new set after. Refuses, before writing
 * anything, when a final name holds any entry (lstat: a dangling symlink
 * too) and `force` is false.
 * @returns `recovered`: what was finished or rolled back first ('' if nothing)
 */
export function writeFilesAtomic(dir: string, files: readonly OutputFile[], force: boolean): { readonly recovered: string } {
  const recovered = recoverInterrupted(dir);
  const clash = files.filter((f) => entryExists(join(dir, f.name)));
  if (clash.length && !force) {
    throw new OutputError(`--out: ${dir} already holds ${clash.map((f) => f.name).join(', ')}; allowed: an empty or new folder, or --force to replace them${recovered ? ` (${recovered})` : ''}`);
  }
  const folder = clash.find((f) => lstatSync(join(dir, f.name)).isDirectory());
  if (folder) throw new OutputError(`--out: ${join(dir, folder.name)} is a folder; allowed: a folder without entries named like the output files (${folder.name})`);
  try {
    mkdirSync(dir, { recursive: true });
  } catch (e) {
    throw new OutputError(`--out: cannot create ${dir}: ${(e as Error).message}`);
  }
  const token = randomBytes(16).toString('hex');
  const names = files.map((f) => f.name);
  const existed = clash.map((f) => f.name);
  const journal = (phase: Journal['phase']): Journal => ({ tool: 'umbrafab', token, pid: process.pid, phase, names, existed });
  const made: string[] = [];
  let switching = false;
  let renamed = 0;
  try {
    writeJournal(dir, journal('writing'));
    files.forEach((f, i) => {
      testPause('UMBRAFAB_TEST_PAUSE_AFTER_TEMPS', i);
      const tmp = join(dir, tempName(f.name, token));
      made.push(tmp);
      writeDurable(tmp, f.bytes);
    });
    testPause('UMBRAFAB_TEST_PAUSE_AFTER_TEMPS', files.length);
    for (const name of existed) {
      const backup = join(dir, backupName(name, token));
      made.push(backup);
      backUp(join(dir, name), backup);
    }
    writeJournal(dir, journal('switching'));
    switching = true;
    files.forEach((f, i) => {
      testPause('UMBRAFAB_TEST_PAUSE_AFTER_RENAMES', i);
      testFail('UMBRAFAB_TEST_FAIL_AT_RENAME', i);
      renameSync(join(dir, tempName(f.name, token)), join(dir, f.name));
      renamed++;
    });
    syncDir(dir);
    testPause('UMBRAFAB_TEST_PAUSE_AFTER_RENAMES', files.length);
    writeJournal(dir, journal('done'));
    switching = false;
    testPause('UMBRAFAB_TEST_PAUSE_AFTER_COMMIT', 0);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === 'ENOSPC' ? 'the disk is full' : code === 'EACCES' || code === 'EPERM' || code === 'EROFS' ? 'the folder is not writable' : (e as Error).message;
    let state: string;
    if (!switching) state = 'no file in it was changed';
    else {
      const left = rollBack(dir, journal('switching'));
      state = left.length === 0 ? `the ${renamed} file${renamed === 1 ? '' : 's'} already replaced were put back as they were` : `rolling back failed for ${left.join(', ')}: these may hold the new version`;
    }
    for (const p of made) rmSync(p, { force: true });
    rmSync(join(dir, journalName(token)), { force: true });
    throw new OutputError(`--out: could not write into ${dir}: ${why}; ${state}`);
  }
  for (const p of made) rmSync(p, { force: true });
  rmSync(join(dir, journalName(token)), { force: true });
  return { recovered };
}

/** Write bytes to a new file and fsync it. */
function writeDurable(path: string, bytes: Uint8Array): void {
  const fd = openSync(path, 'wx', 0o644);
  try {
    let off = 0;
    while (off < bytes.length) off += writeSync(fd, bytes, off);
    fsyncSync(fd);
  } finally {
    closeSync(fd);
  }
}

/** Keep the entry at `path` under a second name: a hard link (no copy, same file), else a copy (a file system without hard links), else a new symlink with the same target. */
function backUp(path: string, backup: string): void {
  try {
    linkSync(path, backup);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code !== 'EPERM' && code !== 'ENOTSUP' && code !== 'EOPNOTSUPP' && code !== 'EMLINK') throw e;
    if (lstatSync(path).isSymbolicLink()) symlinkSync(readlinkSync(path), backup);
    else copyFileSync(path, backup);
  }
}

/** Make the folder's entries (renames, new names) durable: fsync the directory (POSIX fsync(2) on a directory fd, Linux). */
function syncDir(dir: string): void {
  let fd: number | undefined;
  try {
    fd = openSync(dir, 'r');
    fsyncSync(fd);
  } catch {
    /* some file systems refuse fsync on a folder: the renames are still atomic */
  } finally {
    if (fd !== undefined) closeSync(fd);
  }
}

/** Replace the journal atomically (its own temporary name, fsync, rename, fsync of the folder). */
function writeJournal(dir: string, j: Journal): void {
  const tmp = join(dir, `${journalName(j.token)}.tmp`);
  rmSync(tmp, { force: true });
  writeDurable(tmp, new TextEncoder().encode(JSON.stringify(j)));
  renameSync(tmp, join(dir, journalName(j.token)));
  syncDir(dir);
}

/** Put the old set back: each backup over its name, and a name that held nothing before removed. Returns the names it could not restore. */
function rollBack(dir: string, j: Journal): string[] {
  const left: string[] = [];
  for (const name of j.names) {
    try {
      const backup = join(dir, backupName(name, j.token));
      if (j.existed.includes(name)) {
        if (entryExists(backup)) renameSync(backup, join(dir, name));
      } else if (!entryExists(join(dir, tempName(name, j.token)))) {
        // Its temporary file is gone, so this name holds the new file: it held nothing before.
        rmSync(join(dir, name), { force: true });
      }
    } catch {
      left.push(name);
    }
  }
  syncDir(dir);
  return left;
}

/** Is process `pid` still running (kill(pid, 0) does not fail with ESRCH)? */
function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code !== 'ESRCH';
  }
}

/**
 * Finish what an umbrafab process killed mid-write left in `dir`: for each
 * journal of ours (name and content carry the same token) whose process is
 * gone, roll back (phase writing or switching: the old set comes back) or
 * forward (phase done), then remove that write's helper files. Files with
 * other names, or helper names without a matching journal, are left alone.
 * @returns a sentence for the user if anything was done, else ''
 */
export function recoverInterrupted(dir: string): string {
  let entries: string[];
  try {
    entries = readdirSync(dir);
  } catch {
    return '';
  }
  const done: string[] = [];
  const tokens = new Set(entries.map((e) => JOURNAL_NAME.exec(e)?.[1]).filter((t): t is string => t !== undefined));
  for (const token of tokens) {
    const main = join(dir, journalName(token));
    let j: Journal;
    try {
      // The journal, or only its temporary copy when the process died while writing the first one.
      j = JSON.parse(readFileSync(entryExists(main) ? main : `${main}.tmp`, 'utf8')) as Journal;
    } catch {
      continue; // not a journal of ours after all, or an unfinished first journal: no helper file was made yet
    }
    if (j.tool !== 'umbrafab' || j.token !== token || !Array.isArray(j.names) || !Array.isArray(j.existed) || !Number.isInteger(j.pid) || alive(j.pid)) continue;
    if (j.phase === 'switching') {
      rollBack(dir, j);
      done.push(`put back the old files of an interrupted write (${j.names.join(', ')})`);
    } else if (j.phase === 'done') done.push('finished an interrupted write whose new files were all in place');
    for (const name of entries) {
      const h = HELPER_NAME.exec(name);
      if (h && h[1] === token) rmSync(join(dir, name), { force: true });
    }
    rmSync(`${main}.tmp`, { force: true });
    rmSync(main, { force: true });
    syncDir(dir);
  }
  return done.join('; ');
}

/** Test hook for the roll-back test: when the environment variable `name` equals `count`, fail as an I/O error would. */
function testFail(name: string, count: number): void {
  const at = process.env[name];
  if (at !== undefined && Number(at) === count) throw Object.assign(new Error(`test failure at ${name}=${count}`), { code: 'EIO' });
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
