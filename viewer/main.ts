/**
 * Entry point of the workbench page. The build worker starts first, so its
 * script and the WASM kernel load while the page's components load in a chunk
 * of their own.
 */
import { startBuildWorker } from './lib/early-worker.ts';

startBuildWorker();
void import('./components/fw-app.ts');
