/**
 * Bench points that contradict each other: two at one head whose stopping
 * masses differ by more than 5 %. At one head the pad stops the flow at one
 * force (F = F_pre + A_eff rho g H has one value per H), so a second, different
 * mass there is a misreading, not a second measurement; left in, the fit
 * would average it away silently.
 *
 * Heads less than 1 % apart count as one head (the fit's own rule,
 * headsDefineSlope); 5 % is the scatter past which the sizing already asks for
 * the points to be repeated (the "calibration-scatter" warning).
 *
 * Returns, for each point that clashes with an earlier one, its index and the
 * earlier point's index (each point reported once, against the first it clashes with).
 * Example: 31 g and 40 g both at 0.8 m -> [{ index: 1, earlier: 0 }]; 31 g and 31.5 g -> [].
 */
import type { CalibrationPoint } from '../sizing/inputs.ts';

export const SAME_HEAD_SHARE = 0.01;
export const MASS_SPREAD_SHARE = 0.05;

export function sameHeadClashes(points: readonly CalibrationPoint[]): { index: number; earlier: number }[] {
  const clashes: { index: number; earlier: number }[] = [];
  points.forEach((p, i) => {
    const earlier = points.findIndex(
      (q, j) =>
        j < i &&
        Math.abs(p.headM - q.headM) <= SAME_HEAD_SHARE * ((p.headM + q.headM) / 2) &&
        Math.abs(p.massKg - q.massKg) > MASS_SPREAD_SHARE * Math.max(p.massKg, q.massKg),
    );
    if (earlier >= 0) clashes.push({ index: i, earlier });
  });
  return clashes;
}
