/**
 * How many generated designs each property draws per `npm test` run (property
 * testing with fast-check; the soak runner draws far more). Override with
 * environment variables to dig deeper locally:
 *   FUZZ_SEED=123 FUZZ_SIZING_RUNS=2000 npx vitest run test/fuzz
 */
function count(name: string, fallback: number): number {
  const v = Number(process.env[name]);
  return Number.isInteger(v) && v > 0 ? v : fallback;
}

/** Designs sized per run (with the retargeted ones on top). */
export const SIZING_RUNS = count('FUZZ_SIZING_RUNS', 300);
/** Designs sized, built at preview quality and checked with manifold-3d per run. */
export const BUILD_RUNS = count('FUZZ_BUILD_RUNS', 120);
/** Hostile documents (one field out of range or junk) per run. */
export const REJECT_RUNS = count('FUZZ_REJECT_RUNS', 400);

/** A fixed seed to replay a failure (FUZZ_SEED), else fast-check draws one and prints it on failure. */
export function fuzzSeed(): number | undefined {
  const v = Number(process.env.FUZZ_SEED);
  return process.env.FUZZ_SEED !== undefined && Number.isInteger(v) ? v : undefined;
}
