import { HOLD_DOWN_FACTOR, STANDARD_GRAVITY, STEEL_DENSITY } from '../constants.ts';

export interface LeverHoldDownOptions {
  /** the float's full-submersion lift (flooded), N, at floatArmMm from the pivot */
  floatLiftN: number;
  floatArmMm: number;
  /** everything else, wet: the arm with its pad at its centroid, and the frame, nozzle and pin (taken at the pivot, x = 0: their real centroid lies forward of it, which only helps), N */
  armWetWeightN: number;
  armCentroidMm: number;
  restWetWeightN: number;
  /** the foot's back edge (the frame tips about it when the float lifts the front), and the anchors' x, mm */
  backEdgeXMm: number;
  anchorXMm: number;
  /** liquid density for the steel ballast's wet weight, kg/m3 */
  densityKgM3: number;
}

/**
 * A flooded floor lever: the float lifts its whole reserve at the arm's tip, in
 * front of the frame's foot, so the valve tends to tip up about the foot's back
 * edge x_b. Moments about that edge (statics):
 *
 *   M = F_lift (a_f - x_b) - W_arm (x_c - x_b) - W_rest (0 - x_b)
 *
 * The anchors at x_a hold it with F_a = HOLD_DOWN_FACTOR M / (x_a - x_b) (the
 * direct valve's 1.5 on the flood uplift), or steel ballast at the anchors of
 * that wet weight, m = F_a / ((1 - rho / rho_steel) g). Also the plain uplift
 * U = F_lift - W_arm - W_rest (positive: the whole valve would float off).
 *
 * @returns { upliftN, tippingMomentNmm (<= 0: it stands on its own), anchorForceN, ballastSteelG }
 *
 * Example: lift 0.3 N at 45 mm, arm 0.02 N at 20 mm, rest 0.08 N, back edge -17 mm,
 * anchors at 0: M = 0.3 x 62 - 0.02 x 37 - 0.08 x 17 = 16.5 N mm; F_a = 1.5 x 16.5 / 17
 * = 1.4559 N; in water (998.2) on steel (7850) 1.4559 / (0.87284 x 9.80665) = 170.1 g.
 * Source: equilibrium of moments (Meriam and Kraige, Statics, from memory); steel 7850 kg/m3 (handbook, from memory).
 */
export function leverHoldDown(o: LeverHoldDownOptions): { upliftN: number; tippingMomentNmm: number; anchorForceN: number; ballastSteelG: number } {
  if (!(o.anchorXMm > o.backEdgeXMm)) throw new RangeError(`leverHoldDown.anchorXMm = ${o.anchorXMm}; allowed: in front of the back edge (${o.backEdgeXMm} mm)`);
  const xb = o.backEdgeXMm;
  const moment = o.floatLiftN * (o.floatArmMm - xb) - o.armWetWeightN * (o.armCentroidMm - xb) - o.restWetWeightN * (0 - xb);
  const anchor = Math.max(0, (HOLD_DOWN_FACTOR * moment) / (o.anchorXMm - xb));
  return {
    upliftN: o.floatLiftN - o.armWetWeightN - o.restWetWeightN,
    tippingMomentNmm: moment,
    anchorForceN: anchor,
    ballastSteelG: (anchor / ((1 - o.densityKgM3 / STEEL_DENSITY) * STANDARD_GRAVITY)) * 1e3,
  };
}
