/**
 * Quantities in sentences rewritten in US customary units. Each converted value
 * is checked against js-quantities (an independent unit library) and NIST SP 811
 * (2008), appendix B (1 in = 25.4 mm, 1 ft = 0.3048 m, 1 oz = 28.349523125 g,
 * 1 US gal = 3.785411784 L, 1 US fl oz = 29.57353 mL, 1 psi = 6.894757 kPa);
 * degrees Fahrenheit = 1.8 x degrees Celsius + 32 (NIST SP 811, 4.2.1.1).
 */
import Qty from 'js-quantities';
import { describe, expect, it } from 'vitest';
import { htmlInUnits, textInUnits } from '../../generator/doc/text-in-units.ts';

const imperial = (t: string) => textInUnits(t, 'imperial');
/** the number in a converted phrase */
const numberIn = (t: string) => Number(/([\d.]+)/.exec(t)![1]);

describe('textInUnits', () => {
  it('leaves metric text alone', () => {
    expect(textInUnits('The float drops 32.0 mm to its pin.', 'metric')).toBe('The float drops 32.0 mm to its pin.');
  });

  it('rewrites lengths, heads, masses, flows and pressures, agreeing with js-quantities', () => {
    const cases: [string, string, string][] = [
      ['The float drops 32.0 mm to its pin.', '32 mm', 'in'],
      ['a tank no higher than 1.23 m above the nozzle', '1.23 m', 'ft'],
      ['add 66 g of steel ballast', '66 g', 'oz'],
      ['at most 4.5 kg', '4.5 kg', 'lb'],
      ['a head of 30 kPa', '30 kPa', 'psi'],
    ];
    for (const [text, qty, unit] of cases) {
      const out = imperial(text);
      expect(out, text).toMatch(new RegExp(`\\d ${unit}\\b`));
      expect(numberIn(out.slice(out.search(/\d/)))).toBeCloseTo(Qty(qty).to(unit).scalar, 1);
    }
    // US gallon 3.785411784 L (NIST SP 811): 3.0 L/day = 0.793 gal/day (three significant digits, shownNumber); 1 L/h = 0.264 gal/h
    expect(imperial('while the plants drink 3.0 L/day')).toBe('while the plants drink 0.793 gal/day');
    expect(imperial('under 1 L/h: slow')).toBe('under 0.264 gal/h: slow');
    expect(imperial('drink 3.0 L a day')).toBe('drink 0.793 gal a day');
    expect(numberIn(imperial('take in 4.1 mL'))).toBeCloseTo(Qty('4.1 ml').to('floz').scalar, 3);
    expect(imperial('PLA softens near 55-60 °C')).toBe('PLA softens near 131-140 °F');
  });

  it('keeps print-scale lengths and areas in millimetres, and a range or pair in one unit', () => {
    expect(imperial('The 2.40 mm wall is 5.33 line widths (2.25 mm).')).toBe('The 2.40 mm wall is 5.33 line widths (2.25 mm).');
    expect(imperial('a seal area of 21.3 mm2')).toBe('a seal area of 21.3 mm2');
    expect(imperial('a foot of 254 x 508 mm')).toBe('a foot of 10 x 20 in'); // 254 mm = 10 in exactly
    expect(imperial('from 1 m to 3.048 m')).toBe('from 3.28 ft to 10 ft');
  });

  it('leaves a quantity that already gives its imperial value, and words that only look like units', () => {
    expect(imperial('3.05 m is about 10 ft (30 kPa, 4.3 psi of water)')).toBe('3.05 m is about 10 ft (30 kPa, 4.3 psi of water)');
    expect(imperial('at most 3 m (10 ft) above the valve')).toBe('at most 3 m (10 ft) above the valve');
    expect(imperial('M3 screws, a 50-degree cone, 4 lines, 2 mins')).toBe('M3 screws, a 50-degree cone, 4 lines, 2 mins');
  });
});

describe('htmlInUnits', () => {
  it('rewrites text between tags, never a tag or a style sheet', () => {
    const page = '<style>@page { margin: 12mm }</style><p title="45 mm">Holds 45.0 mm</p>';
    expect(htmlInUnits(page, 'imperial')).toBe('<style>@page { margin: 12mm }</style><p title="45 mm">Holds 1.77 in</p>');
  });
});

describe("a plan's starving reason (flows in L/h and the plants' use in L/day)", () => {
  it('every flow goes to US gallons, agreeing with js-quantities', () => {
    const out = imperial("gets 3 L/h with every valve open at full tank, less than its plants' peak use (100 L/day, 4.17 L/h)");
    expect(out).not.toMatch(/\bL\//);
    const values = [...out.matchAll(/([\d.]+) gal\/(h|day)/g)].map((m) => Number(m[1]));
    const expected = [3, 100, 4.17].map((l) => Qty(`${l} L`).to('gal').scalar);
    expect(values).toHaveLength(3);
    values.forEach((v, i) => expect(Math.abs(v / expected[i]! - 1)).toBeLessThan(0.01));
  });
});
