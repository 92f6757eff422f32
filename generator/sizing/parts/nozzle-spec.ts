import { OVERHANG_RISE } from '../constants.ts';
import type { NozzleSpec } from '../result.ts';

export interface NozzleSpecOptions {
  /** bore through the whole insert, mm (d_o) */
  orificeMm: number;
  /** outer diameter of the sealing lip, mm (d_s) */
  sealDiameterMm: number;
  /** supply tube inner diameter, mm: the barb root */
  tubeInnerDiameterMm: number;
  /** pad indentation at seal, mm: the lip must stand taller than it */
  indentationMm: number;
  lineWidthMm: number;
  /** length of the seat the collar presses into (deck + boss), mm */
  seatLengthMm: number;
  printClearanceMm: number;
}

/** Barb teeth stand this much over the tube bore, as a fraction of it (common practice: 10-20 %). */
const BARB_OVERSIZE = 0.15;
/** Plain stem between the housing top and the first barb tooth, mm. */
const BARB_STEM_MM = 2;
/** Length over which each tooth tapers back to the root, mm (common practice: about one tube bore). */
const BARB_TAPER_MM = 3;
const BARB_TEETH = 2;
/** Shoulder stands this far past the collar, mm: a ledge that seats on the housing boss. */
const SHOULDER_LEDGE_MM = 1.5;
const SHOULDER_HEIGHT_MM = 1.5;
const CRUSH_RIBS = 6;
const RIB_BASE_MM = 1.0;

/**
 * The nozzle insert's dimensions, mounted z up with the sealing face at z = 0.
 * From the face up: lip (d_s, a little taller than the pad indentation), a
 * 50-degree flare out to the shoulder, the shoulder (seats under the housing
 * boss), the collar (its crush ribs stand 2 x clearance proud, so they bite one
 * clearance into the seat bore), then the barb stem and teeth. The bore d_o runs
 * through. Printed tip down, every step out rises at 50 degrees (OVERHANG_MIN_DEG).
 */
export function nozzleSpec(o: NozzleSpecOptions): NozzleSpec {
  const lipHeight = Math.max(1.0, o.indentationMm + 0.5);
  const root = o.tubeInnerDiameterMm;
  const crest = root * (1 + BARB_OVERSIZE);
  const collar = Math.max(crest, o.sealDiameterMm) + 4 * o.lineWidthMm;
  const shoulder = collar + 2 * SHOULDER_LEDGE_MM;
  const flareHeight = ((shoulder - o.sealDiameterMm) / 2) * OVERHANG_RISE;
  const protrusion = lipHeight + flareHeight + SHOULDER_HEIGHT_MM;
  const toothStep = (crest - root) / 2;
  const total = protrusion + o.seatLengthMm + BARB_STEM_MM + BARB_TEETH * (toothStep * OVERHANG_RISE + BARB_TAPER_MM);
  return {
    orificeMm: o.orificeMm,
    lipDiameterMm: o.sealDiameterMm,
    lipHeightMm: lipHeight,
    shoulderDiameterMm: shoulder,
    shoulderHeightMm: SHOULDER_HEIGHT_MM,
    collarDiameterMm: collar,
    collarLengthMm: o.seatLengthMm,
    crushRibs: { count: CRUSH_RIBS, heightMm: 2 * o.printClearanceMm, baseWidthMm: RIB_BASE_MM },
    barb: { stemLengthMm: BARB_STEM_MM, rootDiameterMm: root, crestDiameterMm: crest, taperLengthMm: BARB_TAPER_MM, count: BARB_TEETH },
    protrusionMm: protrusion,
    totalLengthMm: total,
  };
}

/** Thinnest wall of the insert, mm: at the barb root around the bore. */
export function nozzleThinnestWallMm(n: NozzleSpec): number {
  return (n.barb.rootDiameterMm - n.orificeMm) / 2;
}
