/**
 * TEMPORARY stand-in for generator/solids (the real part builders): each part
 * as a solid of revolution from its main sizing numbers, closed and welded,
 * so the workbench and its exports work until the real builders land.
 * No holes, vents or notches; the float is solid. Same contract as the real module.
 */
import type { SizingSuccess } from '../../generator/sizing/result.ts';
import type { FloatPose, IndexedMesh, PartMeshes, PartTransforms } from './parts-contract.ts';

/**
 * Revolves a closed profile [r, z][] (counter-clockwise in the r-z plane, r >= 0)
 * about the z axis. Points on the axis become one shared vertex, so the mesh is
 * closed: every edge used twice.
 */
export function lathe(profile: readonly (readonly [number, number])[], segments: number): IndexedMesh {
  const positions: number[] = [];
  const indices: number[] = [];
  const ring: number[] = []; // first vertex index of each profile point
  for (const [r, z] of profile) {
    ring.push(positions.length / 3);
    if (r === 0) positions.push(0, 0, z);
    else
      for (let j = 0; j < segments; j++) {
        const a = (2 * Math.PI * j) / segments;
        positions.push(r * Math.cos(a), r * Math.sin(a), z);
      }
  }
  const at = (i: number, j: number) => (profile[i][0] === 0 ? ring[i] : ring[i] + (j % segments));
  const n = profile.length;
  for (let i = 0; i < n; i++) {
    const k = (i + 1) % n;
    if (profile[i][0] === 0 && profile[k][0] === 0) continue;
    for (let j = 0; j < segments; j++) {
      const a = at(i, j), b = at(k, j), c = at(k, j + 1), d = at(i, j + 1);
      // profile runs counter-clockwise in (r, z); sweeping by +angle, (a, c, b) faces outward
      if (profile[i][0] !== 0 && profile[k][0] !== 0) indices.push(a, c, b, a, d, c);
      else if (profile[i][0] === 0) indices.push(a, c, b);
      else indices.push(a, d, b);
    }
  }
  return { positions: new Float32Array(positions), indices: new Uint32Array(indices) };
}

function segmentsFor(rMm: number, quality: 'preview' | 'export'): number {
  const chord = quality === 'export' ? 0.05 : 0.3;
  return Math.min(256, Math.max(12, Math.ceil(Math.PI / Math.acos(1 - chord / Math.max(rMm, chord)))));
}

/** Flip a mesh upside down (rotate 180 degrees about x) and rest it on z = 0. */
function flipOnBed(mesh: IndexedMesh, heightMm: number): IndexedMesh {
  const p = mesh.positions.slice();
  for (let i = 0; i < p.length; i += 3) {
    p[i + 1] = -p[i + 1];
    p[i + 2] = heightMm - p[i + 2];
  }
  return { positions: p, indices: mesh.indices.slice() };
}

/** Lay a z-axis mesh on its side (axis along x), resting on z = 0. */
function layOnSide(mesh: IndexedMesh, radiusMm: number): IndexedMesh {
  const p = mesh.positions.slice();
  for (let i = 0; i < p.length; i += 3) {
    const [x, y, z] = [p[i], p[i + 1], p[i + 2]];
    p[i] = z;
    p[i + 1] = y;
    p[i + 2] = radiusMm - x; // rotate about y by +90 deg keeps the orientation
  }
  return { positions: p, indices: mesh.indices.slice() };
}

export async function buildParts(sizing: SizingSuccess, opts: { quality: 'preview' | 'export' }): Promise<PartMeshes> {
  const { housing: h, float: f, nozzle: n, pin } = sizing.parts;
  const q = opts.quality;
  const ro = h.outerDiameterMm / 2, rb = h.boreMm / 2, rs = h.seatBoreMm / 2, rf = h.foot.outerDiameterMm / 2;
  const ft = h.foot.flangeThicknessMm;
  const housingMounted = lathe(
    [
      [rb, 0], [rf, 0], [rf, ft], [ro, ft + (rf - ro)], [ro, h.heightMm], [rs, h.heightMm],
      [rs, h.deckBottomZMm], [rb, h.deckBottomZMm],
    ],
    segmentsFor(rf, q),
  );
  const R = f.outerDiameterMm / 2;
  const floatMesh = lathe([[0, 0], [R, 0], [R, f.cylinderHeightMm], [f.plateauRadiusMm, f.heightMm], [0, f.heightMm]], segmentsFor(R, q));
  const ri = n.orificeMm / 2, rl = n.lipDiameterMm / 2, rsh = n.shoulderDiameterMm / 2, rc = n.collarDiameterMm / 2, rr = n.barb.rootDiameterMm / 2;
  const z1 = n.lipHeightMm, z2 = z1 + n.shoulderHeightMm, z3 = z2 + n.collarLengthMm;
  const nozzleMesh = lathe(
    [[ri, 0], [rl, 0], [rl, z1], [rsh, z2 - 0.01], [rsh, z2], [rc, z2], [rc, z3], [rr, z3], [rr, n.totalLengthMm], [ri, n.totalLengthMm]],
    segmentsFor(rsh, q),
  );
  const rp = pin.diameterMm / 2;
  const pinMesh = layOnSide(lathe([[0, 0], [rp, 0], [rp, pin.lengthMm], [0, pin.lengthMm]], segmentsFor(rp, q)), rp);
  return { housing: flipOnBed(housingMounted, h.heightMm), float: floatMesh, nozzle: nozzleMesh, pin: pinMesh };
}

const translate = (x: number, y: number, z: number) => [1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, x, y, z, 1];

export function assemblyTransforms(sizing: SizingSuccess, state: FloatPose): PartTransforms {
  const { housing: h, pin, mount } = sizing.parts;
  // housing: flip back (rotate 180 about x) and lift by its height
  const housing = [1, 0, 0, 0, 0, -1, 0, 0, 0, 0, -1, 0, 0, 0, h.heightMm, 1];
  const rp = pin.diameterMm / 2;
  return {
    housing,
    float: translate(0, 0, state === 'rest' ? mount.floatRestZMm : mount.floatSealZMm),
    nozzle: translate(0, 0, mount.nozzleTipZMm),
    pin: translate(-pin.lengthMm / 2, 0, mount.pinTopZMm - 2 * rp),
  };
}
