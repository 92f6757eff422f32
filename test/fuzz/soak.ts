/**
 * The long fuzz run (`npm run soak`, not part of `npm test` or CI): draws
 * 10,000 designs (property-based testing with fast-check) and puts each
 * through every check of the property tests: parse, size or say why, the
 * sizing invariants, the way out applied, a preview build checked by
 * manifold-3d, the assembly without overlaps, the triangle bound, and one
 * hostile mutation refused with the field named. Work is split into chunks of
 * CHUNK designs, chunk k drawn with seed base + k, spread over one child
 * process per core.
 *
 * Usage: npm run soak [-- --designs 10000 --seed 1234 --workers 2]
 * Replay one failure: npm run soak -- --seed <chunk seed> --designs <chunk size> --workers 1
 * Writes test-output/soak-<base seed>.json (summary and every failure) and
 * exits 1 if any design failed.
 */
import { spawn } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { join } from 'node:path';
import { createInterface } from 'node:readline';
import { fileURLToPath } from 'node:url';
import type { ChunkResult } from './soak-worker.ts';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const WORKER = fileURLToPath(new URL('./soak-worker.ts', import.meta.url));
const CHUNK = 250;

function option(name: string, fallback: number): number {
  const i = process.argv.indexOf(`--${name}`);
  const v = i >= 0 ? Number(process.argv[i + 1]) : Number.NaN;
  return Number.isInteger(v) ? v : fallback;
}

const designs = option('designs', 10_000);
const baseSeed = option('seed', Number(process.env.FUZZ_SEED ?? Math.floor(Math.random() * 2 ** 31)));
const workers = Math.max(1, option('workers', availableParallelism()));
const chunks = Array.from({ length: Math.ceil(designs / CHUNK) }, (_, k) => ({ seed: baseSeed + k, count: Math.min(CHUNK, designs - k * CHUNK) }));

const started = performance.now();
const results: ChunkResult[] = [];
let next = 0;

/** One child process that takes chunks until none are left. */
function runWorker(): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ['--import', 'tsx', WORKER, '--serve'], { cwd: ROOT, stdio: ['pipe', 'pipe', 'inherit'] });
    const feed = () => {
      if (next >= chunks.length) return child.stdin.end();
      child.stdin.write(`${JSON.stringify(chunks[next++])}\n`);
    };
    createInterface({ input: child.stdout }).on('line', (line) => {
      const r = JSON.parse(line) as ChunkResult;
      results.push(r);
      const done = results.reduce((n, c) => n + c.count, 0);
      const failed = results.reduce((n, c) => n + c.failures.length, 0);
      process.stderr.write(`soak: ${done}/${designs} designs, ${failed} failing, ${((performance.now() - started) / 1000).toFixed(0)} s\n`);
      feed();
    });
    child.on('error', reject);
    child.on('exit', (code) => (code === 0 ? resolve() : reject(new Error(`soak worker exited with ${code}`))));
    feed();
  });
}

await Promise.all(Array.from({ length: Math.min(workers, chunks.length) }, runWorker));

const sum = (key: keyof ChunkResult) => results.reduce((n, r) => n + (r[key] as number), 0);
const max = (key: keyof ChunkResult) => results.reduce((n, r) => Math.max(n, r[key] as number), 0);
const failures = results.flatMap((r) => r.failures);
const summary = {
  designs: sum('count'),
  seeds: `${baseSeed} to ${baseSeed + chunks.length - 1} (${CHUNK} designs each)`,
  workers,
  seconds: Math.round((performance.now() - started) / 1000),
  sized: sum('sized'),
  built: sum('built'),
  infeasible: sum('infeasible'),
  refusedCalibration: sum('refusedCalibration'),
  mutationsRefused: sum('mutationsRefused'),
  maxSizeMs: Math.round(max('maxSizeMs')),
  maxBuildMs: Math.round(max('maxBuildMs')),
  slowBuilds: sum('slowBuilds'),
  maxTriangles: max('maxTriangles'),
  failing: failures.length,
};
mkdirSync(join(ROOT, 'test-output'), { recursive: true });
const report = join(ROOT, 'test-output', `soak-${baseSeed}.json`);
writeFileSync(report, `${JSON.stringify({ summary, failures }, null, 2)}\n`);
console.log(JSON.stringify(summary, null, 2));
for (const f of failures.slice(0, 10)) console.log(`FAIL seed ${f.seed} #${f.index}: ${f.problems.join(' | ')}\n  ${JSON.stringify(f.doc)}`);
console.log(`report: ${report}`);
process.exitCode = failures.length ? 1 : 0;
