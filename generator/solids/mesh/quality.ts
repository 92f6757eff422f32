/**
 * Two mesh qualities, chosen by the largest allowed chord error of a circle:
 *
 * - export  0.05 mm: what the written STL / 3MF files use (DESIGN.md
 *   "Solids": chord error at most 0.05 mm at export). Well under a typical
 *   0.4 mm nozzle's line width, so facets do not show in the print or bind a fit.
 * - preview 0.3 mm: for the interactive view; about a third of the
 *   triangles per circle, so rebuilding while a value is dragged stays quick.
 *
 * segmentsFor(r, quality) applies segmentsForChordError with that error.
 * Example: r = 10 mm → export 32 segments, preview 16.
 */
import { segmentsForChordError } from './segments-for-chord-error.ts';

export type Quality = 'export' | 'preview';

export const QUALITY: Readonly<Record<Quality, { readonly chordErrorMm: number; readonly purpose: string }>> = {
  export: { chordErrorMm: 0.05, purpose: 'files for printing' },
  preview: { chordErrorMm: 0.3, purpose: 'interactive preview' },
};

export function segmentsFor(radiusMm: number, quality: Quality): number {
  const entry = QUALITY[quality];
  if (!entry) {
    throw new RangeError(`segmentsFor.quality = ${JSON.stringify(quality)}; allowed: ${Object.keys(QUALITY).map((q) => `"${q}"`).join(' or ')}`);
  }
  return segmentsForChordError(radiusMm, entry.chordErrorMm);
}
