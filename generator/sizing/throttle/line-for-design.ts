import { ORIFICE_DISCHARGE_COEFFICIENT, SHARP_ENTRANCE_LOSS, TUBE_ROUGHNESS_M } from '../constants.ts';
import type { FrictionBridge } from '../hydraulics/darcy-friction-factor.ts';
import type { ValveLine } from '../hydraulics/valve-flow-m3s.ts';
import type { DesignInputs } from '../inputs.ts';

/**
 * How far a printed bore commonly comes out under its drawn size, m: 0.1 to 0.2 mm (common practice:
 * small holes print tight as the extruded lines squash inward). The flow band's low end takes 0.2 mm.
 */
export const PRINTED_BORE_UNDERSIZE_M = 0.2e-3;

/** A point of the flow band: nominal (drawn bore, linear friction bridge), low, high. */
export type FlowBand = 'nominal' | 'low' | 'high';

/**
 * The supply line of one design at one head, for the flow solvers (valveFlowM3s, gapFlow):
 * tank entrance K 0.5, the design's tube, its bore (a short tube when the insert is at least three
 * bores long) and the flow band's bore and friction bridge:
 * nominal = the drawn bore with the linear bridge between Re 2300 and 4000;
 * low = the bore 0.2 mm under size with the bridge at its higher end (max of laminar and turbulent friction);
 * high = the drawn bore with the bridge at its lower end (min of the two).
 * Source: the choices are the project's (DESIGN second part, "Bore, flow band and drains").
 */
export function lineForDesign(inp: DesignInputs, headM: number, boreLengthM: number, band: FlowBand = 'nominal'): ValveLine {
  const bridge: FrictionBridge = band === 'low' ? 'high' : band === 'high' ? 'low' : 'linear';
  return {
    headM,
    tubeInnerDiameterM: inp.tubeInnerDiameterM,
    tubeLengthM: inp.tubeLengthM,
    orificeM: band === 'low' ? Math.max(inp.orificeM / 2, inp.orificeM - PRINTED_BORE_UNDERSIZE_M) : inp.orificeM,
    densityKgM3: inp.liquidDensityKgM3,
    viscosityPaS: inp.liquidViscosityPaS,
    entranceLossK: SHARP_ENTRANCE_LOSS,
    dischargeCoefficient: ORIFICE_DISCHARGE_COEFFICIENT,
    roughnessM: TUBE_ROUGHNESS_M,
    boreLengthM,
    bridge,
  };
}
