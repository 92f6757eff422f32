/**
 * Plans the schema accepts are solved or refused with the reason (issue 11, items 6 and 10).
 * Checks against the energy equation for branching pipes (White, Fluid Mechanics, ch. 6, from
 * memory): with no pump the energy head at every tee is at most the tank surface, and by
 * continuity the tank outflow is the sum of every valve's flow. Water at 20 C: 998.2 kg/m3 and
 * 1.0016 mPa s (CRC Handbook, from memory). Names are compared in Unicode NFC (UAX #15).
 */
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { planNetwork, type NetworkRow } from '../../generator/plan/plan-network.ts';
import { planHtml, planMarkdown, planReport } from '../../generator/plan/report.ts';
import { parsePlan } from '../../generator/plan/schema.ts';
import { solveSupplyNetwork } from '../../generator/sizing/hydraulics/index.ts';
import { planOf, row } from '../plan/helpers.ts';

const rho = 998.2, mu = 1.0016e-3;
const design = parseDesign({ supply: { headMax: '1.6 m' }, level: { target: '45 mm' } });
if (!design.ok) throw new Error('bad design');

/** 150 rows of 1000 valves on a 7 mm main, tees 0.1 m apart, each row 5 mm lower: the plan that crashed. */
const hugeRows: NetworkRow[] = Array.from({ length: 150 }, (_, i) => ({
  count: 1000,
  mainLengthM: 0.1 * i,
  tipElevationM: 1.07 - 0.005 * i,
  inputs: design.inputs,
}));

describe('the network solve copes with the largest plans', () => {
  it('150 rows x 1000 valves on a 7 mm main: finite heads, at most the tank, flow conserved', () => {
    const tankM = 2.7;
    const solved = solveSupplyNetwork({
      tankSurfaceElevationM: tankM,
      mainInnerDiameterM: 0.007,
      densityKgM3: rho,
      viscosityPaS: mu,
      branches: hugeRows.map((r) => ({ mainLengthM: r.mainLengthM, count: r.count, tubeInnerDiameterM: 0.004, tubeLengthM: 2, orificeM: 0.002, tipElevationM: r.tipElevationM })),
    });
    expect(solved.converged).toBe(true);
    for (const b of solved.branches) {
      expect(Number.isFinite(b.headAtTeeM)).toBe(true);
      expect(b.headAtTeeM).toBeLessThanOrEqual(tankM + 1e-9);
      expect(b.flowM3s).toBeGreaterThanOrEqual(0);
    }
    const sum = solved.branches.reduce((a, b) => a + b.totalLph, 0);
    expect(Math.abs(solved.mainFlowLph - sum)).toBeLessThan(1e-6 * Math.max(sum, 1));
    // the near rows draw first: along the main every tee head falls
    const heads = solved.branches.map((b) => b.headAtTeeM);
    for (let i = 1; i < heads.length; i++) expect(heads[i]!).toBeLessThanOrEqual(heads[i - 1]! + 1e-9);
  });

  it('planNetwork on the same rows gives finite flows at full and low tank', () => {
    for (const tank of [2.7, 2.15]) {
      const flows = planNetwork({ tankSurfaceElevationM: tank, mainInnerDiameterM: 0.007, densityKgM3: rho, viscosityPaS: mu, rows: hugeRows });
      expect(Number.isFinite(flows.mainFlowLph)).toBe(true);
      for (const f of [...flows.shared, ...flows.alone]) expect(Number.isFinite(f.flowLph) && f.flowLph >= 0).toBe(true);
    }
  });
});

const planDoc = (containers: unknown[]) => ({ tank: { fullSurfaceElevation: '2.7 m', lowSurfaceElevation: '2.15 m' }, main: { innerDiameter: '7 mm' }, containers });

describe('plan limits and names', () => {
  it('more than 1000 valves in all is refused with the cap and what to do', () => {
    const parsed = parsePlan(planDoc(Array.from({ length: 150 }, (_, i) => row(`row ${i}`, '1 m', { count: 1000, mainLength: `${(0.1 * i).toFixed(1)} m` }))));
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.errors).toEqual([{ field: 'containers', message: expect.stringMatching(/150000 valves in all; a plan holds at most 1000 .*Split the bench/) }]);
  });

  it('exactly 1000 valves is accepted', () => {
    const parsed = parsePlan(planDoc([row('a', '1 m', { count: 600 }), row('b', '0.9 m', { count: 400 })]));
    expect(parsed.ok).toBe(true);
  });

  it.each([
    ['case', 'Top tier', 'top TIER'],
    ['spaces', 'top tier', '  top   tier '],
    ['no-break space', 'top tier', 'top\u00a0tier'],
    ['Unicode form', 'caf\u00e9 row', 'cafe\u0301 row'],
  ])('names differing only by %s are one container: refused with the first row named', (_what, a, b) => {
    const parsed = parsePlan(planDoc([row(a, '1 m'), row(b, '0.9 m')]));
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.errors).toEqual([{ field: 'containers.1.name', message: expect.stringMatching(/already the name of containers\.0 .*give each row its own name/) }]);
  });

  it('a container whose name ends in "(!)" does not show as starving; one that starves does', () => {
    const plan = planOf({
      tank: { fullSurfaceElevation: '2 m' },
      main: { innerDiameter: '5 mm' },
      containers: [row('near (!)', '0.3 m', { count: 6, mainLength: '1 m' }), row('far', '1 m', { mainLength: '15 m' })],
    });
    expect(plan.containers.map((c) => c.starving)).toEqual([false, true]);
    const html = planHtml(planReport(plan));
    expect(html).toContain('<tr><td>near (!)</td>');
    expect(html).toContain('<tr class="starving"><td>far (!)</td>');
  });

  it('a newline in a plan or container name never starts a Markdown heading (CommonMark 4.2)', () => {
    const plan = planOf({
      name: 'bench\n# injected plan',
      notes: 'x',
      tank: { fullSurfaceElevation: '2 m' },
      main: { innerDiameter: '8 mm' },
      containers: [row('tub\n## injected row', '0.3 m')],
    });
    const md = planMarkdown(planReport(plan));
    expect(md).not.toMatch(/^#+ injected/m);
    expect(md).toContain('tub \\#\\# injected row');
  });
});
