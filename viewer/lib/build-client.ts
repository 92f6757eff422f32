/**
 * The page's side of the build worker. `build` keeps at most one job running
 * and one waiting: a newer input replaces the waiting one, so typing fast never
 * piles up stale builds. Exports go to a second worker so they never wait behind
 * (or hold up) the preview.
 */
import type { DesignInputs } from '../../generator/sizing/inputs.ts';
import type { TextUnits } from '../../generator/doc/text-in-units.ts';
import type { BuiltReply, ExportFile, ExportKind, WorkerReply, WorkerRequest } from '../worker/protocol.ts';
import type { PartName } from '../worker/parts-contract.ts';
import { newBuildWorker, takeEarlyWorker } from './early-worker.ts';

export type WorkerFactory = () => Worker;

export const defaultWorkerFactory: WorkerFactory = () => takeEarlyWorker() ?? newBuildWorker();

export class BuildClient {
  private worker: Worker | null = null;
  private exporter: Worker | null = null;
  private nextId = 1;
  private running: number | null = null;
  private waiting: WorkerRequest | null = null;
  private exports = new Map<number, { resolve: (f: ExportFile[]) => void; reject: (e: Error) => void }>();

  constructor(
    private readonly onBuilt: (reply: BuiltReply, supersededByNewer: boolean) => void,
    private readonly onError: (message: string) => void,
    private readonly factory: WorkerFactory = defaultWorkerFactory,
  ) {}

  /** Ask for a build of these inputs; returns its id (ids grow with every request). */
  build(inputs: DesignInputs): number {
    const req: WorkerRequest = { type: 'build', id: this.nextId++, inputs };
    if (this.running === null) this.send(req);
    else this.waiting = req;
    return req.id;
  }

  /** `units`: the system the build sheet is written in (default metric); the parts are in millimetres either way */
  exportFiles(inputs: DesignInputs, document: unknown, kind: ExportKind, part?: PartName, units: TextUnits = 'metric'): Promise<ExportFile[]> {
    if (!this.exporter) {
      this.exporter = this.factory();
      this.exporter.onmessage = (e: MessageEvent<WorkerReply>) => {
        const pending = this.exports.get(e.data.id);
        if (!pending) return;
        this.exports.delete(e.data.id);
        if (e.data.type === 'exported') pending.resolve(e.data.files);
        else pending.reject(new Error(e.data.type === 'error' ? e.data.message : 'unexpected reply'));
      };
    }
    const id = this.nextId++;
    const promise = new Promise<ExportFile[]>((resolve, reject) => this.exports.set(id, { resolve, reject }));
    this.exporter.postMessage({ type: 'export', id, inputs, document, kind, part, units } satisfies WorkerRequest);
    return promise;
  }

  dispose(): void {
    this.worker?.terminate();
    this.exporter?.terminate();
  }

  private send(req: WorkerRequest): void {
    if (!this.worker) {
      this.worker = this.factory();
      this.worker.onmessage = (e: MessageEvent<WorkerReply>) => this.receive(e.data);
      this.worker.onerror = (e) => {
        this.running = null;
        this.onError(e.message || 'the build worker stopped');
      };
    }
    this.running = req.id;
    this.worker.postMessage(req);
  }

  private receive(reply: WorkerReply): void {
    this.running = null;
    const next = this.waiting;
    this.waiting = null;
    if (next) this.send(next);
    if (reply.type === 'built') this.onBuilt(reply, next !== null);
    else if (reply.type === 'error') this.onError(reply.message);
  }
}
