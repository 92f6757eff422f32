import { depthForForceMm } from '../float/depth-for-force.ts';
import type { ValveLine } from '../hydraulics/valve-flow-m3s.ts';
import type { FloatSpec } from '../result.ts';
import { gapFlow, type LipGeometry } from './gap-flow.ts';

/**
 * Equivalent film gap left by the pad resting on the printed lip before it seals tight, m:
 * the ripples of a printed first layer and a sponge's skin (modelling choice; 20 um, from memory:
 * a printed face's roughness is of the order of a tenth of a 0.2 mm layer).
 */
export const CONTACT_GAP_M = 20e-6;

export interface CharacteristicOptions {
  /** the supply line at this tank head (valveFlowM3s' ValveLine; headM = the head) */
  line: ValveLine;
  lip: LipGeometry;
  float: FloatSpec;
  /** float mass with the pad, kg */
  floatMassKg: number;
  /** float bottom (mm above the housing base) when the pad first touches the lip */
  touchBottomMm: number;
  /** the pad's squeeze from first touch to the tight seal, mm (the float rises this much) */
  indentationMm: number;
  /** float bottom resting on the pin, mm */
  restBottomMm: number;
  /** the pad's force for a tight seal at this head, N (sealForceN(H)) */
  sealForceN: number;
  /**
   * lever valve: how far the float moves per mm the pad moves (the arm's ratio a_float / a_pad), and the
   * float push that holds a pad force (the moment balance with the arm's weight and the pivot's friction,
   * closing); defaults 1 and the pad force itself (the direct valve: the float carries the pad)
   */
  floatPerPad?: number;
  floatPushN?: (padForceN: number) => number;
}

export interface CharacteristicPoint {
  levelMm: number;
  flowLph: number;
}

export interface Characteristic {
  /** from the float on its pin (fully open) up to the tight shut-off (zero flow); level rising, flow falling */
  points: CharacteristicPoint[];
  /** level where the pad first rests on the lip (the gap at the contact gap), mm */
  contactMm: number;
  /** the tight shut-off, mm */
  shutOffMm: number;
  /** the flow with the float on its pin, L/h */
  openLph: number;
}

const GAP_POINTS = 28;
/** The previous point's flow times this bounds the next solve from above (the solver's tolerance is 1e-9). */
const ABOVE_LAST_FLOW = 1 + 1e-6;
const CONTACT_POINTS = 12;

/**
 * The valve's characteristic Q(L) at one tank head: the flow it passes at each water level.
 *
 * Free gap (h >= h_c): for a gap h the float bottom sits at z_touch - (h - h_c) and the water
 * pushes the pad down with F_w(h) (gapFlow); the float balances it at the depth z(F_w)
 * (depthForForceMm: rho g V_sub(z) = F + m g), so L(h) = z_touch - (h - h_c) + z(F_w(h)), Q = Q(h).
 * The gap is marched from the travel (float on its pin) down to h_c geometrically: no nested
 * root search for the level, only the flow's one bisection per point.
 * Contact (modelling choice): from push F_c = F_w(h_c) to F_s = sealForceN(H) the pad rests on the lip;
 * with s = (F - F_c)/(F_s - F_c) the pad is squeezed s delta (the float rises s delta) and the leak
 * passes an equivalent film gap h_c (1 - s), so the flow falls monotonically to zero exactly at the
 * tight seal, where L = z_touch + delta + z(F_s) (the sizing's shut-off level).
 * On a lever the float moves `floatPerPad` times as far as the pad (small turns) and pushes what holds the
 * pad's force through the arm (`floatPushN`): L(h) = z_touch - ratio (h - h_c) + z(F_float(F_w(h))).
 * Q(L) is made non-increasing by a running minimum from the closed end (it already is whenever the
 * jet's momentum grows slower with the gap than the float's buoyancy, rho g A_f per metre).
 *
 * Example: rooftop-tubs at full tank: open 55 L/h with the float on its pin; first contact
 * some 20 mm below the tight shut-off at the target.
 * Source: float force balance (Archimedes) with the gap's film and curtain laws (gapFlow).
 */
export function valveCharacteristic(o: CharacteristicOptions): Characteristic {
  // The push never counts above the tight seal's force: a bench fit (or the gasket form) below the film's
  // p A_film says the pad holds with less, and the float is only sized to give that (with its reserve).
  const ratio = o.floatPerPad ?? 1;
  const push = o.floatPushN ?? ((f: number) => f);
  const depth = (forceN: number) => depthForForceMm(o.float, push(Math.min(Math.max(0, forceN), o.sealForceN)), o.floatMassKg, o.line.densityKgM3);
  const hc = CONTACT_GAP_M;
  // the gap at the pad: the float's travel from its rest to the first touch, over the ratio
  const travelM = Math.max(hc * 2, ((o.touchBottomMm - o.restBottomMm) * 1e-3) / ratio + hc);
  const raw: CharacteristicPoint[] = [];
  // the gap only narrows from point to point, so each flow is below the one before: that flow (a hair above,
  // clear of the solver's tolerance) bounds the next solve
  let last: { gapM: number; forceN: number; flowM3s: number } = { gapM: NaN, forceN: NaN, flowM3s: Infinity };
  for (let i = 0; i <= GAP_POINTS; i++) {
    const h = travelM * (hc / travelM) ** (i / GAP_POINTS);
    const g = gapFlow(o.line, o.lip, h, last.flowM3s * ABOVE_LAST_FLOW);
    last = { gapM: h, forceN: g.forceN, flowM3s: g.flowM3s };
    raw.push({ levelMm: o.touchBottomMm - (h - hc) * 1e3 * ratio + depth(g.forceN), flowLph: g.flowM3s * 3.6e6 });
  }
  // the march ends on h_c itself (unless rounding says otherwise): its push is already known
  const contactForceN = Math.min(last.gapM === hc ? last.forceN : gapFlow(o.line, o.lip, hc).forceN, o.sealForceN);
  const contactMm = raw[raw.length - 1]!.levelMm;
  const sealN = o.sealForceN;
  let lastFlowM3s = last.flowM3s;
  for (let i = 1; i <= CONTACT_POINTS; i++) {
    const s = i / CONTACT_POINTS;
    const forceN = contactForceN + s * (sealN - contactForceN);
    if (i < CONTACT_POINTS) lastFlowM3s = gapFlow(o.line, o.lip, hc * (1 - s), lastFlowM3s * ABOVE_LAST_FLOW).flowM3s;
    const flowLph = i === CONTACT_POINTS ? 0 : lastFlowM3s * 3.6e6;
    raw.push({ levelMm: o.touchBottomMm + s * o.indentationMm * ratio + depth(forceN), flowLph });
  }
  // running extremes from the closed end: level never rising, flow never falling, as the gap opens
  const points = raw.slice();
  for (let i = points.length - 2; i >= 0; i--) {
    const next = points[i + 1]!;
    const p = points[i]!;
    points[i] = { levelMm: Math.min(p.levelMm, next.levelMm), flowLph: Math.max(p.flowLph, next.flowLph) };
  }
  return { points, contactMm, shutOffMm: points[points.length - 1]!.levelMm, openLph: points[0]!.flowLph };
}

/**
 * Level at which the characteristic passes a given flow, mm: linear interpolation between its points
 * (flow falling as the level rises). A flow at or above the open flow gives the lowest point's level;
 * zero gives the tight shut-off.
 */
export function levelAtFlowMm(c: Characteristic, flowLph: number): number {
  const p = c.points;
  if (flowLph >= p[0]!.flowLph) return p[0]!.levelMm;
  if (flowLph <= 0) return c.shutOffMm;
  for (let i = 1; i < p.length; i++) {
    const a = p[i - 1]!;
    const b = p[i]!;
    if (b.flowLph <= flowLph) {
      const t = a.flowLph === b.flowLph ? 0 : (a.flowLph - flowLph) / (a.flowLph - b.flowLph);
      return a.levelMm + t * (b.levelMm - a.levelMm);
    }
  }
  return c.shutOffMm;
}

/** Flow at a level, L/h: linear interpolation; below the lowest point, the open flow; at or above the shut-off, 0. */
export function flowAtLevelLph(c: Characteristic, levelMm: number): number {
  const p = c.points;
  if (levelMm <= p[0]!.levelMm) return p[0]!.flowLph;
  for (let i = 1; i < p.length; i++) {
    const a = p[i - 1]!;
    const b = p[i]!;
    if (levelMm <= b.levelMm) {
      const t = b.levelMm === a.levelMm ? 1 : (levelMm - a.levelMm) / (b.levelMm - a.levelMm);
      return a.flowLph + t * (b.flowLph - a.flowLph);
    }
  }
  return 0;
}
