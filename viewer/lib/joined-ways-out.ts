/**
 * Ways out offered as a pair (the sizing gives each box of the pair its own
 * entry with the same message: "a water depth to hold of at least 32 mm
 * together with a housing foot of 129 mm across") joined into one, so its
 * button sets both boxes: either alone does not make the design work.
 * Entries with a message of their own are kept as they are, in order.
 */
import type { WayOut } from '../../generator/sizing/result.ts';

export function joinedWaysOut(ways: readonly WayOut[]): WayOut[] {
  const out: WayOut[] = [];
  for (const way of ways) {
    const first = out.find((w) => w.message === way.message);
    if (!first) out.push({ ...way, ...(way.also ? { also: [...way.also] } : {}) });
    else first.also = [...(first.also ?? []), { field: way.field, value: way.value }, ...(way.also ?? [])];
  }
  return out;
}
