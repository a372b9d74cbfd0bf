import { closeSync, existsSync, fsyncSync, mkdirSync, openSync, renameSync, rmSync, writeSync } from 'node:fs';
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
  const stamp = `${process.pid}-${Date.now().toString(36)}`;
  const temps: string[] = [];
  try {
    for (const f of files) {
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
    files.forEach((f, i) => renameSync(temps[i], join(dir, f.name)));
  } catch (e) {
    for (const t of temps) rmSync(t, { force: true });
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === 'ENOSPC' ? 'the disk is full' : code === 'EACCES' || code === 'EPERM' || code === 'EROFS' ? 'the folder is not writable' : (e as Error).message;
    throw new OutputError(`--out: could not write into ${dir}: ${why}; nothing was left half-written`);
  }
}
