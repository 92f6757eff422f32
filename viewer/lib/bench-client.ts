/**
 * The bench page's side of the bench worker: at most one plan solving and one
 * waiting (a newer plan replaces the waiting one, so typing never piles up
 * stale solves); exports go to a second worker so they never hold up the drawing.
 */
import type { BenchReply, BenchRequest } from '../worker/bench-protocol.ts';
import type { ExportFile } from '../worker/protocol.ts';

export type BenchWorkerFactory = () => Worker;

const newBenchWorker = () => new Worker(new URL('../worker/bench-worker.ts', import.meta.url), { type: 'module' });
let early: Worker | null = null;

/** Start the bench worker now, while the bench page's code loads (idempotent; a no-op where workers are missing). */
export function startBenchWorker(): void {
  if (early || typeof Worker === 'undefined') return;
  early = newBenchWorker();
}

/** The worker started early, once; a new one after that. */
export const defaultBenchWorker: BenchWorkerFactory = () => {
  const w = early ?? newBenchWorker();
  early = null;
  return w;
};

type Planned = Extract<BenchReply, { type: 'planned' }>;

export class BenchClient {
  private worker: Worker | null = null;
  private exporter: Worker | null = null;
  private nextId = 1;
  private running: number | null = null;
  private waiting: BenchRequest | null = null;
  private exports = new Map<number, { resolve: (f: ExportFile) => void; reject: (e: Error) => void }>();

  constructor(
    private readonly onPlanned: (reply: Planned, newerWaiting: boolean) => void,
    private readonly onError: (message: string) => void,
    private readonly factory: BenchWorkerFactory = defaultBenchWorker,
  ) {}

  /** Ask for this plan to be solved; returns its id (ids grow with every request). */
  plan(plan: unknown): number {
    const req: BenchRequest = { type: 'plan', id: this.nextId++, plan };
    if (this.running === null) this.send(req);
    else this.waiting = req;
    return req.id;
  }

  exportZip(plan: unknown): Promise<ExportFile> {
    if (!this.exporter) {
      this.exporter = this.factory();
      this.exporter.onmessage = (e: MessageEvent<BenchReply>) => {
        const pending = this.exports.get(e.data.id);
        if (!pending) return;
        this.exports.delete(e.data.id);
        if (e.data.type === 'exported') pending.resolve(e.data.file);
        else pending.reject(new Error(e.data.type === 'error' ? e.data.message : 'unexpected reply'));
      };
    }
    const id = this.nextId++;
    const promise = new Promise<ExportFile>((resolve, reject) => this.exports.set(id, { resolve, reject }));
    this.exporter.postMessage({ type: 'export', id, plan } satisfies BenchRequest);
    return promise;
  }

  dispose(): void {
    this.worker?.terminate();
    this.exporter?.terminate();
  }

  private send(req: BenchRequest): void {
    if (!this.worker) {
      this.worker = this.factory();
      this.worker.onmessage = (e: MessageEvent<BenchReply>) => this.receive(e.data);
      this.worker.onerror = (e) => {
        this.running = null;
        this.onError(e.message || 'the bench worker stopped');
      };
    }
    this.running = req.id;
    this.worker.postMessage(req);
  }

  private receive(reply: BenchReply): void {
    this.running = null;
    const next = this.waiting;
    this.waiting = null;
    if (next) this.send(next);
    if (reply.type === 'planned') this.onPlanned(reply, next !== null);
    else if (reply.type === 'error') this.onError(reply.message);
  }
}
