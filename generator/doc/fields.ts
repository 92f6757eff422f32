/**
 * Building blocks for documents a grower writes (the design document now, the
 * bench plan later): zod field types for quantities with units and ranges,
 * sections that refuse unknown keys, a guard against prototype keys, and the
 * conversion of zod issues to `{ field, message }` errors that name the
 * document path, the value and the allowed range.
 */
import { z } from 'zod';
import { formatNumber, parseQuantity, showInput, expectedHint, fromSi, toSi, type Quantity, type QuantityKind } from './units.ts';

/** One problem with a document: dotted path ("supply.headMax", "seal.calibration.1.mass") and a sentence. */
export interface FieldError {
  field: string;
  message: string;
}

/** Path used for problems with the document as a whole. */
export const ROOT_FIELD = 'design';

/** Range and wording of a quantity field; limits are in the field's stated unit. */
export interface QuantitySpec {
  /** the field's stated unit (symbol from the unit table; '' for plain numbers) */
  unit: string;
  /** noun phrase for messages: "the water depth to hold" */
  label: string;
  min?: number;
  max?: number;
  /** true: the value must be above `min`, not equal to it */
  minExclusive?: boolean;
  maxExclusive?: boolean;
  /** sentence appended to too-high messages (e.g. the low-pressure caution) */
  note?: string;
  /** example for a missing required value, e.g. "2.2 m" */
  example?: string;
}

/** A field's value in SI with how the grower wrote it, for later messages. */
export interface Measured {
  si: number;
  /** the input as written, with its value in the field's unit when it was given in another */
  shown: string;
}

/** Text for the input as written: `"12 in" (304.8 mm)`, `"40 mm"`, `40 mm` (bare number in the field's unit). */
export function describeInput(raw: unknown, quantity: Quantity, spec: Pick<QuantitySpec, 'unit'>): string {
  if (typeof raw === 'number') return spec.unit ? `${formatNumber(raw, 10)} ${spec.unit}` : formatNumber(raw, 10);
  const text = showInput(raw);
  if (!spec.unit || quantity.unit === spec.unit || quantity.unit === '') return text;
  return `${text} (${formatNumber(fromSi(quantity.si, spec.unit))} ${spec.unit})`;
}

function withUnit(value: number, unit: string): string {
  return unit ? `${formatNumber(value)} ${unit}` : formatNumber(value);
}

/** "from 5 mm to 250 mm", "more than 0 m and at most 3.05 m", "at least 1". */
export function rangeText(spec: QuantitySpec): string {
  const { min, max, unit } = spec;
  const low = min === undefined ? '' : `${spec.minExclusive ? 'more than' : 'at least'} ${withUnit(min, unit)}`;
  const high = max === undefined ? '' : `${spec.maxExclusive ? 'less than' : 'at most'} ${withUnit(max, unit)}`;
  if (min !== undefined && max !== undefined && !spec.minExclusive && !spec.maxExclusive) {
    return `from ${withUnit(min, unit)} to ${withUnit(max, unit)}`;
  }
  return [low, high].filter(Boolean).join(' and ');
}

/** The out-of-range message for an SI value, or null when it is inside the range. */
export function checkRange(si: number, shown: string, spec: QuantitySpec): string | null {
  const value = spec.unit ? fromSi(si, spec.unit) : si;
  // Compare in the field's unit with a little tolerance, so "250 mm" written as "25 cm" is not refused for rounding.
  // The tolerance scales with the bound, not the value: an overflowed value (Infinity) must not widen it to Infinity.
  const { min, max } = spec;
  const eps = 1e-9 * Math.max(1, Math.abs(min ?? 0), Math.abs(max ?? 0));
  let side: 'low' | 'high' | null = Number.isNaN(value) ? 'high' : null;
  if (min !== undefined && (spec.minExclusive ? value <= min : value < min - eps)) side = 'low';
  if (max !== undefined && (spec.maxExclusive ? value >= max : value > max + eps)) side = 'high';
  if (!side) return null;
  const note = spec.note && side === 'high' ? ` ${spec.note}` : '';
  return `${shown} is too ${side}; ${spec.label} must be ${rangeText(spec)}.${note}`;
}

/** An SI value moved onto the nearest bound of `spec` when it lies (within tolerance) outside it. */
export function clampToRange(si: number, spec: QuantitySpec): number {
  const toSiValue = (v: number) => (spec.unit ? toSi(v, spec.unit) : v);
  if (spec.min !== undefined && !spec.minExclusive && si < toSiValue(spec.min)) return toSiValue(spec.min);
  if (spec.max !== undefined && !spec.maxExclusive && si > toSiValue(spec.max)) return toSiValue(spec.max);
  return si;
}

/** Options of a quantity field: its range and wording, and a default in the field's unit (absent: required). */
export interface QuantityFieldOptions extends QuantitySpec {
  fallback?: number | string;
}

type Ctx = { issues: unknown[]; value: unknown };

function pushIssue(ctx: Ctx, input: unknown, message: string, path: PropertyKey[] = []): void {
  (ctx.issues as object[]).push({ code: 'custom', message, input, path });
}

/** Message for a required value that is missing. */
export function missingMessage(spec: QuantitySpec, kind: QuantityKind): string {
  return `missing; give ${spec.label}${spec.example ? `, for example "${spec.example}"` : `: ${expectedHint(kind, spec.unit)}`}.`;
}

/** Parse one value of a field: the Measured value, or a message. Range is checked when `checkLimits` is set. */
export function measure(raw: unknown, kind: QuantityKind, spec: QuantitySpec, checkLimits = true): { ok: true; measured: Measured; quantity: Quantity } | { ok: false; message: string } {
  const parsed = parseQuantity(raw, kind, spec.unit || undefined);
  if (!parsed.ok) return { ok: false, message: parsed.message + '.' };
  const shown = describeInput(raw, parsed.quantity, spec);
  const measured = { si: parsed.quantity.si, shown };
  if (checkLimits && kind !== 'head') {
    const problem = checkRange(measured.si, shown, spec);
    if (problem) return { ok: false, message: problem };
    // within the rounding tolerance but past a bound ("-1e-12 m" of tube): take the bound itself, so the
    // sizing core never sees a value outside the range it was promised
    measured.si = clampToRange(measured.si, spec);
  }
  return { ok: true, measured, quantity: { ...parsed.quantity, si: measured.si } };
}

/** A required quantity field (or one with a default): output is Measured, in SI. */
export function quantityField(kind: Exclude<QuantityKind, 'head'>, options: QuantityFieldOptions): z.ZodType<Measured> {
  return z.unknown().optional().transform((raw, ctx): Measured => {
    const value = raw === undefined ? options.fallback : raw;
    if (value === undefined) {
      pushIssue(ctx, raw, missingMessage(options, kind));
      return z.NEVER;
    }
    const result = measure(value, kind, options);
    if (!result.ok) {
      pushIssue(ctx, raw, result.message);
      return z.NEVER;
    }
    return result.measured;
  }) as unknown as z.ZodType<Measured>;
}

/**
 * An optional quantity field with no default: output is Measured or null.
 * `acceptNull` (default true): an explicit null means "not given"; false refuses it
 * like any other junk (for fields whose default is worked out elsewhere).
 */
export function optionalQuantityField(kind: Exclude<QuantityKind, 'head'>, spec: QuantitySpec, acceptNull = true): z.ZodType<Measured | null> {
  return z.unknown().optional().transform((raw, ctx): Measured | null => {
    if (raw === undefined || (raw === null && acceptNull)) return null;
    const result = measure(raw, kind, spec);
    if (!result.ok) {
      pushIssue(ctx, raw, result.message);
      return z.NEVER;
    }
    return result.measured;
  }) as unknown as z.ZodType<Measured | null>;
}

export const lengthField = (o: QuantityFieldOptions) => quantityField('length', o);
export const densityField = (o: QuantityFieldOptions) => quantityField('density', o);
export const forceField = (o: QuantityFieldOptions) => quantityField('force', o);
export const massField = (o: QuantityFieldOptions) => quantityField('mass', o);
export const areaField = (o: QuantityFieldOptions) => quantityField('area', o);
export const viscosityField = (o: QuantityFieldOptions) => quantityField('viscosity', o);
export const numberField = (o: Omit<QuantityFieldOptions, 'unit'>) => quantityField('number', { ...o, unit: '' });

/**
 * A head as written: a height (range-checked at once) or a pressure, which
 * becomes a height only with the liquid's density (`resolveHead`).
 */
export interface HeadReading {
  quantity: Quantity;
  shown: string;
  raw: unknown;
}

/** A head field: a height in `spec.unit` or a pressure. Heights are range-checked here; pressures in `resolveHead`. */
export function headField(options: QuantitySpec & { required: boolean }): z.ZodType<HeadReading | null> {
  return z.unknown().optional().transform((raw, ctx): HeadReading | null => {
    if (raw === undefined || raw === null) {
      if (!options.required) return null;
      pushIssue(ctx, raw, missingMessage(options, 'head'));
      return z.NEVER;
    }
    const result = measure(raw, 'head', options);
    if (!result.ok) {
      pushIssue(ctx, raw, result.message);
      return z.NEVER;
    }
    if (result.quantity.dimension === 'length') {
      const problem = checkRange(result.measured.si, result.measured.shown, options);
      if (problem) {
        pushIssue(ctx, raw, problem);
        return z.NEVER;
      }
    }
    return { quantity: result.quantity, shown: result.measured.shown, raw };
  }) as unknown as z.ZodType<HeadReading | null>;
}

/** Head in m from a reading, with a pressure turned into a height by H = p / (rho g); range-checked against `spec`. */
export function resolveHead(reading: HeadReading, densityKgM3: number, spec: QuantitySpec, gravity: number): { ok: true; measured: Measured } | { ok: false; message: string } {
  const { quantity } = reading;
  if (quantity.dimension === 'length') return { ok: true, measured: { si: quantity.si, shown: reading.shown } };
  const headM = quantity.si / (densityKgM3 * gravity);
  const shown = `${showInput(reading.raw)} (${formatNumber(fromSi(headM, spec.unit))} ${spec.unit} of liquid at ${formatNumber(densityKgM3)} kg/m3)`;
  const problem = checkRange(headM, shown, spec);
  return problem ? { ok: false, message: problem } : { ok: true, measured: { si: headM, shown } };
}

/**
 * A field that takes one word from a short list (case and surrounding spaces ignored), e.g.
 * `valve.mount`: "auto" | "floor" | "rim". Absent: `fallback`. Anything else is refused with
 * the words it takes, each with what it means.
 */
export function choiceField<T extends string>(label: string, choices: readonly { value: T; means: string }[], fallback: T): z.ZodType<T> {
  return z.unknown().optional().transform((raw, ctx): T => {
    if (raw === undefined) return fallback;
    if (typeof raw === 'string') {
      const found = choices.find((c) => c.value === raw.trim().toLowerCase());
      if (found) return found.value;
    }
    const list = choices.map((c) => `"${c.value}" (${c.means})`).join(', ');
    pushIssue(ctx, raw, `${showInput(raw)} is not ${label}; give one of ${list}.`);
    return z.NEVER;
  }) as unknown as z.ZodType<T>;
}

/** A short text field with a length limit. */
export function textField(label: string, maxLength: number): z.ZodType<string | undefined> {
  return z.unknown().optional().transform((raw, ctx): string | undefined => {
    if (raw === undefined) return undefined;
    if (typeof raw !== 'string') {
      pushIssue(ctx, raw, `${showInput(raw)} is not text; ${label} must be a string of at most ${maxLength} characters.`);
      return z.NEVER;
    }
    if (raw.length > maxLength) {
      pushIssue(ctx, raw, `${label} is ${raw.length} characters long; it must be at most ${maxLength}.`);
      return z.NEVER;
    }
    return raw;
  }) as unknown as z.ZodType<string | undefined>;
}

/** Marker put on issues for keys a section does not know. */
interface UnknownKeyParams {
  unknownKey: true;
  allowed: string[];
}

/**
 * A section of a document: an object with exactly these keys (each optional
 * unless its field says otherwise). A key it does not know is an error that
 * names the key: a grower's typo must not be silently ignored.
 */
export function section<Shape extends z.ZodRawShape>(shape: Shape) {
  const allowed = Object.keys(shape);
  const params: UnknownKeyParams = { unknownKey: true, allowed };
  return z
    .object(shape, {
      error: (issue) =>
        issue.code === 'invalid_type'
          ? `${showInput(issue.input)} is not a section; expected an object with the keys ${allowed.join(', ')}.`
          : undefined,
    })
    .catchall(z.custom(() => false, { params }));
}

/** Keys that could reach an object's prototype; refused anywhere in a document. */
export const FORBIDDEN_KEYS: readonly string[] = ['__proto__', 'constructor', 'prototype'];

/** Largest nesting a document may have (ours is 4 deep). */
const MAX_DEPTH = 16;

/**
 * Walk a raw document (as from JSON.parse) and refuse prototype keys and
 * runaway nesting before any schema sees it.
 */
export function scanForbiddenKeys(doc: unknown, path: string[] = [], depth = 0): FieldError[] {
  if (doc === null || typeof doc !== 'object') return [];
  const field = path.length ? path.join('.') : ROOT_FIELD;
  if (depth > MAX_DEPTH) return [{ field, message: `nested more than ${MAX_DEPTH} levels deep; a document is at most a few levels deep.` }];
  const errors: FieldError[] = [];
  for (const key of Object.keys(doc)) {
    if (FORBIDDEN_KEYS.includes(key)) {
      errors.push({ field: [...path, key].join('.'), message: `the key "${key}" is not allowed in a document (it is reserved by JavaScript).` });
      continue;
    }
    errors.push(...scanForbiddenKeys((doc as Record<string, unknown>)[key], [...path, key], depth + 1));
  }
  return errors;
}

/** Edit distance, for "did you mean" hints. */
function distance(a: string, b: string): number {
  const row = Array.from({ length: b.length + 1 }, (_, i) => i);
  for (let i = 1; i <= a.length; i++) {
    let diagonal = row[0];
    row[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const above = row[j];
      row[j] = Math.min(row[j] + 1, row[j - 1] + 1, diagonal + (a[i - 1] === b[j - 1] ? 0 : 1));
      diagonal = above;
    }
  }
  return row[b.length];
}

/** The allowed key closest to a mistyped one, if it is close enough to be a typo. */
export function closestKey(key: string, allowed: readonly string[]): string | undefined {
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const candidate of allowed) {
    const d = candidate.toLowerCase() === key.toLowerCase() ? 0 : distance(key.toLowerCase(), candidate.toLowerCase());
    if (d < bestDistance) {
      best = candidate;
      bestDistance = d;
    }
  }
  return bestDistance <= Math.max(2, Math.floor(key.length / 3)) ? best : undefined;
}

/** Zod issues as `{ field, message }`, one per problem, field being the dotted document path. */
export function zodIssuesToFieldErrors(issues: readonly z.core.$ZodIssue[]): FieldError[] {
  const errors: FieldError[] = [];
  for (const issue of issues) {
    const path = issue.path.map(String);
    const field = path.length ? path.join('.') : ROOT_FIELD;
    const params = issue.code === 'custom' ? (issue.params as Partial<UnknownKeyParams> | undefined) : undefined;
    if (params?.unknownKey) {
      const key = path[path.length - 1] ?? '';
      const allowed = params.allowed ?? [];
      const guess = closestKey(key, allowed);
      const hint = guess ? `did you mean "${guess}"?` : `the keys allowed here are ${allowed.join(', ')}.`;
      errors.push({ field, message: `unknown key "${key}"; ${hint}` });
      continue;
    }
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) errors.push({ field: [...path, key].join('.'), message: `unknown key "${key}".` });
      continue;
    }
    errors.push({ field, message: issue.message });
  }
  return errors;
}

/** SI value written in a field's unit for a normalized document: "2.4 m", "1.5". */
export function normalizedText(si: number, unit: string): string {
  return unit ? `${formatNumber(fromSi(si, unit), 10)} ${unit}` : formatNumber(si, 10);
}
