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
import type { DirectSizing, LeverSizing, SizingSuccess } from '../sizing/result.ts';
import { housingFlipMatrix } from './parts/housing-solid.ts';
import { leverFrameFlipMatrix } from './parts/lever-frame-solid.ts';
import { fromRows, multiply, translation } from './shapes/transform-mesh.ts';

import type { DirectPartName, LeverPartName, PartName } from './part-names.ts';

export { PART_NAMES, valvePartNames, type DirectPartName, type LeverPartName, type PartName } from './part-names.ts';
export type AssemblyState = 'rest' | 'seal';

export function assemblyTransforms(sizing: DirectSizing, state: AssemblyState): Record<DirectPartName | 'pad', number[]>;
export function assemblyTransforms(sizing: LeverSizing, state: AssemblyState): Partial<Record<LeverPartName | 'pad', number[]>>;
export function assemblyTransforms(sizing: SizingSuccess, state: AssemblyState): Partial<Record<PartName | 'pad', number[]>>;
export function assemblyTransforms(sizing: SizingSuccess, state: AssemblyState): Partial<Record<PartName | 'pad', number[]>> {
  if (state !== 'rest' && state !== 'seal') {
    throw new RangeError(`assemblyTransforms.state = ${JSON.stringify(state)}; allowed: "rest" or "seal"`);
  }
  if (sizing.architecture === 'lever') return leverTransforms(sizing, state);
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

/**
 * The lever valve as mounted (z up from the container floor, x along the arm from the pivot):
 * - frame: turned back deck-up (leverFrameFlipMatrix is its own inverse);
 * - arm: print pose (top face on the bed) back to mounted, (x, y, z) -> (x, -y, armTop - z), with its top
 *   face armTop = the float's sealed bottom + float height + bar depth (the bar rests on the float's collar);
 * - float: under the arm's tip, its bottom at the sealed height; arm, float and pad turn together about the
 *   pivot axis (y through z_p), nose down by the rest turn at rest, level at the seal;
 * - nozzle: as printed, its sealing face at the tip height over the pad arm;
 * - pin: along y through the pivot, flat down, head outside the -y cheek: (x, y, z) -> (-y, x - w/2, z + z_p - flat);
 * - hanger and stem (rim): the stem flat against the frame's back wall, (x, y, z) -> (back - z, y, x + stem bottom);
 *   the hanger's inner leg against the stem, its U over the wall, (x, y, z) -> (x + dx, w/2 - z, y + bridge underside).
 * Rotation about an axis, elementary geometry.
 */
function leverTransforms(sizing: LeverSizing, state: AssemblyState): Partial<Record<LeverPartName | 'pad', number[]>> {
  const { arm, frame, float, pin, rim, mount, pad } = sizing.parts;
  const armTop = mount.floatSealZMm + float.heightMm + arm.barDepthMm;
  const theta = state === 'rest' ? mount.restTurnRad : 0;
  const co = Math.cos(theta);
  const si = Math.sin(theta);
  const z0 = mount.pivotZMm;
  const turn = multiply(translation(0, 0, z0), multiply(fromRows([co, 0, si], [0, 1, 0], [-si, 0, co]), translation(0, 0, -z0)));
  const back = -frame.postHalfLengthMm - frame.wallMm;
  const out: Partial<Record<LeverPartName | 'pad', number[]>> = {
    frame: leverFrameFlipMatrix(frame),
    arm: multiply(turn, fromRows([1, 0, 0], [0, -1, 0], [0, 0, -1], [0, 0, armTop])),
    float: multiply(turn, translation(arm.floatArmMm, 0, mount.floatSealZMm)),
    nozzle: translation(arm.padArmMm, 0, mount.nozzleTipZMm),
    pin: fromRows([0, -1, 0], [1, 0, 0], [0, 0, 1], [0, -frame.widthMm / 2, z0 - pin.flatOffsetMm]),
    pad: multiply(turn, translation(arm.padArmMm, 0, armTop - (pad.thicknessMm - pad.proudMm))),
  };
  if (rim) {
    const stemT = rim.stem.thicknessMm;
    out.stem = fromRows([0, 0, -1], [0, 1, 0], [1, 0, 0], [back, 0, rim.stem.bottomZMm]);
    const dx = back - stemT - (sizing.parts.printClearanceMm + rim.hanger.legMm);
    out.hanger = fromRows([1, 0, 0], [0, 0, -1], [0, 1, 0], [dx, rim.hanger.widthMm / 2, rim.hanger.bridgeBottomZMm]);
  }
  return out;
}
