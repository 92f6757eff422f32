import { OVERHANG_MIN_DEG, OVERHANG_RISE } from '../constants.ts';
import { FOOT_FLARE_RISE } from './housing-spec.ts';
import { cylinderVolume, frustumVolume } from '../float/frustum-volume.ts';
import type { HousingSpec, NozzleSpec, PinSpec } from '../result.ts';
import { PIN_HOLE_ROOF_DEG } from './housing-spec.ts';

/**
 * Analytic solid volumes of the printed parts, mm3, for true circles.
 * The solids are faceted; tests compare them with the same shapes over N-gons.
 * Every formula is elementary geometry (cylinder, frustum, circular segment).
 */

/**
 * Area of a teardrop: circle of radius r plus a point whose sides are tangent at a = 50 degrees
 * from the horizontal: A = pi r^2 + r^2 tan a - a r^2 (the kite centre-tangents-point, r^2 tan a,
 * less the circle's sector of 2a between the tangent points). a = 45deg gives r^2 (3 pi / 4 + 1).
 */
export function teardropAreaMm2(r: number, roofDeg = OVERHANG_MIN_DEG): number {
  const a = (roofDeg * Math.PI) / 180;
  return r * r * (Math.PI + Math.tan(a) - a);
}

/**
 * Anchor holes are teardrops in plan, point outward, roof at this angle: where a hole
 * leaves the foot's 50-degree flare, each printed layer closes the point by less than
 * a slicer's overhang allowance (common practice: a hole bridged at its end needs support).
 */
export const ANCHOR_ROOF_DEG = 60;

/** Integral over y in [-a, a] of sqrt(R^2 - y^2): the area of a circle's slab half, mm2. */
function slabHalfArea(R: number, a: number): number {
  const h = Math.min(a, R);
  return h * Math.sqrt(R * R - h * h) + R * R * Math.asin(h / R);
}

/** Outer radius of the housing at height z, mm (flange, flare at FOOT_FLARE_DEG, then tube). */
export function housingOuterRadiusAtMm(h: HousingSpec, z: number): number {
  const Ro = h.outerDiameterMm / 2;
  const Rf = h.foot.outerDiameterMm / 2;
  if (z <= h.foot.flangeThicknessMm) return Rf;
  const u = z - h.foot.flangeThicknessMm;
  return Math.max(Ro, Rf - u / FOOT_FLARE_RISE);
}

/** Height of the flare over the flange, mm: (R_f - R_o) tan FOOT_FLARE_DEG. */
export function housingFlareHeightMm(h: HousingSpec): number {
  return ((h.foot.outerDiameterMm - h.outerDiameterMm) / 2) * FOOT_FLARE_RISE;
}

/** The notch's section through the wall at height z, mm2: the slab of half-width a outside, less the bore's (`boreSlabMm2`). */
function notchSectionMm2(h: HousingSpec, boreSlabMm2: number, a: number, z: number): number {
  return slabHalfArea(housingOuterRadiusAtMm(h, z), a) - boreSlabMm2;
}

/** Volume one drain notch removes: slab of the notch width through the wall and foot, z from 0 to its height (Simpson's rule in z). */
function notchVolumeMm3(h: HousingSpec): number {
  const a = h.drainNotches.widthMm / 2;
  const Rb = h.boreMm / 2;
  // the bore's slab is the same at every height
  const boreSlab = slabHalfArea(Rb, a);
  // split at the flange top so Simpson sees smooth pieces
  const flareTop = h.foot.flangeThicknessMm + housingFlareHeightMm(h);
  const breaks = [0, Math.min(h.foot.flangeThicknessMm, h.drainNotches.heightMm), Math.min(flareTop, h.drainNotches.heightMm), h.drainNotches.heightMm];
  let v = 0;
  for (let k = 0; k + 1 < breaks.length; k++) {
    const [z0, z1] = [breaks[k], breaks[k + 1]];
    if (z1 <= z0) continue;
    const n = 16;
    const dz = (z1 - z0) / n;
    let s = notchSectionMm2(h, boreSlab, a, z0) + notchSectionMm2(h, boreSlab, a, z1);
    for (let i = 1; i < n; i++) s += (i % 2 ? 4 : 2) * notchSectionMm2(h, boreSlab, a, z0 + i * dz);
    v += (s * dz) / 3;
  }
  return v;
}

export function housingVolumeMm3(h: HousingSpec): number {
  const Ro = h.outerDiameterMm / 2;
  const Rb = h.boreMm / 2;
  const Rf = h.foot.outerDiameterMm / 2;
  const w = Rf - Ro;
  const rSeat = h.seatBoreMm / 2;
  const rBoss = h.bossOuterDiameterMm / 2;
  const tube = Math.PI * (Ro * Ro - Rb * Rb) * h.deckBottomZMm;
  const deck = cylinderVolume(Ro, h.deckThicknessMm) - cylinderVolume(rSeat, h.deckThicknessMm);
  const vents = h.vents.count * cylinderVolume(h.vents.diameterMm / 2, h.deckThicknessMm);
  const boss = Math.PI * (rBoss * rBoss - rSeat * rSeat) * h.bossHeightMm;
  // the guide: sleeve below the boss to its mouth, stop ring inside it, less the air slots
  const gd = h.guide;
  const rGuide = gd.boreMm / 2;
  const rStop = gd.stopBoreMm / 2;
  const bossBottom = h.deckBottomZMm - h.bossHeightMm;
  const sleeveLength = bossBottom - gd.mouthZMm;
  const stopLength = bossBottom - gd.stopZMm;
  const sleeve = Math.PI * (rBoss * rBoss - rGuide * rGuide) * sleeveLength + Math.PI * (rGuide * rGuide - rStop * rStop) * stopLength;
  const a = gd.slots.widthMm / 2;
  const slot =
    (slabHalfArea(rBoss, a) - slabHalfArea(rGuide, a)) * sleeveLength +
    (slabHalfArea(rGuide, a) - slabHalfArea(rStop, a)) * stopLength +
    (slabHalfArea(rBoss, a) - slabHalfArea(rStop - 1, a)) * gd.slots.riseMm;
  const guide = sleeve - gd.slots.count * slot;
  const flange = Math.PI * (Rf * Rf - Ro * Ro) * h.foot.flangeThicknessMm;
  // ring between R_o and a radius shrinking from R_f to R_o over height w tan a: pi tan a (R_o w^2 + w^3/3), a = FOOT_FLARE_DEG
  const flare = Math.PI * FOOT_FLARE_RISE * (Ro * w * w + (w * w * w) / 3);
  const ah = h.foot.anchorHoles;
  const anchorDepth = h.foot.flangeThicknessMm + Math.max(0, Rf - ah.circleRadiusMm) * FOOT_FLARE_RISE;
  const anchors = ah.count * teardropAreaMm2(ah.diameterMm / 2, ANCHOR_ROOF_DEG) * anchorDepth;
  const notches = h.drainNotches.count * notchVolumeMm3(h);
  const rHole = h.pinHoles.diameterMm / 2;
  const pinHoles = 2 * teardropAreaMm2(rHole, PIN_HOLE_ROOF_DEG) * (housingOuterRadiusAtMm(h, h.pinHoles.centerZMm) - Rb);
  return tube + deck - vents + boss + guide + flange + flare - anchors - notches - pinHoles;
}

export function nozzleVolumeMm3(n: NozzleSpec): number {
  const rs = n.lipDiameterMm / 2;
  const rsh = n.shoulderDiameterMm / 2;
  const rc = n.collarDiameterMm / 2;
  const root = n.barb.rootDiameterMm / 2;
  const crest = n.barb.crestDiameterMm / 2;
  const step = crest - root;
  const ribs = n.crushRibs.count * 0.5 * n.crushRibs.baseWidthMm * n.crushRibs.heightMm * n.collarLengthMm;
  const outer =
    cylinderVolume(rs, n.lipHeightMm) +
    frustumVolume((rsh - rs) * OVERHANG_RISE, rs, rsh) +
    cylinderVolume(rsh, n.shoulderHeightMm) +
    cylinderVolume(rc, n.collarLengthMm) +
    ribs +
    cylinderVolume(root, n.barb.stemLengthMm) +
    n.barb.count * (frustumVolume(step * OVERHANG_RISE, root, crest) + frustumVolume(n.barb.taperLengthMm, crest, root));
  return outer - cylinderVolume(n.orificeMm / 2, n.totalLengthMm);
}

/** Cross-section of the pin: circle less the segment below the flat at flatOffset f = r cos 50deg: pi r^2 - (r^2/2)(theta - sin theta), theta = 2 acos(f / r). */
export function pinSectionAreaMm2(p: PinSpec): number {
  const r = p.diameterMm / 2;
  const theta = 2 * Math.acos(p.flatOffsetMm / r);
  return Math.PI * r * r - (r * r / 2) * (theta - Math.sin(theta));
}

export function pinVolumeMm3(p: PinSpec): number {
  return pinSectionAreaMm2(p) * p.lengthMm + p.head.lengthMm * p.head.widthMm * p.head.heightMm;
}
