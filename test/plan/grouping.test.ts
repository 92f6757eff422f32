import { describe, expect, it } from 'vitest';
import { planOf, row } from './helpers.ts';

// Grouping is bookkeeping, checked by counting by hand (common practice: one print job per distinct part,
// quantity = number of identical valves). Filament per valve is the sizing core's own figure.

describe('grouping identical valves into one file set', () => {
  const plan = planOf({
    tank: { fullSurfaceElevation: '2.4 m', lowSurfaceElevation: '2.0 m' },
    main: { innerDiameter: '10 mm' },
    containers: [
      row('left tubs', '0.5 m', { count: 3 }),
      row('right tubs', '0.5 m', { count: 2 }),
      row('deep tub', '0.5 m', { level: '80 mm' }),
      row('floor tub', '0 m'),
    ],
  });

  it('identical containers produce one file set with the summed quantity', () => {
    expect(plan.designs.map((d) => [d.id, d.quantity])).toEqual([['d1', 5], ['d2', 1], ['d3', 1]]);
    expect(plan.containers.map((c) => c.design)).toEqual(['d1', 'd1', 'd2', 'd3']);
    expect(plan.designs[0]!.containerIndices).toEqual([0, 1]);
  });

  it('totals count every valve: four printed parts each, filament and ballast times the count', () => {
    expect(plan.totals.valves).toBe(7); // 3 + 2 + 1 + 1
    expect(plan.totals.parts).toBe(28);
    let grams = 0;
    let ballast = 0;
    for (const c of plan.containers) {
      if (!c.sizing.ok) throw new Error('sizing failed');
      grams += c.count * (c.sizing.mass.totalG - c.sizing.mass.byPart.pad);
      ballast += c.count * c.sizing.holdDown.ballastSteelG;
    }
    expect(plan.totals.filamentG).toBeCloseTo(grams, 9);
    expect(plan.totals.ballastSteelG).toBeCloseTo(ballast, 9);
  });
});
