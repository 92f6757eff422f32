/**
 * The parts as mounted (assemblyTransforms), float at rest on the pin and
 * pressed on the nozzle at H_max: no part overlaps another (overlap volumes
 * measured by manifold-3d's intersection), except the two intended contacts:
 * the nozzle's crush ribs bite into the seat (allowed up to their analytic
 * interference volume) and the lip indents the pad at seal (allowed up to the
 * lip disc times the indentation). Radial gap float to bore: DESIGN defaults
 * c_gap 0.75 mm + c_print 0.25 mm (common practice values copied here).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { assemblyTransforms, buildParts, type BuiltParts } from '../../generator/solids/index.ts';
import {
  intersect,
  loadManifold,
  meshToManifold,
  segmentsFor,
  type IndexedMesh,
  type Manifold,
  type ManifoldToplevel,
} from '../../generator/solids/mesh/index.ts';
import { cornersOn, SCALE_EXAMPLE, sizeDoc } from './helpers.ts';
import { transformMesh } from '../../generator/solids/shapes/transform-mesh.ts';

const FLOAT_GAP_MM = 0.75; // DESIGN c_gap, common practice
const PRINT_CLEARANCE_MM = 0.25; // DESIGN c_print, common practice
/** Overlap taken as zero: float32 rounding where faces touch (mm3). */
const CONTACT_MM3 = 5e-3;

const { sizing } = sizeDoc(SCALE_EXAMPLE);
const P = sizing.parts;
let wasm: ManifoldToplevel;
let parts: BuiltParts;

beforeAll(async () => {
  wasm = await loadManifold();
  parts = await buildParts(sizing, { quality: 'preview', withPad: true });
});

function mounted(state: 'rest' | 'seal'): Record<string, IndexedMesh> {
  const t = assemblyTransforms(sizing, state);
  const out: Record<string, IndexedMesh> = {};
  for (const name of ['housing', 'float', 'nozzle', 'pin', 'pad'] as const) out[name] = transformMesh(parts[name] as IndexedMesh, t[name]);
  return out;
}

function overlapMm3(a: IndexedMesh, b: IndexedMesh): number {
  const ma = meshToManifold(wasm, a, 'a');
  const mb = meshToManifold(wasm, b, 'b');
  let both: Manifold | undefined;
  try {
    both = intersect(wasm, ma, mb);
    return both.volume();
  } finally {
    both?.delete();
    ma.delete();
    mb.delete();
  }
}

/** Crush ribs past the seat: each rib is a triangle (base b, height h) whose tip beyond the seat (h - c) is a similar triangle. */
function ribInterferenceMm3(): number {
  const n = P.nozzle;
  const c = (P.housing.seatBoreMm - n.collarDiameterMm) / 2;
  const h = n.crushRibs.heightMm;
  const b = n.crushRibs.baseWidthMm;
  return n.crushRibs.count * 0.5 * b * ((h - c) ** 2 / h) * n.collarLengthMm;
}

describe.each(['rest', 'seal'] as const)('assembly at %s', (state) => {
  it('no two parts overlap, except the crush ribs in the seat and the lip in the pad at seal', () => {
    const m = mounted(state);
    const names = Object.keys(m);
    for (let i = 0; i < names.length; i++) {
      for (let j = i + 1; j < names.length; j++) {
        const [a, b] = [names[i], names[j]];
        const v = overlapMm3(m[a], m[b]);
        const pair = `${a}+${b}`;
        if (pair === 'housing+nozzle') {
          expect(v, pair).toBeGreaterThan(0);
          expect(v, pair).toBeLessThanOrEqual(ribInterferenceMm3() * 1.02 + CONTACT_MM3);
        } else if (pair === 'nozzle+pad' && state === 'seal') {
          const lipMm3 = Math.PI * (P.nozzle.lipDiameterMm / 2) ** 2 * sizing.seal.indentationMm;
          expect(v, pair).toBeGreaterThan(0);
          expect(v, pair).toBeLessThanOrEqual(lipMm3 * 1.01);
        } else {
          expect(v, pair).toBeLessThan(CONTACT_MM3);
        }
      }
    }
  });

  it('the float clears the bore by the functional gap plus the print clearance all round', () => {
    const m = mounted(state);
    const f = m.float.positions;
    let zLo = Infinity;
    let zHi = -Infinity;
    let floatR = 0;
    for (let i = 0; i < f.length; i += 3) {
      floatR = Math.max(floatR, Math.hypot(f[i], f[i + 1]));
      zLo = Math.min(zLo, f[i + 2]);
    }
    // the straight side; above it the collar runs in its own sleeve (the guide test)
    zHi = zLo + P.float.cylinderHeightMm;
    // nearest approach of the housing to the axis within the float's height: distance from the axis to each
    // triangle's plan view (its projection on z = 0), over the triangles that reach into that height band
    const h = m.housing;
    let nearest = Infinity;
    for (let t = 0; t < h.indices.length; t += 3) {
      const v = [0, 1, 2].map((k) => 3 * h.indices[t + k]);
      const zs = v.map((i) => h.positions[i + 2]);
      if (Math.max(...zs) <= zLo || Math.min(...zs) >= zHi) continue;
      const xy = v.map((i) => [h.positions[i], h.positions[i + 1]] as [number, number]);
      nearest = Math.min(nearest, distanceToTriangle2d(xy));
    }
    expect(nearest - floatR).toBeGreaterThanOrEqual(FLOAT_GAP_MM + PRINT_CLEARANCE_MM - 1e-4);
  });

  it('the pad pocket sits centred under the nozzle face: the pad covers the lip wherever the float drifts', () => {
    const m = mounted(state);
    const rLip = P.nozzle.lipDiameterMm / 2;
    expect(P.float.padDiameterMm / 2).toBeGreaterThanOrEqual(rLip + FLOAT_GAP_MM + PRINT_CLEARANCE_MM);
    let padTop = -Infinity;
    for (let i = 2; i < m.pad.positions.length; i += 3) padTop = Math.max(padTop, m.pad.positions[i]);
    let tip = Infinity;
    for (let i = 2; i < m.nozzle.positions.length; i += 3) tip = Math.min(tip, m.nozzle.positions[i]);
    expect(tip).toBeCloseTo(P.mount.nozzleTipZMm, 4);
    if (state === 'seal') expect(padTop - tip).toBeCloseTo(sizing.seal.indentationMm, 4); // the pad is indented by delta
    else expect(tip - padTop).toBeCloseTo(sizing.nozzle.travelMm, 4); // open by the travel s
  });
});

describe('nozzle sealing face', () => {
  it('is the lowest face, flat on the bed, and only the lip ring (N-gon area, elementary geometry)', () => {
    const n = parts.nozzle!;
    const p = n.positions;
    let minZ = Infinity;
    for (let i = 2; i < p.length; i += 3) minZ = Math.min(minZ, p[i]);
    expect(minZ).toBe(0);
    let faceArea = 0;
    for (let t = 0; t < n.indices.length; t += 3) {
      const [a, b, c] = [0, 1, 2].map((k) => 3 * n.indices[t + k]);
      const onBed = [a, b, c].filter((v) => p[v + 2] === 0).length;
      if (onBed < 3) continue;
      const ux = p[b] - p[a], uy = p[b + 1] - p[a + 1], vx = p[c] - p[a], vy = p[c + 1] - p[a + 1];
      const cross = ux * vy - uy * vx; // z of the normal (times 2 area)
      expect(cross).toBeLessThan(0); // faces straight down
      faceArea += -cross / 2;
    }
    const k = cornersOn(segmentsFor(P.nozzle.shoulderDiameterMm / 2, 'preview'));
    const ring = k * Math.PI * ((P.nozzle.lipDiameterMm / 2) ** 2 - (P.nozzle.orificeMm / 2) ** 2);
    expect(faceArea / ring).toBeCloseTo(1, 5);
    // nothing else of the nozzle comes within a tenth of a millimetre of the bed outside the lip
    for (let i = 0; i < p.length; i += 3) {
      if (p[i + 2] < 0.1) expect(Math.hypot(p[i], p[i + 1])).toBeLessThanOrEqual(P.nozzle.lipDiameterMm / 2 + 1e-5);
    }
  });
});

/** Distance from the origin to a 2D triangle (0 inside). */
function distanceToTriangle2d(t: [number, number][]): number {
  const [a, b, c] = t;
  const side = (p: number[], q: number[]) => p[0] * q[1] - p[1] * q[0]; // which side of edge p->q the origin is on
  const s1 = side(a, b), s2 = side(b, c), s3 = side(c, a);
  const area = (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);
  if (area !== 0 && ((s1 >= 0 && s2 >= 0 && s3 >= 0) || (s1 <= 0 && s2 <= 0 && s3 <= 0))) return 0;
  return Math.min(segmentDistance(a, b), segmentDistance(b, c), segmentDistance(c, a));
}

function segmentDistance(p: number[], q: number[]): number {
  const dx = q[0] - p[0];
  const dy = q[1] - p[1];
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, -(p[0] * dx + p[1] * dy) / len2));
  return Math.hypot(p[0] + t * dx, p[1] + t * dy);
}
