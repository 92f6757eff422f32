/**
 * manifold-3d Manifold → welded indexed mesh (what the writers take).
 *
 * Only positions are kept. If manifold-3d split a vertex across property
 * seams it lists the copies in its merge vectors; they are folded back and
 * unused vertices dropped, so every position appears once. Throws if the
 * Manifold carries an error status (it would read back empty).
 */
import type { Manifold } from 'manifold-3d';
import type { IndexedMesh } from './types.ts';

export interface ManifoldToMeshOptions {
  /** delete the Manifold (free its WASM memory) once read; default false */
  dispose?: boolean;
}

export function manifoldToMesh(manifold: Manifold, options: ManifoldToMeshOptions = {}): IndexedMesh {
  // An errored Manifold reads back as an empty mesh; say why instead.
  const status = manifold.status();
  const mesh = status === 'NoError' ? manifold.getMesh() : undefined;
  if (options.dispose) manifold.delete();
  if (!mesh) throw new Error(`manifoldToMesh: the Manifold carries manifold-3d status ${status}, so it has no mesh`);
  const { numProp, vertProperties, triVerts, mergeFromVert, mergeToVert } = mesh;
  const vertexCount = vertProperties.length / numProp;

  const target = new Uint32Array(vertexCount);
  for (let v = 0; v < vertexCount; v++) target[v] = v;
  for (let i = 0; i < (mergeFromVert?.length ?? 0); i++) target[mergeFromVert[i]] = mergeToVert[i];

  // Renumber the vertices actually used, in first-use order.
  const newIndex = new Int32Array(vertexCount).fill(-1);
  const indices = new Uint32Array(triVerts.length);
  const positions: number[] = [];
  for (let i = 0; i < triVerts.length; i++) {
    const v = target[triVerts[i]];
    if (newIndex[v] < 0) {
      newIndex[v] = positions.length / 3;
      positions.push(vertProperties[v * numProp], vertProperties[v * numProp + 1], vertProperties[v * numProp + 2]);
    }
    indices[i] = newIndex[v];
  }
  return { positions: new Float32Array(positions), indices };
}
