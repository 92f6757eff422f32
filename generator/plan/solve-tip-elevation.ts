import { HEAD_CAP_M } from '../sizing/constants.ts';
import type { DesignInputs } from '../sizing/inputs.ts';
import type { SizingResult } from '../sizing/result.ts';
import { sizeDesign } from '../sizing/size-design.ts';
import type { TipSolution } from './types.ts';

export interface TipElevationOptions {
  /** the container's design inputs (headMaxM / headMinM are replaced) */
  inputs: DesignInputs;
  /** container floor elevation, m */
  floorElevationM: number;
  /** tank water surface elevation when full and at its lowest, m */
  tankFullSurfaceElevationM: number;
  tankLowSurfaceElevationM: number;
  /** the sizing function; default sizeDesign (a plan passes a memoised one) */
  size?: (inputs: DesignInputs) => SizingResult;
  /** stop when the tip height moves less than this, m; default 1e-4 (0.1 mm) */
  toleranceM?: number;
  /** default 20 */
  maxIterations?: number;
  /** first guess of the tip height above the floor, m; default 0.065 (a typical valve) */
  guessTipHeightM?: number;
}

/** Heads handed to the sizing are rounded to 0.1 mm so identical containers share one sizing (and a cache hit). */
const roundHead = (h: number) => Math.round(h * 1e4) / 1e4;

/** Heads the sizing accepts while iterating; the final heads are checked by the caller. */
const MIN_HEAD_M = 0.005;

/**
 * The nozzle tip elevation of one container's valve, solved together with the
 * head it sees.
 *
 * The sizing places the tip at a height t(H) above the floor that depends on
 * the head H (a higher head needs a bigger float, so a taller valve), while the
 * head depends on the tip: H = E_full - (E_floor + t(H)), H_min = E_low - (E_floor + t(H)).
 * Solved by fixed-point iteration t_{k+1} = t(E_full - E_floor - t_k), stopping
 * when t moves less than 0.1 mm. It converges because t changes slowly with
 * H: with the defaults and a 45 mm level, about 5 mm per metre of head (a
 * contraction factor near 0.005). The search is over discrete float sizes, so
 * near a size step the iterates can cycle between two designs; then the one
 * sized for the higher head is kept (it has the reserve for both) and
 * `converged` is false.
 *
 * Example: tank surface 2.4 m, floor 0.3 m, 45 mm level, defaults: the tip
 * settles near 82.3 mm in 2 steps, so H_max is near 2.018 m (checked to 0.5 mm in
 * test/plan/single.test.ts; it moves when the sizing's defaults do).
 * Source: fixed-point iteration (Burden and Faires, Numerical Analysis, sec. 2.2), from memory.
 */
export function solveTipElevation(opts: TipElevationOptions): TipSolution {
  const size = opts.size ?? sizeDesign;
  const tol = opts.toleranceM ?? 1e-4;
  const maxIterations = opts.maxIterations ?? 20;
  const { floorElevationM: floor, tankFullSurfaceElevationM: full, tankLowSurfaceElevationM: low } = opts;

  const sizeAt = (tipM: number) => {
    const headMaxM = Math.min(HEAD_CAP_M, Math.max(MIN_HEAD_M, roundHead(full - floor - tipM)));
    const headMinM = Math.min(headMaxM, Math.max(MIN_HEAD_M, roundHead(low - floor - tipM)));
    return { headMaxM, sizing: size({ ...opts.inputs, headMaxM, headMinM }) };
  };

  let tipM = opts.guessTipHeightM ?? 0.065;
  const seen: { tipM: number; headMaxM: number; sizing: SizingResult; nextTipM: number }[] = [];
  let converged = false;
  let chosen: (typeof seen)[number] | null = null;

  for (let k = 0; k < maxIterations; k++) {
    const { headMaxM, sizing } = sizeAt(tipM);
    if (!sizing.ok) {
      chosen = { tipM, headMaxM, sizing, nextTipM: tipM };
      converged = true; // nothing to iterate on: the valve cannot be sized near this head
      break;
    }
    const nextTipM = sizing.nozzle.tipHeightMm / 1e3;
    const step = { tipM, headMaxM, sizing, nextTipM };
    seen.push(step);
    if (Math.abs(nextTipM - tipM) < tol) {
      chosen = step;
      converged = true;
      break;
    }
    // A tip seen two or more steps ago again: a cycle between designs on either side of a size step.
    const earlier = seen.slice(0, -1).findIndex((s) => Math.abs(s.tipM - nextTipM) < tol);
    if (earlier >= 0) {
      chosen = seen.slice(earlier).reduce((a, b) => (b.headMaxM > a.headMaxM ? b : a));
      break;
    }
    tipM = nextTipM;
  }
  chosen ??= seen.reduce((a, b) => (b.headMaxM > a.headMaxM ? b : a));

  const tipHeightM = chosen.sizing.ok ? chosen.sizing.nozzle.tipHeightMm / 1e3 : chosen.tipM;
  const tipElevationM = floor + tipHeightM;
  return {
    sizing: chosen.sizing,
    tipElevationM,
    headMaxM: full - tipElevationM,
    headMinM: low - tipElevationM,
    iterations: seen.length + (chosen.sizing.ok ? 0 : 1),
    converged,
  };
}
