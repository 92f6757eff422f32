import { checkRange, NON_NEGATIVE, POSITIVE } from './check-range.ts';
import { boreModel } from './bore-model.ts';
import { MAX_RELATIVE_ROUGHNESS, RELATIVE_ROUGHNESS_RANGE } from './colebrook-friction-factor.ts';
import { BETA_RANGE } from './contraction-loss-k.ts';
import { DISCHARGE_COEFFICIENT_RANGE } from './jet-head-m.ts';
import type { ValveLine } from './valve-flow-m3s.ts';

/**
 * What tubeHeadLossM and boreHeadM would check of a line (valveFlowM3s), once, so that its solver's residual
 * can use their unchecked cores: the head finite; tube diameter > 0, length >= 0, roughness 0 to a tenth of
 * the tube and of the bore, entrance K >= 0; density and viscosity > 0; bore > 0; C_d in (0, 1] for a sharp
 * orifice, bore over tube in (0, 1] for a short tube. Throws RangeError naming the field.
 */
export function checkValveLine(line: ValveLine, boreLengthM: number): void {
  checkRange('headM', line.headM);
  const d = checkRange('tubeInnerDiameterM', line.tubeInnerDiameterM, POSITIVE);
  checkRange('tubeLengthM', line.tubeLengthM, NON_NEGATIVE);
  const roughnessM = line.roughnessM;
  if (!(roughnessM >= 0 && roughnessM <= MAX_RELATIVE_ROUGHNESS * d)) {
    checkRange('roughnessM', roughnessM, { min: 0, max: MAX_RELATIVE_ROUGHNESS * d, note: 'a tenth of tubeInnerDiameterM' });
  }
  checkRange('entranceLossK', line.entranceLossK, NON_NEGATIVE);
  checkRange('densityKgM3', line.densityKgM3, POSITIVE);
  checkRange('viscosityPaS', line.viscosityPaS, POSITIVE);
  const boreM = checkRange('orificeM', line.orificeM, POSITIVE);
  if (boreModel(boreLengthM, boreM) === 'orifice') {
    checkRange('dischargeCoefficient', line.dischargeCoefficient, DISCHARGE_COEFFICIENT_RANGE);
  } else {
    checkRange('relativeRoughness', roughnessM / boreM, RELATIVE_ROUGHNESS_RANGE);
    checkRange('beta', Math.min(1, boreM / d), BETA_RANGE);
  }
}
