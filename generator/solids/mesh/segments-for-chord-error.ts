/**
 * Number of segments for a faceted circle so that no chord strays more than
 * `chordErrorMm` from the true circle.
 *
 * A regular N-gon inscribed in a circle of radius r has chords whose middle
 * lies r (1 - cos(pi/N)) inside the circle (the sagitta of a chord,
 * elementary geometry). Keeping that <= e gives N >= pi / acos(1 - e/r).
 * The count is then at least 8 and rounded up to a multiple of 4, so there
 * are vertices on both axes and holes line up with the x and y directions.
 *
 * Example: r = 10 mm, e = 0.05 mm → pi / acos(0.995) = 31.4 → 32 segments
 * (sagitta 0.048 mm).
 */
import { requirePositive } from './validate.ts';

/** Refuse counts past this: they point to a unit mix-up (metres for millimetres) rather than a real need. */
export const MAX_SEGMENTS = 4096;

export function segmentsForChordError(radiusMm: number, chordErrorMm: number): number {
  requirePositive('segmentsForChordError.radiusMm', radiusMm, 'mm');
  requirePositive('segmentsForChordError.chordErrorMm', chordErrorMm, 'mm');
  // e >= 2r: any polygon is within e (acos of -1 or less is pi), so the minimum applies
  const halfAngle = Math.acos(Math.max(-1, 1 - chordErrorMm / radiusMm));
  const needed = Math.max(8, Math.ceil(Math.PI / halfAngle));
  const segments = Math.ceil(needed / 4) * 4;
  if (segments > MAX_SEGMENTS) {
    throw new RangeError(
      `segmentsForChordError: radiusMm = ${radiusMm} mm with chordErrorMm = ${chordErrorMm} mm needs ${segments} segments; ` +
        `allowed: at most ${MAX_SEGMENTS} (check the units, or use a larger chord error)`,
    );
  }
  return segments;
}
