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

export { isNodeRuntime, loadManifold, useManifold } from './loadManifold.ts';

export { geom3ToMesh } from './geom3ToMesh.ts';
export { meshToManifold } from './meshToManifold.ts';
export { toManifold } from './toManifold.ts';
export { manifoldToMesh, type ManifoldToMeshOptions } from './manifoldToMesh.ts';
export { manifoldToGeom3 } from './manifoldToGeom3.ts';
export { meshToGeom3 } from './meshToGeom3.ts';
export { isIndexedMesh } from './isIndexedMesh.ts';

export type { Solid } from './solidInputs.ts';
export { unionAll } from './unionAll.ts';
export { subtractAll } from './subtractAll.ts';
export { intersect } from './intersect.ts';

export { meshVolumeMm3 } from './meshVolumeMm3.ts';
export { meshBounds } from './meshBounds.ts';
export { countEdgeUses } from './countEdgeUses.ts';
export { triangleCount } from './triangleCount.ts';

export { writeStlBinary, type StlOptions } from './writeStlBinary.ts';
export { write3mf, type ThreeMfObject, type ThreeMfOptions } from './write3mf.ts';
export { layoutOnPlate, type Footprint, type PlateLayout, type PlateOptions } from './layoutOnPlate.ts';
export { formatFloat32 } from './formatFloat32.ts';

export { MAX_SEGMENTS, segmentsForChordError } from './segmentsForChordError.ts';
export { QUALITY, segmentsFor, type Quality } from './quality.ts';
export { holePolygonRadiusMm } from './holePolygonRadiusMm.ts';
export { teardrop2d, type TeardropOptions } from './teardrop2d.ts';
export { teardropArea } from './teardropArea.ts';
