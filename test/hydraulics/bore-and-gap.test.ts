import { describe, expect, it } from 'vitest';
import { boreHeadM, boreModel, contractionLossK, darcyFrictionFactor, jetHeadM, supplyFlow } from '../../generator/sizing/hydraulics/index.ts';
import { filmFlowM3s } from '../../generator/sizing/hydraulics/film-flow-m3s.ts';
import { curtainFlowM3s } from '../../generator/sizing/hydraulics/curtain-flow-m3s.ts';

// Water at 20 C: 998.2 kg/m3 (CRC Handbook, from memory), 1.0016 mPa s (IAPWS 2008, from memory); g 9.80665 (NIST SP 330).
const rho = 998.2, mu = 1.0016e-3, g = 9.80665;

describe('sudden contraction (Crane TP-410)', () => {
  it('beta 0.5 gives K = 0.5 (1 - 0.25) = 0.375 on the small pipe velocity', () => {
    expect(contractionLossK(0.5)).toBeCloseTo(0.375, 12);
  });
  it('beta 1 (no contraction) loses nothing; beta out of range is refused by name', () => {
    expect(contractionLossK(1)).toBe(0);
    expect(() => contractionLossK(1.5)).toThrow(/beta/);
  });
});

describe('bore as a short tube against a sharp orifice', () => {
  it('three bore diameters or more is a short tube', () => {
    expect(boreModel(0.006, 0.002)).toBe('short-tube');
    expect(boreModel(0.0059, 0.002)).toBe('orifice');
  });
  it('loss coefficients 1.0 + 0.375 + f L/d against 1 / 0.61^2 = 2.69 (Crane TP-410; C_d 0.61 standard texts, from memory)', () => {
    // laminar in the bore (Re 1000) so f = 64 / Re = 0.064 (Hagen-Poiseuille): K = 1.375 + 0.064 x 10 = 2.015
    const d = 0.002, L = 0.02;
    const q = (1000 * mu * Math.PI * d) / (4 * rho);
    const v = q / (Math.PI * d * d / 4);
    const common = { flowM3s: q, boreM: d, tubeInnerDiameterM: 0.004, densityKgM3: rho, viscosityPaS: mu, dischargeCoefficient: 0.61 };
    const tube = boreHeadM({ ...common, boreLengthM: L });
    const orifice = boreHeadM({ ...common, boreLengthM: 0.001 });
    expect(tube).toBeCloseTo((2.015 * v * v) / (2 * g), 10);
    expect(orifice / tube).toBeCloseTo(2.6874 / 2.015, 3);
    expect(orifice).toBeCloseTo(jetHeadM({ flowM3s: q, orificeM: d }), 12);
  });
  it('the supply flow of a long bore is larger than the orifice flow at the same head', () => {
    const base = { headM: 2.2, tubeInnerDiameterM: 0.004, tubeLengthM: 5, orificeM: 0.002, densityKgM3: rho, viscosityPaS: mu };
    const a = supplyFlow(base);
    const b = supplyFlow({ ...base, boreLengthM: 0.02 });
    expect(a.boreModel).toBe('orifice');
    expect(b.boreModel).toBe('short-tube');
    expect(b.flowLph).toBeGreaterThan(a.flowLph);
  });
});

describe('friction bridge bounds (64/Re Hagen-Poiseuille; Colebrook 1939)', () => {
  it('low and high are the lesser and greater of the laminar and turbulent laws; linear lies between', () => {
    const re = 3000, e = 3.75e-4;
    const lam = 64 / re;
    const lo = darcyFrictionFactor(re, e, 'low');
    const hi = darcyFrictionFactor(re, e, 'high');
    expect(lo).toBeCloseTo(lam, 12);
    expect(hi).toBeGreaterThan(lam);
    const mid = darcyFrictionFactor(re, e);
    expect(mid).toBeGreaterThanOrEqual(lo);
    expect(mid).toBeLessThanOrEqual(hi);
  });
});

describe('radial film flow (lubrication theory; White, Viscous Fluid Flow)', () => {
  it('h 20 um, dp 20 kPa, mu 1.0016 mPa s, r_s/r_o 2.5 gives 9.13e-8 m3/s (0.33 L/h)', () => {
    const q = filmFlowM3s(20e-6, 20e3, 0.002, 0.005, 1.0016e-3);
    expect(q).toBeCloseTo(9.13e-8, 10);
    expect(q * 3.6e6).toBeCloseTo(0.33, 2);
  });
  it('goes as the cube of the gap', () => {
    expect(filmFlowM3s(40e-6, 1, 0.002, 0.005, mu) / filmFlowM3s(20e-6, 1, 0.002, 0.005, mu)).toBeCloseTo(8, 10);
  });
});

describe('curtain orifice (orifice equation on pi d_o h; C_d 0.61 from memory)', () => {
  it('d_o 2 mm, h 0.5 mm, 20 kPa: 0.61 pi 2e-3 5e-4 sqrt(2 x 2e4 / 998.2) = 43.67 L/h', () => {
    expect(curtainFlowM3s(5e-4, 2e4, 0.002, rho, 0.61) * 3.6e6).toBeCloseTo(43.672, 2);
  });
});
