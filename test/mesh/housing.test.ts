/**
 * A housing-like part (tube, deck, boss with bore, six rim notches, two
 * teardrop pin holes, two vents) made from JSCAD primitives with every
 * boolean through manifold-3d: closed, accepted by manifold-3d as a new
 * Manifold, and of the right volume.
 * Sources: prism over a regular N-gon (N/2) r^2 sin(2 pi / N) h, elementary
 * geometry (REFERENCE-CHECKS "Geometry"); Euler-Poincare formula
 * V - E + F = 2 - 2g for a closed orientable surface of genus g (elementary
 * topology); manifold-3d as the independent closedness check.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import {
  countEdgeUses,
  loadManifold,
  manifoldToMesh,
  meshBounds,
  meshVolumeMm3,
  subtractAll,
  teardropArea,
  type IndexedMesh,
  type ManifoldToplevel,
  type Quality,
} from '../../generator/solids/mesh/index.ts';
import { segmentsFor } from '../../generator/solids/mesh/index.ts';
import { buildHousing, HOUSING, housingParts, polygonArea } from './fixtures/housing.ts';

let wasm: ManifoldToplevel;
beforeAll(async () => {
  wasm = await loadManifold();
});

/** Independent check: manifold-3d's own constructor on the raw arrays (not our meshToManifold). */
function manifoldStatus(mesh: IndexedMesh): { status: string; genus: number; volume: number } {
  const manifold = new wasm.Manifold(new wasm.Mesh({ numProp: 3, vertProperties: mesh.positions, triVerts: mesh.indices }));
  const result = { status: manifold.status(), genus: manifold.genus(), volume: manifold.volume() };
  manifold.delete();
  return result;
}

const h = HOUSING;
const innerRadiusMm = h.outerRadiusMm - h.wallMm;
const n = (r: number, quality: Quality) => segmentsFor(r, quality);

describe.each(['preview', 'export'] as const)('housing-like part at %s quality', (quality) => {
  it('plain tube: volume of the two N-gon prisms within 0.1 % (elementary geometry)', () => {
    const parts = housingParts(quality);
    const mesh = manifoldToMesh(subtractAll(wasm, parts.tube[0], [parts.tube[1]]), { dispose: true });
    const expected =
      (polygonArea(h.outerRadiusMm, n(h.outerRadiusMm, quality)) - polygonArea(innerRadiusMm, n(innerRadiusMm, quality))) * h.tubeHeightMm;
    expect(Math.abs(meshVolumeMm3(mesh) / expected - 1)).toBeLessThan(0.001);
    expect(countEdgeUses(mesh).closed).toBe(true);
    const independent = manifoldStatus(mesh);
    expect(independent.status).toBe('NoError');
    expect(independent.genus).toBe(1); // a tube is a torus topologically
  });

  it('tube + deck + boss - bore - vents: sum of N-gon prisms within 0.1 % (elementary geometry)', () => {
    const parts = housingParts(quality);
    const housing = buildHousing(wasm, parts, false);
    const mesh = manifoldToMesh(housing, { dispose: true });
    const area = (r: number) => polygonArea(r, n(r, quality));
    const expected =
      area(h.outerRadiusMm) * (h.tubeHeightMm + h.deckMm) -
      area(innerRadiusMm) * h.tubeHeightMm +
      area(h.bossRadiusMm) * h.bossHeightMm -
      area(h.boreRadiusMm) * (h.deckMm + h.bossHeightMm) -
      2 * area(h.ventRadiusMm) * h.deckMm;
    expect(Math.abs(meshVolumeMm3(mesh) / expected - 1)).toBeLessThan(0.001);
    expect(countEdgeUses(mesh).closed).toBe(true);
    expect(manifoldStatus(mesh).status).toBe('NoError');
  });

  it('full part: closed 2-manifold by edge count and by manifold-3d, genus 5, sane volume and bounds', () => {
    const parts = housingParts(quality);
    const plain = manifoldToMesh(buildHousing(wasm, parts, false), { dispose: true });
    const mesh = manifoldToMesh(buildHousing(wasm, parts, true), { dispose: true });

    const edges = countEdgeUses(mesh);
    expect(edges).toMatchObject({ boundaryEdges: 0, overusedEdges: 0, inconsistentlyOriented: 0, degenerateTriangles: 0, closed: true });
    const independent = manifoldStatus(mesh);
    expect(independent.status).toBe('NoError');
    // Handles: bore 1 + vents 2 + a pin hole through each wall 2 (rim notches open to the edge add none).
    expect(independent.genus).toBe(5);
    const vertices = mesh.positions.length / 3;
    const faces = mesh.indices.length / 3;
    expect(vertices - edges.edges + faces).toBe(2 - 2 * 5); // Euler-Poincare

    const volume = meshVolumeMm3(mesh);
    expect(volume).toBeGreaterThan(0);
    expect(Math.abs(independent.volume / volume - 1)).toBeLessThan(1e-6);
    // What the notches and pin holes take out, against a flat-wall estimate
    // (wall x notch width x notch height; wall x teardrop area per wall): the
    // wall's curve and the facets move it by a few per cent at most.
    const removed = meshVolumeMm3(plain) - volume;
    const estimate = h.notchCount * h.wallMm * h.notchWidthMm * h.notchHeightMm + 2 * h.wallMm * teardropArea(h.pinRadiusMm);
    expect(Math.abs(removed / estimate - 1)).toBeLessThan(0.05);

    const bounds = meshBounds(mesh);
    expect(bounds.min[2]).toBeCloseTo(0, 5);
    expect(bounds.max[2]).toBeCloseTo(h.tubeHeightMm + h.deckMm + h.bossHeightMm, 4);
    expect(bounds.max[0]).toBeCloseTo(h.outerRadiusMm, 4); // a vertex on +x (N multiple of 4)
  });
});
