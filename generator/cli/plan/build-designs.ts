/**
 * Builds every design of a plan into a folder: one sub-folder per design,
 * built on this thread and worker threads (together one per core, at most one
 * per design) when there is more than one design, on this thread otherwise.
 *
 * A worker takes about 1.7 s to start (tsx compiles the sources, the WASM
 * kernel loads), so a caller can start the pool early (`startBuildPool`) and
 * let it warm up while the plan is solved.
 */
import { availableParallelism } from 'node:os';
import { join } from 'node:path';
import { Worker } from 'node:worker_threads';
import type { Quality } from '../../solids/index.ts';
import type { BuildJob } from './build-worker.ts';
import { writeDesignFiles, type DesignFilesOptions } from './write-design-files.ts';

export type DesignJob = Omit<DesignFilesOptions, 'dir'> & { id: string; folder: string };

export interface BuildPool {
  workers: Worker[];
  /** one per worker: settles when it has loaded the sources and the kernel (rejects if it fails to start) */
  ready: Promise<void>[];
  close(): Promise<void>;
}

/**
 * Start `threads` build workers; default one fewer than the machine's cores,
 * since this thread builds too (one worker's start-up is about five designs' build time).
 */
export function startBuildPool(threads: number = Math.max(1, availableParallelism() - 1)): BuildPool {
  // A plain-JS entry that registers tsx itself: under Node 20 a worker does not inherit the parent's loader.
  const workers = Array.from({ length: Math.max(1, threads) }, () => new Worker(new URL('./build-worker.mjs', import.meta.url)));
  const ready = workers.map(
    (w) =>
      new Promise<void>((resolve, reject) => {
        const onMessage = (m: { ready?: boolean }) => {
          if (!m.ready) return;
          w.off('message', onMessage);
          resolve();
        };
        w.on('message', onMessage);
        w.once('error', reject);
        w.once('exit', (code) => reject(new Error(`build worker exited (${code}) before it was ready`)));
      }),
  );
  for (const r of ready) r.catch(() => {}); // a worker that never starts just takes no jobs
  return { workers, ready, close: async () => void (await Promise.all(workers.map((w) => w.terminate()))) };
}

export interface BuildDesignsOptions {
  jobs: readonly DesignJob[];
  /** the (temporary) output folder; each job writes into root/job.folder */
  root: string;
  quality: Quality;
  /** called after each design is written, with how many are done */
  onProgress?: (done: number, total: number) => void;
  /** at most this many threads; default the machine's available parallelism (ignored when `pool` is given) */
  threads?: number;
  /** an already started pool (left open: the caller closes it) */
  pool?: BuildPool;
  /** stops the designs built on this thread between steps (the caller closes the pool to stop the workers) */
  signal?: AbortSignal;
}

/** Files written per design id (paths relative to root), and triangles in all. */
export interface BuildDesignsResult {
  files: Record<string, string[]>;
  triangles: number;
  threads: number;
}

export async function buildDesigns(opts: BuildDesignsOptions): Promise<BuildDesignsResult> {
  const { jobs, root } = opts;
  const files: Record<string, string[]> = {};
  let triangles = 0;
  let done = 0;
  const record = (job: DesignJob, written: string[], tri: number) => {
    files[job.id] = written.map((f) => `${job.folder}/${f}`);
    triangles += tri;
    opts.onProgress?.(++done, jobs.length);
  };
  const threads = opts.pool ? opts.pool.workers.length + 1 : Math.max(1, Math.min(opts.threads ?? availableParallelism(), jobs.length));
  if (!opts.pool && (jobs.length <= 1 || threads === 1)) {
    for (const job of jobs) {
      const r = await writeDesignFiles({ ...job, dir: join(root, job.folder), signal: opts.signal });
      record(job, r.files, r.triangles);
    }
    return { files, triangles, threads: 1 };
  }

  const queue = [...jobs];
  const pool = opts.pool ?? startBuildPool(threads - 1);
  const busy = pool.workers.slice(0, Math.max(1, Math.min(pool.workers.length, jobs.length - 1)));
  const listeners: (() => void)[] = [];
  // This thread takes jobs from the same queue while the workers do.
  const local = async () => {
    for (let job = queue.shift(); job; job = queue.shift()) {
      const r = await writeDesignFiles({ ...job, dir: join(root, job.folder), signal: opts.signal });
      record(job, r.files, r.triangles);
    }
  };
  try {
    await Promise.all([
      local(),
      ...busy.map(
        (worker, k) =>
          new Promise<void>((resolve, reject) => {
            let current: DesignJob | undefined;
            const next = () => {
              current = queue.shift();
              if (!current) return resolve();
              const message: BuildJob = { ...current, dir: join(root, current.folder) };
              worker.postMessage(message);
            };
            const onMessage = (m: { ready?: boolean; id?: string; files?: string[]; triangles?: number; error?: string }) => {
              if (m.ready) return;
              if (m.error !== undefined || !current) return reject(new Error(`design ${m.id}: ${m.error}`));
              record(current, m.files!, m.triangles!);
              next();
            };
            const onExit = (code: number) => {
              if (current && !(current.id in files)) reject(new Error(`build worker stopped (exit ${code}) while building ${current.id}`));
            };
            worker.on('message', onMessage);
            worker.on('error', reject);
            worker.on('exit', onExit);
            listeners.push(() => {
              worker.off('message', onMessage);
              worker.off('error', reject);
              worker.off('exit', onExit);
            });
            // A worker takes jobs only once warm, so a slow start never delays a job this thread could do.
            pool.ready[k]!.then(next, () => resolve());
          }),
      ),
    ]);
  } finally {
    for (const off of listeners) off();
    if (!opts.pool) await pool.close();
  }
  return { files, triangles, threads: busy.length + 1 };
}
