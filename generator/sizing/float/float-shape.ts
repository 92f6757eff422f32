import { cylinderVolume, frustumVolume } from './frustum-volume.ts';
import type { FloatSpec } from '../result.ts';

export interface FloatShapeOptions {
  /** outer diameter D_f, mm */
  outerDiameterMm: number;
  /** cylindrical height h_c, mm */
  cylinderHeightMm: number;
  /** shell thickness (side, bottom, cone normal), mm: three line widths by default */
  shellMm: number;
  /** seal pad disc diameter and thickness, mm */
  padDiameterMm: number;
  padThicknessMm: number;
  /** how far the pad stands above the plateau, mm (pocket depth = pad - proud) */
  padProudMm: number;
  /** print clearance per side, mm (pocket radius = pad radius + clearance) */
  clearanceMm: number;
  /** plastic ring around the pocket, mm */
  rimMm: number;
}

/**
 * The float's whole shape from its outer diameter and cylinder height.
 *
 * Outer: cylinder of radius R = D_f/2 and height h_c, then a 45-degree cone up to
 * a plateau of radius r_p = pocket radius + rim, so h_k = R - r_p.
 * Cavity: inner cylinder of radius R - t from z = t; its 45-degree roof is the
 * outer cone moved inward by t along the normal, i.e. by t*sqrt(2) in radius, so it
 * starts at z1 = h_c - t (sqrt(2) - 1); the cavity stops under the plateau, which is
 * solid for the pocket depth plus t. That flat roof (radius r_roof) is the one
 * bridge of the print, short by construction. Returns null if the shape does not
 * close (float too small for its plateau and walls).
 */
export function floatShape(o: FloatShapeOptions): FloatSpec | null {
  const R = o.outerDiameterMm / 2;
  const t = o.shellMm;
  const pocketDepth = Math.max(0, o.padThicknessMm - o.padProudMm);
  const pocketRadius = o.padDiameterMm / 2 + o.clearanceMm;
  const plateauRadius = pocketRadius + o.rimMm;
  const coneHeight = R - plateauRadius;
  const height = o.cylinderHeightMm + coneHeight;
  const cavityRadius = R - t;
  const cavityBottom = t;
  const coneStart = o.cylinderHeightMm - t * (Math.SQRT2 - 1);
  const roofZ = height - pocketDepth - t;
  const roofRadius = cavityRadius - (roofZ - coneStart);
  if (coneHeight <= 0 || cavityRadius <= 0 || coneStart <= cavityBottom || roofZ <= coneStart || roofRadius <= 0) {
    return null;
  }
  return {
    outerDiameterMm: o.outerDiameterMm,
    cylinderHeightMm: o.cylinderHeightMm,
    coneHeightMm: coneHeight,
    heightMm: height,
    plateauRadiusMm: plateauRadius,
    shellMm: t,
    cavityRadiusMm: cavityRadius,
    cavityBottomZMm: cavityBottom,
    cavityConeStartZMm: coneStart,
    cavityRoofZMm: roofZ,
    cavityRoofRadiusMm: roofRadius,
    pocketRadiusMm: pocketRadius,
    pocketDepthMm: pocketDepth,
    padDiameterMm: o.padDiameterMm,
    padThicknessMm: o.padThicknessMm,
    padProudMm: o.padThicknessMm - pocketDepth,
  };
}

/** Outer envelope volume V_f = pi R^2 h_c + frustum(h_k, R, r_p), mm3 (pocket counted as filled by the pad). */
export function floatOuterVolumeMm3(f: FloatSpec): number {
  const R = f.outerDiameterMm / 2;
  return cylinderVolume(R, f.cylinderHeightMm) + frustumVolume(f.coneHeightMm, R, f.plateauRadiusMm);
}

/** Sealed cavity volume, mm3: inner cylinder plus the inner frustum under the plateau. */
export function floatCavityVolumeMm3(f: FloatSpec): number {
  return (
    cylinderVolume(f.cavityRadiusMm, f.cavityConeStartZMm - f.cavityBottomZMm) +
    frustumVolume(f.cavityRoofZMm - f.cavityConeStartZMm, f.cavityRadiusMm, f.cavityRoofRadiusMm)
  );
}

/** Printed plastic of the float, mm3: envelope minus cavity minus pad pocket. */
export function floatShellVolumeMm3(f: FloatSpec): number {
  return floatOuterVolumeMm3(f) - floatCavityVolumeMm3(f) - cylinderVolume(f.pocketRadiusMm, f.pocketDepthMm);
}
