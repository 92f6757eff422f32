import { describe, expect, it } from 'vitest';
import { parsePlan } from '../../generator/plan/schema.ts';
import { solvePlan } from '../../generator/plan/solve-plan.ts';
import { planOf, row } from './helpers.ts';

// Hydrostatics: the static head at a point is the free-surface elevation minus the point's elevation
// (any fluid mechanics text, e.g. White, Fluid Mechanics, ch. 2; from memory). The plan's tip elevation is
// the floor elevation plus the tip height the sizing places, so both rows must satisfy that identity.

const doc = {
  tank: { fullSurfaceElevation: '2.6 m', lowSurfaceElevation: '2.0 m' },
  main: { innerDiameter: '8 mm' },
  containers: [row('upper', '1.2 m'), row('lower', '0.2 m')],
};

describe('two containers at different floor elevations', () => {
  const plan = planOf(doc);
  const [upper, lower] = plan.containers;

  it('get different head ranges, each equal to surface minus (floor + own tip height)', () => {
    for (const c of [upper!, lower!]) {
      if (!c.sizing.ok) throw new Error('sizing failed');
      const tipHeightM = c.sizing.nozzle.tipHeightMm / 1e3;
      expect(c.tipElevationM).toBeCloseTo(c.floorElevationM + tipHeightM, 12);
      expect(c.headMaxM).toBeCloseTo(2.6 - c.tipElevationM, 12);
      expect(c.headMinM).toBeCloseTo(2.0 - c.tipElevationM, 12);
      expect(c.headMaxM - c.headMinM).toBeCloseTo(0.6, 12); // the tank's own swing
      expect(Math.abs(c.sizing.inputs.headMaxM - c.headMaxM)).toBeLessThan(2e-4); // sized at its own head (0.1 mm)
    }
    expect(lower!.headMaxM).toBeGreaterThan(upper!.headMaxM + 0.9);
    expect(lower!.headMaxM - upper!.headMaxM).toBeLessThan(1.0 + 1e-9); // 1 m of floor, less the taller valve below
  });

  it('size the lower (higher-head) valve with a float at least as wide, and different files', () => {
    if (!upper!.sizing.ok || !lower!.sizing.ok) throw new Error('sizing failed');
    expect(lower!.sizing.float.outerDiameterMm).toBeGreaterThanOrEqual(upper!.sizing.float.outerDiameterMm);
    expect(upper!.design).not.toBe(lower!.design);
    // both hold the target at full tank; the low tank lowers the shut-off (DESIGN closed form: by (H_max - H_min) d_s^2 / D_f^2)
    for (const c of [upper!, lower!]) {
      if (!c.sizing.ok) continue;
      expect(c.shutOffAtHeadMaxMm).toBeCloseTo(45, 6);
      const drop = (c.headMaxM - c.headMinM) * 1e3 * (c.sizing.closingForce.equivalentSealDiameterMm / c.sizing.float.outerDiameterMm) ** 2;
      expect(c.shutOffAtHeadMaxMm! - c.shutOffAtHeadMinMm!).toBeCloseTo(drop, 0);
    }
  });

  it('refuses a floor that puts the tip above the low tank, naming the plan path', () => {
    const parsed = parsePlan({ ...doc, containers: [row('ok', '0.2 m'), row('too high', '1.98 m')] });
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    const solved = solvePlan(parsed.plan);
    expect(solved.ok).toBe(false);
    if (solved.ok) return;
    expect(solved.errors).toHaveLength(1);
    expect(solved.errors[0]!.field).toBe('containers.1.floorElevation');
    expect(solved.errors[0]!.message).toMatch(/1\.98 m is too high; the nozzle tip .* is not below the tank's lowest surface \(2 m\): the floor must be below/);
  });

  it('refuses more than 3.05 m of head (10 ft, the low-pressure cap) at the floor that causes it', () => {
    const parsed = parsePlan({ ...doc, tank: { fullSurfaceElevation: '3.2 m' }, containers: [row('deep', '0 m')] });
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    const solved = solvePlan(parsed.plan);
    expect(solved.ok).toBe(false);
    if (!solved.ok) expect(solved.errors[0]).toMatchObject({ field: 'containers.0.floorElevation', message: expect.stringMatching(/too low.*more than 3\.05 m/) });
  });

  it('a container no size fits makes the plan not ok, with ways out named by plan path', () => {
    const plan = planOf({ ...doc, containers: [row('fine', '0.2 m'), row('shallow', '0 m', { level: '12 mm', maxOuterDiameter: '40 mm' })] });
    expect(plan.ok).toBe(false);
    const bad = plan.containers[1]!;
    expect(bad.design).toBeNull();
    expect(bad.waysOut.length).toBeGreaterThan(0);
    for (const w of bad.waysOut) expect(w.field).toMatch(/^containers\.1\.(level|maxOuterDiameter|floorElevation)$|^design\./);
    expect(bad.waysOut.map((w) => w.field)).toContain('containers.1.level');
    expect(plan.totals.valves).toBe(1); // only the valve that fits is counted
  });
});
