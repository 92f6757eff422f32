import { parsePlan } from '../../generator/plan/schema.ts';
import { solvePlan } from '../../generator/plan/solve-plan.ts';
import type { PlanResult } from '../../generator/plan/types.ts';

/** Parse and solve a plan document, failing the test with the errors if either step refuses it. */
export function planOf(doc: unknown): PlanResult {
  const parsed = parsePlan(doc);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  const solved = solvePlan(parsed.plan);
  if (!solved.ok) throw new Error(JSON.stringify(solved.errors));
  return solved.result;
}

export const row = (name: string, floor: string, extra: Record<string, unknown> = {}) => ({
  name,
  floorElevation: floor,
  level: '45 mm',
  branch: { length: '2 m', innerDiameter: '4 mm' },
  ...extra,
});
