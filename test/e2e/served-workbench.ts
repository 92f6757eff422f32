/**
 * The built workbench served by `vite preview` and a headless Chromium on it,
 * for the end-to-end test files (each file gets its own build, server and
 * browser profile, removed again by `close`). Also what the grower can read on
 * the page: every visible text, through the components' shadow roots.
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const CHROMIUM = '/usr/bin/chromium';
export const haveChromium = existsSync(CHROMIUM);
if (!haveChromium) {
  if (process.env.CI) throw new Error(`${CHROMIUM} is missing: CI must install Debian's chromium (apt-get install -y chromium) to run the browser tests.`);
  console.warn(`[e2e] SKIPPED: ${CHROMIUM} not found. Install it with: apt-get update && apt-get install -y chromium`);
}
export const ROOT = new URL('../..', import.meta.url).pathname;
/** screenshots land here (ignored by git): look at them after changing the screen */
export const SHOTS = join(ROOT, 'test-output');

export interface ServedWorkbench {
  url: string;
  context: BrowserContext;
  page: Page;
  close(): Promise<void>;
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

async function waitForServer(url: string, child: ChildProcess, timeoutMs: number): Promise<void> {
  const start = Date.now();
  for (;;) {
    if (child.exitCode !== null) throw new Error(`vite preview exited with ${child.exitCode}`);
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not up yet
    }
    if (Date.now() - start > timeoutMs) throw new Error(`vite preview did not answer at ${url}`);
    await new Promise((r) => setTimeout(r, 150));
  }
}

/**
 * Build the workbench into a temporary folder, serve it and open Chromium on a fresh profile.
 * `name`: a word for the temporary folders (default 'e2e'); the viewport starts at 1400 x 900.
 */
export async function serveWorkbench(name = 'e2e'): Promise<ServedWorkbench> {
  mkdirSync(SHOTS, { recursive: true });
  const outDir = mkdtempSync(join(tmpdir(), `fw-${name}-dist-`));
  const userDir = mkdtempSync(join(tmpdir(), `fw-${name}-chromium-`));
  let preview: ChildProcess | null = null;
  let context: BrowserContext | null = null;
  const close = async () => {
    await context?.close();
    preview?.kill();
    for (const dir of [outDir, userDir]) rmSync(dir, { recursive: true, force: true });
  };
  try {
    const vite = join(ROOT, 'node_modules/vite/bin/vite.js');
    const built = spawnSync(process.execPath, [vite, 'build', '--outDir', outDir, '--emptyOutDir', '--logLevel', 'warn'], { cwd: ROOT, encoding: 'utf8' });
    if (built.status !== 0) throw new Error(`vite build failed:\n${built.stdout}\n${built.stderr}`);
    const port = await freePort();
    preview = spawn(process.execPath, [vite, 'preview', '--outDir', outDir, '--port', String(port), '--strictPort', '--host', '127.0.0.1'], { cwd: ROOT, stdio: 'ignore' });
    const url = `http://127.0.0.1:${port}/`;
    await waitForServer(url, preview, 20_000);
    context = await chromium.launchPersistentContext(userDir, {
      executablePath: CHROMIUM,
      headless: true,
      acceptDownloads: true,
      viewport: { width: 1400, height: 900 },
      args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    });
    const page = context.pages()[0] ?? (await context.newPage());
    page.on('pageerror', (e) => console.error('[page error]', e.message));
    return { url, context, page, close };
  } catch (error) {
    await close();
    throw error;
  }
}

/**
 * Every text the grower can read on the page now: text of rendered elements (through open shadow roots;
 * folded, hidden and display:none parts left out) and tooltips (title attributes of rendered elements).
 */
export function visibleTexts(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const out: string[] = [];
    const walk = (root: Node) => {
      const walker = document.createTreeWalker(root, NodeFilter.SHOW_ELEMENT | NodeFilter.SHOW_TEXT);
      for (let node: Node | null = walker.currentNode; node; node = walker.nextNode()) {
        if (node.nodeType === Node.TEXT_NODE) {
          const text = (node as Text).data.trim();
          if (text && node.parentElement?.checkVisibility()) out.push(text);
          continue;
        }
        if (node.nodeType !== Node.ELEMENT_NODE) continue; // the shadow root itself
        const el = node as Element;
        const title = el.getAttribute('title');
        if (title && el.checkVisibility()) out.push(title);
        if (el.shadowRoot) walk(el.shadowRoot);
      }
    };
    walk(document.body);
    return out;
  });
}
