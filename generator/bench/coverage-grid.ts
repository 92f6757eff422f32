/**
 * Issue 13's coverage grid: which tank heights and water depths get a valve.
 * Heads 0.3 to 3.0 m (the low tank at 75 % of full), depths 15 to 300 mm,
 * footprint limits 90 and 120 mm; every cell gives the container a rim
 * RIM_ABOVE_LEVEL_MM above its level and a WALL_MM wall (so the rim mount is
 * weighed too), everything else the document's defaults. Measured as a grower
 * would get it: the document through parseDesign and sizeDesign ("auto": the
 * direct valve wherever it fits, else the lightest lever on the floor or the
 * rim), with the time per cell. A benchmark, not a test.
 *
 * Run alone: `npx tsx generator/bench/coverage-grid.ts [--json]`; `npm run bench` prints it too.
 */
import { fileURLToPath } from 'node:url';
import { parseDesign } from '../doc/schema.ts';
import { sizeDesign } from '../sizing/size-design.ts';

export const GRID_HEADS_M = [0.3, 0.6, 1.0, 1.5, 2.0, 2.5, 3.0] as const;
export const GRID_LEVELS_MM = [15, 20, 25, 30, 40, 50, 75, 100, 150, 200, 250, 300] as const;
export const GRID_LIMITS_MM = [90, 120] as const;
export const LOW_TANK_SHARE = 0.75;
/** Every cell's container: the rim this far above the level (a bucket's freeboard), and its wall. */
export const RIM_ABOVE_LEVEL_MM = 100;
export const WALL_MM = 3;

/** 'D' direct valve on the floor, 'L' lever on the floor, 'R' lever hung from the rim, '.' none, 'x' the document refuses the cell. */
export type Cell = 'D' | 'L' | 'R' | '.' | 'x';

export interface CoverageGrid {
  headsM: readonly number[];
  levelsMm: readonly number[];
  limits: {
    limitMm: number;
    /** rows by level, columns by head */
    cells: Cell[][];
    /** grams of plastic per cell (null where nothing fits) */
    plasticG: (number | null)[][];
    reached: number;
    byKind: Record<'D' | 'L' | 'R', number>;
    /** parse + size per cell, ms: median and worst */
    msMedian: number;
    msMax: number;
  }[];
}

const median = (v: number[]) => {
  if (v.length === 0) return NaN;
  const s = [...v].sort((a, b) => a - b);
  return (s[(s.length - 1) >> 1] + s[s.length >> 1]) / 2;
};

export function documentFor(headM: number, levelMm: number, limitMm: number) {
  return {
    supply: { headMax: `${headM} m`, headMin: `${Number((headM * LOW_TANK_SHARE).toFixed(4))} m` },
    level: { target: `${levelMm} mm` },
    limits: { maxOuterDiameter: `${limitMm} mm` },
    container: { rimHeight: `${levelMm + RIM_ABOVE_LEVEL_MM} mm`, wallThickness: `${WALL_MM} mm` },
  };
}

export function runCoverageGrid(): CoverageGrid {
  const limits = GRID_LIMITS_MM.map((limitMm) => {
    const cells: Cell[][] = [];
    const grams: (number | null)[][] = [];
    const ms: number[] = [];
    const byKind = { D: 0, L: 0, R: 0 };
    for (const levelMm of GRID_LEVELS_MM) {
      const row: Cell[] = [];
      const gRow: (number | null)[] = [];
      for (const headM of GRID_HEADS_M) {
        const t0 = performance.now();
        const parsed = parseDesign(documentFor(headM, levelMm, limitMm));
        const sized = parsed.ok ? sizeDesign(parsed.inputs) : null;
        ms.push(performance.now() - t0);
        if (!sized?.ok) {
          row.push(parsed.ok ? '.' : 'x');
          gRow.push(null);
          continue;
        }
        const cell: Cell = sized.architecture === 'direct' ? 'D' : sized.mount === 'rim' ? 'R' : 'L';
        byKind[cell]++;
        row.push(cell);
        gRow.push(sized.mass.totalG - sized.mass.byPart.pad);
      }
      cells.push(row);
      grams.push(gRow);
    }
    return { limitMm, cells, plasticG: grams, reached: byKind.D + byKind.L + byKind.R, byKind, msMedian: median(ms), msMax: Math.max(...ms) };
  });
  return { headsM: GRID_HEADS_M, levelsMm: GRID_LEVELS_MM, limits };
}

/** The grids as text, one per limit. */
export function coverageText(g: CoverageGrid): string {
  const total = g.headsM.length * g.levelsMm.length;
  const lines = [
    `coverage grid (issue 13): heads across, water depths down; low tank at ${LOW_TANK_SHARE * 100} % of full; every container's rim ${RIM_ABOVE_LEVEL_MM} mm above its level, ${WALL_MM} mm wall`,
    '  measured through parseDesign + sizeDesign ("auto"): D = direct valve on the floor, L = lever on the floor, R = lever hung from the rim, . = nothing fits, x = refused',
  ];
  for (const l of g.limits) {
    lines.push('', `footprint limit ${l.limitMm} mm: ${l.reached} of ${total} (direct ${l.byKind.D}, lever on the floor ${l.byKind.L}, on the rim ${l.byKind.R})`);
    lines.push(`  depth \\ head ${g.headsM.map((h) => `${h.toFixed(1)} m`.padStart(6)).join('')}`);
    g.levelsMm.forEach((level, i) => lines.push(`  ${`${level} mm`.padStart(11)} ${l.cells[i].map((c) => c.padStart(6)).join('')}`));
    lines.push(`  time per cell (parse + size): ${l.msMedian.toFixed(1)} ms median, ${l.msMax.toFixed(0)} ms worst`);
  }
  return `${lines.join('\n')}\n`;
}

if (import.meta.url === `file://${process.argv[1]}` || process.argv[1] === fileURLToPath(import.meta.url)) {
  const g = runCoverageGrid();
  process.stdout.write(process.argv.includes('--json') ? `${JSON.stringify(g, null, 2)}\n` : coverageText(g));
}
