/**
 * One soak worker (property-based testing with fast-check, run long): for
 * each chunk `{ seed, count }` it is sent, it draws `count` designs from the
 * accepted input space with that seed and puts each through everything the
 * property tests check (see checks.ts for the sources: Archimedes,
 * hydrostatics, the orifice equation, manifold-3d as the independent mesh
 * check), plus one hostile mutation of the same document. Writes one JSON line
 * per chunk on stdout. Run by soak.ts; not part of `npm test`.
 */
import fc from 'fast-check';
import { createInterface } from 'node:readline';
import { parseDesign } from '../../generator/doc/schema.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import { assemblyTransforms, buildParts } from '../../generator/solids/index.ts';
import { loadManifold, type IndexedMesh } from '../../generator/solids/mesh/index.ts';
import { triangleBounds } from '../../generator/solids/part-caps.ts';
import { designSpec, junkValue, outsideValue, setPath, toDocument, type Mutation } from './arbitraries.ts';
import { calibrationMayBeRefused, onlyCalibrationRefused, checkAssembly, checkInfeasible, wayOutProblems, checkPartMeshes, checkSized, NON_FINITE_TEXT } from './checks.ts';

/** Preview builds slower than this are reported (issue 6: at most 2 s at preview quality). */
export const SLOW_BUILD_MS = 2000;

export interface ChunkResult {
  seed: number;
  count: number;
  refusedCalibration: number;
  sized: number;
  infeasible: number;
  built: number;
  mutationsRefused: number;
  maxSizeMs: number;
  maxBuildMs: number;
  maxTriangles: number;
  slowBuilds: number;
  failures: { seed: number; index: number; doc: unknown; problems: string[] }[];
}

/** The design space the soak draws from: mostly plausible designs, a third anywhere in the accepted space. */
export const soakSpec = () => fc.oneof({ weight: 2, arbitrary: designSpec({ plausible: true }) }, { weight: 1, arbitrary: designSpec() });

function mutationProblems(doc: Record<string, unknown>, m: Mutation): string[] {
  const bad = setPath(doc, m.field, m.value);
  let parsed;
  try {
    parsed = parseDesign(bad);
  } catch (error) {
    return [`mutation ${m.field} = ${String(m.value)}: parseDesign threw ${(error as Error).message}`];
  }
  if (parsed.ok) {
    // accepted: only "left out" (null in an optional field) or an underflow to 0 inside the range
    const fine = (m.value === null && m.field === 'supply.headMin') || (m.field === 'supply.tubeLength' && m.value === '1e-400 m');
    return fine ? [] : [`mutation ${m.field} = ${JSON.stringify(m.value)} was accepted`];
  }
  const mine = parsed.errors.filter((e) => e.field === m.field || e.field.startsWith(`${m.field}.`));
  if (!mine.length) return [`mutation ${m.field}: errors name ${parsed.errors.map((e) => e.field).join(', ')}`];
  const typed = typeof m.value === 'string' ? m.value : String(m.value);
  return mine
    .filter((e) => NON_FINITE_TEXT.test(e.message) && !/NaN|Infinity|undefined|object Object/.test(typed))
    .map((e) => `mutation ${m.field}: message shows a non-finite value: ${e.message}`);
}

export async function runChunk(seed: number, count: number): Promise<ChunkResult> {
  const wasm = await loadManifold();
  const r: ChunkResult = {
    seed, count, refusedCalibration: 0, sized: 0, infeasible: 0, built: 0, mutationsRefused: 0,
    maxSizeMs: 0, maxBuildMs: 0, maxTriangles: 0, slowBuilds: 0, failures: [],
  };
  const draws = fc.sample(fc.tuple(soakSpec(), fc.oneof(outsideValue(), junkValue())), { numRuns: count, seed });
  for (let index = 0; index < draws.length; index++) {
    const [spec, mutation] = draws[index];
    const doc = toDocument(spec);
    const problems: string[] = [];
    try {
      const parsed = parseDesign(doc);
      // the mutation is judged on a document that was good before it (random bench points may already be refused)
      const m = parsed.ok ? mutationProblems(doc, mutation) : [];
      if (m.length) problems.push(...m);
      else if (parsed.ok) r.mutationsRefused++;
      if (!parsed.ok) {
        const calibrationOnly = onlyCalibrationRefused(parsed.errors);
        const mayFall = calibrationMayBeRefused(spec, doc); // as the property test allows
        if (calibrationOnly && mayFall) r.refusedCalibration++;
        else problems.push(`accepted document refused: ${JSON.stringify(parsed.errors)}`);
      } else {
        const t0 = performance.now();
        const sizing = sizeDesign(parsed.inputs);
        r.maxSizeMs = Math.max(r.maxSizeMs, performance.now() - t0);
        if (!sizing.ok) {
          r.infeasible++;
          problems.push(...checkInfeasible(sizing));
          problems.push(...wayOutProblems(doc, sizing).problems); // every way out applies (issue 11)
          const level = sizing.waysOut.find((w) => w.field === 'level.target');
          if (level && Number.parseFloat(level.value) <= 250) {
            const foot = /together/.test(level.message) ? sizing.waysOut.find((w) => w.field === 'limits.maxOuterDiameter') : undefined;
            let moved = setPath(doc, 'level.target', level.value);
            if (foot) moved = setPath(moved, 'limits.maxOuterDiameter', foot.value);
            const again = parseDesign(moved);
            if (again.ok && !sizeDesign(again.inputs).ok) problems.push(`way out ${level.value}${foot ? ` with a ${foot.value} foot` : ''} does not size`);
          }
        } else {
          r.sized++;
          problems.push(...checkSized(parsed.inputs, sizing));
          const t1 = performance.now();
          const parts = (await buildParts(sizing, { quality: 'preview', withPad: true })) as unknown as Record<string, IndexedMesh>;
          const ms = performance.now() - t1;
          r.built++;
          r.maxBuildMs = Math.max(r.maxBuildMs, ms);
          if (ms > SLOW_BUILD_MS) {
            r.slowBuilds++;
            problems.push(`preview build took ${ms.toFixed(0)} ms (over ${SLOW_BUILD_MS} ms)`);
          }
          const bounds = triangleBounds(sizing, 'preview') as Record<string, number>;
          for (const [name, mesh] of Object.entries(parts)) {
            const n = mesh.indices.length / 3;
            r.maxTriangles = Math.max(r.maxTriangles, n);
            if (n > bounds[name]) problems.push(`${name}: ${n} triangles over the cap bound ${bounds[name]}`);
          }
          problems.push(...checkPartMeshes(wasm, parts));
          problems.push(...checkAssembly(wasm, sizing, parts, { rest: assemblyTransforms(sizing, 'rest'), seal: assemblyTransforms(sizing, 'seal') }));
        }
      }
    } catch (error) {
      problems.push(`threw: ${error instanceof Error ? error.stack ?? error.message : String(error)}`);
    }
    if (problems.length) r.failures.push({ seed, index, doc, problems });
  }
  return r;
}

// As a child of soak.ts: read `{ seed, count }` lines, answer with one ChunkResult line each.
if (process.argv.includes('--serve')) {
  const lines = createInterface({ input: process.stdin });
  for await (const line of lines) {
    if (!line.trim()) continue;
    const { seed, count } = JSON.parse(line) as { seed: number; count: number };
    process.stdout.write(`${JSON.stringify(await runChunk(seed, count))}\n`);
  }
}
