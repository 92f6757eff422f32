/**
 * Counterexamples the fuzzing (fast-check property testing) found, kept as
 * plain tests so they replay on every run. Each names the defect and its fix.
 * Hydrostatics for the expectations: the closing force F = F_pre + A rho g H must
 * grow with the head H, so bench masses that fall as the head rises cannot be fitted.
 */
import { direct } from '../sizing/fixtures.ts';
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import { checkInfeasible } from './checks.ts';

function refusal(doc: unknown) {
  const parsed = parseDesign(doc);
  expect(parsed.ok).toBe(false);
  return parsed.ok ? [] : parsed.errors;
}

describe('regressions found by the fuzzing', () => {
  it('bench points that fall with head are refused at the door (was: RangeError escaping sizeDesign)', () => {
    // shrunk counterexample of sizing.property.test.ts (first run): masses fall as the head rises
    const errors = refusal({
      supply: { headMax: '1.143111666154534 ft' },
      level: { target: '22.5 mm' },
      seal: { calibration: [{ head: 0.615422826838, mass: '1.8233 g' }, { head: 0.01, mass: '2.6218 g' }] },
    });
    expect(errors.map((e) => e.field)).toEqual(['seal.calibration']);
    expect(errors[0].message).toMatch(/1\.8233 g at 0\.6154\d* m/); // the values
    expect(errors[0].message).toMatch(/more than 0 mm2/); // the allowed range
    // one point under the pad's seating force: m g = 0.1 g * 9.80665 m/s2 = 0.98 mN, far below any pad's (seed run 2, explore script)
    const one = refusal({ supply: { headMax: '2 m' }, level: { target: '40 mm' }, seal: { calibration: [{ head: 0.01, mass: '0.1 g' }] } });
    expect(one[0].field).toBe('seal.calibration');
    expect(one[0].message).toMatch(/one bench point can only set the seal's area, with the pad's own seating force of [\d.]+ N/);
    // two heads 0.8 % apart count as one (soak seed 555637040, #167: was "do not rise with head" for masses that rise)
    const close = refusal({
      supply: { headMax: '0.18 m' }, level: { target: '48 mm' }, nozzle: { sealDiameter: '2.4 mm' },
      seal: { pad: 'sponge-2', calibration: [{ head: 0.0552654225586, mass: '1.2798 g' }, { head: 0.0557165386943, mass: '1.2902 g' }] },
    });
    expect(close[0].field).toBe('seal.calibration');
    expect(close[0].message).toMatch(/heads less than 1 % apart \(they count as one head\)/);
    expect(close[0].message).not.toMatch(/do not rise/);
  });

  it('a design no float can lift says why (was: a failure with no reasons)', () => {
    // one bench point of 51 g at 1 cm: A_eff = (0.5 N - 0.1 N) / (rho g 0.01 m), about 41 cm2, 122 N to close at 3.05 m
    const parsed = parseDesign({ supply: { headMax: '3.05 m' }, level: { target: '40 mm' }, seal: { calibration: [{ head: 0.01, mass: '51 g' }] } });
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const result = sizeDesign(parsed.inputs);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(checkInfeasible(result)).toEqual([]);
    // since the pad model: 122 N on a 16.5 mm2 land would crush any table pad past its stop, which is said first
    expect(result.reasons.map((r) => r.code)).toContain('pad-on-stop');
    expect(result.reasons[0].message).toMatch(/past the hard stop/);
  });
});

describe('regressions found by the build property (build.property.test.ts)', () => {
  it('a wide lip on fine lines: the guide\'s stop ring clears the pad (was: 0.0385 mm3 of housing in the pad at seal, FUZZ_SEED=1356777560)', () => {
    // 7.1 mm lip, 0.2 mm lines: the nozzle's shoulder (10.9 mm) is narrower than the pad (11.5 mm), which stands proud
    // of the float into the stop ring's height at seal; the ring's bore must clear the wider of the two (plain geometry)
    const parsed = parseDesign({
      supply: { headMax: '0.58 m', tubeLength: '0 m' },
      level: { target: '25 mm' },
      nozzle: { orifice: '2 mm', sealDiameter: '7.0967 mm' },
      print: { material: 'nylon 12', lineWidth: '0.2 mm' },
      reserve: 3,
    });
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const s = sizeDesign(parsed.inputs);
    expect(s.ok).toBe(true);
    if (!s.ok) return;
    const d = direct(s);
    expect(d.parts.housing.guide.stopBoreMm).toBeGreaterThanOrEqual(d.parts.float.padDiameterMm + 2 * 0.25);
    expect(d.parts.housing.guide.stopBoreMm).toBeGreaterThanOrEqual(d.parts.nozzle.shoulderDiameterMm + 2 * 0.25);
  });
});

describe('regressions found by the rejection properties (one field junk or out of range)', () => {
  it('"1e308 m" for a millimetre field is refused (was: accepted, as Infinity mm slipped past the range check)', () => {
    const parsed = parseDesign({ supply: { headMax: '2 m', tubeInnerDiameter: '1e308 m' }, level: { target: '40 mm' } });
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.errors[0].field).toBe('supply.tubeInnerDiameter');
    expect(parsed.errors[0].message).toContain('"1e308 m"');
    expect(parsed.errors[0].message).not.toContain('Infinity');
  });

  it('the largest double is shown with its digits (was: "Infinity N is too high")', () => {
    const parsed = parseDesign({ supply: { headMax: '2 m' }, level: { target: '40 mm' }, seal: { preload: Number.MAX_VALUE } });
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.errors[0].message).toMatch(/^1\.797693135e\+308 N is too high; the pad preload must be from 0 N to 5 N\./);
  });

  it('a value a hair past a bound is taken as the bound (was: -5e-324 m of tube accepted, then a RangeError in the hydraulics)', () => {
    // the schema forgives a billionth of the bound for unit rounding; the sizing core must then see the bound
    for (const tubeLength of [-5e-324, -1e-12, '-0.000000000001 m', -0]) {
      const parsed = parseDesign({ supply: { headMax: '2 m', tubeLength }, level: { target: '40 mm' } });
      expect(parsed.ok).toBe(true);
      if (!parsed.ok) return;
      expect(Object.is(parsed.inputs.tubeLengthM, 0) || parsed.inputs.tubeLengthM === 0).toBe(true);
      expect(() => sizeDesign(parsed.inputs)).not.toThrow();
    }
    const high = parseDesign({ supply: { headMax: '2 m' }, level: { target: '30.0000000001 cm' } });
    expect(high.ok && high.inputs.targetLevelM).toBe(0.3); // the bound, 300 mm (issue 13 raised it from 250)
  });
});

describe('regressions found by the hostile documents (cli-hostile.test.ts)', () => {
  it('a design nested 5000 levels deep is refused with a message (was: "Maximum call stack size exceeded", exit 1)', async () => {
    const { mergeOverrides } = await import('../../generator/doc/schema.ts');
    let deep: unknown = 2;
    for (let i = 0; i < 5000; i++) deep = [deep];
    const doc = { supply: { headMax: deep }, level: { target: '40 mm' } };
    // the command line merges its flags into the file's document; that copy used to overflow the stack
    const merged = mergeOverrides(doc, { 'level.target': '45 mm' });
    const parsed = parseDesign(merged);
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.errors[0].message).toMatch(/nested more than 16 levels/);
    expect(parseDesign(mergeOverrides(doc, {})).ok).toBe(false);
  });
});

describe('regressions found by applying the ways out (sizing.property.test.ts)', () => {
  it('a higher target offered as a way out sizes when applied (was: "at least 154 mm", which then broke the 250 mm part cap)', () => {
    // 21.87 kPa of a 1200 kg/m3 liquid on a 26.9 mm lip: a big float whose housing, lifted by a higher target, outgrew 250 mm
    const doc = {
      supply: { headMax: '21.87 kPa' }, level: { target: '5 mm' }, liquid: { density: '1200 kg/m3' },
      // indentation 0.5 mm (was 0.05: a 26.9 mm lip under a pad pressed 0.05 mm is now refused by the tilt rule first)
      nozzle: { orifice: '2 mm', sealDiameter: '26.9 mm' }, seal: { indentation: 0.5, padDensity: '0.25 g/cm3' },
      print: { wall: '0.9 mm' }, reserve: 1.85,
    };
    const parsed = parseDesign(doc);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    const result = sizeDesign(parsed.inputs);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    const level = result.waysOut.find((w) => w.field === 'level.target')!;
    const foot = result.waysOut.find((w) => w.field === 'limits.maxOuterDiameter');
    const fixed = parseDesign({ ...doc, level: { target: level.value }, ...(/together/.test(level.message) && foot ? { limits: { maxOuterDiameter: foot.value } } : {}) });
    expect(fixed.ok && sizeDesign(fixed.inputs).ok).toBe(true);
  });

  it('a level and foot offered together size when applied together (was: 118.5 mm with a 207 mm foot, which needed 210 mm; soak seed 1004493665 #244)', () => {
    const doc = {
      supply: { headMax: '11.251042719655233 mm' }, level: { target: '103.70254816985906 mm' },
      seal: { pad: 'rubber 80A', indentation: 0.05 }, limits: { maxOuterDiameter: '40.31629805966736 mm' },
    };
    const parsed = parseDesign(doc);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    const result = sizeDesign(parsed.inputs);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    const level = result.waysOut.find((w) => w.field === 'level.target')!;
    const foot = result.waysOut.find((w) => w.field === 'limits.maxOuterDiameter')!;
    expect(level.message).toBe(foot.message);
    const fixed = parseDesign({ ...doc, level: { target: level.value }, limits: { maxOuterDiameter: foot.value } });
    expect(fixed.ok && sizeDesign(fixed.inputs).ok).toBe(true);
  });
  it('a lever for a 25 mm feed tube: the nozzle\'s seat ends in front of the frame\'s cheeks (was: 30 to 208 mm3 of frame in the nozzle, soak seeds 279494411 to 279494444)', () => {
    const parsed = parseDesign({ supply: { headMax: '0.5 m', tubeInnerDiameter: '25 mm' }, level: { target: '25 mm' }, valve: { architecture: 'lever' } });
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const s = sizeDesign(parsed.inputs);
    expect(s.ok).toBe(true);
    if (!s.ok || s.architecture !== 'lever') return;
    // plain geometry along the arm: the seat bore, centred over the pad, clears the cheeks' front end by a print clearance
    const frame = s.parts.frame;
    expect(frame.padArmMm - frame.seatBoreMm / 2).toBeGreaterThanOrEqual(frame.postHalfLengthMm + 0.25 - 1e-9);
  });
  it('a deeper level is never offered above the rim the grower gave (was: the lever\'s level way out past a 16 mm rim, soak seeds 1644785480 to 1644785484)', () => {
    // the rim mount cannot hold 15 mm here, and the floor lever needs more than 16 mm of water: no level may be offered
    const doc = { supply: { headMax: '1.5 m' }, level: { target: '15 mm' }, limits: { maxOuterDiameter: '90 mm' }, container: { rimHeight: '16 mm', wallThickness: '3 mm' } };
    const parsed = parseDesign(doc);
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const s = sizeDesign(parsed.inputs);
    expect(s.ok).toBe(false);
    if (s.ok) return;
    for (const w of s.waysOut.filter((x) => x.field === 'level.target')) expect(Number.parseFloat(w.value)).toBeLessThanOrEqual(16);
    // each way out offered is one the document accepts
    for (const w of s.waysOut) {
      const changed = JSON.parse(JSON.stringify(doc));
      for (const c of [w, ...(w.also ?? [])]) {
        const [section, key] = c.field.split('.');
        changed[section!] = { ...(changed[section!] ?? {}), [key!]: c.value };
      }
      expect(parseDesign(changed).ok, `${w.field} = ${w.value}`).toBe(true);
    }
  });
});
