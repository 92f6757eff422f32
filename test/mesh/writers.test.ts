/**
 * STL and 3MF writers, read back with something else.
 * STL: three's STLLoader (three 0.187, a general-purpose npm reference
 * library) reads the bytes back: same triangle count, same volume.
 * 3MF: unzipped with fflate and parsed by regex; per the 3MF Core
 * Specification (3MF Consortium) 4.1 every edge is shared by exactly two
 * triangles by vertex index, and 4.1.3 asks for no duplicate vertices;
 * manifold-3d re-reads each object as the independent closedness check.
 * Volumes: divergence theorem, and the N-gon prism of elementary geometry.
 */
import { unzipSync, strFromU8 } from 'fflate';
import { STLLoader } from 'three/examples/jsm/loaders/STLLoader.js';
import { beforeAll, describe, expect, it } from 'vitest';
import {
  countEdgeUses,
  formatFloat32,
  geom3ToMesh,
  jscad,
  layoutOnPlate,
  loadManifold,
  manifoldToMesh,
  meshBounds,
  meshVolumeMm3,
  triangleCount,
  write3mf,
  writeStlBinary,
  type IndexedMesh,
  type ManifoldToplevel,
} from '../../generator/solids/mesh/index.ts';
import { buildHousing, housingParts, polygonArea, zCylinder } from './fixtures/housing.ts';

let wasm: ManifoldToplevel;
let housing: IndexedMesh;
beforeAll(async () => {
  wasm = await loadManifold();
  housing = manifoldToMesh(buildHousing(wasm, housingParts('export')), { dispose: true });
});

/** Signed volume of a triangle soup (non-indexed xyz triples), computed here independently of meshVolumeMm3. */
function soupVolume(xyz: ArrayLike<number>): number {
  let sum = 0;
  for (let i = 0; i < xyz.length; i += 9) {
    const [ax, ay, az, bx, by, bz, cx, cy, cz] = Array.from({ length: 9 }, (_, k) => xyz[i + k]);
    sum += ax * (by * cz - bz * cy) - ay * (bx * cz - bz * cx) + az * (bx * cy - by * cx);
  }
  return sum / 6;
}

describe('writeStlBinary', () => {
  it('reads back with three\'s STLLoader: same triangle count, same volume within 1e-6', () => {
    const bytes = writeStlBinary(housing);
    expect(bytes.length).toBe(84 + 50 * triangleCount(housing)); // binary STL layout
    expect(new TextDecoder().decode(bytes.subarray(0, 5))).not.toBe('solid');
    const buffer = bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer;
    const geometry = new STLLoader().parse(buffer);
    const position = geometry.getAttribute('position');
    expect(position.count / 3).toBe(triangleCount(housing));
    const volume = meshVolumeMm3(housing);
    expect(Math.abs(soupVolume(position.array) / volume - 1)).toBeLessThan(1e-6);
    // stored normals are unit length and point the way the corners wind
    const normal = geometry.getAttribute('normal');
    expect(Math.hypot(normal.getX(0), normal.getY(0), normal.getZ(0))).toBeCloseTo(1, 6);
  });

  it('writes a geom3 straight away (N-gon prism volume, elementary geometry)', () => {
    const n = 32;
    const cylinder = zCylinder(10, 0, 5, n);
    const bytes = writeStlBinary(cylinder, { header: 'solid-looking header' });
    expect(new TextDecoder().decode(bytes.subarray(0, 5))).toBe('STL s'); // never starts with "solid"
    const geometry = new STLLoader().parse(bytes.buffer as ArrayBuffer);
    expect(geometry.getAttribute('position').count / 3).toBe(triangleCount(geom3ToMesh(cylinder)));
    expect(Math.abs(soupVolume(geometry.getAttribute('position').array) / (polygonArea(10, n) * 5) - 1)).toBeLessThan(1e-6);
  });
});

interface ParsedObject {
  id: string;
  name: string;
  mesh: IndexedMesh;
}

function parse3mf(bytes: Uint8Array): { files: Record<string, string>; objects: ParsedObject[]; items: string[]; unit: string } {
  const files = Object.fromEntries(Object.entries(unzipSync(bytes)).map(([name, data]) => [name, strFromU8(data)]));
  const model = files['3D/3dmodel.model'];
  const objects = [...model.matchAll(/<object id="(\d+)" type="model" name="([^"]*)">([\s\S]*?)<\/object>/g)].map(([, id, name, body]) => {
    const positions = [...body.matchAll(/<vertex x="([^"]+)" y="([^"]+)" z="([^"]+)"\/>/g)].flatMap((m) => [Number(m[1]), Number(m[2]), Number(m[3])]);
    const indices = [...body.matchAll(/<triangle v1="(\d+)" v2="(\d+)" v3="(\d+)"\/>/g)].flatMap((m) => [Number(m[1]), Number(m[2]), Number(m[3])]);
    return { id, name, mesh: { positions: new Float32Array(positions), indices: new Uint32Array(indices) } };
  });
  const items = [...model.matchAll(/<item objectid="(\d+)"\/>/g)].map((m) => m[1]);
  const unit = /<model unit="([^"]+)"/.exec(model)?.[1] ?? '';
  return { files, objects, items, unit };
}

describe('write3mf', () => {
  const plate = { plateWidthMm: 220, plateDepthMm: 220, spacingMm: 5 };

  it('writes an OPC package per the 3MF Core Specification: content types, root relationship, millimetre model', () => {
    const { files, unit, objects, items } = parse3mf(write3mf([{ name: 'housing', mesh: housing }], plate));
    expect(Object.keys(files).sort()).toEqual(['3D/3dmodel.model', '[Content_Types].xml', '_rels/.rels']);
    expect(files['[Content_Types].xml']).toContain('Extension="model" ContentType="application/vnd.ms-package.3dmanufacturing-3dmodel+xml"');
    expect(files['[Content_Types].xml']).toContain('Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"');
    expect(files['_rels/.rels']).toContain('Target="/3D/3dmodel.model"');
    expect(files['_rels/.rels']).toContain('Type="http://schemas.microsoft.com/3dmanufacturing/2013/01/3dmodel"');
    expect(files['3D/3dmodel.model']).toContain('xmlns="http://schemas.microsoft.com/3dmanufacturing/core/2015/02"');
    expect(unit).toBe('millimeter');
    expect(objects.map((o) => o.name)).toEqual(['housing']);
    expect(items).toEqual(['1']);
  });

  it('every object reads back welded and closed: each edge used exactly twice, no repeated vertex, same volume, on z = 0, side by side', () => {
    const tube = manifoldToMesh(buildHousing(wasm, housingParts('preview'), false), { dispose: true });
    const cube = geom3ToMesh(jscad.primitives.cuboid({ size: [20, 30, 10], center: [-100, 40, 25] }));
    const input = [
      { name: 'housing', mesh: housing },
      { name: 'plain <housing> & "preview"', mesh: tube },
      { name: 'block', mesh: cube },
    ];
    const { objects, items } = parse3mf(write3mf(input, plate));
    expect(objects.map((o) => o.name)).toEqual(['housing', 'plain &lt;housing&gt; &amp; &quot;preview&quot;', 'block']);
    expect(items).toEqual(objects.map((o) => o.id));

    const footprints = objects.map(({ mesh }, i) => {
      const source = input[i].mesh;
      const edges = countEdgeUses(mesh);
      expect(edges.closed).toBe(true);
      expect(edges.boundaryEdges + edges.overusedEdges + edges.inconsistentlyOriented).toBe(0);
      // welded: as many vertices as the welded source, and no two at one position
      expect(mesh.positions.length).toBe(source.positions.length);
      const distinct = new Set<string>();
      for (let v = 0; v < mesh.positions.length; v += 3) distinct.add(`${mesh.positions[v]},${mesh.positions[v + 1]},${mesh.positions[v + 2]}`);
      expect(distinct.size).toBe(mesh.positions.length / 3);
      expect(triangleCount(mesh)).toBe(triangleCount(source));
      expect(Math.abs(meshVolumeMm3(mesh) / meshVolumeMm3(source) - 1)).toBeLessThan(1e-6);
      // manifold-3d, independently, takes it as a closed 2-manifold
      const manifold = new wasm.Manifold(new wasm.Mesh({ numProp: 3, vertProperties: mesh.positions, triVerts: mesh.indices }));
      expect(manifold.status()).toBe('NoError');
      manifold.delete();

      const bounds = meshBounds(mesh);
      expect(bounds.min[2]).toBe(0); // resting on the plate
      expect(bounds.min[0]).toBeGreaterThanOrEqual(0);
      expect(bounds.min[1]).toBeGreaterThanOrEqual(0);
      expect(bounds.max[0]).toBeLessThanOrEqual(plate.plateWidthMm);
      expect(bounds.max[1]).toBeLessThanOrEqual(plate.plateDepthMm);
      return bounds;
    });
    // footprints do not overlap and keep the spacing
    for (let i = 0; i < footprints.length; i++) {
      for (let j = i + 1; j < footprints.length; j++) {
        const a = footprints[i];
        const b = footprints[j];
        const gapX = Math.max(b.min[0] - a.max[0], a.min[0] - b.max[0]);
        const gapY = Math.max(b.min[1] - a.max[1], a.min[1] - b.max[1]);
        expect(Math.max(gapX, gapY)).toBeGreaterThanOrEqual(plate.spacingMm - 1e-3);
      }
    }
  });

  it('gives the same bytes for the same parts', () => {
    const a = write3mf([{ name: 'housing', mesh: housing }], plate);
    const b = write3mf([{ name: 'housing', mesh: housing }], plate);
    expect(Buffer.from(a).equals(Buffer.from(b))).toBe(true);
  });

  it('refuses bad input naming the field, the value and the allowed range', () => {
    expect(() => write3mf([], plate)).toThrow(/write3mf\.objects = \[\] \(empty\)/);
    expect(() => write3mf([{ name: ' ', mesh: housing }], plate)).toThrow(/write3mf\.objects\[0\]\.name = " "; allowed: a non-empty part name/);
    const open = { positions: housing.positions, indices: housing.indices.slice(3) };
    expect(() => write3mf([{ name: 'housing', mesh: housing }, { name: 'float', mesh: open }], plate)).toThrow(
      /write3mf\.objects\[1\]\.mesh \("float"\) is not a closed 2-manifold: 3 open edges/,
    );
    expect(() => write3mf([{ name: 'housing', mesh: housing }], { ...plate, plateWidthMm: -1 })).toThrow(
      /write3mf\.options\.plateWidthMm = -1 mm; allowed: a finite number greater than 0 mm/,
    );
    expect(() => write3mf([{ name: 'housing', mesh: housing }], { plateWidthMm: 50, plateDepthMm: 50, spacingMm: 5 })).toThrow(
      /write3mf\.options: plate 50 × 50 mm is too small for this part \(they need 61\.0 × 61\.0 mm/,
    );
  });
});

describe('layoutOnPlate', () => {
  it('matches its worked example and wraps to a new shelf at the plate edge', () => {
    const two = layoutOnPlate([{ widthMm: 50, depthMm: 30 }, { widthMm: 50, depthMm: 30 }], { plateWidthMm: 200, plateDepthMm: 200, spacingMm: 10 });
    expect(two).toEqual({ placements: [{ xMm: 45, yMm: 85 }, { xMm: 105, yMm: 85 }], usedWidthMm: 110, usedDepthMm: 30, fits: true });
    const four = layoutOnPlate(Array.from({ length: 4 }, () => ({ widthMm: 60, depthMm: 60 })), { plateWidthMm: 130, plateDepthMm: 130, spacingMm: 5 });
    expect(four.fits).toBe(true);
    expect(four.usedWidthMm).toBe(125);
    expect(four.usedDepthMm).toBe(125);
  });
});

describe('formatFloat32', () => {
  it('writes the shortest text that reads back as the same float32 (IEEE 754 single precision)', () => {
    expect(formatFloat32(0.1)).toBe('0.1');
    expect(formatFloat32(Math.fround(0.1))).toBe('0.1');
    expect(formatFloat32(-0)).toBe('0');
    expect(formatFloat32(30.5)).toBe('30.5');
    for (const value of [Math.PI, 1e-7, 123.456789, -98.76543, 2 ** -20]) {
      expect(Math.fround(Number(formatFloat32(value)))).toBe(Math.fround(value));
    }
  });
});
