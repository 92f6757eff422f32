/**
 * Input check at the door of every hydraulics function: a finite number
 * inside the stated range, or a RangeError naming the field, the value and
 * the allowed range. Internal helper (not re-exported by index.ts).
 */
export interface AllowedRange {
  /** lower bound (inclusive unless minExclusive) */
  min?: number;
  minExclusive?: boolean;
  /** upper bound (inclusive unless maxExclusive) */
  max?: number;
  maxExclusive?: boolean;
  integer?: boolean;
  /** plain words appended to the range, e.g. "a tenth of tubeInnerDiameterM" */
  note?: string;
}

function describe(range: AllowedRange): string {
  const parts: string[] = [range.integer ? 'a whole number' : 'a finite number'];
  if (range.min !== undefined) parts.push(`${range.minExclusive ? '>' : '>='} ${range.min}`);
  if (range.max !== undefined) parts.push(`${range.min !== undefined ? 'and ' : ''}${range.maxExclusive ? '<' : '<='} ${range.max}`);
  return parts.join(' ') + (range.note ? ` (${range.note})` : '');
}

/** Ranges checked in the solvers' inner loops, made once (a literal per call costs an allocation each time). */
export const POSITIVE: AllowedRange = Object.freeze({ min: 0, minExclusive: true });
export const NON_NEGATIVE: AllowedRange = Object.freeze({ min: 0 });

/** Returns `value` when it is allowed; throws RangeError naming `path` otherwise. */
export function checkRange(path: string, value: unknown, range: AllowedRange = {}): number {
  const ok =
    typeof value === 'number' &&
    Number.isFinite(value) &&
    (!range.integer || Number.isInteger(value)) &&
    (range.min === undefined || (range.minExclusive ? value > range.min : value >= range.min)) &&
    (range.max === undefined || (range.maxExclusive ? value < range.max : value <= range.max));
  if (!ok) {
    const shown = typeof value === 'string' ? JSON.stringify(value) : String(value);
    throw new RangeError(`${path} = ${shown} is out of range; allowed: ${describe(range)}`);
  }
  return value as number;
}
