// @vitest-environment happy-dom
/**
 * The filament menu: a table material or the grower's own { name, density }.
 * Densities: typical filament datasheet figures (the table's own values, from
 * memory: PETG 1.27 g/cm3); 1 g/cm3 = 1000 kg/m3 exactly (NIST SP 811, appendix B).
 * Labels: WCAG 2.2 SC 1.3.1 / 4.1.2 (source: W3C), every input tied to a label.
 */
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { MATERIAL_DENSITY_FIELD, OTHER_FILAMENT, materialChoice, otherFilamentValue } from '../../viewer/lib/material-choice.ts';
import { convertDocument, displayText, documentValue } from '../../viewer/lib/units-system.ts';
import { ALL_FIELDS } from '../../viewer/lib/form-fields.ts';
import { setAt, type Doc } from '../../viewer/lib/doc-path.ts';
import '../../viewer/components/fw-design-form.ts';

const BASE = { supply: { headMax: '2.2 m' }, level: { target: '45 mm' } };

async function mountForm(doc: Doc, errors: Record<string, string> = {}, units = 'metric') {
  const el = document.createElement('fw-design-form') as HTMLElement & { doc: Doc; errors: Record<string, string>; units: string; updateComplete: Promise<unknown> };
  Object.assign(el, { doc, errors, units });
  document.body.append(el);
  await el.updateComplete;
  const sent: { path: string; value: unknown }[] = [];
  el.addEventListener('field-input', (e) => sent.push((e as CustomEvent).detail));
  return { el, root: el.shadowRoot!, sent };
}

describe('reading print.material', () => {
  it('table names in any spelling, the default when absent, custom objects, and unknown text', () => {
    expect(materialChoice(undefined)).toEqual({ kind: 'table', name: 'PETG' });
    expect(materialChoice('pet-g')).toEqual({ kind: 'table', name: 'PETG' });
    expect(materialChoice({ name: 'PETG-CF', density: '1150 kg/m3' })).toEqual({ kind: 'other', name: 'PETG-CF', density: '1150 kg/m3' });
    expect(materialChoice('nylon')).toEqual({ kind: 'unknown', text: 'nylon' });
  });
  it('"other filament" starts from the current table material (PETG 1.27 g/cm3, datasheet figure from memory), or brings back the last custom one', () => {
    expect(otherFilamentValue('PETG', null)).toEqual({ name: 'PETG', density: '1.27 g/cm3' });
    expect(otherFilamentValue('PETG', { name: 'CF', density: '1.3' })).toEqual({ name: 'CF', density: '1.3' });
    expect(parseDesign({ ...BASE, print: { material: otherFilamentValue('PP', null) } }).ok).toBe(true);
  });
  it('the density box takes other units as typed; 1150 kg/m3 is 1.15 g/cm3 (NIST SP 811)', () => {
    expect(documentValue('1.15', MATERIAL_DENSITY_FIELD, 'imperial')).toBe('1.15 g/cm3');
    expect(documentValue('1150 kg/m3', MATERIAL_DENSITY_FIELD, 'metric')).toBe('1150 kg/m3');
    expect(displayText('1.15 g/cm3', MATERIAL_DENSITY_FIELD, 'metric')).toBe('1.15');
    const parsed = parseDesign({ ...BASE, print: { material: { name: 'PETG-CF', density: '1150 kg/m3' } } });
    expect(parsed.ok && parsed.inputs.materialDensityKgM3).toBe(1150);
  });
  it('a unit switch leaves the custom material as written', () => {
    const doc = { ...BASE, print: { material: { name: 'PETG-CF', density: '1150 kg/m3' } } };
    const there = convertDocument(doc, ALL_FIELDS, 'imperial');
    expect(there.print).toEqual(doc.print);
    expect((convertDocument(there, ALL_FIELDS, 'metric') as typeof doc).print).toEqual(doc.print);
  });
});

describe('fw-design-form filament', () => {
  it('a table material: no name or density boxes; picking "other" sends a custom material', async () => {
    const { root, sent } = await mountForm({ ...BASE, print: { material: 'ABS' } });
    const select = root.querySelector('#f-print-material') as HTMLSelectElement;
    expect(select.value).toBe('ABS');
    expect(root.querySelector('#f-print-material-density')).toBeNull();
    select.value = OTHER_FILAMENT;
    select.dispatchEvent(new Event('change'));
    // ABS 1.04 g/cm3, the table's datasheet figure (from memory)
    expect(sent.at(-1)).toEqual({ path: 'print.material', value: { name: 'ABS', density: '1.04 g/cm3' } });
  });

  it('a custom material from a file: shown with its name and density, labelled, edits and errors on their fields', async () => {
    const doc = { ...BASE, print: { material: { name: 'PETG-CF', density: '1150 kg/m3' } } };
    const { el, root, sent } = await mountForm(doc, { 'print.material.density': '"9" is too high; the material density must be from 0.5 g/cm3 to 3 g/cm3.' });
    expect((root.querySelector('#f-print-material') as HTMLSelectElement).value).toBe(OTHER_FILAMENT);
    const name = root.querySelector('#f-print-material-name') as HTMLInputElement;
    const density = root.querySelector('#f-print-material-density') as HTMLInputElement;
    expect(name.value).toBe('PETG-CF');
    expect(density.value).toBe('1150 kg/m3');
    for (const input of [name, density]) expect(root.querySelector(`label[for="${input.id}"]`)).not.toBeNull();
    expect(density.getAttribute('aria-invalid')).toBe('true');
    expect(root.querySelector('#f-print-material-density-msg')!.textContent).toContain('0.5 g/cm3 to 3 g/cm3');
    density.value = '1.2';
    density.dispatchEvent(new Event('input'));
    expect(sent.at(-1)).toEqual({ path: 'print.material.density', value: '1.2 g/cm3' });
    density.value = '';
    density.dispatchEvent(new Event('input'));
    // an emptied box keeps the custom material in the document (so parseDesign names the missing density)
    expect(sent.at(-1)).toEqual({ path: 'print.material.density', value: '' });
    expect(setAt(doc, 'print.material.density', '')).toEqual({ ...BASE, print: { material: { name: 'PETG-CF', density: '' } } });
    name.value = '';
    name.dispatchEvent(new Event('input'));
    expect(sent.at(-1)).toEqual({ path: 'print.material.name', value: '' });

    // back to a table material, then "other" again brings the custom one back
    const select = root.querySelector('#f-print-material') as HTMLSelectElement;
    select.value = 'PLA';
    select.dispatchEvent(new Event('change'));
    expect(sent.at(-1)).toEqual({ path: 'print.material', value: 'PLA' });
    Object.assign(el, { doc: { ...BASE, print: { material: 'PLA' } }, errors: {} });
    await (el as unknown as { updateComplete: Promise<unknown> }).updateComplete;
    expect(root.querySelector('#f-print-material-density')).toBeNull();
    select.value = OTHER_FILAMENT;
    select.dispatchEvent(new Event('change'));
    expect(sent.at(-1)).toEqual({ path: 'print.material', value: { name: 'PETG-CF', density: '1150 kg/m3' } });
  });

  it('an unknown name from a file is shown as such, with its message', async () => {
    const { root } = await mountForm({ ...BASE, print: { material: 'nylon' } }, { 'print.material': '"nylon" is not a material in the table' });
    const select = root.querySelector('#f-print-material') as HTMLSelectElement;
    expect(select.selectedOptions[0].textContent).toContain('nylon');
    expect(root.querySelector('#f-print-material-msg')!.textContent).toContain('not a material');
  });
});
