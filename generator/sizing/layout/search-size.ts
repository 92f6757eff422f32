import { PART_SIZE_CAP_MM } from '../constants.ts';
import type { DesignBasis } from './design-basis.ts';
import { floatLiftViolations, floatViolations, layoutCandidate, sizeFloat, type Candidate, type ConstraintCode } from './evaluate-candidate.ts';

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

/** Smallest height in [lo, hi] where `ok` holds, to a quarter of the height grid (ok(hi) holds, ok monotone). */
function bisectHeightMm(ok: (h: number) => boolean, lo: number, hi: number): number {
  while (hi - lo > HEIGHT_STEP_MM / 4) {
    const mid = (lo + hi) / 2;
    if (ok(mid)) hi = mid;
    else lo = mid;
  }
  return lo;
}

/**
 * Shortest cylinder for a float diameter that meets the reserve, keeps the
 * seal depth inside the cylinder and holds the pad on the lip when tilted. All
 * ease monotonically as the cylinder grows (lift gains pi R^2 per mm against
 * 2 pi R t rho_m / rho of shell; a taller float tilts less in its bore), so
 * bisection finds the smallest; every other cost grows with height, so smallest
 * is best. The cheap lift rules are bisected first; the tilt (an inner
 * bisection of its own) is looked at only above the height they give.
 */
function shortestCylinderMm(b: DesignBasis, diameterMm: number, guessMm: number | null): number | null {
  const liftOk = (h: number) => floatLiftViolations(b, sizeFloat(b, diameterMm, h)).length === 0;
  const ok = (h: number) => floatViolations(b, sizeFloat(b, diameterMm, h)).length === 0;
  const hi = PART_SIZE_CAP_MM;
  if (!liftOk(hi) || !ok(hi)) return null;
  let lo = liftOk(0.5) ? 0.5 : bisectHeightMm(liftOk, ...bracketHeightMm(liftOk, guessMm, 0.5, hi));
  if (lo === 0.5 && ok(0.5)) return 0.5;
  // from the lift's height up: the grid point there, or a bisection with the tilt when that binds
  const grid = (k: number) => Number((k * HEIGHT_STEP_MM).toFixed(6));
  let k = Math.ceil(lo / HEIGHT_STEP_MM - 1e-6);
  if (ok(grid(k))) return grid(k);
  lo = bisectHeightMm(ok, k * HEIGHT_STEP_MM, hi);
  // to the height grid, clear of floating-point fuzz (the bound found works, so this ends within a step or two)
  k = Math.ceil(lo / HEIGHT_STEP_MM - 1e-6);
  while (!ok(grid(k))) k++;
  return grid(k);
}

/**
 * A bracket [failing, working] around the boundary of a monotone `ok` on [lo, hi] (ok(lo) fails, ok(hi) holds),
 * galloping out from a guess (the neighbouring diameter's height: heights change little from one diameter to
 * the next), so the bisection starts narrow. Without a guess: the whole range.
 */
function bracketHeightMm(ok: (h: number) => boolean, guessMm: number | null, lo: number, hi: number): [number, number] {
  if (guessMm === null || !(guessMm > lo && guessMm < hi)) return [lo, hi];
  let step = 4 * HEIGHT_STEP_MM;
  if (ok(guessMm)) {
    let top = guessMm;
    for (;;) {
      const below = top - step;
      if (below <= lo) return [lo, top];
      if (!ok(below)) return [below, top];
      top = below;
      step *= 2;
    }
  }
  let bottom = guessMm;
  for (;;) {
    const above = bottom + step;
    if (above >= hi) return [bottom, hi];
    if (ok(above)) return [bottom, above];
    bottom = above;
    step *= 2;
  }
}

function candidateAt(b: DesignBasis, drainAreaMm2: number, diameterMm: number, guessMm: number | null): Candidate | ConstraintCode[] {
  const h = shortestCylinderMm(b, diameterMm, guessMm);
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
  let guess: number | null = null;
  for (let i = 0; ; i++) {
    const d = SMALLEST_FLOAT_MM + i * DIAMETER_STEP_MM;
    if (d > PART_SIZE_CAP_MM) break;
    const c = candidateAt(b, drainAreaMm2, d, guess);
    results.push(c);
    guess = Array.isArray(c) ? null : c.float.cylinderHeightMm;
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
    // The foot grows with the float, so past the diameter limit nothing fits any more: with a design in hand,
    // this first one too wide is the last needed (the best's neighbour, for boundBy). Without one, go on
    // a little to find what a wider limit would give (the ways out).
    if (best && c.housing.foot.outerDiameterMm > limitMm + 1e-9) break;
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
