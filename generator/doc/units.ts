/**
 * Quantities in a design document: a number in the field's stated unit, or a
 * string with a unit ("2.4 m", "40mm", "1.27 g/cm3", "3 psi", "31 g").
 * Units are case-insensitive, the space before them optional, ² and ³ allowed.
 * A decimal comma ("2,4 m") is refused rather than guessed at. Lengths also
 * take feet and inches together ("7' 2\"", "7 ft 2 in", "7 ft 2 1/2 in") and
 * fractions ("5/32 in", "1 1/2 in"), as tape measures and US hardware are marked.
 *
 * Results are in SI (m, Pa, kg/m3, N, kg, m2, Pa s). A force given as a mass
 * ("31 g") is that mass's weight in standard gravity. A head may be given as a
 * pressure; turn it into a height with `headFromPressure` once the liquid's
 * density is known (H = p / (rho g)).
 */
import { STANDARD_GRAVITY } from '../sizing/constants.ts';
import { FOOT_M, INCH_M, findUnit, scaleFromSi, scaleToSi, unitBySymbol, type Dimension } from './unit-table.ts';

/** The unit reported for a length written as feet and inches together ("7' 2\""). */
export const FEET_INCHES = 'ft+in';

export type QuantityKind = Dimension | 'head' | 'number';

/** A parsed value: SI number of its dimension, and the unit it was written in. */
export interface Quantity {
  /** SI value: m, Pa, kg/m3, N, kg, m2, Pa s; or the plain number */
  si: number;
  /** what was measured; a force written as a mass is reported as 'force' */
  dimension: Dimension | 'number';
  /** symbol of the unit used (the field's unit when a bare number was given; FEET_INCHES for "7' 2\"") */
  unit: string;
}

export type QuantityResult = { ok: true; quantity: Quantity } | { ok: false; message: string };
export type ValueResult = { ok: true; value: number } | { ok: false; message: string };

/** Which dimensions each kind accepts. */
const ACCEPTS: Record<QuantityKind, readonly Dimension[]> = {
  length: ['length'],
  head: ['length', 'pressure'],
  pressure: ['pressure'],
  density: ['density'],
  force: ['force', 'mass'],
  mass: ['mass'],
  area: ['area'],
  viscosity: ['viscosity'],
  flow: ['flow'],
  number: [],
};

const KIND_NOUN: Record<QuantityKind, string> = {
  length: 'a length',
  head: 'a head',
  pressure: 'a pressure',
  density: 'a density',
  force: 'a force',
  mass: 'a mass',
  area: 'an area',
  viscosity: 'a viscosity',
  flow: 'a flow',
  number: 'a plain number',
};

const MAX_TEXT_LENGTH = 64;
const NUMBER_THEN_UNIT = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?)\s*(.*)$/i;
/** "5/32", "1 1/2", "1-1/2" (a whole number, then a fraction) before the unit. */
const FRACTION_THEN_UNIT = /^(?:(\d+)(?:\s+|-))?(\d+)\/(\d+)(?![\d.])\s*(.*)$/;
/** Feet then inches: "7' 2\"", "7 ft 2 in", "7ft 2 1/2in", "7' 2" (the inches' own mark may be left off). */
const FEET_THEN_INCHES =
  /^(\d+(?:\.\d+)?)\s*(?:(?:'|\u2032)\s*|(?:ft|feet|foot)\s+)(\d+(?:\.\d+)?|(?:\d+(?:\s+|-))?\d+\/\d+)\s*(?:"|\u2033|''|in|inch|inches)?$/i;

/**
 * A fraction or mixed number as a value: "5/32" -> 0.15625, "1 1/2" -> 1.5, "1-1/2" -> 1.5; NaN when the
 * text is not one (or divides by zero).
 */
export function fractionValue(text: string): number {
  const m = /^(?:(\d+)(?:\s+|-))?(\d+)\/(\d+)$/.exec(text.trim());
  if (!m || Number(m[3]) === 0) return Number.NaN;
  return Number(m[1] ?? 0) + Number(m[2]) / Number(m[3]);
}

/** A value, decimal or fraction: "2.5" -> 2.5, "5/32" -> 0.15625. */
function plainValue(text: string): number {
  return text.includes('/') ? fractionValue(text) : Number(text);
}

/** The field unit used for bare numbers when none is given. */
export const DEFAULT_UNIT: Record<QuantityKind, string> = {
  length: 'mm',
  head: 'm',
  pressure: 'kPa',
  density: 'kg/m3',
  force: 'N',
  mass: 'g',
  area: 'm2',
  viscosity: 'mPa s',
  flow: 'L/day',
  number: '',
};

/** What to write instead, for error messages: `use a number in mm or a value with a unit such as ...`. */
export function expectedHint(kind: QuantityKind, unit: string = DEFAULT_UNIT[kind]): string {
  switch (kind) {
    case 'number':
      return 'use a plain number such as 1.5';
    case 'head':
      return `use a number in ${unit}, a height such as "2.2 m" or "7 ft", or a pressure such as "21 kPa" or "3 psi"`;
    default:
      return `use a number in ${unit} or a value with a unit such as ${examples(kind, unit)}`;
  }
}

function examples(kind: QuantityKind, unit: string): string {
  const list: Record<string, string[]> = {
    'length:m': ['5 m', '500 cm', '16 ft'],
    length: ['40 mm', '4 cm', '1.5 in'],
    pressure: ['20 kPa', '3 psi'],
    'density:g/cm3': ['1.27 g/cm3', '1270 kg/m3'],
    density: ['998 kg/m3', '1.0 g/cm3'],
    force: ['0.1 N', '10 gf', '10 g', '0.35 oz'],
    mass: ['31 g', '0.031 kg', '1.1 oz'],
    area: ['0.12 m2', '1200 cm2', '1.3 ft2'],
    viscosity: ['1.0 mPa s', '1 cP', '0.001 Pa s'],
    flow: ['4 L/day', '1 gal/day', '0.2 L/h'],
  };
  const chosen = list[`${kind}:${unit}`] ?? list[kind] ?? [];
  return chosen.map((e) => `"${e}"`).join(', ');
}

/** A short rendering of any input for messages: strings quoted, containers named. */
export function showInput(input: unknown): string {
  if (typeof input === 'string') {
    const cut = input.length > 40 ? `${input.slice(0, 37)}...` : input;
    return JSON.stringify(cut);
  }
  if (typeof input === 'number' || typeof input === 'boolean' || typeof input === 'bigint') return String(input);
  if (input === null) return 'null';
  if (input === undefined) return 'nothing';
  if (Array.isArray(input)) return 'a list';
  return 'an object';
}

/**
 * Parse `input` as a quantity of `kind`. `unit` is the field's stated unit
 * (a symbol from the unit table) that a bare number, or a numeric string with
 * no unit, is taken in.
 */
export function parseQuantity(input: unknown, kind: QuantityKind, unit: string = DEFAULT_UNIT[kind]): QuantityResult {
  const fail = (why?: string): QuantityResult => ({
    ok: false,
    message: `${showInput(input)} is not ${KIND_NOUN[kind]}${why ? ` (${why})` : ''}; ${expectedHint(kind, unit)}`,
  });
  const bare = (value: number): QuantityResult => {
    if (kind === 'number') return { ok: true, quantity: { si: value, dimension: 'number', unit: '' } };
    const fieldUnit = unitBySymbol(unit);
    return sized({ si: scaleToSi(value, fieldUnit), dimension: fieldUnit.dimension, unit });
  };
  // A finite value can still overflow once converted ("1e308 m" is Infinity mm): refuse it, or the range check
  // would compare Infinity and messages would show it.
  const sized = (quantity: Quantity): QuantityResult => {
    const inField = kind === 'number' || kind === 'head' || quantity.dimension === 'force' ? quantity.si : scaleFromSi(quantity.si, unitBySymbol(unit));
    return Number.isFinite(quantity.si) && Number.isFinite(inField) ? { ok: true, quantity } : fail('far too large');
  };

  if (typeof input === 'number') return Number.isFinite(input) ? bare(input) : fail('not a finite number');
  if (typeof input !== 'string') return fail();

  const text = input.trim();
  if (text === '') return fail('empty text');
  if (text.length > MAX_TEXT_LENGTH) return fail(`longer than ${MAX_TEXT_LENGTH} characters`);
  if (text.includes(',')) {
    const single = text.split(',').length === 2 ? ` such as "${text.replace(',', '.')}"` : '';
    return {
      ok: false,
      message: `${showInput(input)} has a comma; write decimals with a point and no thousands separators${single}`,
    };
  }
  const feetInches = FEET_THEN_INCHES.exec(text);
  if (feetInches) {
    if (!ACCEPTS[kind].includes('length')) return fail(`feet and inches measure length`);
    const inches = plainValue(feetInches[2]);
    if (!Number.isFinite(inches)) return fail('a fraction over zero');
    if (inches >= 12) return fail(`${formatNumber(inches)} inches is a foot or more; write it in feet`);
    return sized({ si: Number(feetInches[1]) * FOOT_M + inches * INCH_M, dimension: 'length', unit: FEET_INCHES });
  }
  const fraction = FRACTION_THEN_UNIT.exec(text);
  const match = fraction ? ([text, `${fraction[1] ?? ''} ${fraction[2]}/${fraction[3]}`.trim(), fraction[4]] as const) : NUMBER_THEN_UNIT.exec(text);
  if (!match) return fail();
  const value = fraction ? fractionValue(match[1]) : Number(match[1]);
  const unitText = match[2].trim();
  if (fraction && !Number.isFinite(value)) return fail('a fraction over zero');
  if (!Number.isFinite(value)) return fail('not a finite number');
  if (unitText === '') return bare(value);
  if (kind === 'number') return fail('no unit expected');

  const found = findUnit(unitText);
  if (!found) return fail(`unknown unit ${JSON.stringify(unitText)}`);
  if (!ACCEPTS[kind].includes(found.dimension)) return fail(`${found.symbol} measures ${found.dimension}`);
  if (kind === 'force' && found.dimension === 'mass') {
    return sized({ si: scaleToSi(value, found) * STANDARD_GRAVITY, dimension: 'force', unit: found.symbol });
  }
  return sized({ si: scaleToSi(value, found), dimension: found.dimension, unit: found.symbol });
}

function valueOf(result: QuantityResult): ValueResult {
  return result.ok ? { ok: true, value: result.quantity.si } : result;
}

/** Head H = p / (rho g), m, from a pressure in Pa and a density in kg/m3. E.g. 1 psi of water at 998.2 kg/m3: 0.7043 m. */
export function headFromPressure(pressurePa: number, densityKgM3: number): number {
  return pressurePa / (densityKgM3 * STANDARD_GRAVITY);
}

/** Length in m; bare numbers in `unit` (default mm). */
export const parseLength = (input: unknown, unit = 'mm'): ValueResult => valueOf(parseQuantity(input, 'length', unit));

/** Head in m: a height, or a pressure turned into one with the liquid's density; bare numbers in `unit` (default m). */
export function parseHead(input: unknown, densityKgM3: number, unit = 'm'): ValueResult {
  const result = parseQuantity(input, 'head', unit);
  if (!result.ok) return result;
  const { si, dimension } = result.quantity;
  return { ok: true, value: dimension === 'pressure' ? headFromPressure(si, densityKgM3) : si };
}

/** Density in kg/m3; bare numbers in `unit` (default kg/m3). */
export const parseDensity = (input: unknown, unit = 'kg/m3'): ValueResult => valueOf(parseQuantity(input, 'density', unit));

/** Force in N (a mass means its weight in standard gravity); bare numbers in `unit` (default N). */
export const parseForce = (input: unknown, unit = 'N'): ValueResult => valueOf(parseQuantity(input, 'force', unit));

/** Mass in kg; bare numbers in `unit` (default g). */
export const parseMass = (input: unknown, unit = 'g'): ValueResult => valueOf(parseQuantity(input, 'mass', unit));

/** Area in m2; bare numbers in `unit` (default m2). */
export const parseArea = (input: unknown, unit = 'm2'): ValueResult => valueOf(parseQuantity(input, 'area', unit));

/** Dynamic viscosity in Pa s; bare numbers in `unit` (default mPa s). */
export const parseViscosity = (input: unknown, unit = 'mPa s'): ValueResult =>
  valueOf(parseQuantity(input, 'viscosity', unit));

/** A plain number (a number or numeric text with no unit). */
export const parseNumber = (input: unknown): ValueResult => valueOf(parseQuantity(input, 'number'));

/** SI value expressed in the unit with this symbol (e.g. fromSi(0.0024, 'mm') = 2.4). */
export function fromSi(si: number, symbol: string): number {
  return scaleFromSi(si, unitBySymbol(symbol));
}

/** Value in the unit with this symbol expressed in SI (e.g. toSi(2.4, 'mm') = 0.0024). */
export function toSi(value: number, symbol: string): number {
  return scaleToSi(value, unitBySymbol(symbol));
}

/** Round to `significant` digits and drop float noise: 2.4000000000000004 -> "2.4". */
export function formatNumber(value: number, significant = 6): string {
  if (!Number.isFinite(value)) return String(value);
  // rounding can overflow next to the largest double (1.7976931348623157e308 -> Infinity): keep the digits then
  const rounded = Number(value.toPrecision(significant));
  return Number.isFinite(rounded) ? String(rounded) : value.toPrecision(significant);
}

/** SI value written in the unit with this symbol: formatQuantity(0.0024, 'mm') = "2.4 mm". */
export function formatQuantity(si: number, symbol: string, significant = 6): string {
  return `${formatNumber(fromSi(si, symbol), significant)} ${symbol}`;
}
