/**
 * The seal pad's disc: padDiameterMm by padThicknessMm, lying flat on z = 0.
 * The pad itself is cut from closed-cell sponge or rubber sheet (the pad
 * table); this disc is drawn in the preview and written, on request, as a
 * cutting template. A printed flexible pad is too stiff for a float to seat
 * and cannot absorb a tilt (generator/sizing/seal/pads.ts).
 */
import { geom3ToMesh, segmentsFor, type IndexedMesh, type Quality } from '../mesh/index.ts';
import type { FloatSpec } from '../../sizing/result.ts';
import { revolveProfile } from '../shapes/revolve-profile.ts';

export function buildPadMesh(f: Pick<FloatSpec, 'padDiameterMm' | 'padThicknessMm'>, quality: Quality): IndexedMesh {
  const r = f.padDiameterMm / 2;
  return geom3ToMesh(revolveProfile([[0, 0], [r, 0], [r, f.padThicknessMm], [0, f.padThicknessMm]], segmentsFor(r, quality)));
}
