// container.demand: units checked against NIST SP 811 (1 US gallon = 3.785411784 L; 1 d = 86 400 s)
// and js-quantities (npm, an independent general-purpose unit library).
import Qty from 'js-quantities';
import { describe, expect, it } from 'vitest';
import { parseDesign, type DesignParse } from '../../generator/doc/schema.ts';

const MINIMAL = { supply: { headMax: '2.2 m' }, level: { target: '45 mm' } };
const withDemand = (demand: unknown) => parseDesign({ ...MINIMAL, container: { demand } });
function inputsOf(r: DesignParse) {
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r;
}

describe('container.demand', () => {
  it('litres a day, US gallons a day and litres an hour (NIST SP 811)', () => {
    expect(inputsOf(withDemand('3 L/day')).inputs.demandM3s).toBeCloseTo(3e-3 / 86400, 15);
    expect(inputsOf(withDemand('1 gal/day')).inputs.demandM3s).toBeCloseTo(3.785411784e-3 / 86400, 15);
    expect(inputsOf(withDemand('0.125 L/h')).inputs.demandM3s).toBeCloseTo(3e-3 / 86400, 15);
    expect(inputsOf(withDemand(4)).inputs.demandM3s).toBeCloseTo(4e-3 / 86400, 15); // a bare number is in L/day
  });
  it('agrees with js-quantities on gal/day and L/h', () => {
    const gal = Qty('1 gal/day').to('m^3/s').scalar;
    expect(inputsOf(withDemand('1 gal/day')).inputs.demandM3s).toBeCloseTo(gal, 14);
    const lph = Qty('2 L/h').to('m^3/s').scalar;
    expect(inputsOf(withDemand('2 L/h')).inputs.demandM3s).toBeCloseTo(lph, 14);
  });
  it('zero is allowed; a negative or a non-flow is refused naming the field, the value and the range', () => {
    expect(inputsOf(withDemand('0 L/day')).inputs.demandM3s).toBe(0);
    for (const bad of ['-1 L/day', '3 kg', '6000 L/day']) {
      const r = withDemand(bad);
      expect(r.ok).toBe(false);
      if (r.ok) continue;
      const e = r.errors.find((x) => x.field === 'container.demand');
      expect(e, bad).toBeDefined();
      expect(e!.message).toContain(bad.split(' ')[0]!);
    }
  });
  it('written back in L/day and parsed to the same inputs', () => {
    const first = inputsOf(withDemand('1 gal/day'));
    expect(first.document.container?.demand).toMatch(/L\/day$/);
    expect(inputsOf(parseDesign(first.document)).inputs.demandM3s).toBeCloseTo(first.inputs.demandM3s, 15);
  });
});
