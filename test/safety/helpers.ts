import { execFile, spawn } from 'node:child_process';
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = fileURLToPath(new URL('../..', import.meta.url));
export const BIN = join(ROOT, 'generator/cli/bin.js');

export function capture() {
  const io = { out$: '', err$: '', out: (t: string) => void (io.out$ += t), err: (t: string) => void (io.err$ += t) };
  return io;
}

/** A one-container plan (quick to build at preview quality). */
export const SMALL_PLAN = {
  name: 'test bench',
  tank: { fullSurfaceElevation: '2.2 m', lowSurfaceElevation: '1.8 m' },
  main: { innerDiameter: '8 mm' },
  containers: [{ name: 'tub', floorElevation: '0.3 m', level: '45 mm', branch: { length: '2 m', innerDiameter: '4 mm' } }],
};

export function writePlan(dir: string, plan: unknown = SMALL_PLAN): string {
  const path = join(dir, 'plan.json');
  writeFileSync(path, JSON.stringify(plan));
  return path;
}

/** Names and contents of a folder tree (folders as "folder"), to compare before and after. */
export function snapshot(dir: string): Record<string, string> {
  const out: Record<string, string> = {};
  const walk = (d: string, prefix: string) => {
    for (const name of readdirSync(d).sort()) {
      const path = join(d, name);
      if (statSync(path).isDirectory()) {
        out[`${prefix}${name}/`] = 'folder';
        walk(path, `${prefix}${name}/`);
      } else out[`${prefix}${name}`] = readFileSync(path).toString('base64');
    }
  };
  walk(dir, '');
  return out;
}

/** Run the command line as a grower does: a real process. */
export function floatwright(...args: string[]): Promise<{ status: number | null; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    execFile(process.execPath, [BIN, ...args], { cwd: ROOT, encoding: 'utf8', timeout: 120_000 }, (error, stdout, stderr) => {
      resolve({ status: error ? (typeof error.code === 'number' ? error.code : null) : 0, stdout, stderr });
    });
  });
}

/**
 * Start the command line and send it a signal once `whenExists` exists (the run's lock: the run is under way
 * and has its handlers), or after `fallbackMs` if it never appears. Status -1: ended by the signal itself.
 */
export function floatwrightStopped(args: string[], signal: NodeJS.Signals, whenExists: string, delayMs = 0, fallbackMs = 60_000): Promise<{ status: number | null; stderr: string; signalled: boolean }> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, [BIN, ...args], { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'] });
    let stderr = '';
    let signalled = false;
    child.stderr.on('data', (d) => (stderr += d));
    child.stdout.on('data', () => {});
    const send = () => {
      signalled = true;
      child.kill(signal);
    };
    const started = Date.now();
    const poll = setInterval(() => {
      if (existsSync(whenExists)) {
        clearInterval(poll);
        setTimeout(send, delayMs);
      } else if (Date.now() - started > fallbackMs) {
        clearInterval(poll);
        send();
      }
    }, 10);
    child.once('exit', (code, sig) => {
      clearInterval(poll);
      resolve({ status: code ?? (sig ? -1 : null), stderr, signalled });
    });
  });
}
