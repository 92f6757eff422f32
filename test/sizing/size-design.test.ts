import { describe, expect, it } from 'vitest';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import { FLOAT_GAP_MM, PRINT_CLEARANCE_MM } from '../../generator/sizing/constants.ts';
import type { DirectSizing, SizingFailure, SizingSuccess } from '../../generator/sizing/result.ts';
import { defaultInputs, direct } from './fixtures.ts';

// Invariants of the sizing model. The closed forms checked here come from
// Archimedes' principle and p = rho g H (hydrostatics); the scenarios are demo values.
const cases = [
  defaultInputs(),
  defaultInputs({ headMaxM: 0.6, headMinM: 0.3, targetLevelM: 0.025, materialName: 'PLA', materialDensityKgM3: 1240 }),
  defaultInputs({ headMaxM: 1.2, headMinM: 0.9, targetLevelM: 0.03, materialName: 'ASA', materialDensityKgM3: 1070 }),
  defaultInputs({ headMaxM: 3.0, headMinM: 2.0, targetLevelM: 0.08, maxOuterDiameterM: 0.2 }),
  defaultInputs({ headMaxM: 1.5, headMinM: 1.5, targetLevelM: 0.15, materialName: 'PP', materialDensityKgM3: 900 }),
];

function sized(i: number): DirectSizing {
  return direct(sizeDesign(cases[i]));
}

describe('sized design invariants', () => {
  cases.forEach((inp, i) => {
    describe(`case ${i}: H ${inp.headMaxM}/${inp.headMinM} m, L ${inp.targetLevelM * 1000} mm, ${inp.materialName}`, () => {
      const r = sized(i);
      it('shuts off at the target level at the highest head (within 0.5 mm)', () => {
        expect(Math.abs(r.levels.shutOffAtHeadMaxMm - r.levels.targetMm)).toBeLessThan(0.5);
      });
      it('the drop from H_max to H_min matches (H_max - H_min) d_s^2 / D_f^2 (hydrostatics, closed form)', () => {
        const ds = r.closingForce.equivalentSealDiameterMm;
        const df = r.float.outerDiameterMm;
        const expected = (inp.headMaxM - inp.headMinM) * 1000 * (ds * ds) / (df * df);
        expect(r.levels.shutOffAtHeadMaxMm - r.levels.shutOffAtHeadMinMm).toBeCloseTo(expected, 6);
      });
      it('has at least the reserve the document asks for', () => {
        expect(r.float.availableForceN / r.closingForce.atHeadMaxN).toBeGreaterThanOrEqual(inp.reserve - 1e-9);
        expect(r.float.reserve).toBeGreaterThanOrEqual(inp.reserve - 1e-9);
      });
      it('seals while the water line is on the cylinder', () => {
        expect(r.float.sealDepthAtHeadMaxMm).toBeLessThanOrEqual(r.float.cylinderHeightMm + 1e-9);
      });
      it('travels at least its minimum, max(d_o/2, 1.5 mm)', () => {
        expect(r.nozzle.minimumTravelMm).toBe(Math.max(inp.orificeM * 500, 1.5));
        expect(r.nozzle.travelMm).toBeGreaterThanOrEqual(r.nozzle.minimumTravelMm - 1e-9);
      });
      it('bore clears the float by the gap plus the print clearance all round', () => {
        expect(r.housing.boreMm - r.float.outerDiameterMm).toBeCloseTo(2 * (FLOAT_GAP_MM + PRINT_CLEARANCE_MM), 9);
      });
      it('drain notches give at least the area needed to keep within 2 mm of the outside level', () => {
        expect(r.drain.providedAreaMm2).toBeGreaterThanOrEqual(r.drain.requiredAreaMm2);
      });
      it('has at least two vents of 3 mm or more', () => {
        expect(r.vents.count).toBeGreaterThanOrEqual(2);
        expect(r.vents.diameterMm).toBeGreaterThanOrEqual(3);
      });
      it('levels are ordered: lift-off below first touch below shut-off; the target is reachable', () => {
        expect(r.levels.liftOffMm).toBeLessThan(r.levels.firstTouchMm);
        expect(r.levels.firstTouchMm).toBeLessThan(r.levels.shutOffAtHeadMinMm + 1e-9);
        expect(r.levels.minimumReachableMm).toBeLessThanOrEqual(r.levels.targetMm + 1e-9);
      });
      it('hold-down follows 1.5 F_up - W, and the ballast is steel weighed in water', () => {
        const need = Math.max(0, 1.5 * r.holdDown.upliftN - r.holdDown.netWeightN);
        expect(r.holdDown.neededN).toBeCloseTo(need, 12);
        const steelG = (need / ((1 - inp.liquidDensityKgM3 / 7850) * 9.80665)) * 1000;
        expect(r.holdDown.ballastSteelG).toBeCloseTo(steelG, 9);
      });
      it('worst tilt: bottom rim on the bore and collar top in its sleeve, H sin t - (R + r_c)(1 - cos t) = c + g (or the stop ring first); lip gap d_s tan t', () => {
        // Elementary plane geometry of a rigid body between vertical walls, solved here by Newton's method:
        // pivot at the pad, the bottom rim (radius R, height 0) meets the bore (play c) on one side while
        // the collar's top corner (radius r_c, height H) meets its sleeve (play g) on the other.
        const c = FLOAT_GAP_MM + PRINT_CLEARANCE_MM;
        const g = PRINT_CLEARANCE_MM + 0.25; // the guide's play: print clearance + 0.25 mm running gap (common practice)
        const f = r.parts.float;
        const R = f.outerDiameterMm / 2;
        const rc = f.plateauRadiusMm;
        const H = f.heightMm;
        const delta = r.seal.indentationMm;
        const hp = H + f.padProudMm - delta;
        const newton = (fn: (t: number) => number, d: (t: number) => number) => {
          let t = 0.02;
          for (let i = 0; i < 50; i++) t -= fn(t) / d(t);
          return t;
        };
        const walls = newton((t) => H * Math.sin(t) - (R + rc) * (1 - Math.cos(t)) - (c + g), (t) => H * Math.cos(t) - (R + rc) * Math.sin(t));
        // the collar top rising on one side into the stop ring, stopGap above it at seal
        const gap = r.tilt.hardStopIndentationMm - delta;
        const stop = newton((t) => rc * Math.sin(t) - (hp - H) * (1 - Math.cos(t)) - gap, (t) => rc * Math.cos(t) - (hp - H) * Math.sin(t));
        const theta = Math.min(walls, stop);
        expect(r.tilt.maxAngleDeg).toBeCloseTo((theta * 180) / Math.PI, 6);
        expect(r.tilt.lipGapMm).toBeCloseTo(inp.sealDiameterM * 1000 * Math.tan(theta), 6);
        expect(r.tilt.guidePlayMm).toBeCloseTo(g, 12);
        // accepted only when the pad stays on the lip and the lip's far side stays shut
        expect(r.tilt.padMarginMm).toBeCloseTo(f.padDiameterMm / 2 - inp.sealDiameterM * 500, 12);
        expect(r.tilt.padOffsetMm).toBeGreaterThanOrEqual(g - 1e-9); // sliding across the sleeve's play, untilted
        expect(r.tilt.padOffsetMm).toBeLessThanOrEqual(r.tilt.padMarginMm);
        expect(r.tilt.lipGapMm).toBeLessThanOrEqual(delta / 2);
        expect(r.warnings.map((w) => w.code)).not.toContain('tilt-gap');
      });
      it('mass adds up and filament length is volume over the 1.75 mm filament section', () => {
        const p = r.mass.byPart;
        expect(r.mass.totalG).toBeCloseTo(p.housing + p.float + p.nozzle + p.pin + p.pad, 9);
        const plasticMm3 = (p.housing + p.float + p.nozzle + p.pin) / (inp.materialDensityKgM3 * 1e-6);
        expect(r.mass.filamentM).toBeCloseTo(plasticMm3 / (Math.PI * 0.875 ** 2) / 1000, 6);
        expect(r.float.massG).toBeCloseTo(p.float + p.pad, 9);
      });
      it('says what bound the size and gives only finite numbers', () => {
        expect(r.boundBy.length).toBeGreaterThan(0);
        const bad: string[] = [];
        JSON.stringify(r, (k, v) => {
          if (typeof v === 'number' && !Number.isFinite(v)) bad.push(k);
          return v;
        });
        expect(bad).toEqual([]);
      });
    });
  });

  it('prefers the lighter design: a taller tank never gives a lighter float', () => {
    const low = sizeDesign(defaultInputs({ headMaxM: 1.0, headMinM: 1.0 })) as SizingSuccess;
    const high = sizeDesign(defaultInputs({ headMaxM: 2.5, headMinM: 2.5 })) as SizingSuccess;
    expect(high.float.availableForceN).toBeGreaterThan(low.float.availableForceN);
    expect(high.mass.totalG).toBeGreaterThan(low.mass.totalG);
  });

  it('uses a bench calibration in place of d_s and the preload', () => {
    const FT = 0.3048; // NIST SP 811
    const r = sizeDesign(
      defaultInputs({ calibration: [{ headM: 4 * FT, massKg: 0.0425 }, { headM: 10 * FT, massKg: 0.09 }] }),
    ) as SizingSuccess;
    expect(r.ok).toBe(true);
    expect(r.closingForce.fromCalibration).toBe(true);
    // common practice bench figures (see hydrostatics.test.ts): about 5.75 mm and 0.107 N
    expect(r.closingForce.equivalentSealDiameterMm).toBeCloseTo(5.75, 1);
    expect(r.closingForce.preloadN).toBeCloseTo(0.107, 2);
  });
});

describe('infeasible designs say why and how to make them work', () => {
  // 25 mm at 2.2 m is out of the direct valve's reach (the guide's collar and the 50-degree cone make the float
  // taller), 28.5 mm is not; asked for the direct valve ("auto" would make a lever)
  const inp = defaultInputs({ targetLevelM: 0.025, architecture: 'direct' });
  const r = sizeDesign(inp) as SizingFailure;
  it('is refused with reasons', () => {
    expect(r.ok).toBe(false);
    expect(r.reasons.map((x) => x.code)).toContain('travel');
  });
  it('offers a lowest level that really works at this head', () => {
    const way = r.waysOut.find((w) => w.field === 'level.target');
    expect(way).toBeDefined();
    const mm = parseFloat(way!.value);
    expect(sizeDesign({ ...inp, targetLevelM: mm / 1000 }).ok).toBe(true);
  });
  it('offers a highest head that really works at this level', () => {
    const way = r.waysOut.find((w) => w.field === 'supply.headMax');
    expect(way).toBeDefined();
    const m = parseFloat(way!.value);
    expect(m).toBeLessThan(inp.headMaxM);
    expect(sizeDesign({ ...inp, headMaxM: m, headMinM: Math.min(inp.headMinM, m) }).ok).toBe(true);
  });
  it('refuses a bore that leaves the barb too thin, and names both ways out', () => {
    const thin = sizeDesign(defaultInputs({ orificeM: 0.003 })) as SizingFailure;
    expect(thin.ok).toBe(false);
    expect(thin.reasons[0].code).toBe('barb-wall');
    expect(thin.waysOut.map((w) => w.field).sort()).toEqual(['nozzle.orifice', 'supply.tubeInnerDiameter']);
  });
});

describe('when no single change helps', () => {
  it('names a level and a diameter limit that work together', () => {
    const inp = defaultInputs({ headMaxM: 3.0, headMinM: 3.0, targetLevelM: 0.008, maxOuterDiameterM: 0.04, architecture: 'direct' });
    const r = sizeDesign(inp) as SizingFailure;
    expect(r.ok).toBe(false);
    const level = r.waysOut.find((w) => w.field === 'level.target');
    const limit = r.waysOut.find((w) => w.field === 'limits.maxOuterDiameter');
    expect(level && limit).toBeTruthy();
    const fixed = sizeDesign({ ...inp, targetLevelM: parseFloat(level!.value) / 1000, maxOuterDiameterM: parseFloat(limit!.value) / 1000 });
    expect(fixed.ok).toBe(true);
  });
});
