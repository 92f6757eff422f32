// Unit conversions checked two ways: against the exact constants of NIST SP 811
// (App. B) and the standard-gravity definition (3rd CGPM 1901, NIST SP 330), and
// against js-quantities (npm, 1.8.0), an independent general-purpose unit library.
import Qty from 'js-quantities';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  expectedHint,
  formatQuantity,
  fromSi,
  headFromPressure,
  parseArea,
  parseDensity,
  parseForce,
  parseHead,
  parseLength,
  parseMass,
  parseNumber,
  parseQuantity,
  parseViscosity,
  toSi,
  type ValueResult,
} from '../../generator/doc/units.ts';
import { UNITS } from '../../generator/doc/unit-table.ts';

function value(result: ValueResult): number {
  if (!result.ok) throw new Error(result.message);
  return result.value;
}
function message(result: ValueResult): string {
  if (result.ok) throw new Error(`expected a refusal, got ${result.value}`);
  return result.message;
}

describe('exact constants (NIST SP 811, App. B)', () => {
  it('1 in = 25.4 mm and 1 ft = 0.3048 m (international yard and pound, 1959; NIST SP 811)', () => {
    expect(value(parseLength('1 in'))).toBe(0.0254);
    expect(value(parseLength('1 ft'))).toBe(0.3048);
    expect(value(parseLength('10 ft'))).toBeCloseTo(3.048, 12);
    expect(value(parseLength('12 in'))).toBeCloseTo(0.3048, 12);
  });

  it('1 psi = 6894.757 Pa (NIST SP 811, App. B.9)', () => {
    const result = parseQuantity('1 psi', 'pressure');
    expect(result.ok && result.quantity.si).toBe(6894.757);
  });

  it('1 oz (avoirdupois) = 28.349523125 g (NIST SP 811, App. B.9)', () => {
    expect(value(parseMass('1 oz'))).toBe(0.028349523125);
    expect(value(parseMass('16 oz'))).toBeCloseTo(0.45359237, 12); // 1 lb = 0.45359237 kg exactly (NIST SP 811)
  });

  it('1 gf = 9.80665 mN, and a mass given for a force is its weight in standard gravity (CGPM 1901)', () => {
    expect(value(parseForce('1 gf'))).toBeCloseTo(9.80665e-3, 15);
    expect(value(parseForce('1 g'))).toBeCloseTo(9.80665e-3, 15);
    expect(value(parseForce('1 kg'))).toBeCloseTo(9.80665, 12);
    expect(value(parseForce('1 oz'))).toBeCloseTo(0.028349523125 * 9.80665, 14);
    expect(value(parseForce('1 lbf'))).toBeCloseTo(4.4482216152605, 12); // NIST SP 811 App. B.9: 4.448222 N
    expect(value(parseForce('250 mN'))).toBeCloseTo(0.25, 15);
  });

  it('decimal prefixes carry no float noise (0.45 mm is 0.00045 m exactly)', () => {
    expect(value(parseLength('0.45 mm'))).toBe(0.00045);
    expect(value(parseLength(0.45))).toBe(0.00045);
    expect(toSi(2.4, 'mm')).toBe(0.0024);
    expect(fromSi(0.0024, 'mm')).toBe(2.4);
  });
});

describe('cross-check against js-quantities (independent npm reference)', () => {
  // [our text, our parser, js-quantities text, SI unit in js-quantities, relative tolerance]
  // js-quantities rounds psi to 6894.76 Pa and lbf to 4.448222 N, hence 1e-6 there.
  const cases: [string, (t: string) => ValueResult, string, string, number][] = [
    ['2.4 m', (t) => parseLength(t), '2.4 m', 'm', 1e-12],
    ['40 mm', (t) => parseLength(t), '40 mm', 'm', 1e-12],
    ['4.5 cm', (t) => parseLength(t), '4.5 cm', 'm', 1e-12],
    ['1.5 in', (t) => parseLength(t), '1.5 in', 'm', 1e-12],
    ['7 ft', (t) => parseLength(t), '7 ft', 'm', 1e-12],
    ['3 psi', (t) => ({ ok: true, value: (parseQuantity(t, 'pressure') as { quantity: { si: number } }).quantity.si }), '3 psi', 'Pa', 1e-6],
    ['21 kPa', (t) => ({ ok: true, value: (parseQuantity(t, 'pressure') as { quantity: { si: number } }).quantity.si }), '21 kPa', 'Pa', 1e-12],
    ['1.27 g/cm3', (t) => parseDensity(t), '1.27 g/cm^3', 'kg/m^3', 1e-12],
    ['998.2 kg/m3', (t) => parseDensity(t), '998.2 kg/m^3', 'kg/m^3', 1e-12],
    ['1.02 g/mL', (t) => parseDensity(t), '1.02 g/ml', 'kg/m^3', 1e-12],
    ['31 g', (t) => parseMass(t), '31 g', 'kg', 1e-12],
    ['0.25 kg', (t) => parseMass(t), '0.25 kg', 'kg', 1e-12],
    ['2 oz', (t) => parseMass(t), '2 oz', 'kg', 1e-9], // js-quantities stores the ounce as 0.0283495231 kg
    ['0.12 m2', (t) => parseArea(t), '0.12 m^2', 'm^2', 1e-12],
    ['1200 cm2', (t) => parseArea(t), '1200 cm^2', 'm^2', 1e-12],
    ['186 in2', (t) => parseArea(t), '186 in^2', 'm^2', 1e-12],
    ['1.3 ft2', (t) => parseArea(t), '1.3 ft^2', 'm^2', 1e-12],
    ['350 mm2', (t) => parseArea(t), '350 mm^2', 'm^2', 1e-12],
    ['1 cP', (t) => parseViscosity(t), '1 cP', 'Pa*s', 1e-12],
    ['1.0016 mPa s', (t) => parseViscosity(t), '1.0016 mPa*s', 'Pa*s', 1e-12],
    ['0.002 Pa s', (t) => parseViscosity(t), '0.002 Pa*s', 'Pa*s', 1e-12],
    ['1 lbf', (t) => parseForce(t), '1 lbf', 'N', 1e-6],
  ];
  it.each(cases)('%s', (text, parse, qtyText, qtyUnit, tolerance) => {
    const ours = value(parse(text));
    const theirs = Qty(qtyText).to(qtyUnit).scalar;
    expect(Math.abs(ours - theirs) / Math.abs(theirs)).toBeLessThan(tolerance);
  });

  it('a mass read as a force matches m * 9.80665 m/s2 computed by js-quantities', () => {
    const theirs = Qty('31 g').mul(Qty('9.80665 m/s^2')).to('N').scalar;
    expect(value(parseForce('31 g'))).toBeCloseTo(theirs, 12);
  });

  it('every length, area, density and mass unit in our table agrees with js-quantities where it knows the unit', () => {
    const names: Record<string, string> = {
      mm: 'mm', cm: 'cm', m: 'm', in: 'in', ft: 'ft', 'kg/m3': 'kg/m^3', 'g/cm3': 'g/cm^3', mg: 'mg', g: 'g', kg: 'kg', lb: 'lb',
      mm2: 'mm^2', cm2: 'cm^2', m2: 'm^2', in2: 'in^2', ft2: 'ft^2', Pa: 'Pa', kPa: 'kPa', hPa: 'hPa', bar: 'bar', mbar: 'mbar', N: 'N',
    };
    const siName: Record<string, string> = { length: 'm', area: 'm^2', density: 'kg/m^3', mass: 'kg', pressure: 'Pa', force: 'N' };
    let compared = 0;
    for (const unit of UNITS) {
      const theirName = names[unit.symbol];
      if (!theirName) continue;
      const theirs = Qty(`1 ${theirName}`).to(siName[unit.dimension]).scalar;
      expect(Math.abs(unit.toSi - theirs) / theirs, unit.symbol).toBeLessThan(1e-9);
      compared++;
    }
    expect(compared).toBe(Object.keys(names).length);
  });
});

describe('head given as a pressure: H = p / (rho g)', () => {
  it('1 psi of water is about 2.31 ft (0.703 m) of head (common practice: hydraulics handbooks round 2.307 ft at 60 F)', () => {
    const headM = value(parseHead('1 psi', 998.2));
    expect(headM).toBeCloseTo(0.703, 2);
    expect(headM / 0.3048).toBeCloseTo(2.31, 1);
  });

  it('10 ft (3.048 m) of water at 998.2 kg/m3 is 29.84 kPa and 4.33 psi (computed from the NIST constants)', () => {
    expect(value(parseHead('29.84 kPa', 998.2))).toBeCloseTo(3.048, 3);
    expect(value(parseHead('4.33 psi', 998.2))).toBeCloseTo(3.048, 2);
    expect(headFromPressure(998.2 * 9.80665 * 3.048, 998.2)).toBeCloseTo(3.048, 12);
  });

  it('a head given as a height ignores the density; a bare number is in m', () => {
    expect(value(parseHead('7 ft', 1100))).toBeCloseTo(2.1336, 12);
    expect(value(parseHead(2.2, 998.2))).toBe(2.2);
    expect(value(parseHead('2.2', 998.2))).toBe(2.2);
  });
});

describe('tolerant spelling', () => {
  it.each([
    ['2.4m', 2.4],
    ['2.4 M', 2.4],
    ['  2.4   metres ', 2.4],
    ['40MM', 0.04],
    ['40 Millimeters', 0.04],
    ['4.0 cm', 0.04],
    ['1.5"', 0.0381],
    ['1.5 inch', 0.0381],
    ["7'", 2.1336],
    ['7 feet', 2.1336],
    ['.5 in', 0.0127],
    ['+3 mm', 0.003],
    ['1e3 mm', 1],
    ['40', 0.04],
  ])('%s is a length of %f m', (text, metres) => {
    expect(value(parseLength(text))).toBeCloseTo(metres, 12);
  });

  it('accepts unicode superscripts, middle dots and carets in units', () => {
    expect(value(parseArea('0.12 m²'))).toBeCloseTo(0.12, 12);
    expect(value(parseArea('0.12 m^2'))).toBeCloseTo(0.12, 12);
    expect(value(parseDensity('1.27 g/cm³'))).toBeCloseTo(1270, 9);
    expect(value(parseDensity('998 KG/M3'))).toBeCloseTo(998, 9);
    expect(value(parseViscosity('1 mPa·s'))).toBeCloseTo(0.001, 15);
    expect(value(parseViscosity('1 mpa.s'))).toBeCloseTo(0.001, 15);
    expect(value(parseViscosity('1 cp'))).toBeCloseTo(0.001, 15);
  });

  it('takes bare numbers in the field unit given', () => {
    expect(value(parseLength(5, 'm'))).toBe(5);
    expect(value(parseDensity(1.27, 'g/cm3'))).toBeCloseTo(1270, 9);
    expect(value(parseMass(31))).toBeCloseTo(0.031, 15);
    expect(value(parseForce(0.1))).toBe(0.1);
    expect(value(parseViscosity(1.0016))).toBeCloseTo(1.0016e-3, 15);
    expect(value(parseNumber('1.5'))).toBe(1.5);
    expect(value(parseNumber(2))).toBe(2);
  });
});

describe('refusals say what was expected', () => {
  it('"abc" is not a length (the wording asked for)', () => {
    expect(message(parseLength('abc'))).toBe(
      '"abc" is not a length; use a number in mm or a value with a unit such as "40 mm", "4 cm", "1.5 in"',
    );
  });

  it('a decimal comma is refused with the fix, not guessed', () => {
    const text = message(parseLength('2,4 m'));
    expect(text).toContain('comma');
    expect(text).toContain('"2.4 m"');
    expect(message(parseLength('1,000 mm'))).toContain('comma');
  });

  it('names an unknown unit and a unit of the wrong kind', () => {
    expect(message(parseLength('40 mmm'))).toContain('unknown unit "mmm"');
    expect(message(parseLength('40 kPa'))).toContain('kPa measures pressure');
    expect(message(parseMass('3 N'))).toContain('N measures force');
    expect(message(parseHead('40 g', 998.2))).toContain('is not a head');
    expect(message(parseNumber('1.5 mm'))).toContain('no unit expected');
  });

  it('refuses other types, empty text, non-finite numbers and compound values', () => {
    expect(message(parseLength(true))).toMatch(/^true is not a length/);
    expect(message(parseLength(null))).toMatch(/^null is not a length/);
    expect(message(parseLength({ value: 3 }))).toMatch(/^an object is not a length/);
    expect(message(parseLength([3]))).toMatch(/^a list is not a length/);
    expect(message(parseLength(''))).toContain('empty');
    expect(message(parseLength(Number.NaN))).toContain('not a finite number');
    expect(message(parseLength(Infinity))).toContain('not a finite number');
    expect(message(parseLength('Infinity mm'))).toContain('is not a length');
    expect(message(parseLength('2 m 6 cm'))).toContain('unknown unit'); // feet and inches are the one compound taken
    expect(message(parseLength('x'.repeat(100)))).toContain('longer than');
  });

  it('hints match the field unit', () => {
    expect(expectedHint('length', 'm')).toContain('"16 ft"');
    expect(expectedHint('head')).toContain('"3 psi"');
    expect(expectedHint('force')).toContain('"10 gf"');
  });
});

describe('formatting', () => {
  it('writes SI values in a unit without float noise', () => {
    expect(formatQuantity(0.0024, 'mm')).toBe('2.4 mm');
    expect(formatQuantity(0.00045, 'mm')).toBe('0.45 mm');
    expect(formatQuantity(1270, 'g/cm3')).toBe('1.27 g/cm3');
    expect(formatQuantity(1.0016e-3, 'mPa s')).toBe('1.0016 mPa s');
  });

  it('property: a value written with formatQuantity parses back to itself', () => {
    const units = ['mm', 'cm', 'm', 'in', 'ft'];
    fc.assert(
      fc.property(fc.double({ min: 1e-4, max: 1e3, noNaN: true }), fc.constantFrom(...units), (si, unit) => {
        const back = value(parseLength(formatQuantity(si, unit, 15)));
        return Math.abs(back - si) <= 1e-12 * si;
      }),
    );
  });
});

// Feet and inches together, and fractions, as tape measures and US hardware are marked. Expected values from the
// exact definitions 1 ft = 0.3048 m and 1 in = 0.0254 m (NIST SP 811, App. B); cross-checked with js-quantities.
describe('feet and inches, and fractions (NIST SP 811, App. B)', () => {
  it("7' 2\" and 7 ft 2 in are 86 in = 2.1844 m", () => {
    const expected = 86 * 0.0254;
    for (const text of [`7' 2"`, '7 ft 2 in', "7'2\"", '7ft 2in', '7 feet 2 inches', "7' 2", '7 ft 2', '7\u2032 2\u2033']) {
      expect(value(parseLength(text)), text).toBeCloseTo(expected, 12);
    }
    expect(expected).toBeCloseTo(Qty('86 in').to('m').scalar, 12);
  });

  it('a head in feet and inches: 7 ft 2 in of water is 2.1844 m', () => {
    expect(value(parseHead('7 ft 2 in', 998.2))).toBeCloseTo(2.1844, 12);
  });

  it('fractions and mixed numbers: 5/32 in = 3.96875 mm, 1 1/2 in = 38.1 mm, 7 ft 2 1/2 in = 2.197 m', () => {
    expect(value(parseLength('5/32 in'))).toBeCloseTo(0.00396875, 15);
    expect(value(parseLength('5/32"'))).toBeCloseTo(0.00396875, 15);
    expect(value(parseLength('1 1/2 in'))).toBeCloseTo(0.0381, 15);
    expect(value(parseLength('1-1/2 in'))).toBeCloseTo(0.0381, 15);
    expect(value(parseLength('7 ft 2 1/2 in'))).toBeCloseTo(86.5 * 0.0254, 12);
    expect(value(parseLength('3/4', 'in'))).toBeCloseTo(0.01905, 15); // a bare fraction in the field's unit
    expect(value(parseLength('5/32 in'))).toBeCloseTo(Qty('5 in').div(32).to('m').scalar, 15);
  });

  it('refuses what a tape measure would not show, saying why', () => {
    expect(message(parseLength('7 ft 14 in'))).toMatch(/a foot or more/);
    expect(message(parseLength('1/0 in'))).toMatch(/over zero/);
    expect(message(parseMass("7' 2\""))).toMatch(/measure length/);
    expect(parseLength('7 ft 2 m').ok).toBe(false);
  });
});
