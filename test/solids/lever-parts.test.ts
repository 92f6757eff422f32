/**
 * The lever's arm and pivot pin, the rim hanger and the slotted stem: each a
 * closed 2-manifold (checked by manifold-3d, a library independent of the JSCAD
 * code that extruded it, and by counting edge uses: every edge used exactly
 * twice, once each way; 3MF Core Specification, "Manifold Edges"), resting on
 * z = 0, of the genus its holes give it (manifold-3d), with the volume the sizing's
 * analytic formulas give within 1 % (prisms, cylinders, and pointed holes:
 * elementary geometry; faceting at export quality moves the round pieces by
 * well under that), and with no downward face flatter than 50 degrees from the
 * bed but the faces on the bed and the stated bridge (DESIGN second part, print
 * margins; common practice: slicers add support under faces flatter than 45).
 * Designs: our own demo scenarios (a 25 mm tray at 2 m, a 250 mm bucket at 1.5 m,
 * a 20 mm tray at 1 m in a 90 mm footprint, whose frame has no back anchor wing).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { leverArmVolume, leverFrameVolumeMm3 } from '../../generator/sizing/lever/index.ts';
import { pinVolumeMm3 } from '../../generator/sizing/parts/part-volumes.ts';
import { rimMountVolumesMm3 } from '../../generator/sizing/rim/index.ts';
import { countEdgeUses, holePolygonRadiusMm, loadManifold, meshBounds, meshToManifold, meshVolumeMm3, segmentsFor, type IndexedMesh, type ManifoldToplevel } from '../../generator/solids/mesh/index.ts';
import { buildLeverArmMesh } from '../../generator/solids/parts/lever-arm-solid.ts';
import { buildLeverFrameMesh } from '../../generator/solids/parts/lever-frame-solid.ts';
import { buildPinMesh } from '../../generator/solids/parts/pin-solid.ts';
import { buildRimHangerMesh } from '../../generator/solids/parts/rim-hanger-solid.ts';
import { buildSlottedStemMesh } from '../../generator/solids/parts/slotted-stem-solid.ts';
import { demoBucket, demoNarrowTray, demoTray } from './lever-demos.ts';
import { overhangFaces } from './overhang-faces.ts';

let wasm: ManifoldToplevel;
beforeAll(async () => {
  wasm = await loadManifold();
});

const tray = demoTray();
const bucket = demoBucket();
const narrowTray = demoNarrowTray();

function checkClosed(mesh: IndexedMesh, name: string, genus: number): void {
  expect(countEdgeUses(mesh), name).toMatchObject({ boundaryEdges: 0, overusedEdges: 0, inconsistentlyOriented: 0, degenerateTriangles: 0, closed: true });
  const m = meshToManifold(wasm, mesh, name);
  try {
    expect(m.status(), name).toBe('NoError');
    expect(m.volume(), name).toBeGreaterThan(0);
    expect(m.genus(), name).toBe(genus);
  } finally {
    m.delete();
  }
  expect(meshBounds(mesh).min[2], name).toBe(0);
}

/** No face flatter than 50 degrees off the bed, unless it lies inside an allowed bridge (a disc in the print's xy plane). */
function checkOverhangs(mesh: IndexedMesh, name: string, bridge?: { x: number; y: number; r: number }): void {
  for (const face of overhangFaces(mesh, 50)) {
    const inBridge = bridge !== undefined && face.corners.every(([x, y]) => Math.hypot(x - bridge.x, y - bridge.y) <= bridge.r + 1e-3);
    expect(inBridge, `${name}: face flatter than 50 degrees at z ${face.zMinMm.toFixed(2)}`).toBe(true);
  }
}

describe('lever arm', () => {
  for (const quality of ['preview', 'export'] as const) {
    it(`${quality}: closed, one through hole (the pin's), on the bed; prints with the pocket floor as its one bridge`, async () => {
      const mesh = await buildLeverArmMesh(tray.arm, quality);
      checkClosed(mesh, 'arm', 1);
      checkOverhangs(mesh, 'arm', { x: tray.arm.padArmMm, y: 0, r: holePolygonRadiusMm(tray.arm.pocketDiameterMm / 2, segmentsFor(tray.arm.pocketDiameterMm / 2, quality)) });
      const b = meshBounds(mesh);
      expect(b.max[2]).toBeCloseTo(Math.max(tray.arm.eyeDepthMm, tray.arm.barDepthMm + tray.arm.tongueLengthMm), 4);
      expect(b.max[0] - b.min[0]).toBeCloseTo(tray.arm.tipXMm - tray.arm.tailXMm, 4);
    });
  }

  it('volume within 1 % of the analytic arm (export quality)', async () => {
    const mesh = await buildLeverArmMesh(tray.arm, 'export');
    expect(Math.abs(meshVolumeMm3(mesh) / leverArmVolume(tray.arm).volumeMm3 - 1)).toBeLessThan(0.01);
  });
});

describe('pivot pin (the retainer pin builder, spanning the frame)', () => {
  it('closed, on the bed, spanning the frame, volume within 2.5 % of the true-circle pin (a 16-gon at export)', async () => {
    const mesh = await buildPinMesh(tray.pin, 'export');
    checkClosed(mesh, 'pivot pin', 0);
    expect(tray.pin.lengthMm).toBeGreaterThan(tray.frame.widthMm);
    expect(tray.pin.diameterMm + 2 * 0.25).toBeCloseTo(tray.arm.holeDiameterMm, 12); // one print clearance each side (common practice, 0.25 mm)
    expect(Math.abs(meshVolumeMm3(mesh) / pinVolumeMm3(tray.pin) - 1)).toBeLessThan(0.025);
  });
});

describe('rim hanger and slotted stem', () => {
  const rim = bucket.rim!;
  for (const quality of ['preview', 'export'] as const) {
    it(`${quality}: hanger closed with three pilot holes, stem closed with a slot and two holes; no overhang past 50 degrees`, async () => {
      const hanger = await buildRimHangerMesh(rim, quality);
      checkClosed(hanger, 'hanger', 3);
      checkOverhangs(hanger, 'hanger');
      const stem = await buildSlottedStemMesh(rim, quality);
      checkClosed(stem, 'stem', 3);
      checkOverhangs(stem, 'stem');
      expect(meshBounds(stem).max[0]).toBeCloseTo(rim.stem.lengthMm, 4);
      expect(meshBounds(hanger).max[2]).toBeCloseTo(rim.hanger.widthMm, 4);
    });
  }

  it('volumes within 1 % of the analytic ones (export quality)', async () => {
    const v = rimMountVolumesMm3(rim);
    expect(Math.abs(meshVolumeMm3(await buildRimHangerMesh(rim, 'export')) / v.hangerMm3 - 1)).toBeLessThan(0.01);
    expect(Math.abs(meshVolumeMm3(await buildSlottedStemMesh(rim, 'export')) / v.stemMm3 - 1)).toBeLessThan(0.01);
  });

  it('the slot gives the stated adjustment: 2 x 10 mm of travel beyond the screw pitch', () => {
    expect(rim.stem.slotLengthMm - rim.screwPitchMm).toBe(2 * rim.adjustMm);
  });
});

describe('lever frame', () => {
  for (const [name, c, genus] of [
    // floor: pin hole through both cheeks (2), the seat bore (1); the anchors are slots open to the wings' edges
    ['floor', tray, 3],
    // rim: pin hole through both cheeks (2), two pilot holes, the seat bore
    ['rim', bucket, 5],
    // floor without the back anchor wing (a 90 mm footprint): the same holes, two slots open to the side wings' edges
    ['floor, no back wing', narrowTray, 3],
  ] as const) {
    for (const quality of ['preview', 'export'] as const) {
      it(`${name}, ${quality}: closed, deck on the bed, no face flatter than 50 degrees`, async () => {
        const mesh = await buildLeverFrameMesh(c.frame, quality);
        checkClosed(mesh, `${name} frame`, genus);
        checkOverhangs(mesh, `${name} frame`);
        expect(meshBounds(mesh).max[2]).toBeCloseTo(c.frame.heightMm, 3);
      });
    }
    it(`${name}: volume within 1 % of the analytic frame (export quality)`, async () => {
      const mesh = await buildLeverFrameMesh(c.frame, 'export');
      expect(Math.abs(meshVolumeMm3(mesh) / leverFrameVolumeMm3(c.frame) - 1)).toBeLessThan(0.01);
    });
  }
});

describe('the back anchor wing (left off only where the valve would not fit with it)', () => {
  it('the 120 mm tray keeps it and its third slot; the 90 mm tray has neither, and its frame is one wing shorter and lighter', () => {
    expect(tray.frame.backWing).toBe(true);
    expect(narrowTray.frame.backWing).toBe(false);
    expect(narrowTray.footprintMm).toBeLessThanOrEqual(90);
    // the foot's back edge: the back wall's outer face, or a wing (anchor slot and two walls) behind it
    expect(narrowTray.frame.footBackXMm).toBeCloseTo(-narrowTray.frame.postHalfLengthMm - narrowTray.frame.wallMm, 9);
    expect(tray.frame.footBackXMm).toBeCloseTo(-tray.frame.postHalfLengthMm - tray.frame.wallMm - tray.frame.wingMm, 9);
    const withWing = leverFrameVolumeMm3({ ...narrowTray.frame, backWing: true });
    expect(withWing).toBeGreaterThan(leverFrameVolumeMm3(narrowTray.frame));
  });
});
