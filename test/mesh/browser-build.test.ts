/**
 * The browser path compiles: vite (the project's bundler, vite 8) builds a
 * page whose ES module worker uses the mesh helpers, emits manifold-3d's WASM
 * as an asset and hands its URL to the loader (manifold-3d's documented
 * `locateFile` hook; source: manifold-3d's manifold.d.ts). Running the built
 * page needs a browser; see generator/solids/mesh/README.md for that check.
 */
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'vite';
import { afterAll, describe, expect, it } from 'vitest';

const outDir = mkdtempSync(join(tmpdir(), 'floatwright-mesh-browser-'));
afterAll(() => rmSync(outDir, { recursive: true, force: true }));

describe('browser build of the mesh helpers', () => {
  it('bundles into an ES worker with manifold.wasm emitted and located through the asset URL', async () => {
    await build({
      configFile: false,
      root: fileURLToPath(new URL('./fixtures/browser/', import.meta.url)),
      logLevel: 'silent',
      build: { outDir, emptyOutDir: true, target: 'es2022' },
      worker: { format: 'es' },
    });
    const assets = readdirSync(join(outDir, 'assets'));
    const wasm = assets.filter((name) => name.endsWith('.wasm'));
    expect(wasm).toHaveLength(1);
    expect(wasm[0]).toMatch(/^manifold-/);
    // the browser-only loader chunk returns the emitted file's URL
    const locator = assets.find((name) => name.startsWith('browser-module-options'));
    expect(locator).toBeDefined();
    expect(readFileSync(join(outDir, 'assets', locator as string), 'utf8')).toContain(wasm[0]);
    // the worker is an ES module chunk of its own
    expect(assets.some((name) => name.startsWith('worker') && name.endsWith('.js'))).toBe(true);
  });
});
