/**
 * Output folders (issue 11, items 1, 7 and 10): nothing floatwright did not
 * write is ever deleted, a link or a file given as the folder is never
 * replaced or followed, one writer at a time, debris of a killed run put right.
 * Exit statuses 0 / 2 / 1 as the command line documents them, 128 + signal
 * number for a signal (common practice for Unix tools; SIGINT 2, SIGTERM 15 in
 * POSIX signal.h, from memory). The lock is an O_EXCL file (POSIX open(2)).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, lstatSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../generator/cli/main.ts';
import { clearDebris } from '../../generator/cli/output/clear-debris.ts';
import { capture, snapshot, writePlan } from './helpers.ts';

const BUILD = ['--head-max', '2.2m', '--level', '45mm', '--quality', 'preview'];
const work = () => mkdtempSync(join(tmpdir(), 'fw-out-'));
const NOT_RAW = /\b(EACCES|ENOENT|EEXIST|ENOTDIR|EISDIR|ENOSPC|EROFS|errno)\b|^\s+at /m;

/** A process id that no longer runs (a finished child's). */
function deadPid(): number {
  return spawnSync(process.execPath, ['-e', 'process.stdout.write(String(process.pid))'], { encoding: 'utf8' }).stdout as unknown as number;
}

describe('--force replaces only an earlier floatwright output', () => {
  it('a folder of unrelated files (no marker), the plan file inside it: exit 2 naming the folder, nothing deleted', async () => {
    const dir = work();
    const out = join(dir, 'home');
    mkdirSync(out);
    writeFileSync(join(out, 'notes.txt'), 'my notes');
    const plan = writePlan(out);
    const before = snapshot(out);
    const io = capture();
    expect(await runCli(['plan', plan, '--out', out, '--force', '--quality', 'preview'], io)).toBe(2);
    expect(io.err$).toContain(out);
    expect(io.err$.replace(/\s+/g, ' ')).toMatch(/not made by floatwright .*nothing was deleted/);
    expect(snapshot(out)).toEqual(before);
  });

  it('an earlier plan output is replaced; once a file of the grower is added to it, --force refuses and names the file', async () => {
    const dir = work();
    const plan = writePlan(dir);
    const out = join(dir, 'bench');
    expect(await runCli(['plan', plan, '--out', out, '--quality', 'preview'], capture())).toBe(0);
    expect(readdirSync(out)).toContain('.floatwright-output');
    const marker = JSON.parse(readFileSync(join(out, '.floatwright-output'), 'utf8'));
    expect(marker.entries).toEqual(readdirSync(out).filter((n) => !n.startsWith('.')).sort());
    expect(await runCli(['plan', plan, '--out', out, '--force', '--quality', 'preview'], capture())).toBe(0);
    writeFileSync(join(out, 'photo.jpg'), 'not floatwright');
    const before = snapshot(out);
    const io = capture();
    expect(await runCli(['plan', plan, '--out', out, '--force', '--quality', 'preview'], io)).toBe(2);
    expect(io.err$.replace(/\s+/g, ' ')).toMatch(/"photo\.jpg".*nothing was deleted/);
    expect(snapshot(out)).toEqual(before);
    expect(readdirSync(dir).filter((n) => n.includes('partial'))).toEqual([]);
  }, 60_000);

  it.each(['plan', 'build'])('%s: a file given as --out is never replaced, with or without --force', async (command) => {
    const dir = work();
    const target = join(dir, 'important.txt');
    writeFileSync(target, 'keep me');
    for (const force of [[], ['--force']]) {
      if (command === 'build' && force.length) continue; // build has no --force
      const io = capture();
      const args = command === 'plan' ? ['plan', writePlan(dir), '--out', target, ...force, '--quality', 'preview'] : ['build', ...BUILD, '--out', target];
      expect(await runCli(args, io)).toBe(2);
      expect(io.err$.replace(/\s+/g, ' ')).toMatch(/is a file, not a folder; nothing was replaced/);
      expect(readFileSync(target, 'utf8')).toBe('keep me');
    }
  });

  it.each(['plan', 'build'])('%s: a symbolic link given as --out is refused; the link and what it points at are untouched', async (command) => {
    const dir = work();
    const real = join(dir, 'real');
    mkdirSync(real);
    writeFileSync(join(real, 'mine.txt'), 'keep me');
    const link = join(dir, 'link');
    symlinkSync(real, link);
    const io = capture();
    const args = command === 'plan' ? ['plan', writePlan(dir), '--out', link, '--force', '--quality', 'preview'] : ['build', ...BUILD, '--out', link];
    expect(await runCli(args, io)).toBe(2);
    expect(io.err$.replace(/\s+/g, ' ')).toMatch(/is a symbolic link/);
    expect(lstatSync(link).isSymbolicLink()).toBe(true);
    expect(snapshot(real)).toEqual({ 'mine.txt': Buffer.from('keep me').toString('base64') });
  });
});

describe('a failed run leaves no folder it made', () => {
  it('build: a folder name the disk refuses (too long) leaves none of the parents it made, and says so plainly', async () => {
    const dir = work();
    // 300 bytes: longer than the 255-byte name limit of common Linux file systems (from memory)
    const longOut = join(dir, 'a', 'b', 'y'.repeat(300));
    const io = capture();
    expect(await runCli(['build', ...BUILD, '--out', longOut], io)).toBe(2);
    expect(io.err$).toMatch(/too long for the file system/);
    expect(io.err$).not.toMatch(NOT_RAW);
    expect(readdirSync(dir)).toEqual([]);
  });

  it('plan: a plan refused after the folder was opened leaves no folder', async () => {
    const dir = work();
    const out = join(dir, 'new', 'bench');
    const bad = writePlan(dir, { tank: { fullSurfaceElevation: '2 m' }, main: { innerDiameter: '8 mm' }, containers: [{ name: 'a', floorElevation: '5 m', level: '45 mm' }] });
    expect(await runCli(['plan', bad, '--out', out], capture())).toBe(2);
    expect(readdirSync(dir)).toEqual(['plan.json']);
  });
});

describe('one writer at a time', () => {
  it.each(['plan', 'build'])('%s: a folder whose lock a live process holds is busy: exit 2, nothing changed', async (command) => {
    const dir = work();
    const out = join(dir, 'out');
    mkdirSync(out);
    writeFileSync(join(out, '.floatwright-output'), JSON.stringify({ entries: [] }));
    writeFileSync(join(out, '.floatwright-lock'), `${process.ppid}\n`); // the test runner's parent: alive
    const before = snapshot(out);
    const io = capture();
    const args = command === 'plan' ? ['plan', writePlan(dir), '--out', out, '--force', '--quality', 'preview'] : ['build', ...BUILD, '--out', out];
    expect(await runCli(args, io)).toBe(2);
    expect(io.err$.replace(/\s+/g, ' ')).toMatch(new RegExp(`"${out}" is busy: another floatwright run \\(process ${process.ppid}\\) is writing there`));
    expect(snapshot(out)).toEqual(before);
  });

  it('a lock left by a killed run (its process gone) is taken over; the lock is gone afterwards', async () => {
    const dir = work();
    const out = join(dir, 'out');
    mkdirSync(out);
    writeFileSync(join(out, '.floatwright-lock'), `${deadPid()}\n`);
    expect(await runCli(['build', ...BUILD, '--out', out], capture())).toBe(0);
    expect(readdirSync(out).filter((n) => n.startsWith('.'))).toEqual([]); // not made by this run: no marker added; lock released
  });
});

describe('debris of a killed run is put right by the next run', () => {
  it('an unfinished run (temporary files left): its backups are put back, its temporary files removed', async () => {
    const dir = work();
    writeFileSync(join(dir, '.v-housing.stl.123-abcd.bak'), 'earlier housing');
    writeFileSync(join(dir, 'v-housing.stl'), 'half-swapped new housing');
    writeFileSync(join(dir, '.v-plate.3mf.123-abcd.bak'), 'earlier plate'); // moved aside, new one not yet in
    writeFileSync(join(dir, '.v-float.stl.123-abcd.tmp'), 'partial');
    writeFileSync(join(dir, 'mine.txt'), 'unrelated');
    expect(await clearDebris(dir)).toEqual({ restored: 2, removed: 1 });
    expect(snapshot(dir)).toEqual({
      'mine.txt': Buffer.from('unrelated').toString('base64'),
      'v-housing.stl': Buffer.from('earlier housing').toString('base64'),
      'v-plate.3mf': Buffer.from('earlier plate').toString('base64'),
    });
  });

  it('a finished run (no temporary file left) only lost its backups: they are removed, the new files kept', async () => {
    const dir = work();
    writeFileSync(join(dir, '.v-housing.stl.9-ff.bak'), 'earlier');
    writeFileSync(join(dir, 'v-housing.stl'), 'new');
    expect(await clearDebris(dir)).toEqual({ restored: 0, removed: 1 });
    expect(readFileSync(join(dir, 'v-housing.stl'), 'utf8')).toBe('new');
  });

  it('build removes .tmp debris in its folder; plan removes .partial folders beside its folder and puts back an -old one', async () => {
    const dir = work();
    const out = join(dir, 'v');
    mkdirSync(out);
    writeFileSync(join(out, '.float-valve-housing.stl.77-0a.tmp'), 'partial');
    expect(await runCli(['build', ...BUILD, '--out', out], capture())).toBe(0);
    expect(readdirSync(out).filter((n) => n.endsWith('.tmp') || n.endsWith('.bak'))).toEqual([]);

    const plan = writePlan(dir);
    const bench = join(dir, 'bench');
    expect(await runCli(['plan', plan, '--out', bench, '--quality', 'preview'], capture())).toBe(0);
    const earlier = snapshot(bench);
    // a plan killed inside its swap: the earlier folder moved aside, the new one not yet in place
    const { renameSync } = await import('node:fs');
    renameSync(bench, join(dir, '.bench.partial-k1-old'));
    mkdirSync(join(dir, '.bench.partial-k1'));
    writeFileSync(join(dir, '.bench.partial-k1', '.floatwright-lock'), `${deadPid()}\n`);
    const io = capture();
    expect(await runCli(['plan', plan, '--out', bench, '--quality', 'preview'], io)).toBe(2); // the earlier output is back: not empty
    expect(io.err$).toMatch(/already holds files/);
    expect(snapshot(bench)).toEqual(earlier);
    expect(readdirSync(dir).filter((n) => n.includes('partial'))).toEqual([]);
  }, 60_000);
});
