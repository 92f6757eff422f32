/**
 * Powers of units written raised, as the SI Brochure (BIPM, 9th edition,
 * 5.4.2: "m²", "kg/m³") writes them; and what is shown can be typed back.
 */
import { describe, expect, it } from 'vitest';
import { superscriptUnits } from '../../generator/doc/superscript-units.ts';
import { parseQuantity } from '../../generator/doc/units.ts';

describe('superscriptUnits', () => {
  it('raises the power of a length unit anywhere in a sentence', () => {
    expect(superscriptUnits('"0.18 m2" is too high; the reservoir area must be from 0.0001 m2 to 100 m2.')).toBe(
      '"0.18 m²" is too high; the reservoir area must be from 0.0001 m² to 100 m².',
    );
    expect(superscriptUnits('1.27 g/cm3, 998.2 kg/m3, 12 mm2, 3 ft2, 0.5 in2, 4 cm3')).toBe('1.27 g/cm³, 998.2 kg/m³, 12 mm², 3 ft², 0.5 in², 4 cm³');
  });

  it('leaves names that only look like units alone', () => {
    expect(superscriptUnits('M3 screws, PA12, TPU 95A, item2, x3, 2 m 3 mm')).toBe('M3 screws, PA12, TPU 95A, item2, x3, 2 m 3 mm');
  });

  it('writes what the units parser reads back to the same value', () => {
    for (const [plain, kind] of [['0.18 m2', 'area'], ['1.27 g/cm3', 'density'], ['3 ft2', 'area']] as const) {
      const a = parseQuantity(plain, kind);
      const b = parseQuantity(superscriptUnits(plain), kind);
      expect(a.ok && b.ok && a.quantity.si === b.quantity.si, plain).toBe(true);
    }
  });
});
