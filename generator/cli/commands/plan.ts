/**
 * `floatwright plan FILE [--out DIR]`: size every valve of a bench plan (one
 * tank, one main, many containers at their own heights), group identical
 * valves, solve the supply with every valve open, and write a folder per
 * design plus the plan report. Files are written into a temporary folder next
 * to DIR and renamed into place only when everything is written.
 */
import { printBedMm } from '../../sizing/parts/print-bed.ts';
import { mkdtemp, readdir, rename, rm, writeFile } from 'node:fs/promises';
import { availableParallelism } from 'node:os';
import { basename, dirname, join } from 'node:path';
import type { FieldError } from '../../doc/fields.ts';
import { ROOT_FIELD } from '../../doc/fields.ts';
import { fileStem } from '../../doc/file-stem.ts';
import { parsePlan, PLAN_ROOT_FIELD } from '../../plan/schema.ts';
import { solvePlan } from '../../plan/solve-plan.ts';
import { documentWithHeads, planJson } from '../../plan/plan-json.ts';
import { planHtml, planMarkdown, planReport } from '../../plan/report.ts';
import type { PlanResult } from '../../plan/types.ts';
import { EXIT_INPUT, EXIT_OK, type Command, type Io } from '../command.ts';
import { readCommandLine, reportInputErrors } from '../command-line.ts';
import { readDesignFile } from '../design-input.ts';
import type { BuildPool, DesignJob } from '../plan/build-designs.ts';
import { catchInterrupt, type Interrupt } from '../output/interrupt.ts';
import { isBookkeeping, openOutFolder, type OutFolder } from '../output/open-out-folder.ts';
import { takeLock } from '../output/out-lock.ts';
import { writeMarker } from '../output/out-marker.ts';
import { failureOutcome } from '../output/write-into-out-folder.ts';

const OPTIONS = {
  out: { type: 'string', short: 'o' },
  quality: { type: 'string' },
  json: { type: 'boolean' },
  force: { type: 'boolean' },
  help: { type: 'boolean', short: 'h' },
  debug: { type: 'boolean' },
} as const;

const HELP = `Usage: floatwright plan FILE [--out DIR] [--quality preview|export] [--json] [--force]

Plans a whole bench: one raised tank feeding many containers at their own
heights through one supply main. Works out each valve's head from the
elevations, sizes every valve, gives identical valves one set of files,
solves the flows with every valve open and each alone, names the containers
that would starve, and totals the plastic and ballast.

  FILE                     plan document (JSON); see presets/plan-rooftop-shelf.json
  -o, --out DIR            write a folder per design (STL parts, 3MF plate, build sheet),
                           plates/ (every part to print, packed on 256 mm plates, 3MF)
                           and the plan report (plan-report.md / .html, plan.json) into DIR;
                           without it only the report is printed
  --quality Q              export (default; 0.05 mm chord error) or preview (coarser, faster)
  --force                  replace DIR if it holds an earlier floatwright output (its marker
                           file .floatwright-output lists everything in it); a folder holding
                           anything else, a file or a symbolic link is never replaced
  --json                   print {"ok", "containers", "designs", "totals"} on standard output
  --debug                  show the stack trace if floatwright itself fails
  -h, --help               show this help

Exit status: 0 planned; 2 bad input, a container no size fits, DIR busy (another
run writes there), refused or not writable (nothing is written); 130 / 143 stopped
by Ctrl-C / SIGTERM (DIR keeps its earlier files); 1 a fault in floatwright.
`;

const QUALITIES = ['export', 'preview'] as const;

const STYLE = { command: 'plan', subject: 'the plan', help: HELP, allowPositionals: true };
const inputErrors = (errors: FieldError[], json: boolean, io: Io, subject?: string) => reportInputErrors(STYLE, errors, json, io, subject);

/** A folder name from a container name: "top tier" -> "top-tier". */
const slug = (text: string) => fileStem(text, { fallback: 'design', maxLength: 40 });

/** A progress bar on standard error, only for a person at a terminal. */
function progressBar(io: Io, enabled: boolean) {
  if (!enabled) return { update: (_d: number, _t: number) => {}, done: () => {} };
  const width = 30;
  return {
    update: (done: number, total: number) => {
      const filled = Math.round((width * done) / Math.max(total, 1));
      io.err(`\rbuilding designs [${'#'.repeat(filled)}${'.'.repeat(width - filled)}] ${done}/${total}`);
    },
    done: () => io.err('\n'),
  };
}

export interface WritePlanOptions {
  result: PlanResult;
  out: string;
  quality: 'export' | 'preview';
  force?: boolean;
  onProgress?: (done: number, total: number) => void;
  threads?: number;
  /** extra keys for plan.json */
  extra?: Record<string, unknown>;
  /** build workers started earlier (startBuildPool), left open for the caller to close (closed early if the run is stopped) */
  pool?: BuildPool;
  /** the output folder, already opened (openOutFolder with replace); default: opened here */
  folder?: OutFolder;
  /** stops the run (Ctrl-C): the new files are removed and the earlier folder stays */
  signal?: AbortSignal;
}

/**
 * Builds every design of a solved plan and writes the plan folder: a
 * temporary folder beside `out` (with its own marker and lock), swapped into
 * place at the end, so `out` holds the earlier files or the new ones, never a
 * mix. The folder is opened with openOutFolder: never a link or a file; with
 * `force`, an earlier floatwright output is replaced, nothing else.
 * Returns the files per design.
 */
export async function writePlanFolder(opts: WritePlanOptions): Promise<{ files: Record<string, string[]>; plates: string[]; triangles: number; threads: number }> {
  const { buildDesigns } = await import('../plan/build-designs.ts');
  const { result, signal } = opts;
  const folder = opts.folder ?? (await openOutFolder(opts.out, { shownAs: opts.out, replace: true, force: opts.force }));
  const out = folder.path;
  const stopped = new Promise<never>((_, reject) => {
    if (signal?.aborted) reject(signal.reason);
    signal?.addEventListener('abort', () => reject(signal.reason), { once: true });
  });
  stopped.catch(() => {});
  const temp = await mkdtemp(join(dirname(out), `.${basename(out)}.partial-`));
  let building: Promise<unknown> | null = null;
  try {
    await writeMarker(temp, []);
    await takeLock(temp, opts.out);
    const used = new Set<string>();
    const jobs: DesignJob[] = result.designs.map((d) => {
      const first = result.containers.find((c) => c.index === d.containerIndices[0])!;
      let folder = `${d.id}-${slug(first.name)}`;
      while (used.has(folder)) folder += '-x';
      used.add(folder);
      const doc = result.plan.containers.find((c) => c.index === first.index)!.document;
      return {
        id: d.id,
        folder,
        prefix: d.id,
        sizing: d.sizing,
        document: { ...documentWithHeads(doc, first.headMaxM, first.headMinM), name: `${d.id}: ${first.name} (print ${d.quantity})` },
        quality: opts.quality,
        quantity: d.quantity,
      };
    });
    const designs = buildDesigns({ jobs, root: temp, quality: opts.quality, onProgress: opts.onProgress, threads: opts.threads, pool: opts.pool, signal });
    building = designs;
    const built = await Promise.race([designs, stopped]);
    signal?.throwIfAborted();
    const { writePlateSet } = await import('../plan/plate-set.ts');
    const plates = await writePlateSet(
      temp,
      jobs.map((j) => ({
        id: j.id,
        quantity: j.quantity,
        stl: Object.fromEntries(built.files[j.id]!.filter((f) => f.endsWith('.stl')).map((f) => [f.slice(f.lastIndexOf(`${j.id}-`) + j.id.length + 1, -4), f])),
      })),
      // the plan's plates on the smallest bed of its designs (print.bed, 220 x 220 mm by default)
      result.designs.reduce<{ widthMm: number; depthMm: number } | undefined>((bed, d) => {
        const b = printBedMm(d.sizing.inputs);
        return !bed || b.widthMm * b.depthMm < bed.widthMm * bed.depthMm ? { widthMm: b.widthMm, depthMm: b.depthMm } : bed;
      }, undefined),
    );
    const report = planReport(result, built.files, plates);
    await writeFile(join(temp, 'plan-report.md'), planMarkdown(report));
    await writeFile(join(temp, 'plan-report.html'), planHtml(report));
    await writeFile(join(temp, 'plan.json'), `${JSON.stringify(planJson(result, built.files, { ...opts.extra, plates }), null, 2)}\n`);
    const entries = (await readdir(temp)).filter((n) => !isBookkeeping(n));
    await writeMarker(temp, entries);
    signal?.throwIfAborted();

    // The swap: the earlier folder (holding this run's lock) aside, the new one (holding its own) in.
    const old = `${temp}-old`;
    await rename(out, old);
    try {
      await rename(temp, out);
    } catch (error) {
      await rename(old, out);
      throw error;
    }
    await rm(old, { recursive: true, force: true });
    await folder.finish(entries, { replaceListing: true });
    return { ...built, plates };
  } catch (error) {
    if (signal?.aborted) await opts.pool?.close(); // its workers write into temp: stop them before it is removed
    await building?.catch(() => {}); // and this thread's own design (it stops at its next step)
    await rm(temp, { recursive: true, force: true });
    if (!opts.folder) await folder.abandon();
    throw error;
  }
}

async function run(argv: string[], io: Io): Promise<number> {
  const json = argv.includes('--json');
  const args = readCommandLine(argv, OPTIONS, STYLE, io);
  if (typeof args === 'number') return args;
  const { values, positionals } = args;
  if (positionals.length !== 1) {
    const message =
      positionals.length === 0
        ? 'missing; give the plan document, e.g. floatwright plan presets/plan-rooftop-shelf.json --out bench.'
        : `${positionals.length} files given (${positionals.join(', ')}); give one plan document.`;
    return inputErrors([{ field: 'FILE', message }], json, io, 'the command line');
  }
  const quality = (values.quality ?? 'export') as string;
  if (!(QUALITIES as readonly string[]).includes(quality)) {
    return inputErrors([{ field: '--quality', message: `${JSON.stringify(quality)} is not a quality; give export or preview.` }], json, io, 'the command line');
  }
  const out = typeof values.out === 'string' ? values.out : null;
  if (out !== null && out.trim() === '') {
    return inputErrors([{ field: '--out', message: 'empty; give the folder to write the plan into, e.g. --out bench.' }], json, io, 'the command line');
  }
  // The folder is checked and locked first: a busy or refused folder costs no solving.
  const interrupt = out !== null ? catchInterrupt() : null;
  let folder: OutFolder | null = null;
  if (out !== null) {
    try {
      folder = await openOutFolder(out, { shownAs: out, replace: true, force: values.force === true });
    } catch (error) {
      interrupt?.dispose();
      const failed = failureOutcome(error, out, null);
      return inputErrors([{ field: failed.field, message: failed.message }], json, io, 'the command line');
    }
  }

  // Start the build workers now, so they warm up while the plan is checked and solved.
  const pool = out !== null && availableParallelism() > 1 ? (await import('../plan/build-designs.ts')).startBuildPool() : null;
  let status = EXIT_INPUT;
  try {
    status = await planAndWrite(positionals[0]!, out, quality as 'export' | 'preview', json, io, pool, folder, interrupt);
    return status;
  } finally {
    if (status !== EXIT_OK) await folder?.abandon();
    interrupt?.dispose();
    await pool?.close();
  }
}

async function planAndWrite(
  file: string,
  out: string | null,
  quality: 'export' | 'preview',
  json: boolean,
  io: Io,
  pool: BuildPool | null,
  folder: OutFolder | null,
  interrupt: Interrupt | null,
): Promise<number> {
  const read = await readDesignFile(file);
  if (!read.ok) {
    return inputErrors(read.errors.map((e) => ({ ...e, field: e.field === ROOT_FIELD ? PLAN_ROOT_FIELD : e.field, message: e.message.replace('a design document', 'a plan document').replace('the design file', 'the plan file') })), json, io);
  }
  const parsed = parsePlan(read.doc);
  if (!parsed.ok) return inputErrors(parsed.errors, json, io);
  const solved = solvePlan(parsed.plan);
  if (!solved.ok) return inputErrors(solved.errors, json, io);
  const result = solved.result;

  if (!result.ok) {
    // Some container has no size that fits: say why and what would, and write nothing.
    if (json) io.out(`${JSON.stringify(planJson(result), null, 2)}\n`);
    else io.err(`floatwright plan: no valve size fits some containers; nothing was written.\n\n${planMarkdown(planReport(result))}`);
    return EXIT_INPUT;
  }

  let files: Record<string, string[]> = {};
  let plates: string[] = [];
  if (out !== null) {
    const bar = progressBar(io, !json && process.stdout.isTTY === true);
    const started = performance.now();
    // One design builds in this thread; more go to the pool.
    let built;
    try {
      built = await writePlanFolder({ result, out, quality, folder: folder!, signal: interrupt!.signal, onProgress: bar.update, ...(pool && result.designs.length > 1 ? { pool } : { threads: 1 }) });
    } catch (error) {
      bar.done();
      const failed = failureOutcome(error, out, interrupt);
      if (json) io.out(`${JSON.stringify({ ok: false, errors: [{ field: failed.field, message: failed.message }] }, null, 2)}\n`);
      else io.err(`floatwright plan: ${failed.message}\n`);
      return failed.status;
    }
    bar.done();
    files = built.files;
    plates = built.plates;
    if (!json) {
      const count = Object.values(files).reduce((n, f) => n + f.length, 0) + plates.length + 3;
      io.err(`Wrote ${count} files for ${result.designs.length} designs to ${out} in ${((performance.now() - started) / 1000).toFixed(1)} s on ${built.threads} thread(s).\n`);
    }
  }
  if (json) io.out(`${JSON.stringify(planJson(result, files, out !== null ? { out, plates } : {}), null, 2)}\n`);
  else io.out(planMarkdown(planReport(result, files, plates)));
  return EXIT_OK;
}

export const command: Command = {
  name: 'plan',
  summary: 'plan a whole bench: one tank, many containers at their own heights; a file set per distinct valve',
  help: HELP,
  run,
};
