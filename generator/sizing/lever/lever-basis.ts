import { closingForceN } from '../hydrostatics/closing-force-n.ts';
import type { DesignBasis } from '../layout/design-basis.ts';
import type { LeverBasis } from './lever-types.ts';

/**
 * The lever search's basis from the direct valve's (designBasis): the same inputs,
 * nozzle, deck, pad and travels. The seal force and the indentation at the seal
 * come from the basis's seal model when it has one (`sealForceN(headM)`,
 * `indentationMm`); until then from today's closing force p(H) A_seal + F_pre
 * (closingForceN, with the basis's seal area and preload, fitted or not) and the
 * document's indentation.
 */
export function leverBasisFromDesign(b: DesignBasis): LeverBasis {
  const seal = b as DesignBasis & Partial<{ sealForceN: (headM: number) => number; indentationMm: number }>;
  const rho = b.inputs.liquidDensityKgM3;
  return {
    basis: b,
    sealForceN:
      typeof seal.sealForceN === 'function'
        ? (headM) => seal.sealForceN!(headM)
        : (headM) => closingForceN({ headM, sealAreaM2: b.sealAreaM2, preloadN: b.preloadN, densityKgM3: rho }),
    indentationMm: typeof seal.indentationMm === 'number' ? seal.indentationMm : b.inputs.indentationM * 1e3,
  };
}
