// @vitest-environment happy-dom
/**
 * The bench page's pieces: its boxes and their labels, the plan kept as
 * typed, units rewritten (NIST SP 811: the foot is exactly 0.3048 m, the inch
 * 25.4 mm), and the page itself in a DOM with the bench worker's code run in
 * place of a worker. Every input has a label tied to it (WCAG 2.2 SC 1.3.1 /
 * 4.1.2, source: W3C); the starving rule is the plan's own (shared flow below
 * half the flow alone; generator/plan/plan-network.ts).
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { parsePlan, solvePlan } from '../../generator/plan/index.ts';
import { benchInLabels, benchLabelFor, benchValue, convertPlan, GROUP_FIELDS, setPlanAt, TANK_FIELDS } from '../../viewer/lib/bench-fields.ts';
import { BENCH_KEY, isPlanDocument, loadBench, saveBench } from '../../viewer/lib/bench-storage.ts';
import { benchView, solveBench } from '../../viewer/worker/bench-solve.ts';
import type { BenchReply, BenchRequest } from '../../viewer/worker/bench-protocol.ts';
import type { FwBenchPage } from '../../viewer/components/fw-bench-page.ts';
import '../../viewer/components/fw-bench-page.ts';

const PRESET = JSON.parse(readFileSync(join(process.cwd(), 'presets/plan-rooftop-shelf.json'), 'utf8')) as Record<string, unknown>;
const field = (path: string) => [...TANK_FIELDS, ...GROUP_FIELDS].find((f) => f.path === path)!;

describe('bench boxes', () => {
  it('writes a bare number in the shown unit and leaves a typed unit alone', () => {
    expect(benchValue('1.2', field('floorElevation'), 'metric')).toBe('1.2 m');
    expect(benchValue('4', field('floorElevation'), 'imperial')).toBe('4 ft');
    expect(benchValue('30 cm', field('floorElevation'), 'metric')).toBe('30 cm');
    expect(benchValue('3', field('count'), 'metric')).toBe(3);
    expect(benchValue('  ', field('reservoirArea'), 'metric')).toBeUndefined();
  });

  it('sets a group\'s value in place, keeping the groups a list', () => {
    const next = setPlanAt(PRESET, 'containers.1.branch.length', '2 m');
    expect(Array.isArray(next.containers)).toBe(true);
    expect((next.containers as { branch: { length: string } }[])[1]!.branch.length).toBe('2 m');
    expect((PRESET.containers as { branch: { length: string } }[])[1]!.branch.length).toBe('1.6 m'); // the original untouched
    const cleared = setPlanAt(next, 'containers.0.design.container.demand', undefined);
    expect((cleared.containers as unknown[]).length).toBe(4);
  });

  it('rewrites the boxes in feet and inches and back (NIST SP 811), rounded as the valve page rounds', () => {
    const imperial = convertPlan(PRESET, 'imperial');
    expect((imperial.tank as { fullSurfaceElevation: string }).fullSurfaceElevation).toBe('8.86 ft'); // 2.7 / 0.3048 = 8.858
    expect((imperial.main as { innerDiameter: string }).innerDiameter).toBe('0.276 in'); // 7 / 25.4 = 0.2756
    // converted again (after an edit; with none the page puts back the exact values): 8.86 x 0.3048 = 2.7005 m
    const back = convertPlan(imperial, 'metric');
    expect((back.tank as { fullSurfaceElevation: string }).fullSurfaceElevation).toBe('2.701 m');
    expect(parsePlan(imperial).ok).toBe(true);
  });

  it('names every problem by its box, never by a plan path', () => {
    const bad = setPlanAt(setPlanAt(PRESET, 'containers.2.floorElevation', 'abc'), 'tank.lowSurfaceElevation', '9 m');
    const parsed = parsePlan(bad);
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    const shown = parsed.errors.map((e) => `${benchLabelFor(e.field, bad)}: ${benchInLabels(e.message, bad)}`);
    expect(shown.some((s) => s.startsWith('Floor height of "bottom tier"'))).toBe(true);
    expect(shown.some((s) => s.startsWith('Tank water surface, low'))).toBe(true);
    for (const s of shown) expect(s).not.toMatch(/containers\.\d|tank\.[a-z]|fullSurfaceElevation|floorElevation/);
  });

  it('tells a plan from a valve design', () => {
    expect(isPlanDocument(PRESET)).toBe(true);
    expect(isPlanDocument({ supply: { headMax: '2 m' } })).toBe(false);
    expect(isPlanDocument([1])).toBe(false);
  });
});

describe('bench solve (the worker\'s code)', () => {
  it('gives what generator/plan gives, group by group', () => {
    const solved = solveBench(PRESET);
    expect(solved.ok).toBe(true);
    if (!solved.ok) return;
    const direct = solvePlan((parsePlan(PRESET) as { ok: true; plan: never }).plan);
    if (!direct.ok) throw new Error('preset does not solve');
    const view = benchView(solved.result);
    expect(view.groups.map((g) => [g.name, g.starving, g.design])).toEqual(direct.result.containers.map((c) => [c.name, c.starving, c.design]));
    for (const g of view.groups) {
      const c = direct.result.containers.find((k) => k.index === g.index)!;
      expect(g.sharedFullLph).toBeCloseTo(c.sharedFull.flowLph, 9);
      // the starving rule: below half its own flow with every valve open (plan-network.ts)
      expect(g.starving).toBe(g.sharedFullLph < 0.5 * g.aloneFullLph || g.sharedLowLph < 0.5 * g.aloneLowLph);
      expect((g.valveDoc.supply as { headMax: string }).headMax).toMatch(/ m$/);
      expect(g.valveDoc.name).toBe(g.name);
    }
  });
});

describe('a deep group on the bench', () => {
  // issue 13: each container gets its own choice; a deep one hangs from its rim when the row gives the rim height
  it('a 250 mm group gets no valve on the floor, and a lever hung from the rim once its Rim height box says 360 mm', () => {
    const deep = setPlanAt(setPlanAt(PRESET, 'containers.0.level', '250 mm'), 'containers.0.design.container.rimHeight', undefined);
    const without = solveBench(deep);
    if (!without.ok) throw new Error(JSON.stringify(without.errors));
    // the bench still solves; that group's valve has no size (too tall for a part standing on the floor)
    const noFit = benchView(without.result).groups.find((g) => g.index === 0)!;
    expect(noFit.noFit.length).toBeGreaterThan(0);
    const withRim = solveBench(setPlanAt(deep, 'containers.0.design.container.rimHeight', benchValue('360', GROUP_FIELDS.find((f) => f.path === 'design.container.rimHeight')!, 'metric')));
    expect(withRim.ok).toBe(true);
    if (!withRim.ok) return;
    const sized = withRim.result.containers.find((c) => c.index === 0)!.sizing;
    expect(sized.ok && [sized.architecture, sized.mount]).toEqual(['lever', 'rim']);
    // a rim under the level is named by the box's label
    const low = solveBench(setPlanAt(deep, 'containers.0.design.container.rimHeight', '200 mm'));
    expect(low.ok).toBe(false);
    if (low.ok) return;
    const said = low.errors.map((e) => `${benchLabelFor(e.field, deep)}: ${benchInLabels(e.message, deep)}`).join(' ');
    expect(said).toMatch(/Rim height/);
    expect(said).not.toMatch(/containers\.\d|container\.rimHeight|level\.target/);
  });
});

/** A stand-in for the bench worker: the worker's own code, answered on the next turn. */
class InPlaceWorker {
  onmessage: ((e: MessageEvent<BenchReply>) => void) | null = null;
  onerror: ((e: ErrorEvent) => void) | null = null;
  postMessage(req: BenchRequest): void {
    setTimeout(() => {
      const s = solveBench(req.plan);
      const reply: BenchReply = s.ok ? { type: 'planned', id: req.id, ok: true, solved: benchView(s.result), solveMs: 0 } : { type: 'planned', id: req.id, ok: false, errors: s.errors, solveMs: 0 };
      this.onmessage?.({ data: reply } as MessageEvent<BenchReply>);
    }, 0);
  }
  terminate(): void {}
}

async function settled(page: FwBenchPage): Promise<void> {
  await new Promise<void>((resolve) => page.addEventListener('bench-settled', () => resolve(), { once: true }));
  await page.updateComplete;
}

describe('fw-bench-page', () => {
  afterEach(() => {
    document.body.innerHTML = '';
    localStorage.clear();
  });

  async function mountPage(): Promise<FwBenchPage> {
    const page = document.createElement('fw-bench-page') as FwBenchPage;
    page.workerFactory = () => new InPlaceWorker() as unknown as Worker;
    page.starter = PRESET;
    const done = settled(page);
    document.body.append(page);
    await done;
    return page;
  }

  it('starts from the plan preset, labels every box, and flags the starving groups in words', async () => {
    const page = await mountPage();
    const root = page.shadowRoot!;
    const inputs = [...root.querySelectorAll('input[data-field]')] as HTMLInputElement[];
    expect(inputs.length).toBe(1 + 3 + 4 * GROUP_FIELDS.length); // the bench name, the tank and main, four groups
    for (const input of inputs) expect(input.closest('label'), input.dataset.field).not.toBeNull();
    expect((root.querySelector('textarea[data-field="notes"]') as HTMLTextAreaElement).value).toContain('200 L tank'); // the preset's notes on show
    const flagged = [...root.querySelectorAll('[data-starving]')].map((p) => p.textContent ?? '');
    expect(flagged.length).toBeGreaterThan(0);
    for (const text of flagged) expect(text).toMatch(/^Starves: gets \d+ % of its own flow/);
    expect(root.querySelectorAll('[data-result-group]').length).toBe(4);
  });

  it('keeps every keystroke in the browser, errors and all, and sends a group\'s valve up', async () => {
    const page = await mountPage();
    const root = page.shadowRoot!;
    const floor = root.querySelector('input[data-field="containers.0.floorElevation"]') as HTMLInputElement;
    const done = settled(page);
    floor.value = 'abc';
    floor.dispatchEvent(new Event('input'));
    expect((loadBench(localStorage)!.containers as { floorElevation: string }[])[0]!.floorElevation).toBe('abc');
    await done;
    expect(root.querySelector('[data-problems]')!.textContent).toContain('Floor height of "top tier"');
    expect((root.querySelector('[data-export-zip]') as HTMLButtonElement).disabled).toBe(true);
    expect(localStorage.getItem(BENCH_KEY)).toContain('abc');
    let sent: unknown = null;
    page.addEventListener('open-valve', (e) => (sent = (e as CustomEvent).detail));
    (root.querySelector('[data-open-valve="1"]') as HTMLButtonElement).click();
    expect((sent as { name: string }).name).toBe('middle tier');
  });

  it('adds a group as a copy of the last, unfolded, its floor height box focused', async () => {
    const page = await mountPage();
    const root = page.shadowRoot!;
    const done = settled(page);
    (root.querySelector('[data-add-group]') as HTMLButtonElement).click();
    await page.updateComplete;
    await page.updateComplete;
    expect((root.querySelector('details[data-group="4"]') as HTMLDetailsElement).open).toBe(true);
    expect((root.activeElement as HTMLInputElement | null)?.dataset.field).toBe('containers.4.floorElevation');
    await done;
    expect(root.querySelectorAll('[data-result-group]').length).toBe(5);
  });

  it('opens a kept bench before the preset', async () => {
    saveBench(localStorage, { ...PRESET, containers: (PRESET.containers as unknown[]).slice(0, 1) });
    const page = await mountPage();
    expect(page.shadowRoot!.querySelectorAll('[data-result-group]').length).toBe(1);
  });
});
