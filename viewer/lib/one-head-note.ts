/**
 * What bench points measured at a single head do, said to the grower: with
 * one head the fit F = F_pre + A_eff rho g H cannot find both unknowns, so the
 * sizing keeps the pad table's seating force and takes only the seal's area
 * from the weights (fitSealCalibration). Null when two heads at least 1 % apart
 * are given (headsDefineSlope), or no row is complete yet.
 *
 * Heads written as pressures are read as water at 20 °C (998.2 kg/m3), enough
 * to tell heads apart.
 */
import { parseHead, parseMass } from '../../generator/doc/units.ts';
import { WATER_DENSITY_20C } from '../../generator/sizing/constants.ts';
import { headsDefineSlope } from '../../generator/sizing/hydrostatics/fit-seal-calibration.ts';

export function oneHeadNote(points: readonly { head?: unknown; mass?: unknown }[]): string | null {
  const heads: { headM: number }[] = [];
  for (const p of points) {
    const head = parseHead(p.head, WATER_DENSITY_20C);
    if (head.ok && parseMass(p.mass).ok) heads.push({ headM: head.value });
  }
  if (heads.length === 0 || headsDefineSlope(heads)) return null;
  const what = heads.length === 1 ? 'One point' : 'These points are all at one head: they';
  return `${what} can only give the seal's area. The sizing keeps the pad's own seating force from the table for the rest. Add a point at a second head well apart (half or twice as high) to measure both.`;
}
