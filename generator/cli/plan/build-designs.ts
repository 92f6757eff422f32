/**
 * Builds every design of a plan into a folder: one sub-folder per design,
 * built on worker threads (one per core, at most one per design) when there
 * is more than one design, in this thread otherwise.
 */
import { availableParallelism } from 'node:os';
import { join } from 'node:path';
import { Worker } from 'node:worker_threads';
import type { Quality } from '../../solids/index.ts';
import type { BuildJob } from './build-worker.ts';
import { writeDesignFiles, type DesignFilesOptions } from './write-design-files.ts';

export type DesignJob = Omit<DesignFilesOptions, 'dir'> & { id: string; folder: string };

export interface BuildDesignsOptions {
  jobs: readonly DesignJob[];
  /** the (temporary) output folder; each job writes into root/job.folder */
  root: string;
  quality: Quality;
  /** called after each design is written, with how many are done */
  onProgress?: (done: number, total: number) => void;
  /** at most this many threads; default the machine's available parallelism */
  threads?: number;
}

/** Files written per design id (paths relative to root), and triangles in all. */
export interface BuildDesignsResult {
  files: Record<string, string[]>;
  triangles: number;
  threads: number;
}

function spawn(): Worker {
  // A plain-JS entry that registers tsx itself: under Node 20 a worker does not inherit the parent's loader.
  return new Worker(new URL('./build-worker.mjs', import.meta.url));
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
  const threads = Math.max(1, Math.min(opts.threads ?? availableParallelism(), jobs.length));
  if (jobs.length <= 1 || threads === 1) {
    for (const job of jobs) {
      const r = await writeDesignFiles({ ...job, dir: join(root, job.folder) });
      record(job, r.files, r.triangles);
    }
    return { files, triangles, threads: 1 };
  }

  const queue = [...jobs];
  const workers = Array.from({ length: threads }, spawn);
  try {
    await Promise.all(
      workers.map(
        (worker) =>
          new Promise<void>((resolve, reject) => {
            let current: DesignJob | undefined;
            const next = () => {
              current = queue.shift();
              if (!current) return resolve();
              const message: BuildJob = { ...current, dir: join(root, current.folder) };
              worker.postMessage(message);
            };
            worker.on('message', (m: { id: string; files?: string[]; triangles?: number; error?: string }) => {
              if (m.error !== undefined || !current) return reject(new Error(`design ${m.id}: ${m.error}`));
              record(current, m.files!, m.triangles!);
              next();
            });
            worker.on('error', reject);
            worker.on('exit', (code) => {
              if (current && !(current.id in files)) reject(new Error(`build worker stopped (exit ${code}) while building ${current.id}`));
            });
            next();
          }),
      ),
    );
  } finally {
    await Promise.all(workers.map((w) => w.terminate()));
  }
  return { files, triangles, threads };
}
