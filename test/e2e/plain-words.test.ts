/**
 * Plain words on the valve page, in a real browser (Debian's headless Chromium
 * driven by playwright-core, the built page served by `vite preview`): a bad
 * value in any box is explained with the boxes' on-screen labels, never with a
 * document path such as "supply.headMax".
 *
 * Reference checks: the rule itself is the issue's (a grower reads labels, not
 * file paths); that every message is tied to its box follows WCAG 2.2 SC 3.3.1
 * Error Identification ("the item that is in error is identified and the error
 * is described to the user in text"; source: W3C).
 */
import { join } from 'node:path';
import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GLOSSARY, type TermKey } from '../../generator/doc/glossary.ts';
import { CONSTRAINT_TEXT } from '../../generator/sizing/layout/constraint-text.ts';
import { SHOTS, haveChromium, serveWorkbench, visibleTexts, type ServedWorkbench } from './served-workbench.ts';

/** A dotted document path as the CLI and the files write it: "supply.headMax", "seal.calibration.mass". */
const DOCUMENT_PATH = /\b[a-z]+\.[a-zA-Z]+(\.[a-zA-Z]+)*\b/;
/** The sizing's internal names of its size-setting rules ("reserve", "travel", "least-mass"), as whole words. */
const RULE_NAMES = new RegExp(`\\b(${Object.keys(CONSTRAINT_TEXT).join('|')})\\b`, 'i');

describe.skipIf(!haveChromium)('plain words on the valve page, in Chromium', () => {
  let served: ServedWorkbench;
  let page: Page;

  beforeAll(async () => {
    served = await serveWorkbench('e2e-words');
    page = served.page;
  });
  afterAll(async () => served?.close());

  const app = () => page.locator('fw-app');
  const buildId = async () => Number((await app().getAttribute('data-build-id')) ?? 0);
  const invalidCount = () => page.locator('fw-design-form [aria-invalid="true"]').count();

  /**
   * Type a value and wait until the page has judged it: checked (the app counts its checks), and when no box
   * is marked, sized (the build asked for has come back).
   */
  async function enter(box: Locator, value: string): Promise<void> {
    const checked = Number((await app().getAttribute('data-checked')) ?? 0);
    await box.fill(value);
    await expect.poll(async () => Number(await app().getAttribute('data-checked')), { timeout: 20_000 }).toBeGreaterThan(checked);
    if ((await invalidCount()) > 0) return;
    const asked = Number(await app().getAttribute('data-asked-build-id'));
    await expect.poll(buildId, { timeout: 20_000 }).toBeGreaterThanOrEqual(asked);
  }

  /** Type a good value back: judged, sized, and no box marked. */
  async function restore(box: Locator, value: string): Promise<void> {
    await enter(box, value);
    expect(await invalidCount(), `${value} is taken again`).toBe(0);
  }

  /** Visible texts that hold a document path or a rule's internal name, with what was typed (empty: none). */
  async function pathsOnScreen(what: string): Promise<string[]> {
    return (await visibleTexts(page)).filter((t) => DOCUMENT_PATH.test(t) || RULE_NAMES.test(t)).map((t) => `${what}: ${t}`);
  }

  /** All the messages under the boxes now. */
  const messages = () => page.locator('fw-design-form .msg').allTextContents();

  it('names boxes by their labels after a bad value in every box, never by a document path or a rule\'s internal name', async () => {
    await page.goto(served.url);
    await page.waitForFunction(() => document.querySelector('fw-app')?.hasAttribute('data-preview-build-id'), null, { timeout: 30_000 });
    expect(await pathsOnScreen('on opening')).toEqual([]);
    // every box there is: two bench points and the grower's own filament bring their boxes on screen
    await page.getByRole('button', { name: 'Add a bench point' }).click();
    await page.getByLabel('Head, point 1').fill('0.8');
    await page.getByLabel('Weight, point 1').fill('31');
    await page.getByRole('button', { name: 'Add a bench point' }).click();
    await page.getByLabel('Head, point 2').fill('2.1');
    await restore(page.getByLabel('Weight, point 2'), '66');
    await page.getByLabel('Filament', { exact: true }).selectOption({ label: 'other filament…' });
    await expect.poll(() => page.getByLabel('Filament density').count()).toBe(1);

    const names = await page.locator('fw-design-form input[name]').evaluateAll((els) => els.map((e) => (e as HTMLInputElement).name));
    expect(names.length).toBeGreaterThanOrEqual(19);
    const found: string[] = [];
    const seen = new Set<string>();
    for (const name of names) {
      const box = page.locator(`fw-design-form input[name="${name}"]`);
      const old = await box.inputValue();
      const text = name === 'name' || name === 'print.material.name';
      for (const value of text ? [''] : ['abc', '99999', '-1', '']) {
        if (value === old) continue;
        await enter(box, value);
        for (const m of await messages()) if (m.trim()) seen.add(m.trim());
        found.push(...(await pathsOnScreen(`"${value}" in ${name}`)));
      }
      await restore(box, old);
    }
    // the check has something to read: most boxes refused most of those values with a message
    expect(seen.size).toBeGreaterThan(30);
    expect(found).toEqual([]);
  });

  it('names the other box of a pair by its label (low above full, hole wider than the lip, a wall under two lines)', async () => {
    const pairs: [label: string, value: string, other: string][] = [
      ['Tank low: water height above the valve', '3', 'Tank full: water height above the valve'],
      ['Nozzle hole', '5', 'Nozzle lip, outside width'],
      ['Housing wall', '0.5', 'Line width'],
    ];
    const full = page.getByLabel('Tank full: water height above the valve');
    const oldFull = await full.inputValue();
    await restore(full, '2.9');
    const found: string[] = [];
    for (const [label, value, other] of pairs) {
      const box = page.getByLabel(label, { exact: true });
      const old = await box.inputValue();
      await enter(box, value);
      const said = (await messages()).join(' ');
      if (label !== 'Housing wall') expect(said, label).toContain(`"${other}"`);
      else expect(said, label).toMatch(/line width/i);
      found.push(...(await pathsOnScreen(`${value} in ${label}`)));
      if (label === 'Tank low: water height above the valve') await page.screenshot({ path: join(SHOTS, 'words-01-pair-1400.png') });
      await restore(box, old);
    }
    await restore(full, oldFull);
    expect(found).toEqual([]);
  });

  it('says the reasons and the ways out of a design no valve fits in labels, at 1400 and 390 px', async () => {
    const head = page.getByLabel('Tank full: water height above the valve');
    const level = page.getByLabel('Water depth to hold');
    const [oldHead, oldLevel] = [await head.inputValue(), await level.inputValue()];
    await head.fill('3');
    await enter(level, '10');
    await page.waitForSelector('[data-way-out]', { timeout: 20_000 });
    const ways = await page.locator('[data-way-out]').allTextContents();
    expect(ways.length).toBeGreaterThan(0);
    expect(ways.join(' ')).toContain('"Water depth to hold"');
    expect(await pathsOnScreen('no fit at 1400 px')).toEqual([]);
    await page.screenshot({ path: join(SHOTS, 'words-02-no-fit-1400.png') });
    await page.setViewportSize({ width: 390, height: 844 });
    expect(await pathsOnScreen('no fit at 390 px')).toEqual([]);
    await page.screenshot({ path: join(SHOTS, 'words-03-no-fit-390.png'), fullPage: true });
    await page.setViewportSize({ width: 1400, height: 900 });
    await head.fill(oldHead);
    await restore(level, oldLevel);
  });

  /** The element the keyboard focus is on, through shadow roots: its fw-term's key, if it is a glossary word. */
  const focusedTerm = () =>
    page.evaluate(() => {
      let el = document.activeElement;
      while (el?.shadowRoot?.activeElement) el = el.shadowRoot.activeElement;
      return el?.getAttribute('data-term') ?? null;
    });
  const tooltipOf = (key: TermKey) => page.locator(`fw-term[term="${key}"] [role="tooltip"]`).first();

  it('explains every glossary word the page uses, on keyboard focus and on hover, and Escape hides it', async () => {
    await page.setViewportSize({ width: 1400, height: 900 });
    const text = (await visibleTexts(page)).join(' ');
    const used = (Object.keys(GLOSSARY) as TermKey[]).filter((key) => new RegExp(`\\b${GLOSSARY[key].name}\\b`, 'i').test(text));
    // the trade words of issue 12 are on the page, and many more
    for (const key of ['head', 'nozzle-hole', 'throttle-band', 'spare-lift', 'pad-squeeze'] as TermKey[]) expect(used).toContain(key);
    for (const key of used) {
      const terms = page.locator(`fw-term[term="${key}"]`);
      expect(await terms.count(), `"${GLOSSARY[key].name}" is explained somewhere on the page`).toBeGreaterThan(0);
      // the explanation is tied to the word: aria-describedby names the tooltip beside it
      const word = terms.first().locator('[data-term]');
      const tip = tooltipOf(key);
      expect(await word.getAttribute('aria-describedby')).toBe(await tip.getAttribute('id'));
      expect((await tip.textContent())!.length).toBeGreaterThan(40);
    }
    // keyboard: from the notes box (the last of "This valve"), Tab reaches "head" in the tank group's intro, and its explanation shows
    await page.getByLabel('Notes (printed on the build sheet)').focus();
    await page.keyboard.press('Tab');
    expect(await focusedTerm()).toBe('head');
    await expect.poll(() => tooltipOf('head').isVisible()).toBe(true);
    expect(await tooltipOf('head').textContent()).toContain(GLOSSARY.head.explain);
    await page.screenshot({ path: join(SHOTS, 'words-04-term-focus-1400.png') });
    await page.keyboard.press('Escape');
    await expect.poll(() => tooltipOf('head').isVisible()).toBe(false);
    await page.keyboard.press('Tab');
    expect(await focusedTerm()).toBe('tank-full');
    await expect.poll(() => tooltipOf('tank-full').isVisible()).toBe(true);
    expect(await tooltipOf('head').isVisible()).toBe(false);
    // hover alone shows it too
    await page.getByLabel('Name (used for the file names)').focus();
    await page.locator('fw-term[term="nozzle-hole"] [data-term]').first().hover();
    await expect.poll(() => tooltipOf('nozzle-hole').isVisible()).toBe(true);
    expect(await tooltipOf('nozzle-hole').textContent()).toContain('orifice');
    await page.mouse.move(0, 0);
    await expect.poll(() => tooltipOf('nozzle-hole').isVisible()).toBe(false);
  });

  it('keeps an explanation on screen at 1024 and 390 px, and writes powers of units raised (m², not m2)', async () => {
    for (const [width, height] of [[1024, 768], [390, 844]]) {
      await page.setViewportSize({ width, height });
      const marker = page.locator('fw-term[term="spare-lift"] [data-term]').first();
      await page.getByLabel('Name (used for the file names)').focus(); // a fresh focus: placed for this width
      await marker.scrollIntoViewIfNeeded();
      await marker.focus();
      const tip = tooltipOf('spare-lift');
      await expect.poll(() => tip.isVisible()).toBe(true);
      const box = (await tip.boundingBox())!;
      expect(box.x, `left edge at ${width} px`).toBeGreaterThanOrEqual(0);
      expect(box.x + box.width, `right edge at ${width} px`).toBeLessThanOrEqual(width);
      expect(box.y + box.height, `bottom edge at ${width} px`).toBeLessThanOrEqual(height);
      await page.screenshot({ path: join(SHOTS, `words-05-term-${width}.png`) });
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(width);
    }
    await page.setViewportSize({ width: 1400, height: 900 });
    const area = page.getByLabel('Water surface area');
    const old = await area.inputValue();
    await enter(area, '99999');
    const texts = await visibleTexts(page);
    // the box's unit and its message: square metres written m² (ISO 80000-1 writes powers of units as superscripts)
    expect(texts).toContain('m²');
    expect(texts.join(' ')).toMatch(/m² is too high|too high.*m²/);
    expect(texts.filter((t) => /\b(mm|cm|m|in|ft)[23]\b/.test(t))).toEqual([]);
    await restore(area, old);
  });

  it('says beside the filament menu what PLA, nylon and a flexible filament mean for a valve, each with its basis, at 1400 and 390 px', async () => {
    await page.setViewportSize({ width: 1400, height: 900 });
    const filament = page.getByLabel('Filament', { exact: true });
    const note = (id: string) => page.locator(`[data-material-note="${id}"]`);
    const before = await filament.inputValue();
    for (const [material, id, title] of [
      ['PLA', 'pla-warm-water', 'PLA softens in warm water.'],
      ['PA12', 'nylon-takes-up-water', 'Nylon takes up water.'],
      ['TPU 95A', 'flexible-no-float', 'A flexible filament cannot make a float.'],
    ] as const) {
      await filament.selectOption(material);
      await expect.poll(() => note(id).isVisible()).toBe(true);
      expect(await note(id).textContent()).toContain(title);
      expect(await note(id).locator('.basis').textContent()).toMatch(/^Basis: .{60,}/);
      expect(await pathsOnScreen(`filament ${material}`)).toEqual([]);
      if (material === 'PLA') {
        await note(id).scrollIntoViewIfNeeded();
        await page.screenshot({ path: join(SHOTS, 'words-06-pla-note-1400.png') });
        await page.setViewportSize({ width: 390, height: 844 });
        await note(id).scrollIntoViewIfNeeded();
        await page.screenshot({ path: join(SHOTS, 'words-07-pla-note-390.png') });
        expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
        await page.setViewportSize({ width: 1400, height: 900 });
      }
    }
    await filament.selectOption('PETG');
    await expect.poll(() => page.locator('[data-material-note]').count()).toBe(0);
    if (before !== 'PETG' && before !== '__other') await filament.selectOption(before);
  });
});

