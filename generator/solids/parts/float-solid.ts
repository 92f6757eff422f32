/**
 * The float, in print pose = mounted pose (flat bottom on z = 0).
 *
 * One solid of revolution, no booleans: the profile is the shell's half
 * section, the sealed cavity and the pad pocket are notches in it that reach
 * the axis. Outer: cylinder R to h_c, 50-degree cone in to the guide collar
 * r_c, the collar up to the plateau at h_f, pocket (r_pocket, depth) cut into
 * the plateau. Cavity: r_cav from the bottom shell t up to the inner cone
 * start, then the 50-degree roof: with the guide collar it closes to a point
 * inside the collar (no bridge); without one (the lever's float) it ends at a
 * flat roof under the pocket. Every dimension is FloatSpec's.
 *
 * Facets: one count for the whole float, from its outer radius at the asked
 * quality, so every section is the same N-gon and the volume is exactly
 * k(N) times FloatSpec's analytic shell (see revolveProfile).
 */
import { geom3ToMesh, segmentsFor, type IndexedMesh, type Quality } from '../mesh/index.ts';
import type { FloatSpec } from '../../sizing/result.ts';
import { revolveProfile } from '../shapes/revolve-profile.ts';
import { dedupe } from '../shapes/dedupe-corners.ts';

/** Profile corners [r, z], counter-clockwise. */
export function floatProfile(f: FloatSpec): [number, number][] {
  const R = f.outerDiameterMm / 2;
  const H = f.heightMm;
  const pocketFloor = H - f.pocketDepthMm;
  const outer: [number, number][] = [
    [0, 0],
    [R, 0],
    [R, f.cylinderHeightMm],
    [f.plateauRadiusMm, f.cylinderHeightMm + f.coneHeightMm],
    [f.plateauRadiusMm, H],
  ];
  const pocket: [number, number][] =
    f.pocketDepthMm > 0
      ? [
          [f.pocketRadiusMm, H],
          [f.pocketRadiusMm, pocketFloor],
          [0, pocketFloor],
        ]
      : [[0, H]];
  const cavity: [number, number][] = [
    [0, f.cavityRoofZMm],
    [f.cavityRoofRadiusMm, f.cavityRoofZMm],
    [f.cavityRoofRadiusMm, f.cavityConeTopZMm],
    [f.cavityRadiusMm, f.cavityConeStartZMm],
    [f.cavityRadiusMm, f.cavityBottomZMm],
    [0, f.cavityBottomZMm],
  ];
  return [...outer, ...pocket, ...cavity];
}

export function floatSegments(f: FloatSpec, quality: Quality): number {
  return segmentsFor(f.outerDiameterMm / 2, quality);
}

export function buildFloatMesh(f: FloatSpec, quality: Quality): IndexedMesh {
  return geom3ToMesh(revolveProfile(dedupe(floatProfile(f)), floatSegments(f, quality)));
}
