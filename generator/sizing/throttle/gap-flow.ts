import { STANDARD_GRAVITY } from '../constants.ts';
import { curtainFlowM3s } from '../hydraulics/curtain-flow-m3s.ts';
import { filmFlowM3s } from '../hydraulics/film-flow-m3s.ts';
import { valveFlowM3s, type ValveLine } from '../hydraulics/valve-flow-m3s.ts';

/** The lip's geometry and what the gap needs besides the line. */
export interface LipGeometry {
  /** bore diameter d_o, m */
  boreM: number;
  /** lip outer diameter d_s, m */
  lipM: number;
  /** film force area pi (r_s^2 - r_o^2) / (2 ln(r_s/r_o)), m2 (the bore's own area included) */
  filmAreaM2: number;
  /** C_d of the curtain */
  dischargeCoefficient: number;
}

export interface GapFlow {
  /** volume flow, m3/s */
  flowM3s: number;
  /** gauge pressure where the bore meets the gap, Pa */
  boreExitPa: number;
  /** water's push down on the pad, N */
  forceN: number;
}

/**
 * Flow and the water's push on the pad with the pad held a gap h above the lip.
 *
 * The line (tank, tube, bore) feeds the gap; the gap's pressure drop is a curtain
 * (inertial) drop at the bore's edge followed by a viscous film drop across the land,
 * the two in series:
 *   dp_gap = rho/2 (Q / (C_d pi d_o h))^2 + Q 6 mu ln(r_s/r_o) / (pi h^3)
 * so H = tube + bore losses + dp_gap / (rho g), solved for Q by bisection (valveFlowM3s).
 * Small gaps are viscous (the film law), large ones inertial (the curtain law), with
 * no switch: the drops add (modelling choice). They are equal at h* = 12 pi mu ln(r_s/r_o) C_d^2 d_o^2 / (rho Q),
 * about 5 um at 36 L/h for a 2 mm bore in a 5 mm lip: below it the film law rules, above it the curtain.
 * Push: F = p_exit A_o + dp_film (A_film - A_o) + rho Q v_o, the bore pressure on the bore,
 * the film's logarithmic pressure across the land, and the jet's momentum (v_o = Q / A_o).
 *
 * `upperHintM3s` (m3/s, default none): a flow above the answer, passed to valveFlowM3s (the previous,
 * wider gap's flow when the gap is marched down: flow grows with the gap).
 * Example: as h grows the push falls from rho g H A_film (a closed film) toward the jet's
 * momentum alone, and Q rises to the open-valve flow.
 * Source: radial film flow and curtain orifice (filmFlowM3s, curtainFlowM3s); momentum balance on the jet.
 */
export function gapFlow(line: ValveLine, lip: LipGeometry, gapM: number, upperHintM3s = Infinity): GapFlow {
  const rho = line.densityKgM3;
  const boreAreaM2 = (Math.PI / 4) * lip.boreM * lip.boreM;
  // per unit dp: film conductance (m3/s/Pa); curtain flow at dp = rho/2 (so Q = that x sqrt(dp / (rho/2)))
  const filmPerPa = filmFlowM3s(gapM, 1, lip.boreM, lip.lipM, line.viscosityPaS);
  const curtainUnit = curtainFlowM3s(gapM, rho / 2, lip.boreM, rho, lip.dischargeCoefficient);
  if (!(gapM > 0)) {
    const p = rho * STANDARD_GRAVITY * Math.max(0, line.headM);
    return { flowM3s: 0, boreExitPa: p, forceN: p * lip.filmAreaM2 };
  }
  const flowM3s = valveFlowM3s(
    line,
    1e-9,
    'illinois',
    (q) => (filmDropPa(q, filmPerPa) + curtainDropPa(q, curtainUnit, rho)) / (rho * STANDARD_GRAVITY),
    upperHintM3s,
  );
  const film = filmDropPa(flowM3s, filmPerPa);
  const exit = film + curtainDropPa(flowM3s, curtainUnit, rho);
  const v = flowM3s / boreAreaM2;
  return { flowM3s, boreExitPa: exit, forceN: exit * boreAreaM2 + film * (lip.filmAreaM2 - boreAreaM2) + rho * flowM3s * v };
}

/** The film's pressure drop at a flow, Pa: Q over its conductance (m3/s per Pa). */
function filmDropPa(flowM3s: number, filmPerPa: number): number {
  return flowM3s / filmPerPa;
}

/** The curtain's pressure drop at a flow, Pa: rho/2 (Q / Q_unit)^2, Q_unit its flow at a drop of rho/2. */
function curtainDropPa(flowM3s: number, curtainUnit: number, rho: number): number {
  return (rho / 2) * (flowM3s / curtainUnit) ** 2;
}
