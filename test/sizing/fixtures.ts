import type { DirectSizing, LeverSizing, SizingResult } from '../../generator/sizing/result.ts';
import type { DesignInputs } from '../../generator/sizing/inputs.ts';

/** DESIGN.md defaults in SI, with a head and level of our own choosing (demo values, not reference data). */
export function defaultInputs(over: Partial<DesignInputs> = {}): DesignInputs {
  return {
    headMaxM: 2.2,
    headMinM: 1.6,
    targetLevelM: 0.045,
    liquidDensityKgM3: 998.2,
    liquidViscosityPaS: 1.0016e-3,
    orificeM: 0.002,
    sealDiameterM: 0.005,
    padName: null,
    padThicknessM: 0.003,
    padDensityKgM3: 200,
    calibration: [],
    materialName: 'PETG',
    materialDensityKgM3: 1270,
    wallM: 0.00225,
    lineWidthM: 0.00045,
    maxOuterDiameterM: 0.12,
    reserve: 1.5,
    tubeInnerDiameterM: 0.004,
    tubeLengthM: 5,
    reservoirAreaM2: 0.12,
    reservoirRiseM: 0.02,
    overflowM: null,
    demandM3s: 3e-3 / 86400,
    bedWidthM: 0.22,
    bedDepthM: 0.22,
    architecture: 'auto',
    mount: 'auto',
    rimHeightM: null,
    containerWallM: 0.003,
    retiredFields: [],
    ...over,
  };
}

/** A sizing that must have given the direct valve (the tests of its housing, guide, drains and tilt). */
export function direct(s: SizingResult): DirectSizing {
  if (!s.ok) throw new Error(`expected a sized valve: ${JSON.stringify(s.reasons)}`);
  if (s.architecture !== 'direct') throw new Error(`expected the direct valve, got a ${s.architecture} valve`);
  return s;
}

/** A sizing that must have given a lever valve. */
export function lever(s: SizingResult): LeverSizing {
  if (!s.ok) throw new Error(`expected a sized valve: ${JSON.stringify(s.reasons)}`);
  if (s.architecture !== 'lever') throw new Error(`expected a lever valve, got a ${s.architecture} valve`);
  return s;
}
