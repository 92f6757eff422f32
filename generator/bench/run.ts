/**
 * `npm run bench` (`-- --json` for JSON): timings of the sizing and the
 * solids for one design (the rooftop-tubs preset), after warm-up, as medians:
 * sizing; each part's build at preview and export quality; the whole assembly
 * (all four parts); binary STL serialisation of the export parts; triangles
 * and STL bytes per part; the process's peak resident size
 * (process.resourceUsage().maxRSS) after the single-design export runs. If the
 * plan benchmark (plan-bench.ts) is there, its figures follow under "plan";
 * then the workbench in headless Chromium (browser-bench.ts; skip it with
 * `-- --no-browser`).
 *
 * Then issue 13's coverage grid (coverage-grid.ts): the heads and depths that
 * get a valve at 90 and 120 mm footprints, measured through parseDesign and sizeDesign,
 * with the time per cell (about
 * half a minute; skip it with `-- --no-coverage`).
 *
 * Targets (2-core machine): sizing at most 10 ms; assembly under 50 ms at preview and
 * under 1 s at export; peak memory of a single-design export run under 300 MB.
 * A benchmark, not a test: nothing here fails on time.
 */
import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { parseDesign } from '../doc/schema.ts';
import { sizeDesign } from '../sizing/size-design.ts';
import type { SizingSuccess } from '../sizing/result.ts';
import { buildPart, buildParts, PART_NAMES, type PartName } from '../solids/index.ts';
import { loadManifold, triangleCount, writeStlBinary, type Quality } from '../solids/mesh/index.ts';
import { runBrowserBench, type BrowserBench } from './browser-bench.ts';
import { coverageText, runCoverageGrid, type CoverageGrid } from './coverage-grid.ts';

const WARMUP = 3;
const RUNS = 15;
const PRESET = new URL('../../presets/rooftop-tubs.json', import.meta.url);

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return (s[(s.length - 1) >> 1] + s[s.length >> 1]) / 2;
}

async function timeMs(run: () => unknown, runs = RUNS): Promise<number> {
  for (let i = 0; i < WARMUP; i++) await run();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    await run();
    times.push(performance.now() - t0);
  }
  return median(times);
}

const round = (x: number, digits = 2) => Number(x.toFixed(digits));

export interface BenchResult {
  sizingMs: number;
  parts: Record<PartName, { previewMs: number; exportMs: number; triangles: number; previewTriangles: number; stlBytes: number }>;
  assembly: { previewMs: number; exportMs: number };
  stlMs: number;
  peakRssMb: number;
  plan?: unknown;
  browser?: BrowserBench | null;
  coverage?: CoverageGrid;
}

export async function runBench(): Promise<BenchResult> {
  const parsed = parseDesign(JSON.parse(readFileSync(fileURLToPath(PRESET), 'utf8')));
  if (!parsed.ok) throw new Error(`bench preset refused: ${JSON.stringify(parsed.errors)}`);
  const sizingMs = await timeMs(() => sizeDesign(parsed.inputs));
  const sized = sizeDesign(parsed.inputs);
  if (!sized.ok) throw new Error('bench preset could not be sized');
  const sizing: SizingSuccess = sized;
  await loadManifold();

  const parts = {} as BenchResult['parts'];
  for (const name of PART_NAMES) {
    const ms: Record<Quality, number> = { preview: 0, export: 0 };
    for (const quality of ['preview', 'export'] as const) ms[quality] = await timeMs(() => buildPart(name, sizing, { quality }));
    const exportMesh = await buildPart(name, sizing, { quality: 'export' });
    const previewMesh = await buildPart(name, sizing, { quality: 'preview' });
    parts[name] = {
      previewMs: round(ms.preview),
      exportMs: round(ms.export),
      triangles: triangleCount(exportMesh),
      previewTriangles: triangleCount(previewMesh),
      stlBytes: writeStlBinary(exportMesh).length,
    };
  }
  const assembly = {
    previewMs: round(await timeMs(() => buildParts(sizing, { quality: 'preview' }))),
    exportMs: round(await timeMs(() => buildParts(sizing, { quality: 'export' }))),
  };
  const exportParts = await buildParts(sizing, { quality: 'export' });
  const stlMs = await timeMs(() => PART_NAMES.map((name) => writeStlBinary(exportParts[name]!)));
  const peakRssMb = process.resourceUsage().maxRSS / 1024; // kilobytes on Linux and macOS

  const result: BenchResult = { sizingMs: round(sizingMs, 3), parts, assembly, stlMs: round(stlMs, 3), peakRssMb: round(peakRssMb, 1) };
  const planBench = new URL('./plan-bench.ts', import.meta.url);
  if (existsSync(fileURLToPath(planBench))) {
    const { runPlanBench } = (await import(planBench.href)) as { runPlanBench?: () => Promise<unknown> };
    if (typeof runPlanBench === 'function') result.plan = await runPlanBench();
  }
  if (!process.argv.includes('--no-browser')) result.browser = await runBrowserBench(() => undefined);
  if (!process.argv.includes('--no-coverage')) result.coverage = runCoverageGrid();
  return result;
}

function text(r: BenchResult): string {
  const lines = [
    'floatwright bench (rooftop-tubs preset; medians after warm-up; not a test)',
    '',
    `sizing                 ${r.sizingMs.toFixed(3)} ms   (target <= 10 ms)`,
    '',
    'part        preview ms  export ms  triangles (preview / export)  STL bytes (export)',
  ];
  for (const name of PART_NAMES) {
    const p = r.parts[name];
    lines.push(
      `${name.padEnd(10)} ${p.previewMs.toFixed(2).padStart(11)} ${p.exportMs.toFixed(2).padStart(10)}  ${`${p.previewTriangles} / ${p.triangles}`.padStart(28)}  ${String(p.stlBytes).padStart(18)}`,
    );
  }
  lines.push(
    `${'assembly'.padEnd(10)} ${r.assembly.previewMs.toFixed(2).padStart(11)} ${r.assembly.exportMs.toFixed(2).padStart(10)}   (targets: preview < 50 ms, export < 1000 ms)`,
    '',
    `STL serialisation, all export parts   ${r.stlMs.toFixed(3)} ms`,
    `peak resident size (single design)    ${r.peakRssMb.toFixed(1)} MB   (target < 300 MB)`,
  );
  if (r.plan) {
    const p = r.plan as { ms?: number; solveMs?: number; peakRssMb?: number; containers?: number; designs?: number; files?: number; threads?: number };
    lines.push(
      '',
      `plan, ${p.containers} containers / ${p.designs} designs at export quality on ${p.threads} threads`,
      `  whole run ${((p.ms ?? NaN) / 1000).toFixed(2)} s (solve ${((p.solveMs ?? NaN) / 1000).toFixed(2)} s), ${p.files} files   (target < 20 s)`,
      `  peak resident size ${(p.peakRssMb ?? NaN).toFixed(1)} MB   (target < 1 GB)`,
    );
  }
  if (r.browser) {
    lines.push('', `browser (headless Chromium, software rendering; bundle ${(r.browser.bundleKb / 1024).toFixed(2)} MB on disk)`);
    for (const v of r.browser.viewports) {
      lines.push(
        `  ${v.width} x ${v.height}: first view after load ${v.firstViewMs.toFixed(0)} ms (worker build ${v.firstBuildWorkerMs.toFixed(0)} ms; target < 400 ms);` +
          ` last keystroke to redrawn view median ${v.inputToRedrawMs.median.toFixed(0)} ms, p95 ${v.inputToRedrawMs.p95.toFixed(0)} ms over ${v.inputToRedrawMs.samples.length} edits (target p95 < 100 ms)`,
      );
    }
  } else if (r.browser === null) {
    lines.push('', 'browser: skipped (no /usr/bin/chromium)');
  }
  return `${lines.join('\n')}\n${r.coverage ? `\n${coverageText(r.coverage)}` : ''}`;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const r = await runBench();
  process.stdout.write(process.argv.includes('--json') ? `${JSON.stringify(r, null, 2)}\n` : text(r));
}
