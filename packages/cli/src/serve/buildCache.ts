import { createHash } from 'node:crypto';
import { faceOrientationOf, type DialSpec } from '@umbrafab/geometry';
import { toSvg, type SvgOptions } from '@umbrafab/fabricate';
import { buildContext } from '../buildFiles.ts';
import type { BuildContext } from '../outputs/outputTypes.ts';
import { plateOutputs, previewSvgOptions } from '../outputs/plateOutputs.ts';
import { planarContext, planarPreviewSvgOptions, type PlanarContext } from '../planarViews.ts';
import type { OutputFile } from '../writeFilesAtomic.ts';
import type { FullBuilder } from './fullBuilder.ts';

/** One spec the page has shown, kept in memory: its geometry, its face SVG, and (on demand) every file of the build. */
export interface CachedBuild {
  /** short content id: the same validated spec always gets the same id */
  readonly id: string;
  readonly spec: DialSpec;
  /** the layout and plate drawing: the polar plate's (buildContext, what every producer reads) or a planar face's (planarContext) */
  readonly ctx: PageContext;
  /** preview.svg exactly as `umbrafab build` writes it (the plate producer on the same context, or the planar build's writer) */
  readonly previewSvg: string;
  /** how preview.svg was drawn, for `previewFrame` */
  readonly previewOptions: SvgOptions;
  /** every file of `umbrafab build` for this spec (buildAnyFiles, in the builder's worker), built once on first call */
  readonly full: () => Promise<readonly OutputFile[]>;
}

/** The geometry the page's views read: the polar plate's, or a horizontal, wall, meridian or equatorial face's. */
export type PageContext = BuildContext | PlanarContext;

/** Is this a planar face's context (a spec with a non-polar `face.type`)? */
export function isPlanarContext(ctx: PageContext): ctx is PlanarContext {
  return 'kind' in ctx.layout && ctx.layout.kind === 'planar';
}

/** Most bytes of finished full builds the page server keeps for downloads (the newest build's are always kept). */
export const MAX_CACHED_FILE_BYTES = 64 * 1024 * 1024;

/**
 * A small in-memory store of recent specs, newest last, at most `size`.
 * The views (layout, face SVG) are computed at once; the full build, which
 * takes about a second with every picture and program, only when the page
 * asks for the file list or a file; finished builds' files are kept up to
 * `maxFileBytes` in all (older ones are dropped and built again if asked
 * for), so memory does not grow with every spec shown. Downloads are looked up here by id and
 * exact file name: nothing is read from or written to disk, so a name from
 * the page can never reach a path.
 */
export function buildCache(builder: FullBuilder, size = 12, maxFileBytes = MAX_CACHED_FILE_BYTES) {
  const builds = new Map<string, CachedBuild>();
  /** the finished full builds held, oldest first, with their size in bytes */
  const held = new Map<string, { bytes: number; drop: () => void }>();
  const hold = (id: string, files: readonly OutputFile[], drop: () => void) => {
    held.delete(id);
    held.set(id, { bytes: files.reduce((n, f) => n + f.bytes.length, 0), drop });
    let total = [...held.values()].reduce((n, h) => n + h.bytes, 0);
    // Keep the newest build's files whatever their size; drop older ones (built again if asked for) past the budget.
    for (const [old, h] of held) {
      if (total <= maxFileBytes || old === id) break;
      h.drop();
      held.delete(old);
      total -= h.bytes;
    }
  };
  return {
    async views(spec: DialSpec): Promise<CachedBuild> {
      const id = specId(spec);
      const hit = builds.get(id);
      if (hit) {
        builds.delete(id);
        builds.set(id, hit);
        return hit;
      }
      builder.warm();
      const { ctx, previewSvg, previewOptions } = await faceViews(spec);
      let full: Promise<readonly OutputFile[]> | undefined;
      const entry: CachedBuild = {
        id,
        spec,
        ctx,
        previewSvg,
        previewOptions,
        full: () =>
          (full ??= builder.build(spec).then((files) => {
            hold(id, files, () => (full = undefined));
            return files;
          })),
      };
      builds.set(id, entry);
      while (builds.size > size) {
        const oldest = builds.keys().next().value as string;
        builds.delete(oldest);
        held.delete(oldest);
      }
      return entry;
    },
    get(id: string): CachedBuild | undefined {
      return builds.get(id);
    },
  };
}

export type BuildCache = ReturnType<typeof buildCache>;

/**
 * The face's geometry and preview.svg as `umbrafab build` draws them: the
 * polar plate through the plate producer, any other face through the
 * planar build's writer and options (`buildAnyFiles` picks the same way).
 */
async function faceViews(spec: DialSpec): Promise<{ ctx: PageContext; previewSvg: string; previewOptions: SvgOptions }> {
  if (faceOrientationOf(spec)) {
    const ctx = planarContext(spec);
    const previewOptions = planarPreviewSvgOptions(ctx);
    return { ctx, previewSvg: toSvg(ctx.drawing, previewOptions), previewOptions };
  }
  const ctx = buildContext(spec);
  const plate = await plateOutputs(ctx);
  const svg = plate.files.find((f) => f.name === 'preview.svg');
  return { ctx, previewSvg: svg ? new TextDecoder().decode(svg.bytes) : '', previewOptions: previewSvgOptions(ctx) };
}

/** sha-256 of the validated spec's JSON, first 16 hex digits. */
export function specId(spec: DialSpec): string {
  return createHash('sha256').update(JSON.stringify(spec)).digest('hex').slice(0, 16);
}
