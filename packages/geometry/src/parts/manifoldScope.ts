import type { ManifoldToplevel } from 'manifold-3d';
import { manifoldEngine } from './manifoldEngine.ts';

/** Hands an object made in a scope to the scope, which deletes it when the work is done; returns it. */
export type Keep = <X extends { delete(): void }>(x: X) => X;

/**
 * Run mesh work with manifold-3d's WASM objects freed afterwards: every
 * object passed to `keep` is deleted (newest first) when `work` ends,
 * normally or by a throw. WASM memory is not garbage collected, so each
 * builder that makes Manifolds or CrossSections runs inside one scope.
 *
 * @example await manifoldScope(async (wasm, keep) => keep(wasm.Manifold.cube(1)).volume())
 */
export async function manifoldScope<T>(work: (wasm: ManifoldToplevel, keep: Keep) => T | Promise<T>): Promise<T> {
  const wasm = await manifoldEngine();
  const live: { delete(): void }[] = [];
  const keep: Keep = (x) => {
    live.push(x);
    return x;
  };
  try {
    return await work(wasm, keep);
  } finally {
    for (const x of live.reverse()) x.delete();
  }
}
