import { PRINT_CLEARANCE_MM } from '../constants.ts';
import { availableLiftN } from '../float/depth-for-force.ts';
import { floatOuterVolumeMm3, floatShape, floatShellVolumeMm3 } from '../float/float-shape.ts';
import type { FloatSpec } from '../result.ts';
import { FLOAT_SOCKET_DEPTH_MM } from './lever-constants.ts';

export interface LeverFloat {
  float: FloatSpec;
  shellMm3: number;
  massKg: number;
  /** full-submersion lift, N */
  availableN: number;
}

/**
 * The lever's float: the direct valve's float shape (generator/sizing/float: the
 * 50-degree cone and a collar inside which the cavity closes to a point), whose
 * pad pocket becomes a socket for the arm's round tongue (FLOAT_SOCKET_DEPTH_MM
 * deep, the tongue's diameter plus the print clearance) in a collar at least as tall. It carries no pad, so its mass is its shell alone.
 * Returns null when the shape does not close.
 */
export function leverFloat(
  outerDiameterMm: number,
  cylinderHeightMm: number,
  tongueDiameterMm: number,
  shellMm: number,
  materialDensityKgM3: number,
  liquidDensityKgM3: number,
): LeverFloat | null {
  const float = floatShape({
    outerDiameterMm,
    cylinderHeightMm,
    shellMm,
    padDiameterMm: tongueDiameterMm,
    padThicknessMm: FLOAT_SOCKET_DEPTH_MM,
    padProudMm: 0,
    clearanceMm: PRINT_CLEARANCE_MM,
    rimMm: shellMm,
    // a collar round the socket, at least as tall as the socket is deep, so the tongue is held all its length
    // and the cavity's 50-degree roof closes to a point inside it: no flat roof, no bridge (a slicer would fill
    // a bridged cavity with support that can never come out; see float-shape.ts)
    collarHeightMm: FLOAT_SOCKET_DEPTH_MM,
  });
  if (!float) return null;
  const shell = floatShellVolumeMm3(float);
  const massKg = shell * 1e-9 * materialDensityKgM3;
  return { float, shellMm3: shell, massKg, availableN: availableLiftN(floatOuterVolumeMm3(float), massKg, liquidDensityKgM3) };
}
