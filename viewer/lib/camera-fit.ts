/**
 * Where the 3D view's camera stands, as plain numbers (tested without a GPU).
 *
 * fitBoxDistance: the camera distance from the box's centre at which every
 * corner of the parts' bounding box is inside the view, looking from `toCamera`
 * (a unit vector from the centre to the camera) with the world's `up`, a
 * vertical field of view `vfovDeg` and the view's `aspect` (width / height).
 * A corner at offset o from the centre, seen from distance d, stands at depth
 * d - o.toCamera and must keep |o.up'| <= depth x tan(vfov / 2) and
 * |o.right| <= depth x aspect x tan(vfov / 2) (pinhole camera); the largest d
 * any corner needs, times `margin` (default 1.08, a little air around the parts).
 * Example: a cube of side 2 seen face-on, vfov 90 degrees, aspect 1: the near
 * face's corners (o.toCamera = 1, |o.up'| = 1) need d >= 1 + 1 / tan(45) = 2.
 *
 * needsReframe: whether new parts have outgrown or shrunk from the framed
 * ones enough to frame them again: the radius changed by more than 15 %, or
 * the centre moved more than 15 % of the radius. Typing a level a few mm
 * higher keeps the grower's view; a valve half again as tall is framed again.
 *
 * ORBIT: gentle turning: half the usual rotate speed, and the camera kept
 * between 20 and 150 degrees from straight above, so a small drag never
 * flips the valve to a top or bottom view.
 */
export type Vec3 = readonly [number, number, number];

export interface Sphere {
  center: readonly [number, number, number];
  radius: number;
}

export const REFRAME_SHARE = 0.15;

export const ORBIT = {
  rotateSpeed: 0.5,
  minPolarAngle: (20 * Math.PI) / 180,
  maxPolarAngle: (150 * Math.PI) / 180,
} as const;

const dot = (a: Vec3, b: Vec3) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const cross = (a: Vec3, b: Vec3): Vec3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const unit = (a: Vec3): Vec3 => {
  const n = Math.hypot(...a);
  return [a[0] / n, a[1] / n, a[2] / n];
};

export function fitBoxDistance(min: Vec3, max: Vec3, toCamera: Vec3, up: Vec3, vfovDeg: number, aspect: number, margin = 1.08): number {
  const center: Vec3 = [(min[0] + max[0]) / 2, (min[1] + max[1]) / 2, (min[2] + max[2]) / 2];
  const back = unit(toCamera);
  const right = unit(cross([-back[0], -back[1], -back[2]], up));
  const upInView = cross(right, [-back[0], -back[1], -back[2]]);
  const tanV = Math.tan((vfovDeg * Math.PI) / 360);
  const tanH = tanV * aspect;
  let d = 0;
  for (const x of [min[0], max[0]]) for (const y of [min[1], max[1]]) for (const z of [min[2], max[2]]) {
    const o: Vec3 = [x - center[0], y - center[1], z - center[2]];
    const toward = dot(o, back);
    d = Math.max(d, toward + Math.abs(dot(o, upInView)) / tanV, toward + Math.abs(dot(o, right)) / tanH);
  }
  return d * margin;
}

export function needsReframe(framed: Sphere | null, now: Sphere): boolean {
  if (!framed || !(framed.radius > 0)) return true;
  const moved = Math.hypot(now.center[0] - framed.center[0], now.center[1] - framed.center[1], now.center[2] - framed.center[2]);
  return Math.abs(now.radius / framed.radius - 1) > REFRAME_SHARE || moved > REFRAME_SHARE * framed.radius;
}
