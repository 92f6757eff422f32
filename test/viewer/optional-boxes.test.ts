// @vitest-environment happy-dom
/**
 * Optional boxes show the value a blank one uses and can be set back to it;
 * clearing one reverts to its default (issue 12, "the small things"). What a
 * blank box uses is checked against parseDesign, the schema the command line
 * reads (a document without the key sizes exactly as one with the value shown);
 * the inch is exactly 25.4 mm and the foot 0.3048 m (NIST SP 811, appendix B).
 * Refill time = area x rise / flow (continuity) needs both boxes.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { fieldDefault } from '../../viewer/lib/field-default.ts';
import { docToSize } from '../../viewer/lib/doc-to-size.ts';
import { placeErrors } from '../../viewer/lib/place-errors.ts';
import { ALL_FIELDS } from '../../viewer/lib/form-fields.ts';
import '../../viewer/components/fw-design-form.ts';
import { edit, form, mountApp, root, sentRequests, settle } from './app-harness.ts';

const field = (path: string) => ALL_FIELDS.find((f) => f.path === path)!;
const base = { supply: { headMax: '2 m' }, level: { target: '40 mm' } };
const inputsOf = (doc: unknown) => {
  const parsed = parseDesign(doc);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  return parsed.inputs;
};

beforeEach(() => {
  localStorage.clear();
  location.hash = '';
});
afterEach(() => {
  document.body.innerHTML = '';
});

describe('what a blank box uses', () => {
  it('every optional box with a default says it, and a blank box sizes as the value said (parseDesign)', () => {
    const withDefaults = ALL_FIELDS.filter((f) => f.optional && !f.blankFrom && !f.blankMeans);
    expect(withDefaults.map((f) => f.path)).toEqual(expect.arrayContaining(['limits.maxOuterDiameter', 'nozzle.orifice', 'reserve', 'supply.tubeLength']));
    for (const def of withDefaults) {
      const shown = fieldDefault(def, base, 'metric')!;
      expect(shown.note, def.path).toMatch(/^Blank uses /);
      const written = `${shown.placeholder}${def.metric ? ` ${def.metric}` : ''}`;
      const [section, key] = def.path.includes('.') ? def.path.split('.') : [def.path, ''];
      const doc = key ? { ...base, [section]: { ...(base as Record<string, object>)[section], [key]: written } } : { ...base, [section]: Number(written) };
      expect(inputsOf(doc), def.path).toEqual(inputsOf(base));
    }
  });

  it('in an inch box the default is in inches: 120 mm / 25.4 = 4.72 in (NIST SP 811), 5 m / 0.3048 = 16.4 ft', () => {
    expect(fieldDefault(field('limits.maxOuterDiameter'), base, 'imperial')).toEqual({ placeholder: '4.72', note: 'Blank uses 4.72 in (the usual value).' });
    expect(fieldDefault(field('supply.tubeLength'), base, 'imperial')!.placeholder).toBe('16.4');
    expect(fieldDefault(field('level.target'), base, 'metric')).toBeNull(); // not optional
  });

  it('"Tank low" blank copies "Tank full"; the refill boxes blank mean no refill time', () => {
    expect(fieldDefault(field('supply.headMin'), base, 'metric')).toEqual({ placeholder: '2', note: 'Blank: the same as "Tank full: water height above the valve".' });
    expect(inputsOf(base).headMinM).toBe(inputsOf(base).headMaxM);
    expect(fieldDefault(field('reservoir.area'), base, 'metric')!.note).toBe('Blank: no refill time.');
  });
});

describe('the form', () => {
  async function mountForm(doc: unknown, units = 'metric') {
    const el = document.createElement('fw-design-form') as HTMLElement & { updateComplete: Promise<unknown> };
    Object.assign(el, { doc, units, errors: {} });
    document.body.append(el);
    await el.updateComplete;
    return el;
  }

  it('shows the default greyed in an empty box and under it; a typed box offers to go back, which sends the key away', async () => {
    const el = await mountForm({ ...base, limits: { maxOuterDiameter: '90 mm' } });
    const r = el.shadowRoot!;
    const orifice = r.querySelector('#f-nozzle-orifice') as HTMLInputElement;
    expect(orifice.placeholder).toBe('2');
    expect(r.querySelector('#f-nozzle-orifice-note')!.textContent).toBe('Blank uses 2 mm (the usual value).');
    expect(r.querySelector('[data-reset="nozzle.orifice"]')).toBeNull();
    let detail: unknown = null;
    el.addEventListener('field-input', (e) => (detail = (e as CustomEvent).detail));
    (r.querySelector('[data-reset="limits.maxOuterDiameter"]') as HTMLButtonElement).click();
    expect(detail).toEqual({ path: 'limits.maxOuterDiameter', value: undefined });
    // clearing by hand does the same
    orifice.value = '2.5';
    orifice.dispatchEvent(new Event('input'));
    orifice.value = '';
    orifice.dispatchEvent(new Event('input'));
    expect(detail).toEqual({ path: 'nozzle.orifice', value: undefined });
  });

  it('a refill box given alone says it waits for the other', async () => {
    const el = await mountForm({ ...base, reservoir: { rise: '20 mm' } });
    expect(el.shadowRoot!.querySelector('#f-reservoir-rise-note')!.textContent).toContain('Not used until "Water surface area" is given too.');
  });
});

describe('the document as sized', () => {
  it('leaves out a lone refill box and half-filled bench rows, and nothing else', () => {
    const doc = { ...base, reservoir: { rise: '20 mm' }, seal: { calibration: [{ head: '0.8 m', mass: '' }] } };
    expect(docToSize(doc)).toEqual(base);
    const both = { ...base, reservoir: { area: '0.1 m2', rise: '20 mm' } };
    expect(docToSize(both)).toEqual(both);
    expect(parseDesign(docToSize(doc)).ok).toBe(true);
    expect(parseDesign(doc).ok).toBe(false); // the command line still wants both
  });
});

describe('errors land on the box the grower changed', () => {
  const errorsOf = (doc: unknown) => {
    const parsed = parseDesign(doc);
    return parsed.ok ? {} : Object.fromEntries(parsed.errors.map((e) => [e.field, e.message]));
  };
  it('a narrower lip typed last: the message is on the lip; a wider hole typed last: on the hole', () => {
    const errors = errorsOf({ ...base, nozzle: { orifice: '3 mm', sealDiameter: '2.5 mm' } });
    expect(Object.keys(errors)).toEqual(['nozzle.orifice']); // where the schema reports it
    const lip = placeErrors(errors, new Map([['nozzle.orifice', 1], ['nozzle.sealDiameter', 2]]));
    expect(Object.keys(lip)).toEqual(['nozzle.sealDiameter']);
    expect(lip['nozzle.sealDiameter']).toMatch(/^Now not wider than "Nozzle hole"\./);
    expect(Object.keys(placeErrors(errors, new Map([['nozzle.sealDiameter', 1], ['nozzle.orifice', 2]])))).toEqual(['nozzle.orifice']);
  });
  it('tank full lowered under tank low, and a line width too wide for the wall', () => {
    const heads = errorsOf({ supply: { headMax: '1 m', headMin: '1.5 m' }, level: { target: '40 mm' } });
    expect(Object.keys(placeErrors(heads, new Map([['supply.headMax', 5]])))).toEqual(['supply.headMax']);
    const wall = errorsOf({ ...base, print: { wall: '1.2 mm', lineWidth: '0.8 mm' } });
    expect(Object.keys(placeErrors(wall, new Map([['print.lineWidth', 3]])))).toEqual(['print.lineWidth']);
  });
  it('a box\'s own range error stays on it', () => {
    const errors = errorsOf({ ...base, nozzle: { orifice: '9 mm' } });
    expect(Object.keys(placeErrors(errors, new Map([['nozzle.sealDiameter', 9]])))).toEqual(['nozzle.orifice']);
  });
});

describe('in the workbench', () => {
  it('clearing "Water surface area" does not stop the sizing; the files hold the design as sized', async () => {
    const app = await mountApp();
    await settle(app);
    await edit(app, 'reservoir.area', '0.1');
    await edit(app, 'reservoir.rise', '20');
    await settle(app);
    const builds = () => sentRequests().length;
    expect(app.getAttribute('data-result')).toBe('sized');
    await edit(app, 'reservoir.area', '');
    const before = builds();
    await new Promise((r) => setTimeout(r, 60));
    expect(builds()).toBeGreaterThan(before); // sized again, not stopped by an error
    await settle(app);
    expect(form(app).shadowRoot!.querySelector('.field.bad')).toBeNull();
    expect(form(app).shadowRoot!.querySelector('#f-reservoir-rise-note')!.textContent).toContain('Not used until');
    root(app).querySelector('fw-file-bar')!.dispatchEvent(new CustomEvent('export-request', { detail: { kind: 'zip' }, bubbles: true, composed: true }));
    const exported = sentRequests().find((r) => r.type === 'export') as { document: Record<string, unknown> } | undefined;
    expect(exported?.document.reservoir).toBeUndefined();
  });

  it('a lip typed narrower than the hole is marked on the lip box', async () => {
    const app = await mountApp();
    await settle(app);
    await edit(app, 'nozzle.sealDiameter', '1.5');
    await settle(app);
    const f = form(app).shadowRoot!;
    expect(f.querySelector('#f-nozzle-sealDiameter')!.getAttribute('aria-invalid')).toBe('true');
    expect(f.querySelector('#f-nozzle-orifice')!.getAttribute('aria-invalid')).toBe('false');
  });
});
