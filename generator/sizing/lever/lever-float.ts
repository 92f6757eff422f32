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
 * The lever's float: the direct valve's float shape (generator/sizing/float, its
 * cone and walls whatever they are), whose pad pocket becomes a socket for the
 * arm's round tongue (FLOAT_SOCKET_DEPTH_MM deep, the tongue's diameter plus the
 * print clearance). It carries no pad, so its mass is its shell alone.
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
    // 45 degrees, as the lever's layout was built and checked for: at 50 its float meets the frame
    // at rest (the lever's layout has no float-to-frame rule yet). A slicer at a 45-degree threshold
    // may support inside this cavity; issue 13's layout should take the 50-degree cone.
    coneRise: 1,
  });
  if (!float) return null;
  const shell = floatShellVolumeMm3(float);
  const massKg = shell * 1e-9 * materialDensityKgM3;
  return { float, shellMm3: shell, massKg, availableN: availableLiftN(floatOuterVolumeMm3(float), massKg, liquidDensityKgM3) };
}
