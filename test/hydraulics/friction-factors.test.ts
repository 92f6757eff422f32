import { describe, expect, it } from 'vitest';
import {
  blasiusFrictionFactor,
  colebrookFrictionFactor,
  darcyFrictionFactor,
  flowRegime,
  laminarFrictionFactor,
  swameeJainFrictionFactor,
} from '../../generator/sizing/hydraulics/index.ts';

/** Colebrook by plain fixed-point iteration, written here so the checks do not lean on the code under test. */
function colebrookByFixedPoint(reynolds: number, relativeRoughness: number): number {
  let x = 8;
  for (let i = 0; i < 200; i++) x = -2 * Math.log10(relativeRoughness / 3.7 + 2.51 / (reynolds / x));
  return 1 / (x * x);
}

describe('laminarFrictionFactor', () => {
  it('is 64/Re (source: Hagen-Poiseuille; White, Fluid Mechanics)', () => {
    expect(laminarFrictionFactor(2000)).toBeCloseTo(0.032, 12);
    expect(laminarFrictionFactor(1948)).toBeCloseTo(0.032854, 6);
  });
  it('refuses Re <= 0 with a message naming the field', () => {
    expect(() => laminarFrictionFactor(0)).toThrow(/reynolds = 0 .*> 0/);
    expect(() => laminarFrictionFactor(Number.NaN)).toThrow(RangeError);
  });
});

describe('colebrookFrictionFactor', () => {
  it('matches the published reference value at Re 1e5, e/D 1e-4', () => {
    // source: Colebrook (1939); reference value 0.018514 in Winning and Coole (2013), Flow Turbulence Combust. 90:1-27
    expect(colebrookFrictionFactor(1e5, 1e-4)).toBeCloseTo(0.018514, 6);
  });
  it('satisfies the Colebrook equation to 1e-12', () => {
    for (const [re, rr] of [[4000, 0], [1e5, 1e-4], [3e6, 1e-3], [1e8, 0.05]] as const) {
      const f = colebrookFrictionFactor(re, rr);
      const rhs = -2 * Math.log10(rr / 3.7 + 2.51 / (re * Math.sqrt(f)));
      expect(Math.abs(1 / Math.sqrt(f) - rhs) * Math.sqrt(f)).toBeLessThan(1e-12);
      expect(f).toBeCloseTo(colebrookByFixedPoint(re, rr), 12);
    }
  });
  it('tends to the fully rough law at very high Re', () => {
    // source: von Karman rough-pipe law 1/sqrt(f) = 2 log10(3.7 / (e/D)) (White, Fluid Mechanics, ch. 6)
    const rough = 1 / (2 * Math.log10(3.7 / 0.01)) ** 2;
    expect(colebrookFrictionFactor(1e12, 0.01) / rough).toBeCloseTo(1, 6);
  });
  it('refuses relative roughness past 0.1', () => {
    expect(() => colebrookFrictionFactor(1e5, 0.2)).toThrow(/relativeRoughness = 0.2 .*<= 0.1/);
  });
});

describe('cross-check formulas', () => {
  it('Swamee-Jain gives 0.018452, within 0.5 % of Colebrook', () => {
    // source: Swamee and Jain (1976), J. Hydraul. Div. ASCE 102(5)
    const sj = swameeJainFrictionFactor(1e5, 1e-4);
    expect(sj).toBeCloseTo(0.018452, 6);
    expect(Math.abs(sj / colebrookFrictionFactor(1e5, 1e-4) - 1)).toBeLessThan(0.005);
  });
  it('Blasius gives 0.017792 at Re 1e5 and lies within 2 % of smooth-pipe Colebrook', () => {
    // source: Blasius (1913), f = 0.3164 Re^-0.25
    expect(blasiusFrictionFactor(1e5)).toBeCloseTo(0.017792, 6);
    expect(Math.abs(blasiusFrictionFactor(1e5) / colebrookFrictionFactor(1e5, 0) - 1)).toBeLessThan(0.02);
  });
});

describe('darcyFrictionFactor and flowRegime', () => {
  const rr = 1.5e-6 / 0.004; // 1.5 um in a 4 mm tube (common practice roughness for drawn plastic tube)
  it('is 64/Re up to 2300 and Colebrook from 4000', () => {
    expect(darcyFrictionFactor(1948, rr)).toBeCloseTo(64 / 1948, 14);
    expect(darcyFrictionFactor(2300, rr)).toBeCloseTo(64 / 2300, 14);
    expect(darcyFrictionFactor(4000, rr)).toBeCloseTo(colebrookByFixedPoint(4000, rr), 12);
    expect(darcyFrictionFactor(1e5, 1e-4)).toBeCloseTo(0.018514, 6); // Colebrook; Winning and Coole (2013)
  });
  it('bridges linearly in Re between the two (doc example 0.034056 at Re 3150)', () => {
    const from = 64 / 2300;
    const to = colebrookByFixedPoint(4000, rr);
    expect(to).toBeCloseTo(0.040286, 6);
    expect(darcyFrictionFactor(3150, rr)).toBeCloseTo(from + 0.5 * (to - from), 12);
    expect(darcyFrictionFactor(3150, rr)).toBeCloseTo(0.034056, 6);
    // continuous at both ends
    expect(darcyFrictionFactor(2300 + 1e-9, rr)).toBeCloseTo(from, 9);
    expect(darcyFrictionFactor(4000 - 1e-9, rr)).toBeCloseTo(to, 9);
  });
  it('names the regime with the 2300 / 4000 limits (common practice)', () => {
    expect(flowRegime(0)).toBe('laminar');
    expect(flowRegime(1948)).toBe('laminar');
    expect(flowRegime(2300)).toBe('laminar');
    expect(flowRegime(2301)).toBe('transitional');
    expect(flowRegime(3896)).toBe('transitional');
    expect(flowRegime(4000)).toBe('turbulent');
    expect(() => flowRegime(-1)).toThrow(/reynolds = -1/);
  });
});
