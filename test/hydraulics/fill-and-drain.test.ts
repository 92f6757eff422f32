import { describe, expect, it } from 'vitest';
import { drainAreaRequiredM2, fillTimeS } from '../../generator/sizing/hydraulics/index.ts';

describe('fillTimeS', () => {
  it('is area x rise / flow (source: volume balance): 0.12 m2 x 20 mm at 24 L/h takes 360 s', () => {
    expect(fillTimeS({ areaM2: 0.12, riseM: 0.02, flowM3s: 24 / 3.6e6 })).toBeCloseTo(360, 9);
  });
  it('returns null at zero flow and 0 for zero rise', () => {
    expect(fillTimeS({ areaM2: 0.12, riseM: 0.02, flowM3s: 0 })).toBeNull();
    expect(fillTimeS({ areaM2: 0.12, riseM: 0, flowM3s: 0 })).toBe(0);
  });
  it('names a bad field', () => {
    expect(() => fillTimeS({ areaM2: 0, riseM: 0.02, flowM3s: 1e-5 })).toThrow(/areaM2 = 0 .*> 0/);
    expect(() => fillTimeS({ areaM2: 0.1, riseM: -0.02, flowM3s: 1e-5 })).toThrow(/riseM = -0.02/);
  });
});

describe('drainAreaRequiredM2', () => {
  // source: orifice equation A = Q / (C_d sqrt(2 g dh)), g = 9.80665 (NIST SP 330), C_d 0.61 (standard texts, from memory)
  it('passes 100 L/h at 2 mm of level difference through 229.9 mm2', () => {
    const a = drainAreaRequiredM2({ flowM3s: 100 / 3.6e6 });
    expect(a * 1e6).toBeCloseTo(229.92, 2);
    expect(a).toBeCloseTo(100 / 3.6e6 / (0.61 * Math.sqrt(2 * 9.80665 * 0.002)), 14);
  });
  it('scales as 1/sqrt(dh) and 1/C_d', () => {
    const base = drainAreaRequiredM2({ flowM3s: 1e-5, headLossM: 0.002, dischargeCoefficient: 0.61 });
    expect(drainAreaRequiredM2({ flowM3s: 1e-5, headLossM: 0.008, dischargeCoefficient: 0.61 })).toBeCloseTo(base / 2, 14);
    expect(drainAreaRequiredM2({ flowM3s: 1e-5, headLossM: 0.002, dischargeCoefficient: 0.305 })).toBeCloseTo(base * 2, 14);
    expect(drainAreaRequiredM2({ flowM3s: 0 })).toBe(0);
  });
  it('names a bad field', () => {
    expect(() => drainAreaRequiredM2({ flowM3s: 1e-5, headLossM: 0 })).toThrow(/headLossM = 0 .*> 0/);
  });
});
