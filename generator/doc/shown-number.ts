/**
 * Sensible rounding for numbers shown to a grower: as many decimals as the
 * unit's everyday use needs (a head to the centimetre or the hundredth of a
 * foot, a level to the tenth of a millimetre or the hundredth of an inch),
 * never fewer than three significant digits, and no float noise.
 *
 * Example: shownNumber(2.2 / 0.3048, 'ft') = "7.22" (not 7.2178); shownNumber(0.0045, 'm2') = "0.0045".
 * The step sizes are common practice (tape measures, rulers and scales as sold).
 */

/** Decimals per unit symbol; units not listed keep three significant digits. */
const DECIMALS: Record<string, number> = {
  mm: 1,
  cm: 2,
  m: 3,
  in: 2,
  ft: 2,
  g: 1,
  kg: 3,
  oz: 2,
  lb: 2,
  N: 2,
  mN: 0,
  gf: 0,
  ozf: 2,
  kPa: 2,
  psi: 2,
  'kg/m3': 0,
  'g/cm3': 3,
  m2: 3,
  cm2: 0,
  mm2: 1,
  ft2: 2,
  in2: 2,
  'L/day': 1,
  'gal/day': 2,
  'L/h': 1,
  'gal/h': 2,
  'mPa s': 2,
};

/** At least this many significant digits, whatever the unit (0.0045 m2 stays 0.0045, not 0.005). */
const MIN_SIGNIFICANT = 3;

/** How many decimals `value` is shown with in `unit` (the unit's step, or more for three significant digits). */
export function shownDecimals(value: number, unit: string): number {
  if (!Number.isFinite(value) || value === 0) return DECIMALS[unit] ?? 0;
  const forSignificant = MIN_SIGNIFICANT - 1 - Math.floor(Math.log10(Math.abs(value)));
  return Math.max(0, Math.min(8, Math.max(DECIMALS[unit] ?? 0, forSignificant)));
}

/** `value` rounded for showing in `unit`, as a number. */
export function roundShown(value: number, unit: string): number {
  if (!Number.isFinite(value) || value === 0) return value;
  return Number(value.toFixed(shownDecimals(value, unit)));
}

/** `value` rounded for showing in `unit`, as text without the unit: shownNumber(7.2178, 'ft') = "7.22". */
export function shownNumber(value: number, unit: string): string {
  return Number.isFinite(value) ? String(roundShown(value, unit)) : '–';
}
