import { describe, expect, it } from 'vitest';
import { planNetwork, starvingReason, type NetworkRow } from '../../generator/plan/plan-network.ts';
import { supplyFlow } from '../../generator/sizing/hydraulics/index.ts';
import { parseDesign } from '../../generator/doc/schema.ts';
import { planOf, row } from './helpers.ts';

// Method: energy equation for pipes in series and branching pipes (White, Fluid Mechanics, ch. 6, from memory):
// in series the head losses add; at a tee every branch sees the same head. Laminar losses by Hagen-Poiseuille,
// h = 128 mu l Q / (pi rho g d^4); entrance K = 0.5 (Crane TP-410, from memory); jet head (Q/(C_d A_o))^2 / 2g,
// C_d 0.61. Water at 20 C: 998.2 kg/m3 and 1.0016 mPa s (CRC Handbook, from memory); g 9.80665 (NIST SP 330).

const rho = 998.2, mu = 1.0016e-3, g = 9.80665;
const inputsWith = (tube: string, length: string) => {
  const d = parseDesign({ supply: { headMax: '1 m', tubeInnerDiameter: tube, tubeLength: length }, level: { target: '45 mm' } });
  if (!d.ok) throw new Error('bad doc');
  return d.inputs;
};
const rowOf = (over: Partial<NetworkRow> = {}): NetworkRow => ({ count: 1, mainLengthM: 3, tipElevationM: 0, inputs: inputsWith('4 mm', '2 m'), ...over });
const common = { tankSurfaceElevationM: 0.6, mainInnerDiameterM: 0.008, densityKgM3: rho, viscosityPaS: mu };

function bisect(fn: (x: number) => number, lo: number, hi: number): number {
  for (let i = 0; i < 200; i++) {
    const mid = 0.5 * (lo + hi);
    if (fn(mid) < 0) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

describe('plan network (source: energy equation for branching pipes, White ch. 6)', () => {
  it('two identical branches at the same elevation share the flow equally', () => {
    const f = planNetwork({ ...common, rows: [rowOf(), rowOf()] });
    expect(f.shared[0]!.flowLph).toBe(f.shared[1]!.flowLph);
    expect(f.alone[0]!.flowLph).toBe(f.alone[1]!.flowLph);
    expect(f.shared[0]!.flowLph).toBeLessThan(f.alone[0]!.flowLph); // sharing the main costs head
    expect(f.mainFlowLph).toBeCloseTo(2 * f.shared[0]!.flowLph, 8);
  });

  it('a branch with a longer tube gets less', () => {
    const f = planNetwork({ ...common, rows: [rowOf(), rowOf({ inputs: inputsWith('4 mm', '6 m') })] });
    expect(f.shared[1]!.flowLph).toBeLessThan(f.shared[0]!.flowLph);
    expect(f.alone[1]!.flowLph).toBeLessThan(f.alone[0]!.flowLph);
  });

  it('one branch alone equals the single valve with the main added in series (hand check, laminar)', () => {
    // Hand check: 0.6 m of head through an 8 mm x 3 m main (K_in 0.5 on its velocity head), a 4 mm x 2 m tube
    // and a 2 mm orifice; Hagen-Poiseuille resistances in series, solved by bisection.
    const R = (l: number, d: number) => (128 * mu * l) / (Math.PI * rho * g * d ** 4);
    const v = (q: number, d: number) => q / (0.25 * Math.PI * d * d);
    const q = bisect(
      (x) => (0.5 * v(x, 0.008) ** 2) / (2 * g) + (R(3, 0.008) + R(2, 0.004)) * x + (x / (0.61 * 0.25 * Math.PI * 0.002 ** 2)) ** 2 / (2 * g) - 0.6,
      0,
      1e-3,
    );
    expect((rho * v(q, 0.004) * 0.004) / mu).toBeLessThan(2300); // laminar, so Hagen-Poiseuille holds
    const f = planNetwork({ ...common, rows: [rowOf()] });
    expect(f.alone[0]!.flowLph / (q * 3.6e6)).toBeCloseTo(1, 6);
    expect(f.shared[0]!.flowLph / (q * 3.6e6)).toBeCloseTo(1, 6); // with one valve, shared = alone
    expect(f.mainFlowLph / (q * 3.6e6)).toBeCloseTo(1, 6);
    // and with a main of the tube's own bore it is one tube of the summed length (supplyFlow)
    const same = planNetwork({ ...common, mainInnerDiameterM: 0.004, rows: [rowOf()] });
    const single = supplyFlow({ headM: 0.6, tubeInnerDiameterM: 0.004, tubeLengthM: 5, orificeM: 0.002, densityKgM3: rho, viscosityPaS: mu });
    expect(same.alone[0]!.flowLph / single.flowLph).toBeCloseTo(1, 8);
  });

  it('fill time is area x rise / flow (continuity), for the plan rows that give a reservoir', () => {
    const plan = planOf({
      tank: { fullSurfaceElevation: '2 m' },
      main: { innerDiameter: '8 mm' },
      containers: [row('tub', '0.5 m', { reservoirArea: '0.1 m2', rise: '20 mm' }), row('no area', '0.5 m')],
    });
    const [tub, bare] = plan.containers;
    expect(tub!.aloneFull.fillTimeMin!).toBeCloseTo((0.1 * 0.02) / (tub!.aloneFull.flowLph / 3.6e6) / 60, 9);
    expect(bare!.aloneFull.fillTimeMin).toBeNull();
  });

  it('names a container that starves behind a narrow main, and the share is the grower\'s', () => {
    const doc = (share: number) => ({
      tank: { fullSurfaceElevation: '2 m' },
      main: { innerDiameter: '5 mm' },
      starvingShare: share,
      containers: [row('near', '0.3 m', { count: 6, mainLength: '1 m' }), row('far', '1 m', { mainLength: '15 m' })],
    });
    const strict = planOf(doc(0.5));
    const far = strict.containers[1]!;
    expect(far.sharedFull.flowLph).toBeLessThan(0.5 * far.aloneFull.flowLph);
    expect(far.starving).toBe(true);
    expect(far.starvingReason).toMatch(/with every valve open/);
    const lax = planOf(doc(0));
    expect(lax.containers[1]!.starving).toBe(lax.containers[1]!.sharedFull.flowLph <= 0 || lax.containers[1]!.sharedLow.flowLph <= 0);
    // conservation: the main carries what the valves draw
    const drawn = strict.containers.reduce((s, c) => s + c.count * c.sharedFull.flowLph, 0);
    expect(strict.totals.mainFlowLph / drawn).toBeCloseTo(1, 8);
  });

  // A valve wide open gives the most it ever can; if that is less than the plants' peak use, the reservoir falls
  // whatever the valve does (continuity; common practice: size the supply for the peak use). 100 L/day = 4.1667 L/h.
  it('starves when even wide open it gives less than the plants use at their peak, whatever the share', () => {
    const alone = { flowLph: 4, fillTimeMin: null };
    const shared = { flowLph: 3, fillTimeMin: null };
    expect(starvingReason(shared, alone, 0.5, 'full tank')).toBeNull(); // 75 % of its own flow
    expect(starvingReason(shared, alone, 0.5, 'full tank', 100 / 24)).toBe(
      "gets 3 L/h with every valve open at full tank, less than its plants' peak use (100 L/day, 4.17 L/h)",
    );
    expect(starvingReason(shared, alone, 0.5, 'full tank', 2.9)).toBeNull();
  });

  it('a row whose valve alone keeps up with its plants, but not with every valve open, is marked as starving', () => {
    const doc = (demand: string) => ({
      tank: { fullSurfaceElevation: '2 m', lowSurfaceElevation: '1.5 m' },
      main: { innerDiameter: '6 mm' },
      containers: [row('near', '0.3 m', { count: 6 }), row('far', '1 m', { mainLength: '5 m', design: { container: { demand } } })],
    });
    const easy = planOf(doc('3 L/day')).containers[1]!;
    expect(easy.starving).toBe(false);
    // a peak use between what it gets at the low tank with every valve open and what it gets alone, in L/day
    const { sharedLow, aloneLow } = easy;
    expect(sharedLow.flowLph).toBeGreaterThan(0.5 * aloneLow.flowLph); // the share rule alone passes it
    const demand = Math.round(((sharedLow.flowLph + aloneLow.flowLph) / 2) * 24);
    expect(demand).toBeGreaterThan(sharedLow.flowLph * 24);
    expect(demand).toBeLessThan(aloneLow.flowLph * 24);
    const hungry = planOf(doc(`${demand} L/day`)).containers[1]!;
    expect(hungry.sizing.ok).toBe(true); // alone, its valve gives more than the plants use
    expect(hungry.starving).toBe(true);
    expect(hungry.starvingReason).toMatch(/with every valve open at low tank, less than its plants' peak use/);
  });
});
