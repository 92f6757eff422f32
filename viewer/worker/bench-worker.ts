/// <reference lib="webworker" />
/**
 * The bench page's worker: checks and solves the plan (every group's valve
 * sized, the flows alone and shared) and makes the bench's zip, off the page.
 * One plan at a time; the page sends only the newest.
 */
import { benchView, solveBench } from './bench-solve.ts';
import type { BenchReply, BenchRequest } from './bench-protocol.ts';

const scope = self as unknown as DedicatedWorkerGlobalScope;

async function handle(req: BenchRequest): Promise<void> {
  const t0 = performance.now();
  const solved = solveBench(req.plan);
  if (req.type === 'plan') {
    const reply: BenchReply = solved.ok
      ? { type: 'planned', id: req.id, ok: true, solved: benchView(solved.result), solveMs: performance.now() - t0 }
      : { type: 'planned', id: req.id, ok: false, errors: solved.errors, solveMs: performance.now() - t0 };
    scope.postMessage(reply);
    return;
  }
  if (!solved.ok) throw new Error('the bench has problems to correct first');
  if (!solved.result.ok) throw new Error('no valve size fits some groups, so there are no files to make');
  // the geometry kernel, the part builders and the writers load on the first export: the drawing never needs them
  const { benchZip } = await import('./bench-export.ts');
  const name = (req.plan as { name?: unknown } | null)?.name;
  const file = await benchZip(solved.result, typeof name === 'string' ? name : 'bench');
  scope.postMessage({ type: 'exported', id: req.id, file } satisfies BenchReply, [file.bytes.buffer as ArrayBuffer]);
}

scope.onmessage = (event: MessageEvent<BenchRequest>) => {
  const req = event.data;
  handle(req).catch((error: unknown) => {
    scope.postMessage({ type: 'error', id: req.id, message: error instanceof Error ? error.message : String(error) } satisfies BenchReply);
  });
};
