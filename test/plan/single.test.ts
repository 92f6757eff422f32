import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { solveTipElevation } from '../../generator/plan/solve-tip-elevation.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import { planOf, row } from './helpers.ts';

// Reference: DESIGN.md's worked scale (from memory of the team's own bench notes): 2.2 m of head and a
// 45 mm level with the defaults give a float of roughly 54 mm across. The plan must give exactly what the
// sizing core gives for the same head, since it only adds the elevations around it.

describe('a flat plan with one container', () => {
  const plan = planOf({
    tank: { fullSurfaceElevation: '2.5 m' },
    main: { innerDiameter: '8 mm' },
    containers: [row('bench', '0.3 m')],
  });
  const c = plan.containers[0]!;

  it('gives the same design as the sizing core alone at the head it solved', () => {
    expect(plan.ok).toBe(true);
    expect(plan.designs).toHaveLength(1);
    const doc = parseDesign({ supply: { headMax: `${c.headMaxM} m`, tubeLength: '2 m' }, level: { target: '45 mm' } });
    if (!doc.ok) throw new Error(JSON.stringify(doc.errors));
    const alone = sizeDesign(doc.inputs);
    if (!alone.ok || !c.sizing.ok) throw new Error('sizing failed');
    expect(c.sizing.float.outerDiameterMm).toBe(alone.float.outerDiameterMm);
    // the guide collar carries the stop gap, which follows the pad's indentation: equal to a micrometre
    expect(c.sizing.float.heightMm).toBeCloseTo(alone.float.heightMm, 3);
    expect(c.sizing.footprintMm).toBe(alone.footprintMm);
    // same head to 0.1 mm, so the same tip to well under 0.1 mm (about 5 mm of tip per metre of head)
    expect(Math.abs(c.sizing.nozzle.tipHeightMm - alone.nozzle.tipHeightMm)).toBeLessThan(0.1);
    expect(Math.abs(c.sizing.mass.totalG - alone.mass.totalG)).toBeLessThan(0.05);
    expect(c.shutOffAtHeadMaxMm).toBeCloseTo(45, 6);
    // roughly 54 mm across at about 2.1 m of head (DESIGN.md scale note; "roughly")
    expect(c.sizing.float.outerDiameterMm).toBeGreaterThan(45);
    expect(c.sizing.float.outerDiameterMm).toBeLessThan(65);
  });

  it('puts the tip where the sizing puts it: head = surface - (floor + tip height), to 0.1 mm', () => {
    if (!c.sizing.ok) throw new Error('sizing failed');
    expect(c.tipElevationM).toBeCloseTo(0.3 + c.sizing.nozzle.tipHeightMm / 1e3, 12);
    expect(c.headMaxM).toBeCloseTo(2.5 - c.tipElevationM, 12);
    // the head the valve was sized for agrees with the head its own tip gives (fixed point, 0.1 mm)
    expect(Math.abs(c.sizing.inputs.headMaxM - c.headMaxM)).toBeLessThan(2e-4);
    // a flat tank: lowest head = highest head
    expect(c.headMinM).toBeCloseTo(c.headMaxM, 12);
  });

  it('checks the doc comment example: 2.4 m tank, 0.3 m floor, 45 mm level: tip near 82.3 mm, head near 2.018 m', () => {
    const doc = parseDesign({ supply: { headMax: '1 m' }, level: { target: '45 mm' } });
    if (!doc.ok) throw new Error('bad doc');
    const r = solveTipElevation({ inputs: doc.inputs, floorElevationM: 0.3, tankFullSurfaceElevationM: 2.4, tankLowSurfaceElevationM: 2.4 });
    expect(r.converged).toBe(true);
    expect(Math.abs((r.tipElevationM - 0.3) * 1e3 - 82.3)).toBeLessThan(0.5);
    expect(Math.abs(r.headMaxM - 2.0177)).toBeLessThan(5e-4);
    expect(r.headMaxM).toBeCloseTo(2.4 - r.tipElevationM, 12);
  });

  it('on a float-size step where the iterates cycle, keeps the design sized for the higher head', () => {
    // A stand-in sizing with a step: tip 70 mm above 2.0 m of head, 50 mm below (fixed-point iteration
    // on a discontinuous map has no fixed point; Burden and Faires sec. 2.2, from memory).
    const doc = parseDesign({ supply: { headMax: '1 m' }, level: { target: '45 mm' } });
    if (!doc.ok) throw new Error('bad doc');
    const size = (inp: typeof doc.inputs) => ({ ok: true, inputs: inp, nozzle: { tipHeightMm: inp.headMaxM > 2.0 ? 70 : 50 } }) as never;
    const r = solveTipElevation({ inputs: doc.inputs, floorElevationM: 0, tankFullSurfaceElevationM: 2.06, tankLowSurfaceElevationM: 2.06, size });
    expect(r.converged).toBe(false);
    expect(r.tipElevationM).toBeCloseTo(0.07, 12);
    expect((r.sizing as { inputs: { headMaxM: number } }).inputs.headMaxM).toBeCloseTo(2.01, 9);
  });

  it('converges the fixed point from far-off guesses to the same tip', () => {
    const doc = parseDesign({ supply: { headMax: '1 m', tubeLength: '2 m' }, level: { target: '45 mm' } });
    if (!doc.ok) throw new Error('bad doc');
    const solve = (guess: number) =>
      solveTipElevation({ inputs: doc.inputs, floorElevationM: 0.3, tankFullSurfaceElevationM: 2.5, tankLowSurfaceElevationM: 2.5, guessTipHeightM: guess });
    const a = solve(0);
    const b = solve(0.2);
    expect(a.converged && b.converged).toBe(true);
    expect(Math.abs(a.tipElevationM - b.tipElevationM)).toBeLessThan(2e-4);
    expect(a.iterations).toBeLessThan(8);
    expect(c.tipElevationM).toBeCloseTo(a.tipElevationM, 3);
  });
});
