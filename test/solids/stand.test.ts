/**
 * The seal test stand (DESIGN "Seal test stand"): stand-base and
 * stand-plunger are closed 2-manifolds (manifold-3d accepts them; every edge
 * used twice), rest on z = 0 with no face overhanging past 50 degrees from the
 * bed, hold the nozzle in the housing's own seat, do not overlap when the pad
 * rests on the lip, carry the mass they are labelled with, and are written by
 * `build --with-test-stand`.
 * Sources: Pappus' centroid theorem for volumes of revolution (any calculus
 * text); the cone V = pi r^2 h / 3 (elementary geometry); 50 degrees from the
 * bed is the project's print rule (common practice: slicers support faces
 * flatter than 45 degrees).
 */
import { mkdtempSync, readFileSync, rmSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runCli } from '../../generator/cli/main.ts';
import type { Io } from '../../generator/cli/command.ts';
import { holePolygonRadiusMm, intersect, loadManifold, countEdgeUses, meshBounds, meshVolumeMm3, meshToManifold } from '../../generator/solids/mesh/index.ts';
import { buildStandBaseMesh, standBaseDrawnProfile, standBaseSegments } from '../../generator/solids/parts/stand-base-solid.ts';
import { buildStandPlungerMesh, standPlungerFlipMatrix, standPlungerLabelWidthMm } from '../../generator/solids/parts/stand-plunger-solid.ts';
import { housingProfile, housingSegments } from '../../generator/solids/parts/housing-solid.ts';
import { plungerLabelText, revolvedVolumeMm3, standSpecOf } from '../../generator/sizing/parts/stand-spec.ts';
import { transformMesh, translation } from '../../generator/solids/shapes/transform-mesh.ts';
import { buildSheetMarkdown } from '../../generator/doc/build-sheet.ts';
import { CAUTIONS } from '../../generator/doc/cautions.ts';
import { overhangFaces } from './overhang-faces.ts';
import { presetFiles, ROOT, sizeAnyPreset, sizePreset } from './helpers.ts';

const scratch = mkdtempSync(join(tmpdir(), 'fw-stand-'));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

describe('revolvedVolumeMm3 (Pappus over a polygon)', () => {
  it('a unit square at the axis is a cylinder of volume pi; a right triangle is a cone pi r^2 h / 3', () => {
    expect(revolvedVolumeMm3([[0, 0], [1, 0], [1, 1], [0, 1]])).toBeCloseTo(Math.PI, 12);
    expect(revolvedVolumeMm3([[0, 0], [3, 0], [0, 4]])).toBeCloseTo((Math.PI * 9 * 4) / 3, 10);
    // a ring 2..3 of height 1: pi (9 - 4)
    expect(revolvedVolumeMm3([[2, 0], [3, 0], [3, 1], [2, 1]])).toBeCloseTo(5 * Math.PI, 10);
  });
});

describe.each(presetFiles())('test stand for %s', (preset) => {
  const { sizing } = sizeAnyPreset(preset);
  const stand = standSpecOf(sizing);

  it('both parts are closed 2-manifolds on z = 0 with nothing overhanging past 50 degrees', async () => {
    for (const mesh of [await buildStandBaseMesh(stand.base, 'export'), await buildStandPlungerMesh(stand.plunger, 'export')]) {
      const edges = countEdgeUses(mesh);
      expect(edges.closed).toBe(true);
      expect(edges.boundaryEdges + edges.overusedEdges + edges.inconsistentlyOriented).toBe(0);
      // Euler: a closed triangle mesh has 3 F = 2 E
      expect(3 * (mesh.indices.length / 3)).toBe(2 * edges.edges);
      expect(meshBounds(mesh).min[2]).toBe(0);
      expect(overhangFaces(mesh, 50)).toEqual([]);
    }
  });

  it('mesh volumes agree with Pappus volumes of the profiles within 1.5 % (faceting and the label)', async () => {
    const base = meshVolumeMm3(await buildStandBaseMesh(stand.base, 'export'));
    const plunger = meshVolumeMm3(await buildStandPlungerMesh(stand.plunger, 'export'));
    expect(Math.abs(base - stand.base.volumeMm3) / stand.base.volumeMm3).toBeLessThan(0.015);
    expect(Math.abs(plunger - stand.plunger.plasticVolumeMm3) / stand.plunger.plasticVolumeMm3).toBeLessThan(0.015);
  });

  it('the seat is the housing seat (a lever: its frame\'s): same bore, same length, flats on the same nominal circle', () => {
    if (sizing.architecture === 'lever') {
      const fr = sizing.parts.frame;
      expect(stand.base.seatBoreMm).toBe(fr.seatBoreMm);
      expect(stand.base.seatLengthMm).toBeCloseTo(fr.deckThicknessMm + fr.bossHeightMm, 12);
      return;
    }
    const h = sizing.parts.housing;
    expect(stand.base.seatBoreMm).toBe(h.seatBoreMm);
    expect(stand.base.seatLengthMm).toBeCloseTo(h.deckThicknessMm + h.bossHeightMm, 12);
    const nb = standBaseSegments(stand.base, 'export');
    const nh = housingSegments(h, 'export');
    const seatBase = Math.min(...standBaseDrawnProfile(stand.base, nb).map(([r]) => r));
    const seatHousing = Math.min(...housingProfile(h, nh).filter(([r]) => r > 0).map(([r]) => r));
    // flats of an n-gon at distance R cos(pi / n) from its centre (elementary geometry)
    expect(seatBase * Math.cos(Math.PI / nb)).toBeCloseTo(h.seatBoreMm / 2, 9);
    expect(seatHousing * Math.cos(Math.PI / nh)).toBeCloseTo(h.seatBoreMm / 2, 9);
    expect(seatBase).toBeCloseTo(holePolygonRadiusMm(h.seatBoreMm / 2, nb), 12);
    // the nozzle's collar and its ribs fit as in the housing: ribs stand 2 x clearance proud of a collar one clearance under the bore
    expect(sizing.parts.nozzle.collarDiameterMm + 2 * sizing.parts.printClearanceMm).toBeCloseTo(stand.base.seatBoreMm, 9);
  });

  it('plunger and base do not overlap with the pad on the lip; the guide leaves clearance + running gap', async () => {
    const wasm = await loadManifold();
    const base = await buildStandBaseMesh(stand.base, 'export');
    const plungerPrint = await buildStandPlungerMesh(stand.plunger, 'export');
    // print pose back to the pose in use (the flip is its own inverse), then onto the lip
    const used = transformMesh(transformMesh(plungerPrint, standPlungerFlipMatrix(stand.plunger)), translation(0, 0, stand.plungerSeatedZMm));
    const a = meshToManifold(wasm, base);
    const b = meshToManifold(wasm, used);
    const both = intersect(wasm, a, b);
    expect(both.volume()).toBeLessThan(1e-6);
    both.delete();
    a.delete();
    b.delete();
    expect(stand.base.guideInnerRadiusMm - stand.plunger.stemRadiusMm).toBeCloseTo(sizing.parts.printClearanceMm + 0.3, 12);
    // the nozzle's shoulder clears the guide bore, and the stem is still in the guide when seated
    expect(sizing.parts.nozzle.shoulderDiameterMm / 2).toBeLessThan(stand.base.guideInnerRadiusMm);
    expect(stand.base.guideTopZMm).toBeGreaterThan(stand.plungerSeatedZMm + stand.plunger.pocketDepthMm);
  });

  it('the label is the plunger mass (plastic at the design density plus the pad), and fits on the flange', async () => {
    const p = stand.plunger;
    expect(p.massG).toBeCloseTo((p.plasticVolumeMm3 * sizing.inputs.materialDensityKgM3) / 1e6 + sizing.mass.byPart.pad, 12);
    expect(p.label.text).toBe(plungerLabelText(p.massG));
    expect(Number(p.label.text.replace('g', ''))).toBeCloseTo(p.massG, 1);
    // the printed part weighs what the label says, within the label's rounding and the label's own plastic (0.1 g)
    const mesh = await buildStandPlungerMesh(p, 'export');
    const printedG = (meshVolumeMm3(mesh) * sizing.inputs.materialDensityKgM3) / 1e6 + sizing.mass.byPart.pad;
    expect(Math.abs(printedG - Number(p.label.text.replace('g', '')))).toBeLessThan(0.15);
    expect(standPlungerLabelWidthMm(p)).toBeLessThanOrEqual(p.label.maxWidthMm);
  });

  it('the cup is a cone at the print angle: its capacity is pi r^3 tan(55 deg) / 3', () => {
    const p = stand.plunger;
    const r = p.cupRimRadiusMm - p.cupWallMm / Math.sin((55 * Math.PI) / 180);
    expect(p.cupCapacityMl).toBeCloseTo((Math.PI * r ** 3 * Math.tan((55 * Math.PI) / 180)) / 3 / 1000, 9);
  });
});

describe('build --with-test-stand', () => {
  function capture(): Io & { text: () => string } {
    let buffer = '';
    return { out: (t) => (buffer += t), err: (t) => (buffer += t), text: () => buffer };
  }
  it('writes both stand STL files, lists them in --json parts[], and the sheet explains the test with the cautions', async () => {
    const out = join(scratch, 'bucket');
    const io = capture();
    expect(await runCli(['build', '--design', join(ROOT, 'presets/bucket-tote.json'), '--out', out, '--with-test-stand', '--json'], io)).toBe(0);
    const json = JSON.parse(io.text());
    const names = json.parts.map((p: { name: string }) => p.name);
    expect(names).toEqual(expect.arrayContaining(['stand-base', 'stand-plunger']));
    for (const part of json.parts.filter((p: { name: string }) => p.name.startsWith('stand-'))) {
      expect(existsSync(part.file)).toBe(true);
      expect(part.triangles).toBeGreaterThan(0);
    }
    expect(json.testStand.plunger.label.text).toMatch(/^\d+(\.\d)?g$/);
    const sheet = readFileSync(json.files.find((f: string) => f.endsWith('build-sheet.md')), 'utf8');
    expect(sheet).toContain('Seal test with the stand');
    // where the points go, in the grower's words: the workbench's bench points, or the design file's "calibration" in "seal"
    expect(sheet).toContain('as bench points in the workbench');
    expect(sheet).toMatch(/"calibration\\?" inside \\?"seal/);
    expect(sheet).toContain(json.testStand.plunger.label.text);
    for (const c of CAUTIONS) expect(sheet).toContain(c.title);
  });

  it('without the option no stand part is built and the sheet has no stand page', async () => {
    const { sizing, document } = sizePreset('bucket-tote.json');
    expect(buildSheetMarkdown(sizing, document, {})).not.toContain('Seal test with the stand');
    const io = capture();
    expect(await runCli(['build', '--design', join(ROOT, 'presets/bucket-tote.json'), '--out', join(scratch, 'plain'), '--json'], io)).toBe(0);
    expect(JSON.parse(io.text()).parts.map((p: { name: string }) => p.name)).not.toContain('stand-base');
  });
});
