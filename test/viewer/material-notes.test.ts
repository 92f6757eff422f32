// @vitest-environment happy-dom
/**
 * The filament's notes where the filament is chosen: a note with its basis for
 * PLA (warm water), nylon (water) and flexible filament (no float), tied to the
 * menu by aria-describedby (WCAG 2.2 SC 1.3.1, source: W3C); none for PETG.
 */
import { describe, expect, it } from 'vitest';
import '../../viewer/components/fw-design-form.ts';

async function notesFor(material: unknown): Promise<{ ids: string[]; root: ShadowRoot }> {
  const el = document.createElement('fw-design-form') as HTMLElement & { doc: unknown; updateComplete: Promise<unknown> };
  el.doc = { supply: { headMax: '2.2 m' }, level: { target: '45 mm' }, print: { material } };
  document.body.append(el);
  await el.updateComplete;
  const root = el.shadowRoot!;
  return { ids: [...root.querySelectorAll('[data-material-note]')].map((n) => n.getAttribute('data-material-note')!), root };
}

describe('fw-design-form: filament notes', () => {
  it('shows the PLA note with its basis beside the menu, and the menu points to it', async () => {
    const { ids, root } = await notesFor('PLA');
    expect(ids).toEqual(['pla-warm-water']);
    const note = root.querySelector('[data-material-note="pla-warm-water"]')!;
    expect(note.textContent).toContain('PLA softens in warm water.');
    expect(note.querySelector('.basis')!.textContent).toMatch(/^Basis: .*45 to 65 °C/);
    const describedBy = root.querySelector('#f-print-material')!.getAttribute('aria-describedby')!.split(' ');
    expect(describedBy).toContain('f-print-material-notes');
    expect(root.querySelector('#f-print-material-notes')!.contains(note)).toBe(true);
  });

  it('says a flexible filament cannot make a float, nylon takes up water (also a filament of your own), and nothing for PETG', async () => {
    expect((await notesFor('TPU 95A')).ids).toEqual(['flexible-no-float']);
    expect((await notesFor('PA12')).ids).toEqual(['nylon-takes-up-water']);
    expect((await notesFor({ name: 'PA6-CF', density: '1.2 g/cm3' })).ids).toEqual(['nylon-takes-up-water']);
    expect((await notesFor('PETG')).ids).toEqual([]);
  });
});
