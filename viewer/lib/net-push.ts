/**
 * The float's net upward push against the reservoir level, with the float held
 * at its sealed position: F(L) = rho g V_sub(L - z_b) - m g (Archimedes) (for a
 * lever, the push that gives at the pad through the arm), where
 * z_b is the float's bottom when sealed and V_sub the displaced volume of its
 * outer envelope. The level where F reaches the force needed to close at a head
 * is the level the valve holds at that head.
 */
import { submergedVolumeMm3 } from '../../generator/sizing/float/submerged-volume.ts';
import type { SizingSuccess } from '../../generator/sizing/result.ts';

const STANDARD_GRAVITY = 9.80665;

export function netPushN(sizing: SizingSuccess, levelMm: number): number {
  const f = sizing.parts.float;
  const depth = levelMm - sizing.parts.mount.floatSealZMm;
  const rho = sizing.inputs.liquidDensityKgM3;
  const floatPush = rho * STANDARD_GRAVITY * submergedVolumeMm3(f, depth) * 1e-9 - (sizing.float.massG / 1000) * STANDARD_GRAVITY;
  if (sizing.architecture === 'direct') return floatPush;
  // a lever: the push at the pad, through the arm (the moment balance, lever.padForceFromPush)
  const m = sizing.lever.padForceFromPush;
  return m.perNewton * floatPush + m.offsetN;
}

export interface PushCurve {
  points: { levelMm: number; pushN: number }[];
  closeAtHeadMaxN: number;
  closeAtHeadMinN: number;
  holdsAtHeadMaxMm: number;
  holdsAtHeadMinMm: number;
}

/** The push from the float's sealed bottom to its top, `samples` points. */
export function pushCurve(sizing: SizingSuccess, samples = 81): PushCurve {
  const bottom = sizing.parts.mount.floatSealZMm;
  const top = bottom + sizing.parts.float.heightMm;
  const points = [];
  for (let i = 0; i < samples; i++) {
    const levelMm = bottom + ((top - bottom) * i) / (samples - 1);
    points.push({ levelMm, pushN: netPushN(sizing, levelMm) });
  }
  return {
    points,
    closeAtHeadMaxN: sizing.closingForce.atHeadMaxN,
    closeAtHeadMinN: sizing.closingForce.atHeadMinN,
    holdsAtHeadMaxMm: levelForPush(sizing, sizing.closingForce.atHeadMaxN),
    holdsAtHeadMinMm: levelForPush(sizing, sizing.closingForce.atHeadMinN),
  };
}

/** Level at which the sealed float pushes with `forceN` (bisection; the push rises with the level). */
export function levelForPush(sizing: SizingSuccess, forceN: number): number {
  let lo = sizing.parts.mount.floatSealZMm;
  let hi = lo + sizing.parts.float.heightMm;
  if (netPushN(sizing, hi) < forceN) return Infinity;
  for (let i = 0; i < 60; i++) {
    const mid = (lo + hi) / 2;
    if (netPushN(sizing, mid) < forceN) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}
