import type { DesignInputs } from '../inputs.ts';

/** The printer bed, mm, from the design document's `print.bed` (DesignInputs bedWidthM, bedDepthM; 220 x 220 mm by default). */
export function printBedMm(inp: DesignInputs): { widthMm: number; depthMm: number } {
  return { widthMm: inp.bedWidthM * 1e3, depthMm: inp.bedDepthM * 1e3 };
}

/** Whether a footprint fits on the bed, either way round. */
export function fitsBed(widthMm: number, depthMm: number, bed: { widthMm: number; depthMm: number }): boolean {
  return (widthMm <= bed.widthMm && depthMm <= bed.depthMm) || (widthMm <= bed.depthMm && depthMm <= bed.widthMm);
}
