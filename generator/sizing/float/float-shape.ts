import { OVERHANG_RISE } from '../constants.ts';
import { cylinderVolume, frustumVolume } from './frustum-volume.ts';
import type { FloatSpec } from '../result.ts';

export interface FloatShapeOptions {
  /** outer diameter D_f, mm */
  outerDiameterMm: number;
  /** cylindrical height h_c, mm */
  cylinderHeightMm: number;
  /** shell thickness (side, bottom, cone normal, collar), mm: four line widths by default */
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
  /** the guide collar: least radius (its top must land on the hard stop), mm; default 0 (pocket + rim) */
  collarMinRadiusMm?: number;
  /** the guide collar's height above the cone, mm; default 0 (no collar: the cone ends at the plateau) */
  collarHeightMm?: number;
  /** the cone's rise over run; default OVERHANG_RISE (50 degrees from the bed) */
  coneRise?: number;
}

/**
 * The float's whole shape from its outer diameter and cylinder height.
 *
 * Outer: cylinder of radius R = D_f/2 and height h_c, then a cone at 50 degrees
 * (OVERHANG_MIN_DEG) up to the collar radius r_c = max(pocket radius + rim,
 * collarMinRadius), so h_k = (R - r_c) tan 50deg; then the guide collar, a
 * vertical cylinder r_c high collarHeight, whose top is the plateau with the pad
 * pocket. Cavity: inner cylinder of radius R - t from z = t; its roof cone is the
 * outer cone moved inward by t along the normal, i.e. down by t / cos 50deg, so it
 * starts at z1 = h_c - t (1 - sin 50deg) / cos 50deg. With a collar, the roof cone
 * goes on up inside it to a point, z_apex = z1 + (R - t) tan 50deg, so the sealed
 * cavity has no flat roof at all: a flat roof is a bridge, and a slicer laying more
 * perimeters than the shell has lines round the bridge (the housing's five, say, on
 * one plate) prints them over the hole and fills the cavity with support that can
 * never come out (PrusaSlicer, 5 perimeters, 45-degree threshold: 23 m of support
 * filament in a 9.5 mm roof). The collar is made tall enough for the point to sit
 * at least t under the pocket: h_collar >= z_apex + t + pocket depth - (h_c + h_k).
 * With no collar (the lever's float) the cone stops at the roof, t under the
 * pocket. Returns null if the shape does not close.
 *
 * Example: R 30.5, t 1.8, r_c 6.55, pocket 2 mm, h_c 30 mm: z1 = 29.34, z_apex =
 * 29.34 + 28.7 x 1.1918 = 63.55; h_k = 23.95 x 1.1918 = 28.54; so the collar is at
 * least 63.55 + 1.8 + 2 - 58.54 = 8.81 mm high. Source: plane geometry.
 */
export function floatShape(o: FloatShapeOptions): FloatSpec | null {
  const R = o.outerDiameterMm / 2;
  const t = o.shellMm;
  const k = o.coneRise ?? OVERHANG_RISE;
  const cosA = 1 / Math.sqrt(1 + k * k);
  const sinA = k * cosA;
  const pocketDepth = Math.max(0, o.padThicknessMm - o.padProudMm);
  const pocketRadius = o.padDiameterMm / 2 + o.clearanceMm;
  const collarRadius = Math.max(pocketRadius + o.rimMm, o.collarMinRadiusMm ?? 0);
  const coneHeight = (R - collarRadius) * k;
  const cavityRadius = R - t;
  const cavityBottom = t;
  const coneStart = o.cylinderHeightMm - (t * (1 - sinA)) / cosA;
  const withCollar = (o.collarHeightMm ?? 0) > 0;
  const apexZ = coneStart + cavityRadius * k;
  // with a collar, tall enough that the cavity closes to a point under the pocket (no bridge)
  const collarHeight = withCollar ? Math.max(o.collarHeightMm!, apexZ + t + pocketDepth - (o.cylinderHeightMm + coneHeight)) : 0;
  const height = o.cylinderHeightMm + coneHeight + collarHeight;
  const roofZ = withCollar ? apexZ : height - pocketDepth - t;
  // without one, the inner cone rises to the collar's inner radius or the roof, whichever comes first
  const coneTop = withCollar ? apexZ : Math.min(coneStart + (cavityRadius - (collarRadius - t)) * k, roofZ);
  const roofRadius = withCollar ? 0 : cavityRadius - (coneTop - coneStart) / k;
  if (coneHeight <= 0 || cavityRadius <= 0 || coneStart <= cavityBottom || roofZ <= coneStart || roofRadius < 0 || (!withCollar && roofRadius === 0)) {
    return null;
  }
  return {
    outerDiameterMm: o.outerDiameterMm,
    cylinderHeightMm: o.cylinderHeightMm,
    coneHeightMm: coneHeight,
    collarHeightMm: collarHeight,
    heightMm: height,
    plateauRadiusMm: collarRadius,
    shellMm: t,
    cavityRadiusMm: cavityRadius,
    cavityBottomZMm: cavityBottom,
    cavityConeStartZMm: coneStart,
    cavityConeTopZMm: coneTop,
    cavityRoofZMm: roofZ,
    cavityRoofRadiusMm: roofRadius,
    pocketRadiusMm: pocketRadius,
    pocketDepthMm: pocketDepth,
    padDiameterMm: o.padDiameterMm,
    padThicknessMm: o.padThicknessMm,
    padProudMm: o.padThicknessMm - pocketDepth,
  };
}

/** Outer envelope volume V_f = pi R^2 h_c + frustum(h_k, R, r_c) + pi r_c^2 h_collar, mm3 (pocket counted as filled by the pad). */
export function floatOuterVolumeMm3(f: FloatSpec): number {
  const R = f.outerDiameterMm / 2;
  return (
    cylinderVolume(R, f.cylinderHeightMm) +
    frustumVolume(f.coneHeightMm, R, f.plateauRadiusMm) +
    cylinderVolume(f.plateauRadiusMm, f.collarHeightMm)
  );
}

/** Sealed cavity volume, mm3: inner cylinder, the inner frustum, then the cylinder inside the collar up to the roof. */
export function floatCavityVolumeMm3(f: FloatSpec): number {
  return (
    cylinderVolume(f.cavityRadiusMm, f.cavityConeStartZMm - f.cavityBottomZMm) +
    frustumVolume(f.cavityConeTopZMm - f.cavityConeStartZMm, f.cavityRadiusMm, f.cavityRoofRadiusMm) +
    cylinderVolume(f.cavityRoofRadiusMm, f.cavityRoofZMm - f.cavityConeTopZMm)
  );
}

/** Printed plastic of the float, mm3: envelope minus cavity minus pad pocket. */
export function floatShellVolumeMm3(f: FloatSpec): number {
  return floatOuterVolumeMm3(f) - floatCavityVolumeMm3(f) - cylinderVolume(f.pocketRadiusMm, f.pocketDepthMm);
}
