/**
 * The units a design document accepts, with their factors to SI.
 *
 * Exact definitions (NIST SP 811, App. B): 1 in = 25.4 mm, 1 ft = 0.3048 m,
 * 1 oz (avoirdupois) = 28.349523125 g, 1 lb = 0.45359237 kg, standard gravity
 * 9.80665 m/s2 (3rd CGPM 1901; NIST SP 330), so 1 gf = 9.80665 mN. NIST SP 811
 * App. B.9 lists 1 psi = 6.894757 E+03 Pa; we use that value as given.
 */
import { STANDARD_GRAVITY } from '../sizing/constants.ts';

/** What a quantity measures; `head` accepts a length or a pressure. */
export type Dimension = 'length' | 'pressure' | 'density' | 'force' | 'mass' | 'area' | 'viscosity' | 'flow';

export interface UnitDef {
  /** how the unit is written in output, e.g. "mm", "g/cm3", "mPa s" */
  symbol: string;
  dimension: Dimension;
  /** one of this unit in the SI unit of its dimension (m, Pa, kg/m3, N, kg, m2, Pa s, m3/s) */
  toSi: number;
  /** other spellings; matched case-insensitively with spaces, dots and carets removed */
  aliases: string[];
}

export const INCH_M = 0.0254;
export const FOOT_M = 0.3048;
export const PSI_PA = 6894.757;
export const OUNCE_KG = 0.028349523125;
export const POUND_KG = 0.45359237;
export const GRAM_FORCE_N = 1e-3 * STANDARD_GRAVITY;
/** 1 US liquid gallon = 231 in3 = 3.785411784 L (NIST SP 811, App. B) */
export const US_GALLON_M3 = 3.785411784e-3;
export const DAY_S = 86400;

export const UNITS: readonly UnitDef[] = [
  // length, m
  { symbol: 'mm', dimension: 'length', toSi: 1e-3, aliases: ['millimetre', 'millimetres', 'millimeter', 'millimeters'] },
  { symbol: 'cm', dimension: 'length', toSi: 1e-2, aliases: ['centimetre', 'centimetres', 'centimeter', 'centimeters'] },
  { symbol: 'm', dimension: 'length', toSi: 1, aliases: ['metre', 'metres', 'meter', 'meters'] },
  // " and ' are unambiguous after a single number: inches and feet.
  { symbol: 'in', dimension: 'length', toSi: INCH_M, aliases: ['inch', 'inches', '"', '\u2033'] },
  { symbol: 'ft', dimension: 'length', toSi: FOOT_M, aliases: ['foot', 'feet', "'", '\u2032'] },
  // pressure, Pa
  { symbol: 'Pa', dimension: 'pressure', toSi: 1, aliases: ['pascal', 'pascals'] },
  { symbol: 'hPa', dimension: 'pressure', toSi: 100, aliases: [] },
  { symbol: 'kPa', dimension: 'pressure', toSi: 1e3, aliases: ['kilopascal', 'kilopascals'] },
  { symbol: 'mbar', dimension: 'pressure', toSi: 100, aliases: ['millibar', 'millibars'] },
  { symbol: 'bar', dimension: 'pressure', toSi: 1e5, aliases: [] },
  { symbol: 'psi', dimension: 'pressure', toSi: PSI_PA, aliases: ['lbf/in2'] },
  // density, kg/m3
  { symbol: 'kg/m3', dimension: 'density', toSi: 1, aliases: ['g/l'] },
  { symbol: 'g/cm3', dimension: 'density', toSi: 1e3, aliases: ['g/cc', 'g/ml', 'kg/l', 'kg/dm3'] },
  // force, N; a mass stands for its weight in standard gravity
  { symbol: 'N', dimension: 'force', toSi: 1, aliases: ['newton', 'newtons'] },
  { symbol: 'mN', dimension: 'force', toSi: 1e-3, aliases: ['millinewton', 'millinewtons'] },
  { symbol: 'gf', dimension: 'force', toSi: GRAM_FORCE_N, aliases: ['gram-force', 'g-force'] },
  { symbol: 'kgf', dimension: 'force', toSi: STANDARD_GRAVITY, aliases: ['kilogram-force'] },
  { symbol: 'ozf', dimension: 'force', toSi: OUNCE_KG * STANDARD_GRAVITY, aliases: ['ounce-force'] },
  { symbol: 'lbf', dimension: 'force', toSi: POUND_KG * STANDARD_GRAVITY, aliases: ['pound-force'] },
  // mass, kg
  { symbol: 'mg', dimension: 'mass', toSi: 1e-6, aliases: ['milligram', 'milligrams'] },
  { symbol: 'g', dimension: 'mass', toSi: 1e-3, aliases: ['gram', 'grams', 'gramme', 'grammes'] },
  { symbol: 'kg', dimension: 'mass', toSi: 1, aliases: ['kilogram', 'kilograms'] },
  { symbol: 'oz', dimension: 'mass', toSi: OUNCE_KG, aliases: ['ounce', 'ounces'] },
  { symbol: 'lb', dimension: 'mass', toSi: POUND_KG, aliases: ['lbs', 'pound', 'pounds'] },
  // area, m2
  { symbol: 'mm2', dimension: 'area', toSi: 1e-6, aliases: ['sqmm'] },
  { symbol: 'cm2', dimension: 'area', toSi: 1e-4, aliases: ['sqcm'] },
  { symbol: 'm2', dimension: 'area', toSi: 1, aliases: ['sqm'] },
  { symbol: 'in2', dimension: 'area', toSi: INCH_M * INCH_M, aliases: ['sqin'] },
  { symbol: 'ft2', dimension: 'area', toSi: FOOT_M * FOOT_M, aliases: ['sqft'] },
  // dynamic viscosity, Pa s (1 cP = 1 mPa s)
  { symbol: 'mPa s', dimension: 'viscosity', toSi: 1e-3, aliases: ['cp', 'centipoise'] },
  { symbol: 'Pa s', dimension: 'viscosity', toSi: 1, aliases: [] },
  // volume flow, m3/s (a plants' demand: litres or US gallons a day, or litres an hour)
  { symbol: 'L/day', dimension: 'flow', toSi: 1e-3 / DAY_S, aliases: ['l/d', 'lpd', 'litres/day', 'liters/day', 'litre/day', 'liter/day'] },
  { symbol: 'gal/day', dimension: 'flow', toSi: US_GALLON_M3 / DAY_S, aliases: ['gal/d', 'gpd', 'gallons/day', 'gallon/day'] },
  { symbol: 'L/h', dimension: 'flow', toSi: 1e-3 / 3600, aliases: ['l/hr', 'lph', 'litres/hour', 'liters/hour', 'litre/hour', 'liter/hour'] },
];

/**
 * Spelling key: lower case, unicode superscripts to digits, micro sign to u,
 * and spaces, dots, middle dots, asterisks and carets removed
 * ("mPa·s", "mPa s", "MPA.S" -> "mpas"; "m²", "m^2" -> "m2").
 */
export function unitKey(text: string): string {
  return text
    .normalize('NFC')
    .toLowerCase()
    .replace(/\u00b2/g, '2')
    .replace(/\u00b3/g, '3')
    .replace(/[\u00b5\u03bc]/g, 'u')
    .replace(/[\s.\u00b7\u22c5*^]/g, '');
}

const BY_KEY = new Map<string, UnitDef>();
for (const unit of UNITS) {
  for (const spelling of [unit.symbol, ...unit.aliases]) {
    const key = unitKey(spelling);
    if (BY_KEY.has(key)) throw new Error(`unit table: "${spelling}" is listed twice`);
    BY_KEY.set(key, unit);
  }
}

/** The unit written as `text`, or undefined. */
export function findUnit(text: string): UnitDef | undefined {
  return BY_KEY.get(unitKey(text));
}

/** The unit with this exact symbol (for a field's stated unit); throws on a programming error. */
export function unitBySymbol(symbol: string): UnitDef {
  const unit = UNITS.find((u) => u.symbol === symbol);
  if (!unit) throw new Error(`unit table: no unit with symbol "${symbol}"`);
  return unit;
}

/** 1/toSi when it is a whole number (mm: 1000), so decimal prefixes divide instead of multiplying by an inexact 1e-3. */
function wholeInverse(unit: UnitDef): number | null {
  if (unit.toSi >= 1) return null;
  const inverse = Math.round(1 / unit.toSi);
  return Math.abs(inverse * unit.toSi - 1) < 1e-12 ? inverse : null;
}

/** value in `unit` -> SI, without float noise for decimal prefixes (0.45 mm -> 0.00045 m, not 0.00045000000000000004). */
export function scaleToSi(value: number, unit: UnitDef): number {
  const inverse = wholeInverse(unit);
  return inverse === null ? value * unit.toSi : value / inverse;
}

/** SI -> value in `unit`, the inverse of scaleToSi. */
export function scaleFromSi(si: number, unit: UnitDef): number {
  const inverse = wholeInverse(unit);
  return inverse === null ? si / unit.toSi : si * inverse;
}
