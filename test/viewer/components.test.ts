// @vitest-environment happy-dom
/**
 * Lit components in a DOM: state down, events up. The plot's held level is
 * checked against the sizing core (Archimedes' principle, via net-push); the
 * form's labels follow WCAG 2.2 SC 1.3.1 / 4.1.2 (source: W3C) - every input
 * has a label tied to it.
 */
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import type { SizingSuccess, WayOut } from '../../generator/sizing/result.ts';
import '../../viewer/components/fw-design-form.ts';
import '../../viewer/components/fw-push-plot.ts';
import '../../viewer/components/fw-results.ts';
import '../../viewer/components/fw-cautions.ts';
import { CAUTIONS } from '../../generator/doc/cautions.ts';

async function mount<T extends HTMLElement>(tag: string, props: Record<string, unknown>): Promise<T> {
  const el = document.createElement(tag) as T & { updateComplete: Promise<unknown> };
  Object.assign(el, props);
  document.body.append(el);
  await el.updateComplete;
  return el;
}

function sized(doc: unknown): SizingSuccess {
  const p = parseDesign(doc);
  if (!p.ok) throw new Error('bad doc');
  const r = sizeDesign(p.inputs);
  if (!r.ok) throw new Error('no fit');
  return r;
}

describe('fw-design-form', () => {
  it('gives every input a label and sends edits up with the shown unit', async () => {
    const form = await mount<HTMLElement>('fw-design-form', { doc: { supply: { headMax: '2 m' }, level: { target: '40 mm' } }, units: 'imperial', errors: {} });
    const root = form.shadowRoot!;
    const inputs = [...root.querySelectorAll('input[id]')] as HTMLInputElement[];
    expect(inputs.length).toBeGreaterThan(10);
    for (const input of inputs) expect(root.querySelector(`label[for="${input.id}"]`), input.id).not.toBeNull();
    const level = root.querySelector('#f-level-target') as HTMLInputElement;
    expect(level.value).toBe('40 mm'); // written in mm, shown as written until the grower switches units
    let detail: unknown = null;
    form.addEventListener('field-input', (e) => (detail = (e as CustomEvent).detail));
    level.value = '2';
    level.dispatchEvent(new Event('input'));
    expect(detail).toEqual({ path: 'level.target', value: '2 in' });
  });

  it('marks a field with its message', async () => {
    const form = await mount<HTMLElement>('fw-design-form', { doc: { supply: { headMax: '9 m' } }, units: 'metric', errors: { 'supply.headMax': '"9 m" is too high' } });
    const input = form.shadowRoot!.querySelector('#f-supply-headMax') as HTMLInputElement;
    expect(input.getAttribute('aria-invalid')).toBe('true');
    expect(form.shadowRoot!.querySelector('#f-supply-headMax-msg')!.textContent).toContain('too high');
  });
});

describe('fw-design-form: the seal pad menu', () => {
  it('has a labelled menu of the pad table, shows the document\'s pad and sends a pick up ("auto" removes the key)', async () => {
    const form = await mount<HTMLElement & { updateComplete: Promise<unknown> }>('fw-design-form', {
      doc: { supply: { headMax: '2 m' }, level: { target: '40 mm' }, seal: { pad: 'Sponge-2' } },
      units: 'metric',
      errors: {},
    });
    const root = form.shadowRoot!;
    const select = root.querySelector('#f-seal-pad') as HTMLSelectElement;
    expect(root.querySelector('label[for="f-seal-pad"]')).not.toBeNull(); // WCAG 2.2 SC 1.3.1: a label tied to the control
    const options = [...select.options].map((o) => o.value);
    expect(options).toContain('sponge grade 2');
    expect(options).toContain('rubber 50A');
    expect(select.value).toBe('sponge grade 2');
    let detail: unknown = null;
    form.addEventListener('field-input', (e) => (detail = (e as CustomEvent).detail));
    select.value = 'rubber 40A';
    select.dispatchEvent(new Event('change'));
    expect(detail).toEqual({ path: 'seal.pad', value: 'rubber 40A' });
    select.value = 'auto';
    select.dispatchEvent(new Event('change'));
    expect(detail).toEqual({ path: 'seal.pad', value: undefined });
  });
});

describe('fw-push-plot', () => {
  it('draws the curve and labels the level held at full tank', async () => {
    const s = sized({ supply: { headMax: '2.2 m', headMin: '1.2 m' }, level: { target: '45 mm' } });
    const plot = await mount<HTMLElement>('fw-push-plot', { sizing: s, units: 'metric' });
    const root = plot.shadowRoot!;
    expect(root.querySelector('path.curve')!.getAttribute('d')!.split('L')).toHaveLength(81);
    expect(root.querySelector('[data-result="plot-held-full"]')!.textContent).toBe('45.0 mm');
    expect(root.querySelectorAll('.need-max, .need-min')).toHaveLength(2);
  });
});

describe('fw-results', () => {
  it('offers the ways out as buttons that send the change up', async () => {
    const way: WayOut = { field: 'level.target', value: '28.5 mm', message: 'a target level of at least 28.5 mm at this head' };
    const el = await mount<HTMLElement>('fw-results', { result: { ok: false, reasons: [{ code: 'travel', message: 'no room' }], waysOut: [way], warnings: [] }, lastGood: null, units: 'metric' });
    let got: unknown = null;
    el.addEventListener('apply-way-out', (e) => (got = (e as CustomEvent).detail));
    (el.shadowRoot!.querySelector('[data-way-out="level.target"]') as HTMLButtonElement).click();
    expect(got).toEqual(way);
  });
  it('shows the sized numbers in the chosen units', async () => {
    const s = sized({ supply: { headMax: '2.2 m' }, level: { target: '50.8 mm' } });
    const el = await mount<HTMLElement>('fw-results', { result: s, lastGood: s, units: 'imperial' });
    // 50.8 mm is exactly 2 in (NIST SP 811)
    expect(el.shadowRoot!.querySelector('[data-result="level-full"]')!.textContent).toBe('2.00 in');
  });
  it('shows the pad and the water the float can take in (Archimedes: (F_avail - F_seal) / (rho g))', async () => {
    const s = sized({ supply: { headMax: '2.2 m' }, level: { target: '45 mm' } });
    const el = await mount<HTMLElement>('fw-results', { result: s, lastGood: s, units: 'metric' });
    expect(el.shadowRoot!.querySelector('[data-result="pad"]')!.textContent).toContain(s.seal.padMaterial);
    const ml = ((s.float.availableForceN - s.closingForce.atHeadMaxN) / (998.2 * 9.80665)) * 1e6; // water 998.2 kg/m3 (CRC, from memory); g NIST SP 330
    expect(el.shadowRoot!.querySelector('[data-result="leak-tolerance"]')!.textContent).toContain(`${ml.toFixed(1)} mL`);
  });
});

describe('fw-cautions', () => {
  it('shows every shared caution', async () => {
    const el = await mount<HTMLElement>('fw-cautions', {});
    expect(el.shadowRoot!.querySelectorAll('li')).toHaveLength(CAUTIONS.length);
  });
});
