/**
 * File-system faults at random points of a build (issue 11): fast-check picks
 * the operation (write, rename, remove, make a folder), which call of it fails
 * and the POSIX errno (EIO, ENOSPC, EROFS, EACCES, ENAMETOOLONG, EEXIST, EBUSY).
 * Whatever fails, `build` exits 0 (the fault missed) or 2 with a plain message,
 * never 1, never the raw errno line; the folder then holds exactly the files of
 * the earlier run (all or nothing), with no temporary file, backup or lock left.
 * Faults are made by a vitest mock of node:fs/promises.
 */
import fc from 'fast-check';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import { runCli } from '../../generator/cli/main.ts';
import { fuzzSeed } from './budget.ts';

const fault = { op: '', at: -1, seen: 0, code: '' };
vi.mock('node:fs/promises', async (importOriginal) => {
  const real = await importOriginal<typeof import('node:fs/promises')>();
  const failing =
    <A extends unknown[], R>(op: string, fn: (...args: A) => Promise<R>) =>
    async (...args: A): Promise<R> => {
      if (fault.op === op && fault.seen++ === fault.at) throw Object.assign(new Error(`${fault.code}: injected, ${op} '${String(args[0])}'`), { code: fault.code });
      return fn(...args);
    };
  return { ...real, writeFile: failing('writeFile', real.writeFile), rename: failing('rename', real.rename), rm: failing('rm', real.rm), mkdir: failing('mkdir', real.mkdir) };
});

function capture() {
  const io = { out$: '', err$: '', out: (t: string) => void (io.out$ += t), err: (t: string) => void (io.err$ += t) };
  return io;
}

const DEBRIS = /\.(tmp|bak)$/;

/** The files of the folder, debris aside. */
function contents(dir: string): Record<string, string> {
  return Object.fromEntries(readdirSync(dir).filter((f) => !DEBRIS.test(f)).sort().map((f) => [f, readFileSync(join(dir, f)).toString('base64')]));
}

describe('random file-system faults during build (fast-check)', () => {
  it('exit 0 or 2, a plain message, the earlier files whole, no debris', async () => {
    const out = join(mkdtempSync(join(tmpdir(), 'fw-fsfuzz-')), 'v');
    const args = (level: number) => ['build', '--head-max', '2.2m', '--level', `${level}mm`, '--quality', 'preview', '--out', out];
    expect(await runCli(args(45), capture())).toBe(0);
    const tally = { runs: 0, hit: 0 };
    await fc.assert(
      fc.asyncProperty(
        fc.constantFrom('writeFile', 'rename', 'rm', 'mkdir'),
        fc.integer({ min: 0, max: 14 }),
        fc.constantFrom('EIO', 'ENOSPC', 'EROFS', 'EACCES', 'ENAMETOOLONG', 'EEXIST', 'EBUSY'),
        fc.integer({ min: 40, max: 80 }),
        async (op, at, code, level) => {
          const before = contents(out);
          Object.assign(fault, { op, at, seen: 0, code });
          const io = capture();
          let status: number;
          try {
            status = await runCli(args(level), io);
          } finally {
            fault.op = '';
          }
          tally.runs++;
          const names = readdirSync(out);
          // a backup or the lock whose removal failed is left (nothing can remove it then) for the next run to clear:
          // the lock is taken over once its process is gone, which the test plays by removing it; nothing else is left
          expect(names.filter((n) => (DEBRIS.test(n) || n === '.floatwright-lock') && !(op === 'rm' && (n.endsWith('.bak') || n === '.floatwright-lock')))).toEqual([]);
          rmSync(join(out, '.floatwright-lock'), { force: true });
          if (status === 0) return;
          tally.hit++;
          expect(status).toBe(2);
          expect(io.err$).not.toMatch(/injected|sorry|\bE[A-Z]{2,}\b:|^\s+at /m);
          expect(Object.keys(contents(out))).toEqual(Object.keys(before));
          expect(contents(out)).toEqual(before);
        },
      ),
      { numRuns: 30, seed: fuzzSeed() },
    );
    expect(tally.hit).toBeGreaterThan(0);
    // a clean run afterwards leaves no debris at all
    expect(await runCli(args(50), capture())).toBe(0);
    expect(readdirSync(out).filter((n) => n.startsWith('.'))).toEqual(['.floatwright-output']);
    console.info(`[fuzz] fs faults: ${JSON.stringify(tally)}`);
  }, 240_000);
});
