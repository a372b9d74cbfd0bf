import type { ManifoldToplevel } from 'manifold-3d';

let engine: Promise<ManifoldToplevel> | undefined;

/**
 * The robust mesh-boolean engine (manifold-3d, WASM; E. Lalish et al.,
 * https://github.com/elalish/manifold), loaded once per process and shared.
 * Its booleans return guaranteed 2-manifold meshes, which JSCAD's do not
 * (T-junctions, DEPS.md). Loading reads the bundled .wasm file; nothing
 * else about the engine is stateful.
 *
 * @example const { Manifold } = await manifoldEngine();
 */
export function manifoldEngine(): Promise<ManifoldToplevel> {
  // The module itself (and its WASM) loads only when a solid needs a boolean, not with this package.
  engine ??= import('manifold-3d').then(({ default: Module }) => Module()).then((wasm) => {
    wasm.setup();
    return wasm;
  });
  return engine;
}
