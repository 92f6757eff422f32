/**
 * The rim mount: input refusals naming the field, and the hanger and stem
 * dimensions and volumes counted by hand (prisms less round holes and a
 * stadium slot: elementary geometry). Adjustment +-10 mm: issue 13's figure.
 * Screw holes 3.5 mm: clearance for an M3 screw (ISO 273 medium series, 3.4 mm; from memory);
 * pilot holes 2.5 mm for an M3 screw cutting its own thread in plastic (common practice).
 */
import { describe, expect, it } from 'vitest';
import { rimInputProblems, rimMountSpec, rimMountVolumesMm3 } from '../../generator/sizing/rim/index.ts';

describe('rim inputs', () => {
  it('a rim below the target level is refused, naming container.rimHeight, the value and the rule', () => {
    const p = rimInputProblems(180, 3, 250);
    expect(p).toHaveLength(1);
    expect(p[0].field).toBe('container.rimHeight');
    expect(p[0].message).toContain('180 mm');
    expect(p[0].message).toContain('250 mm');
    expect(p[0].message).toMatch(/allowed: at least the target level/);
    expect(rimInputProblems(250, 3, 250)).toEqual([]);
  });

  it('out-of-range values name their field and the range', () => {
    const p = rimInputProblems(Number.NaN, 40, 50);
    expect(p.map((x) => x.field)).toEqual(['container.rimHeight', 'container.wallThickness']);
    expect(p[1].message).toBe('container.wallThickness = 40 mm; allowed: 0.5 to 25 mm');
  });
});

describe('hanger and slotted stem', () => {
  // rim 350 mm, 3 mm wall, valve top at 300 mm, 2.25 mm print wall
  const r = rimMountSpec({ rimHeightMm: 350, wallThicknessMm: 3, valveTopZMm: 300, printWallMm: 2.25 });

  it('dimensions by hand', () => {
    // legs 3 mm (at least 3, the wall is 2.25); width 3.5 + 4 x 2.25 = 12.5; gap 3 + 2 x 0.25 = 3.5
    expect(r.hanger).toMatchObject({ legMm: 3, widthMm: 12.5, gapMm: 3.5, bridgeBottomZMm: 350.25, outerLegLengthMm: 15 });
    // upper hole 1.75 + 2.25 under the bridge: 346.25; lower 334.25; inner leg down to 334.25 - 4 = 330.25: 20 mm
    expect(r.hanger.upperHoleZMm).toBeCloseTo(346.25, 9);
    expect(r.hanger.innerLegLengthMm).toBeCloseTo(20, 9);
    // the clamp screw halfway down the 15 mm outer leg
    expect(r.hanger.clampHoleZMm).toBeCloseTo(342.75, 9);
    // slot 12 + 2 x 10 = 32 mm centre to centre, middle at 340.25: the valve moves 10 mm either way
    expect(r.adjustMm).toBe(10);
    expect(r.stem.slotLengthMm).toBe(32);
    expect(r.stem.slotMiddleZMm).toBeCloseTo(340.25, 9);
    // stem top 340.25 + 16 + 4 = 360.25; valve holes 296 and 284; foot 284 - 4 = 280: 80.25 mm long
    expect(r.stem.topZMm).toBeCloseTo(360.25, 9);
    expect(r.stem.bottomZMm).toBeCloseTo(280, 9);
    expect(r.stem.lengthMm).toBeCloseTo(80.25, 9);
    expect(r.behindDepthMm).toBeCloseTo(3 + 3 + 3.5 + 3, 9);
    expect(r.tooLow).toBe(false);
  });

  it('volumes by hand', () => {
    const hole = Math.PI * 1.75 ** 2;
    // 2.5 mm pilot holes with a 50-degree pointed roof: 1.5625 (pi - 0.87266 + 1.19175) = 5.4073 mm2 each
    const pilot = 1.25 ** 2 * (Math.PI - (50 * Math.PI) / 180 + Math.tan((50 * Math.PI) / 180));
    expect(pilot).toBeCloseTo(5.4073, 4);
    const hanger = (3 * 20 + 3 * 15 + (3.5 + 6) * 3) * 12.5 - 3 * pilot * 3; // two screw holes and the clamp's
    const stem = 12.5 * 3 * 80.25 - (32 * 3.5 + hole + 2 * hole) * 3;
    const v = rimMountVolumesMm3(r);
    expect(v.hangerMm3).toBeCloseTo(hanger, 9);
    expect(v.stemMm3).toBeCloseTo(stem, 9);
    expect(hanger).toBeCloseTo(133.5 * 12.5 - 48.67, 1); // 1620.1 mm3
  });

  it('a valve whose screws would reach the slot is flagged: the rim is too low for it', () => {
    expect(rimMountSpec({ rimHeightMm: 350, wallThicknessMm: 3, valveTopZMm: 330, printWallMm: 2.25 }).tooLow).toBe(true);
  });
});
