// @vitest-environment happy-dom
/**
 * The workbench never loses work and never exports a design the screen does
 * not show (issue 11, items 2, 3 and 4). Builds run on a fake worker that sizes
 * with the real sizing core and answers when the test says, so "a build is
 * pending" is a state the test holds, not a race. Design documents are checked
 * by parseDesign (the same schema the command line uses). WAI-ARIA 1.2:
 * messages are in role="alert" / role="status" regions (source: W3C).
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { WorkerRequest } from '../../viewer/worker/protocol.ts';
import { STORAGE_KEY } from '../../viewer/lib/storage.ts';
import { RECENT_KEY } from '../../viewer/lib/recent-designs.ts';
import { encodeDesign } from '../../viewer/lib/share-link.ts';
import { edit, mountApp, root, settle, workers, type App } from './app-harness.ts';

const fileBar = (app: App) => root(app).querySelector('fw-file-bar')! as HTMLElement & { updateComplete: Promise<unknown> };
const notice = (app: App) => root(app).querySelector('[data-notice]')?.textContent?.replace(/\s+/g, ' ') ?? '';

beforeEach(() => {
  localStorage.clear();
  location.hash = '';
});
afterEach(() => {
  document.body.innerHTML = '';
});

describe('a damaged saved design', () => {
  it.each([
    ['calibration as a string', { supply: { headMax: '2 m' }, level: { target: '40 mm' }, seal: { calibration: 'lots' } }],
    ['calibration as {}', { supply: { headMax: '2 m' }, level: { target: '40 mm' }, seal: { calibration: {} } }],
    ['calibration as [null]', { supply: { headMax: '2 m' }, level: { target: '40 mm' }, seal: { calibration: [null] } }],
    ['a head that is not a head', { supply: { headMax: { deep: true } }, level: { target: '40 mm' } }],
  ])('%s: a message naming the box by its label, a preset on screen that sizes, the damaged one kept', async (_what, doc) => {
    localStorage.setItem(STORAGE_KEY, JSON.stringify({ doc, units: 'metric' }));
    const app = await mountApp();
    await settle(app);
    expect(notice(app)).toMatch(/Your saved design could not be opened: .* starts from/);
    expect(notice(app)).not.toMatch(/seal\.calibration|supply\.headMax/);
    expect(app.getAttribute('data-result')).toBe('sized');
    expect(root(app).querySelector('fw-results')!.shadowRoot!.textContent).not.toContain('Sizing…');
    expect(JSON.parse(localStorage.getItem(RECENT_KEY)!)[0].doc).toEqual(doc);
  });
});

describe('opening a link or a preset keeps the current design', () => {
  it('a share link replaces the design, keeps the old one under "Earlier designs", and puts it back on request', async () => {
    const mine = { name: 'my tubs', supply: { headMax: '1.7 m' }, level: { target: '55 mm' } };
    localStorage.setItem(STORAGE_KEY, JSON.stringify({ doc: mine, units: 'metric' }));
    location.hash = `#design=${encodeDesign({ name: 'from a friend', supply: { headMax: '2.4 m' }, level: { target: '35 mm' } })}`;
    const app = await mountApp();
    await settle(app);
    expect(notice(app)).toMatch(/Opened the design from the link\. Your previous design is kept/);
    expect(JSON.parse(localStorage.getItem(RECENT_KEY)!)[0].doc).toEqual(mine);
    expect(root(app).querySelector('[data-recent]')).not.toBeNull();
    (root(app).querySelector('[data-undo]') as HTMLButtonElement).click();
    await settle(app);
    expect(JSON.parse(localStorage.getItem(STORAGE_KEY)!).doc).toEqual(mine);
  });

  it('picking a preset keeps the design on screen in the list, and it can be opened again from there', async () => {
    const mine = { name: 'my tubs', supply: { headMax: '1.7 m' }, level: { target: '55 mm' } };
    localStorage.setItem(STORAGE_KEY, JSON.stringify({ doc: mine, units: 'metric' }));
    const app = await mountApp();
    await settle(app);
    const presetSelect = root(app).querySelector('header select') as HTMLSelectElement;
    presetSelect.value = presetSelect.options[1]!.value;
    presetSelect.dispatchEvent(new Event('change'));
    await settle(app);
    expect(JSON.parse(localStorage.getItem(STORAGE_KEY)!).doc).not.toEqual(mine);
    const recent = root(app).querySelector('[data-recent]') as HTMLSelectElement;
    recent.value = '0';
    recent.dispatchEvent(new Event('change'));
    await settle(app);
    expect(JSON.parse(localStorage.getItem(STORAGE_KEY)!).doc).toEqual(mine);
  });
});

describe('exports come from the design on screen', () => {
  const buttons = (app: App) => [...fileBar(app).shadowRoot!.querySelectorAll('button')].filter((b) => !/share/i.test(b.textContent ?? ''));

  it('while a change is being sized, every file button is off with the reason and the view is marked out of date; then the export holds the new value', async () => {
    const app = await mountApp();
    await settle(app);
    expect(buttons(app).every((b) => !b.disabled)).toBe(true);
    await edit(app, 'level.target', '61 mm');
    await fileBar(app).updateComplete;
    expect(buttons(app).length).toBeGreaterThan(5);
    expect(buttons(app).every((b) => b.disabled)).toBe(true);
    expect(fileBar(app).shadowRoot!.querySelector('[data-export-blocked]')!.textContent).toMatch(/Sizing your latest change|out of date/);
    expect(root(app).querySelector('[data-out-of-date]')).not.toBeNull();
    // an export asked for now (a click that slipped through) makes nothing
    fileBar(app).dispatchEvent(new CustomEvent('export-request', { detail: { kind: 'zip' }, bubbles: true, composed: true }));
    expect(workers.flatMap((w) => w.sent).some((r) => r.type === 'export')).toBe(false);
    await settle(app);
    expect(buttons(app).every((b) => !b.disabled)).toBe(true);
    expect(root(app).querySelector('[data-out-of-date]')).toBeNull();
    fileBar(app).dispatchEvent(new CustomEvent('export-request', { detail: { kind: 'zip' }, bubbles: true, composed: true }));
    const exported = workers.flatMap((w) => w.sent).find((r) => r.type === 'export') as Extract<WorkerRequest, { type: 'export' }>;
    expect((exported.document as { level: { target: string } }).level.target).toBe('61 mm');
    expect(exported.inputs.targetLevelM).toBeCloseTo(0.061, 9);
  });

  it('a box in error turns the files off with the reason; no valve fitting does too', async () => {
    const app = await mountApp();
    await settle(app);
    await edit(app, 'supply.headMax', '9 m');
    await settle(app);
    expect(buttons(app).every((b) => b.disabled)).toBe(true);
    expect(fileBar(app).shadowRoot!.textContent).toMatch(/Correct the boxes marked in red/);
    await edit(app, 'supply.headMax', '3 m');
    await edit(app, 'limits.maxOuterDiameter', '20 mm');
    await settle(app);
    if (app.getAttribute('data-result') === 'no-fit') {
      expect(buttons(app).every((b) => b.disabled)).toBe(true);
      expect(fileBar(app).shadowRoot!.textContent).toMatch(/No valve fits/);
    }
  });
});
