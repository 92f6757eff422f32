/**
 * Issue 13's coverage grid: which tank heights and water depths get a valve.
 * Heads 0.3 to 3.0 m (the low tank at 75 % of full), depths 15 to 300 mm,
 * footprint limits 90 and 120 mm, everything else the document's defaults.
 *
 * Measured: today's direct valve, through parseDesign and sizeDesign as a grower
 * would (a depth the document refuses is marked so), with the time per cell.
 * Estimated: what the lever and rim groundwork (generator/sizing/lever, rim)
 * would add once it is wired into the search: a floor lever (searchLever), and
 * a rim-hung valve (a lever on the rim, or today's direct valve hung so that it
 * holds 30, 45 or 60 mm above its own base: the lightest that fits), with the rim
 * assumed RIM_ABOVE_LEVEL_MM above the level and a WALL_MM wall. The estimate is
 * only computed where the direct valve fails. A benchmark, not a test.
 *
 * Run alone: `npx tsx generator/bench/coverage-grid.ts [--json]`; `npm run bench` prints it too.
 */
import { fileURLToPath } from 'node:url';
import { parseDesign } from '../doc/schema.ts';
import { designBasis } from '../sizing/layout/design-basis.ts';
import { leverBasisFromDesign, searchLever } from '../sizing/lever/index.ts';
import { rimMountSpec, RIM_ADJUST_MM } from '../sizing/rim/index.ts';
import { sizeDesign } from '../sizing/size-design.ts';
import type { DesignInputs } from '../sizing/inputs.ts';

export const GRID_HEADS_M = [0.3, 0.6, 1.0, 1.5, 2.0, 2.5, 3.0] as const;
export const GRID_LEVELS_MM = [15, 20, 25, 30, 40, 50, 75, 100, 150, 200, 250, 300] as const;
export const GRID_LIMITS_MM = [90, 120] as const;
export const LOW_TANK_SHARE = 0.75;
/** Estimate only: the rim this far above the level (a bucket's freeboard), and its wall. */
export const RIM_ABOVE_LEVEL_MM = 100;
export const WALL_MM = 3;
/** Estimate only: the levels a direct valve hung on the rim is tried for, above its own base, mm. */
const HUNG_DIRECT_LEVELS_MM = [30, 45, 60];

/** 'D' direct, 'L' lever on the floor, 'R' rim-hung (lever or direct), '.' none, 'x' the document refuses the depth and nothing else fits. */
export type Cell = 'D' | 'L' | 'R' | '.' | 'x';

export interface CoverageGrid {
  headsM: readonly number[];
  levelsMm: readonly number[];
  limits: {
    limitMm: number;
    /** rows by level, columns by head */
    cells: Cell[][];
    direct: number;
    withLeverAndRim: number;
    /** medians and worst, ms: the direct valve per cell (parse + size), and the estimate per cell where it ran */
    directMsMedian: number;
    directMsMax: number;
    estimateMsMedian: number;
    estimateMsMax: number;
    /** the estimate's lightest choice per cell where it ran: grams */
    estimateG: (number | null)[][];
  }[];
  /** a depth the document refuses (its range), for the note under the grid */
  refusedLevelsMm: number[];
}

const median = (v: number[]) => {
  if (v.length === 0) return NaN;
  const s = [...v].sort((a, b) => a - b);
  return (s[(s.length - 1) >> 1] + s[s.length >> 1]) / 2;
};

function documentFor(headM: number, levelMm: number, limitMm: number) {
  return {
    supply: { headMax: `${headM} m`, headMin: `${Number((headM * LOW_TANK_SHARE).toFixed(4))} m` },
    level: { target: `${levelMm} mm` },
    limits: { maxOuterDiameter: `${limitMm} mm` },
  };
}

/** A direct valve hung from the rim (estimate): the lightest of a few hung heights whose housing and hanger fit the limit. */
function hungDirectG(inp: DesignInputs, rimHeightMm: number): number | null {
  const levelMm = inp.targetLevelM * 1e3;
  const limitMm = inp.maxOuterDiameterM * 1e3;
  let best: number | null = null;
  for (const own of HUNG_DIRECT_LEVELS_MM) {
    const base = levelMm - own;
    if (base < RIM_ADJUST_MM) continue;
    // no foot on the rim: let the search ignore the foot's limit, then check the tube and the hanger behind it
    const r = sizeDesign({ ...inp, targetLevelM: own / 1e3, maxOuterDiameterM: 0.25 });
    if (!r.ok || r.architecture !== 'direct') continue;
    const rim = rimMountSpec({ rimHeightMm, wallThicknessMm: WALL_MM, valveTopZMm: base + r.housing.heightMm, printWallMm: inp.wallM * 1e3 });
    if (rim.tooLow || rim.stem.lengthMm > 250 || r.housing.outerDiameterMm + rim.behindDepthMm > limitMm) continue;
    if (best === null || r.mass.totalG < best) best = r.mass.totalG;
  }
  return best;
}

export function runCoverageGrid(): CoverageGrid {
  const refused = new Set<number>();
  const limits = GRID_LIMITS_MM.map((limitMm) => {
    const cells: Cell[][] = [];
    const grams: (number | null)[][] = [];
    const directMs: number[] = [];
    const estimateMs: number[] = [];
    let direct = 0;
    let reached = 0;
    let fallback: DesignInputs | null = null;
    for (const levelMm of GRID_LEVELS_MM) {
      const row: Cell[] = [];
      const gRow: (number | null)[] = [];
      for (const headM of GRID_HEADS_M) {
        const t0 = performance.now();
        const parsed = parseDesign(documentFor(headM, levelMm, limitMm));
        const sized = parsed.ok ? sizeDesign(parsed.inputs) : null;
        directMs.push(performance.now() - t0);
        if (sized?.ok) {
          row.push('D');
          gRow.push(null);
          direct++;
          reached++;
          continue;
        }
        if (!parsed.ok) refused.add(levelMm);
        // the estimate runs on the same inputs; for a refused depth, on the defaults with that depth
        if (parsed.ok) fallback = parsed.inputs;
        const inp: DesignInputs | null = parsed.ok ? parsed.inputs : fallback && { ...fallback, headMaxM: headM, headMinM: headM * LOW_TANK_SHARE, targetLevelM: levelMm / 1e3 };
        if (!inp) {
          row.push('x');
          gRow.push(null);
          continue;
        }
        const t1 = performance.now();
        const lb = leverBasisFromDesign(designBasis(inp));
        const floor = searchLever(lb, { mount: 'floor' }).best;
        const rimHeightMm = levelMm + RIM_ABOVE_LEVEL_MM;
        const rimLever = searchLever(lb, { mount: 'rim', rim: { rimHeightMm, wallThicknessMm: WALL_MM } }).best;
        const rimDirect = hungDirectG(inp, rimHeightMm);
        estimateMs.push(performance.now() - t1);
        const options: [Cell, number][] = [];
        if (floor) options.push(['L', floor.totalMassKg * 1e3]);
        if (rimLever) options.push(['R', rimLever.totalMassKg * 1e3]);
        if (rimDirect !== null) options.push(['R', rimDirect]);
        options.sort((a, b) => a[1] - b[1]);
        if (options.length) {
          row.push(options[0][0]);
          gRow.push(options[0][1]);
          reached++;
        } else {
          row.push(parsed.ok ? '.' : 'x');
          gRow.push(null);
        }
      }
      cells.push(row);
      grams.push(gRow);
    }
    return {
      limitMm,
      cells,
      direct,
      withLeverAndRim: reached,
      directMsMedian: median(directMs),
      directMsMax: Math.max(...directMs),
      estimateMsMedian: median(estimateMs),
      estimateMsMax: estimateMs.length ? Math.max(...estimateMs) : NaN,
      estimateG: grams,
    };
  });
  return { headsM: GRID_HEADS_M, levelsMm: GRID_LEVELS_MM, limits, refusedLevelsMm: [...refused].sort((a, b) => a - b) };
}

/** The grids as text: one per limit, the measured direct valve and the estimate together. */
export function coverageText(g: CoverageGrid): string {
  const total = g.headsM.length * g.levelsMm.length;
  const lines = [
    `coverage grid (issue 13): heads across, water depths down; low tank at ${LOW_TANK_SHARE * 100} % of full`,
    "  D = today's direct valve (measured)   L = lever on the floor, R = hung from the rim (ESTIMATE from the",
    `  lever/rim groundwork, not yet in the search; rim ${RIM_ABOVE_LEVEL_MM} mm above the level, ${WALL_MM} mm wall)   . = nothing fits   x = depth refused by the document`,
  ];
  for (const l of g.limits) {
    lines.push('', `footprint limit ${l.limitMm} mm: direct ${l.direct} of ${total}; with lever and rim (estimate) ${l.withLeverAndRim} of ${total}`);
    lines.push(`  depth \\ head ${g.headsM.map((h) => `${h.toFixed(1)} m`.padStart(6)).join('')}`);
    g.levelsMm.forEach((level, i) => lines.push(`  ${`${level} mm`.padStart(11)} ${l.cells[i].map((c) => c.padStart(6)).join('')}`));
    lines.push(
      `  time per cell: direct ${l.directMsMedian.toFixed(1)} ms median, ${l.directMsMax.toFixed(1)} ms worst; estimate (floor lever + rim lever + hung direct) ${l.estimateMsMedian.toFixed(0)} ms median, ${l.estimateMsMax.toFixed(0)} ms worst`,
    );
  }
  if (g.refusedLevelsMm.length) lines.push('', `depths the document refuses today: ${g.refusedLevelsMm.map((l) => `${l} mm`).join(', ')} (the estimate there uses the same inputs with that depth)`);
  return `${lines.join('\n')}\n`;
}

if (import.meta.url === `file://${process.argv[1]}` || process.argv[1] === fileURLToPath(import.meta.url)) {
  const g = runCoverageGrid();
  process.stdout.write(process.argv.includes('--json') ? `${JSON.stringify(g, null, 2)}\n` : coverageText(g));
}
