import type { DesignBasis } from '../layout/design-basis.ts';
import type { LeverBasis } from './lever-types.ts';

/**
 * The lever search's basis from the direct valve's (designBasis): the same inputs,
 * nozzle, deck, pad and travels. The seal force and the indentation at the seal
 * come from the basis's seal model (`sealForceN(headM)`: the tight-seal force of
 * the pad, or the bench fit; `indentationMm`: the pad's squeeze at that force;
 * `padStopIndentationMm`: where the hard stop takes over).
 */
export function leverBasisFromDesign(b: DesignBasis): LeverBasis {
  return {
    basis: b,
    sealForceN: (headM) => b.sealForceN(headM),
    indentationMm: b.indentationMm,
    padStopIndentationMm: b.padStopIndentationMm,
  };
}
