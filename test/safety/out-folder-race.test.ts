/**
 * Two runs that both find the output folder missing: the second one's mkdir
 * meets the folder the first just made (EEXIST, POSIX mkdir(2)). It must open
 * that folder as an existing one and be told "busy" by the first run's lock,
 * not fail with a vague file-system message. (Seen under load in
 * signals.test.ts "two builds started together"; here the race is forced.)
 */
import { mkdtempSync, mkdirSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import { openOutFolder } from '../../generator/cli/output/open-out-folder.ts';
import { FolderBusyError, takeLock } from '../../generator/cli/output/out-lock.ts';

const race = { path: '', release: undefined as undefined | (() => Promise<void>) };
vi.mock('node:fs/promises', async (importOriginal) => {
  const real = await importOriginal<typeof import('node:fs/promises')>();
  return {
    ...real,
    mkdir: async (...args: Parameters<typeof real.mkdir>) => {
      if (race.path && String(args[0]) === race.path) {
        // the other run gets there first: it makes the folder and takes its lock
        mkdirSync(race.path);
        race.release = await takeLock(race.path, 'other run');
        race.path = '';
      }
      return real.mkdir(...args);
    },
  };
});

describe('two runs making the same output folder at once', () => {
  it('the later one is told "busy" and removes nothing of the earlier one', async () => {
    const out = join(mkdtempSync(join(tmpdir(), 'fw-race-')), 'out');
    race.path = out;
    await expect(openOutFolder(out, { shownAs: 'out' })).rejects.toBeInstanceOf(FolderBusyError);
    expect(readdirSync(out)).toContain('.floatwright-lock');
    await race.release?.();
    // once the first run is done, the folder opens normally
    const opened = await openOutFolder(out, { shownAs: 'out' });
    expect(opened.created).toBe(false);
    await opened.finish([]);
  });
});
