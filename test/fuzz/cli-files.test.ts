/**
 * Output files are written under temporary names and renamed when complete:
 * an interrupted or failed run never leaves a truncated STL or report, and
 * never loses the files an earlier run wrote. STL sizes checked against the
 * binary STL layout (80-byte header, 4-byte count, 50 bytes a triangle: the
 * format's common definition, from memory). The rename failure is made with a
 * vitest mock of node:fs/promises that fails one chosen rename.
 */
import { spawn } from 'node:child_process';
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it, vi } from 'vitest';
import { runCli } from '../../generator/cli/main.ts';

const failRename = { at: -1, count: 0 };
vi.mock('node:fs/promises', async (importOriginal) => {
  const real = await importOriginal<typeof import('node:fs/promises')>();
  return {
    ...real,
    rename: async (from: string, to: string) => {
      if (failRename.at >= 0 && failRename.count++ === failRename.at) {
        throw Object.assign(new Error(`EIO: i/o error, rename '${from}' -> '${to}'`), { code: 'EIO' });
      }
      return real.rename(from, to);
    },
  };
});

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const BIN = join(ROOT, 'generator/cli/bin.js');
const ARGS = ['--head-max', '2.2m', '--level', '45mm', '--quality', 'preview'];

function capture() {
  const io = { out$: '', err$: '', out: (t: string) => void (io.out$ += t), err: (t: string) => void (io.err$ += t) };
  return io;
}

/** Every STL in the folder is whole: 84 + 50 n bytes for the n its header announces. */
function stlsComplete(dir: string): void {
  for (const f of readdirSync(dir).filter((f) => f.endsWith('.stl') && !f.startsWith('.'))) {
    const bytes = readFileSync(join(dir, f));
    expect(bytes.length, f).toBe(84 + 50 * bytes.readUInt32LE(80));
  }
}

function snapshot(dir: string): Record<string, string> {
  return Object.fromEntries(
    readdirSync(dir)
      .sort()
      .map((f) => [f, statSync(join(dir, f)).isFile() ? readFileSync(join(dir, f)).toString('base64').slice(0, 64) + statSync(join(dir, f)).size : 'folder']),
  );
}

describe('floatwright build writes temp names and renames them, losing nothing on failure', () => {
  it('a good run leaves only the finished files, every STL whole', async () => {
    const out = join(mkdtempSync(join(tmpdir(), 'fw-files-')), 'v');
    expect(await runCli(['build', ...ARGS, '--out', out], capture())).toBe(0);
    const names = readdirSync(out);
    expect(names.filter((n) => n.startsWith('.'))).toEqual(['.floatwright-output']); // the marker of a folder floatwright made; no temporary file
    expect(names.filter((n) => n.endsWith('.stl'))).toHaveLength(4);
    stlsComplete(out);
  });

  it('a re-run that fails half way through the renames puts the earlier files back', async () => {
    const out = join(mkdtempSync(join(tmpdir(), 'fw-files-')), 'v');
    expect(await runCli(['build', ...ARGS, '--out', out], capture())).toBe(0);
    const before = snapshot(out);
    // the second run, at another level, fails on its fifth rename (after some files were replaced)
    failRename.at = 4;
    failRename.count = 0;
    const io = capture();
    const status = await runCli(['build', '--head-max', '2.2m', '--level', '60mm', '--quality', 'preview', '--out', out], io);
    failRename.at = -1;
    expect(status).toBe(2);
    expect(io.err$).toMatch(/none were written/);
    expect(io.err$).not.toMatch(/^\s+at /m);
    expect(snapshot(out)).toEqual(before);
  });

  it('something other than a file in the way: refused before anything is replaced', async () => {
    const out = join(mkdtempSync(join(tmpdir(), 'fw-files-')), 'v');
    expect(await runCli(['build', ...ARGS, '--out', out], capture())).toBe(0);
    const sheet = readdirSync(out).find((f) => f.endsWith('.html'))!;
    const { rmSync } = await import('node:fs');
    rmSync(join(out, sheet));
    mkdirSync(join(out, sheet));
    const before = snapshot(out);
    const io = capture();
    expect(await runCli(['build', ...ARGS, '--out', out], io)).toBe(2);
    expect(io.err$).toMatch(/not a file/);
    expect(snapshot(out)).toEqual(before);
  });

  it('a run killed part way never leaves a truncated STL under a final name', async () => {
    const out = join(mkdtempSync(join(tmpdir(), 'fw-files-')), 'v');
    for (const delayMs of [400, 900, 1500]) {
      const child = spawn(process.execPath, [BIN, 'build', '--head-max', '2.2m', '--level', '45mm', '--out', out], { cwd: ROOT, stdio: 'ignore' });
      const exited = new Promise((r) => child.once('exit', r));
      await new Promise((r) => setTimeout(r, delayMs));
      child.kill('SIGKILL');
      await exited;
      try {
        stlsComplete(out);
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code !== 'ENOENT') throw error;
      }
    }
  }, 60_000);
});
