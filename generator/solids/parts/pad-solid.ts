/**
 * The optional printed seal pad (flexible filament): a disc of the float's
 * padDiameterMm by padThicknessMm, lying flat on z = 0. The default is a
 * bought disc of closed-cell foam or soft rubber; this is for growers who
 * print one in TPU.
 */
import { geom3ToMesh, segmentsFor, type IndexedMesh, type Quality } from '../mesh/index.ts';
import type { FloatSpec } from '../../sizing/result.ts';
import { revolveProfile } from '../shapes/revolve-profile.ts';

export function buildPadMesh(f: FloatSpec, quality: Quality): IndexedMesh {
  const r = f.padDiameterMm / 2;
  return geom3ToMesh(revolveProfile([[0, 0], [r, 0], [r, f.padThicknessMm], [0, f.padThicknessMm]], segmentsFor(r, quality)));
}
