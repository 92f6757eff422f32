/**
 * The build worker, started as the very first thing the page does, so that it
 * loads its script and the geometry kernel's WASM while the page's own modules
 * (Lit, three.js, the form) are still loading and evaluating. The first
 * BuildClient takes it; later ones make their own.
 */
let early: Worker | null = null;

export function newBuildWorker(): Worker {
  return new Worker(new URL('../worker/build-worker.ts', import.meta.url), { type: 'module' });
}

/** Start the build worker now (idempotent; a no-op where workers are missing, e.g. under test DOMs). */
export function startBuildWorker(): void {
  if (early || typeof Worker === 'undefined') return;
  early = newBuildWorker();
}

/** The worker started early, once; null after that or if none was started. */
export function takeEarlyWorker(): Worker | null {
  const w = early;
  early = null;
  return w;
}
