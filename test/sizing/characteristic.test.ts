import { describe, expect, it } from 'vitest';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import type { DirectSizing } from '../../generator/sizing/result.ts';
import { defaultInputs, direct } from './fixtures.ts';

// The characteristic's properties follow from the model's physics, not from its numbers: the float pushes
// harder as the water rises (Archimedes), so the gap, and with it the flow, can only fall; at the tight seal the
// flow is zero (the pad's push reaches the seal force). Scenarios are demo values.
const perDay = (litres: number) => litres * 1e-3 / 86400;
const cases = [
  defaultInputs(),
  defaultInputs({ headMaxM: 0.6, headMinM: 0.3, targetLevelM: 0.025, materialName: 'PLA', materialDensityKgM3: 1240 }),
  defaultInputs({ headMaxM: 3.0, headMinM: 2.0, targetLevelM: 0.08, maxOuterDiameterM: 0.2, demandM3s: perDay(20) }),
];
function sized(i: number): DirectSizing {
  return direct(sizeDesign(cases[i]!));
}

describe('the valve characteristic Q(level)', () => {
  cases.forEach((inp, i) => {
    describe(`case ${i}: H ${inp.headMaxM}/${inp.headMinM} m, L ${inp.targetLevelM * 1e3} mm`, () => {
      const r = sized(i);
      for (const which of ['headMax', 'headMin'] as const) {
        const pts = r.characteristic[which];
        it(`${which}: at least 20 points, level never falling and flow never rising, from open to zero`, () => {
          expect(pts.length).toBeGreaterThanOrEqual(20);
          for (let k = 1; k < pts.length; k++) {
            expect(pts[k]!.levelMm).toBeGreaterThanOrEqual(pts[k - 1]!.levelMm);
            expect(pts[k]!.flowLph).toBeLessThanOrEqual(pts[k - 1]!.flowLph);
          }
          expect(pts[pts.length - 1]!.flowLph).toBe(0);
          expect(pts[0]!.flowLph).toBeGreaterThan(0.5 * (which === 'headMax' ? r.flow.atHeadMaxLph : r.flow.atHeadMinLph));
        });
      }
      it('reaches zero exactly at the tight shut-off, full and low tank', () => {
        expect(r.characteristic.headMax.at(-1)!.levelMm).toBeCloseTo(r.levels.shutOffAtHeadMaxMm, 2);
        expect(r.characteristic.headMin.at(-1)!.levelMm).toBeCloseTo(r.levels.shutOffAtHeadMinMm, 2);
      });
      it('the band is ordered: 50 % <= 10 % <= 1 % <= held at the demand <= tight shut-off', () => {
        const L = r.levels;
        expect(L.flow50Mm).toBeLessThanOrEqual(L.flow10Mm);
        expect(L.flow10Mm).toBeLessThanOrEqual(L.flow1Mm);
        expect(L.heldAtDemandMm).toBeLessThanOrEqual(L.shutOffAtHeadMaxMm + 1e-9);
        expect(L.heldAtDemandLowTankMm).toBeLessThanOrEqual(L.shutOffAtHeadMinMm + 1e-9);
        expect(L.throttleStartMm).toBe(L.firstTouchMm);
      });
      it('flow band: low <= nominal <= high; drains sized on the high end (A >= Q / (0.61 sqrt(2 g 2 mm)))', () => {
        expect(r.flow.atHeadMaxLowLph).toBeLessThan(r.flow.atHeadMaxLph);
        expect(r.flow.atHeadMaxHighLph).toBeGreaterThanOrEqual(r.flow.atHeadMaxLph);
        // orifice equation, C_d 0.61 (standard texts, from memory); g 9.80665 (NIST SP 330)
        const needMm2 = (r.flow.atHeadMaxHighLph / 3.6e6 / (0.61 * Math.sqrt(2 * 9.80665 * 0.002))) * 1e6;
        expect(r.drain.requiredAreaMm2).toBeCloseTo(needMm2, 6);
      });
      it('the 20 mm insert makes the bore a short tube (length >= 3 bores)', () => {
        expect(r.flow.boreModel).toBe(r.flow.boreLengthMm >= 3 * r.nozzle.orificeMm ? 'short-tube' : 'orifice');
      });
      it('inputs carry the demand in litres per day; the fill time is finite with a reservoir', () => {
        expect(r.inputs.demandLpd).toBeCloseTo(inp.demandM3s * 8.64e7, 9);
        expect(r.fill.timeToHeldMin).not.toBeNull();
        expect(r.fill.timeToHeldMin!).toBeGreaterThan(0);
      });
    });
  });

  it('zero demand holds the tight shut-off', () => {
    const r = sizeDesign(defaultInputs({ demandM3s: 0 }));
    if (!r.ok) throw new Error('infeasible');
    expect(r.levels.heldAtDemandMm).toBe(r.levels.shutOffAtHeadMaxMm);
    expect(r.levels.heldAtDemandLowTankMm).toBe(r.levels.shutOffAtHeadMinMm);
  });

  it('a demand larger than the open flow at low tank is refused, naming container.demand and the flow the valve gives', () => {
    const r = sizeDesign(defaultInputs({ demandM3s: perDay(5000) }));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.reasons[0]!.code).toBe('demand');
    expect(r.reasons[0]!.message).toMatch(/container\.demand: 5000 L\/day .* \d+(\.\d)? L\/day \(\d+(\.\d+)? L\/h\)/);
    const way = r.waysOut.find((w) => w.field === 'container.demand');
    expect(way).toBeDefined();
    // the way out really works
    const again = sizeDesign(defaultInputs({ demandM3s: perDay(Number.parseFloat(way!.value)) }));
    expect(again.ok).toBe(true);
  });

  it('a larger demand holds a lower level (the valve must stay further open)', () => {
    const a = sizeDesign(defaultInputs({ demandM3s: perDay(1) }));
    const b = sizeDesign(defaultInputs({ demandM3s: perDay(50) }));
    if (!a.ok || !b.ok) throw new Error('infeasible');
    expect(b.levels.heldAtDemandMm).toBeLessThan(a.levels.heldAtDemandMm);
  });
});
