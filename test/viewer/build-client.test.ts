/**
 * The build queue: at most one build running and one waiting, the newest input
 * replacing the waiting one (common practice for live previews: never queue stale work).
 */
import { describe, expect, it } from 'vitest';
import { BuildClient } from '../../viewer/lib/build-client.ts';
import type { DesignInputs } from '../../generator/sizing/inputs.ts';
import type { WorkerReply, WorkerRequest } from '../../viewer/worker/protocol.ts';

class FakeWorker {
  sent: WorkerRequest[] = [];
  onmessage: ((e: MessageEvent<WorkerReply>) => void) | null = null;
  onerror: ((e: ErrorEvent) => void) | null = null;
  postMessage(req: WorkerRequest) {
    this.sent.push(req);
  }
  reply(id: number) {
    this.onmessage!({ data: { type: 'built', id, sizing: { ok: false, reasons: [], waysOut: [], warnings: [] }, meshes: null, transforms: null, sizeMs: 1, buildMs: 0 } } as unknown as MessageEvent<WorkerReply>);
  }
  terminate() {}
}

const inputs = (headMaxM: number) => ({ headMaxM }) as DesignInputs;

describe('BuildClient', () => {
  it('sends the newest waiting input after the running build and drops the ones in between', () => {
    const workers: FakeWorker[] = [];
    const got: [number, boolean][] = [];
    const client = new BuildClient((r, newer) => got.push([r.id, newer]), () => {}, () => {
      const w = new FakeWorker();
      workers.push(w);
      return w as unknown as Worker;
    });
    const a = client.build(inputs(1));
    client.build(inputs(2));
    const c = client.build(inputs(3));
    expect(workers).toHaveLength(1);
    expect(workers[0].sent.map((r) => r.id)).toEqual([a]);
    workers[0].reply(a);
    expect(workers[0].sent.map((r) => r.id)).toEqual([a, c]);
    expect((workers[0].sent[1] as { inputs: DesignInputs }).inputs.headMaxM).toBe(3);
    workers[0].reply(c);
    expect(got).toEqual([[a, true], [c, false]]);
  });

  it('once the first build is back, a relief worker takes a newer input while the first is still busy; the older reply is then dropped', () => {
    const workers: FakeWorker[] = [];
    const got: [number, boolean][] = [];
    const client = new BuildClient((r, newer) => got.push([r.id, newer]), () => {}, () => {
      const w = new FakeWorker();
      workers.push(w);
      return w as unknown as Worker;
    });
    const a = client.build(inputs(1));
    workers[0].reply(a);
    expect(workers).toHaveLength(2); // the relief worker starts when the page is idle
    // and warms up on the design on screen (a worker's first build runs cold code); that reply is never shown
    expect(workers[1].sent).toHaveLength(1);
    expect(workers[1].sent[0]!.id).toBeLessThan(0);
    expect((workers[1].sent[0] as { inputs: DesignInputs }).inputs.headMaxM).toBe(1);
    workers[1].reply(workers[1].sent[0]!.id);
    const slow = client.build(inputs(0.005)); // a half-typed value whose sizing searches long
    const typed = client.build(inputs(0.051)); // the value typed 40 ms later does not wait behind it
    expect(workers[0].sent.map((r) => r.id)).toEqual([a, slow]);
    expect(workers[1].sent.map((r) => r.id).slice(1)).toEqual([typed]);
    workers[1].reply(typed);
    workers[0].reply(slow);
    expect(got).toEqual([[a, false], [typed, false]]);
  });
});

describe('BuildClient warm-up', () => {
  it('an input that comes while the relief worker warms up and the first is busy waits for whichever is free first', () => {
    const workers: FakeWorker[] = [];
    const got: number[] = [];
    const client = new BuildClient((r) => got.push(r.id), () => {}, () => {
      const w = new FakeWorker();
      workers.push(w);
      return w as unknown as Worker;
    });
    const a = client.build(inputs(1));
    workers[0].reply(a);
    const warm = workers[1].sent[0]!.id;
    const b = client.build(inputs(2)); // to the first, idle
    const c = client.build(inputs(3)); // both busy: waits
    expect(workers[0].sent.map((r) => r.id)).toEqual([a, b]);
    workers[1].reply(warm); // the warm-up ends first: the waiting input goes to the relief worker
    expect(workers[1].sent.map((r) => r.id)).toEqual([warm, c]);
    workers[1].reply(c);
    workers[0].reply(b); // older than the one shown: dropped
    expect(got).toEqual([a, c]);
  });
});
