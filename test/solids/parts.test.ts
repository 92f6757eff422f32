/**
 * Each printed part: a closed 2-manifold (checked by manifold-3d, a library
 * independent of the JSCAD code that extruded it, and by counting edge uses),
 * positive volume, resting on z = 0, and the volume the sizing core's analytic
 * formulas give for the faceted shape (see helpers.ts: N-gon areas, elementary
 * geometry) within 1 %. Float mass from its mesh against the sizing's
 * float.massG (PETG 1.27 g/cm3, a typical datasheet value, from memory; the
 * pad counted) within 1 %.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { floatShellVolumeMm3 } from '../../generator/sizing/float/float-shape.ts';
import { buildPart, buildParts, PartBuildError } from '../../generator/solids/index.ts';
import {
  countEdgeUses,
  loadManifold,
  meshBounds,
  meshToManifold,
  meshVolumeMm3,
  segmentsFor,
  type IndexedMesh,
  type ManifoldToplevel,
} from '../../generator/solids/mesh/index.ts';
import { overhangFaces } from './overhang-faces.ts';
import { cornersOn, directPresetFiles, facetedHousingMm3, facetedNozzleMm3, facetedPinMm3, SCALE_EXAMPLE, sizeDoc, sizePreset } from './helpers.ts';

let wasm: ManifoldToplevel;
const { sizing } = sizeDoc(SCALE_EXAMPLE);
const P = sizing.parts;

beforeAll(async () => {
  wasm = await loadManifold();
});

function checkClosed(mesh: IndexedMesh, name: string): void {
  const edges = countEdgeUses(mesh);
  expect(edges, name).toMatchObject({ boundaryEdges: 0, overusedEdges: 0, inconsistentlyOriented: 0, degenerateTriangles: 0, closed: true });
  const manifold = meshToManifold(wasm, mesh, name);
  try {
    expect(manifold.status()).toBe('NoError');
    expect(manifold.volume()).toBeGreaterThan(0);
    expect(Math.abs(manifold.volume() / meshVolumeMm3(mesh) - 1)).toBeLessThan(1e-6);
  } finally {
    manifold.delete();
  }
}

describe('every part is a closed 2-manifold resting on z = 0', () => {
  for (const quality of ['preview', 'export'] as const) {
    it(`${quality}: housing, float, nozzle, pin and the printed pad`, async () => {
      const parts = await buildParts(sizing, { quality, withPad: true });
      for (const [name, mesh] of Object.entries(parts)) {
        checkClosed(mesh as IndexedMesh, name);
        const b = meshBounds(mesh as IndexedMesh);
        expect(b.min[2], name).toBe(0);
      }
      // genus (manifold-3d): the float is a shell around one sealed cavity (two surfaces, genus -1)
      const float = meshToManifold(wasm, parts.float!, 'float');
      expect(float.genus()).toBe(-1);
      float.delete();
    });
  }
});

describe('mesh volume vs the sizing core analytic volume (faceting accounted for)', () => {
  it('float: exactly k(N) times the analytic shell, N-gon sections (both qualities)', async () => {
    for (const q of ['preview', 'export'] as const) {
      const mesh = await buildPart('float', sizing, { quality: q });
      const expected = floatShellVolumeMm3(P.float) * cornersOn(segmentsFor(P.float.outerDiameterMm / 2, q));
      expect(Math.abs(meshVolumeMm3(mesh) / expected - 1)).toBeLessThan(1e-4);
      expect(P.volumes.floatMm3).toBeCloseTo(floatShellVolumeMm3(P.float), 6);
    }
  });

  it('housing within 1 % at both qualities', async () => {
    for (const q of ['preview', 'export'] as const) {
      const mesh = await buildPart('housing', sizing, { quality: q });
      expect(Math.abs(meshVolumeMm3(mesh) / facetedHousingMm3(sizing, q) - 1)).toBeLessThan(0.01);
    }
  });

  it('nozzle and pin within 1 % at both qualities; raw export-quality volumes within 2.5 % of true circles', async () => {
    for (const q of ['preview', 'export'] as const) {
      const nozzle = await buildPart('nozzle', sizing, { quality: q });
      expect(Math.abs(meshVolumeMm3(nozzle) / facetedNozzleMm3(sizing, q) - 1)).toBeLessThan(0.01);
      const pin = await buildPart('pin', sizing, { quality: q });
      expect(Math.abs(meshVolumeMm3(pin) / facetedPinMm3(sizing, q) - 1)).toBeLessThan(0.01);
      if (q === 'export') {
        // the 4 mm pin at 0.05 mm chord error is a 16-gon: 2.5 % less area than its circle (k(16) = 0.9745)
        expect(Math.abs(meshVolumeMm3(pin) / P.volumes.pinMm3 - 1)).toBeLessThan(0.025);
        expect(Math.abs(meshVolumeMm3(nozzle) / P.volumes.nozzleMm3 - 1)).toBeLessThan(0.025);
      }
    }
  });

  it('float mass from the mesh (plus the pad) matches float.massG within 1 % at export quality', async () => {
    const mesh = await buildPart('float', sizing, { quality: 'export' });
    const shellG = meshVolumeMm3(mesh) * sizing.inputs.materialDensityKgM3 * 1e-6; // kg/m3 -> g/mm3
    expect(sizing.inputs.materialDensityKgM3).toBe(1270); // PETG default, DESIGN materials table (from memory)
    expect(Math.abs((shellG + sizing.mass.byPart.pad) / sizing.float.massG - 1)).toBeLessThan(0.01);
  });
});

describe('print poses', () => {
  it('housing deck down: the deck top is the bed, the foot is up, the seat bore opens on the bed', async () => {
    const mesh = await buildPart('housing', sizing, { quality: 'preview' });
    const b = meshBounds(mesh);
    expect(b.max[2]).toBeCloseTo(P.housing.heightMm, 4);
    // widest at the top of the print (the foot), tube-wide at the bed
    let bedRadius = 0;
    let topRadius = 0;
    for (let i = 0; i < mesh.positions.length; i += 3) {
      const r = Math.hypot(mesh.positions[i], mesh.positions[i + 1]);
      if (mesh.positions[i + 2] === 0) bedRadius = Math.max(bedRadius, r);
      if (Math.abs(mesh.positions[i + 2] - b.max[2]) < 1e-4) topRadius = Math.max(topRadius, r);
    }
    expect(bedRadius).toBeCloseTo(P.housing.outerDiameterMm / 2, 3);
    expect(topRadius).toBeCloseTo(P.housing.foot.outerDiameterMm / 2, 3);
  });

  it('pin lies on its flat: height = flat offset + radius, length = head + body', async () => {
    const mesh = await buildPart('pin', sizing, { quality: 'preview' });
    const b = meshBounds(mesh);
    expect(b.max[2]).toBeCloseTo(P.pin.flatOffsetMm + P.pin.diameterMm / 2, 5);
    expect(b.max[0] - b.min[0]).toBeCloseTo(P.pin.lengthMm + P.pin.head.lengthMm, 4);
    expect(b.max[1] - b.min[1]).toBeCloseTo(P.pin.head.widthMm, 4);
  });

  it.each(directPresetFiles())('%s: no downward-facing face is flatter than 50 degrees from the bed, except on the bed and the stated bridge', async (file) => {
    // Printability rule of issue 9: slicers add automatic supports under faces flatter than their
    // threshold, 45 degrees by default (common practice); every face here is 50 degrees or steeper.
    const { sizing: s } = sizePreset(file);
    const parts = await buildParts(s, { quality: 'preview' });
    const bridges: Record<string, number> = {
      // the float's cavity roof (a disc of cavityRoofRadius) is the one stated bridge
      float: s.parts.float.cavityRoofRadiusMm,
      // the housing: the vents' tops and the seat cut through the deck are holes, not faces; the boss top and tube end bridge nothing
      housing: 0,
      nozzle: 0,
      pin: 0,
    };
    for (const [name, mesh] of Object.entries(parts)) {
      for (const face of overhangFaces(mesh, 50)) {
        // a flat downward face: allowed only as the float's stated bridge, level
        const r = Math.max(...face.corners.map(([x, y]) => Math.hypot(x, y)));
        const level = face.corners.every(([, , z]) => Math.abs(z - face.zMinMm) < 1e-4);
        expect(r, `${name}: downward face at z ${face.zMinMm.toFixed(2)} r ${r.toFixed(2)}`).toBeLessThanOrEqual(bridges[name] + 1e-4);
        expect(level, `${name}: the bridge at z ${face.zMinMm.toFixed(2)} is level`).toBe(true);
      }
    }
  });
});

describe('builder failures name the part', () => {
  it('a spec the sizing would never make throws PartBuildError starting with the part name', async () => {
    const broken = structuredClone(sizing);
    broken.parts.float.cavityRadiusMm = -1;
    await expect(buildPart('float', broken, { quality: 'preview' })).rejects.toThrow(/^float: /);
    await expect(buildParts(broken, { quality: 'preview' })).rejects.toBeInstanceOf(PartBuildError);
    await expect(buildParts(sizing, { quality: 'draft' as never })).rejects.toThrow(/quality/);
  });
});
