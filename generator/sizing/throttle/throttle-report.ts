import { ORIFICE_DISCHARGE_COEFFICIENT } from '../constants.ts';
import type { DesignBasis } from '../layout/design-basis.ts';
import type { Candidate } from '../layout/evaluate-candidate.ts';
import { fillTimeToLevelS } from './fill-time-to-level-s.ts';
import { lineForDesign, type FlowBand } from './line-for-design.ts';
import { levelAtFlowMm, valveCharacteristic, type Characteristic, type CharacteristicPoint } from './valve-characteristic.ts';

export interface ThrottleReport {
  headMax: Characteristic;
  headMin: Characteristic;
  /** first contact of the pad on the lip at full tank (the throttling's own start is the first touch), mm */
  flow50Mm: number;
  flow10Mm: number;
  flow1Mm: number;
  heldAtDemandMm: number;
  heldAtDemandLowTankMm: number;
  /** the same at low tank */
  lowTank: { flow50Mm: number; flow10Mm: number; flow1Mm: number };
  /** fill time from (held - reservoir rise) to 1 mm below the level held, full tank, low end of the band, min; null without a reservoir */
  timeToHeldMin: number | null;
  fillFromMm: number | null;
  fillToMm: number | null;
  demandLph: number;
}

/** The characteristic of the chosen design at one head and band. */
export function designCharacteristic(b: DesignBasis, c: Candidate, headM: number, band: FlowBand = 'nominal'): Characteristic {
  const inp = b.inputs;
  return valveCharacteristic({
    line: lineForDesign(inp, headM, b.nozzle.totalLengthMm * 1e-3, band),
    lip: { boreM: inp.orificeM, lipM: inp.sealDiameterM, filmAreaM2: b.filmAreaM2, dischargeCoefficient: ORIFICE_DISCHARGE_COEFFICIENT },
    float: c.float,
    floatMassKg: c.massKg,
    touchBottomMm: c.sealBottomMm - b.indentationMm,
    indentationMm: b.indentationMm,
    restBottomMm: c.pinTopMm,
    sealForceN: b.sealForceN(headM),
  });
}

/**
 * The band the valve holds in use (DESIGN second part, "The valve's characteristic"): Q(L) at full and
 * low tank, the levels at 50, 10 and 1 % of the open flow (the nominal open flow at that head, float on
 * its pin), the level held at the demand, and the fill time: dL/dt = (Q(L) - D) / A_res integrated on the
 * low end of the band at full tank from (held - reservoir rise) to 1 mm below the level held.
 * Computed once for the chosen design, never inside the size search.
 */
export function throttleReport(b: DesignBasis, c: Candidate, openAtHeadMaxLph: number, openAtHeadMinLph: number): ThrottleReport {
  return throttleReportOf(b, (headM, band) => designCharacteristic(b, c, headM, band), openAtHeadMaxLph, openAtHeadMinLph);
}

/** The same for any valve whose characteristic at a head and band `characteristicAt` gives (the lever's, say). */
export function throttleReportOf(
  b: DesignBasis,
  characteristicAt: (headM: number, band: FlowBand) => Characteristic,
  openAtHeadMaxLph: number,
  openAtHeadMinLph: number,
): ThrottleReport {
  const inp = b.inputs;
  const demandLph = inp.demandM3s * 3.6e6;
  const headMax = characteristicAt(inp.headMaxM, 'nominal');
  const headMin = inp.headMinM === inp.headMaxM ? headMax : characteristicAt(inp.headMinM, 'nominal');
  const at = (ch: Characteristic, open: number, share: number) => levelAtFlowMm(ch, share * open);
  const heldAtDemandMm = levelAtFlowMm(headMax, demandLph);
  let timeToHeldMin: number | null = null;
  let fillFromMm: number | null = null;
  let fillToMm: number | null = null;
  if (inp.reservoirAreaM2 !== null && inp.reservoirRiseM !== null) {
    const low = characteristicAt(inp.headMaxM, 'low');
    const held = levelAtFlowMm(low, demandLph);
    fillFromMm = held - inp.reservoirRiseM * 1e3;
    fillToMm = held - 1;
    const s = fillTimeToLevelS(low, fillFromMm, fillToMm, demandLph, inp.reservoirAreaM2);
    timeToHeldMin = s === null ? null : s / 60;
  }
  return {
    headMax,
    headMin,
    flow50Mm: at(headMax, openAtHeadMaxLph, 0.5),
    flow10Mm: at(headMax, openAtHeadMaxLph, 0.1),
    flow1Mm: at(headMax, openAtHeadMaxLph, 0.01),
    heldAtDemandMm,
    heldAtDemandLowTankMm: levelAtFlowMm(headMin, demandLph),
    lowTank: {
      flow50Mm: at(headMin, openAtHeadMinLph, 0.5),
      flow10Mm: at(headMin, openAtHeadMinLph, 0.1),
      flow1Mm: at(headMin, openAtHeadMinLph, 0.01),
    },
    timeToHeldMin,
    fillFromMm,
    fillToMm,
    demandLph,
  };
}

/** The points as the result carries them: levels and flows rounded to 0.001 mm and 0.0001 L/h. */
export function characteristicPoints(ch: Characteristic): CharacteristicPoint[] {
  return ch.points.map((p) => ({ levelMm: Math.round(p.levelMm * 1e3) / 1e3, flowLph: Math.round(p.flowLph * 1e4) / 1e4 }));
}
