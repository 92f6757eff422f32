/**
 * Two different masses at one head are refused. The rule follows from the
 * bench model F = F_pre + A_eff rho g H (DESIGN "Sizing model"): one head gives
 * one closing force, so one stopping mass. Worked by hand: 31 g and 40 g at
 * 0.8 m differ by 9 g, 22.5 % of 40 g (more than 5 %: refused); 31 g and 32 g
 * by 1 g, 3.1 % (kept); 0.8 m and 0.805 m are 0.62 % apart, under the 1 % that
 * counts as one head (headsDefineSlope).
 */
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { sameHeadClashes } from '../../generator/doc/same-head-clash.ts';

const withPoints = (calibration: { head: string; mass: string }[]) => ({ supply: { headMax: '2.2 m' }, level: { target: '45 mm' }, seal: { calibration } });
const errors = (doc: unknown) => {
  const parsed = parseDesign(doc);
  return parsed.ok ? [] : parsed.errors;
};

describe('bench points at one head', () => {
  it('refuses two masses more than 5 % apart at one head, on the later point\'s mass, naming the earlier', () => {
    const found = errors(withPoints([{ head: '0.8 m', mass: '31 g' }, { head: '2.1 m', mass: '66 g' }, { head: '0.8 m', mass: '40 g' }]));
    expect(found.map((e) => e.field)).toEqual(['seal.calibration.2.mass']);
    expect(found[0].message).toContain('point 1 at the same head stopped the flow with 31 g');
    expect(found[0].message).not.toMatch(/seal\.|calibration\./);
  });

  it('heads under 1 % apart count as one; masses within 5 % are a repeat, not a clash', () => {
    expect(errors(withPoints([{ head: '0.8 m', mass: '31 g' }, { head: '80.5 cm', mass: '40 g' }])).map((e) => e.field)).toEqual(['seal.calibration.1.mass']);
    expect(errors(withPoints([{ head: '0.8 m', mass: '31 g' }, { head: '0.8 m', mass: '32 g' }, { head: '2.1 m', mass: '66 g' }]))).toEqual([]);
    expect(sameHeadClashes([{ headM: 0.8, massKg: 0.031 }, { headM: 0.9, massKg: 0.040 }])).toEqual([]); // 12 % apart: two heads
  });

  it('each point is reported once, against the first it clashes with', () => {
    const points = [0.031, 0.040, 0.050].map((massKg) => ({ headM: 1, massKg }));
    expect(sameHeadClashes(points)).toEqual([{ index: 1, earlier: 0 }, { index: 2, earlier: 0 }]);
  });
});
