/**
 * The 3D view's camera (issue 12: reframe after a size change, gentler
 * orbiting). Geometry checked by hand and against three.js's own math (a
 * general reference library): the pinhole camera model (a point at lateral
 * offset y and depth z projects inside the view when |y| <= z tan(fov / 2)),
 * and three.js PerspectiveCamera.project as the independent check.
 */
import * as THREE from 'three';
import { describe, expect, it } from 'vitest';
import { ORBIT, fitBoxDistance, needsReframe } from '../../viewer/lib/camera-fit.ts';

describe('fitBoxDistance', () => {
  it('a cube of side 2 seen face-on, 90 degrees, square view: the near corners need d = 1 + 1 / tan(45) = 2', () => {
    expect(fitBoxDistance([-1, -1, -1], [1, 1, 1], [0, -1, 0], [0, 0, 1], 90, 1, 1)).toBeCloseTo(2, 12);
    expect(fitBoxDistance([-1, -1, -1], [1, 1, 1], [0, -1, 0], [0, 0, 1], 90, 1)).toBeCloseTo(2 * 1.08, 12); // with the air around
  });

  it('every corner lands inside the view, projected by three.js\'s own camera (a tall valve, a wide and a narrow view)', () => {
    const min = [-30, -30, 0] as const;
    const max = [30, 30, 155] as const; // a housing 60 mm across and 155 mm tall
    const toCamera = new THREE.Vector3(0.45, -1, 0.5).normalize();
    for (const aspect of [614 / 322, 390 / 320, 0.6]) {
      const d = fitBoxDistance(min, max, toCamera.toArray(), [0, 0, 1], 35, aspect);
      const center = new THREE.Vector3(0, 0, 77.5);
      const camera = new THREE.PerspectiveCamera(35, aspect, 1, 5000);
      camera.up.set(0, 0, 1);
      camera.position.copy(center).addScaledVector(toCamera, d);
      camera.lookAt(center);
      camera.updateMatrixWorld();
      let widest = 0;
      for (const x of [min[0], max[0]]) for (const y of [min[1], max[1]]) for (const z of [min[2], max[2]]) {
        const p = new THREE.Vector3(x, y, z).project(camera); // normalised device coordinates: inside the view is -1..1
        widest = Math.max(widest, Math.abs(p.x), Math.abs(p.y));
      }
      expect(widest, `aspect ${aspect}`).toBeLessThanOrEqual(1);
      expect(widest, `aspect ${aspect}`).toBeGreaterThan(0.85); // and it fills the view, not a speck in it
    }
  });
});

describe('needsReframe', () => {
  const framed = { center: [0, 0, 50] as const, radius: 60 };
  it('keeps the view for a small change, frames again for a large one', () => {
    expect(needsReframe(null, framed)).toBe(true);
    expect(needsReframe(framed, { center: [0, 0, 52], radius: 63 })).toBe(false); // 5 % larger, moved 2 mm
    expect(needsReframe(framed, { center: [0, 0, 50], radius: 120 })).toBe(true); // twice the size
    expect(needsReframe(framed, { center: [0, 0, 50], radius: 40 })).toBe(true); // a third smaller
    expect(needsReframe(framed, { center: [30, 0, 50], radius: 60 })).toBe(true); // parts pulled apart: moved half a radius
  });
});

describe('ORBIT', () => {
  it('turns at half speed and stays between 20 and 150 degrees from straight above', () => {
    expect(ORBIT.rotateSpeed).toBe(0.5);
    expect(THREE.MathUtils.radToDeg(ORBIT.minPolarAngle)).toBeCloseTo(20, 9);
    expect(THREE.MathUtils.radToDeg(ORBIT.maxPolarAngle)).toBeCloseTo(150, 9);
    // the first view (0.45, -1, 0.5) lies inside the band: acos(0.5 / |v|) = 65.5 degrees
    const v = new THREE.Vector3(0.45, -1, 0.5);
    expect(THREE.MathUtils.radToDeg(Math.acos(v.z / v.length()))).toBeCloseTo(65.5, 1);
  });
});
