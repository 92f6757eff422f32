/**
 * The refill time needs both "Water surface area" and "Refill depth"
 * (t = A x rise / Q, continuity). The path of the one given without the other,
 * or null when both or neither are given.
 */
import { getAt } from './doc-path.ts';

export const REFILL_BOXES = ['reservoir.area', 'reservoir.rise'] as const;

export function loneRefillBox(doc: unknown): (typeof REFILL_BOXES)[number] | null {
  const given = REFILL_BOXES.filter((path) => {
    const v = getAt(doc, path);
    return !(v === undefined || v === null || (typeof v === 'string' && v.trim() === ''));
  });
  return given.length === 1 ? given[0] : null;
}
