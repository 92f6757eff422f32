/**
 * One shared manifold-3d (WASM) instance, loaded on first use.
 *
 * Node: the package's own loader finds manifold.wasm beside manifold.js.
 * Browser (vite, also inside an ES module worker): dependencies are
 * pre-bundled, so the package's relative URL no longer points at the file;
 * browserModuleOptions.ts imports the .wasm through vite (`?url`), which makes
 * vite emit it as an asset, and hands that URL to the loader via `locateFile`.
 * That file is imported only on the browser path, so Node never sees `?url`.
 *
 * A bundle that serves the WASM some other way can skip all this with
 * useManifold(instance).
 */
import Module, { type ManifoldToplevel } from 'manifold-3d';

let cached: Promise<ManifoldToplevel> | undefined;

/** True under Node (and tools built on it: vitest, tsx); false in a browser page or worker. */
export function isNodeRuntime(): boolean {
  const process = (globalThis as { process?: { versions?: { node?: string } } }).process;
  return typeof process?.versions?.node === 'string';
}

/** The shared manifold-3d instance; the first call loads and sets it up, later calls get the same one. */
export function loadManifold(): Promise<ManifoldToplevel> {
  if (!cached) {
    cached = instantiate().catch((error: unknown) => {
      cached = undefined; // let a later call try again
      throw new Error(`manifold-3d (WASM) failed to load: ${error instanceof Error ? error.message : String(error)}`, { cause: error });
    });
  }
  return cached;
}

/** Use an instance the caller loaded itself (already set up or not); later loadManifold() calls return it. */
export function useManifold(instance: ManifoldToplevel): void {
  instance.setup();
  cached = Promise.resolve(instance);
}

async function instantiate(): Promise<ManifoldToplevel> {
  const options = isNodeRuntime() ? undefined : (await import('./browser-module-options.ts')).browserModuleOptions();
  const instance = await Module(options);
  instance.setup(); // installs the JS-friendly wrappers; safe to call twice
  return instance;
}
