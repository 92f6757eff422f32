import { OVERHANG_RISE } from '../constants.ts';
import type { PinSpec } from '../result.ts';

/** Retainer pin diameter, mm (common practice: stiff enough across a 100 mm bore in PETG). */
export const PIN_DIAMETER_MM = 4;
/** The pin sticks out this far past the housing on the far side, mm. */
const PIN_STICK_OUT_MM = 3;

/**
 * Retainer pin: round bar with a flat at r cos 50deg below the axis (printed on
 * the flat, every overhang then at 50 degrees or steeper: the circle's tangent where
 * it meets the flat is 50 degrees from the bed), long enough to cross the housing
 * at the hole height, with a tab head wider than the hole.
 */
export function pinSpec(spanMm: number, holeDiameterMm: number): PinSpec {
  const r = PIN_DIAMETER_MM / 2;
  const flat = r / Math.hypot(1, OVERHANG_RISE);
  return {
    diameterMm: PIN_DIAMETER_MM,
    flatOffsetMm: flat,
    lengthMm: spanMm + PIN_STICK_OUT_MM,
    head: { lengthMm: 3, widthMm: holeDiameterMm + 4, heightMm: r + flat },
  };
}
