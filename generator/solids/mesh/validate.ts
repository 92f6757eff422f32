/**
 * Input checks at the door. Every message names the field path, the value
 * given and the allowed range, so a caller can show it as is.
 */

/** Throws unless `value` is a finite number > 0. */
export function requirePositive(path: string, value: unknown, unit = ''): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
    throw new RangeError(`${path} = ${describe(value)}${unit ? ' ' + unit : ''}; allowed: a finite number greater than 0${unit ? ' ' + unit : ''}`);
  }
  return value;
}

/** Throws unless `value` is a finite number >= 0. */
export function requireNonNegative(path: string, value: unknown, unit = ''): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0) {
    throw new RangeError(`${path} = ${describe(value)}${unit ? ' ' + unit : ''}; allowed: a finite number of 0 or more${unit ? ' ' + unit : ''}`);
  }
  return value;
}

/** Throws unless `value` is an integer within [min, max]. */
export function requireInteger(path: string, value: unknown, min: number, max: number): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < min || value > max) {
    throw new RangeError(`${path} = ${describe(value)}; allowed: a whole number from ${min} to ${max}`);
  }
  return value;
}

function describe(value: unknown): string {
  if (typeof value === 'string') return JSON.stringify(value);
  if (value === undefined) return 'undefined (missing)';
  return String(value);
}
