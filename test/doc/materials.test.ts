// Print materials: typical filament datasheet densities, from memory (DESIGN's table);
// the lookup must be forgiving about case and spacing.
import { describe, expect, it } from 'vitest';
import { customMaterial, findMaterial, MATERIALS, materialNames } from '../../generator/sizing/materials.ts';

describe('materials table', () => {
  it('holds the typical datasheet densities, g/cm3 (from memory)', () => {
    const table = Object.fromEntries(MATERIALS.map((m) => [m.name, m.densityKgM3 / 1000]));
    expect(table).toEqual({ PLA: 1.24, PETG: 1.27, ABS: 1.04, ASA: 1.07, PP: 0.9, PA12: 1.01, 'TPU 95A': 1.21 });
  });

  it.each([
    ['petg', 'PETG'],
    ['PETG', 'PETG'],
    [' PetG ', 'PETG'],
    ['PET-G', 'PETG'],
    ['tpu', 'TPU 95A'],
    ['TPU 95A', 'TPU 95A'],
    ['tpu95a', 'TPU 95A'],
    ['pa 12', 'PA12'],
    ['Nylon 12', 'PA12'],
    ['pla', 'PLA'],
  ])('%s finds %s', (typed, name) => {
    expect(findMaterial(typed)?.name).toBe(name);
  });

  it('returns undefined for an unknown name and lists the names for messages', () => {
    expect(findMaterial('unobtainium')).toBeUndefined();
    expect(findMaterial('')).toBeUndefined();
    expect(materialNames()).toEqual(['PLA', 'PETG', 'ABS', 'ASA', 'PP', 'PA12', 'TPU 95A']);
  });

  it('makes a custom material', () => {
    expect(customMaterial('PETG-CF', 1300)).toEqual({ name: 'PETG-CF', densityKgM3: 1300, aliases: [] });
  });
});
