import { cylinderVolume, frustumVolume } from './frustum-volume.ts';
import type { FloatSpec } from '../result.ts';

/**
 * Volume of the float's outer envelope below a water line at depth z above its bottom, mm3.
 *
 *   z <= h_c:        V = pi R^2 z
 *   h_c < z <= h_c + h_k:  V = pi R^2 h_c + frustum(u, R, R - u / tan 50deg), u = z - h_c   (cone of rise tan 50deg = h_k / (R - r_c))
 *   above:           V = pi R^2 h_c + frustum(h_k, R, r_c) + pi r_c^2 (z - h_c - h_k)   (collar), at most V_f
 *
 * Example: R = 27, h_c = 35, z = 10 gives 22 902 mm3. Source: elementary geometry.
 */
export function submergedVolumeMm3(f: FloatSpec, depthMm: number): number {
  const R = f.outerDiameterMm / 2;
  const z = Math.min(Math.max(depthMm, 0), f.heightMm);
  if (z <= f.cylinderHeightMm) return cylinderVolume(R, z);
  const u = Math.min(z - f.cylinderHeightMm, f.coneHeightMm);
  const rise = f.coneHeightMm / (R - f.plateauRadiusMm); // the shape's own cone (OVERHANG_RISE unless asked otherwise)
  const cone = cylinderVolume(R, f.cylinderHeightMm) + frustumVolume(u, R, R - u / rise);
  return cone + cylinderVolume(f.plateauRadiusMm, Math.max(0, z - f.cylinderHeightMm - f.coneHeightMm));
}

/**
 * Depth at which the float displaces a given volume, mm (inverse of submergedVolumeMm3):
 * closed form in the cylinder, bisection in the cone. Returns Infinity when the
 * volume exceeds the whole envelope (the float cannot give that push).
 */
export function depthForVolumeMm(f: FloatSpec, volumeMm3: number): number {
  if (volumeMm3 <= 0) return 0;
  const R = f.outerDiameterMm / 2;
  const cylinder = cylinderVolume(R, f.cylinderHeightMm);
  if (volumeMm3 <= cylinder) return volumeMm3 / (Math.PI * R * R);
  if (volumeMm3 > submergedVolumeMm3(f, f.heightMm)) return Infinity;
  let lo = f.cylinderHeightMm;
  let hi = f.heightMm;
  for (let i = 0; i < 60; i++) {
    const mid = (lo + hi) / 2;
    if (submergedVolumeMm3(f, mid) < volumeMm3) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}
