/**
 * Invariants a sized design must keep, written from first principles so they
 * check the sizing core from outside, and the mesh checks for its parts.
 * Used by the property tests (fast-check) and by the soak runner; each
 * function returns a list of problems (empty: all good) instead of throwing,
 * so the soak can count them.
 *
 * Sources:
 * - Archimedes' principle: full-submersion lift F = (rho V_f - m_f) g.
 * - Hydrostatics: closing force rho g H (pi/4) d_s^2 + F_pre; the shut-off level
 *   at H_min lies (H_max - H_min) A_seal / A_float below the one at H_max
 *   while the water line is on the float's straight side (DESIGN "Vertical layout").
 * - Orifice equation A_d = Q / (C_d sqrt(2 g dh)), C_d = 0.61 (standard texts, from memory).
 * - Frustum volume (pi h / 3)(R^2 + R r + r^2) (elementary geometry).
 * - manifold-3d as the independent mesh check (its own status and volume), and
 *   a count of edge uses (3MF core specification: every edge used twice).
 * Design rules copied from DESIGN.md: c_gap 0.75 mm + c_print 0.25 mm (common practice),
 * travel s >= max(d_o / 2, 1.5 mm), at least two vents of 3 mm, parts at most 250 mm,
 * at most 200,000 triangles a part.
 */
import { transformMesh } from '../../generator/solids/shapes/transform-mesh.ts';
import type { DesignInputs } from '../../generator/sizing/inputs.ts';
import type { DirectSizing, LeverSizing, SizingResult, SizingSuccess, WayOut } from '../../generator/sizing/result.ts';
import { parseDesign } from '../../generator/doc/schema.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import { headsDefineSlope } from '../../generator/sizing/hydrostatics/fit-seal-calibration.ts';
import { setPath, type DesignSpec } from './arbitraries.ts';
import {
  countEdgeUses,
  intersect,
  meshBounds,
  meshToManifold,
  meshVolumeMm3,
  triangleCount,
  type IndexedMesh,
  type Manifold,
  type ManifoldToplevel,
} from '../../generator/solids/mesh/index.ts';

export const G = 9.80665; // NIST SP 330
const C_D = 0.61; // sharp-edged orifice, standard texts (from memory)
const DRAIN_DH_M = 0.002; // DESIGN: 2 mm
const RADIAL_GAP_MM = 0.75 + 0.25; // DESIGN c_gap + c_print (common practice)
export const PART_CAP_MM = 250; // DESIGN "Caps"
export const TRIANGLE_CAP = 200_000; // DESIGN "Caps"
/** Shut-off at H_max must equal the target within this (issue 6). */
export const SHUT_OFF_TOLERANCE_MM = 0.5;

/** Every number anywhere in a value (path -> number) that is not finite. */
export function nonFinite(value: unknown, path = '', out: string[] = [], depth = 0): string[] {
  if (depth > 20) return out;
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) out.push(`${path || '(value)'} = ${value}`);
  } else if (Array.isArray(value)) {
    value.forEach((v, i) => nonFinite(v, `${path}[${i}]`, out, depth + 1));
  } else if (value && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) nonFinite(v, path ? `${path}.${k}` : k, out, depth + 1);
  }
  return out;
}

/** Text for a non-finite number in a message: "NaN", "Infinity" (never in output). */
export const NON_FINITE_TEXT = /\bNaN\b|\bInfinity\b|undefined|\[object Object\]/;

function frustumMm3(h: number, R: number, r: number): number {
  return (Math.PI * h * (R * R + R * r + r * r)) / 3;
}

/** Invariants of a successful sizing (hydrostatics, Archimedes, DESIGN rules). */
export function checkSized(inp: DesignInputs, s: SizingSuccess): string[] {
  const p: string[] = [];
  const expect = (ok: boolean, what: string) => {
    if (!ok) p.push(what);
  };
  const bad = nonFinite(s).filter((x) => !/fillTime/.test(x));
  if (bad.length) p.push(`non-finite numbers: ${bad.slice(0, 5).join(', ')}`);
  for (const w of [...s.warnings]) expect(!NON_FINITE_TEXT.test(w.message), `warning text: ${w.message}`);

  // shut-off at H_max equals the target (the design places z_tip so)
  expect(Math.abs(s.levels.shutOffAtHeadMaxMm - inp.targetLevelM * 1e3) <= SHUT_OFF_TOLERANCE_MM,
    `shut-off at H_max ${s.levels.shutOffAtHeadMaxMm} mm vs target ${inp.targetLevelM * 1e3} mm`);

  // closing force for a tight seal, when not calibrated: the gasket-factor form of ASME BPVC VIII-1 Mandatory
  // Appendix 2, G = (d_o + d_s)/2, b = (d_s - d_o)/4, F = p (pi/4 G^2 + 2 pi b G m) + F_seat with
  // F_seat = max(y pi G 2b, E (0.2 mm / t_pad) pi G 2b) (seating by 0.2 mm: our stated choice), m, y, E from the pad
  const rho = inp.liquidDensityKgM3;
  if (inp.calibration.length === 0) {
    const Gm = (inp.orificeM + inp.sealDiameterM) / 2;
    const b = (inp.sealDiameterM - inp.orificeM) / 4;
    const ring = Math.PI * Gm * 2 * b;
    const seat = Math.max(s.seal.seatingStressKpa * 1e3 * ring, s.seal.padStiffnessKpa * 1e3 * (0.2e-3 / inp.padThicknessM) * ring);
    const f = rho * G * inp.headMaxM * ((Math.PI / 4) * Gm * Gm + 2 * Math.PI * b * Gm * s.seal.gasketFactor) + seat;
    expect(Math.abs(s.closingForce.atHeadMaxN - f) <= 1e-9 * Math.max(1, f), `closing force ${s.closingForce.atHeadMaxN} N vs gasket-factor form ${f} N`);
  }
  // the pad never leans on its stop at the tight seal; in service it sees at most 25 % (the stop)
  expect(s.seal.indentationMm <= s.seal.stopIndentationMm + 1e-9, `pad squeezed ${s.seal.indentationMm} mm at seal, past the stop ${s.seal.stopIndentationMm} mm`);
  expect(s.seal.worstStrain <= 0.25 + 1e-12, `worst pad strain ${s.seal.worstStrain}`);
  // leak tolerance (Archimedes): (F_avail - F_seal(H_max)) / (rho g); on a lever the float's own push at the seal
  const floatNeedsN = s.architecture === 'lever' ? s.lever.floatPushAtHeadMaxN : s.closingForce.atHeadMaxN;
  const leak = ((s.float.availableForceN - floatNeedsN) / (rho * G)) * 1e6;
  expect(Math.abs(leak - s.float.leakToleranceMl) <= 1e-9 * Math.max(1, leak), `leak tolerance ${s.float.leakToleranceMl} mL vs ${leak} mL`);
  expect(s.closingForce.atHeadMaxN > 0, `closing force ${s.closingForce.atHeadMaxN} N is not positive`);

  // float envelope volume, cylinder plus frustum plus collar cylinder (geometry), against the sizing's
  const fs = s.parts.float;
  const R = fs.outerDiameterMm / 2;
  const vf = Math.PI * R * R * fs.cylinderHeightMm + frustumMm3(fs.coneHeightMm, R, fs.plateauRadiusMm) + Math.PI * fs.plateauRadiusMm ** 2 * fs.collarHeightMm;
  expect(Math.abs(vf - s.float.volumeMm3) <= 1e-6 * vf, `float volume ${s.float.volumeMm3} mm3 vs cylinder + frustum + collar ${vf} mm3`);
  // Archimedes: lift at full submersion, and the reserve over the force needed at H_max
  const lift = (rho * vf * 1e-9 - s.float.massG * 1e-3) * G;
  expect(Math.abs(lift - s.float.availableForceN) <= 1e-6 * Math.max(1, Math.abs(lift)), `lift ${s.float.availableForceN} N vs Archimedes ${lift} N`);
  // the pad force the full lift gives (through the arm on a lever) is the reserve times the force needed at H_max
  const liftAtPad = s.architecture === 'lever' ? s.lever.padForceFromPush.perNewton * lift + s.lever.padForceFromPush.offsetN : lift;
  expect(liftAtPad >= inp.reserve * s.closingForce.atHeadMaxN * (1 - 1e-9), `reserve: ${liftAtPad} N at the pad < ${inp.reserve} x ${s.closingForce.atHeadMaxN} N`);
  // the seal at H_max happens on the straight side
  expect(s.float.sealDepthAtHeadMaxMm <= fs.cylinderHeightMm + 1e-9, `seal depth ${s.float.sealDepthAtHeadMaxMm} mm above the cylinder ${fs.cylinderHeightMm} mm`);
  expect(s.float.sealDepthAtHeadMaxMm > 0, 'seal depth not positive');

  // shut-off at H_min: lower by (H_max - H_min) A_seal / A_float (closed form)
  const aFloat = Math.PI * R * R;
  const drop =
    s.architecture === 'lever'
      ? ((s.lever.floatPushAtHeadMaxN - s.lever.floatPushAtHeadMinN) / (rho * G * aFloat * 1e-6)) * 1e3
      : (inp.headMaxM - inp.headMinM) * 1e3 * (s.closingForce.sealAreaMm2 / aFloat);
  const dropSeen = s.levels.shutOffAtHeadMaxMm - s.levels.shutOffAtHeadMinMm;
  expect(Math.abs(dropSeen - drop) <= 1e-3 + 1e-6 * drop, `shut-off drop H_max -> H_min ${dropSeen} mm vs closed form ${drop} mm`);

  // travel s >= max(d_o / 2, 1.5 mm) and the layout that defines it
  const minTravel = Math.max((inp.orificeM * 1e3) / 2, 1.5);
  expect(s.nozzle.travelMm >= minTravel - 1e-9, `travel ${s.nozzle.travelMm} mm < ${minTravel} mm`);
  // levels in order: lift-off, first touch, shut-off at H_min, at H_max
  const L = s.levels;
  expect(L.liftOffMm <= L.firstTouchMm + 1e-9 && L.firstTouchMm <= L.shutOffAtHeadMinMm + 1e-9 && L.shutOffAtHeadMinMm <= L.shutOffAtHeadMaxMm + 1e-9,
    `levels out of order: lift-off ${L.liftOffMm}, first touch ${L.firstTouchMm}, shut-off ${L.shutOffAtHeadMinMm} / ${L.shutOffAtHeadMaxMm}`);
  expect(L.minimumReachableMm <= inp.targetLevelM * 1e3 + 1e-6, `target ${inp.targetLevelM * 1e3} below the minimum reachable ${L.minimumReachableMm}`);

  expect(s.flow.atHeadMaxLph > 0 && s.flow.atHeadMinLph > 0 && s.flow.atHeadMinLph <= s.flow.atHeadMaxLph * (1 + 1e-9), `flows ${s.flow.atHeadMinLph} / ${s.flow.atHeadMaxLph} L/h`);

  // the characteristic: level never falling, flow never rising, zero at the tight shut-off (the float can only
  // push harder as the water rises: Archimedes); the level held at the demand between the first point and the shut-off
  for (const [pts, shut] of [[s.characteristic.headMax, L.shutOffAtHeadMaxMm], [s.characteristic.headMin, L.shutOffAtHeadMinMm]] as const) {
    expect(pts.length >= 20, `characteristic of ${pts.length} points`);
    for (let k = 1; k < pts.length; k++) {
      expect(pts[k]!.levelMm >= pts[k - 1]!.levelMm && pts[k]!.flowLph <= pts[k - 1]!.flowLph, `characteristic not monotone at point ${k}`);
    }
    expect(pts.at(-1)!.flowLph === 0 && Math.abs(pts.at(-1)!.levelMm - shut) <= 2e-3, `characteristic ends at ${pts.at(-1)!.levelMm} mm, ${pts.at(-1)!.flowLph} L/h; shut-off ${shut}`);
  }
  expect(L.heldAtDemandMm <= L.shutOffAtHeadMaxMm + 1e-9 && L.heldAtDemandLowTankMm <= L.shutOffAtHeadMinMm + 1e-9, `level held ${L.heldAtDemandMm} / ${L.heldAtDemandLowTankMm} above the shut-off`);
  expect(s.flow.atHeadMaxLowLph <= s.flow.atHeadMaxLph * (1 + 1e-9) && s.flow.atHeadMaxLph <= s.flow.atHeadMaxHighLph * (1 + 1e-9), `flow band ${s.flow.atHeadMaxLowLph} / ${s.flow.atHeadMaxLph} / ${s.flow.atHeadMaxHighLph}`);

  expect(fs.shellMm >= 3 * inp.lineWidthM * 1e3 - 1e-9, `float shell ${fs.shellMm} under three lines`);
  expect(s.footprintMm <= inp.maxOuterDiameterM * 1e3 + 1e-6, `footprint ${s.footprintMm} over the limit ${inp.maxOuterDiameterM * 1e3}`);
  if (s.architecture === 'direct') p.push(...directChecks(inp, s));
  else p.push(...leverChecks(inp, s));
  expect(s.mass.totalG > 0 && s.float.massG > 0, 'masses not positive');
  expect(s.boundBy.length > 0, 'boundBy is empty');
  return p;
}

/** The direct valve's own invariants: the layout from the tip down, the bore's gap, drain and vents, walls and caps. */
function directChecks(inp: DesignInputs, s: DirectSizing): string[] {
  const p: string[] = [];
  const expect = (ok: boolean, what: string) => {
    if (!ok) p.push(what);
  };
  const fs = s.parts.float;
  const padTopRest = s.parts.mount.floatRestZMm + fs.heightMm + fs.padProudMm;
  expect(Math.abs(s.parts.mount.nozzleTipZMm - padTopRest - s.nozzle.travelMm) <= 1e-6, `tip - pad top at rest ${s.parts.mount.nozzleTipZMm - padTopRest} mm vs travel ${s.nozzle.travelMm} mm`);
  const sealBottom = s.parts.mount.nozzleTipZMm - fs.heightMm - fs.padProudMm + s.seal.indentationMm;
  expect(Math.abs(sealBottom - s.parts.mount.floatSealZMm) <= 1e-6, `float bottom at seal ${s.parts.mount.floatSealZMm} vs z_tip - h_f - proud + delta ${sealBottom}`);
  // clearance: bore = D_f + 2 (c_gap + c_print)
  expect(s.housing.boreMm - s.float.outerDiameterMm >= 2 * RADIAL_GAP_MM - 1e-9, `bore ${s.housing.boreMm} vs float ${s.float.outerDiameterMm}: radial gap under ${RADIAL_GAP_MM} mm`);
  expect(s.parts.mount.floatRestZMm >= s.parts.mount.pinTopZMm - 1e-9, 'float rests below the pin top');

  // drain (orifice equation, on the high end of the flow band) and vents
  const q = s.flow.atHeadMaxHighLph / 3.6e6;
  const need = (q / (C_D * Math.sqrt(2 * G * DRAIN_DH_M))) * 1e6;
  expect(Math.abs(s.drain.requiredAreaMm2 - need) <= 1e-6 * Math.max(1, need), `drain required ${s.drain.requiredAreaMm2} vs orifice equation ${need}`);
  expect(s.drain.providedAreaMm2 >= need * (1 - 1e-9), `drain provided ${s.drain.providedAreaMm2} mm2 < required ${need} mm2`);
  expect(s.vents.count >= 2 && s.vents.diameterMm >= 3, `vents ${s.vents.count} x ${s.vents.diameterMm} mm`);
  // walls: housing wall as asked; float shell three lines (DESIGN "Solids")
  expect(Math.abs(s.housing.wallMm - inp.wallM * 1e3) <= 1e-9, `housing wall ${s.housing.wallMm} vs ${inp.wallM * 1e3}`);
  // size caps and the diameter limit
  expect(s.housing.heightMm <= PART_CAP_MM + 1e-9 && s.housing.footDiameterMm <= PART_CAP_MM + 1e-9 && s.parts.pin.lengthMm <= PART_CAP_MM + 1e-9,
    `part over ${PART_CAP_MM} mm: housing ${s.housing.heightMm} x ${s.housing.footDiameterMm}, pin ${s.parts.pin.lengthMm}`);
  expect(s.housing.footDiameterMm <= inp.maxOuterDiameterM * 1e3 + 1e-6, `foot ${s.housing.footDiameterMm} over the limit ${inp.maxOuterDiameterM * 1e3}`);
  return p;
}

/**
 * The lever valve's own invariants: the moment balance about the pivot (Meriam and Kraige, Statics: the float's push
 * at the seal gives the pad exactly the force needed, and without the arm's weight and friction a_f F_f = a_p F_pad
 * would need less), the ratio a_f / a_p, the pad's travel at rest, the caps.
 */
function leverChecks(inp: DesignInputs, s: LeverSizing): string[] {
  const p: string[] = [];
  const expect = (ok: boolean, what: string) => {
    if (!ok) p.push(what);
  };
  const lv = s.lever;
  const padAtSeal = lv.padForceFromPush.perNewton * lv.floatPushAtHeadMaxN + lv.padForceFromPush.offsetN;
  expect(Math.abs(padAtSeal - s.closingForce.atHeadMaxN) <= 1e-9 * Math.max(1, padAtSeal), `pad force from the float's push ${padAtSeal} N vs needed ${s.closingForce.atHeadMaxN} N`);
  expect(lv.floatPushAtHeadMaxN * lv.floatArmMm >= s.closingForce.atHeadMaxN * lv.padArmMm * (1 - 1e-12), `float push ${lv.floatPushAtHeadMaxN} N at ${lv.floatArmMm} mm gives less moment than the pad's ${s.closingForce.atHeadMaxN} N at ${lv.padArmMm} mm`);
  expect(Math.abs(lv.ratio - lv.floatArmMm / lv.padArmMm) <= 1e-12 * lv.ratio, `ratio ${lv.ratio} vs ${lv.floatArmMm} / ${lv.padArmMm}`);
  expect(lv.hysteresisMm >= 0 && lv.frictionTorqueNmm >= 0, `friction band ${lv.hysteresisMm} mm, torque ${lv.frictionTorqueNmm} N mm`);
  const minTravel = Math.max((inp.orificeM * 1e3) / 2, 1.5);
  expect(s.nozzle.travelMm >= minTravel - 1e-9, `pad travel at rest ${s.nozzle.travelMm} mm < ${minTravel} mm`);
  expect(lv.lipGapMm <= s.seal.indentationMm / 2 + 1e-9, `lip gap at first touch ${lv.lipGapMm} mm over half the squeeze`);
  expect(s.frame.heightMm <= PART_CAP_MM + 1e-9 && lv.armLengthMm <= PART_CAP_MM + 1e-9, `part over ${PART_CAP_MM} mm: frame ${s.frame.heightMm}, arm ${lv.armLengthMm}`);
  expect((s.mount === 'rim') === (s.rim !== null) && (s.rim === null || s.rim.adjustMm === 10), `rim ${JSON.stringify(s.rim)} on the ${s.mount}`);
  return p;
}

/** A failed sizing: reasons in words, no non-finite numbers, ways out that name a field. */
export function checkInfeasible(s: Exclude<SizingResult, SizingSuccess>): string[] {
  const p: string[] = [];
  if (s.reasons.length === 0) p.push('no reasons given');
  for (const r of s.reasons) if (!r.message || NON_FINITE_TEXT.test(r.message)) p.push(`reason text: ${r.message}`);
  for (const w of s.waysOut) {
    if (!/^[a-zA-Z.]+$/.test(w.field)) p.push(`way out field ${w.field}`);
    if (NON_FINITE_TEXT.test(w.value) || NON_FINITE_TEXT.test(w.message)) p.push(`way out text: ${w.value} ${w.message}`);
  }
  const bad = nonFinite(s);
  if (bad.length) p.push(`non-finite numbers: ${bad.join(', ')}`);
  return p;
}

/** Each part: closed 2-manifold (edge uses; manifold-3d status), positive volume, on z = 0, under the triangle cap. */
export function checkPartMeshes(wasm: ManifoldToplevel, parts: Record<string, IndexedMesh | undefined>): string[] {
  const p: string[] = [];
  for (const [name, mesh] of Object.entries(parts)) {
    if (!mesh) continue;
    const edges = countEdgeUses(mesh);
    if (!edges.closed || edges.degenerateTriangles > 0) p.push(`${name}: edge uses ${JSON.stringify(edges)}`);
    if (triangleCount(mesh) > TRIANGLE_CAP) p.push(`${name}: ${triangleCount(mesh)} triangles over the cap`);
    const b = meshBounds(mesh);
    if (b.min[2] !== 0) p.push(`${name}: rests at z = ${b.min[2]}, not on the bed`);
    const size = Math.max(b.max[0] - b.min[0], b.max[1] - b.min[1], b.max[2] - b.min[2]);
    if (size > PART_CAP_MM + 1e-3) p.push(`${name}: ${size} mm across, over ${PART_CAP_MM} mm`);
    let m: Manifold | undefined;
    try {
      m = meshToManifold(wasm, mesh, name);
      if (m.status() !== 'NoError') p.push(`${name}: manifold-3d status ${m.status()}`);
      const v = m.volume();
      if (!(v > 0)) p.push(`${name}: manifold-3d volume ${v}`);
      if (Math.abs(v / meshVolumeMm3(mesh) - 1) > 1e-5) p.push(`${name}: volume ${v} (manifold-3d) vs ${meshVolumeMm3(mesh)} (divergence theorem)`);
    } catch (error) {
      p.push(`${name}: ${(error as Error).message}`);
    } finally {
      m?.delete();
    }
  }
  return p;
}

/** Overlap taken as contact: float32 rounding where faces touch, mm3 (as in test/solids/assembly.test.ts). */
const CONTACT_MM3 = 5e-3;

/**
 * No two mounted parts overlap (manifold-3d intersection volumes), except the
 * intended contacts: crush ribs in the seat (bounded by their analytic
 * interference, triangles of base b and height h past the seat clearance c)
 * and, at seal, the lip in the pad (lip disc times the indentation).
 */
export function checkAssembly(
  wasm: ManifoldToplevel,
  sizing: SizingSuccess,
  parts: Record<string, IndexedMesh | undefined>,
  transforms: { rest: Partial<Record<string, number[]>>; seal: Partial<Record<string, number[]>> },
): string[] {
  const p: string[] = [];
  const n = sizing.parts.nozzle;
  // the nozzle's seat: in the housing's deck, or in the lever frame's
  const seat = sizing.architecture === 'direct' ? sizing.parts.housing : sizing.parts.frame;
  const c = (seat.seatBoreMm - n.collarDiameterMm) / 2;
  const h = n.crushRibs.heightMm;
  const ribMm3 = h > c ? n.crushRibs.count * 0.5 * n.crushRibs.baseWidthMm * ((h - c) ** 2 / h) * n.collarLengthMm : 0;
  const lipMm3 = Math.PI * (n.lipDiameterMm / 2) ** 2 * sizing.seal.indentationMm;
  const names = Object.keys(parts).filter((k) => parts[k]);
  for (const state of ['rest', 'seal'] as const) {
    const ms: Record<string, Manifold> = {};
    try {
      for (const name of names) ms[name] = meshToManifold(wasm, transformMesh(parts[name]!, transforms[state][name]!), name);
      for (let i = 0; i < names.length; i++) {
        for (let j = i + 1; j < names.length; j++) {
          const pair = `${names[i]}+${names[j]}`;
          // bounding boxes apart: no overlap (saves the boolean)
          const a = ms[names[i]].boundingBox();
          const b = ms[names[j]].boundingBox();
          if (a.max[0] < b.min[0] || b.max[0] < a.min[0] || a.max[1] < b.min[1] || b.max[1] < a.min[1] || a.max[2] < b.min[2] || b.max[2] < a.min[2]) continue;
          const both = intersect(wasm, ms[names[i]], ms[names[j]]);
          const v = both.volume();
          both.delete();
          let allowed = CONTACT_MM3;
          if (pair === 'housing+nozzle' || pair === 'frame+nozzle') allowed = ribMm3 * 1.02 + CONTACT_MM3;
          if (state === 'seal' && (pair === 'nozzle+pad' || pair === 'float+nozzle')) allowed = lipMm3 * 1.01 + CONTACT_MM3;
          if (v > allowed) p.push(`${state}: ${pair} overlap ${v.toFixed(4)} mm3 (allowed ${allowed.toFixed(4)})`);
        }
      }
    } finally {
      for (const m of Object.values(ms)) m.delete();
    }
  }
  return p;
}

/** Ways out grouped as they are applied: one with its `also`, or the ones that share a message (a pair). */
export function wayOutGroups(waysOut: WayOut[]): { field: string; value: string }[][] {
  const byMessage = new Map<string, { field: string; value: string }[]>();
  for (const w of waysOut) {
    const list = byMessage.get(w.message) ?? [];
    list.push({ field: w.field, value: w.value }, ...(w.also ?? []));
    byMessage.set(w.message, list);
  }
  return [...byMessage.values()];
}

/**
 * Every way out applied to the document it came from gives a document the
 * schema accepts (issue 11: never `nozzle.orifice = -0.8 mm`, never the highest
 * head below the lowest). Returns the problems and how many applied ones size.
 */
export function wayOutProblems(doc: Record<string, unknown>, s: Exclude<SizingResult, SizingSuccess>): { problems: string[]; applied: number; sized: number } {
  const problems: string[] = [];
  let applied = 0;
  let sized = 0;
  for (const changes of wayOutGroups(s.waysOut)) {
    applied++;
    const moved = changes.reduce((d, c) => setPath(d, c.field, c.value), doc);
    const again = parseDesign(moved);
    if (!again.ok) problems.push(`the way out ${JSON.stringify(changes)} is refused: ${JSON.stringify(again.errors)}`);
    else if (sizeDesign(again.inputs).ok) sized++;
  }
  return { problems, applied, sized };
}

/**
 * Whether every problem is a refusal of the bench points: the fit on seal.calibration, or two masses at one
 * head on the later point's mass (generator/doc/same-head-clash.ts).
 */
export function onlyCalibrationRefused(errors: readonly { field: string; message: string }[]): boolean {
  return errors.every((e) => e.field === 'seal.calibration' || (/^seal\.calibration\.\d+\.mass$/.test(e.field) && /at the same head/.test(e.message)));
}

/**
 * Whether a drawn design's bench points may be refused: scattered or random points may fall with head,
 * and one head alone may too, since its fit holds the pad's own seating force, which the drawn line's
 * intercept need not reach (heads counted as written: points off the scale are never weighed).
 */
export function calibrationMayBeRefused(spec: DesignSpec, doc: unknown): boolean {
  if (!spec.calibration) return false;
  const written = ((doc as { seal?: { calibration?: { head: unknown }[] } }).seal?.calibration ?? []).map((p) => p.head);
  // heads less than 1 % apart count as one head (headsDefineSlope, the fit's own rule)
  const oneHead = !headsDefineSlope(written.map((h) => ({ headM: Number(h) })));
  return spec.calibration.line === null || spec.calibration.line.scatter > 0 || oneHead;
}
