import type { SizingSuccess } from '../sizing/result.ts';

/** Dimensions are compared to this step (mm): a printer cannot tell 0.01 mm apart. */
export const SAME_DESIGN_STEP_MM = 0.01;

/** Numbers rounded to the step, so two sizings that print the same give the same key. */
function rounded(value: unknown): unknown {
  if (typeof value === 'number') return Math.round(value / SAME_DESIGN_STEP_MM) * SAME_DESIGN_STEP_MM;
  if (Array.isArray(value)) return value.map(rounded);
  if (value !== null && typeof value === 'object') {
    return Object.fromEntries(Object.keys(value).sort().map((k) => [k, rounded((value as Record<string, unknown>)[k])]));
  }
  return value;
}

/**
 * The identity of a valve's file set: every part dimension (the solids are a
 * function of `parts` alone) to 0.01 mm, and the print material (it sets the
 * masses on the build sheet).
 */
export function designKey(sizing: SizingSuccess): string {
  return JSON.stringify([rounded(sizing.parts), sizing.inputs.materialName, sizing.inputs.materialDensityKgM3]);
}

export interface DesignGroup {
  id: string;
  /** positions (in the given list) of the members, in order */
  members: number[];
  quantity: number;
  sizing: SizingSuccess;
}

/**
 * Containers whose valves come out the same share one file set: groups in
 * order of first appearance, ids "d1", "d2", ..., quantity the sum of counts.
 * Example: counts [3, 2, 1] where the first two print the same -> d1 x5, d2 x1.
 */
export function groupDesigns(items: readonly { sizing: SizingSuccess | null; count: number }[]): { groups: DesignGroup[]; idOf: (string | null)[] } {
  const byKey = new Map<string, DesignGroup>();
  const groups: DesignGroup[] = [];
  const idOf = items.map((item, i): string | null => {
    if (!item.sizing) return null;
    const key = designKey(item.sizing);
    let group = byKey.get(key);
    if (!group) {
      group = { id: `d${groups.length + 1}`, members: [], quantity: 0, sizing: item.sizing };
      byKey.set(key, group);
      groups.push(group);
    }
    group.members.push(i);
    group.quantity += item.count;
    return group.id;
  });
  return { groups, idOf };
}
