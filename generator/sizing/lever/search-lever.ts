import { PART_SIZE_CAP_MM, PRINT_CLEARANCE_MM } from '../constants.ts';
import { HEIGHT_STEP_MM } from '../layout/search-size.ts';
import { shortestWorkingHeightMm } from '../layout/shortest-working-height.ts';
import { armLoad, layoutLever, leverFloatChecks, padForceFromPush, type ArmLoad } from './layout-lever.ts';
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
import { depthForForceMm } from '../float/depth-for-force.ts';
import { RIM_ADJUST_MM } from '../rim/rim-constants.ts';
import { leverPad } from './lever-pad.ts';
import type { LeverBasis, LeverCandidate, LeverConstraint } from './lever-types.ts';

const SMALLEST_FLOAT_MM = 16;
/** The coarse grid the search walks first (then the fine one round its lightest), mm. */
const COARSE_DIAMETER_STEP_MM = 3;
const COARSE_ARM_STEP_MM = 5;
/** Where the coarse grid fits nothing, the fine grid is searched round this many of its lightest near misses (one rule failed). */
const NEAR_MISSES_REFINED = 8;

export interface LeverSearchOptions {
  mount: 'floor' | 'rim';
  /** pad arms tried past the shortest, mm; default PAD_ARM_EXTRA_MM */
  padArmExtrasMm?: readonly number[];
  rim?: { rimHeightMm: number; wallThicknessMm: number };
}

export interface LeverSearchOutcome {
  best: LeverCandidate | null;
  /** every constraint that rejected a laid-out candidate, with how many */
  rejections: Map<LeverConstraint, number>;
  /** candidates laid out (for the benchmark) */
  evaluated: number;
  /** the constraints that rejected a lighter candidate than the best (what bound it), most often first; 'least-mass' when none did */
  boundBy: (LeverConstraint | 'least-mass')[];
  /** the smallest footprint of any candidate that passed every rule, mm (Infinity without one) */
  smallestFootprintMm: number;
  /**
   * the lowest level any laid-out candidate failing the travel rule alone would serve, raised until the float
   * clears the floor at the minimum travel, mm (Infinity without one): where a deeper level is the way out
   */
  lowestReachableMm: number;
}

/**
 * Shortest pad arm, mm: the pad arc rule (a_pad >= 2 d_s, padArcContact), and the
 * pad table (wider than the cheek gap) a print clearance in front of the frame's
 * cheeks (which end postHalfLengthMm from the pivot); to the half millimetre.
 */
export function shortestPadArmMm(lb: LeverBasis, postHalfLengthMm: number, tableHalfSideMm: number, below?: { tableBelowPivotMm: number; travelMm: number }): number {
  const sealMm = lb.basis.inputs.sealDiameterM * 1e3;
  let padArm = Math.ceil(Math.max(2 * sealMm, postHalfLengthMm + PRINT_CLEARANCE_MM + tableHalfSideMm) * 2 - 1e-9) / 2;
  // turned nose down to its rest, the table's lower back edge (tableBelowPivot under the axis) swings back
  // towards the cheeks: (a_p - h) cos(theta) - d sin(theta), theta = asin((travel + delta) / a_p)
  if (below) {
    for (let i = 0; i < 200; i++, padArm += 0.5) {
      const theta = Math.asin(Math.min(1, (below.travelMm + lb.indentationMm) / padArm));
      if ((padArm - tableHalfSideMm) * Math.cos(theta) - below.tableBelowPivotMm * Math.sin(theta) >= postHalfLengthMm + PRINT_CLEARANCE_MM - 1e-9) break;
    }
  }
  return padArm;
}

/**
 * Shortest cylinder (on the height grid) meeting the reserve and the seal-in-cylinder rule on this arm, or null.
 * Both are linear in the cylinder's height h while the water line is on the straight side: the lift
 * F(h) = rho g V(h) - m(h) g and the float's mass m(h) grow linearly with h (the cone and the collar above do
 * not change), so the reserve asks F(h) >= F_1 and the seal depth (push + m(h) g) / (rho g pi R^2) <= h.
 * Two floats, at h = 10 and 20 mm, give the lines; their meeting heights, up to the grid, are then checked on
 * the real shape (stepping up the grid while fuzz or the cone says no).
 * Source: Archimedes' principle; straight lines through two points.
 */
function shortestCylinderMm(lb: LeverBasis, load: ArmLoad, diameterMm: number): number | null {
  const inp = lb.basis.inputs;
  const rho = inp.liquidDensityKgM3;
  const pushAtHeadMaxN = leverFloatChecks(lb, load, null).pushN;
  const needed = inp.reserve * lb.sealForceN(inp.headMaxM);
  // the rule is called directly (cylinderHolds), and made a function only for a search (searchHoldingMm):
  // a closure made for every candidate costs more than its use
  const a = floatOnArm(lb, load, diameterMm, 10);
  const b = floatOnArm(lb, load, diameterMm, 20);
  if (!a || !b) return searchHoldingMm(lb, load, diameterMm, pushAtHeadMaxN, needed, 0.5, PART_SIZE_CAP_MM);
  const g = 9.80665;
  const pushN = pushAtHeadMaxN;
  // the float's own lift needed for the reserve, through the arm: padForceFromPush is linear and rising in the push
  const neededPadN = needed;
  const liftSlope = (b.availableN - a.availableN) / 10;
  const padA = padForceFromPush(load, a.availableN);
  const padB = padForceFromPush(load, b.availableN);
  const padSlope = (padB - padA) / 10;
  if (!(liftSlope > 0) || !(padSlope > 0)) return searchHoldingMm(lb, load, diameterMm, pushAtHeadMaxN, needed, 0.5, PART_SIZE_CAP_MM);
  const hReserve = 10 + (neededPadN - padA) / padSlope;
  // seal depth on the straight side: (push + m(h) g) / (rho g A) <= h, m(h) = m_a + k (h - 10)
  const areaM2 = Math.PI * (diameterMm / 2) ** 2 * 1e-6;
  const k = (b.massKg - a.massKg) / 10;
  const perMm = rho * g * areaM2 * 1e-3; // N of lift per mm of depth
  const hSeal = (pushN + (a.massKg - 10 * k) * g) / (perMm - k * g);
  if (!(perMm > k * g)) return searchHoldingMm(lb, load, diameterMm, pushAtHeadMaxN, needed, 0.5, PART_SIZE_CAP_MM);
  let h = Math.max(0.5, Number((Math.ceil(Math.max(hReserve, hSeal) / HEIGHT_STEP_MM - 1e-6) * HEIGHT_STEP_MM).toFixed(6)));
  if (h > PART_SIZE_CAP_MM) return null;
  // the grid point just below may already hold (rounding): the search's height is the least that holds
  const below = Number((h - HEIGHT_STEP_MM).toFixed(6));
  if (below >= 0.5 && cylinderHolds(lb, load, diameterMm, below, pushAtHeadMaxN, needed)) {
    return searchHoldingMm(lb, load, diameterMm, pushAtHeadMaxN, needed, 0.5, below);
  }
  for (let i = 0; i < 20; i++, h = Number((h + HEIGHT_STEP_MM).toFixed(6))) if (cylinderHolds(lb, load, diameterMm, h, pushAtHeadMaxN, needed)) return h;
  return searchHoldingMm(lb, load, diameterMm, pushAtHeadMaxN, needed, h, PART_SIZE_CAP_MM);
}

/** shortestWorkingHeightMm over [loMm, hiMm] with cylinderHolds as the rule. */
function searchHoldingMm(lb: LeverBasis, load: ArmLoad, diameterMm: number, pushAtHeadMaxN: number, neededN: number, loMm: number, hiMm: number): number | null {
  return shortestWorkingHeightMm((h) => cylinderHolds(lb, load, diameterMm, h, pushAtHeadMaxN, neededN), HEIGHT_STEP_MM, loMm, hiMm);
}

/** The float of a diameter and cylinder height (mm) on this arm, or null when its shape does not close. */
function floatOnArm(lb: LeverBasis, load: ArmLoad, diameterMm: number, heightMm: number) {
  const inp = lb.basis.inputs;
  return leverFloat(diameterMm, heightMm, load.arm.tongueDiameterMm, lb.basis.floatShellMm, inp.materialDensityKgM3, inp.liquidDensityKgM3);
}

/** Whether a cylinder height (mm) meets the reserve (pad force `neededN` through the arm) and seals on the straight side. */
function cylinderHolds(lb: LeverBasis, load: ArmLoad, diameterMm: number, heightMm: number, pushAtHeadMaxN: number, neededN: number): boolean {
  const f = floatOnArm(lb, load, diameterMm, heightMm);
  if (!f) return false;
  // sealed on the straight side: the volume displaced at the seal fits in the cylinder (no depth search)
  const sealVolumeMm3 = ((pushAtHeadMaxN / 9.80665 + f.massKg) / lb.basis.inputs.liquidDensityKgM3) * 1e9;
  return padForceFromPush(load, f.availableN) >= neededN && sealVolumeMm3 <= Math.PI * (diameterMm / 2) ** 2 * heightMm;
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
 *
 * On the floor the frame has a third anchor wing across the back; where nothing
 * fits the footprint with it, the search is run again without it (a wing
 * narrower, the anchors then holding with about twice the force), so the back
 * wing is left off only where it is what keeps the valve out.
 */
export function searchLever(lb: LeverBasis, o: LeverSearchOptions): LeverSearchOutcome {
  const withWing = searchWithFrame(lb, o, true);
  if (withWing.best || o.mount !== 'floor' || !withWing.rejections.has('outer-diameter-limit')) return withWing;
  const without = searchWithFrame(lb, o, false);
  if (without.best) return without;
  return { ...withWing, lowestReachableMm: Math.min(withWing.lowestReachableMm, without.lowestReachableMm) };
}

/** searchLever with the back anchor wing on (floor) or off. */
function searchWithFrame(lb: LeverBasis, o: LeverSearchOptions, backWing: boolean): LeverSearchOutcome {
  const inp = lb.basis.inputs;
  const wallMm = inp.wallM * 1e3;
  const pad = leverPad(lb.basis);
  const limitMm = inp.maxOuterDiameterM * 1e3;
  const rejections = new Map<LeverConstraint, number>();
  let best: LeverCandidate | null = null;
  let evaluated = 0;
  let smallestFootprintMm = Infinity;
  let lowestReachableMm = Infinity;
  const rejected: { massKg: number; violations: LeverConstraint[] }[] = [];
  // the arm's rest stop is built for the preferred travel; where nothing fits so (shallow trays), for the least
  let stopTravelMm = lb.basis.preferredTravelMm;
  const armFor = (padArm: number, floatArm: number) =>
    leverArmSpec({
      padArmMm: padArm,
      floatArmMm: floatArm,
      wallMm,
      lineWidthMm: inp.lineWidthM * 1e3,
      padDiameterMm: pad.diameterMm,
      padThicknessMm: pad.thicknessMm,
      padProudMm: pad.proudMm,
      restTurnRad: Math.asin(Math.min(1, (stopTravelMm + lb.indentationMm) / padArm)),
    });
  const probe = armFor(100, 200);
  // the frame's post reaches a clearance and a wall past the eye (leverFrameSpec)
  const post = probe.eyeHalfLengthMm + PRINT_CLEARANCE_MM + wallMm;
  // and the nozzle's seat (its collar and two clearances, centred over the pad) ends in front of the cheeks, so a
  // wide nozzle for a wide feed tube never sits in them (found by the soak: 16 to 25 mm tubes)
  const seatHalfMm = lb.basis.nozzle.collarDiameterMm / 2 + PRINT_CLEARANCE_MM;
  const shortest = Math.max(
    shortestPadArmMm(lb, post, probe.tableHalfSideMm, { tableBelowPivotMm: probe.barDepthMm - probe.holeCentreDepthMm, travelMm: lb.basis.preferredTravelMm }),
    Math.ceil((post + PRINT_CLEARANCE_MM + seatHalfMm) * 2 - 1e-9) / 2,
  );
  // On the floor the frame stands from the floor to its deck, above the arm, which rests on the float's top,
  // which stands above the water line (the float seals on its straight side): at least the target level, the
  // bar, the pad standing proud less its squeeze, the nozzle under the deck, the boss and the deck. Past the
  // part-size cap no candidate can fit: said at once, without the search.
  if (o.mount === 'floor') {
    const b = lb.basis;
    const lowest = inp.targetLevelM * 1e3 + probe.barDepthMm + pad.proudMm - lb.indentationMm + b.nozzle.protrusionMm + b.bossHeightMm + b.deckThicknessMm;
    if (lowest > PART_SIZE_CAP_MM) {
      rejections.set('part-size', 1);
      return { best: null, rejections, evaluated: 0, boundBy: [], smallestFootprintMm: Infinity, lowestReachableMm: Infinity };
    }
  }
  const maxD = Math.min(limitMm, PART_SIZE_CAP_MM);
  const floorZ = o.mount === 'rim' ? RIM_ADJUST_MM : 0;
  const hopeless = new Map<number, boolean>();
  /**
   * Whether no float of this diameter can float high enough: even with no push at all it sinks to its own
   * depth, which only grows with its height (a taller float is heavier on the same waterplane), so where the
   * target less that depth is under the floor (on the rim: the floor less the adjustment) every candidate of
   * this diameter would break the travel rule. Said without laying any of them out: a half-typed level ('5'
   * on the way to '51') is answered at once instead of after the whole grid.
   */
  const sinksBelowFloor = (d: number): boolean => {
    let known = hopeless.get(d);
    if (known === undefined) {
      const floatOf = (h: number) => leverFloat(d, h, probe.tongueDiameterMm, lb.basis.floatShellMm, inp.materialDensityKgM3, inp.liquidDensityKgM3);
      // the shortest float of this diameter whose shape closes
      const h = shortestWorkingHeightMm((mm) => floatOf(mm) !== null, HEIGHT_STEP_MM, 0.5, PART_SIZE_CAP_MM);
      const f = h === null ? null : floatOf(h);
      const self = f ? depthForForceMm(f.float, 0, f.massKg, inp.liquidDensityKgM3) : Infinity;
      known = inp.targetLevelM * 1e3 - self < floorZ;
      hopeless.set(d, known);
      if (known) rejections.set('travel', (rejections.get('travel') ?? 0) + 1);
    }
    return known;
  };
  const seen = new Set<number>();
  /** Lays out one candidate (pad arm, float diameter, float arm); returns it, or null when no float shape fits. */
  const evaluate = (padArm: number, d: number, floatArm: number): LeverCandidate | null => {
    // pad arms on 0.5 mm, diameters on 1 mm and float arms on 2.5 mm grids: one number each
    const key = ((stopTravelMm === lb.basis.preferredTravelMm ? 0 : 1) * 4096 + Math.round(padArm * 2) * 4096 + Math.round(d)) * 4096 + Math.round(floatArm * 2);
    if (seen.has(key)) return null;
    seen.add(key);
    const load = armLoad(lb, armFor(padArm, floatArm));
    const h = shortestCylinderMm(lb, load, d);
    if (h === null) return null;
    const f = leverFloat(d, h, load.arm.tongueDiameterMm, lb.basis.floatShellMm, inp.materialDensityKgM3, inp.liquidDensityKgM3);
    if (!f) return null;
    const c = layoutLever(lb, { mount: o.mount, rim: o.rim, load, float: f, backWing });
    evaluated++;
    for (const v of c.violations) rejections.set(v, (rejections.get(v) ?? 0) + 1);
    if (c.violations.length) rejected.push({ massKg: c.totalMassKg, violations: c.violations });
    else smallestFootprintMm = Math.min(smallestFootprintMm, c.footprintMm);
    if (c.violations.length === 1 && c.violations[0] === 'travel') lowestReachableMm = Math.min(lowestReachableMm, c.shutOffAtHeadMaxMm + c.travelShortfallMm);
    return c;
  };
  /** The lightest candidate of one pad arm over a grid of diameters and float arms (each float arm row stops past the limit). */
  /** candidates of the last scan that failed one rule only (where a window the coarse grid stepped over may lie) */
  let near: LeverCandidate[] = [];
  const scan = (padArm: number, diameters: number[], armStep: number, armFrom = -Infinity, armTo = Infinity): LeverCandidate | null => {
    let found: LeverCandidate | null = null;
    near = [];
    for (const d of diameters) {
      if (sinksBelowFloor(d)) continue;
      const first = Math.max(MIN_LEVER_RATIO * padArm, post + d / 2 + FLOAT_TO_FRAME_GAP_MM, armFrom);
      const last = Math.min(MAX_LEVER_RATIO * padArm, armTo);
      for (let k = Math.ceil(first / armStep - 1e-9); k * armStep <= last + 1e-9; k++) {
        const floatArm = Number((k * armStep).toFixed(6));
        // the float's far rim alone is past the limit from here on
        if (floatArm + d / 2 + post > limitMm + 1e-9) break;
        const c = evaluate(padArm, d, floatArm);
        if (!c) continue;
        if (c.violations.length === 1) near.push(c);
        if (c.violations.length === 0) {
          const lighter = !found || massKey(c.totalMassKg) < massKey(found.totalMassKg);
          const tie = found && massKey(c.totalMassKg) === massKey(found.totalMassKg) && c.footprintMm < found.footprintMm;
          if (lighter || tie) found = c;
        }
        if (c.violations.includes('outer-diameter-limit')) break;
      }
    }
    return found;
  };
  const grid = (from: number, to: number, step: number) => {
    const out: number[] = [];
    for (let k = Math.ceil(from / step - 1e-9); k * step <= to + 1e-9; k++) out.push(Number((k * step).toFixed(6)));
    return out;
  };
  const lighterOf = (a: LeverCandidate | null, b: LeverCandidate | null) =>
    !a ? b : !b ? a : massKey(b.totalMassKg) < massKey(a.totalMassKg) || (massKey(b.totalMassKg) === massKey(a.totalMassKg) && b.footprintMm < a.footprintMm) ? b : a;
  for (const stop of [lb.basis.preferredTravelMm, lb.basis.minimumTravelMm]) {
    if (best) break;
    stopTravelMm = stop;
    for (const extra of o.padArmExtrasMm ?? PAD_ARM_EXTRA_MM) {
      const padArm = shortest + extra;
      // coarse, then fine round the coarse best; a pad arm whose coarse grid fits nothing gets the whole fine grid
      const coarse = scan(padArm, grid(SMALLEST_FLOAT_MM, maxD, COARSE_DIAMETER_STEP_MM), COARSE_ARM_STEP_MM);
      // fine round a candidate of the coarse grid
      const around = (c: LeverCandidate) =>
        scan(
          padArm,
          grid(Math.max(SMALLEST_FLOAT_MM, c.float.outerDiameterMm - COARSE_DIAMETER_STEP_MM), Math.min(maxD, c.float.outerDiameterMm + COARSE_DIAMETER_STEP_MM), LEVER_DIAMETER_STEP_MM),
          FLOAT_ARM_STEP_MM,
          c.arm.floatArmMm - COARSE_ARM_STEP_MM,
          c.arm.floatArmMm + COARSE_ARM_STEP_MM,
        );
      let here: LeverCandidate | null;
      if (coarse) here = lighterOf(coarse, around(coarse));
      else {
        // nothing on the coarse grid: look between its points only round the lightest few that failed one rule
        here = null;
        const closest = [...near].sort((x, y) => x.totalMassKg - y.totalMassKg).slice(0, NEAR_MISSES_REFINED);
        for (const c of closest) here = lighterOf(here, around(c));
      }
      // a longer pad arm is heavier once one fits: go on only while the lightest keeps falling
      if (best && (!here || massKey(here.totalMassKg) >= massKey(best.totalMassKg))) break;
      best = lighterOf(best, here);
    }
  }
  const bound = new Map<LeverConstraint, number>();
  if (best) {
    for (const r of rejected) if (massKey(r.massKg) < massKey(best.totalMassKg)) for (const v of r.violations) bound.set(v, (bound.get(v) ?? 0) + 1);
  }
  const boundBy: (LeverConstraint | 'least-mass')[] = [...bound.entries()].sort((a, b) => b[1] - a[1]).map(([code]) => code);
  if (best && boundBy.length === 0) boundBy.push('least-mass');
  return { best, rejections, evaluated, boundBy, smallestFootprintMm, lowestReachableMm };
}
