/**
 * What an optional box uses when it is left blank, for the grower to see:
 * the placeholder (a number in the box's unit, or a word) and a short note.
 *
 * Options (on the field definition):
 * - a default in DEFAULT_DOCUMENT (generator/doc/schema.ts), or the field's `blankUses`: shown converted to
 *   the box's unit ("120 mm" shows as 4.72 in an inch box);
 * - `blankFrom` (default none): the path of the box a blank one copies ("Tank low" blank: same as "Tank full");
 * - `blankMeans` (default none): what a blank box means when it has no value to show ("no refill time").
 * Returns null for a box that is not optional.
 */
import { DEFAULT_DOCUMENT } from '../../generator/doc/schema.ts';
import { getAt, type Doc } from './doc-path.ts';
import { labelFor } from './field-label.ts';
import { convertValue, displayText, unitFor, type FieldDef, type UnitSystem } from './units-system.ts';

export interface FieldDefault {
  /** shown greyed in the empty box */
  placeholder: string;
  /** said under the box: what a blank box uses */
  note: string;
}

export function fieldDefault(def: FieldDef, doc: Doc, system: UnitSystem): FieldDefault | null {
  if (!def.optional) return null;
  const unit = unitFor(def, system);
  const fallback = getAt(DEFAULT_DOCUMENT, def.path) ?? def.blankUses;
  if (fallback !== undefined) {
    const shown = displayText(convertValue(fallback, def, unit), def, system);
    return { placeholder: shown, note: `Blank uses ${shown}${unit ? ` ${unit}` : ''} (the usual value).` };
  }
  if (def.blankFrom) {
    const other = getAt(doc, def.blankFrom);
    const shown = other === undefined ? '' : displayText(convertValue(other, def, unit), def, system);
    return { placeholder: shown, note: `Blank: the same as "${labelFor(def.blankFrom)}".` };
  }
  return { placeholder: def.blankMeans ? 'none' : '', note: def.blankMeans ? `Blank: ${def.blankMeans}.` : 'May be left blank.' };
}
