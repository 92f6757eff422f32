// @vitest-environment happy-dom
/**
 * Bench points on the valve page (issue 12): one head says what it does, two
 * different masses at one head are refused on the box of the later weight.
 * The model is F = F_pre + A_eff rho g H (DESIGN "Sizing model"): one head
 * cannot fix both unknowns; one head has one stopping force. Heads 1 % apart
 * count as one (headsDefineSlope). A head written as a pressure is read with
 * water at 20 °C, 998.2 kg/m3 (CRC Handbook, recalled from memory): 1.2 psi =
 * 8273.7 Pa = 0.845 m.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { oneHeadNote } from '../../viewer/lib/one-head-note.ts';
import '../../viewer/components/fw-bench-points.ts';
import { form, mountApp, settle } from './app-harness.ts';

beforeEach(() => localStorage.clear());
afterEach(() => {
  document.body.innerHTML = '';
});

describe('one head', () => {
  it('says what one point, or points at one head, can do; nothing for two heads or unfinished rows', () => {
    expect(oneHeadNote([{ head: '0.8 m', mass: '31 g' }])).toMatch(/^One point can only give the seal's area/);
    expect(oneHeadNote([{ head: '0.8 m', mass: '31 g' }, { head: '80.4 cm', mass: '31.5 g' }])).toMatch(/all at one head/);
    expect(oneHeadNote([{ head: '0.8 m', mass: '31 g' }, { head: '2.1 m', mass: '66 g' }])).toBeNull();
    expect(oneHeadNote([{ head: '0.8 m', mass: '' }])).toBeNull();
    expect(oneHeadNote([{ head: '1.2 psi', mass: '31 g' }, { head: '0.845 m', mass: '31 g' }])).toMatch(/all at one head/);
  });

  it('the panel shows the note as a status', async () => {
    const el = document.createElement('fw-bench-points') as HTMLElement & { updateComplete: Promise<unknown> };
    Object.assign(el, { points: [{ head: '0.8 m', mass: '31 g' }], units: 'metric', errors: {} });
    document.body.append(el);
    await el.updateComplete;
    const note = el.shadowRoot!.querySelector('[data-one-head]')!;
    expect(note.getAttribute('role')).toBe('status');
    expect(note.textContent).toContain('Add a point at a second head');
  });
});

describe('two masses at one head in the workbench', () => {
  it('are refused on the later weight\'s box, with a message naming the box and the other point', async () => {
    const app = await mountApp();
    await settle(app);
    const points = () => form(app).shadowRoot!.querySelector('fw-bench-points')!.shadowRoot!;
    const add = () => [...points().querySelectorAll('button')].find((b) => b.textContent === 'Add a bench point')!.click();
    const type = async (name: string, value: string) => {
      const input = points().querySelector(`[name="${name}"]`) as HTMLInputElement;
      input.value = value;
      input.dispatchEvent(new Event('input'));
      await settle(app);
    };
    add();
    await settle(app);
    await type('cal-head-0', '0.8');
    await type('cal-mass-0', '31');
    expect(points().querySelector('[data-one-head]')).not.toBeNull();
    add();
    await settle(app);
    await type('cal-head-1', '0.8');
    await type('cal-mass-1', '40');
    expect(points().querySelector('[name="cal-mass-1"]')!.getAttribute('aria-invalid')).toBe('true');
    expect(points().querySelector('[name="cal-mass-0"]')!.getAttribute('aria-invalid')).toBe('false');
    const message = points().querySelector('.msg')!.textContent!;
    expect(message).toMatch(/^Weight, point 2: 40 g at 0\.8 m, but point 1 at the same head stopped the flow with 31 g/);
    await type('cal-head-1', '2.1');
    await type('cal-mass-1', '66');
    expect(points().querySelector('.msg')).toBeNull();
    expect(points().querySelector('[data-one-head]')).toBeNull();
    expect(points().querySelectorAll('[aria-invalid="true"]')).toHaveLength(0);
  });
});
