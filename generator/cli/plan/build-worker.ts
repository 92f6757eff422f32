/**
 * Worker thread for `floatwright plan`: builds and writes one design's file
 * set per message. Runs TypeScript through tsx (`execArgv: ['--import', 'tsx']`).
 * Message in: a BuildJob; out: { id, files } or { id, error }. On start it
 * loads the geometry kernel and posts { ready: true }, so the warm-up overlaps
 * the planning in the main thread.
 */
import { parentPort } from 'node:worker_threads';
import { loadManifold } from '../../solids/mesh/index.ts';
import { writeDesignFiles, type DesignFilesOptions } from './write-design-files.ts';

export interface BuildJob extends DesignFilesOptions {
  id: string;
}

parentPort!.on('message', async (job: BuildJob) => {
  try {
    const { files, triangles } = await writeDesignFiles(job);
    parentPort!.postMessage({ id: job.id, files, triangles });
  } catch (error) {
    parentPort!.postMessage({ id: job.id, error: error instanceof Error ? `${error.message}\n${error.stack ?? ''}` : String(error) });
  }
});

// Warm up: the WASM geometry kernel loads once per thread.
await loadManifold();
parentPort!.postMessage({ ready: true });
