import { describe, expect, it } from 'vitest';
import { gentModulusPa } from '../../generator/sizing/seal/gent-modulus-pa.ts';
import { filmAreaM2 } from '../../generator/sizing/seal/film-area-m2.ts';
import { gasketAreaM2 } from '../../generator/sizing/seal/gasket-area-m2.ts';
import { seatingForceN } from '../../generator/sizing/seal/seating-force-n.ts';
import { landStrain } from '../../generator/sizing/seal/land-strain.ts';
import { PADS, findPad, padNames } from '../../generator/sizing/seal/pads.ts';
import { leakToleranceMl } from '../../generator/sizing/float/leak-tolerance-ml.ts';
import { designBasis } from '../../generator/sizing/layout/design-basis.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import type { SizingFailure, SizingSuccess } from '../../generator/sizing/result.ts';
import type { DesignInputs } from '../../generator/sizing/inputs.ts';
import { defaultInputs } from './fixtures.ts';

const G = 9.80665; // NIST SP 330
const RHO = 998.2; // water at 20 C, CRC Handbook (IAPWS-95), from memory

function ok(inp: DesignInputs): SizingSuccess {
  const r = sizeDesign(inp);
  if (!r.ok) throw new Error(JSON.stringify(r.reasons));
  return r;
}
function refused(inp: DesignInputs): SizingFailure {
  const r = sizeDesign(inp);
  if (r.ok) throw new Error('expected a refusal');
  return r;
}

describe("Gent's relation, Young's modulus from Shore A", () => {
  // A. N. Gent (1958), Trans. Inst. Rubber Ind. 34, 46: S 30 -> 1.142 MPa, 50 -> 2.456 MPa, 70 -> 5.521 MPa
  it.each([
    [30, 1.142],
    [50, 2.456],
    [70, 5.521],
  ])('%i A gives %f MPa', (s, mpa) => {
    expect(gentModulusPa(s) / 1e6).toBeCloseTo(mpa, 3);
  });
  it('refuses a hardness outside 0..100', () => {
    expect(() => gentModulusPa(100)).toThrow(RangeError);
    expect(() => gentModulusPa(0)).toThrow(RangeError);
  });
});

describe('areas on the nozzle lip', () => {
  it('film force area of a flat land, r_o 1.0 mm, r_s 2.5 mm: pi (6.25 - 1) / (2 ln 2.5) = 9.00 mm2 (radial laminar flow; White, Viscous Fluid Flow)', () => {
    expect(filmAreaM2(0.002, 0.005) * 1e6).toBeCloseTo(9.0, 2);
  });
  it('gasket-factor area, d_o 2, d_s 5 mm, m 0.5: 9.62 + 8.25 = 17.87 mm2 (ASME BPVC VIII-1 Mandatory App. 2 form)', () => {
    expect(gasketAreaM2(0.002, 0.005, 0.5) * 1e6).toBeCloseTo(17.87, 2);
    // m = 0 leaves the end force inside G alone: pi/4 3.5^2 = 9.62 mm2
    expect(gasketAreaM2(0.002, 0.005, 0) * 1e6).toBeCloseTo(9.62, 2);
    expect(() => gasketAreaM2(0.005, 0.005, 0.5)).toThrow(RangeError);
  });
});

describe('seating force and land strain', () => {
  // the land ring pi G 2b = (pi/4)(d_s^2 - d_o^2) = (pi/4)(25 - 4) mm2 (elementary geometry)
  const ring = (Math.PI / 4) * (25 - 4) * 1e-6;
  it('the larger of y on the ring and the push that indents the pad (ASME App. 2 seating load; Hooke)', () => {
    const base = { meanDiameterM: 0.0035, effectiveWidthM: 0.00075, thicknessM: 0.003, seatingIndentationM: 0.0002 };
    // sponge 192 kPa, y 0: 192e3 x (0.2 / 3) x ring = 0.211 N
    expect(seatingForceN({ ...base, seatingStressPa: 0, stiffnessPa: 192e3 })).toBeCloseTo(192e3 * (0.2 / 3) * ring, 12);
    // 80 A rubber: y = 1.4 MPa (ASME Table 2-5.1, from memory) on the ring: 23.1 N, more than its indentation term
    expect(seatingForceN({ ...base, seatingStressPa: 1.4e6, stiffnessPa: 9e6 })).toBeCloseTo(1.4e6 * ring, 9);
  });
  it('uniaxial strain under the land, with the bore pressure taking p A_o (Hooke; our stated load split)', () => {
    const p = RHO * G * 2.2;
    const f = 0.6;
    const strain = landStrain({ forceN: f, pressurePa: p, boreAreaM2: Math.PI * 1e-6, landAreaM2: ring, stiffnessPa: 192e3 });
    expect(strain).toBeCloseTo((f - p * Math.PI * 1e-6) / ring / 192e3, 12);
    expect(strain * 3).toBeCloseTo(0.5, 1); // about 0.50 mm on a 3 mm pad
    expect(landStrain({ forceN: 0, pressurePa: p, boreAreaM2: Math.PI * 1e-6, landAreaM2: ring, stiffnessPa: 192e3 })).toBe(0);
  });
});

describe('pad table', () => {
  // ASTM D1056 compression-deflection grades, stress at 25 % deflection, from memory:
  // 0 under 14 kPa; 1: 14-34; 2: 34-62; 3: 62-90; 4: 90-117; 5: 117-165 kPa. Stiffness = middle / 0.25.
  const grades: [number, number, number][] = [[0, 0, 14], [1, 14, 34], [2, 34, 62], [3, 62, 90], [4, 90, 117], [5, 117, 165]];
  it.each(grades)('sponge grade %i sits in its D1056 range (secant modulus at 25 %)', (grade, lo, hi) => {
    const pad = findPad(`sponge grade ${grade}`)!;
    const stressAt25 = (pad.stiffnessPa * 0.25) / 1e3;
    expect(stressAt25).toBeGreaterThanOrEqual(lo);
    expect(stressAt25).toBeLessThanOrEqual(hi);
    expect(stressAt25).toBeCloseTo((lo + hi) / 2, 9);
  });
  it("rubbers follow Gent; gasket factors split at 75 A (ASME Table 2-5.1, from memory: m 0.50 y 0 below, m 1.00 y 1.4 MPa at or above)", () => {
    for (const s of [30, 40, 50, 60, 70]) {
      const pad = findPad(`rubber ${s}A`)!;
      expect(pad.stiffnessPa).toBeCloseTo(gentModulusPa(s), 6);
      expect([pad.gasketFactor, pad.seatingStressPa]).toEqual([0.5, 0]);
    }
    expect([findPad('rubber 80A')!.gasketFactor, findPad('rubber 80A')!.seatingStressPa]).toEqual([1, 1.4e6]);
  });
  it('finds names in any case and spacing; lists them; has no printed pad', () => {
    expect(findPad('SPONGE-GRADE-2')?.name).toBe('sponge grade 2');
    expect(findPad('sponge 2')?.name).toBe('sponge grade 2');
    expect(findPad('rubber 50')?.name).toBe('rubber 50A');
    expect(findPad('TPU 95A')).toBeUndefined();
    expect(padNames()).toHaveLength(PADS.length);
  });
});

describe('the pad in a sized design', () => {
  it('chooses the softest sponge that stays within 20 % at the tight seal (defaults, 2.2 m: grade 2, as the CLI test recomputes)', () => {
    const b = designBasis(defaultInputs());
    expect(b.pad.name).toBe('sponge grade 2');
    expect(b.strainAtSeal).toBeLessThanOrEqual(0.2);
    const softer = designBasis(defaultInputs({ padName: 'sponge grade 1' }));
    expect(softer.strainAtSeal).toBeGreaterThan(0.2);
    // sealForceN is the same model at any head: p(H) A + F_seat (hydrostatics)
    expect(b.sealForceN(1)).toBeCloseTo(RHO * G * 1 * b.sealAreaM2 + b.preloadN, 12);
    expect(b.forceAtHeadMaxN).toBeCloseTo(b.sealForceN(2.2), 12);
    expect(b.filmAreaM2 * 1e6).toBeCloseTo(9.0, 2);
    expect(b.boreAreaM2 * 1e6).toBeCloseTo(Math.PI, 12);
    expect(b.padStopIndentationMm).toBeCloseTo(0.75, 12);
    // at the low tank (1.6 m): the same contact model at p(1.6 m) and F_seal(1.6 m), shallower than at full tank
    const ring = (Math.PI / 4) * (25 - 4) * 1e-6;
    const p = RHO * G * 1.6;
    const strainLow = (b.sealForceN(1.6) - p * Math.PI * 1e-6) / ring / (b.padStiffnessKpa * 1e3);
    expect(b.indentationAtHeadMinMm).toBeCloseTo(strainLow * 3, 9);
    expect(b.indentationAtHeadMinMm).toBeLessThan(b.indentationMm);
  });
  it('worst strain in service is capped by the stop at 25 % (common practice); without it the flooded float would squeeze more', () => {
    const r = ok(defaultInputs());
    const ring = (Math.PI / 4) * (25 - 4) * 1e-6;
    // flooded with the tank empty: the whole lift on the land (Archimedes; Hooke)
    const flooded = r.float.availableForceN / ring / (r.seal.padStiffnessKpa * 1e3);
    expect(r.seal.worstStrainWithoutStop).toBeCloseTo(flooded, 9);
    expect(r.seal.worstStrain).toBe(Math.min(0.25, flooded));
  });
  it('refuses a pad the seal would squeeze past its stop, with ways out that size', () => {
    const inp = defaultInputs({ padName: 'sponge grade 0' });
    const r = refused(inp);
    expect(r.reasons[0].code).toBe('pad-on-stop');
    expect(r.waysOut.length).toBeGreaterThan(0);
    for (const w of r.waysOut) {
      const next =
        w.field === 'seal.pad'
          ? { ...inp, padName: w.value === 'auto' ? null : w.value }
          : { ...inp, padThicknessM: parseFloat(w.value) / 1e3 };
      expect(sizeDesign(next).ok, `${w.field} = ${w.value}`).toBe(true);
    }
  });
  it('warns when a named rubber pad is used, and about first-version keys', () => {
    expect(ok(defaultInputs({ padName: 'rubber 30A', maxOuterDiameterM: 0.25 })).warnings.map((w) => w.code)).toContain('rubber-pad');
    const old = ok(defaultInputs({ retiredFields: ['seal.preload', 'seal.indentation'] }));
    expect(old.warnings.find((w) => w.code === 'retired-fields')?.message).toContain('seal.preload and seal.indentation');
  });
  it('warns when bench points give an area below the bore or above twice the lip', () => {
    // two points on the line F = 0.1 N + A rho g H with A = 2 mm2, under the 3.14 mm2 bore (demo values)
    const line = (h: number, aMm2: number) => ({ headM: h, massKg: (0.1 + aMm2 * 1e-6 * RHO * G * h) / G });
    const small = ok(defaultInputs({ calibration: [line(0.5, 2), line(2, 2)] }));
    expect(small.warnings.map((w) => w.code)).toContain('calibration-area');
    const fine = ok(defaultInputs({ calibration: [line(0.5, 18), line(2, 18)] }));
    expect(fine.warnings.map((w) => w.code)).not.toContain('calibration-area');
    expect(fine.closingForce.modelAreaMm2).toBeCloseTo(18, 6);
    expect(fine.closingForce.seatN).toBeCloseTo(0.1, 9);
    const large = ok(defaultInputs({ calibration: [line(0.5, 40), line(2, 40)], padName: 'sponge grade 5', maxOuterDiameterM: 0.25 }));
    expect(large.warnings.map((w) => w.code)).toContain('calibration-area');
  });
});

describe('float integrity', () => {
  it('leak tolerance (F_avail - F_seal) / (rho g) (Archimedes): 0.786 N against 0.523 N is 26.9 mL', () => {
    expect(leakToleranceMl(0.786, 0.523, RHO)).toBeCloseTo((0.263 / (RHO * G)) * 1e6, 9);
    expect(leakToleranceMl(0.786, 0.523, RHO)).toBeCloseTo(26.9, 1);
  });
  it('a sized float: four-line shell, leak tolerance by Archimedes, and 1 mL raises the shut-off by 1 mL / A_float', () => {
    const r = ok(defaultInputs());
    expect(r.float.shellMm).toBeCloseTo(4 * 0.45, 12);
    expect(r.float.leakToleranceMl).toBeCloseTo(((r.float.availableForceN - r.closingForce.atHeadMaxN) / (RHO * G)) * 1e6, 9);
    // the seal is on the straight side, so the float sinks V / A_f for V taken in (Archimedes, cylinder)
    const areaMm2 = (Math.PI / 4) * r.float.outerDiameterMm ** 2;
    expect(r.float.levelRisePerMlMm).toBeCloseTo(1000 / areaMm2, 6);
    expect(r.float.dryMassG).toBeCloseTo(r.mass.byPart.float, 12);
  });
});

describe('container overflow', () => {
  it('refuses a tight shut-off within 10 mm of the overflow, with a lower target and a higher overflow that work', () => {
    const inp = defaultInputs({ overflowM: 0.05 }); // shut-off at full tank 45 mm, overflow 50 mm
    const r = refused(inp);
    expect(r.reasons[0].code).toBe('overflow');
    expect(r.reasons[0].message).toContain('50 mm');
    const target = r.waysOut.find((w) => w.field === 'level.target');
    const overflow = r.waysOut.find((w) => w.field === 'container.overflow');
    expect(target?.value).toBe('40 mm');
    expect(overflow?.value).toBe('55 mm');
    expect(sizeDesign({ ...inp, targetLevelM: 0.04 }).ok).toBe(true);
    expect(sizeDesign({ ...inp, overflowM: 0.055 }).ok).toBe(true);
    expect(ok(defaultInputs({ overflowM: 0.055 })).levels.overflowMm).toBeCloseTo(55, 9);
  });
});
