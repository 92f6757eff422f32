/**
 * Print materials and their densities. Values are typical filament datasheet
 * figures, g/cm3, from memory; a grower with a datasheet for their own spool
 * gives a custom `{ name, density }` instead.
 */
export interface Material {
  /** name as shown, e.g. "PETG", "TPU 95A" */
  name: string;
  /** kg/m3 (SI, for the sizing core) */
  densityKgM3: number;
  /** other names a grower may type; matched like the name */
  aliases: readonly string[];
}

/** Typical filament datasheet densities (g/cm3 x 1000), from memory. */
export const MATERIALS: readonly Material[] = [
  { name: 'PLA', densityKgM3: 1240, aliases: [] },
  { name: 'PETG', densityKgM3: 1270, aliases: ['PET-G'] },
  { name: 'ABS', densityKgM3: 1040, aliases: [] },
  { name: 'ASA', densityKgM3: 1070, aliases: [] },
  { name: 'PP', densityKgM3: 900, aliases: ['polypropylene'] },
  { name: 'PA12', densityKgM3: 1010, aliases: ['nylon 12', 'nylon12'] },
  { name: 'TPU 95A', densityKgM3: 1210, aliases: ['TPU'] },
];

/** Default print material (DESIGN: PETG). */
export const DEFAULT_MATERIAL_NAME = 'PETG';

/** Matching key: lower case, spaces, hyphens and underscores dropped ("TPU 95A", "tpu-95a" -> "tpu95a"). */
function materialKey(name: string): string {
  return name.toLowerCase().replace(/[\s\-_]/g, '');
}

const BY_KEY = new Map<string, Material>();
for (const material of MATERIALS) {
  for (const spelling of [material.name, ...material.aliases]) BY_KEY.set(materialKey(spelling), material);
}

/** The table entry for a name, case-insensitively ("petg", "PETG", "tpu", "TPU 95A"); undefined if unknown. */
export function findMaterial(name: string): Material | undefined {
  return BY_KEY.get(materialKey(name));
}

/** The table's names, for messages and menus. */
export function materialNames(): string[] {
  return MATERIALS.map((m) => m.name);
}

/** A grower's own material: density in kg/m3. */
export function customMaterial(name: string, densityKgM3: number): Material {
  return { name, densityKgM3, aliases: [] };
}
