/**
 * Whether a way out can be applied as offered: its value (with `also`, the
 * values that go with it) lies inside the design document's range for the
 * field, and the document's rules between fields still hold after it
 * (the orifice narrower than the lip; the lowest head at most the highest; bench
 * points whose fit still gives a seal area above 0; the level no higher than the rim, when given).
 * A way out the document would refuse (`nozzle.orifice = -0.8 mm`) is never
 * offered. The ranges are the document's own (generator/doc FIELD_SPECS), read
 * here rather than copied, so the two can never drift apart.
 *
 * Example: with a 2 mm orifice and a 5 mm lip, { field: 'nozzle.orifice', value: '0.3 mm' }
 * does not apply (below 0.5 mm); { field: 'nozzle.sealDiameter', value: '1.8 mm' } does not
 * (not wider than the orifice).
 */
import { FIELD_SPECS } from '../doc/schema.ts';
import { fitSealCalibration } from './hydrostatics/fit-seal-calibration.ts';
import type { DesignInputs } from './inputs.ts';
import { chooseSeal } from './seal/choose-seal.ts';
import { AUTO_PAD } from './seal/pads.ts';
import type { WayOut } from './result.ts';

type Spec = { min: number; max: number; minExclusive?: boolean };
/** The document fields ways out set: their range (in the field's unit), the unit's size in SI, the input they set. */
const SPEC_OF: Record<string, { spec: Spec; si: number; input: keyof DesignInputs }> = {
  'level.target': { spec: FIELD_SPECS.target, si: 1e-3, input: 'targetLevelM' },
  'supply.headMax': { spec: FIELD_SPECS.headMax, si: 1, input: 'headMaxM' },
  'supply.headMin': { spec: FIELD_SPECS.headMin, si: 1, input: 'headMinM' },
  'supply.tubeInnerDiameter': { spec: FIELD_SPECS.tubeInnerDiameter, si: 1e-3, input: 'tubeInnerDiameterM' },
  'nozzle.orifice': { spec: FIELD_SPECS.orifice, si: 1e-3, input: 'orificeM' },
  'nozzle.sealDiameter': { spec: FIELD_SPECS.sealDiameter, si: 1e-3, input: 'sealDiameterM' },
  'limits.maxOuterDiameter': { spec: FIELD_SPECS.maxOuterDiameter, si: 1e-3, input: 'maxOuterDiameterM' },
  'seal.padThickness': { spec: FIELD_SPECS.padThickness, si: 1e-3, input: 'padThicknessM' },
  'container.overflow': { spec: FIELD_SPECS.overflow, si: 1e-3, input: 'overflowM' },
  'container.demand': { spec: FIELD_SPECS.demand, si: 1e-3 / 86400, input: 'demandM3s' },
  'container.rimHeight': { spec: FIELD_SPECS.rimHeight, si: 1e-3, input: 'rimHeightM' },
  'container.wallThickness': { spec: FIELD_SPECS.containerWall, si: 1e-3, input: 'containerWallM' },
};

/**
 * The SI value a way out sets (its text is a number and the field's unit), NaN when it lies outside the
 * field's range, undefined for a field whose value is a name (seal.pad: a table entry the sizing chose).
 */
function siValue(field: string, value: string): number | undefined {
  const known = SPEC_OF[field];
  if (!known) return undefined;
  const x = Number.parseFloat(value);
  if (!Number.isFinite(x)) return Number.NaN;
  const { min, max, minExclusive } = known.spec;
  if (x > max || x < min || (minExclusive && x === min)) return Number.NaN;
  return x * known.si;
}

export function wayOutApplies(inp: DesignInputs, w: WayOut): boolean {
  const changes = [{ field: w.field, value: w.value }, ...(w.also ?? [])];
  const set = new Map(changes.map((c) => [c.field, siValue(c.field, c.value)]));
  if ([...set.values()].some((v) => v !== undefined && Number.isNaN(v))) return false;
  const orifice = set.get('nozzle.orifice') ?? inp.orificeM;
  const lip = set.get('nozzle.sealDiameter') ?? inp.sealDiameterM;
  const headMax = set.get('supply.headMax') ?? inp.headMaxM;
  const headMin = set.get('supply.headMin') ?? inp.headMinM;
  if (!(orifice < lip && headMin <= headMax * (1 + 1e-12))) return false;
  // the rim, when given, stays at or above the level (the container is as it is: a way out never raises its rim)
  const target = set.get('level.target') ?? inp.targetLevelM;
  const rim = set.get('container.rimHeight') ?? inp.rimHeightM;
  if (rim !== null && rim !== undefined && target > rim * (1 + 1e-12)) return false;
  return inp.calibration.length === 0 || calibrationStillFits(changedInputs(inp, changes, set));
}

/** The inputs with the way out applied (a pad named by the way out, or "auto" for the sizing's own choice). */
function changedInputs(inp: DesignInputs, changes: { field: string; value: string }[], set: Map<string, number | undefined>): DesignInputs {
  const out: Record<string, unknown> = { ...inp };
  for (const [field, si] of set) if (si !== undefined) out[SPEC_OF[field]!.input] = si;
  const pad = changes.find((c) => c.field === 'seal.pad');
  if (pad) out.padName = pad.value.trim().toLowerCase() === AUTO_PAD ? null : pad.value;
  return out as unknown as DesignInputs;
}

/**
 * The document's rule for bench points, as it checks them (generator/doc schema): the fit
 * F = F_seat + A rho g H with the pad's seating force for these inputs must give a seal area above 0.
 * A wider lip or another pad changes the seating force, so a way out may break a fit that held.
 */
function calibrationStillFits(inp: DesignInputs): boolean {
  try {
    const seatN = chooseSeal({ ...inp, calibration: [] }).seatN;
    return fitSealCalibration(inp.calibration, inp.liquidDensityKgM3, seatN).sealAreaM2 > 0;
  } catch {
    return false;
  }
}
