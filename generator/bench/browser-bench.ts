/**
 * The workbench's speed as a grower feels it, in Debian's headless Chromium
 * (software rendering: --disable-gpu, so SwiftShader draws the view):
 *
 * - first view after load: from the start of navigation to the first preview
 *   drawn, on a fresh profile (cold cache, cold WASM);
 * - last keystroke to redrawn view: the level box is retyped EDITS times, one
 *   key every 40 ms; each sample is the app's own figure (data-input-to-preview-ms:
 *   from the last keystroke to the preview drawn from a build that includes it).
 *
 * Each at 1400 x 900 and at 390 x 844. Medians and 95th percentiles (nearest
 * rank). A benchmark, not a test: nothing here fails on time. Returns null (with
 * a line saying why) where Chromium is missing.
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const CHROMIUM = '/usr/bin/chromium';
const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const EDITS = 20;
const VIEWPORTS = [
  { name: 'wide', width: 1400, height: 900 },
  { name: 'phone', width: 390, height: 844 },
] as const;
/** Levels typed in turn (mm): each one changes the design, so each needs a new build; all fit the rooftop preset at its 90 mm limit (the lowest it reaches is 44.8 mm). */
const LEVELS = ['51', '47', '53', '49', '55', '46', '52', '48', '45', '50'];

export interface BrowserViewportFigures {
  width: number;
  height: number;
  firstViewMs: number;
  /** worker's own time for the first build: sizing + preview parts */
  firstBuildWorkerMs: number;
  inputToRedrawMs: { median: number; p95: number; samples: number[] };
}

export interface BrowserBench {
  bundleKb: number;
  viewports: BrowserViewportFigures[];
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const port = (server.address() as { port: number }).port;
      server.close(() => resolve(port));
    });
  });
}

async function waitForServer(url: string, child: ChildProcess): Promise<void> {
  for (let i = 0; i < 200; i++) {
    if (child.exitCode !== null) throw new Error(`vite preview exited with ${child.exitCode}`);
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`vite preview did not answer at ${url}`);
}

/** Nearest-rank percentile (p in 0..100) of a non-empty list. */
export function percentile(values: readonly number[], p: number): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.max(0, Math.ceil((p / 100) * s.length) - 1))];
}

function bundleKb(dir: string): number {
  const du = spawnSync('du', ['-sk', dir], { encoding: 'utf8' });
  return Number(du.stdout.split(/\s/)[0]) || 0;
}

export async function runBrowserBench(log: (line: string) => void = console.log): Promise<BrowserBench | null> {
  if (!existsSync(CHROMIUM)) {
    log(`browser: skipped (${CHROMIUM} not found; apt-get install -y chromium)`);
    return null;
  }
  const { chromium } = await import('playwright-core');
  const outDir = mkdtempSync(join(tmpdir(), 'fw-bench-dist-'));
  const vite = join(ROOT, 'node_modules/vite/bin/vite.js');
  const built = spawnSync(process.execPath, [vite, 'build', '--outDir', outDir, '--emptyOutDir', '--logLevel', 'warn'], { cwd: ROOT, encoding: 'utf8' });
  if (built.status !== 0) throw new Error(`vite build failed:\n${built.stdout}\n${built.stderr}`);
  const port = await freePort();
  const preview = spawn(process.execPath, [vite, 'preview', '--outDir', outDir, '--port', String(port), '--strictPort', '--host', '127.0.0.1'], { cwd: ROOT, stdio: 'ignore' });
  const url = `http://127.0.0.1:${port}/`;
  const figures: BrowserViewportFigures[] = [];
  try {
    await waitForServer(url, preview);
    for (const vp of VIEWPORTS) {
      const userDir = mkdtempSync(join(tmpdir(), 'fw-bench-chromium-'));
      const context = await chromium.launchPersistentContext(userDir, {
        executablePath: CHROMIUM,
        headless: true,
        viewport: { width: vp.width, height: vp.height },
        args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
      });
      try {
        const page = context.pages()[0] ?? (await context.newPage());
        // the moment (ms since navigation start) the first preview is drawn
        await page.addInitScript(() => {
          const w = window as unknown as { __fwFirstView?: number };
          new MutationObserver((_, obs) => {
            const app = document.querySelector('fw-app');
            if (app?.hasAttribute('data-preview-build-id')) {
              w.__fwFirstView = performance.now();
              obs.disconnect();
            }
          }).observe(document, { subtree: true, attributes: true, attributeFilter: ['data-preview-build-id'] });
        });
        await page.goto(url);
        await page.waitForFunction(() => (window as unknown as { __fwFirstView?: number }).__fwFirstView !== undefined, null, { timeout: 30_000 });
        const firstViewMs = await page.evaluate(() => (window as unknown as { __fwFirstView: number }).__fwFirstView);
        const app = page.locator('fw-app');
        const firstBuildWorkerMs = Number(await app.getAttribute('data-size-ms')) + Number(await app.getAttribute('data-parts-ms'));
        const level = page.locator('input[name="level.target"]');
        const samples: number[] = [];
        for (let i = 0; i < EDITS; i++) {
          const value = LEVELS[i % LEVELS.length];
          const before = Number((await app.getAttribute('data-preview-build-id')) ?? 0);
          await level.fill('');
          await page.evaluate(() => document.querySelector('fw-app')!.removeAttribute('data-input-to-preview-ms'));
          await level.pressSequentially(value, { delay: 40 });
          await page.waitForFunction(
            (prev) => {
              const el = document.querySelector('fw-app')!;
              return el.hasAttribute('data-input-to-preview-ms') && Number(el.getAttribute('data-preview-build-id')) > prev;
            },
            before,
            { timeout: 30_000 },
          );
          samples.push(Number(await app.getAttribute('data-input-to-preview-ms')));
        }
        figures.push({
          width: vp.width,
          height: vp.height,
          firstViewMs,
          firstBuildWorkerMs,
          inputToRedrawMs: { median: percentile(samples, 50), p95: percentile(samples, 95), samples },
        });
      } finally {
        await context.close();
        rmSync(userDir, { recursive: true, force: true });
      }
    }
    return { bundleKb: bundleKb(outDir), viewports: figures };
  } finally {
    preview.kill();
    rmSync(outDir, { recursive: true, force: true });
  }
}
