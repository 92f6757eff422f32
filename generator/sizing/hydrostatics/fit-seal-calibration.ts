import { STANDARD_GRAVITY } from '../constants.ts';
import { diameterForArea } from './circle-area.ts';
import type { CalibrationPoint } from '../inputs.ts';

export interface SealFit {
  /** fitted preload F_pre, N */
  preloadN: number;
  /** fitted effective area A_eff, m2 */
  sealAreaM2: number;
  /** diameter of a circle with area A_eff, m */
  equivalentSealDiameterM: number;
  /** points used */
  points: number;
  /** root-mean-square residual of the fit, N (0 for one or two points) */
  rmsResidualN: number;
}

/**
 * Fits the pad's bench calibration: the smallest mass m_i that stopped the flow
 * at head H_i gives a closing force F_i = m_i g. The model F = F_pre + A_eff rho g H
 * is a straight line in x = rho g H (pressure, Pa), so ordinary least squares gives
 *
 *   A_eff = sum((x - xbar)(F - Fbar)) / sum((x - xbar)^2),  F_pre = Fbar - A_eff xbar.
 *
 * With one point (or all points at one head) the preload is held at
 * `defaultPreloadN` and A_eff = (F - F_pre) / x averaged over the points.
 *
 * Example (common practice bench figures): 42.5 g stopped the flow at 4 ft
 * (1.2192 m) and 90 g at 10 ft (3.048 m) of water: F_pre = 0.107 N (10.9 gf),
 * equivalent seal diameter 5.75 mm.
 * Source: least squares line, any numerical methods text.
 *
 * @param points bench points (head in m, mass in kg), at least one
 * @param densityKgM3 liquid density used on the bench, kg/m3
 * @param defaultPreloadN preload to hold when a line cannot be fitted, N
 * @throws RangeError if there are no points or the fit gives a non-positive area
 */
/**
 * Whether bench points' heads are spread enough to define a slope: their spread (the root-mean-square
 * distance from the mean head) at least 1 % of the mean head. Heads closer than that count as one head,
 * and the fit then holds the preload at the pad's seating force (fitSealCalibration).
 * Example: 0.0553 and 0.0557 m (0.4 % apart from their mean) count as one head; 0.5 and 1.0 m do not.
 */
export function headsDefineSlope(points: readonly Pick<CalibrationPoint, 'headM'>[]): boolean {
  const n = points.length;
  if (n < 2) return false;
  const mean = points.reduce((a, p) => a + p.headM, 0) / n;
  const spread = points.reduce((a, p) => a + (p.headM - mean) ** 2, 0);
  return spread > (0.01 * mean) ** 2 * n;
}

export function fitSealCalibration(
  points: readonly CalibrationPoint[],
  densityKgM3: number,
  defaultPreloadN: number,
  gravityMS2 = STANDARD_GRAVITY,
): SealFit {
  if (points.length === 0) throw new RangeError('seal.calibration: at least one bench point is needed');
  const xs = points.map((p) => densityKgM3 * gravityMS2 * p.headM);
  const fs = points.map((p) => p.massKg * gravityMS2);
  const n = points.length;
  const xbar = xs.reduce((a, b) => a + b, 0) / n;
  const fbar = fs.reduce((a, b) => a + b, 0) / n;
  const sxx = xs.reduce((a, x) => a + (x - xbar) ** 2, 0);
  let area: number;
  let preload: number;
  // A spread of heads under 1 % of the mean cannot define a slope.
  if (headsDefineSlope(points)) {
    const sxf = xs.reduce((a, x, i) => a + (x - xbar) * (fs[i] - fbar), 0);
    area = sxf / sxx;
    preload = fbar - area * xbar;
  } else {
    preload = defaultPreloadN;
    area = xs.reduce((a, x, i) => a + (fs[i] - preload) / x, 0) / n;
  }
  if (!(area > 0)) {
    throw new RangeError(
      'seal.calibration: the bench points do not rise with head (the fitted seal area is not positive); check the heads and masses',
    );
  }
  const residuals = xs.map((x, i) => fs[i] - (preload + area * x));
  const rms = Math.sqrt(residuals.reduce((a, r) => a + r * r, 0) / n);
  return {
    preloadN: preload,
    sealAreaM2: area,
    equivalentSealDiameterM: diameterForArea(area),
    points: n,
    rmsResidualN: rms,
  };
}
