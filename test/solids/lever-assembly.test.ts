/**
 * The lever valve put together as mounted, at the seal and at rest: no two parts
 * overlap (manifold-3d intersection volumes, a library independent of the code
 * that built and placed them), the float at rest stays off the floor (on the
 * rim: off the floor lowered by the whole adjustment), and the nozzle's sealing
 * face sits the indentation into the pad at the seal. Designs: our own demo
 * scenarios (a 25 mm tray at 2 m on the floor, a 250 mm bucket at 1.5 m on the rim,
 * a 20 mm tray at 1 m in a 90 mm footprint, whose frame has no back anchor wing).
 * Rotation of the arm about the pivot axis: elementary geometry.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { armStopTurnRad, type LeverCandidate } from '../../generator/sizing/lever/index.ts';
import { intersect, loadManifold, meshBounds, meshToManifold, type IndexedMesh, type ManifoldToplevel } from '../../generator/solids/mesh/index.ts';
import { buildFloatMesh } from '../../generator/solids/parts/float-solid.ts';
import { buildLeverArmMesh } from '../../generator/solids/parts/lever-arm-solid.ts';
import { buildLeverFrameMountedMesh } from '../../generator/solids/parts/lever-frame-solid.ts';
import { buildNozzleMesh } from '../../generator/solids/parts/nozzle-solid.ts';
import { fromRows, multiply, transformMesh, translation } from '../../generator/solids/shapes/transform-mesh.ts';
import { designBasis } from '../../generator/sizing/layout/design-basis.ts';
import { demoLever, demoLeverInputs } from './lever-demos.ts';

let wasm: ManifoldToplevel;
beforeAll(async () => {
  wasm = await loadManifold();
});


/** Turn about the pivot axis (y through (0, z_p)), nose down by theta. */
function aboutPivot(c: LeverCandidate, theta: number): number[] {
  const co = Math.cos(theta);
  const si = Math.sin(theta);
  return multiply(translation(0, 0, c.pivotZMm), multiply(fromRows([co, 0, si], [0, 1, 0], [-si, 0, co]), translation(0, 0, -c.pivotZMm)));
}

function overlapMm3(a: IndexedMesh, b: IndexedMesh): number {
  const ma = meshToManifold(wasm, a, 'a');
  const mb = meshToManifold(wasm, b, 'b');
  const m = intersect(wasm, ma, mb);
  try {
    return m.volume();
  } finally {
    m.delete();
    ma.delete();
    mb.delete();
  }
}

for (const [name, headM, levelM, mount, limitM] of [
  ['tray on the floor', 2, 0.025, 'floor', 0.12],
  ['bucket on the rim', 1.5, 0.25, 'rim', 0.12],
  ['narrow tray on the floor, no back wing', 1, 0.02, 'floor', 0.09],
] as const) {
  describe(`lever assembly: ${name}`, () => {
    const c = demoLever(headM, levelM, mount, limitM);
    const armTop = c.floatBottomZMm + c.float.heightMm + c.arm.barDepthMm;
    const basis = designBasis(demoLeverInputs(headM, levelM, limitM));
    const delta = basis.indentationMm; // the pad's squeeze at the tight seal (seal model)
    const restTheta = Math.asin((c.restTravelMm + delta) / c.arm.padArmMm);

    it('no part overlaps another at the seal or at rest; the float stays off the floor at rest', async () => {
      const frame = await buildLeverFrameMountedMesh(c.frame, 'preview');
      // arm: print pose (top face on the bed) back to mounted: (x, y, z) -> (x, -y, armTop - z)
      const armMounted = transformMesh(await buildLeverArmMesh(c.arm, 'preview'), fromRows([1, 0, 0], [0, -1, 0], [0, 0, -1], [0, 0, armTop]));
      const floatMounted = transformMesh(buildFloatMesh(c.float, 'preview'), translation(c.arm.floatArmMm, 0, c.floatBottomZMm));
      const nozzle = transformMesh(await buildNozzleMesh(c.nozzle, 'preview'), translation(c.arm.padArmMm, 0, c.tipZMm));
      for (const [state, theta] of [['seal', 0], ['rest', restTheta]] as const) {
        const turn = aboutPivot(c, theta);
        const arm = transformMesh(armMounted, turn);
        const float = transformMesh(floatMounted, turn);
        expect(overlapMm3(arm, frame), `${state}: arm and frame`).toBeLessThan(1e-3);
        expect(overlapMm3(arm, nozzle), `${state}: arm and nozzle`).toBeLessThan(1e-3);
        expect(overlapMm3(float, frame), `${state}: float and frame`).toBeLessThan(1e-3);
        expect(overlapMm3(float, nozzle), `${state}: float and nozzle`).toBeLessThan(1e-3);
        const floor = mount === 'rim' ? c.rim!.adjustMm : 0;
        expect(meshBounds(float).min[2], `${state}: float above the floor`).toBeGreaterThanOrEqual(floor - 0.05);
      }
      // the rest stop: the eye's heel meets the back wall at the stop turn; a little further, the arm would be in the wall
      const stop = armStopTurnRad(-c.arm.tailXMm, c.arm.eyeDepthMm - c.arm.holeCentreDepthMm, c.frame.postHalfLengthMm);
      expect(overlapMm3(transformMesh(armMounted, aboutPivot(c, stop)), frame), 'arm at the stop').toBeLessThan(1e-3);
      expect(overlapMm3(transformMesh(armMounted, aboutPivot(c, stop + 0.05)), frame), 'arm past the stop').toBeGreaterThan(0.01);
      // the pad's hard stop: turned up past the seal until the pad is indented to the stop (25 % of its thickness;
      // common practice against compression set), the arm's top just meets the stop block; a tenth further it would be in it
      expect(basis.padStopIndentationMm).toBeCloseTo(0.25 * 3, 9);
      const up = (basis.padStopIndentationMm - delta) / c.arm.padArmMm;
      expect(overlapMm3(transformMesh(armMounted, aboutPivot(c, -0.98 * up)), frame), 'arm short of the pad stop').toBeLessThan(1e-3);
      expect(overlapMm3(transformMesh(armMounted, aboutPivot(c, -1.1 * up)), frame), 'arm past the pad stop').toBeGreaterThan(0.01);
      // the tongue sits in the float's socket with a clearance, the bar on the plateau: touching, not overlapping
      expect(overlapMm3(armMounted, floatMounted), 'arm and float').toBeLessThan(1e-3);
      expect(c.arm.tongueLengthMm).toBeLessThan(c.float.pocketDepthMm);
      expect(c.arm.tongueDiameterMm).toBeLessThan(2 * c.float.pocketRadiusMm);
    });

    it('at the seal the arm is level and the pad face meets the lip square, the indentation deep', () => {
      // pad face = arm top + proud (1 mm by default); the lip's face is delta below it
      expect(armTop + 1 - c.tipZMm).toBeCloseTo(delta, 9);
      expect(c.padTiltDeg).toBeGreaterThan(0);
      expect(c.lipGapMm).toBeLessThanOrEqual(delta / 2 + 1e-9);
    });
  });
}
