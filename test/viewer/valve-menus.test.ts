// @vitest-environment happy-dom
/**
 * The valve's kind and mounting on the valve page (issue 13's valve.architecture
 * and valve.mount, and the rim boxes): a menu left at "the lightest that fits"
 * leaves the document without the key, so it reads as the command line's "auto";
 * a rim asked for without a rim height is said on the Rim height box, in labels.
 * What the choices mean is the schema's (parseDesign, ARCHITECTURE_CHOICES and
 * MOUNT_CHOICES); the rule that a rim mount needs a rim height is the issue's.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ARCHITECTURE_CHOICES, MOUNT_CHOICES, parseDesign } from '../../generator/doc/schema.ts';
import { VALVE_MENUS } from '../../viewer/lib/form-fields.ts';
import { labelFor } from '../../viewer/lib/field-label.ts';
import '../../viewer/components/fw-design-form.ts';
import { edit, form, mountApp, root, settle } from './app-harness.ts';

beforeEach(() => {
  localStorage.clear();
  location.hash = '';
});
afterEach(() => {
  document.body.innerHTML = '';
});

const pick = async (app: HTMLElement & { updateComplete: Promise<unknown> }, path: string, value: string) => {
  const menu = form(app as never).shadowRoot!.querySelector(`select[name="${path}"]`) as HTMLSelectElement;
  menu.value = value;
  menu.dispatchEvent(new Event('change'));
  await app.updateComplete;
};

describe('valve kind and mounting menus', () => {
  it('offer every choice the document takes, by the same values', () => {
    expect(VALVE_MENUS[0].choices.map((c) => c.value)).toEqual(ARCHITECTURE_CHOICES.map((c) => c.value));
    expect(VALVE_MENUS[1].choices.map((c) => c.value)).toEqual(MOUNT_CHOICES.map((c) => c.value));
    expect(labelFor('valve.architecture')).toBe('Valve kind');
    expect(labelFor('valve.mount')).toBe('Mounting');
    expect(labelFor('container.rimHeight')).toBe('Rim height');
  });

  it('a picked kind goes into the document; "the lightest that fits" takes it out again', async () => {
    const app = await mountApp();
    await settle(app);
    await pick(app, 'valve.architecture', 'lever');
    await settle(app);
    const doc = () => (app as unknown as { doc: { valve?: Record<string, unknown> } }).doc;
    expect(doc().valve?.architecture).toBe('lever');
    const sized = parseDesign(doc());
    expect(sized.ok && sized.inputs.architecture).toBe('lever');
    await pick(app, 'valve.architecture', 'auto');
    await settle(app);
    expect(doc().valve?.architecture).toBeUndefined();
  });

  it('the rim asked for without a rim height: the Rim height box says so in labels, no document path', async () => {
    const app = await mountApp();
    await settle(app);
    await edit(app, 'container.rimHeight', '');
    await pick(app, 'valve.mount', 'rim');
    await settle(app);
    const r = form(app).shadowRoot!;
    expect(r.querySelector('[name="container.rimHeight"]')!.getAttribute('aria-invalid')).toBe('true');
    const message = r.querySelector('#f-container-rimHeight-msg')!.textContent!;
    expect(message).toMatch(/rim height/i);
    expect(message).not.toMatch(/\b(valve|container)\.[a-z]/i);
    // given one, the valve hangs from it
    await edit(app, 'container.rimHeight', '160');
    await settle(app);
    expect(r.querySelector('[name="container.rimHeight"]')!.getAttribute('aria-invalid')).toBe('false');
    expect(root(app).querySelector('fw-results')).not.toBeNull();
  });
});
