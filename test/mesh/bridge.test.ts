/**
 * Loader, geom3 <-> mesh <-> Manifold bridges, booleans and measurements.
 * Sources: expected volumes from elementary geometry (cube a^3; overlap of two cubes;
 * prism over a regular N-gon (N/2) r^2 sin(2 pi / N) h). Closedness is
 * checked with manifold-3d itself (an independent library) besides our own
 * edge count; JSCAD's measureVolume is the second opinion on volumes.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import {
  countEdgeUses,
  geom3ToMesh,
  intersect,
  isNodeRuntime,
  jscad,
  loadManifold,
  manifoldToGeom3,
  manifoldToMesh,
  meshBounds,
  meshToGeom3,
  meshToManifold,
  meshVolumeMm3,
  subtractAll,
  toManifold,
  triangleCount,
  unionAll,
  type IndexedMesh,
  type ManifoldToplevel,
} from '../../generator/solids/mesh/index.ts';
import { polygonArea, zCylinder } from './fixtures/housing.ts';

const { primitives, geometries, measurements, transforms } = jscad;
let wasm: ManifoldToplevel;

beforeAll(async () => {
  wasm = await loadManifold();
});

describe('loadManifold', () => {
  it('loads one shared instance under Node', async () => {
    expect(isNodeRuntime()).toBe(true);
    expect(await loadManifold()).toBe(wasm);
    expect(typeof wasm.Manifold.cube).toBe('function');
  });
});

describe('geom3ToMesh', () => {
  it('welds a JSCAD cube to 8 vertices and 12 triangles, 1000 mm^3 (a^3, elementary geometry)', () => {
    const mesh = geom3ToMesh(primitives.cuboid({ size: [10, 10, 10] }));
    expect(mesh.positions.length / 3).toBe(8);
    expect(triangleCount(mesh)).toBe(12);
    expect(meshVolumeMm3(mesh)).toBeCloseTo(1000, 9);
    expect(countEdgeUses(mesh)).toEqual({
      edges: 18, // source: Euler's polyhedron formula V - E + F = 8 - 18 + 12 = 2
      boundaryEdges: 0,
      overusedEdges: 0,
      inconsistentlyOriented: 0,
      degenerateTriangles: 0,
      closed: true,
    });
    expect(meshBounds(mesh)).toEqual({ min: [-5, -5, -5], max: [5, 5, 5] });
  });

  it('applies pending transforms and agrees with the N-gon prism volume (elementary geometry)', () => {
    const n = 24;
    const cylinder = transforms.translate([100, -50, 7], zCylinder(8, 0, 20, n));
    const mesh = geom3ToMesh(cylinder);
    expect(Math.abs(meshVolumeMm3(mesh) / (polygonArea(8, n) * 20) - 1)).toBeLessThan(1e-6);
    expect(meshBounds(mesh).min[2]).toBeCloseTo(7, 5);
    expect(countEdgeUses(mesh).closed).toBe(true);
  });

  it('reports a flipped triangle and a hole', () => {
    const mesh = geom3ToMesh(primitives.cuboid({ size: [10, 10, 10] }));
    const flipped: IndexedMesh = { positions: mesh.positions, indices: mesh.indices.slice() };
    [flipped.indices[1], flipped.indices[2]] = [flipped.indices[2], flipped.indices[1]];
    const counts = countEdgeUses(flipped);
    expect(counts.inconsistentlyOriented).toBe(3);
    expect(counts.closed).toBe(false);
    const holed: IndexedMesh = { positions: mesh.positions, indices: mesh.indices.slice(3) };
    expect(countEdgeUses(holed).boundaryEdges).toBe(3);
  });
});

describe('toManifold', () => {
  it('hands a closed solid to manifold-3d (status NoError, same volume)', () => {
    const manifold = toManifold(wasm, primitives.cuboid({ size: [10, 20, 30] }));
    expect(manifold.status()).toBe('NoError');
    expect(manifold.volume()).toBeCloseTo(6000, 6);
    manifold.delete();
  });

  it('refuses an open solid with a clear message naming it and manifold-3d\'s status', () => {
    const cube = primitives.cuboid({ size: [10, 10, 10] });
    const open = geometries.geom3.create(cube.polygons.slice(1));
    expect(() => toManifold(wasm, open, 'housing.deck')).toThrow(
      /^housing\.deck: manifold-3d rejected the mesh \(status NotManifold\): 10 triangles, 8 vertices; 4 open edges/,
    );
  });
});

describe('manifoldToMesh / manifoldToGeom3', () => {
  it('round-trips a boolean result into a welded mesh and a JSCAD geom3 of the same volume (JSCAD measureVolume as second opinion)', () => {
    const n = 32;
    const result = subtractAll(wasm, primitives.cuboid({ size: [20, 20, 10] }), [zCylinder(4, -10, 10, n)]);
    const mesh = manifoldToMesh(result);
    const geom = manifoldToGeom3(result, { dispose: true });
    const expected = 20 * 20 * 10 - polygonArea(4, n) * 10; // prism over an N-gon (elementary geometry)
    expect(Math.abs(meshVolumeMm3(mesh) / expected - 1)).toBeLessThan(1e-6);
    expect(Math.abs(measurements.measureVolume(geom) / expected - 1)).toBeLessThan(1e-6);
    expect(countEdgeUses(mesh).closed).toBe(true);
    // no position appears twice
    const keys = new Set<string>();
    for (let v = 0; v < mesh.positions.length; v += 3) keys.add(`${mesh.positions[v]},${mesh.positions[v + 1]},${mesh.positions[v + 2]}`);
    expect(keys.size).toBe(mesh.positions.length / 3);
    // back through geom3ToMesh gives the same welded mesh size
    const again = geom3ToMesh(meshToGeom3(mesh));
    expect(again.positions.length).toBe(mesh.positions.length);
    expect(triangleCount(again)).toBe(triangleCount(mesh));
  });
});

describe('booleans', () => {
  const cubeA = () => primitives.cuboid({ size: [10, 10, 10], center: [0, 0, 0] });
  const cubeB = () => primitives.cuboid({ size: [10, 10, 10], center: [5, 5, 5] });

  it('unionAll of two overlapping cubes: 2 * 1000 - 125 mm^3 (elementary geometry)', () => {
    const mesh = manifoldToMesh(unionAll(wasm, [cubeA(), cubeB()]), { dispose: true });
    expect(meshVolumeMm3(mesh)).toBeCloseTo(1875, 3);
    expect(countEdgeUses(mesh).closed).toBe(true);
  });

  it('intersect of the same cubes: the 5 mm overlap cube, 125 mm^3', () => {
    const mesh = manifoldToMesh(intersect(wasm, cubeA(), cubeB()), { dispose: true });
    expect(meshVolumeMm3(mesh)).toBeCloseTo(125, 4);
    expect(meshBounds(mesh)).toEqual({ min: [0, 0, 0], max: [5, 5, 5] });
  });

  it('subtractAll takes a batch of cutters in one go: 1000 - 125 - 125 mm^3', () => {
    const cutters = [cubeB(), primitives.cuboid({ size: [10, 10, 10], center: [-5, -5, -5] })];
    const mesh = manifoldToMesh(subtractAll(wasm, cubeA(), cutters), { dispose: true });
    expect(meshVolumeMm3(mesh)).toBeCloseTo(750, 3);
    expect(countEdgeUses(mesh).closed).toBe(true);
  });

  it('accepts Manifolds, leaves them to the caller, and gives an empty solid for disjoint intersect', () => {
    const mine = toManifold(wasm, cubeA());
    const far = transforms.translate([100, 0, 0], cubeA());
    const empty = intersect(wasm, mine, far);
    expect(empty.status()).toBe('NoError');
    expect(empty.isEmpty()).toBe(true);
    empty.delete();
    const union = unionAll(wasm, [mine, far]);
    expect(union.volume()).toBeCloseTo(2000, 3);
    union.delete();
    expect(mine.volume()).toBeCloseTo(1000, 6); // still alive
    mine.delete();
    expect(unionAll(wasm, []).isEmpty()).toBe(true);
  });

  it('names a bad operand', () => {
    expect(() => unionAll(wasm, [cubeA(), {} as never])).toThrow(/unionAll\.parts\[1\] is neither a JSCAD geom3 nor a manifold-3d Manifold/);
    const cube = cubeA();
    const open = geometries.geom3.create(cube.polygons.slice(2));
    expect(() => subtractAll(wasm, cubeA(), [cubeB(), open])).toThrow(/subtractAll\.cutters\[1\]: manifold-3d rejected the mesh \(status NotManifold\)/);
  });

  it('meshToManifold accepts what manifoldToMesh gives back', () => {
    const mesh = manifoldToMesh(unionAll(wasm, [cubeA(), cubeB()]), { dispose: true });
    const again = meshToManifold(wasm, mesh, 'roundTrip');
    expect(again.status()).toBe('NoError');
    expect(again.numTri()).toBe(triangleCount(mesh));
    again.delete();
  });
});
