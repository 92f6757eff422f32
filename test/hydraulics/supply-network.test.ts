import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solveSupplyNetwork, supplyFlow, type NetworkBranch } from '../../generator/sizing/hydraulics/index.ts';

// Water at 20 C: 998.2 kg/m3 (CRC Handbook, IAPWS-95, from memory), 1.0016 mPa s (IAPWS 2008, from memory).
const water = { densityKgM3: 998.2, viscosityPaS: 1.0016e-3 };
const g = 9.80665; // NIST SP 330
const valve = { count: 1, tubeInnerDiameterM: 0.004, tubeLengthM: 2, orificeM: 0.003, tipElevationM: 0 };
const sum = (xs: number[]): number => xs.reduce((a, b) => a + b, 0);

/** Bisection on an increasing function, written here so the series check is independent of the solver. */
function bisect(fn: (x: number) => number, lo: number, hi: number): number {
  for (let i = 0; i < 200; i++) {
    const mid = 0.5 * (lo + hi);
    if (fn(mid) < 0) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

describe('solveSupplyNetwork (shooting on tank outflow + bisection; energy equation for branching pipes, White, Fluid Mechanics ch. 6)', () => {
  it('one branch equals two laminar pipes in series solved by hand', () => {
    // source: Hagen-Poiseuille resistance h = 128 mu l Q / (pi rho g d^4) for each pipe (laminar, checked below),
    // entrance loss K 0.5 on the main's velocity head (Crane TP-410, from memory), jet head (Q / (C_d A_o))^2 / 2g.
    const mainD = 0.008, mainL = 3, branchD = 0.004, branchL = 2, orifice = 0.003, head = 0.35;
    const resistance = (l: number, d: number) => (128 * 1.0016e-3 * l) / (Math.PI * 998.2 * g * d ** 4);
    const velocity = (q: number, d: number) => q / (Math.PI * 0.25 * d * d);
    const seriesM3s = bisect(
      (q) =>
        (0.5 * velocity(q, mainD) ** 2) / (2 * g) +
        (resistance(mainL, mainD) + resistance(branchL, branchD)) * q +
        (q / (0.61 * Math.PI * 0.25 * orifice ** 2)) ** 2 / (2 * g) -
        head,
      0,
      1e-3,
    );
    const reBranch = (998.2 * velocity(seriesM3s, branchD) * branchD) / 1.0016e-3;
    expect(reBranch).toBeLessThan(2300); // so the laminar resistances hold
    const r = solveSupplyNetwork({
      tankSurfaceElevationM: head,
      mainInnerDiameterM: mainD,
      branches: [{ ...valve, mainLengthM: mainL, tubeInnerDiameterM: branchD, tubeLengthM: branchL, orificeM: orifice }],
      ...water,
    });
    expect(r.converged).toBe(true);
    expect(r.branches[0]!.flowM3s / seriesM3s).toBeCloseTo(1, 8);
    expect(r.branches[0]!.reynolds).toBeCloseTo(reBranch, 4);
    expect(r.mainFlowLph / (seriesM3s * 3.6e6)).toBeCloseTo(1, 8);
    // the doc comment's worked example
    expect(r.branches[0]!.flowLph).toBeCloseTo(23.509, 3);
    expect(r.branches[0]!.headAtTeeM).toBeCloseTo(0.3296, 4);
  });

  it('one branch on a main of the same bore equals supplyFlow through one tube of the summed length', () => {
    for (const head of [0.3, 1.2, 2.8]) {
      const r = solveSupplyNetwork({
        tankSurfaceElevationM: 10 + head,
        mainInnerDiameterM: 0.004,
        branches: [{ ...valve, mainLengthM: 3, tipElevationM: 10 }],
        ...water,
      });
      const single = supplyFlow({ headM: head, tubeInnerDiameterM: 0.004, tubeLengthM: 5, orificeM: 0.003, ...water });
      expect(r.branches[0]!.flowM3s / single.flowM3s).toBeCloseTo(1, 8);
      expect(r.branches[0]!.regime).toBe(single.regime);
    }
  });

  it('two identical branches at one tee share the flow equally, whether listed twice or as count 2', () => {
    const common = { tankSurfaceElevationM: 1.5, mainInnerDiameterM: 0.006, ...water };
    const twice = solveSupplyNetwork({ ...common, branches: [{ ...valve, mainLengthM: 4 }, { ...valve, mainLengthM: 4 }] });
    const counted = solveSupplyNetwork({ ...common, branches: [{ ...valve, mainLengthM: 4, count: 2 }] });
    const [a, b] = twice.branches;
    expect(a!.flowM3s).toBe(b!.flowM3s);
    expect(a!.headAtTeeM).toBe(b!.headAtTeeM);
    expect(counted.branches[0]!.flowM3s / a!.flowM3s).toBeCloseTo(1, 8);
    expect(counted.branches[0]!.totalLph).toBeCloseTo(2 * counted.branches[0]!.flowLph, 12);
  });

  it('gives a longer branch tube less flow, and a tee further down the main less flow', () => {
    const r = solveSupplyNetwork({
      tankSurfaceElevationM: 1.5,
      mainInnerDiameterM: 0.006,
      branches: [
        { ...valve, mainLengthM: 4 },
        { ...valve, mainLengthM: 4, tubeLengthM: 6 },
        { ...valve, mainLengthM: 9 },
      ],
      ...water,
    });
    const [short, long, far] = r.branches;
    expect(long!.flowM3s).toBeLessThan(short!.flowM3s);
    expect(far!.headAtTeeM).toBeLessThan(short!.headAtTeeM);
    expect(far!.flowM3s).toBeLessThan(short!.flowM3s);
  });

  it('conserves the total: tank outflow equals the sum of all valves', () => {
    const branches: NetworkBranch[] = [
      { ...valve, mainLengthM: 7, count: 3, tipElevationM: -0.3 },
      { ...valve, mainLengthM: 1, count: 2 },
      { ...valve, mainLengthM: 4, count: 4, tubeLengthM: 1, orificeM: 0.0025 },
      { ...valve, mainLengthM: 4, count: 1, tipElevationM: 0.4 },
    ];
    const r = solveSupplyNetwork({ tankSurfaceElevationM: 2.2, mainInnerDiameterM: 0.008, branches, ...water });
    expect(r.converged).toBe(true);
    expect(r.iterations).toBeGreaterThan(0);
    expect(sum(r.branches.map((b) => b.totalLph)) / r.mainFlowLph).toBeCloseTo(1, 8);
    // results come back in input order: the branch at 1 m has the highest tee head
    expect(Math.max(...r.branches.map((b) => b.headAtTeeM))).toBe(r.branches[1]!.headAtTeeM);
  });

  it('with a main too wide to lose head, each valve runs as if alone at E_tank - E_tip (no entrance loss on its own tube)', () => {
    const r = solveSupplyNetwork({
      tankSurfaceElevationM: 2,
      mainInnerDiameterM: 1,
      branches: [
        { ...valve, mainLengthM: 2, tipElevationM: 0.5 },
        { ...valve, mainLengthM: 5, tipElevationM: 1.2 },
      ],
      ...water,
    });
    for (const [i, tip] of [[0, 0.5], [1, 1.2]] as const) {
      const alone = supplyFlow({ headM: 2 - tip, tubeInnerDiameterM: 0.004, tubeLengthM: 2, orificeM: 0.003, entranceLossK: 0, ...water });
      expect(r.branches[i]!.flowM3s / alone.flowM3s).toBeCloseTo(1, 6);
    }
  });

  it('gives zero flow, never negative or NaN, to a tip above the head available at its tee', () => {
    const r = solveSupplyNetwork({
      tankSurfaceElevationM: 1,
      mainInnerDiameterM: 0.005,
      branches: [
        { ...valve, mainLengthM: 1, count: 4 },
        { ...valve, mainLengthM: 20, tipElevationM: 0.98 }, // below the tank, above the head left after the main's losses
        { ...valve, mainLengthM: 2, tipElevationM: 1.3 }, // above the tank
      ],
      ...water,
    });
    expect(r.branches[1]!.headAtTeeM).toBeLessThan(0.98);
    expect(r.branches[1]!.flowM3s).toBe(0);
    expect(r.branches[2]!.flowM3s).toBe(0);
    expect(r.branches[2]!.reynolds).toBe(0);
    expect(r.branches[0]!.flowM3s).toBeGreaterThan(0);
    for (const b of r.branches) for (const v of Object.values(b)) if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true);

    const dry = solveSupplyNetwork({ tankSurfaceElevationM: 0, mainInnerDiameterM: 0.005, branches: [{ ...valve, mainLengthM: 0 }], ...water });
    expect(dry).toMatchObject({ mainFlowLph: 0, converged: true, branches: [{ flowM3s: 0, totalLph: 0, headAtTeeM: 0 }] });
    expect(solveSupplyNetwork({ tankSurfaceElevationM: 1, mainInnerDiameterM: 0.005, branches: [], ...water }).branches).toEqual([]);
  });

  it('names the bad field by its path', () => {
    const ok = { tankSurfaceElevationM: 1, mainInnerDiameterM: 0.005, ...water };
    expect(() => solveSupplyNetwork({ ...ok, branches: [{ ...valve, mainLengthM: 0 }, valve as NetworkBranch] })).toThrow(
      /branches\[1\]\.mainLengthM = undefined/,
    );
    expect(() => solveSupplyNetwork({ ...ok, branches: [{ ...valve, mainLengthM: 1, tubeLengthM: -2 }] })).toThrow(
      /branches\[0\]\.tubeLengthM = -2 is out of range; allowed: a finite number >= 0/,
    );
    expect(() => solveSupplyNetwork({ ...ok, branches: [{ ...valve, mainLengthM: 1, count: 1.5 }] })).toThrow(/branches\[0\]\.count = 1.5 .*whole number/);
    expect(() => solveSupplyNetwork({ ...ok, mainInnerDiameterM: -1, branches: [] })).toThrow(/mainInnerDiameterM = -1/);
  });

  it('property: any small network conserves flow and gives finite, non-negative flows (checked over random cases)', () => {
    const branch = fc.record({
      mainLengthM: fc.double({ min: 0, max: 20, noNaN: true }),
      count: fc.integer({ min: 0, max: 4 }),
      tubeInnerDiameterM: fc.double({ min: 0.002, max: 0.01, noNaN: true }),
      tubeLengthM: fc.double({ min: 0, max: 10, noNaN: true }),
      orificeM: fc.double({ min: 0.001, max: 0.006, noNaN: true }),
      tipElevationM: fc.double({ min: -1, max: 3, noNaN: true }),
    });
    fc.assert(
      fc.property(fc.array(branch, { minLength: 1, maxLength: 4 }), fc.double({ min: 0.004, max: 0.03, noNaN: true }), (branches, mainD) => {
        const r = solveSupplyNetwork({ tankSurfaceElevationM: 2.5, mainInnerDiameterM: mainD, branches, ...water });
        expect(r.converged).toBe(true);
        for (const b of r.branches) {
          expect(b.flowM3s).toBeGreaterThanOrEqual(0);
          expect(Number.isFinite(b.flowM3s) && Number.isFinite(b.headAtTeeM) && Number.isFinite(b.reynolds)).toBe(true);
        }
        const total = sum(r.branches.map((b) => b.totalLph));
        expect(Math.abs(total - r.mainFlowLph)).toBeLessThanOrEqual(1e-7 * Math.max(r.mainFlowLph, 1e-9));
      }),
      { numRuns: 30, seed: 20261201 },
    );
  });
});
