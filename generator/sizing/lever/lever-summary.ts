import type { LeverCandidate } from './lever-types.ts';

/**
 * The figures issue 13 asks `size --json` to add for a lever valve, from a laid-out
 * candidate (mm; the pivot height above the floor, the arm's length from its heel
 * to its tip), ready to spread into the sizing result once the search picks the
 * lever: `architecture`, `mount`, `footprintMm`, `lever.*`, `rim.adjustMm` (rim only).
 */
export function leverSummary(c: LeverCandidate): {
  architecture: 'lever';
  mount: 'floor' | 'rim';
  footprintMm: number;
  lever: { ratio: number; pivotHeightMm: number; armLengthMm: number; hysteresisMm: number };
  rim: { adjustMm: number } | null;
} {
  return {
    architecture: 'lever',
    mount: c.mount,
    footprintMm: c.footprintMm,
    lever: {
      ratio: c.ratio,
      pivotHeightMm: c.pivotZMm,
      armLengthMm: c.arm.tipXMm - c.arm.tailXMm,
      hysteresisMm: c.hysteresisMm,
    },
    rim: c.rim ? { adjustMm: c.rim.adjustMm } : null,
  };
}
