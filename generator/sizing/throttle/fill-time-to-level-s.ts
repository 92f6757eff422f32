import { flowAtLevelLph, type Characteristic } from './valve-characteristic.ts';

const STEPS = 400;

/**
 * Time for the valve to raise a reservoir from one level to another while the plants drink.
 *
 * Equation: dL/dt = (Q(L) - D) / A_res, so t = integral from L_0 to L_1 of A_res dL / (Q(L) - D),
 * Q(L) the characteristic, by the midpoint rule on 400 steps.
 *
 * @param c the characteristic (levels mm, flows L/h)
 * @param fromMm starting level L_0, mm
 * @param toMm end level L_1, mm (> L_0)
 * @param demandLph the plants' draw D, L/h (>= 0)
 * @param areaM2 reservoir surface A_res, m2
 * @returns seconds, or null when the valve cannot outpace the demand somewhere on the way
 *
 * Example: a constant Q of 24 L/h, no demand, 0.12 m2 raised 20 mm: 2.4 L in 360 s (the same as fillTimeS).
 * Source: volume balance (continuity), any fluid mechanics text.
 */
export function fillTimeToLevelS(c: Characteristic, fromMm: number, toMm: number, demandLph: number, areaM2: number): number | null {
  if (!(toMm > fromMm)) return 0;
  const stepMm = (toMm - fromMm) / STEPS;
  let seconds = 0;
  for (let i = 0; i < STEPS; i++) {
    const netLph = flowAtLevelLph(c, fromMm + (i + 0.5) * stepMm) - demandLph;
    if (!(netLph > 0)) return null;
    seconds += (areaM2 * stepMm * 1e-3) / (netLph / 3.6e6);
  }
  return seconds;
}
