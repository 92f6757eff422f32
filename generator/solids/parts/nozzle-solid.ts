/**
 * The nozzle insert, in print pose = mounted pose: sealing face on z = 0
 * (the first layer, the flattest face a printer makes), tip down.
 *
 * Body: one solid of revolution (NozzleSpec from the face up: lip, 50-degree
 * flare to the shoulder, shoulder, collar, barb stem, teeth with a 50-degree
 * step out and a taper back in), the orifice as the profile's inner edge.
 * Crush ribs: `count` triangular prisms (base width at the collar surface,
 * apex heightMm out) running the collar's length, joined to the body in one
 * manifold-3d union. Each rib starts inside the shoulder, so its lower end is
 * buried and its upper end is the collar's top face.
 */
import {
  geom3ToMesh,
  loadManifold,
  manifoldToMesh,
  segmentsFor,
  unionAll,
  type Geom3,
  type IndexedMesh,
  type Quality,
} from '../mesh/index.ts';
import type { NozzleSpec } from '../../sizing/result.ts';
import { fromRows } from '../shapes/transform-mesh.ts';
import { prism } from '../shapes/prism.ts';
import { revolveProfile } from '../shapes/revolve-profile.ts';
import { dedupe } from '../shapes/dedupe-corners.ts';
import { OVERHANG_RISE } from '../../sizing/constants.ts';

/** Outer profile corners [r, z] from the face up, then the orifice back down; counter-clockwise. */
export function nozzleProfile(n: NozzleSpec): [number, number][] {
  const ro = n.orificeMm / 2;
  const rs = n.lipDiameterMm / 2;
  const rsh = n.shoulderDiameterMm / 2;
  const rc = n.collarDiameterMm / 2;
  const root = n.barb.rootDiameterMm / 2;
  const crest = n.barb.crestDiameterMm / 2;
  const pts: [number, number][] = [[ro, 0], [rs, 0], [rs, n.lipHeightMm]];
  let z = n.lipHeightMm + (rsh - rs) * OVERHANG_RISE; // 50-degree flare
  pts.push([rsh, z]);
  z += n.shoulderHeightMm;
  pts.push([rsh, z], [rc, z]);
  z += n.collarLengthMm;
  pts.push([rc, z], [root, z]);
  z += n.barb.stemLengthMm;
  pts.push([root, z]);
  for (let i = 0; i < n.barb.count; i++) {
    z += (crest - root) * OVERHANG_RISE; // 50-degree step out
    pts.push([crest, z]);
    z += n.barb.taperLengthMm;
    pts.push([root, z]);
  }
  pts.push([ro, z]);
  return dedupe(pts);
}

/** Height of the shoulder's top face (where the collar and its ribs start), mm above the face. */
export function nozzleCollarBottomZMm(n: NozzleSpec): number {
  return n.lipHeightMm + ((n.shoulderDiameterMm - n.lipDiameterMm) / 2) * OVERHANG_RISE + n.shoulderHeightMm;
}

export function nozzleSegments(n: NozzleSpec, quality: Quality): number {
  return segmentsFor(n.shoulderDiameterMm / 2, quality);
}

/** The crush ribs as JSCAD prisms (their buried root overlaps the collar and shoulder). */
export function crushRibs(n: NozzleSpec): Geom3[] {
  const rc = n.collarDiameterMm / 2;
  const { count, heightMm, baseWidthMm } = n.crushRibs;
  if (count === 0 || heightMm <= 0) return [];
  const half = baseWidthMm / 2;
  const onCircle = Math.sqrt(Math.max(0, rc * rc - half * half));
  // bury the root halfway into the collar wall (never into the orifice)
  const root = rc - Math.min(1, (rc - n.orificeMm / 2) / 2);
  const section: [number, number][] = [
    [root, -half],
    [onCircle, -half],
    [rc + heightMm, 0],
    [onCircle, half],
    [root, half],
  ];
  const z0 = nozzleCollarBottomZMm(n);
  const buried = n.shoulderHeightMm / 2;
  const ribs: Geom3[] = [];
  for (let k = 0; k < count; k++) {
    const a = (2 * Math.PI * k) / count;
    const c = Math.cos(a);
    const s = Math.sin(a);
    ribs.push(prism(section, n.collarLengthMm + buried, fromRows([c, -s, 0], [s, c, 0], [0, 0, 1], [0, 0, z0 - buried])));
  }
  return ribs;
}

export async function buildNozzleMesh(n: NozzleSpec, quality: Quality): Promise<IndexedMesh> {
  const body = revolveProfile(nozzleProfile(n), nozzleSegments(n, quality));
  const ribs = crushRibs(n);
  if (ribs.length === 0) return geom3ToMesh(body);
  const wasm = await loadManifold();
  return manifoldToMesh(unionAll(wasm, [body, ...ribs]), { dispose: true });
}
