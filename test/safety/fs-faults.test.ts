/**
 * File-system faults while writing (issue 11, items 6, 9 and 10): a read-only
 * disk, a full disk, a name too long, permission refused, a lost race. Both
 * build and plan exit 2 (bad input or a design that cannot be written, as the
 * command line documents) with a plain sentence, never the raw errno line nor
 * the "fault in floatwright" apology, and leave no folder they made. Errno
 * names as POSIX errno.h defines them (EROFS, ENOSPC, ENAMETOOLONG, EACCES,
 * EEXIST). Faults are made by a vitest mock of node:fs/promises, since the
 * tests run as a user file permissions do not stop.
 * A FIFO given as the design or plan file is refused at once (POSIX: opening a
 * FIFO for reading blocks until a writer opens it).
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import { runCli } from '../../generator/cli/main.ts';
import { capture, writePlan } from './helpers.ts';

const fault = { op: '', code: '', match: /$^/ };
vi.mock('node:fs/promises', async (importOriginal) => {
  const real = await importOriginal<typeof import('node:fs/promises')>();
  const failing =
    <A extends unknown[], R>(op: string, fn: (...args: A) => Promise<R>) =>
    async (...args: A): Promise<R> => {
      if (fault.op === op && fault.match.test(String(args[0]))) {
        throw Object.assign(new Error(`${fault.code}: simulated, ${op} '${String(args[0])}'`), { code: fault.code, errno: -1, syscall: op });
      }
      return fn(...args);
    };
  return { ...real, writeFile: failing('writeFile', real.writeFile), rename: failing('rename', real.rename), mkdtemp: failing('mkdtemp', real.mkdtemp) };
});

const RAW = /\b(EROFS|ENOSPC|ENAMETOOLONG|EACCES|EEXIST|simulated)\b|^\s+at /m;
const BUILD = ['--head-max', '2.2m', '--level', '45mm', '--quality', 'preview'];

const CASES = [
  { code: 'EROFS', op: 'writeFile', match: /\.tmp$|plan-report|plate/, says: /read-only disk/ },
  { code: 'ENOSPC', op: 'writeFile', match: /\.tmp$|plan-report|plate/, says: /disk holding .* is full/ },
  { code: 'ENAMETOOLONG', op: 'writeFile', match: /\.tmp$|plan-report|plate/, says: /too long for the file system/ },
  { code: 'EACCES', op: 'writeFile', match: /\.tmp$|plan-report|plate/, says: /permission denied/ },
  { code: 'EEXIST', op: 'rename', match: /\.tmp$|partial-[^/]+$/, says: /something else changed/ },
];

describe.each(CASES)('$code on $op', ({ code, op, match, says }) => {
  it.each(['build', 'plan'])('%s: exit 2, a plain message, no folder left', async (command) => {
    const dir = mkdtempSync(join(tmpdir(), 'fw-fault-'));
    const plan = command === 'plan' ? writePlan(dir) : '';
    const out = join(dir, 'made', 'out');
    Object.assign(fault, { op, code, match });
    const io = capture();
    let status;
    try {
      status = await runCli(command === 'plan' ? ['plan', plan, '--out', out, '--quality', 'preview'] : ['build', ...BUILD, '--out', out], io);
    } finally {
      fault.op = '';
    }
    expect(status).toBe(2);
    expect(io.err$.replace(/\s+/g, ' ')).toMatch(says);
    expect(io.err$).not.toMatch(RAW);
    expect(io.err$).not.toMatch(/sorry/);
    expect(existsSync(join(dir, 'made'))).toBe(false);
    expect(readdirSync(dir)).toEqual(command === 'plan' ? ['plan.json'] : []);
  }, 60_000);
});

describe('a FIFO or a device as the input file is refused, never waited on', () => {
  it.each([
    ['size', '--design'],
    ['build', '--design'],
    ['plan', ''],
  ])('%s', async (command, flag) => {
    const dir = mkdtempSync(join(tmpdir(), 'fw-fifo-'));
    const fifo = join(dir, 'design.json');
    execFileSync('mkfifo', [fifo]);
    for (const path of [fifo, '/dev/zero']) {
      const io = capture();
      const args = command === 'plan' ? ['plan', path] : [command, flag, path, ...(command === 'build' ? ['--out', join(dir, 'out')] : [])];
      expect(await runCli(args, io)).toBe(2);
      expect(io.err$.replace(/\s+/g, ' ')).toMatch(/is not a regular file \(a pipe, a device or a socket\)/);
    }
    expect(existsSync(join(dir, 'out'))).toBe(false);
  });
});
