/**
 * The filament choice in the form, read from and written to `print.material`:
 * a name from the table (generator/sizing/materials.ts) or the grower's own
 * `{ name, density }`. The document holds the value; parseDesign judges it.
 */
import { DEFAULT_MATERIAL_NAME, findMaterial } from '../../generator/sizing/materials.ts';
import { formatNumber } from '../../generator/doc/units.ts';
import type { FieldDef } from './units-system.ts';

/** Option value of "other filament" in the menu (no table name can be spelled like this). */
export const OTHER_FILAMENT = '__other';

export type MaterialChoice =
  | { kind: 'table'; name: string }
  | { kind: 'other'; name: string; density: unknown }
  /** text that names no table material (parseDesign reports it) */
  | { kind: 'unknown'; text: string };

/** What the document's `print.material` means for the menu. Absent: the default (PETG). */
export function materialChoice(raw: unknown): MaterialChoice {
  if (raw === undefined || raw === null) return { kind: 'table', name: DEFAULT_MATERIAL_NAME };
  if (typeof raw === 'string') {
    const found = findMaterial(raw);
    return found ? { kind: 'table', name: found.name } : { kind: 'unknown', text: raw };
  }
  if (typeof raw === 'object' && !Array.isArray(raw)) {
    const o = raw as { name?: unknown; density?: unknown };
    return { kind: 'other', name: typeof o.name === 'string' ? o.name : '', density: o.density };
  }
  return { kind: 'unknown', text: String(raw) };
}

/**
 * The document value when the grower picks "other filament": the custom
 * material they had before, if any, else the current table material's name and
 * density as a start to edit (a valid design, so nothing turns red on the pick).
 */
export function otherFilamentValue(raw: unknown, remembered: { name: string; density: unknown } | null): { name: string; density: unknown } {
  if (remembered) return { ...remembered };
  const current = materialChoice(raw);
  const table = findMaterial(current.kind === 'table' ? current.name : DEFAULT_MATERIAL_NAME)!;
  return { name: table.name, density: `${formatNumber(table.densityKgM3 / 1000, 4)} g/cm3` };
}

/** The density box: g/cm3 in both systems (spools and datasheets give it so); other units as typed. */
export const MATERIAL_DENSITY_FIELD: FieldDef = {
  path: 'print.material.density',
  label: 'Filament density',
  kind: 'density',
  metric: 'g/cm3',
  imperial: 'g/cm3',
  hint: 'from the spool; also takes kg/m3',
};
