import { STANDARD_GRAVITY } from '../constants.ts';
import { cylinderVolume, frustumVolume } from './frustum-volume.ts';
import type { FloatSpec } from '../result.ts';

/** Height of a frustum's centroid above its base of radius a (top radius b, height h): h (a^2 + 2ab + 3b^2) / (4 (a^2 + ab + b^2)). Elementary geometry. */
function frustumCentroid(h: number, a: number, b: number): number {
  return (h * (a * a + 2 * a * b + 3 * b * b)) / (4 * (a * a + a * b + b * b));
}

/** Centroid height of the float's printed shell above its bottom, mm (envelope less cavity less pocket, each a cylinder or frustum). */
export function floatShellCentroidZMm(f: FloatSpec): number {
  const R = f.outerDiameterMm / 2;
  const zk = f.cylinderHeightMm + f.coneHeightMm;
  const pieces: [number, number][] = [
    [cylinderVolume(R, f.cylinderHeightMm), f.cylinderHeightMm / 2],
    [frustumVolume(f.coneHeightMm, R, f.plateauRadiusMm), f.cylinderHeightMm + frustumCentroid(f.coneHeightMm, R, f.plateauRadiusMm)],
    [cylinderVolume(f.plateauRadiusMm, f.collarHeightMm), zk + f.collarHeightMm / 2],
    [-cylinderVolume(f.cavityRadiusMm, f.cavityConeStartZMm - f.cavityBottomZMm), (f.cavityConeStartZMm + f.cavityBottomZMm) / 2],
    [
      -frustumVolume(f.cavityConeTopZMm - f.cavityConeStartZMm, f.cavityRadiusMm, f.cavityRoofRadiusMm),
      f.cavityConeStartZMm + frustumCentroid(f.cavityConeTopZMm - f.cavityConeStartZMm, f.cavityRadiusMm, f.cavityRoofRadiusMm),
    ],
    [-cylinderVolume(f.cavityRoofRadiusMm, f.cavityRoofZMm - f.cavityConeTopZMm), (f.cavityRoofZMm + f.cavityConeTopZMm) / 2],
    [-cylinderVolume(f.pocketRadiusMm, f.pocketDepthMm), f.heightMm - f.pocketDepthMm / 2],
  ];
  let v = 0;
  let m = 0;
  for (const [vol, z] of pieces) {
    v += vol;
    m += vol * z;
  }
  return m / v;
}

export interface TippingInput {
  float: FloatSpec;
  /** printed shell mass and pad mass, kg */
  shellMassKg: number;
  padMassKg: number;
  /** submerged depth at the closing force (on the straight side), mm */
  depthMm: number;
  /** pad face centre above the float's bottom, mm: the pivot */
  pivotZMm: number;
  /** liquid density, kg/m3 */
  densityKgM3: number;
}

/**
 * Restoring moment per radian of a float pressed up on the lip, turning about the pad, N m/rad:
 *
 *   K = W (h_p - z_G) - B (h_p - z_B) + rho g I,   I = pi R^4 / 4
 *
 * W the float's weight at its centre of gravity z_G, B = rho g V_sub the buoyancy at the
 * centre of the displaced volume z_B = depth / 2, and rho g I the shift of that centre as
 * the water plane tilts (the metacentric term, BM = I / V). B - W is the push on the lip,
 * so the more it pushes, the less stable it is: K < 0 means it tips until a wall holds it.
 * Example: R 27 mm, 20 g at z_G 25 mm, depth 30 mm, pivot 60 mm, water: B = 0.673 N,
 * K = 0.196 x 0.035 - 0.674 x 0.045 + 998.2 x 9.80665 x 4.17e-7 = -0.0193 N m/rad (tips).
 * Source: hydrostatic stability of floating bodies (metacentric height), e.g. any naval
 * architecture text (Rawson and Tupper, Basic Ship Theory), from memory; moments about the pivot.
 */
export function tippingStiffnessNmPerRad(o: TippingInput): number {
  const g = STANDARD_GRAVITY;
  const R = (o.float.outerDiameterMm / 2) * 1e-3;
  const shellZ = floatShellCentroidZMm(o.float);
  const padZ = o.float.heightMm - o.float.pocketDepthMm + o.float.padThicknessMm / 2;
  const mass = o.shellMassKg + o.padMassKg;
  const zG = ((o.shellMassKg * shellZ + o.padMassKg * padZ) / mass) * 1e-3;
  const W = mass * g;
  const B = o.densityKgM3 * g * Math.PI * R * R * o.depthMm * 1e-3;
  const zB = (o.depthMm / 2) * 1e-3;
  const hp = o.pivotZMm * 1e-3;
  const I = (Math.PI * R ** 4) / 4;
  return W * (hp - zG) - B * (hp - zB) + o.densityKgM3 * g * I;
}
