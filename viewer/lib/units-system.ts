/**
 * Metric / imperial display. The design document keeps whatever the grower
 * typed (a number with its unit); this module decides which unit a field shows
 * and writes, and converts a whole document when the page switches system.
 * Print settings (walls, nozzle, pad) stay in millimetres in both systems:
 * slicers and printers work in millimetres.
 */
import { fractionValue, fromSi, parseQuantity, type QuantityKind } from '../../generator/doc/units.ts';
import { shownNumber } from '../../generator/doc/shown-number.ts';
import { FIELD_UNITS } from '../../generator/doc/schema.ts';
import type { TermKey } from '../../generator/doc/glossary.ts';
import { getAt, setAt, type Doc } from './doc-path.ts';

export type UnitSystem = 'metric' | 'imperial';

export interface FieldDef {
  /** document path */
  path: string;
  label: string;
  hint?: string;
  kind: QuantityKind;
  metric: string;
  imperial: string;
  optional?: boolean;
  /** an optional box without a default value: the path of the box a blank one copies (default none) */
  blankFrom?: string;
  /** an optional box without a default value: what a blank one means, in a few words (default none) */
  blankMeans?: string;
  /** an optional box whose default the sizing takes outside DEFAULT_DOCUMENT (the container wall): that value, document text (default none) */
  blankUses?: string;
  /** the glossary word the box is about, explained beside its label (default none) */
  term?: TermKey;
}

/** Unit a bare number means in the document, per field (the schema's FIELD_UNITS). */
export function documentUnit(path: string): string {
  const generic = path.replace(/\.\d+\./, '.');
  return (FIELD_UNITS as Record<string, string>)[generic] ?? '';
}

const BARE_NUMBER = /^\s*[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?\s*$/i;

/** A number with no unit: "2.5", "5/32", "1 1/2" (fractions as rulers and US hardware are marked). */
export function isBareNumber(text: string): boolean {
  return BARE_NUMBER.test(text) || Number.isFinite(fractionValue(text));
}

/** The number part of text written in `unit` ("5/32 in" -> "5/32", "45 mm" -> "45"), or null. */
function numberPart(text: string, unit: string): string | null {
  const trimmed = text.trim();
  if (!unit) return isBareNumber(trimmed) ? trimmed : null;
  const m = /^(.*?)\s*([^\d\s/.]\S*)$/.exec(trimmed);
  return m && m[2] === unit && isBareNumber(m[1]) ? m[1] : null;
}

export function unitFor(def: Pick<FieldDef, 'metric' | 'imperial'>, system: UnitSystem): string {
  return system === 'metric' ? def.metric : def.imperial;
}

/**
 * What the field's input box shows for a document value: the bare number when
 * the value is in the shown unit, else the text as written ("3 psi").
 */
export function displayText(raw: unknown, def: FieldDef, system: UnitSystem): string {
  if (raw === undefined || raw === null) return '';
  const unit = unitFor(def, system);
  const docUnit = documentUnit(def.path);
  if (typeof raw === 'number') {
    if (!unit || unit === docUnit) return String(raw);
    const parsed = parseQuantity(raw, def.kind, docUnit || undefined);
    return parsed.ok ? shownNumber(fromSi(parsed.quantity.si, unit), unit) : String(raw);
  }
  const text = String(raw);
  const parsed = parseQuantity(text, def.kind, docUnit || undefined);
  if (parsed.ok && (parsed.quantity.unit === unit || (!unit && parsed.quantity.dimension === 'number'))) {
    return numberPart(text, unit) ?? text;
  }
  return text;
}

/** The document value for what the grower typed: a bare number gets the shown unit; empty text clears the field. */
export function documentValue(text: string, def: FieldDef, system: UnitSystem): string | number | undefined {
  const trimmed = text.trim();
  if (trimmed === '') return undefined;
  const unit = unitFor(def, system);
  if (isBareNumber(trimmed)) return unit ? `${trimmed} ${unit}` : Number(trimmed);
  return trimmed;
}

/** Convert one document value to `unit` (heads given as pressure, and anything unparseable, stay as written). */
export function convertValue(raw: unknown, def: FieldDef, unit: string): unknown {
  if (!unit || raw === undefined || raw === null) return raw;
  const parsed = parseQuantity(raw, def.kind, documentUnit(def.path) || undefined);
  if (!parsed.ok || parsed.quantity.dimension === 'pressure' || parsed.quantity.dimension === 'number') return raw;
  if (parsed.quantity.dimension === 'force' && def.kind !== 'force') return raw;
  if (parsed.quantity.unit === unit) return raw;
  return `${shownNumber(fromSi(parsed.quantity.si, unit), unit)} ${unit}`;
}

/** A copy of the document with every listed field written in the system's units. */
export function convertDocument(doc: Doc, defs: readonly FieldDef[], system: UnitSystem): Doc {
  let out = doc;
  for (const def of defs) {
    const raw = getAt(out, def.path);
    if (raw === undefined) continue;
    const next = convertValue(raw, def, unitFor(def, system));
    if (next !== raw) out = setAt(out, def.path, next);
  }
  const points = getAt(out, 'seal.calibration');
  if (Array.isArray(points)) {
    const converted = points.map((p) =>
      p && typeof p === 'object'
        ? {
            ...p,
            head: convertValue((p as Doc).head, CALIBRATION_HEAD, unitFor(CALIBRATION_HEAD, system)),
            mass: convertValue((p as Doc).mass, CALIBRATION_MASS, unitFor(CALIBRATION_MASS, system)),
          }
        : p,
    );
    out = setAt(out, 'seal.calibration', converted);
  }
  return out;
}

export const CALIBRATION_HEAD: FieldDef = { path: 'seal.calibration.head', label: 'Head', kind: 'head', metric: 'm', imperial: 'ft' };
export const CALIBRATION_MASS: FieldDef = { path: 'seal.calibration.mass', label: 'Weight that stopped the flow', kind: 'mass', metric: 'g', imperial: 'oz' };
