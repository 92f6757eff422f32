/**
 * A fault inside floatwright (not in the grower's input) on the command line:
 * exit status 1 with a one-line apology that says how to report it; the stack
 * trace only with --debug. Exit codes 0 / 2 / 1 as the command line documents
 * them (common practice for Unix tools). The fault is made by replacing the
 * sizing core with one that throws (vitest module mock).
 */
import { describe, expect, it, vi } from 'vitest';
import { runCli } from '../../generator/cli/main.ts';

vi.mock('../../generator/sizing/size-design.ts', () => ({
  sizeDesign: () => {
    throw new TypeError("Cannot read properties of undefined (reading 'boreMm')");
  },
}));

function capture() {
  const io = { out$: '', err$: '', out: (t: string) => void (io.out$ += t), err: (t: string) => void (io.err$ += t) };
  return io;
}

const ARGS = ['--head-max', '2.2m', '--level', '45mm'];

describe('an internal fault: exit 1, one line of apology, the stack only with --debug', () => {
  it.each(['size', 'build'])('%s', async (command) => {
    const extra = command === 'build' ? ['--out', '/tmp/fw-fault-never-written', '--quality', 'preview'] : [];
    const quiet = capture();
    expect(await runCli([command, ...ARGS, ...extra], quiet)).toBe(1);
    const lines = quiet.err$.trimEnd().split('\n');
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/^floatwright: sorry, something went wrong inside floatwright \(Cannot read properties of undefined/);
    expect(lines[0]).toMatch(/please report it/);
    expect(lines[0]).toMatch(/--debug/);
    expect(quiet.err$).not.toMatch(/^\s+at /m);

    const loud = capture();
    expect(await runCli([command, ...ARGS, ...extra, '--debug'], loud)).toBe(1);
    expect(loud.err$).toMatch(/^\s+at /m); // the stack, for the report
    expect(loud.err$.split('\n')[0]).toMatch(/sorry, something went wrong/);
  });

  it('bad input is still exit 2 (checked before the sizing core runs)', async () => {
    const io = capture();
    expect(await runCli(['size', '--head-max', '9m', '--level', '45mm'], io)).toBe(2);
    expect(io.err$).toMatch(/supply\.headMax/);
  });
});
