import { describe, expect, it } from 'vitest';
import { parsePlan } from '../../generator/plan/schema.ts';
import { row } from './helpers.ts';

// Unit factors checked against NIST SP 811 App. B (1 ft = 0.3048 m exactly); the error paths are the plan's
// own contract (issue 5), so these are checks of wording and paths, common practice for input validation.

const base = { tank: { fullSurfaceElevation: '2.4 m' }, main: { innerDiameter: '8 mm' } };
const errorsOf = (doc: unknown) => {
  const p = parsePlan(doc);
  if (p.ok) throw new Error('expected errors');
  return p.errors;
};

describe('plan document', () => {
  it('takes units anywhere: feet for elevations (0.3048 m, NIST SP 811), maps container fields onto design fields', () => {
    const p = parsePlan({
      ...base,
      tank: { fullSurfaceElevation: '8 ft', lowSurfaceElevation: '6 ft' },
      design: { print: { material: 'PLA' }, reservoir: { rise: '2 cm' } },
      containers: [row('a', '1 ft', { branch: { length: '120 cm', innerDiameter: '0.25 in' }, reservoirArea: '0.08 m2', maxOuterDiameter: '80 mm' })],
    });
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    expect(p.plan.tankFullSurfaceElevationM).toBeCloseTo(8 * 0.3048, 12);
    expect(p.plan.tankLowSurfaceElevationM).toBeCloseTo(6 * 0.3048, 12);
    expect(p.plan.starvingShare).toBe(0.5);
    const c = p.plan.containers[0]!;
    expect(c.floorElevationM).toBeCloseTo(0.3048, 12);
    expect(c.count).toBe(1);
    expect(c.inputs.tubeLengthM).toBeCloseTo(1.2, 12);
    expect(c.inputs.tubeInnerDiameterM).toBeCloseTo(0.00635, 12);
    expect(c.inputs.reservoirAreaM2).toBeCloseTo(0.08, 12);
    expect(c.inputs.reservoirRiseM).toBeCloseTo(0.02, 12);
    expect(c.inputs.maxOuterDiameterM).toBeCloseTo(0.08, 12);
    expect(c.inputs.materialName).toBe('PLA');
    expect(c.inputs.targetLevelM).toBeCloseTo(0.045, 12);
  });

  it('names the plan path of each problem: container fields, design defaults, container overrides', () => {
    const errors = errorsOf({
      ...base,
      design: { print: { wall: '0.5 mm' } },
      containers: [
        row('a', '0.5 m'),
        row('b', 'high', { level: '900 mm' }),
        row('c', '0.5 m', { branch: { innerDiameter: '0.1 mm' }, design: { nozzle: { orifice: '9 mm' } } }),
      ],
    });
    const fields = errors.map((e) => e.field);
    expect(fields).toContain('containers.1.floorElevation');
    expect(fields).toContain('design.print.wall');
    expect(fields.filter((f) => f === 'design.print.wall')).toHaveLength(1); // reported once, not per container
    expect(errors.find((e) => e.field === 'containers.2.branch.innerDiameter')!.message).toMatch(/too low; the feed tube's inside width must be from 1 mm to 25 mm/);
    expect(errors.find((e) => e.field === 'containers.2.design.nozzle.orifice')!.message).toMatch(/9 mm/);
  });

  it('maps level.target back to the container', () => {
    const errors = errorsOf({ ...base, containers: [row('a', '0.5 m', { level: '900 mm' })] });
    expect(errors).toEqual([{ field: 'containers.0.level', message: expect.stringMatching(/^"900 mm" is too high; the water depth to hold .* from 5 mm to 300 mm/) }]);
    expect(errorsOf({ ...base, containers: [{ name: 'a', floorElevation: '0.5 m' }] })[0]!.field).toBe('containers.0.level');
  });

  it('refuses heads in the design (the plan works them out), a liquid per container, and a field given twice', () => {
    const errors = errorsOf({
      ...base,
      design: { supply: { headMax: '2 m' } },
      containers: [row('a', '0.5 m', { design: { liquid: { density: '1000 kg/m3' }, level: { target: '40 mm' } } })],
    });
    expect(errors.map((e) => e.field).sort()).toEqual(['containers.0.design.liquid', 'containers.0.level', 'design.supply.headMax']);
  });

  it('refuses unknown keys with a hint, duplicate names, fractional counts, a low tank above the full one', () => {
    const errors = errorsOf({
      ...base,
      tank: { fullSurfaceElevation: '2 m', lowSurfaceElevation: '2.5 m' },
      containers: [row('a', '0.5 m', { cout: 2 }), row('a', '0.2 m', { count: 1.5 })],
    });
    expect(errors).toEqual(
      expect.arrayContaining([
        { field: 'containers.0.cout', message: 'unknown key "cout"; did you mean "count"?' },
      ]),
    );
    const more = errorsOf({ ...base, tank: { fullSurfaceElevation: '2 m', lowSurfaceElevation: '2.5 m' }, containers: [row('a', '0.5 m'), row('a', '0.2 m', { count: 1.5 })] });
    expect(more.map((e) => e.field)).toEqual(['tank.lowSurfaceElevation', 'containers.1.name', 'containers.1.count']);
    expect(errorsOf({ ...base, containers: [] })).toEqual([{ field: 'containers', message: 'empty; give at least one container.' }]);
    expect(errorsOf([])[0]!.field).toBe('plan');
    expect(errorsOf({ ...base, containers: [row('a', '3 m')] })[0]!.field).toBe('containers.0.floorElevation');
  });
});
