import { PART_SIZE_CAP_MM } from '../constants.ts';
import type { DesignBasis } from './design-basis.ts';
import { floatViolations, layoutCandidate, sizeFloat, type Candidate, type ConstraintCode } from './evaluate-candidate.ts';

/** Float diameters are tried on this grid, mm (a printer cannot hold finer anyway). */
export const DIAMETER_STEP_MM = 0.5;
/** Cylinder heights are rounded up to this, mm. */
export const HEIGHT_STEP_MM = 0.1;
const SMALLEST_FLOAT_MM = 16;

export interface SearchOutcome {
  best: Candidate | null;
  /** constraints that stopped a lighter design (empty when none is found) */
  boundBy: string[];
  /** every constraint that rejected a laid-out diameter, with how many it rejected */
  rejections: Map<ConstraintCode, number>;
  /** lowest target any diameter within the limits could hold (ignoring the target), mm */
  lowestReachableMm: number;
  /** smallest foot diameter among designs that work if the diameter limit is ignored, mm */
  smallestWorkingFootMm: number;
  /**
   * Ignoring both the target and the diameter limit, the design that needs the
   * smallest change to the two together (relative rise of the level plus relative
   * growth of the foot): its lowest reachable level and its foot, mm.
   */
  nearestLevelAndFoot: { levelMm: number; footMm: number };
}

/**
 * Shortest cylinder for a float diameter that meets the reserve and keeps the
 * seal depth inside the cylinder. Both ease monotonically as the cylinder grows
 * (lift gains pi R^2 per mm against 2 pi R t rho_m / rho of shell), so bisection
 * finds the smallest; every other cost grows with height, so smallest is best.
 */
function shortestCylinderMm(b: DesignBasis, diameterMm: number): number | null {
  const ok = (h: number) => floatViolations(b, sizeFloat(b, diameterMm, h)).length === 0;
  let hi = PART_SIZE_CAP_MM;
  if (!ok(hi)) return null;
  let lo = 0.5;
  if (ok(lo)) return lo;
  while (hi - lo > HEIGHT_STEP_MM / 4) {
    const mid = (lo + hi) / 2;
    if (ok(mid)) hi = mid;
    else lo = mid;
  }
  // to the height grid, clear of floating-point fuzz (hi itself works, so this ends within a step or two)
  let k = Math.ceil(lo / HEIGHT_STEP_MM - 1e-6);
  while (!ok(Number((k * HEIGHT_STEP_MM).toFixed(6)))) k++;
  return Number((k * HEIGHT_STEP_MM).toFixed(6));
}

function candidateAt(b: DesignBasis, drainAreaMm2: number, diameterMm: number): Candidate | ConstraintCode[] {
  const h = shortestCylinderMm(b, diameterMm);
  if (h === null) return floatViolations(b, sizeFloat(b, diameterMm, PART_SIZE_CAP_MM));
  const f = sizeFloat(b, diameterMm, h);
  if (!f) return ['float-shape'];
  return layoutCandidate(b, f, drainAreaMm2);
}

/** Round a mass to 0.01 g so that ties go to the smaller diameter. */
const massKey = (kg: number) => Math.round(kg * 1e5);

/**
 * The search of DESIGN.md: over float diameters on a 0.5 mm grid, each with its
 * shortest workable cylinder, keep the design of least printed mass that meets
 * every constraint, then the smallest outer diameter. Reports which constraints
 * stopped a lighter design: what the cylinder height was raised for, and what
 * rejected the neighbouring diameters.
 */
export function searchSize(b: DesignBasis, drainAreaMm2: number): SearchOutcome {
  const rejections = new Map<ConstraintCode, number>();
  let best: Candidate | null = null;
  let bestIndex = -1;
  let lowestReachable = Infinity;
  let smallestFoot = Infinity;
  const nearest = { levelMm: Infinity, footMm: Infinity, cost: Infinity };
  const targetMm = b.inputs.targetLevelM * 1e3;
  const results: (Candidate | ConstraintCode[])[] = [];
  const limitMm = b.inputs.maxOuterDiameterM * 1e3;
  for (let i = 0; ; i++) {
    const d = SMALLEST_FLOAT_MM + i * DIAMETER_STEP_MM;
    if (d > PART_SIZE_CAP_MM) break;
    const c = candidateAt(b, drainAreaMm2, d);
    results.push(c);
    // a diameter with no workable cylinder at all is just too small; it explains nothing,
    // unless the tilt rules refuse even the tallest float (a lip too wide for the pad's indentation)
    if (Array.isArray(c)) {
      for (const code of c) if (code === 'tilt-gap' || code === 'tilt-offset') rejections.set(code, (rejections.get(code) ?? 0) + 1);
      continue;
    }
    for (const code of c.violations) rejections.set(code, (rejections.get(code) ?? 0) + 1);
    const others = c.violations.filter((v) => v !== 'travel');
    // a higher target lifts the nozzle and the deck by as much: the housing must still be within the size cap there
    const fitsRaised = c.housing.heightMm + Math.max(0, c.minimumReachableMm - targetMm) <= PART_SIZE_CAP_MM;
    if (others.length === 0 && fitsRaised) lowestReachable = Math.min(lowestReachable, c.minimumReachableMm);
    const rest = c.violations.filter((v) => v !== 'travel' && v !== 'outer-diameter-limit');
    if (rest.length === 0 && fitsRaised) {
      const foot = c.housing.foot.outerDiameterMm;
      const cost = Math.max(0, c.minimumReachableMm - targetMm) / targetMm + Math.max(0, foot - limitMm) / limitMm;
      if (cost < nearest.cost) Object.assign(nearest, { levelMm: c.minimumReachableMm, footMm: foot, cost });
    }
    const allButLimit = c.violations.filter((v) => v !== 'outer-diameter-limit');
    if (allButLimit.length === 0) smallestFoot = Math.min(smallestFoot, c.housing.foot.outerDiameterMm);
    if (c.violations.length === 0 && (!best || massKey(c.totalMassKg) < massKey(best.totalMassKg))) {
      best = c;
      bestIndex = i;
    }
    // past the diameter limit with a working design in hand, wider can only be heavier and too wide
    if (c.housing.foot.outerDiameterMm > Math.max(limitMm, smallestFoot) + 20) break;
  }
  const boundBy: string[] = [];
  if (best) {
    const shorter = Number((best.float.cylinderHeightMm - HEIGHT_STEP_MM).toFixed(6));
    const lower = floatViolations(b, sizeFloat(b, best.float.outerDiameterMm, shorter));
    boundBy.push(...lower);
    for (const j of [bestIndex - 1, bestIndex + 1]) {
      const n = results[j];
      if (!n) continue;
      const codes = Array.isArray(n) ? n : n.violations;
      if (codes.length === 0) {
        if (!boundBy.includes('least-mass')) boundBy.push('least-mass');
      } else {
        for (const code of codes) if (!boundBy.includes(code)) boundBy.push(code);
      }
    }
  }
  return {
    best,
    boundBy,
    rejections,
    lowestReachableMm: lowestReachable,
    smallestWorkingFootMm: smallestFoot,
    nearestLevelAndFoot: { levelMm: nearest.levelMm, footMm: nearest.footMm },
  };
}
