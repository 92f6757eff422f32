/**
 * Seal pads by material: the pad a grower buys and cuts, described by what a
 * supplier states (a sponge's compression-deflection grade, a rubber's Shore A
 * hardness), never by a guessed preload. Each row gives its source.
 *
 * Stiffness is the compressive modulus the contact model uses (land-strain.ts):
 * - closed-cell sponge: the stress at 25 % deflection at the MIDDLE of the
 *   grade's range, divided by 0.25 (a secant modulus, exact at the 25 % the
 *   pad may reach at most). ASTM D1056 compression-deflection grades, from
 *   memory (confirm where a copy is at hand): grade 0 under 14 kPa (2 psi),
 *   1: 14-34 kPa (2-5 psi), 2: 34-62 (5-9), 3: 62-90 (9-13), 4: 90-117 (13-17),
 *   5: 117-165 (17-24). Grade 0 has no lower bound; 7 kPa is taken as its middle.
 * - solid rubber sheet: Young's modulus from Shore A by Gent's relation
 *   (gent-modulus-pa.ts; A. N. Gent 1958).
 *
 * Gasket factors m, y: ASME BPVC VIII-1, Mandatory Appendix 2, Table 2-5.1,
 * from memory: elastomers below 75 Shore A m 0.50, y 0; 75 A and harder
 * m 1.00, y 1.4 MPa (200 psi). The table lists no sponge; we give sponge the
 * soft-elastomer values (m 0.50, y 0): it is softer still, and its seating
 * comes from the indentation term of seating-force-n.ts (our choice).
 *
 * Densities (for the float's mass), from memory: closed-cell EPDM or neoprene
 * sponge about 0.2 g/cm3, solid rubber sheet about 1.2 g/cm3.
 *
 * No printed (TPU) pad: by Gent's relation 95 A is about 44 MPa, 20 times a
 * 30 A rubber and 200 times the default sponge, with y = 1.4 MPa to seat; a
 * float cannot seat it, and it cannot absorb a tilt (our decision, README).
 */
import { gentModulusPa } from './gent-modulus-pa.ts';

export interface PadMaterial {
  /** name as shown and as written in `seal.pad`, e.g. "sponge grade 2" */
  name: string;
  kind: 'sponge' | 'rubber';
  /** compressive modulus for the contact model, Pa */
  stiffnessPa: number;
  /** gasket factor m */
  gasketFactor: number;
  /** seating stress y, Pa */
  seatingStressPa: number;
  densityKgM3: number;
  /** where the stiffness comes from, in a few words (shown in reports) */
  basis: string;
}

const KPA = 1e3;
/** Table 2-5.1 (from memory): the line between soft and hard elastomers, Shore A. */
const HARD_ELASTOMER_SHORE_A = 75;
const HARD_ELASTOMER_Y_PA = 1.4e6;
const SPONGE_DENSITY = 200;
const RUBBER_DENSITY = 1200;

/** ASTM D1056 grades: [grade, low, high] stress at 25 % deflection, kPa (from memory). */
const SPONGE_GRADES: readonly [number, number, number][] = [
  [0, 0, 14],
  [1, 14, 34],
  [2, 34, 62],
  [3, 62, 90],
  [4, 90, 117],
  [5, 117, 165],
];

const RUBBER_SHORE_A = [30, 40, 50, 60, 70, 80] as const;

function spongeRow([grade, lo, hi]: [number, number, number]): PadMaterial {
  const mid = (lo + hi) / 2;
  return {
    name: `sponge grade ${grade}`,
    kind: 'sponge',
    stiffnessPa: (mid * KPA) / 0.25,
    gasketFactor: 0.5,
    seatingStressPa: 0,
    densityKgM3: SPONGE_DENSITY,
    basis: `closed-cell sponge, ASTM D1056 grade ${grade} (${lo === 0 ? 'under ' + hi : lo + '-' + hi} kPa at 25 %; ${mid} kPa taken)`,
  };
}

function rubberRow(shoreA: number): PadMaterial {
  const hard = shoreA >= HARD_ELASTOMER_SHORE_A;
  return {
    name: `rubber ${shoreA}A`,
    kind: 'rubber',
    stiffnessPa: gentModulusPa(shoreA),
    gasketFactor: hard ? 1 : 0.5,
    seatingStressPa: hard ? HARD_ELASTOMER_Y_PA : 0,
    densityKgM3: RUBBER_DENSITY,
    basis: `solid rubber sheet, ${shoreA} Shore A (modulus by Gent's relation)`,
  };
}

/** Every pad, softest first within each kind: sponges, then rubbers. */
export const PADS: readonly PadMaterial[] = [...SPONGE_GRADES.map(spongeRow), ...RUBBER_SHORE_A.map(rubberRow)];

/**
 * Written in `seal.pad` (or left out) to let the sizing choose: the softest
 * sponge whose indentation at the tight seal at full tank stays within
 * AUTO_PAD_STRAIN. Why sponge by default: a float pushes with tenths of a
 * newton; a sponge of grade 1 or 2 seats on a printed lip with a fifth of a
 * newton and sinks 0.3 to 0.6 mm under it, enough to close the far side of the
 * lip when the float leans a couple of degrees. A 30 A rubber needs six times
 * the seating force for a third of the indentation.
 */
export const AUTO_PAD = 'auto';

/** Matching key: lower case, spaces, hyphens and underscores dropped ("Sponge grade 2", "sponge-grade-2"). */
function padKey(name: string): string {
  return name.toLowerCase().replace(/[\s\-_]/g, '');
}

const BY_KEY = new Map<string, PadMaterial>();
for (const pad of PADS) {
  BY_KEY.set(padKey(pad.name), pad);
  // short spellings: "sponge 2", "rubber 50"
  BY_KEY.set(padKey(pad.name.replace('grade ', '').replace(/A$/, '')), pad);
}

/** The table row for a name, case-insensitively; undefined if unknown. */
export function findPad(name: string): PadMaterial | undefined {
  return BY_KEY.get(padKey(name));
}

/** The table's names, for messages and menus. */
export function padNames(): string[] {
  return PADS.map((p) => p.name);
}
