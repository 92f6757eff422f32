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

/**
 * The seed every property draws from. `npm test` (and CI) uses one fixed seed so a
 * run is repeatable and the share of designs that build cannot wobble between runs;
 * the soak (`npm run soak`) draws a fresh seed for breadth. FUZZ_SEED=<n> replays a
 * failure; FUZZ_SEED=random draws a new seed (fast-check prints it on failure).
 */
export const FIXED_FUZZ_SEED = 20261204;

export function fuzzSeed(): number | undefined {
  const raw = process.env.FUZZ_SEED;
  if (raw === 'random') return undefined;
  const v = Number(raw);
  return raw !== undefined && Number.isInteger(v) ? v : FIXED_FUZZ_SEED;
}
