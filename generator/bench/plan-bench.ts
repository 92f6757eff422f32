/**
 * The plan part of `npm run bench`: a bench of 50 containers in 10 distinct
 * designs (ten shelf heights, five identical tubs on each), planned and built
 * at export quality into a temporary folder (design folders, plate set,
 * report), on this thread and worker threads as `floatwright plan` does.
 * Targets (issue 5): under 20 s on 2 cores and under 1 GB peak memory.
 * A benchmark, not a test: nothing here fails on time.
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { availableParallelism, tmpdir } from 'node:os';
import { join } from 'node:path';
import { writePlanFolder } from '../cli/commands/plan.ts';
import { startBuildPool } from '../cli/plan/build-designs.ts';
import { parsePlan } from '../plan/schema.ts';
import { solvePlan } from '../plan/solve-plan.ts';

/** 50 rows of one tub each: 10 floor heights x 5 tubs, each height a distinct valve. */
export function benchPlanDocument(): unknown {
  const containers = [];
  for (let tier = 0; tier < 10; tier++) {
    for (let k = 0; k < 5; k++) {
      containers.push({
        name: `tier ${tier + 1} tub ${k + 1}`,
        floorElevation: `${(0.15 * tier).toFixed(2)} m`,
        level: `${35 + 2 * tier} mm`,
        mainLength: `${(1 + 0.6 * (5 * tier + k)).toFixed(1)} m`,
        branch: { length: '1.5 m', innerDiameter: '4 mm' },
        reservoirArea: '0.08 m2',
      });
    }
  }
  return {
    name: 'bench: 50 containers, 10 designs',
    tank: { fullSurfaceElevation: '2.9 m', lowSurfaceElevation: '2.4 m' },
    main: { innerDiameter: '12 mm' },
    design: { print: { material: 'PETG', wall: '2.7 mm' }, reservoir: { rise: '20 mm' } },
    containers,
  };
}

export interface PlanBenchResult {
  /** wall time: parse, solve, build and write every file, ms */
  ms: number;
  /** solve alone (tip elevations, sizing, network), ms */
  solveMs: number;
  /** highest resident set size sampled every 20 ms during the run (main thread and workers share the process), MB */
  peakRssMb: number;
  /** the process's lifetime peak RSS as the OS reports it (includes anything run before), MB */
  maxRssMb: number;
  containers: number;
  designs: number;
  files: number;
  triangles: number;
  threads: number;
}

export async function runPlanBench(options: { threads?: number } = {}): Promise<PlanBenchResult> {
  let peak = process.memoryUsage().rss;
  const sampler = setInterval(() => {
    peak = Math.max(peak, process.memoryUsage().rss);
  }, 20);
  const dir = await mkdtemp(join(tmpdir(), 'floatwright-plan-bench-'));
  const t0 = performance.now();
  // As the command does: the workers warm up while the plan is solved.
  const threads = options.threads ?? availableParallelism();
  const pool = threads > 1 ? startBuildPool(threads - 1) : undefined;
  try {
    const parsed = parsePlan(benchPlanDocument());
    if (!parsed.ok) throw new Error(`bench plan refused: ${JSON.stringify(parsed.errors)}`);
    const solved = solvePlan(parsed.plan);
    if (!solved.ok || !solved.result.ok) throw new Error('bench plan could not be sized');
    const solveMs = performance.now() - t0;
    const built = await writePlanFolder({
      result: solved.result,
      out: join(dir, 'bench'),
      quality: 'export',
      ...(pool ? { pool } : { threads: 1 }),
    });
    const ms = performance.now() - t0;
    peak = Math.max(peak, process.memoryUsage().rss);
    return {
      ms,
      solveMs,
      peakRssMb: peak / 2 ** 20,
      maxRssMb: process.resourceUsage().maxRSS / 1024,
      containers: solved.result.containers.length,
      designs: solved.result.designs.length,
      files: Object.values(built.files).reduce((n, f) => n + f.length, 0) + built.plates.length + 3,
      triangles: built.triangles,
      threads: built.threads,
    };
  } finally {
    clearInterval(sampler);
    await pool?.close();
    await rm(dir, { recursive: true, force: true });
  }
}

// Run on its own: npx tsx generator/bench/plan-bench.ts
if (import.meta.url === `file://${process.argv[1]}`) {
  const r = await runPlanBench();
  console.log(JSON.stringify({ ...r, ms: Math.round(r.ms), solveMs: Math.round(r.solveMs), peakRssMb: Math.round(r.peakRssMb), maxRssMb: Math.round(r.maxRssMb) }));
}
