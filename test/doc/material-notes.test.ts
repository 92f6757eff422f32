/**
 * Material notes with their basis: PLA softens in warm water, nylon takes up
 * water, a flexible filament cannot make a float. Checked against the sources
 * the notes name: PLA's glass transition 45 to 65 °C (NETZSCH polymer
 * database, "PLA: Polylactide") and 60.6 °C by DSC (Polymaker PolyTerra PLA
 * datasheet, TDS V5.3); water at saturation PA6 about 9 %, PA66 about 7 %,
 * cast PA12 1.4 % (Intech, "Effects of moisture absorption"); TPU's glass
 * transition -45 to -25 °C (the TPU page of the Additive Tools materials site).
 */
import { describe, expect, it } from 'vitest';
import { buildSheetMarkdown } from '../../generator/doc/build-sheet.ts';
import { materialNotes } from '../../generator/doc/material-notes.ts';
import { parseDesign } from '../../generator/doc/schema.ts';
import { materialNames } from '../../generator/sizing/materials.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';

const ids = (name: string) => materialNotes(name).map((n) => n.id);

describe('material notes', () => {
  it('go with the filament: PLA, nylon and flexible ones of the table, and none for PETG, ABS, ASA, PP', () => {
    const byName = Object.fromEntries(materialNames().map((n) => [n, ids(n)]));
    expect(byName).toEqual({
      PLA: ['pla-warm-water'],
      PETG: [],
      ABS: [],
      ASA: [],
      PP: [],
      PA12: ['nylon-takes-up-water'],
      'TPU 95A': ['flexible-no-float'],
    });
  });

  it("find a grower's own filament by the words in its name, and not by look-alikes", () => {
    expect(ids('PLA+')).toEqual(['pla-warm-water']);
    expect(ids('HT-PLA')).toEqual(['pla-warm-water']);
    expect(ids('PA6-CF')).toEqual(['nylon-takes-up-water']);
    expect(ids('nylon 12')).toEqual(['nylon-takes-up-water']);
    expect(ids('TPE 85A')).toEqual(['flexible-no-float']);
    expect(ids('Flexfill')).toEqual(['flexible-no-float']);
    for (const name of ['Plastic X', 'Pastel PETG', 'PETG-CF', 'ABS', '']) expect(ids(name), name).toEqual([]);
  });

  it('each says its basis, with the figures of the sources it names', () => {
    const [pla] = materialNotes('PLA');
    // the note's 55 to 60 °C lies inside the database's 45 to 65 °C, and the datasheet's 60.6 °C is near its top
    expect(pla.text).toContain('55 to 60 °C');
    expect(pla.basis).toContain('45 to 65 °C');
    expect(pla.basis).toContain('60.6 °C');
    expect(pla.basis).toMatch(/recalled from memory/);
    const [nylon] = materialNotes('PA12');
    expect(nylon.basis).toMatch(/PA6 about 9 %.*PA66 about 7 %.*PA12 1\.4 %/);
    expect(nylon.basis).toContain('ISO 62');
    const [flexible] = materialNotes('TPU 95A');
    expect(flexible.title).toBe('A flexible filament cannot make a float');
    expect(flexible.basis).toContain('-45 to -25 °C');
    for (const note of [pla, nylon, flexible]) expect(note.basis.length).toBeGreaterThan(60);
  });

  it('are printed on the build sheet of a valve in that filament, and only then', () => {
    const sheetIn = (material: string) => {
      const parsed = parseDesign({ supply: { headMax: '1.2 m' }, level: { target: '40 mm' }, print: { material } });
      if (!parsed.ok) throw new Error('demo refused');
      const sizing = sizeDesign(parsed.inputs);
      if (!sizing.ok) throw new Error('demo infeasible');
      return buildSheetMarkdown(sizing, parsed.document);
    };
    const pla = sheetIn('PLA');
    expect(pla).toContain('PLA softens in warm water.');
    expect(pla).toContain('Basis: Glass transition of PLA 45 to 65 °C');
    expect(sheetIn('PA12')).toContain('Nylon takes up water.');
    expect(sheetIn('PETG')).not.toMatch(/softens in warm water|takes up water|cannot make a float/);
  });
});
