/** The last good design and the unit system, kept in the browser between visits. */
import type { UnitSystem } from './units-system.ts';

export const STORAGE_KEY = 'floatwright.workbench.v1';

export interface Saved {
  doc: Record<string, unknown>;
  units: UnitSystem;
}

export function loadSaved(storage: Pick<Storage, 'getItem'> | undefined): Saved | null {
  try {
    const text = storage?.getItem(STORAGE_KEY);
    if (!text) return null;
    const value = JSON.parse(text) as Partial<Saved>;
    if (!value || typeof value.doc !== 'object' || value.doc === null || Array.isArray(value.doc)) return null;
    return { doc: value.doc, units: value.units === 'imperial' ? 'imperial' : 'metric' };
  } catch {
    return null;
  }
}

export function save(storage: Pick<Storage, 'setItem'> | undefined, saved: Saved): void {
  try {
    storage?.setItem(STORAGE_KEY, JSON.stringify(saved));
  } catch {
    // storage full or blocked: the design stays on screen, only the reload memory is lost
  }
}
