import { PRINT_CLEARANCE_MM } from '../constants.ts';
import type { LeverBasisFields } from './lever-types.ts';

/**
 * The lever's seal pad: a disc cut from the same sheet as the direct valve's
 * (thickness, density, how far it stands proud), but smaller: the pin holds the
 * arm, so the pad only has to cover the lip against the pivot's play (two print
 * clearances, the pin in its eye and in the cheeks) with 1 mm to spare each
 * side, to the half millimetre: d_pad = d_s + 4 c + 2.
 *
 * Example: d_s 5 mm, c 0.25 mm: 8 mm. Mass pi/4 d^2 t rho: 8 mm x 3 mm at 1200 kg/m3 = 0.181 g.
 */
export function leverPad(b: LeverBasisFields): { diameterMm: number; thicknessMm: number; proudMm: number; massKg: number } {
  const sealMm = b.inputs.sealDiameterM * 1e3;
  const diameter = Math.ceil((sealMm + 4 * PRINT_CLEARANCE_MM + 2) * 2 - 1e-9) / 2;
  const thickness = b.inputs.padThicknessM * 1e3;
  const massKg = Math.PI * (diameter / 2) ** 2 * thickness * 1e-9 * b.inputs.padDensityKgM3;
  return { diameterMm: diameter, thicknessMm: thickness, proudMm: b.padProudMm, massKg };
}
