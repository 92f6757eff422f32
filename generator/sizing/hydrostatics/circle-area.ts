/**
 * Area of a circle from its diameter, A = (pi/4) d^2 (any units squared).
 * Example: d = 5 mm gives 19.635 mm2. Source: elementary geometry.
 */
export function circleArea(diameter: number): number {
  return (Math.PI / 4) * diameter * diameter;
}

/** Diameter of the circle with a given area, d = sqrt(4 A / pi). Inverse of circleArea. */
export function diameterForArea(area: number): number {
  return Math.sqrt((4 * area) / Math.PI);
}
