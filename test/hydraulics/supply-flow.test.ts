import { describe, expect, it } from 'vitest';
import { jetHeadM, reynoldsNumber, supplyFlow, tubeHeadLossM } from '../../generator/sizing/hydraulics/index.ts';

// Water at 20 C: 998.2 kg/m3 (CRC Handbook, IAPWS-95, from memory), 1.0016 mPa s (IAPWS 2008, from memory).
const water = { densityKgM3: 998.2, viscosityPaS: 1.0016e-3 };
const g = 9.80665; // NIST SP 330
const tube = { tubeInnerDiameterM: 0.004, tubeLengthM: 5 };
// An orifice so wide its jet head is nil, and no entrance loss: the tube alone resists.
const tubeOnly = { ...tube, ...water, orificeM: 1, entranceLossK: 0 };

/** Colebrook by fixed-point iteration, written here, independent of the code under test. */
function colebrook(reynolds: number, relativeRoughness: number): number {
  let x = 8;
  for (let i = 0; i < 200; i++) x = -2 * Math.log10(relativeRoughness / 3.7 + (2.51 * x) / reynolds);
  return 1 / (x * x);
}

describe('supplyFlow against Hagen-Poiseuille', () => {
  // source: Q = pi d^4 dp / (128 mu l), computed for water at 20 C, d 4 mm, l 5 m (REFERENCE-CHECKS, pipe flow)
  it('0.5 m of head through the tube alone: v 0.489 m/s, Re 1948, Q 22.1 L/h', () => {
    const r = supplyFlow({ headM: 0.5, ...tubeOnly });
    expect(r.tubeVelocityMS).toBeCloseTo(0.489, 3);
    expect(r.reynolds).toBeCloseTo(1948, 0);
    expect(r.flowLph).toBeCloseTo(22.1, 1);
    expect(r.regime).toBe('laminar');
    expect(r.frictionFactor).toBeCloseTo(64 / r.reynolds, 12);
    const hagenPoiseuilleM3s = (Math.PI * 0.004 ** 4 * 998.2 * g * 0.5) / (128 * 1.0016e-3 * 5);
    expect(r.flowM3s / hagenPoiseuilleM3s).toBeCloseTo(1, 9);
  });

  it('tubeHeadLossM: 22.107 L/h through 5 m of 4 mm tube loses 0.500 m (Hagen-Poiseuille)', () => {
    const flowM3s = (Math.PI * 0.004 ** 4 * 998.2 * g * 0.5) / (128 * 1.0016e-3 * 5);
    expect(flowM3s * 3.6e6).toBeCloseTo(22.107, 3);
    expect(tubeHeadLossM({ flowM3s, innerDiameterM: 0.004, lengthM: 5, ...water })).toBeCloseTo(0.5, 12);
    expect(tubeHeadLossM({ flowM3s: 0, innerDiameterM: 0.004, lengthM: 5, ...water })).toBe(0);
  });

  it('reynoldsNumber: v 0.48867 m/s in 4 mm gives Re 1948 (definition of Re)', () => {
    const flowM3s = 0.48867 * Math.PI * 0.25 * 0.004 ** 2;
    expect(reynoldsNumber({ flowM3s, innerDiameterM: 0.004, ...water })).toBeCloseTo(1948, 0);
  });

  it('1.0 m of head leaves the laminar formula (v 0.977, Re 3896) for the transitional friction', () => {
    // source: pure laminar answer v = 0.977 m/s, Re = 3896 (REFERENCE-CHECKS), past the 2300 limit
    const r = supplyFlow({ headM: 1.0, ...tubeOnly });
    expect(r.regime).toBe('transitional');
    expect(r.tubeVelocityMS).toBeLessThan(0.977 * 0.9);
    expect(r.reynolds).toBeGreaterThan(2300);
    expect(r.reynolds).toBeLessThan(3896);
    // At Re 2300 the laminar loss is only 0.590 m (hand check), so the answer must lie above it.
    const vAt2300 = (2300 * 1.0016e-3) / (998.2 * 0.004);
    expect((64 / 2300) * (5 / 0.004) * (vAt2300 ** 2 / (2 * g))).toBeCloseTo(0.590, 3);
    // Energy balance with the friction bridge written out here: 64/2300 to Colebrook(4000), linear in Re.
    const rr = 1.5e-6 / 0.004;
    const f = 64 / 2300 + ((colebrook(4000, rr) - 64 / 2300) * (r.reynolds - 2300)) / 1700;
    expect(r.frictionFactor).toBeCloseTo(f, 10);
    expect(f * (5 / 0.004) * (r.tubeVelocityMS ** 2 / (2 * g))).toBeCloseTo(1.0, 8);
  });
});

describe('supplyFlow limits and defaults', () => {
  it('tends to Torricelli Q = C_d A_o sqrt(2 g H) when the tube vanishes (source: any fluid mechanics text)', () => {
    const torricelliM3s = 0.61 * Math.PI * 0.25 * 0.003 ** 2 * Math.sqrt(2 * g * 2.2);
    const r = supplyFlow({ headM: 2.2, tubeInnerDiameterM: 0.004, tubeLengthM: 1e-9, orificeM: 0.003, entranceLossK: 0, ...water });
    expect(r.flowM3s / torricelliM3s).toBeCloseTo(1, 6);
    expect(jetHeadM({ flowM3s: 2.83236e-5, orificeM: 0.003 })).toBeCloseTo(2.2, 4); // doc example
  });

  it('gives zero flow, no NaN, at zero head', () => {
    const r = supplyFlow({ headM: 0, ...tube, orificeM: 0.003, ...water });
    expect(r).toEqual({ flowM3s: 0, flowLph: 0, tubeVelocityMS: 0, reynolds: 0, regime: 'laminar', boreModel: 'orifice', frictionFactor: null });
  });

  it('rises with head and falls with the entrance loss (defaults K_in 0.5, C_d 0.61 from Crane TP-410 / standard texts, from memory)', () => {
    const base = { ...tube, orificeM: 0.003, ...water };
    const heads = [0.2, 0.5, 1, 1.5, 2.2, 3];
    const flows = heads.map((headM) => supplyFlow({ headM, ...base }).flowM3s);
    flows.slice(1).forEach((q, i) => expect(q).toBeGreaterThan(flows[i]!));
    expect(supplyFlow({ headM: 2.2, ...base }).flowM3s).toBeLessThan(supplyFlow({ headM: 2.2, ...base, entranceLossK: 0 }).flowM3s);
    // the defaults are the ones named
    expect(supplyFlow({ headM: 2.2, ...base }).flowM3s).toBe(
      supplyFlow({ headM: 2.2, ...base, entranceLossK: 0.5, dischargeCoefficient: 0.61, roughnessM: 1.5e-6 }).flowM3s,
    );
  });

  it('solves the full energy balance to 1e-10 with the default losses', () => {
    const r = supplyFlow({ headM: 2.2, ...tube, orificeM: 0.003, ...water });
    const loss =
      ((0.5 + ((r.frictionFactor ?? 0) * 5) / 0.004) * r.tubeVelocityMS ** 2) / (2 * g) +
      (r.flowM3s / (0.61 * Math.PI * 0.25 * 0.003 ** 2)) ** 2 / (2 * g);
    expect(Math.abs(loss - 2.2)).toBeLessThan(1e-8);
  });

  it('throws a RangeError naming the option, its value and the range', () => {
    const ok = { headM: 1, ...tube, orificeM: 0.003, ...water };
    expect(() => supplyFlow({ ...ok, headM: -1 })).toThrow(/headM = -1 is out of range; allowed: a finite number >= 0/);
    expect(() => supplyFlow({ ...ok, tubeInnerDiameterM: 0 })).toThrow(/tubeInnerDiameterM = 0 .*> 0/);
    expect(() => supplyFlow({ ...ok, orificeM: Number.POSITIVE_INFINITY })).toThrow(/orificeM = Infinity/);
    expect(() => supplyFlow({ ...ok, viscosityPaS: Number.NaN })).toThrow(RangeError);
    expect(() => supplyFlow({ ...ok, dischargeCoefficient: 1.2 })).toThrow(/dischargeCoefficient = 1.2 .*<= 1/);
    expect(() => supplyFlow({ ...ok, roughnessM: 0.001 })).toThrow(/roughnessM = 0.001 .*tenth of tubeInnerDiameterM/);
    expect(() => supplyFlow({ ...ok, headM: '2 m' as unknown as number })).toThrow(/headM = "2 m"/);
  });
});
