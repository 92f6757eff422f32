/**
 * The seal test stand's plunger, printed cup down: (x, y, z) -> (x, -y, H - z)
 * from its pose in use (pad face at z = 0). The cup is a cone at OVERHANG_DEG
 * with its rim on the bed, the stem stands on it and the pad pocket opens
 * upward. The mass label (standPlungerSpec.label) is sunk into the pad face
 * beside the pocket, drawn in the print pose so it reads from the pad side.
 * Text: JSCAD's vectorText strokes, each straight piece a box of the stroke
 * width, then taken away with the body in one manifold-3d subtraction.
 */
import { jscad, loadManifold, manifoldToMesh, segmentsFor, unionAll, type Geom3, type IndexedMesh, type Quality } from '../mesh/index.ts';
import { standPlungerProfile, type StandPlungerSpec } from '../../sizing/parts/stand-spec.ts';
import { revolveProfile } from '../shapes/revolve-profile.ts';
import { prism } from '../shapes/prism.ts';
import { fromRows, transformMesh, translation } from '../shapes/transform-mesh.ts';

/** Stroke width over cap height (common practice for engraved text: about one sixth). */
const STROKE_PER_HEIGHT = 0.18;
/** The strokes reach this far into the flange, so the union has no coplanar faces, mm. */
const CUT_OVERRUN_MM = 0.3;

export function standPlungerSegments(p: StandPlungerSpec, quality: Quality): number {
  return segmentsFor(p.cupRimRadiusMm, quality);
}

/** Print pose: cup rim on z = 0. Self-inverse. */
export function standPlungerFlipMatrix(p: StandPlungerSpec): number[] {
  return fromRows([1, 0, 0], [0, -1, 0], [0, 0, -1], [0, 0, Math.fround(p.heightMm)]);
}

/**
 * The label's strokes as solids in the pose in use (pad face at z = 0), from
 * a little inside the flange to `depth` below its underside; laid out as they
 * read in the print pose (the flip negates y), centred on (0, centerOffset) there.
 */
export function standPlungerLabelStrokes(p: StandPlungerSpec): Geom3[] {
  const { text, heightMm, depthMm, centerOffsetMm } = p.label;
  const strokes = jscad.text.vectorText({ height: heightMm, input: text });
  const xs = strokes.flat().map((q) => q[0]);
  const ys = strokes.flat().map((q) => q[1]);
  const cx = (Math.min(...xs) + Math.max(...xs)) / 2;
  const cy = (Math.min(...ys) + Math.max(...ys)) / 2;
  const stroke = heightMm * STROKE_PER_HEIGHT;
  const flangeUnderside = p.heightMm - p.flangeThicknessMm;
  const h = depthMm + CUT_OVERRUN_MM;
  const out: Geom3[] = [];
  for (const line of strokes) {
    for (let i = 0; i + 1 < line.length; i++) {
      // one straight piece: a box of the stroke width with square ends half a stroke past each point
      const [ax, ay] = [line[i][0] - cx, line[i][1] - cy + centerOffsetMm];
      const [bx, by] = [line[i + 1][0] - cx, line[i + 1][1] - cy + centerOffsetMm];
      const len = Math.hypot(bx - ax, by - ay);
      if (len < 1e-9) continue;
      const [ux, uy] = [(bx - ax) / len, (by - ay) / len];
      const [hx, hy] = [(ux * stroke) / 2, (uy * stroke) / 2];
      const corners: [number, number][] = [
        [ax - hx + hy, ay - hy - hx],
        [bx + hx + hy, by + hy - hx],
        [bx + hx - hy, by + hy + hx],
        [ax - hx - hy, ay - hy + hx],
      ];
      // mirrored in y for the pose in use: the corners' order is reversed to stay counter-clockwise
      const used = corners.map(([x, y]) => [x, -y] as [number, number]).reverse();
      out.push(prism(used, h, translation(0, 0, flangeUnderside - depthMm)));
    }
  }
  return out;
}

/** Width of the label's strokes' extent, mm (centre lines plus one stroke). */
export function standPlungerLabelWidthMm(p: StandPlungerSpec): number {
  const xs = jscad.text.vectorText({ height: p.label.heightMm, input: p.label.text }).flat().map((q) => q[0]);
  return Math.max(...xs) - Math.min(...xs) + p.label.heightMm * STROKE_PER_HEIGHT;
}

export async function buildStandPlungerMesh(p: StandPlungerSpec, quality: Quality): Promise<IndexedMesh> {
  const wasm = await loadManifold();
  const n = standPlungerSegments(p, quality);
  const used = manifoldToMesh(unionAll(wasm, [revolveProfile(standPlungerProfile(p), n), ...standPlungerLabelStrokes(p)]), { dispose: true });
  return transformMesh(used, standPlungerFlipMatrix(p));
}
