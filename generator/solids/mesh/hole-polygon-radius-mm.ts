/**
 * Radius to give a faceted hole so a pin of `radiusMm` still fits it.
 *
 * An inscribed N-gon is narrowest across its flats, at r cos(pi/N) from the
 * centre (elementary geometry), so a hole drawn with the nominal radius comes
 * out up to r (1 - cos(pi/N)) too tight. Drawing it with r / cos(pi/N) puts
 * the flats on the nominal circle.
 *
 * Example: r = 1.5 mm, N = 16 → 1.5294 mm.
 */
import { requireInteger, requirePositive } from './validate.ts';

export function holePolygonRadiusMm(radiusMm: number, segments: number): number {
  requirePositive('holePolygonRadiusMm.radiusMm', radiusMm, 'mm');
  requireInteger('holePolygonRadiusMm.segments', segments, 3, 1_000_000);
  return radiusMm / Math.cos(Math.PI / segments);
}
