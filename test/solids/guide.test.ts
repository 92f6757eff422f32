/**
 * The guide near the pad, checked on the meshes (DESIGN "Tilt, guide and
 * stability": "check it on the meshes, not only by formula").
 *
 * Tilt: the float, pressed on the lip at the tight seal, is turned about the pad
 * face's centre inside the assembled housing (export quality), in a few
 * directions. For each tilt the test finds, by bisection on overlap volumes
 * (manifold-3d intersections), how far the pad centre may slide either way
 * before the float's bottom rim meets the bore or its collar meets the sleeve;
 * the largest tilt that leaves any such position is the mesh's worst tilt.
 * It must agree with the sizing's tilt.maxAngleDeg within the room the facets
 * add: parts are N-gons whose corners lie on the nominal circle (float) or whose
 * flats do (bore, sleeve), so the mesh is never tighter than the nominal shape and
 * looser by at most the sagitta r (1 - cos(pi/N)) (corners) or r (1/cos(pi/N) - 1)
 * (flats) at each of the four contacts (elementary geometry); spread over the
 * collar-to-rim height H that is sum / H radians, plus 0.02 deg for the
 * bisections and the overlap threshold.
 *
 * Hard stop: raised straight up from the seal, the float meets the housing's stop
 * ring when the pad is indented tilt.hardStopIndentationMm, not before.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { assemblyTransforms, buildParts } from '../../generator/solids/index.ts';
import {
  holePolygonRadiusMm,
  loadManifold,
  meshToManifold,
  segmentsFor,
  type IndexedMesh,
  type Manifold,
  type ManifoldToplevel,
} from '../../generator/solids/mesh/index.ts';
import { asMat4, fromRows, transformMesh } from '../../generator/solids/shapes/transform-mesh.ts';
import { sizePreset } from './helpers.ts';

/** Overlap volume taken as no contact: float32 rounding where faces touch, mm3. */
const CONTACT_MM3 = 1e-3;
const DEG = Math.PI / 180;

let wasm: ManifoldToplevel;
beforeAll(async () => {
  wasm = await loadManifold();
});

interface Rig {
  float: Manifold;
  lowerBack: Manifold; // housing below the sleeve's mouth, on the -u side
  upperFront: Manifold; // housing from the mouth up, on the +u side
  upperBack: Manifold;
  housing: Manifold;
  pivot: [number, number, number];
  release(): void;
}

function overlap(a: Manifold, b: Manifold): number {
  const both = wasm.Manifold.intersection(a, b);
  try {
    return both.volume();
  } finally {
    both.delete();
  }
}

/** The float turned by theta about the pivot around the horizontal axis across u, then slid x along u. */
function placed(rig: Rig, u: [number, number], theta: number, x: number): Manifold {
  // rotation about a = (-u_y, u_x, 0): points below the pivot swing towards -u (as in guidedTilt)
  const [ax, ay] = [-u[1], u[0]];
  const c = Math.cos(theta);
  const s = Math.sin(theta);
  const k = 1 - c;
  const r0 = [c + ax * ax * k, ax * ay * k, ay * s];
  const r1 = [ay * ax * k, c + ay * ay * k, -ax * s];
  const r2 = [-ay * s, ax * s, c];
  const [px, py, pz] = rig.pivot;
  const rp = [0, 1, 2].map((i) => [r0, r1, r2][i][0] * px + [r0, r1, r2][i][1] * py + [r0, r1, r2][i][2] * pz);
  const t = [px + x * u[0] - rp[0], py + x * u[1] - rp[1], pz - rp[2]];
  return rig.float.transform(asMat4(fromRows(r0, r1, r2, t)));
}

function touches(rig: Rig, part: Manifold, u: [number, number], theta: number, x: number): boolean {
  const f = placed(rig, u, theta, x);
  try {
    return overlap(f, part) > CONTACT_MM3;
  } finally {
    f.delete();
  }
}

/** Smallest x in [-3, 3] mm clear of `part` (overlap falls as x grows); Infinity when none. */
function lowestClear(rig: Rig, part: Manifold, u: [number, number], theta: number): number {
  if (touches(rig, part, u, theta, 3)) return Infinity;
  let lo = -3;
  let hi = 3;
  if (!touches(rig, part, u, theta, lo)) return lo;
  for (let i = 0; i < 12; i++) {
    const mid = (lo + hi) / 2;
    if (touches(rig, part, u, theta, mid)) lo = mid;
    else hi = mid;
  }
  return hi;
}

function highestClear(rig: Rig, part: Manifold, u: [number, number], theta: number): number {
  if (touches(rig, part, u, theta, -3)) return -Infinity;
  let lo = -3;
  let hi = 3;
  if (!touches(rig, part, u, theta, hi)) return hi;
  for (let i = 0; i < 12; i++) {
    const mid = (lo + hi) / 2;
    if (touches(rig, part, u, theta, mid)) hi = mid;
    else lo = mid;
  }
  return lo;
}

/** The pad positions [lo, hi] that leave the tilted float clear of the bore, sleeve and stop ring. */
function clearRange(rig: Rig, u: [number, number], theta: number): [number, number] {
  const lo = Math.max(lowestClear(rig, rig.lowerBack, u, theta), lowestClear(rig, rig.upperBack, u, theta));
  const hi = highestClear(rig, rig.upperFront, u, theta);
  return [lo, hi];
}

const PRESETS = ['rooftop-tubs.json', 'bucket-tote.json'];

describe.each(PRESETS)('%s: the guided float on the meshes', (file) => {
  const { sizing } = sizePreset(file);
  const P = sizing.parts;
  let rig: Rig;

  beforeAll(async () => {
    const parts = await buildParts(sizing, { quality: 'export' });
    const t = assemblyTransforms(sizing, 'seal');
    const f = P.float;
    const deltaMm = sizing.seal.indentationMm;
    const pivotZ = P.mount.floatSealZMm + f.heightMm + f.padProudMm - deltaMm;
    const floatM = meshToManifold(wasm, transformMesh(parts.float!, t.float), 'float');
    const housing = meshToManifold(wasm, transformMesh(parts.housing as IndexedMesh, t.housing), 'housing');
    rig = { float: floatM, housing, pivot: [0, 0, pivotZ] } as Rig;
    rig.release = () => {
      for (const m of [rig.float, rig.housing, rig.lowerBack, rig.upperFront, rig.upperBack]) m?.delete();
    };
  });

  /** Cut the housing at the sleeve's mouth and across u (manifold-3d splitByPlane). */
  function split(u: [number, number]): void {
    for (const m of [rig.lowerBack, rig.upperFront, rig.upperBack]) m?.delete();
    const [upper, lower] = rig.housing.splitByPlane([0, 0, 1], P.housing.guide.mouthZMm - 0.05);
    const [lowerFront, lowerBack] = lower.splitByPlane([u[0], u[1], 0], 0);
    const [upperFront, upperBack] = upper.splitByPlane([u[0], u[1], 0], 0);
    for (const m of [upper, lower, lowerFront]) m.delete();
    Object.assign(rig, { lowerBack, upperFront, upperBack });
  }

  it.each([0, 90, 200])('turned towards %s degrees, it first meets the bore and the sleeve at the reported tilt', (phiDeg) => {
    const u: [number, number] = [Math.cos(phiDeg * DEG), Math.sin(phiDeg * DEG)];
    split(u);
    const feasible = (theta: number) => {
      const [lo, hi] = clearRange(rig, u, theta);
      return lo <= hi;
    };
    const reported = sizing.tilt.maxAngleDeg * DEG;
    let lo = 0;
    let hi = reported + 1.5 * DEG;
    expect(feasible(lo)).toBe(true);
    expect(feasible(hi)).toBe(false);
    for (let i = 0; i < 12; i++) {
      const mid = (lo + hi) / 2;
      if (feasible(mid)) lo = mid;
      else hi = mid;
    }
    // the room the facets add at the four contacts (module comment)
    const R = P.float.outerDiameterMm / 2;
    const nFloat = segmentsFor(R, 'export');
    const nHousing = segmentsFor(P.housing.foot.outerDiameterMm / 2, 'export');
    const corner = (r: number, n: number) => r * (1 - Math.cos(Math.PI / n));
    const flat = (r: number, n: number) => holePolygonRadiusMm(r, n) - r;
    const room =
      2 * corner(R, nFloat) + // the rim, and the collar's own N-gon at the same count
      corner(P.float.plateauRadiusMm, nFloat) +
      flat(P.housing.boreMm / 2, nHousing) +
      flat(P.housing.guide.boreMm / 2, nHousing);
    const slack = room / P.float.heightMm + 0.02 * DEG;
    if (process.env.FW_GUIDE_REPORT) console.log(`${file} ${phiDeg} deg: mesh ${(lo / DEG).toFixed(3)} deg, reported ${(reported / DEG).toFixed(3)} deg, facet room ${(slack / DEG).toFixed(3)} deg`);
    expect(lo).toBeGreaterThanOrEqual(reported - 0.02 * DEG);
    expect(lo).toBeLessThanOrEqual(reported + slack);
    // and at the mesh's worst tilt the whole float is clear of the whole housing somewhere in the range
    const [xLo, xHi] = clearRange(rig, u, lo);
    const f = placed(rig, u, lo, (xLo + xHi) / 2);
    try {
      // (each of the up to three contacts was allowed just under the threshold)
      expect(overlap(f, rig.housing)).toBeLessThan(3 * CONTACT_MM3);
    } finally {
      f.delete();
    }
    // untilted, the pad slides across the sleeve's play: the reported pad offset's first term
    const [x0, x1] = clearRange(rig, u, 0);
    expect(x1).toBeGreaterThanOrEqual(sizing.tilt.guidePlayMm - 0.01);
    expect(-x0).toBeGreaterThanOrEqual(sizing.tilt.guidePlayMm - 0.01);
    expect(Math.max(x1, -x0)).toBeLessThanOrEqual(sizing.tilt.padOffsetMm + room + 0.01);
  });

  it('raised straight up from the seal, the float lands on the stop ring at the hard-stop indentation', () => {
    const gap = sizing.tilt.hardStopIndentationMm - sizing.seal.indentationMm;
    const at = (dz: number) => {
      const m = rig.float.translate([0, 0, dz]);
      try {
        const both = wasm.Manifold.intersection(m, rig.housing);
        try {
          return { volume: both.volume(), box: both.boundingBox() };
        } finally {
          both.delete();
        }
      } finally {
        m.delete();
      }
    };
    expect(at(gap - 0.01).volume).toBeLessThan(CONTACT_MM3);
    const past = at(gap + 0.02);
    expect(past.volume).toBeGreaterThan(CONTACT_MM3);
    // where it lands: the stop ring's face, around the collar's top
    expect(past.box.min[2]).toBeGreaterThanOrEqual(P.housing.guide.stopZMm - 0.03);
    expect(past.box.max[2]).toBeLessThanOrEqual(P.housing.guide.stopZMm + 0.03);
    rig.release();
  });
});
