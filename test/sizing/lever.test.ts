/**
 * The lever valve's sizing against hand calculations.
 *
 * Moment balance (statics: for a rigid body at rest the moments about any point
 * sum to zero; J. L. Meriam and L. G. Kraige, Engineering Mechanics: Statics,
 * ch. 3, "Equilibrium", from memory). Worked by hand for an arm with the pad
 * 20 mm from the pivot, the float 60 mm out pushing up 0.3 N, and a 5 g arm
 * whose centroid is 30 mm out:
 *   W = 0.005 kg x 9.80665 m/s2 = 0.049033 N (standard gravity, NIST SP 330)
 *   sum M_pivot = 0:  0.3 x 60 - 0.049033 x 30 - F_pad x 20 = 0
 *   F_pad = (18 - 1.471) / 20 = 0.82645 N   (mechanical advantage 60 / 20 = 3)
 *
 * Pin friction (journal bearing, friction circle of radius r sin(phi), tan(phi) = mu;
 * Meriam and Kraige, Statics, "Journal bearings", from memory), mu 0.3, r 2 mm:
 *   r sin(atan 0.3) = 2 x 0.287348 = 0.574696 mm
 *   closing, R = F_pad + W - F_f up on the arm:
 *   F_f (60 + 0.5747) = 0.8264 (20 + 0.5747) + 0.04903 (30 + 0.5747)
 *   F_f = (17.0029 + 1.4991) / 60.5747 = 0.30544 N;  R = 0.8264 + 0.04903 - 0.30544 = 0.56999 N
 */
import { describe, expect, it } from 'vitest';
import {
  armStopTurnRad,
  armWeightInLiquidN,
  floatLowestZMm,
  frictionLevelBandMm,
  leverArmSpec,
  leverArmVolume,
  leverBasisFromDesign,
  leverFloatPushN,
  leverHoldDown,
  leverPadForceN,
  leverSummary,
  padArcContact,
  pivotFrictionTorqueNmm,
  pointedHoleAreaMm2,
  searchLever,
  widestExtentMm,
  type LeverCandidate,
} from '../../generator/sizing/lever/index.ts';
import { designBasis } from '../../generator/sizing/layout/design-basis.ts';
import { defaultInputs } from './fixtures.ts';

const G = 9.80665; // standard gravity, m/s2 (3rd CGPM 1901; NIST SP 330)

describe('moment balance about the pivot (Meriam and Kraige, Statics: sum of moments = 0)', () => {
  it('pad force of the worked example: 0.82645 N, advantage 3', () => {
    const W = 0.005 * G;
    expect(W).toBeCloseTo(0.049033, 6);
    expect(leverPadForceN(0.3, 60, W, 30, 20)).toBeCloseTo(0.82645, 5);
    // a weightless arm gives exactly the ratio
    expect(leverPadForceN(0.3, 60, 0, 0, 20)).toBeCloseTo(0.9, 12);
    expect(() => leverPadForceN(0.3, 60, 0, 0, 0)).toThrow(/padArmMm/);
  });

  it('with pin friction: the worked closing push 0.30544 N, R 0.56999 N; the moments close', () => {
    const o = { padForceN: 0.8264, padArmMm: 20, floatArmMm: 60, armWeightN: 0.04903, armCentroidMm: 30, pinRadiusMm: 2, frictionCoefficient: 0.3 };
    const close = leverFloatPushN({ ...o, direction: 'closing' });
    expect(close.floatPushN).toBeCloseTo(0.30544, 5);
    expect(close.pivotReactionN).toBeCloseTo(0.56999, 5);
    // vertical forces balance (sum F_z = 0) and the moments balance with the friction torque against the float
    expect(close.floatPushN + close.pivotReactionN - o.padForceN - o.armWeightN).toBeCloseTo(0, 12);
    expect(close.floatPushN * 60 - o.padForceN * 20 - o.armWeightN * 30 - close.frictionTorqueNmm).toBeCloseTo(0, 12);
    expect(close.frictionTorqueNmm).toBeCloseTo(close.pivotReactionN * 0.574696, 5);
    // opening: friction now helps the float, so less push holds the same pad force
    const open = leverFloatPushN({ ...o, direction: 'opening' });
    expect(open.floatPushN * 60 - o.padForceN * 20 - o.armWeightN * 30 + open.frictionTorqueNmm).toBeCloseTo(0, 12);
    // without friction (0.8264 x 20 + 0.04903 x 30) / 60 = 0.29998 N lies between the two
    expect(open.floatPushN).toBeLessThan(0.29998);
    expect(close.floatPushN).toBeGreaterThan(0.29998);
  });

  it('friction torque of a 2 mm pin at 0.5 N, mu 0.3: 0.5 x 2 x sin(atan 0.3) = 0.28735 N mm (small-mu form 0.3)', () => {
    expect(pivotFrictionTorqueNmm(0.5, 2, 0.3)).toBeCloseTo(0.28735, 5);
    expect(pivotFrictionTorqueNmm(-0.5, 2, 0.3)).toBeCloseTo(0.28735, 5);
  });

  it("arm weight in water: 4 cm3 of PETG dry 0.04982 N, wet 0.01066 N (Archimedes; PETG 1270 kg/m3 datasheet, from memory; water 998.2 kg/m3 at 20 C, CRC, from memory)", () => {
    expect(armWeightInLiquidN(4000, 1270, 998.2, 0)).toBeCloseTo(4e-6 * 1270 * G, 9);
    expect(armWeightInLiquidN(4000, 1270, 998.2, 0)).toBeCloseTo(0.04982, 5);
    expect(armWeightInLiquidN(4000, 1270, 998.2, 1)).toBeCloseTo(0.01066, 5);
    expect(() => armWeightInLiquidN(4000, 1270, 998.2, 1.5)).toThrow(/wetFraction/);
  });
});

describe('level band, pad arc, extents (Archimedes; elementary geometry)', () => {
  it('0.01 N of friction difference on a 50 mm float: 0.01 / (998.2 x 9.80665 x 1963.5e-6 m2) = 0.5203 mm', () => {
    expect(frictionLevelBandMm(0.01, 0, Math.PI * 25 * 25, 998.2)).toBeCloseTo(0.5203, 4);
  });

  it('pad arc: a_pad 12, d_s 5, delta 0.5, e 5.5 mm: tilt asin(0.5/12) = 2.388 deg, lip gap 5 x 0.5/12 = 0.2083 mm, slide 0.2292 mm', () => {
    const c = padArcContact(12, 5, 0.5, 5.5);
    expect(c.tiltDeg).toBeCloseTo(2.388, 3);
    expect(c.lipGapMm).toBeCloseTo(0.20833, 5);
    expect(c.slideMm).toBeCloseTo(0.22917, 5);
    // a_pad = 2 d_s gives a lip gap of exactly half the indentation
    expect(padArcContact(10, 5, 0.5, 0).lipGapMm).toBeCloseTo(0.25, 12);
  });

  it('widest extent: a 10 mm square at the origin and a 5 mm circle at (20, 5): sqrt(425) + 5 = 25.6155 mm', () => {
    expect(widestExtentMm([{ kind: 'rect', x0: 0, x1: 10, y0: 0, y1: 10 }, { kind: 'circle', x: 20, y: 5, r: 5 }])).toBeCloseTo(25.6155, 4);
    expect(widestExtentMm([{ kind: 'circle', x: 0, y: 0, r: 30 }])).toBe(60);
    expect(widestExtentMm([{ kind: 'rect', x0: 0, x1: 3, y0: 0, y1: 4 }])).toBe(5);
  });

  it('pointed hole: at 45 deg the teardrop r^2 (3 pi / 4 + 1); at 50 deg r 2.25: 5.0625 (pi - 0.87266 + 1.19175) = 17.5197 mm2', () => {
    expect(pointedHoleAreaMm2(2, 45)).toBeCloseTo(4 * ((3 * Math.PI) / 4 + 1), 10);
    expect(pointedHoleAreaMm2(2.25, 50)).toBeCloseTo(17.5197, 4);
  });

  it('rest stop: a heel 5.3 mm behind and 6 mm under the pivot meets a wall 7 mm behind it at phi - acos(7 / R) = 0.34064 rad', () => {
    // R = hypot(5.3, 6) = 8.0056, phi = atan2(6, 5.3) = 0.84727, acos(7 / 8.0056) = 0.50663
    expect(armStopTurnRad(5.3, 6, 7)).toBeCloseTo(0.34064, 5);
    const t = armStopTurnRad(5.3, 6, 7);
    expect(5.3 * Math.cos(t) + 6 * Math.sin(t)).toBeCloseTo(7, 12);
    expect(armStopTurnRad(1, 1, 7)).toBe(Infinity);
  });

  it('flooded floor lever (moments about the foot\'s back edge; steel 7850 kg/m3, from memory): 16.5 N mm, anchors 1.4559 N, or 170.1 g of steel', () => {
    // M = 0.3 x (45 + 17) - 0.02 x (20 + 17) - 0.08 x 17 = 16.5; F_a = 1.5 x 16.5 / 17; m = F_a / ((1 - 998.2 / 7850) x 9.80665)
    const h = leverHoldDown({ floatLiftN: 0.3, floatArmMm: 45, armWetWeightN: 0.02, armCentroidMm: 20, restWetWeightN: 0.08, backEdgeXMm: -17, anchorXMm: 0, densityKgM3: 998.2 });
    expect(h.tippingMomentNmm).toBeCloseTo(16.5, 9);
    expect(h.anchorForceN).toBeCloseTo(1.45588, 5);
    expect(h.ballastSteelG).toBeCloseTo(170.09, 2);
    expect(h.upliftN).toBeCloseTo(0.2, 12);
  });

  it('float turned 0.1 rad about a pivot 60 mm up: far corner (90, 10) goes to 60 - 90 sin 0.1 - 50 cos 0.1 = 1.2648 mm', () => {
    expect(floatLowestZMm(60, 30, 10, 60, 0.1)).toBeCloseTo(1.2648, 4);
    expect(floatLowestZMm(60, 30, 10, 60, 0)).toBeCloseTo(10, 12);
  });
});

describe('arm volume, counted by hand (prisms and cylinders: elementary geometry)', () => {
  it('pad at 12, float at 45 mm, 2.25 mm walls, 8 x 3 mm pad 1 mm proud: 2545.6 mm3', () => {
    const a = leverArmSpec({ padArmMm: 12, floatArmMm: 45, wallMm: 2.25, lineWidthMm: 0.45, padDiameterMm: 8, padThicknessMm: 3, padProudMm: 1 });
    // hole r 2 + 0.25 = 2.25 at 2.25 + 2.25 = 4.5 deep; point 2.25 / cos 50deg = 3.5004; eye 4.5 + 3.5004 + 2.25 -> 10.5 deep, 4.5 each side
    // bar 9 wide (4 walls), 4 deep (pocket 2 + 3 lines = 3.35 -> at least 4), from -4.5 to 45 + 4.5
    expect(a).toMatchObject({ barWidthMm: 9, barDepthMm: 4, eyeDepthMm: 10.5, eyeHalfLengthMm: 4.5, tailXMm: -4.5, tipXMm: 49.5, tableHalfSideMm: 6.5, pocketDiameterMm: 8.5, pocketDepthMm: 2 });
    const byHand =
      9 * 4 * 54 + // bar
      9 * 6.5 * 9 + // eye below the bar
      (13 - 9) * 13 * 4 + // pad table wings
      Math.PI * 4 ** 2 * 2.75 - // tongue 8 mm (bar less 1), 3 mm socket less a clearance
      Math.PI * 4.25 ** 2 * 2 - // pad pocket
      5.0625 * (Math.PI - (50 * Math.PI) / 180 + Math.tan((50 * Math.PI) / 180)) * 9; // pin hole through the eye
    expect(byHand).toBeCloseTo(2545.6, 1);
    expect(leverArmVolume(a).volumeMm3).toBeCloseTo(byHand, 6);
  });
});

/** Independent statics check of a laid-out valve: buoyancy from the float's own straight side (Archimedes), then the moment balance. */
function checkBalance(c: LeverCandidate, sealN: number, rho: number): void {
  const R = c.float.outerDiameterMm / 2;
  const buoyancyN = rho * G * Math.PI * R * R * c.sealDepthMm * 1e-9; // seals on its straight side: V = pi R^2 z
  const netPushN = buoyancyN - c.floatMassKg * G;
  const reaction = sealN + c.armWeightN - netPushN;
  const friction = Math.abs(reaction) * 2 * Math.sin(Math.atan(0.3)); // 4 mm pin, mu 0.3 (printed plastic, wet: from memory)
  const moments = netPushN * c.arm.floatArmMm - c.armWeightN * c.armCentroidMm - sealN * c.arm.padArmMm - friction;
  expect(Math.abs(moments)).toBeLessThan(1e-9);
}

describe('the lightest lever valve (search)', () => {
  const rho = 998.2;
  it('shallow tray, 25 mm at 2 m (low tank 1.5 m), 120 mm footprint: found; every rule holds by hand', () => {
    const inp = defaultInputs({ headMaxM: 2, headMinM: 1.5, targetLevelM: 0.025, maxOuterDiameterM: 0.12 });
    const lb = leverBasisFromDesign(designBasis(inp));
    const out = searchLever(lb, { mount: 'floor' });
    const c = out.best!;
    expect(c).not.toBeNull();
    expect(c.violations).toEqual([]);
    checkBalance(c, lb.sealForceN(2), rho);
    expect(c.shutOffAtHeadMaxMm).toBeCloseTo(25, 9);
    // the lower tank needs less push, so the float shuts lower
    expect(c.shutOffAtHeadMinMm).toBeLessThan(25);
    expect(c.sealDepthMm).toBeLessThanOrEqual(c.float.cylinderHeightMm);
    expect(c.reserve).toBeGreaterThanOrEqual(1.5);
    expect(c.footprintMm).toBeLessThanOrEqual(120);
    expect(c.ratio).toBeGreaterThan(1);
    // the arm is level at the seal: tip and pivot on the arm's own section
    expect(c.tipZMm - c.pivotZMm).toBeCloseTo(c.arm.holeCentreDepthMm + 1 - lb.indentationMm, 9);
    expect(c.restTravelMm).toBeGreaterThanOrEqual(lb.basis.minimumTravelMm);
    expect(c.restLowestZMm).toBeGreaterThanOrEqual(-1e-9);
    expect(c.lipGapMm).toBeLessThanOrEqual(lb.indentationMm / 2);
    expect(c.hysteresisMm).toBeGreaterThan(0);
    // the fields size --json will carry (issue 13, Interface)
    const s = leverSummary(c);
    expect(s).toMatchObject({ architecture: 'lever', mount: 'floor', rim: null });
    expect(s.lever.ratio).toBeCloseTo(c.arm.floatArmMm / c.arm.padArmMm, 12);
    expect(s.lever.armLengthMm).toBeCloseTo(c.arm.tipXMm - c.arm.tailXMm, 12);
    expect(s.footprintMm).toBe(c.footprintMm);
  });

  it('deep bucket, 250 mm at 1.5 m: too tall for a floor frame (250 mm part cap), hung from a rim 100 mm higher it fits 90 mm', () => {
    const inp = defaultInputs({ headMaxM: 1.5, headMinM: 1.125, targetLevelM: 0.25, maxOuterDiameterM: 0.09 });
    const lb = leverBasisFromDesign(designBasis(inp));
    const floor = searchLever(lb, { mount: 'floor' });
    expect(floor.best).toBeNull();
    expect(floor.rejections.has('part-size')).toBe(true);
    const rim = searchLever(lb, { mount: 'rim', rim: { rimHeightMm: 350, wallThicknessMm: 3 } });
    const c = rim.best!;
    expect(c.violations).toEqual([]);
    checkBalance(c, lb.sealForceN(1.5), rho);
    expect(c.rim!.adjustMm).toBe(10);
    // lowered by the whole adjustment, neither the frame nor the float at its minimum travel reaches the floor
    expect(c.frame.cheekBottomZMm).toBeGreaterThanOrEqual(10);
    expect(c.rim!.stem.lengthMm).toBeLessThanOrEqual(250);
  });
});

describe('a level under the float\'s own depth (Archimedes: with no push a float sinks to V = m / rho)', () => {
  it('5 mm: every float of four 1.8 mm walls sinks deeper than that on its own, so nothing is laid out and the travel rule is named', () => {
    const inp = defaultInputs({ targetLevelM: 0.005, maxOuterDiameterM: 0.12 });
    const lb = leverBasisFromDesign(designBasis(inp));
    const t0 = performance.now();
    const out = searchLever(lb, { mount: 'floor' });
    expect(out.best).toBeNull();
    expect(out.evaluated).toBe(0);
    expect([...out.rejections.keys()]).toEqual(['travel']);
    // a bound, not a search: well under the time the grid takes (a loose check, not a timing test)
    expect(performance.now() - t0).toBeLessThan(2000);
  });

  it('the bound never turns away a float that fits: the lightest at 20 mm (1 m, 120 mm) sinks on its own less than 20 mm', () => {
    const inp = defaultInputs({ headMaxM: 1, headMinM: 0.75, targetLevelM: 0.02, maxOuterDiameterM: 0.12 });
    const lb = leverBasisFromDesign(designBasis(inp));
    const c = searchLever(lb, { mount: 'floor' }).best!;
    expect(c).not.toBeNull();
    // its bottom at the seal stands above the floor, so its own depth (seal depth less the push's) is under 20 mm
    expect(c.floatBottomZMm).toBeGreaterThanOrEqual(0);
    expect(c.sealDepthMm).toBeLessThan(20);
  });
});

describe('shortest working height (bisection; Burden and Faires, Numerical Analysis, sec. 2.1, from memory)', () => {
  it('a rule holding from 12.34 mm on a 0.1 mm grid: 12.4; never holding: null; holding at once: the low end', async () => {
    const { shortestWorkingHeightMm } = await import('../../generator/sizing/layout/shortest-working-height.ts');
    expect(shortestWorkingHeightMm((h) => h >= 12.34, 0.1, 0.5, 250)).toBe(12.4);
    expect(shortestWorkingHeightMm((h) => h >= 12.4, 0.1, 0.5, 250)).toBe(12.4);
    expect(shortestWorkingHeightMm(() => false, 0.1, 0.5, 250)).toBeNull();
    expect(shortestWorkingHeightMm(() => true, 0.1, 0.5, 250)).toBe(0.5);
  });
});
