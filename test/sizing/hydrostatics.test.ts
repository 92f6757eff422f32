import { describe, expect, it } from 'vitest';
import { headForPressureM, pressurePa } from '../../generator/sizing/hydrostatics/pressure-pa.ts';
import { closingForceN } from '../../generator/sizing/hydrostatics/closing-force-n.ts';
import { circleArea, diameterForArea } from '../../generator/sizing/hydrostatics/circle-area.ts';
import { fitSealCalibration } from '../../generator/sizing/hydrostatics/fit-seal-calibration.ts';

// Exact unit constants. Source: NIST SP 811, App. B (1 ft = 0.3048 m, 1 psi = 6894.757 Pa,
// 1 oz = 28.349523125 g); 1 gf = 9.80665 mN by definition of the gram-force (g: NIST SP 330).
const FT = 0.3048;
const PSI = 6894.757;
const GF = 9.80665e-3;
const RHO = 998.2; // water at 20 C, CRC Handbook (IAPWS-95), from memory

describe('hydrostatic pressure p = rho g H', () => {
  it('10 ft of water is 29.84 kPa, 4.33 psi (computed from NIST constants; REFERENCE value)', () => {
    const p = pressurePa(10 * FT, RHO);
    expect(p / 1000).toBeCloseTo(29.84, 2);
    expect(p / PSI).toBeCloseTo(4.33, 2);
  });
  it('1 psi of water is 2.31 ft (0.703 m) of head (common practice: hydraulics handbooks round 2.307 ft)', () => {
    const h = headForPressureM(PSI, RHO);
    expect(h).toBeCloseTo(0.704, 2);
    expect(h / FT).toBeCloseTo(2.31, 1);
  });
  it('4 ft of water is about 1.7 psi (common practice)', () => {
    expect(pressurePa(4 * FT, RHO) / PSI).toBeCloseTo(1.73, 1);
  });
});

describe('force to close F = rho g H A + F_pre', () => {
  it('a 4 mm bore against 10 ft of head needs 0.375 N, 38.2 gf (REFERENCE, p A); about 38 g (common practice)', () => {
    const f = closingForceN({ headM: 10 * FT, sealAreaM2: circleArea(0.004), preloadN: 0, densityKgM3: RHO });
    expect(f).toBeCloseTo(0.375, 3);
    expect(f / GF).toBeCloseTo(38.2, 1);
  });
  it('adds the preload unchanged', () => {
    const a = closingForceN({ headM: 1, sealAreaM2: 1e-5, preloadN: 0, densityKgM3: RHO });
    const b = closingForceN({ headM: 1, sealAreaM2: 1e-5, preloadN: 0.1, densityKgM3: RHO });
    expect(b - a).toBeCloseTo(0.1, 12);
  });
  it('circle area and its inverse (elementary geometry)', () => {
    expect(circleArea(5)).toBeCloseTo(19.635, 3);
    expect(diameterForArea(circleArea(5.75))).toBeCloseTo(5.75, 12);
  });
});

describe('bench calibration by least squares', () => {
  // Common practice bench figures: on a flat nozzle and closed-cell foam, 42.5 g (1.5 oz) stopped the
  // flow at 4 ft of head and 90 g at 10 ft; the line through them gives a preload near 0.107 N
  // (10.9 gf) and an equivalent seal diameter near 5.75 mm.
  const points = [
    { headM: 4 * FT, massKg: 0.0425 },
    { headM: 10 * FT, massKg: 0.09 },
  ];
  it('two points give the preload and the equivalent seal diameter', () => {
    const fit = fitSealCalibration(points, RHO, 0.1);
    expect(fit.preloadN).toBeCloseTo(0.107, 2);
    expect(fit.preloadN / GF).toBeGreaterThan(10.5);
    expect(fit.preloadN / GF).toBeLessThan(11.2);
    expect(fit.equivalentSealDiameterM * 1000).toBeCloseTo(5.75, 1);
    expect(fit.rmsResidualN).toBeLessThan(1e-12);
  });
  it('1.5 oz is 42.52 g (NIST SP 811)', () => {
    expect(1.5 * 28.349523125).toBeCloseTo(42.52, 2);
  });
  it('a third point on the same line changes nothing (least squares is exact on collinear data)', () => {
    const f2 = fitSealCalibration(points, RHO, 0.1);
    const mid = { headM: 7 * FT, massKg: (f2.preloadN + f2.sealAreaM2 * RHO * 9.80665 * 7 * FT) / 9.80665 };
    const f3 = fitSealCalibration([...points, mid], RHO, 0.1);
    expect(f3.preloadN).toBeCloseTo(f2.preloadN, 10);
    expect(f3.sealAreaM2).toBeCloseTo(f2.sealAreaM2, 14);
  });
  it('one point holds the default preload and fits the area alone', () => {
    const fit = fitSealCalibration([points[1]], RHO, 0.1);
    expect(fit.preloadN).toBe(0.1);
    const force = 0.09 * 9.80665;
    expect(fit.sealAreaM2).toBeCloseTo((force - 0.1) / (RHO * 9.80665 * 10 * FT), 12);
  });
  it('refuses points that do not rise with head', () => {
    expect(() => fitSealCalibration([{ headM: 1, massKg: 0.09 }, { headM: 2, massKg: 0.02 }], RHO, 0.1)).toThrow(/seal.calibration/);
  });
});
