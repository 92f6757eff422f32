/**
 * Segment counts, quality table, hole radius and the teardrop outline.
 * Sources: sagitta of a chord and areas of regular polygons, elementary
 * geometry (REFERENCE-CHECKS "Geometry": N >= pi / acos(1 - e/r)).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  holePolygonRadiusMm,
  jscad,
  QUALITY,
  segmentsFor,
  segmentsForChordError,
  teardrop2d,
  teardropArea,
} from '../../generator/solids/mesh/index.ts';

const { primitives, geometries, measurements } = jscad;

/** Largest distance from the true circle to a chord of a JSCAD circle outline, measured on its points. */
function measuredChordErrorMm(radiusMm: number, segments: number): number {
  const points = geometries.geom2.toPoints(primitives.circle({ radius: radiusMm, segments }));
  let worst = 0;
  for (let i = 0; i < points.length; i++) {
    const [ax, ay] = points[i];
    const [bx, by] = points[(i + 1) % points.length];
    worst = Math.max(worst, radiusMm - Math.hypot((ax + bx) / 2, (ay + by) / 2));
  }
  return worst;
}

describe('segmentsForChordError', () => {
  it('matches the worked example: r = 10 mm, e = 0.05 mm -> 32 (sagitta relation, elementary geometry)', () => {
    // pi / acos(1 - 0.005) = 31.40, rounded up to a multiple of 4
    expect(segmentsForChordError(10, 0.05)).toBe(32);
    expect(segmentsForChordError(10, 0.3)).toBe(16); // 12.79 -> 13 -> 16
    expect(segmentsForChordError(30, 0.05)).toBe(56); // 54.41 -> 55 -> 56
    expect(segmentsForChordError(1.5, 0.3)).toBe(8); // 4.88, raised to the minimum of 8
  });

  it('is the smallest multiple of 4 (and >= 8) with N >= pi / acos(1 - e/r) (REFERENCE-CHECKS: sagitta of a chord)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.3, max: 125, noNaN: true }), fc.double({ min: 0.005, max: 1, noNaN: true }), (r, e) => {
        const n = segmentsForChordError(r, e);
        const bound = Math.max(8, Math.PI / Math.acos(Math.max(-1, 1 - e / r)));
        expect(n % 4).toBe(0);
        expect(n).toBeGreaterThanOrEqual(bound);
        expect(n - 4).toBeLessThan(bound);
        // sagitta r (1 - cos(pi/N)) <= e
        expect(r * (1 - Math.cos(Math.PI / n))).toBeLessThanOrEqual(e);
      }),
      { numRuns: 300 },
    );
  });

  it('keeps the faceted chord error of a real JSCAD circle <= e (measured on the polygon, elementary geometry)', () => {
    for (const r of [0.8, 1.5, 3, 10, 30.5, 60]) {
      for (const quality of ['export', 'preview'] as const) {
        const e = QUALITY[quality].chordErrorMm;
        const n = segmentsFor(r, quality);
        expect(measuredChordErrorMm(r, n)).toBeLessThanOrEqual(e + 1e-12);
      }
    }
  });

  it('documents the two qualities: export 0.05 mm (DESIGN.md "Solids"), preview 0.3 mm', () => {
    expect(QUALITY.export.chordErrorMm).toBe(0.05);
    expect(QUALITY.preview.chordErrorMm).toBe(0.3);
    expect(segmentsFor(10, 'export')).toBe(32);
    expect(segmentsFor(10, 'preview')).toBe(16);
  });

  it('refuses bad input with the field, the value and the allowed range', () => {
    expect(() => segmentsForChordError(-1, 0.05)).toThrow(/segmentsForChordError\.radiusMm = -1 mm; allowed: a finite number greater than 0/);
    expect(() => segmentsForChordError(10, 0)).toThrow(/chordErrorMm = 0 mm/);
    expect(() => segmentsForChordError(10, Number.NaN)).toThrow(/chordErrorMm = NaN/);
    expect(() => segmentsForChordError(10_000, 0.0001)).toThrow(/needs \d+ segments; allowed: at most 4096/);
    expect(() => segmentsFor(10, 'draft' as never)).toThrow(/segmentsFor\.quality = "draft"; allowed: "export" or "preview"/);
  });
});

describe('holePolygonRadiusMm', () => {
  it('puts the flats of the N-gon on the nominal circle: r / cos(pi/N) (apothem of a regular polygon, elementary geometry)', () => {
    expect(holePolygonRadiusMm(1.5, 16)).toBeCloseTo(1.5293867, 6);
    const n = 16;
    const points = geometries.geom2.toPoints(primitives.circle({ radius: holePolygonRadiusMm(1.5, n), segments: n }));
    const [ax, ay] = points[0];
    const [bx, by] = points[1];
    expect(Math.hypot((ax + bx) / 2, (ay + by) / 2)).toBeCloseTo(1.5, 9);
  });
});

describe('teardrop2d', () => {
  // Roof sides at 50 degrees from the horizontal (5 degrees past the common 45-degree support threshold of slicers, common practice).
  const ROOF = (50 * Math.PI) / 180;
  it('has the analytic area r^2 (pi + tan a - a), a = 50 deg, in the limit and a slightly smaller faceted one (elementary geometry)', () => {
    // circle + kite (centre, tangent points, tip) r^2 tan a - sector between the tangent points a r^2
    expect(teardropArea(2)).toBeCloseTo(13.84272645, 7); // 4 * (3.14159265 + 1.19175359 - 0.87266463)
    for (const r of [1.6, 2, 5]) {
      const exact = teardropArea(r);
      for (const segments of [segmentsFor(r, 'export'), segmentsFor(r, 'preview'), 12, 20]) {
        const faceted = measurements.measureArea(teardrop2d({ radiusMm: r, segments }));
        // The 260-degree arc is cut by chords of at most 2 pi / N each; a circular
        // segment's area (r^2/2)(t - sin t) is convex in t, so the area lost is at
        // most 13/18 of the full N-gon's loss, pi r^2 - (N/2) r^2 sin(2 pi / N).
        const polygonLoss = Math.PI * r * r - (segments / 2) * r * r * Math.sin((2 * Math.PI) / segments);
        expect(faceted).toBeLessThan(exact);
        expect(exact - faceted).toBeLessThanOrEqual((13 / 18) * polygonLoss * (1 + 1e-12));
        if (segments % 36 === 0) expect(exact - faceted).toBeCloseTo((13 / 18) * polygonLoss, 10); // tangent points are circle vertices
      }
      const fine = measurements.measureArea(teardrop2d({ radiusMm: r, segments: 512 }));
      expect((exact - fine) / exact).toBeLessThan(2e-5);
    }
  });

  it('is convex, counter-clockwise, tip at (0, r / cos 50deg), roof sides at 50 degrees, bottom and sides on the axes', () => {
    const r = 1.6;
    const tipY = r / Math.cos(ROOF);
    for (const segments of [8, 12, 16, 20, 32, 36]) {
      const points = geometries.geom2.toPoints(teardrop2d({ radiusMm: r, segments }));
      const tipIndex = points.findIndex(([x, y]) => x === 0 && Math.abs(y - tipY) < 1e-12);
      expect(tipIndex).toBeGreaterThanOrEqual(0);
      const ys = points.map((p) => p[1]);
      expect(Math.max(...ys)).toBeCloseTo(tipY, 12);
      expect(Math.min(...ys)).toBe(-r); // a vertex straight below the centre (N multiple of 4)
      expect(Math.max(...points.map((p) => p[0]))).toBe(r);
      // neighbours of the tip are the tangent points at 40 and 140 degrees, on the circle
      const before = points[(tipIndex + points.length - 1) % points.length];
      const after = points[(tipIndex + 1) % points.length];
      const tip = points[tipIndex];
      expect(Math.abs((tip[1] - before[1]) / (tip[0] - before[0]))).toBeCloseTo(Math.tan(ROOF), 12);
      expect(Math.abs((tip[1] - after[1]) / (tip[0] - after[0]))).toBeCloseTo(Math.tan(ROOF), 12);
      expect(Math.hypot(...before)).toBeCloseTo(r, 12);
      expect(Math.hypot(...after)).toBeCloseTo(r, 12);
      // every turn is to the left: convex and counter-clockwise
      for (let i = 0; i < points.length; i++) {
        const [ax, ay] = points[i];
        const [bx, by] = points[(i + 1) % points.length];
        const [cx, cy] = points[(i + 2) % points.length];
        expect((bx - ax) * (cy - by) - (by - ay) * (cx - bx)).toBeGreaterThan(0);
      }
      // every vertex is on the circle except the tip
      points.forEach(([x, y], i) => {
        if (i !== tipIndex) expect(Math.hypot(x, y)).toBeCloseTo(r, 12);
      });
    }
  });

  it('refuses bad input with the field, the value and the allowed range', () => {
    expect(() => teardrop2d({ radiusMm: 0, segments: 16 })).toThrow(/teardrop2d\.radiusMm = 0 mm/);
    expect(() => teardrop2d({ radiusMm: 2, segments: 3.5 })).toThrow(/teardrop2d\.segments = 3\.5; allowed: a whole number from 4 to 4096/);
    expect(() => teardropArea(-2)).toThrow(/teardropArea\.radiusMm = -2 mm/);
  });
});
