import { describe, expect, it } from 'vitest';
import { cylinderVolume, frustumVolume } from '../../generator/sizing/float/frustum-volume.ts';
import { floatCavityVolumeMm3, floatOuterVolumeMm3, floatShape, floatShellVolumeMm3 } from '../../generator/sizing/float/float-shape.ts';
import { depthForVolumeMm, submergedVolumeMm3 } from '../../generator/sizing/float/submerged-volume.ts';
import { availableLiftN, depthForForceMm } from '../../generator/sizing/float/depth-for-force.ts';
import type { FloatSpec } from '../../generator/sizing/result.ts';

const shape = floatShape({
  outerDiameterMm: 54,
  cylinderHeightMm: 35,
  shellMm: 1.35,
  padDiameterMm: 9,
  padThicknessMm: 3,
  padProudMm: 1,
  clearanceMm: 0.25,
  rimMm: 1.35,
  collarMinRadiusMm: 6.15,
  collarHeightMm: 6.5,
}) as FloatSpec;
/** Self-supporting surfaces at 50 degrees from the bed (5 degrees past slicers' common 45-degree support threshold, common practice). */
const K = Math.tan((50 * Math.PI) / 180);

/** Independent check: volume of a solid of revolution by disc integration (Simpson), V = integral of pi r(z)^2 dz. */
function revolve(radius: (z: number) => number, z0: number, z1: number, n = 2000): number {
  const h = (z1 - z0) / n;
  let s = radius(z0) ** 2 + radius(z1) ** 2;
  for (let i = 1; i < n; i++) s += (i % 2 ? 4 : 2) * radius(z0 + i * h) ** 2;
  return (Math.PI * s * h) / 3;
}

describe('float geometry (elementary geometry: cylinder, frustum; disc integration as the independent check)', () => {
  it('frustum volume (pi h / 3)(R^2 + R r + r^2); r = R gives the cylinder, r = 0 the cone', () => {
    expect(frustumVolume(21, 27, 6)).toBeCloseTo((Math.PI * 21 / 3) * (27 * 27 + 27 * 6 + 36), 9);
    expect(frustumVolume(10, 3, 3)).toBeCloseTo(cylinderVolume(3, 10), 9);
    expect(frustumVolume(9, 2, 0)).toBeCloseTo((Math.PI * 4 * 9) / 3, 12);
  });
  it('the float shape has a 50-degree cone up to the collar, then the collar', () => {
    // collar radius: pocket (4.5 + 0.25) + rim 1.35 = 6.1, raised to the asked least 6.15
    expect(shape.plateauRadiusMm).toBeCloseTo(6.15, 12);
    expect(shape.coneHeightMm).toBeCloseTo((27 - 6.15) * K, 12);
    // the cavity's cone is the outer cone moved in by the shell thickness along its normal:
    // the lines K r + z = c_outer and K r + z = c_inner lie |c_outer - c_inner| / sqrt(1 + K^2) apart
    const cOuter = K * 27 + shape.cylinderHeightMm;
    const cInner = K * shape.cavityRadiusMm + shape.cavityConeStartZMm;
    expect((cOuter - cInner) / Math.hypot(1, K)).toBeCloseTo(shape.shellMm, 12);
    // it closes to a point on the axis (r = 0 on the inner line: z = c_inner), no flat roof: no bridge inside
    expect(shape.cavityRoofRadiusMm).toBe(0);
    expect(shape.cavityConeTopZMm).toBeCloseTo(cInner, 12);
    expect(shape.cavityRoofZMm).toBeCloseTo(cInner, 12);
    // the collar is raised from the asked 6.5 mm so the point sits a shell under the 2 mm pocket
    const collar = cInner + 1.35 + 2 - (35 + shape.coneHeightMm);
    expect(collar).toBeGreaterThan(6.5);
    expect(shape.collarHeightMm).toBeCloseTo(collar, 12);
    expect(shape.heightMm).toBeCloseTo(35 + shape.coneHeightMm + collar, 12);
    expect(shape.heightMm - shape.pocketDepthMm - shape.cavityRoofZMm).toBeCloseTo(1.35, 12);
  });
  it('a collar taller than the point needs keeps its height (the point then sits lower than a shell under the pocket)', () => {
    const tall = floatShape({
      outerDiameterMm: 54, cylinderHeightMm: 35, shellMm: 1.35, padDiameterMm: 9, padThicknessMm: 3, padProudMm: 1,
      clearanceMm: 0.25, rimMm: 1.35, collarMinRadiusMm: 6.15, collarHeightMm: 20,
    }) as FloatSpec;
    expect(tall.collarHeightMm).toBe(20);
    expect(tall.cavityRoofZMm).toBeCloseTo(shape.cavityRoofZMm, 12);
  });
  it('outer and cavity volumes agree with disc integration of the profile', () => {
    const R = 27;
    const zk = shape.cylinderHeightMm + shape.coneHeightMm;
    const outer = revolve(
      (z) => (z <= shape.cylinderHeightMm ? R : z <= zk ? R - (z - shape.cylinderHeightMm) / K : shape.plateauRadiusMm),
      0,
      shape.heightMm,
    );
    expect(floatOuterVolumeMm3(shape)).toBeCloseTo(outer, 0);
    const cav = revolve(
      (z) =>
        z <= shape.cavityConeStartZMm
          ? shape.cavityRadiusMm
          : Math.max(0, shape.cavityRadiusMm - (z - shape.cavityConeStartZMm) / K),
      shape.cavityBottomZMm,
      shape.cavityRoofZMm,
    );
    expect(floatCavityVolumeMm3(shape)).toBeCloseTo(cav, 0);
    expect(floatShellVolumeMm3(shape)).toBeGreaterThan(0);
  });
  it('submerged volume is pi R^2 z in the cylinder and continuous into the cone', () => {
    expect(submergedVolumeMm3(shape, 10)).toBeCloseTo(Math.PI * 27 * 27 * 10, 6);
    const a = submergedVolumeMm3(shape, shape.cylinderHeightMm);
    const b = submergedVolumeMm3(shape, shape.cylinderHeightMm + 1e-9);
    expect(b - a).toBeLessThan(1e-3);
    expect(submergedVolumeMm3(shape, 1e6)).toBeCloseTo(floatOuterVolumeMm3(shape), 6);
  });
  it('depth for a volume inverts the submerged volume, in the cylinder and in the cone', () => {
    for (const z of [3, 20, 35, 40, 50, 62]) {
      expect(depthForVolumeMm(shape, submergedVolumeMm3(shape, z))).toBeCloseTo(z, 6);
    }
    expect(depthForVolumeMm(shape, floatOuterVolumeMm3(shape) * 1.01)).toBe(Infinity);
  });
  it("Archimedes: the float sinks until rho g V_sub = F + m g (Archimedes' principle)", () => {
    const z = depthForForceMm(shape, 0.5, 0.018, 998.2);
    const vSub = submergedVolumeMm3(shape, z) * 1e-9;
    expect(998.2 * 9.80665 * vSub).toBeCloseTo(0.5 + 0.018 * 9.80665, 9);
  });
  it('a 120 mL float weighing 20 g lifts at most 100 g (common practice)', () => {
    const lift = availableLiftN(120_000, 0.02, 1000);
    expect(lift / 9.80665 * 1000).toBeCloseTo(100, 6);
  });
});
