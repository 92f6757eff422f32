/// <reference types="vite/client" />
/**
 * Browser-only: tells manifold-3d where vite put its .wasm file. The `?url`
 * import makes vite copy manifold.wasm into the build as a hashed asset and
 * returns its URL (in dev, a URL served from node_modules). Never imported in
 * Node: loadManifold.ts reaches it through a dynamic import on the browser
 * path only.
 */
import wasmUrl from 'manifold-3d/manifold.wasm?url';

export function browserModuleOptions(): { locateFile: () => string } {
  return { locateFile: () => wasmUrl };
}
