/**
 * Corners of a regular N-gon of radius r (on the circle) at angles
 * phase + 2 pi k / N, counter-clockwise; axis-aligned corners are exact zeros
 * when phase = 0 and N is a multiple of 4.
 */
export function circlePoints(radiusMm: number, segments: number, phaseRad = 0): [number, number][] {
  const points: [number, number][] = [];
  for (let k = 0; k < segments; k++) {
    if (phaseRad === 0 && (4 * k) % segments === 0) {
      const q = ((4 * k) / segments) % 4;
      points.push(([[1, 0], [0, 1], [-1, 0], [0, -1]] as [number, number][])[q].map((c) => c * radiusMm) as [number, number]);
      continue;
    }
    const a = phaseRad + (2 * Math.PI * k) / segments;
    points.push([radiusMm * Math.cos(a), radiusMm * Math.sin(a)]);
  }
  return points;
}
