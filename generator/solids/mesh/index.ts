/**
 * Mesh infrastructure for the part builders.
 *
 * JSCAD makes the primitives, extrusions and transforms; every boolean goes
 * through manifold-3d (JSCAD 2.13's own booleans leave T-junctions, see
 * DESIGN.md "Solids"); results come back as welded indexed meshes that the
 * measurements and writers take.
 *
 * Typical builder:
 *   const wasm = await loadManifold();
 *   const body = subtractAll(wasm, unionAll(wasm, [tube, deck, boss]), [vent1, vent2, ...]);
 *   const mesh = manifoldToMesh(body, { dispose: true });
 *   meshVolumeMm3(mesh); write3mf([{ name: 'housing', mesh }], plate);
 *
 * Every Manifold a function here returns belongs to the caller: free it with
 * `.delete()` or pass `{ dispose: true }` to the converter that reads it.
 * (Careful: unionAll's result passed to subtractAll stays the caller's, so
 * delete it too, or keep the geom3 chain.)
 */
export type { Manifold, ManifoldToplevel } from 'manifold-3d';
export { jscad, type Geom2, type Geom3 } from './jscad.ts';
export type { BoundsMm, EdgeUseCounts, IndexedMesh } from './types.ts';

export { isNodeRuntime, loadManifold, useManifold } from './load-manifold.ts';

export { geom3ToMesh } from './geom3-to-mesh.ts';
export { meshToManifold } from './mesh-to-manifold.ts';
export { toManifold } from './to-manifold.ts';
export { manifoldToMesh, type ManifoldToMeshOptions } from './manifold-to-mesh.ts';
export { manifoldToGeom3 } from './manifold-to-geom3.ts';
export { meshToGeom3 } from './mesh-to-geom3.ts';
export { isIndexedMesh } from './is-indexed-mesh.ts';

export type { Solid } from './solid-inputs.ts';
export { unionAll } from './union-all.ts';
export { subtractAll } from './subtract-all.ts';
export { intersect } from './intersect.ts';

export { meshVolumeMm3 } from './mesh-volume-mm3.ts';
export { meshBounds } from './mesh-bounds.ts';
export { countEdgeUses } from './count-edge-uses.ts';
export { triangleCount } from './triangle-count.ts';

export { writeStlBinary, type StlOptions } from './write-stl-binary.ts';
export { write3mf, type ThreeMfObject, type ThreeMfOptions } from './write3mf.ts';
export { layoutOnPlate, type Footprint, type PlateLayout, type PlateOptions } from './layout-on-plate.ts';
export { packPlates } from './pack-plates.ts';
export { formatFloat32 } from './format-float32.ts';

export { MAX_SEGMENTS, segmentsForChordError } from './segments-for-chord-error.ts';
export { QUALITY, segmentsFor, type Quality } from './quality.ts';
export { holePolygonRadiusMm } from './hole-polygon-radius-mm.ts';
export { teardrop2d, type TeardropOptions } from './teardrop2d.ts';
export { teardropArea } from './teardrop-area.ts';
