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
import { SHOTS, haveChromium, serveWorkbench, visibleTexts, type ServedWorkbench } from './served-workbench.ts';

/** A dotted document path as the CLI and the files write it: "supply.headMax", "seal.calibration.mass". */
const DOCUMENT_PATH = /\b[a-z]+\.[a-zA-Z]+(\.[a-zA-Z]+)*\b/;

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

  /** Visible texts that hold a document path, with what was typed (empty: none). */
  async function pathsOnScreen(what: string): Promise<string[]> {
    return (await visibleTexts(page)).filter((t) => DOCUMENT_PATH.test(t)).map((t) => `${what}: ${t}`);
  }

  /** All the messages under the boxes now. */
  const messages = () => page.locator('fw-design-form .msg').allTextContents();

  it('names boxes by their labels after a bad value in every box, never by a document path', async () => {
    await page.goto(served.url);
    await page.waitForFunction(() => document.querySelector('fw-app')?.hasAttribute('data-preview-build-id'), null, { timeout: 30_000 });
    expect(await pathsOnScreen('on opening')).toEqual([]);
    // every box there is: two bench points and the grower's own filament bring their boxes on screen
    await page.getByRole('button', { name: 'Add a bench point' }).click();
    await page.getByLabel('Tank height, point 1').fill('0.8');
    await page.getByLabel('Weight, point 1').fill('31');
    await page.getByRole('button', { name: 'Add a bench point' }).click();
    await page.getByLabel('Tank height, point 2').fill('2.1');
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
});
