import type { DesignInputs } from '../inputs.ts';

/** Default printer bed, mm: 220 x 220 (common practice for a mid-size printer). */
export const DEFAULT_BED_MM = 220;

/**
 * The printer bed, mm, from the design document's `print.bed` (DesignInputs bedWidthM and
 * bedDepthM) or 220 x 220 when the inputs carry none. `given` says whether the document set it.
 */
export function printBedMm(inp: DesignInputs): { widthMm: number; depthMm: number; given: boolean } {
  const o = inp as DesignInputs & { bedWidthM?: number; bedDepthM?: number };
  const given = typeof o.bedWidthM === 'number' && typeof o.bedDepthM === 'number';
  return {
    widthMm: given ? o.bedWidthM! * 1e3 : DEFAULT_BED_MM,
    depthMm: given ? o.bedDepthM! * 1e3 : DEFAULT_BED_MM,
    given,
  };
}

/** Whether a footprint fits on the bed, either way round. */
export function fitsBed(widthMm: number, depthMm: number, bed: { widthMm: number; depthMm: number }): boolean {
  return (widthMm <= bed.widthMm && depthMm <= bed.depthMm) || (widthMm <= bed.depthMm && depthMm <= bed.widthMm);
}
