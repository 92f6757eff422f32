/**
 * A message about a box, with its quantities in the page's unit system
 * (textInUnits), except for the boxes the form keeps in millimetres in both
 * systems (print settings: their limits stay in mm, as the box is).
 */
import { textInUnits } from '../../generator/doc/text-in-units.ts';
import { ALL_FIELDS } from './form-fields.ts';
import type { UnitSystem } from './units-system.ts';

export function messageInUnits(path: string, message: string, system: UnitSystem): string {
  const def = ALL_FIELDS.find((f) => f.path === path);
  return def && def.imperial === def.metric ? message : textInUnits(message, system);
}
