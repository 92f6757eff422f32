import { PART_SIZE_CAP_MM, PRINT_CLEARANCE_MM } from '../constants.ts';
import { HEIGHT_STEP_MM } from '../layout/search-size.ts';
import { shortestWorkingHeightMm } from '../layout/shortest-working-height.ts';
import { armLoad, layoutLever, leverFloatChecks, type ArmLoad } from './layout-lever.ts';
import { leverArmSpec } from './lever-arm-spec.ts';
import {
  FLOAT_ARM_STEP_MM,
  FLOAT_TO_FRAME_GAP_MM,
  LEVER_DIAMETER_STEP_MM,
  MAX_LEVER_RATIO,
  MIN_LEVER_RATIO,
  PAD_ARM_EXTRA_MM,
} from './lever-constants.ts';
import { leverFloat } from './lever-float.ts';
import { leverPad } from './lever-pad.ts';
import type { LeverBasis, LeverCandidate, LeverConstraint } from './lever-types.ts';

const SMALLEST_FLOAT_MM = 16;

export interface LeverSearchOptions {
  mount: 'floor' | 'rim';
  rim?: { rimHeightMm: number; wallThicknessMm: number };
}

export interface LeverSearchOutcome {
  best: LeverCandidate | null;
  /** every constraint that rejected a laid-out candidate, with how many */
  rejections: Map<LeverConstraint, number>;
  /** candidates laid out (for the benchmark) */
  evaluated: number;
}

/**
 * Shortest pad arm, mm: the pad arc rule (a_pad >= 2 d_s, padArcContact), and the
 * pad table (wider than the cheek gap) a print clearance in front of the frame's
 * cheeks (which end postHalfLengthMm from the pivot); to the half millimetre.
 */
export function shortestPadArmMm(lb: LeverBasis, postHalfLengthMm: number, tableHalfSideMm: number): number {
  const sealMm = lb.basis.inputs.sealDiameterM * 1e3;
  return Math.ceil(Math.max(2 * sealMm, postHalfLengthMm + PRINT_CLEARANCE_MM + tableHalfSideMm) * 2 - 1e-9) / 2;
}

/** Shortest cylinder (on the height grid) meeting the reserve and the seal-in-cylinder rule on this arm, or null. Both ease with height, as in the direct search. */
function shortestCylinderMm(lb: LeverBasis, load: ArmLoad, diameterMm: number): number | null {
  const inp = lb.basis.inputs;
  const ok = (h: number) => {
    const f = leverFloat(diameterMm, h, load.arm.tongueDiameterMm, lb.basis.floatShellMm, inp.materialDensityKgM3, inp.liquidDensityKgM3);
    if (!f) return false;
    const c = leverFloatChecks(lb, load, f);
    return c.reserve >= inp.reserve && c.sealDepthMm <= h;
  };
  return shortestWorkingHeightMm(ok, HEIGHT_STEP_MM, 0.5, PART_SIZE_CAP_MM);
}

/** Round a mass to 0.01 g so that ties go to the smaller footprint. */
const massKey = (kg: number) => Math.round(kg * 1e5);

/**
 * The lightest lever valve for a head and level within the footprint limit
 * (limits.maxOuterDiameter as the widest extent seen from above): the same
 * least-plastic rule as the direct search, over three choices instead of one:
 * - the pad arm: the shortest (shortestPadArmMm), and a little longer
 *   (PAD_ARM_EXTRA_MM), which turns the float less at rest (shallow trays);
 * - the float diameter, on a LEVER_DIAMETER_STEP_MM grid up to the limit;
 * - the float arm, on a FLOAT_ARM_STEP_MM grid from the float's clearance off
 *   the frame (and MIN_LEVER_RATIO) to MAX_LEVER_RATIO times the pad arm, stopped
 *   once the footprint passes the limit;
 * each with its shortest working cylinder. Least printed mass (plastic and pad)
 * wins, then the smaller footprint.
 */
export function searchLever(lb: LeverBasis, o: LeverSearchOptions): LeverSearchOutcome {
  const inp = lb.basis.inputs;
  const wallMm = inp.wallM * 1e3;
  const pad = leverPad(lb.basis);
  const limitMm = inp.maxOuterDiameterM * 1e3;
  const rejections = new Map<LeverConstraint, number>();
  let best: LeverCandidate | null = null;
  let evaluated = 0;
  const armFor = (padArm: number, floatArm: number) =>
    leverArmSpec({
      padArmMm: padArm,
      floatArmMm: floatArm,
      wallMm,
      lineWidthMm: inp.lineWidthM * 1e3,
      padDiameterMm: pad.diameterMm,
      padThicknessMm: pad.thicknessMm,
      padProudMm: pad.proudMm,
      restTurnRad: Math.asin(Math.min(1, (lb.basis.preferredTravelMm + lb.indentationMm) / padArm)),
    });
  const probe = armFor(100, 200);
  // the frame's post reaches a clearance and a wall past the eye (leverFrameSpec)
  const post = probe.eyeHalfLengthMm + PRINT_CLEARANCE_MM + wallMm;
  const shortest = shortestPadArmMm(lb, post, probe.tableHalfSideMm);
  for (const extra of PAD_ARM_EXTRA_MM) {
    const padArm = shortest + extra;
    for (let d = SMALLEST_FLOAT_MM; d <= Math.min(limitMm, PART_SIZE_CAP_MM) + 1e-9; d += LEVER_DIAMETER_STEP_MM) {
      const first = Math.max(MIN_LEVER_RATIO * padArm, post + d / 2 + FLOAT_TO_FRAME_GAP_MM);
      for (let k = Math.ceil(first / FLOAT_ARM_STEP_MM - 1e-9); k * FLOAT_ARM_STEP_MM <= MAX_LEVER_RATIO * padArm + 1e-9; k++) {
        const floatArm = k * FLOAT_ARM_STEP_MM;
        // the float's far rim alone is past the limit from here on
        if (floatArm + d / 2 + post > limitMm + 1e-9) break;
        const load = armLoad(lb, armFor(padArm, floatArm));
        const h = shortestCylinderMm(lb, load, d);
        if (h === null) continue;
        const f = leverFloat(d, h, load.arm.tongueDiameterMm, lb.basis.floatShellMm, inp.materialDensityKgM3, inp.liquidDensityKgM3);
        if (!f) continue;
        const c = layoutLever(lb, { mount: o.mount, rim: o.rim, load, float: f });
        evaluated++;
        for (const v of c.violations) rejections.set(v, (rejections.get(v) ?? 0) + 1);
        if (c.violations.length === 0) {
          const lighter = !best || massKey(c.totalMassKg) < massKey(best.totalMassKg);
          const tie = best && massKey(c.totalMassKg) === massKey(best.totalMassKg) && c.footprintMm < best.footprintMm;
          if (lighter || tie) best = c;
        }
        if (c.violations.includes('outer-diameter-limit')) break;
      }
    }
  }
  return { best, rejections, evaluated };
}
