/**
 * Where each part goes when mounted: 4x4 column-major matrices that take a
 * part from its print pose (as buildParts returns it) to its mounted pose,
 * z up from the housing base (the container floor at z = 0).
 *
 * - housing: turned back deck-up: (x, y, z) -> (x, -y, H - z).
 * - float: up to its bottom's height, at rest on the pin (mount.floatRestZMm)
 *   or pressing the pad on the nozzle at H_max (mount.floatSealZMm).
 * - nozzle: printed as mounted; up to the sealing face's height.
 * - pin: axis along x at z = pinTop - d/2 with its flat down (its round top is
 *   the float's seat), the head outside the housing on the -x side. The head's
 *   face stands off where the housing is widest at the head's lowest point
 *   (on the 45-degree flare), so the head never cuts into the foot.
 * - pad: in the float's pocket, its underside on the pocket floor.
 */
import { housingOuterRadiusAtMm } from '../sizing/parts/part-volumes.ts';
import type { SizingSuccess } from '../sizing/result.ts';
import { housingFlipMatrix } from './parts/housing-solid.ts';
import { translation } from './shapes/transform-mesh.ts';

export type PartName = 'housing' | 'float' | 'nozzle' | 'pin';
export const PART_NAMES: readonly PartName[] = ['housing', 'float', 'nozzle', 'pin'];
export type AssemblyState = 'rest' | 'seal';

export function assemblyTransforms(sizing: SizingSuccess, state: AssemblyState): Record<PartName | 'pad', number[]> {
  if (state !== 'rest' && state !== 'seal') {
    throw new RangeError(`assemblyTransforms.state = ${JSON.stringify(state)}; allowed: "rest" or "seal"`);
  }
  const { housing, float, pin, mount } = sizing.parts;
  const floatZ = state === 'rest' ? mount.floatRestZMm : mount.floatSealZMm;
  const axisZ = mount.pinTopZMm - pin.diameterMm / 2;
  const flatZ = axisZ - pin.flatOffsetMm;
  const headFaceX = -housingOuterRadiusAtMm(housing, flatZ);
  return {
    housing: housingFlipMatrix(housing),
    float: translation(0, 0, floatZ),
    nozzle: translation(0, 0, mount.nozzleTipZMm),
    pin: translation(headFaceX, 0, flatZ),
    pad: translation(0, 0, floatZ + float.heightMm - float.pocketDepthMm),
  };
}
