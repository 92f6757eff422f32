/**
 * The lever tests' demo valves, scenarios of our own (not reference data): a
 * 25 mm tray at 2 m on the floor and a 250 mm bucket at 1.5 m hung from a rim
 * 100 mm above its level (3 mm wall); the low tank at 75 % of full, a 120 mm footprint (at 90 mm the tray's float,
 * turning down with the arm at rest, would swing into the frame).
 */
import { designBasis } from '../../generator/sizing/layout/design-basis.ts';
import { leverBasisFromDesign, searchLever, type LeverCandidate } from '../../generator/sizing/lever/index.ts';
import { defaultInputs } from '../sizing/fixtures.ts';

/** The demo valve's inputs (the low tank at 75 % of the head, a 120 mm footprint unless given). */
export const demoLeverInputs = (headM: number, levelM: number, limitM = 0.12) =>
  defaultInputs({ headMaxM: headM, headMinM: 0.75 * headM, targetLevelM: levelM, maxOuterDiameterM: limitM });

export function demoLever(headM: number, levelM: number, mount: 'floor' | 'rim', limitM = 0.12): LeverCandidate {
  const inp = demoLeverInputs(headM, levelM, limitM);
  const out = searchLever(leverBasisFromDesign(designBasis(inp)), mount === 'rim' ? { mount, rim: { rimHeightMm: levelM * 1e3 + 100, wallThicknessMm: 3 } } : { mount });
  if (!out.best) throw new Error('the demo lever did not size');
  return out.best;
}

export const demoTray = () => demoLever(2, 0.025, 'floor');
export const demoBucket = () => demoLever(1.5, 0.25, 'rim');
/** A 20 mm tray at 1 m in a 90 mm footprint: it fits only with the frame's back anchor wing left off. */
export const demoNarrowTray = () => demoLever(1, 0.02, 'floor', 0.09);

/** The two demo valves as design documents, the lever asked for (our own scenarios). */
export const TRAY_LEVER = { name: 'Tray lever', supply: { headMax: '2 m', headMin: '1.5 m' }, level: { target: '25 mm' }, valve: { architecture: 'lever' } };
export const BUCKET_RIM = { name: 'Bucket rim', supply: { headMax: '1.5 m', headMin: '1.125 m' }, level: { target: '250 mm' }, container: { rimHeight: '350 mm' }, valve: { mount: 'rim' } };
