import { createHash } from 'node:crypto';
import type { DialSpec } from '@umbrafab/geometry';
import { buildFiles, type BuildResult } from '../buildFiles.ts';

/** One build kept in memory so its files can be downloaded by name. */
export interface CachedBuild {
  /** short content id: the same validated spec always gets the same id */
  readonly id: string;
  readonly spec: DialSpec;
  readonly result: BuildResult;
}

/**
 * A small in-memory store of recent builds, newest last, at most `size`.
 * Downloads are looked up here by id and exact file name: nothing is read
 * from or written to disk, so a name from the page can never reach a path.
 */
export function buildCache(size = 12) {
  const builds = new Map<string, CachedBuild>();
  return {
    /** Build (or reuse) the files for a validated spec with the CLI's `buildFiles`. */
    async build(spec: DialSpec): Promise<CachedBuild> {
      const id = specId(spec);
      const hit = builds.get(id);
      if (hit) {
        builds.delete(id);
        builds.set(id, hit);
        return hit;
      }
      const result = await buildFiles(spec);
      const entry: CachedBuild = { id, spec, result };
      builds.set(id, entry);
      while (builds.size > size) builds.delete(builds.keys().next().value as string);
      return entry;
    },
    get(id: string): CachedBuild | undefined {
      return builds.get(id);
    },
  };
}

export type BuildCache = ReturnType<typeof buildCache>;

/** sha-256 of the validated spec's JSON, first 16 hex digits. */
export function specId(spec: DialSpec): string {
  return createHash('sha256').update(JSON.stringify(spec)).digest('hex').slice(0, 16);
}
