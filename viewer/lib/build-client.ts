/**
 * The page's side of the build workers. `build` keeps at most one job waiting:
 * a newer input replaces the waiting one, so typing fast never piles up stale
 * builds. A second, "relief" worker (started once the first build is back, when
 * the page is idle) takes a new input while the first is still busy with an
 * older one: a design that does not size can take the sizing's searches several
 * hundred milliseconds (a level typed half way, "5" on the way to "51"), and the
 * newer input must not wait behind it. A reply older than one already shown is
 * dropped. The relief worker's first job is a warm-up build of the design on
 * screen (its reply dropped): a worker's first build runs cold code and takes
 * twice as long, and the first input it takes for real must not pay that.
 * Exports go to a third worker so they never wait behind (or hold up) the preview.
 */
import type { DesignInputs } from '../../generator/sizing/inputs.ts';
import type { TextUnits } from '../../generator/doc/text-in-units.ts';
import type { BuiltReply, ExportFile, ExportKind, WorkerReply, WorkerRequest } from '../worker/protocol.ts';
import type { PartName } from '../worker/parts-contract.ts';
import { newBuildWorker, takeEarlyWorker } from './early-worker.ts';

export type WorkerFactory = () => Worker;

export const defaultWorkerFactory: WorkerFactory = () => takeEarlyWorker() ?? newBuildWorker();

interface Slot {
  worker: Worker;
  /** id of the build it runs, null when idle */
  running: number | null;
}

/** Build workers at most: the first, and one relief (see above). */
const BUILD_WORKERS = 2;

export class BuildClient {
  private slots: Slot[] = [];
  private exporter: Worker | null = null;
  private nextId = 1;
  private waiting: WorkerRequest | null = null;
  /** the inputs of the newest build asked for (the relief worker warms up on them) */
  private lastInputs: DesignInputs | null = null;
  /** warm-up builds carry ids below zero, so no reply of theirs is ever shown */
  private nextWarmId = -1;
  /** the newest build id handed to onBuilt */
  private shown = 0;
  private exports = new Map<number, { resolve: (f: ExportFile[]) => void; reject: (e: Error) => void }>();

  constructor(
    private readonly onBuilt: (reply: BuiltReply, supersededByNewer: boolean) => void,
    private readonly onError: (message: string) => void,
    private readonly factory: WorkerFactory = defaultWorkerFactory,
  ) {}

  /** Ask for a build of these inputs; returns its id (ids grow with every request). */
  build(inputs: DesignInputs): number {
    const req: WorkerRequest = { type: 'build', id: this.nextId++, inputs };
    this.lastInputs = inputs;
    if (this.slots.length === 0) this.addSlot();
    const idle = this.slots.find((s) => s.running === null);
    if (idle) this.send(idle, req);
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
    for (const s of this.slots) s.worker.terminate();
    this.exporter?.terminate();
  }

  private addSlot(): Slot {
    const slot: Slot = { worker: this.factory(), running: null };
    slot.worker.onmessage = (e: MessageEvent<WorkerReply>) => this.receive(slot, e.data);
    slot.worker.onerror = (e) => {
      slot.running = null;
      this.onError(e.message || 'the build worker stopped');
    };
    this.slots.push(slot);
    return slot;
  }

  private send(slot: Slot, req: WorkerRequest): void {
    slot.running = req.id;
    slot.worker.postMessage(req);
  }

  private receive(slot: Slot, reply: WorkerReply): void {
    slot.running = null;
    const next = this.waiting;
    this.waiting = null;
    if (next) this.send(slot, next);
    // the first build is back and the page is idle: start the relief worker (it loads its kernel now) and warm it up
    if (this.slots.length < BUILD_WORKERS) {
      const relief = this.addSlot();
      if (this.lastInputs) this.send(relief, { type: 'build', id: this.nextWarmId--, inputs: this.lastInputs });
    }
    if (reply.id < 0 || reply.id < this.shown) return; // a warm-up, or a newer build is already on screen
    const newer = next !== null || this.slots.some((s) => s.running !== null && s.running > reply.id);
    if (reply.type === 'built') {
      this.shown = reply.id;
      this.onBuilt(reply, newer);
    } else if (reply.type === 'error') this.onError(reply.message);
  }
}
