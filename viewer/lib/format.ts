/** Numbers for the grower, in the page's unit system. Inputs are the sizing result's own units (mm, N, g, L/h). */
import type { UnitSystem } from './units-system.ts';

const INCH_MM = 25.4;
const FOOT_M = 0.3048;
const US_GALLON_L = 3.785411784;
const OUNCE_G = 28.349523125;
const STANDARD_GRAVITY = 9.80665;
const US_FLUID_OUNCE_ML = 29.5735295625;

const fixed = (x: number, digits: number) => (Number.isFinite(x) ? x.toFixed(digits) : '–');

export function lengthMm(mm: number, system: UnitSystem, digits = 1): string {
  return system === 'metric' ? `${fixed(mm, digits)} mm` : `${fixed(mm / INCH_MM, digits + 1)} in`;
}

/** A print dimension: millimetres in both systems (slicers work in mm). */
export function printMm(mm: number, digits = 1): string {
  return `${fixed(mm, digits)} mm`;
}

export function headM(m: number, system: UnitSystem): string {
  return system === 'metric' ? `${fixed(m, 2)} m` : `${fixed(m / FOOT_M, 2)} ft`;
}

export function flowLph(lph: number, system: UnitSystem): string {
  return system === 'metric' ? `${fixed(lph, 1)} L/h` : `${fixed(lph / US_GALLON_L, 2)} gal/h`;
}

/** The plants' demand, per day. */
export function demandPerDay(lpd: number, system: UnitSystem): string {
  return system === 'metric' ? `${fixed(lpd, lpd < 10 ? 1 : 0)} L/day` : `${fixed(lpd / US_GALLON_L, 2)} gal/day`;
}

/** A flow in the page's unit, for a plot axis (L/h or US gal/h). */
export function flowAxis(lph: number, system: UnitSystem): number {
  return system === 'metric' ? lph : lph / US_GALLON_L;
}

export function massG(g: number, system: UnitSystem, digits = 0): string {
  return system === 'metric' ? `${fixed(g, digits)} g` : `${fixed(g / OUNCE_G, 2)} oz`;
}

/** A force, with the weight it equals (growers think of pushes as weights). */
export function forceN(n: number, system: UnitSystem): string {
  const grams = (n / STANDARD_GRAVITY) * 1000;
  return system === 'metric' ? `${fixed(n, 2)} N (${fixed(grams, 0)} g)` : `${fixed(n, 2)} N (${fixed(grams / OUNCE_G, 1)} oz)`;
}

export function areaMm2(mm2: number, system: UnitSystem): string {
  return system === 'metric' ? `${fixed(mm2, 0)} mm²` : `${fixed(mm2 / (INCH_MM * INCH_MM), 3)} in²`;
}

export function minutes(min: number | null): string {
  if (min === null || !Number.isFinite(min)) return '–';
  return min < 90 ? `${fixed(min, 0)} min` : `${fixed(min / 60, 1)} h`;
}

/** Plot axis value of a level, in the page's unit. */
export function levelAxis(mm: number, system: UnitSystem): number {
  return system === 'metric' ? mm : mm / INCH_MM;
}

/** Water a float can take in and still shut, and how much each unit of it raises the level (US fl oz and inches in imperial). */
export function leakTolerance(ml: number, risePerMlMm: number, system: UnitSystem): string {
  return system === 'metric'
    ? `${fixed(ml, 1)} mL (each mL raises the level ${fixed(risePerMlMm, 2)} mm)`
    : `${fixed(ml / US_FLUID_OUNCE_ML, 2)} fl oz (each fl oz raises the level ${fixed((risePerMlMm * US_FLUID_OUNCE_ML) / INCH_MM, 2)} in)`;
}

/** Filament used, in metres or feet. */
export function filamentLength(m: number, system: UnitSystem): string {
  return system === 'metric' ? `${fixed(m, 1)} m` : `${fixed(m / FOOT_M, 1)} ft`;
}

/** A push as a weight, for a plot axis: newtons in metric, ounces of weight in imperial. */
export function pushAxis(n: number, system: UnitSystem): number {
  return system === 'metric' ? n : ((n / STANDARD_GRAVITY) * 1000) / OUNCE_G;
}
