/**
 * Worst tilt of a float pressed up on the nozzle lip, in its bore and its guide.
 *
 * The float pushing up on the lip is an inverted pendulum about the pad (DESIGN,
 * "Tilt, guide and stability"). Turn it by theta about the pad face's centre P, at
 * height h_p above the float's bottom, and let P sit x off the housing's axis (the
 * pad sliding on the lip). A point of the float at radius r (signed, in the plane of
 * the tilt) and height z then lies at
 *
 *   X(r, z) = x + r cos(theta) - (h_p - z) sin(theta)
 *
 * (rigid rotation; exact, no small-angle step). Every wall is vertical, so each
 * contact is one inequality in x:
 *   bore (radius R_b) on the bottom rim (-R, 0):        x >= -R_b + R cos + h_p sin
 *   bore on the top of the straight side (R, h_c):      x <=  R_b - R cos + (h_p - h_c) sin
 *   sleeve (radius r_g) on the collar at its mouth (-r_c, z_g): x >= -r_g + r_c cos + (h_p - z_g) sin
 *   sleeve on the collar's top corner (r_c, H):         x <=  r_g - r_c cos + (h_p - H) sin
 * With the guide left out, the first of these reduces to the rim-in-bore relation
 * D cos(theta) + h sin(theta) = bore when the float is also against the far wall.
 * The worst tilt is the largest theta for which some x satisfies all of them
 * (bisection: the feasible interval shrinks as theta grows). The collar's top also
 * rises r_c sin(theta) - (h_p - H)(1 - cos(theta)) on one side: where that reaches
 * the stop gap, the stop ring holds the tilt too.
 *
 * Then: pad offset = the largest |x| over every feasible (theta, x); far-side lip gap
 * = d_s tan(theta_max) (the tilted pad face over the lip's width).
 *
 * Example (rooftop-tubs-like, mm): R 27, R_b 28, h_c 35, r_c 6.55, r_g 7.05,
 * H 63, z_g 57, h_p 63.5, no stop: theta_max = atan-free solution of
 * H sin - (R + r_c)(1 - cos) = c + g, about 1.36 deg; pad offset about 0.51 mm.
 * Source: elementary plane geometry of rigid bodies in vertical walls.
 */
export interface GuidedTiltInput {
  /** float radius R and bore radius R_b, mm */
  floatRadiusMm: number;
  boreRadiusMm: number;
  /** straight-side height h_c, mm */
  cylinderHeightMm: number;
  /** collar radius r_c, the sleeve's radius r_g, the collar top H, mm (float frame); guide null = no guide */
  guide: null | {
    collarRadiusMm: number;
    sleeveRadiusMm: number;
    collarTopZMm: number;
    /** float-frame height of the sleeve's mouth (its lowest edge) at seal */
    sleeveMouthZMm: number;
    /** how far the collar top is below the stop ring at seal, mm (Infinity: no stop) */
    stopGapMm: number;
  };
  /** pad face centre above the float's bottom at seal, h_p, mm */
  pivotZMm: number;
  /** nozzle lip diameter d_s, mm */
  lipDiameterMm: number;
}

export interface GuidedTilt {
  maxAngleDeg: number;
  padOffsetMm: number;
  lipGapMm: number;
}

/** Lowest feasible pivot offset at a tilt with cosine c and sine s. */
function pivotLow(o: GuidedTiltInput, c: number, s: number): number {
  const lo = -o.boreRadiusMm + o.floatRadiusMm * c + o.pivotZMm * s;
  const g = o.guide;
  return g ? Math.max(lo, -g.sleeveRadiusMm + g.collarRadiusMm * c + (o.pivotZMm - g.sleeveMouthZMm) * s) : lo;
}

/** Highest feasible pivot offset at a tilt with cosine c and sine s (below pivotLow: none). */
function pivotHigh(o: GuidedTiltInput, c: number, s: number): number {
  const hi = o.boreRadiusMm - o.floatRadiusMm * c + (o.pivotZMm - o.cylinderHeightMm) * s;
  const g = o.guide;
  return g ? Math.min(hi, g.sleeveRadiusMm - g.collarRadiusMm * c + (o.pivotZMm - g.collarTopZMm) * s) : hi;
}

function stopHolds(o: GuidedTiltInput, c: number, s: number): boolean {
  const g = o.guide;
  if (!g || !Number.isFinite(g.stopGapMm)) return false;
  return g.collarRadiusMm * s - (o.pivotZMm - g.collarTopZMm) * (1 - c) > g.stopGapMm;
}

/** Some pivot offset works at tilt theta, and the stop ring does not hold it. */
function feasible(o: GuidedTiltInput, theta: number): boolean {
  const c = Math.cos(theta);
  const s = Math.sin(theta);
  return pivotLow(o, c, s) <= pivotHigh(o, c, s) && !stopHolds(o, c, s);
}

export function guidedTilt(o: GuidedTiltInput): GuidedTilt {
  let lo = 0;
  let hi = Math.PI / 4;
  if (!feasible(o, 0)) return { maxAngleDeg: 0, padOffsetMm: 0, lipGapMm: 0 };
  for (let i = 0; i < 40; i++) {
    const mid = (lo + hi) / 2;
    if (feasible(o, mid)) lo = mid;
    else hi = mid;
  }
  const thetaMax = lo;
  // both ends of the feasible interval grow with theta (for tilts below atan(h_p / R)), so the farthest
  // pivot is at theta = 0 or at the worst tilt; a few samples between make sure of it
  let offset = 0;
  const n = 8;
  for (let i = 0; i <= n; i++) {
    const theta = (thetaMax * i) / n;
    const c = Math.cos(theta);
    const s = Math.sin(theta);
    offset = Math.max(offset, Math.abs(pivotLow(o, c, s)), Math.abs(pivotHigh(o, c, s)));
  }
  return {
    maxAngleDeg: (thetaMax * 180) / Math.PI,
    padOffsetMm: offset,
    lipGapMm: o.lipDiameterMm * Math.tan(thetaMax),
  };
}
