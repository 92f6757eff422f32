/** A refused input, by document path. */
export interface RimInputProblem {
  field: string;
  message: string;
}

/** Allowed ranges of the rim inputs, mm. */
export const RIM_HEIGHT_RANGE_MM = { min: 10, max: 1000 } as const;
export const WALL_THICKNESS_RANGE_MM = { min: 0.5, max: 25 } as const;

const fmt = (x: number) => Number(x.toFixed(2)).toString();

/**
 * Checks the rim mount's inputs at the door (document paths container.rimHeight and
 * container.wallThickness, issue 13): each must be in its range, and a rim below the
 * target level is refused (the valve hangs from the rim, so it could never hold a
 * level above it). Returns every problem, each naming its field, the value and the
 * allowed range; empty when all is well.
 *
 * Example: rim 180 mm for a 250 mm target gives one problem on container.rimHeight.
 */
export function rimInputProblems(rimHeightMm: number, wallThicknessMm: number, targetLevelMm: number): RimInputProblem[] {
  const out: RimInputProblem[] = [];
  const range = (field: string, v: number, r: { min: number; max: number }) => {
    if (!Number.isFinite(v) || v < r.min || v > r.max) {
      out.push({ field, message: `${field} = ${Number.isFinite(v) ? `${fmt(v)} mm` : String(v)}; allowed: ${r.min} to ${r.max} mm` });
      return false;
    }
    return true;
  };
  if (range('container.rimHeight', rimHeightMm, RIM_HEIGHT_RANGE_MM) && rimHeightMm < targetLevelMm) {
    out.push({
      field: 'container.rimHeight',
      message: `container.rimHeight = ${fmt(rimHeightMm)} mm is below level.target (${fmt(targetLevelMm)} mm); allowed: at least the target level, since the valve hangs from the rim`,
    });
  }
  range('container.wallThickness', wallThicknessMm, WALL_THICKNESS_RANGE_MM);
  return out;
}
