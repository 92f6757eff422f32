import { fillTimeS } from './hydraulics/index.ts';
import type { DesignInputs } from './inputs.ts';
import type { SizingSuccess } from './result.ts';
import type { LeverFlows } from './size-lever.ts';
import { characteristicPoints, type ThrottleReport } from './throttle/throttle-report.ts';

/**
 * The flow figures every valve reports alike, direct or lever: the open valve's
 * flow at both heads (with its band at tank full), the bore's model and length,
 * Reynolds numbers and regime; the fill times at full flow, t = A rise / Q
 * (fillTimeS; null without a reservoir area and rise); then the characteristic's
 * points at both heads and the fill with the valve throttling (`throttle`).
 *
 * Example: a reservoir of 0.05 m2 and 20 mm rise at 30 L/h fills in
 * 0.05 x 0.02 / (30 / 3.6e6) = 120 s, 2 min. Source: continuity.
 */
export function flowFigures(inp: DesignInputs, boreLengthMm: number, flows: LeverFlows, throttle: ThrottleReport): Pick<SizingSuccess, 'flow' | 'characteristic' | 'fill'> {
  const { qMax, qMin, qMaxLow, qMaxHigh } = flows;
  const fillMin = (flowM3s: number) => {
    if (inp.reservoirAreaM2 === null || inp.reservoirRiseM === null) return null;
    const s = fillTimeS({ areaM2: inp.reservoirAreaM2, riseM: inp.reservoirRiseM, flowM3s });
    return s === null ? null : s / 60;
  };
  return {
    flow: {
      atHeadMaxLph: qMax.flowLph,
      atHeadMaxLowLph: qMaxLow.flowLph,
      atHeadMaxHighLph: qMaxHigh.flowLph,
      boreModel: qMax.boreModel,
      boreLengthMm,
      atHeadMinLph: qMin.flowLph,
      reynoldsAtHeadMax: qMax.reynolds,
      reynoldsAtHeadMin: qMin.reynolds,
      regimeAtHeadMax: qMax.regime,
      fillTimeAtHeadMaxMin: fillMin(qMax.flowM3s),
      fillTimeAtHeadMinMin: fillMin(qMin.flowM3s),
    },
    characteristic: { headMax: characteristicPoints(throttle.headMax), headMin: characteristicPoints(throttle.headMin) },
    fill: { timeToHeldMin: throttle.timeToHeldMin, fromLevelMm: throttle.fillFromMm, toLevelMm: throttle.fillToMm },
  };
}
