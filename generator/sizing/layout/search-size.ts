import { PART_SIZE_CAP_MM } from '../constants.ts';
import type { DesignBasis } from './design-basis.ts';
import { floatLiftViolations, floatViolations, layoutCandidate, sizeFloat, type Candidate, type ConstraintCode, type FloatSizing } from './evaluate-candidate.ts';

/** Float diameters are tried on this grid, mm (a printer cannot hold finer anyway). */
export const DIAMETER_STEP_MM = 0.5;
/** Cylinder heights are rounded up to this, mm. */
export const HEIGHT_STEP_MM = 0.1;
const SMALLEST_FLOAT_MM = 16;
/** The shortest cylinder tried, mm. */
const SHORTEST_CYLINDER_MM = 0.5;

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

/** The height grid's k-th point, mm (k tenths, clear of floating-point fuzz). */
const gridMm = (k: number) => Number((k * HEIGHT_STEP_MM).toFixed(6));

/**
 * Smallest k in [loK, hiK] with ok(k), for an `ok` that keeps holding once it holds, taken to hold at hiK
 * (never asked there): galloping out from a guess (heights change little from one diameter to the next, so
 * the bracket is narrow), then halving the bracket of whole grid steps. Without a guess (or one outside the
 * range): from loK up.
 */
function firstWorkingK(ok: (k: number) => boolean, loK: number, hiK: number, guessK: number | null): number {
  // bracket: fail < answer <= pass
  let fail = loK - 1;
  let pass = hiK;
  const start = guessK !== null && guessK > loK && guessK < hiK ? guessK : loK;
  if (start >= hiK) return hiK;
  let step = 1;
  if (ok(start)) {
    pass = start;
    for (;;) {
      const below = pass - step;
      if (below <= fail) break;
      if (!ok(below)) {
        fail = below;
        break;
      }
      pass = below;
      step *= 2;
    }
  } else {
    fail = start;
    for (;;) {
      const above = fail + step;
      if (above >= pass) break;
      if (ok(above)) {
        pass = above;
        break;
      }
      fail = above;
      step *= 2;
    }
  }
  while (pass - fail > 1) {
    const mid = (fail + pass) >> 1;
    if (ok(mid)) pass = mid;
    else fail = mid;
  }
  return pass;
}

/** Where the neighbouring diameters' searches ended (grid steps), to start the next one there; null: none. */
interface HeightGuess {
  liftK: number | null;
  previousLiftK: number | null;
  workingK: number | null;
}

/**
 * Shortest cylinder for a float diameter that meets the reserve, keeps the
 * seal depth inside the cylinder and holds the pad on the lip when tilted, with
 * its float; when even the tallest fails, no height and the tallest float. All ease monotonically as the
 * cylinder grows (lift gains pi R^2 per mm against 2 pi R t rho_m / rho of
 * shell; a taller float tilts less in its bore), so the smallest grid height
 * that works is found by halving; every other cost grows with height, so
 * smallest is best. The cheap lift rules are searched first; the tilt (an inner
 * bisection of its own) is looked at only from the height they give up.
 */
function shortestCylinder(b: DesignBasis, diameterMm: number, guess: HeightGuess): { heightMm: number | null; float: FloatSizing | null } {
  // each height's float sized once (cylinderAt); the rules' arrows are written in the calls, not named: tsx
  // names every named closure it makes (about 0.5 us each), and this runs for every diameter
  const c: CylinderSearch = { b, diameterMm, sized: new Map() };
  const loK = Math.round(SHORTEST_CYLINDER_MM / HEIGHT_STEP_MM);
  const hiK = Math.round(PART_SIZE_CAP_MM / HEIGHT_STEP_MM);
  // the lift's trend over the last two diameters says where to start
  const liftGuess = guess.liftK !== null && guess.previousLiftK !== null ? 2 * guess.liftK - guess.previousLiftK : guess.liftK;
  // no neighbour to start from: a float too small for any height is told at once by the tallest
  if (liftGuess === null && !liftHolds(c, hiK)) return { heightMm: null, float: cylinderAt(c, hiK) };
  const liftK = firstWorkingK((k) => liftHolds(c, k), loK, hiK, liftGuess);
  if (liftK === hiK && !liftHolds(c, hiK)) return { heightMm: null, float: cylinderAt(c, hiK) };
  guess.previousLiftK = guess.liftK;
  guess.liftK = liftK;
  let k = liftK;
  if (!allHold(c, liftK)) {
    if (!allHold(c, hiK)) return { heightMm: null, float: cylinderAt(c, hiK) };
    k = firstWorkingK((j) => allHold(c, j), liftK + 1, hiK, guess.workingK);
  }
  guess.workingK = k;
  return { heightMm: gridMm(k), float: cylinderAt(c, k) };
}

/** One diameter's search: the floats sized so far, by grid step. */
interface CylinderSearch {
  b: DesignBasis;
  diameterMm: number;
  sized: Map<number, FloatSizing | null>;
}

/** The float of the search's diameter at grid step k (sized once). */
function cylinderAt(c: CylinderSearch, k: number): FloatSizing | null {
  let f = c.sized.get(k);
  if (f === undefined) c.sized.set(k, (f = sizeFloat(c.b, c.diameterMm, gridMm(k))));
  return f;
}

/** The lift rules (reserve, seal in the cylinder) hold at grid step k. */
function liftHolds(c: CylinderSearch, k: number): boolean {
  return floatLiftViolations(c.b, cylinderAt(c, k)).length === 0;
}

/** Every rule the height settles (the lift's and the tilt's) holds at grid step k. */
function allHold(c: CylinderSearch, k: number): boolean {
  return floatViolations(c.b, cylinderAt(c, k)).length === 0;
}

function candidateAt(b: DesignBasis, drainAreaMm2: number, diameterMm: number, guess: HeightGuess): Candidate | ConstraintCode[] {
  const shortest = shortestCylinder(b, diameterMm, guess);
  const f = shortest.float;
  if (shortest.heightMm === null) return floatViolations(b, f);
  if (!f) return ['float-shape'];
  // the height was chosen where every float rule holds (allHold): no float violation to work out again
  return layoutCandidate(b, f, drainAreaMm2, []);
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
  const guess: HeightGuess = { liftK: null, previousLiftK: null, workingK: null };
  for (let i = 0; ; i++) {
    const d = SMALLEST_FLOAT_MM + i * DIAMETER_STEP_MM;
    if (d > PART_SIZE_CAP_MM) break;
    const c = candidateAt(b, drainAreaMm2, d, guess);
    results.push(c);
    if (Array.isArray(c)) Object.assign(guess, { liftK: null, previousLiftK: null, workingK: null });
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
