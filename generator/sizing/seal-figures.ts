import { PAD_STOP_STRAIN } from './constants.ts';
import { pressurePa } from './hydrostatics/pressure-pa.ts';
import type { DesignBasis } from './layout/design-basis.ts';
import type { SizingSuccess } from './result.ts';

/**
 * The figures of the seal that every valve reports alike, direct or lever:
 * the push needed to shut (closingForce), the pad (seal) and the water's
 * pressure at the nozzle (p = rho g H, pressurePa). `worstStrainWithoutStop`
 * is the pad's worst strain had it no hard stop (each valve works it out from
 * its own largest push); the stop caps it at PAD_STOP_STRAIN.
 */
export function sealFigures(b: DesignBasis, worstStrainWithoutStop: number): Pick<SizingSuccess, 'closingForce' | 'seal' | 'pressure'> {
  const inp = b.inputs;
  const rho = inp.liquidDensityKgM3;
  return {
    closingForce: {
      atHeadMaxN: b.forceAtHeadMaxN,
      atHeadMinN: b.forceAtHeadMinN,
      preloadN: b.preloadN,
      sealAreaMm2: b.sealAreaM2 * 1e6,
      equivalentSealDiameterMm: b.equivalentSealDiameterMm,
      fromCalibration: b.fromCalibration,
      modelAreaMm2: b.sealAreaM2 * 1e6,
      seatN: b.preloadN,
      filmAreaMm2: b.filmAreaM2 * 1e6,
      boreAreaMm2: b.boreAreaM2 * 1e6,
    },
    seal: {
      padMaterial: b.pad.name,
      padDescription: b.pad.basis,
      padChosen: b.padChosen,
      padStiffnessKpa: b.padStiffnessKpa,
      gasketFactor: b.pad.gasketFactor,
      seatingStressKpa: b.pad.seatingStressPa / 1e3,
      padThicknessMm: b.padThicknessMm,
      indentationMm: b.indentationMm,
      strainAtSeal: b.strainAtSeal,
      indentationAtHeadMinMm: b.indentationAtHeadMinMm,
      stopIndentationMm: b.padStopIndentationMm,
      worstStrain: Math.min(worstStrainWithoutStop, PAD_STOP_STRAIN),
      worstStrainWithoutStop,
    },
    pressure: { atHeadMaxKPa: pressurePa(inp.headMaxM, rho) / 1e3, atHeadMinKPa: pressurePa(inp.headMinM, rho) / 1e3 },
  };
}
