/// <reference lib="webworker" />
/**
 * Runs off the page: sizing, then the part solids. One job at a time; the page
 * sends only the newest input, so an older build is superseded, never queued.
 */
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import { assemblyTransforms, buildParts } from './solids-source.ts';
import { loadManifold } from '../../generator/solids/mesh/index.ts';
import type { BuiltReply, WorkerReply, WorkerRequest } from './protocol.ts';
import type { PartMeshes } from './parts-contract.ts';

const scope = self as unknown as DedicatedWorkerGlobalScope;

// Fetch and compile the geometry kernel now, not at the first build: the page starts this
// worker before its own components have loaded, so the kernel is ready when the first design comes.
void loadManifold().catch(() => undefined);

function transferables(meshes: PartMeshes | null): Transferable[] {
  if (!meshes) return [];
  return Object.values(meshes).flatMap((m) => (m ? [m.positions.buffer, m.indices.buffer] : []));
}

async function handle(req: WorkerRequest): Promise<void> {
  const t0 = performance.now();
  const sizing = sizeDesign(req.inputs);
  const t1 = performance.now();
  if (req.type === 'build') {
    const reply: BuiltReply = { type: 'built', id: req.id, sizing, meshes: null, transforms: null, sizeMs: t1 - t0, buildMs: 0 };
    if (sizing.ok) {
      try {
        reply.meshes = await buildParts(sizing, { quality: 'preview', withPad: true });
        reply.transforms = { rest: assemblyTransforms(sizing, 'rest'), seal: assemblyTransforms(sizing, 'seal') };
      } catch (error) {
        reply.solidError = error instanceof Error ? error.message : String(error);
      }
    }
    reply.buildMs = performance.now() - t1;
    scope.postMessage(reply satisfies WorkerReply, transferables(reply.meshes));
    return;
  }
  if (!sizing.ok) throw new Error('this design does not size, so there is nothing to export');
  const meshes = req.kind === 'sheet' ? null : await buildParts(sizing, { quality: 'export' });
  // the writers, the build sheet and the zip load on the first export: the preview never needs them
  const { exportFiles } = await import('./export-files.ts');
  const files = exportFiles(req.kind, sizing, req.document, meshes, req.part, req.units);
  scope.postMessage({ type: 'exported', id: req.id, files } satisfies WorkerReply, files.map((f) => f.bytes.buffer as ArrayBuffer));
}

scope.onmessage = (event: MessageEvent<WorkerRequest>) => {
  const req = event.data;
  handle(req).catch((error: unknown) => {
    scope.postMessage({ type: 'error', id: req.id, message: error instanceof Error ? error.message : String(error) } satisfies WorkerReply);
  });
};
