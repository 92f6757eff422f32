/**
 * The push plot's curve against the sizing core. Physics: Archimedes'
 * principle (net push = rho g V_sub - m g), and DESIGN's closed form for the
 * level drop from full to low tank, (H_max - H_min) d_s^2 / D_f^2, which holds
 * while the water line is on the float's straight side (source: DESIGN
 * "Vertical layout", derived from the same hydrostatics).
 */
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import type { SizingSuccess } from '../../generator/sizing/result.ts';
import { levelForPush, netPushN, pushCurve } from '../../viewer/lib/net-push.ts';

function sized(doc: unknown): SizingSuccess {
  const p = parseDesign(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  const r = sizeDesign(p.inputs);
  if (!r.ok) throw new Error(JSON.stringify(r.reasons));
  return r;
}

describe('net upward push of the sealed float', () => {
  const s = sized({ supply: { headMax: '2.2 m', headMin: '1.6 m' }, level: { target: '45 mm' } });

  it('equals the push needed to shut at the level the sizing says is held (Archimedes)', () => {
    expect(netPushN(s, s.levels.shutOffAtHeadMaxMm)).toBeCloseTo(s.closingForce.atHeadMaxN, 6);
    expect(netPushN(s, s.levels.shutOffAtHeadMinMm)).toBeCloseTo(s.closingForce.atHeadMinN, 6);
  });

  it('is minus the float weight when the water is below the float', () => {
    const weightN = (s.float.massG / 1000) * 9.80665; // standard gravity (CGPM 1901)
    expect(netPushN(s, s.parts.mount.floatSealZMm - 5)).toBeCloseTo(-weightN, 9);
  });

  it('reads the held levels off the curve', () => {
    const c = pushCurve(s);
    expect(c.holdsAtHeadMaxMm).toBeCloseTo(45, 4);
    expect(c.holdsAtHeadMinMm).toBeCloseTo(s.levels.shutOffAtHeadMinMm, 4);
    expect(c.points).toHaveLength(81);
    for (let i = 1; i < c.points.length; i++) expect(c.points[i].pushN).toBeGreaterThanOrEqual(c.points[i - 1].pushN - 1e-12);
  });

  it('drops the level from full to low tank by (H_max - H_min) A_m / A_f (DESIGN closed form)', () => {
    // A_m: the gasket-factor area of the 2 / 5 mm lip with m 0.5, pi/4 G^2 + 2 pi b G m = 17.87 mm2 (ASME VIII-1 App. 2 form)
    const areaMm2 = (Math.PI / 4) * 3.5 ** 2 + 2 * Math.PI * 0.75 * 3.5 * 0.5;
    const drop = ((2.2 - 1.6) * 1000 * areaMm2) / ((Math.PI / 4) * s.float.outerDiameterMm ** 2);
    expect(s.levels.shutOffAtHeadMaxMm - levelForPush(s, s.closingForce.atHeadMinN)).toBeCloseTo(drop, 3);
  });

  it('says Infinity when the float cannot push that hard', () => {
    expect(levelForPush(s, s.float.availableForceN * 2)).toBe(Infinity);
  });
});
