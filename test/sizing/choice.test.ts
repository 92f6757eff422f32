/**
 * Which valve the sizing makes (issue 13): the document's fixed architecture and
 * mount, or "auto"; the lever's figures through sizeDesign; forced choices that
 * cannot work give reasons and ways out that re-size.
 *
 * The moment balance is checked by hand on the sized arm (statics: for a rigid
 * body at rest the moments about the pivot sum to zero; J. L. Meriam and L. G.
 * Kraige, Engineering Mechanics: Statics, ch. 3, from memory), with the pin's
 * friction as a friction circle of radius r sin(atan mu) (the same book,
 * "Journal bearings", from memory):
 *   F_float (a_f + k) = F_pad (a_p + k) + W (x_c + k),  k = 2 mm x sin(atan 0.3) = 0.574696 mm.
 * The scenarios are our own (demo values, not reference data).
 */
import { describe, expect, it } from 'vitest';
import { mergeOverrides, parseDesign } from '../../generator/doc/schema.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import type { SizingFailure, SizingResult } from '../../generator/sizing/result.ts';
import { formatSizingText } from '../../generator/doc/format-sizing.ts';
import { buildSheetMarkdown } from '../../generator/doc/build-sheet.ts';
import { direct, lever } from './fixtures.ts';

const TRAY = { supply: { headMax: '2 m', headMin: '1.5 m' }, level: { target: '25 mm' }, limits: { maxOuterDiameter: '120 mm' } };
const BUCKET = { supply: { headMax: '1.5 m', headMin: '1.125 m' }, level: { target: '250 mm' }, container: { rimHeight: '350 mm' } };
const ROOFTOP = { supply: { headMax: '2.2 m', headMin: '1.6 m' }, level: { target: '45 mm' }, limits: { maxOuterDiameter: '120 mm' } };

function size(doc: unknown): { result: SizingResult; document: ReturnType<typeof parsed>['document'] } {
  const p = parsed(doc);
  return { result: sizeDesign(p.inputs), document: p.document };
}
function parsed(doc: unknown) {
  const p = parseDesign(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return p;
}
function failed(r: SizingResult): SizingFailure {
  if (r.ok) throw new Error(`expected no fit, got a ${r.architecture} valve`);
  return r;
}
/** Each way out applied to the document (with what goes with it) sizes. */
function waysOutSize(doc: object, f: SizingFailure): void {
  expect(f.waysOut.length).toBeGreaterThan(0);
  for (const w of f.waysOut) {
    const changed = mergeOverrides(doc, Object.fromEntries([[w.field, w.value], ...(w.also ?? []).map((a) => [a.field, a.value])]));
    const again = sizeDesign(parsed(changed).inputs);
    expect(again.ok, `${w.field} = ${w.value}: ${again.ok ? '' : JSON.stringify(again.reasons)}`).toBe(true);
  }
}

describe('a lever valve asked for (valve.architecture "lever")', () => {
  const { result, document } = size({ ...TRAY, valve: { architecture: 'lever' } });
  const s = lever(result);

  it('stands on the floor within the footprint, with the fields size --json adds (issue 13, Interface)', () => {
    expect(s.architecture).toBe('lever');
    expect(s.mount).toBe('floor');
    expect(s.rim).toBeNull();
    expect(s.footprintMm).toBeLessThanOrEqual(120);
    expect(s.lever.ratio).toBeCloseTo(s.lever.floatArmMm / s.lever.padArmMm, 12);
    expect(s.lever.ratio).toBeGreaterThan(1);
    expect(s.lever.pivotHeightMm).toBeGreaterThan(s.levels.targetMm);
    expect(s.lever.armLengthMm).toBeGreaterThan(s.lever.floatArmMm);
    expect(s.lever.hysteresisMm).toBeGreaterThan(0);
    expect(s.choice.by).toBe('document');
    expect(s.choice.reason).toMatch(/^A lever valve standing on the container floor, as the design asks/);
    // the JSON the command line prints carries them
    const json = JSON.parse(JSON.stringify(s));
    for (const key of ['architecture', 'mount', 'footprintMm', 'lever', 'rim']) expect(json).toHaveProperty(key);
  });

  it('moment balance about the pivot by hand (Meriam and Kraige): the float push at the seal holds the pad force', () => {
    const k = 2 * Math.sin(Math.atan(0.3));
    expect(k).toBeCloseTo(0.574696, 6);
    const lv = s.lever;
    const padN = s.closingForce.atHeadMaxN; // closingForce is the force at the pad for a lever
    const floatN = (padN * (lv.padArmMm + k) + lv.armWeightN * (lv.armCentroidMm + k)) / (lv.floatArmMm + k);
    expect(lv.floatPushAtHeadMaxN).toBeCloseTo(floatN, 12);
    // without the arm and friction the float would need only F_pad / ratio
    expect(lv.floatPushAtHeadMaxN).toBeGreaterThan(padN / lv.ratio);
    // float.availableForceN is the float's own lift (Archimedes), and its reserve counts it at the pad
    const liftAtPad = lv.padForceFromPush.perNewton * s.float.availableForceN + lv.padForceFromPush.offsetN;
    expect(liftAtPad / padN).toBeCloseTo(s.float.reserve, 9);
    expect(s.float.reserve).toBeGreaterThanOrEqual(1.5);
  });

  it('shuts at the target at full tank and holds the order of the levels', () => {
    expect(s.levels.shutOffAtHeadMaxMm).toBeCloseTo(25, 6);
    expect(s.levels.liftOffMm).toBeLessThanOrEqual(s.levels.firstTouchMm);
    expect(s.levels.firstTouchMm).toBeLessThan(s.levels.shutOffAtHeadMinMm);
    expect(s.levels.shutOffAtHeadMinMm).toBeLessThan(s.levels.shutOffAtHeadMaxMm);
    expect(s.levels.heldAtDemandMm).toBeLessThanOrEqual(s.levels.shutOffAtHeadMaxMm);
  });

  it('the text report and the build sheet say which valve and why, in words', () => {
    const text = formatSizingText(s);
    expect(text).toContain('Valve: lever valve (the float on an arm), standing on the container floor');
    expect(text).toContain('Why this valve');
    expect(text).toContain('Arm and frame');
    const sheet = buildSheetMarkdown(s, document);
    expect(sheet).toContain('This is a lever valve');
    expect(sheet).toContain('Pivot pin (printed)');
    expect(sheet).not.toContain('Rim hanger');
  });
});

describe('a narrow footprint: the frame without its back anchor wing (20 mm at 1 m, 90 mm)', () => {
  const { result, document } = size({ supply: { headMax: '1 m', headMin: '0.75 m' }, level: { target: '20 mm' }, limits: { maxOuterDiameter: '90 mm' } });
  const s = lever(result);

  it('a lever on the floor within 90 mm, its frame held by two anchors, and the words say two', () => {
    expect(s.mount).toBe('floor');
    expect(s.footprintMm).toBeLessThanOrEqual(90);
    expect(s.parts.frame.backWing).toBe(false);
    const sheet = buildSheetMarkdown(s, document);
    expect(sheet).not.toMatch(/three anchor|3 pins/);
    if (s.holdDown.anchorForceN > 0) {
      expect(sheet).toContain('2 pins or M3 screws through the');
      expect(s.warnings.find((w) => w.code === 'hold-down')?.message).toContain('screw the two anchor wings down');
    }
  });
});

describe('hung from the rim (valve.mount "rim")', () => {
  const { result, document } = size({ ...BUCKET, valve: { mount: 'rim' } });
  const s = lever(result);

  it('a lever valve on the rim with +-10 mm of slot, within the footprint', () => {
    expect(s.mount).toBe('rim');
    expect(s.rim!.adjustMm).toBe(10);
    expect(s.rim!.rimHeightMm).toBeCloseTo(350, 9);
    expect(s.rim!.wallThicknessMm).toBeCloseTo(3, 9); // the document's default wall
    expect(s.footprintMm).toBeLessThanOrEqual(120);
    expect(s.levels.shutOffAtHeadMaxMm).toBeCloseTo(250, 6);
    expect(s.mass.byPart.hanger).toBeGreaterThan(0);
    expect(s.mass.byPart.stem).toBeGreaterThan(0);
  });

  it('the build sheet explains how to set the slotted stem', () => {
    const sheet = buildSheetMarkdown(s, document);
    expect(sheet).toContain('Rim hanger (printed)');
    expect(sheet).toMatch(/up to 10\.0 mm either way from the middle/);
  });
});

describe('"auto": the direct valve wherever it fits, else the least plastic of the others', () => {
  it('the rooftop tubs get the direct valve, with the reason', () => {
    const s = direct(size(ROOFTOP).result);
    expect(s.lever).toBeNull();
    expect(s.rim).toBeNull();
    expect(s.footprintMm).toBe(s.housing.footDiameterMm);
    expect(s.choice.by).toBe('direct-first');
    expect(s.choice.reason).toMatch(/^A direct valve standing on the container floor: it fits within 120 mm/);
  });

  it('a shallow tray the direct valve cannot serve gets a lever valve, and says why', () => {
    const s = lever(size(TRAY).result);
    expect(s.mount).toBe('floor');
    expect(s.choice.by).toBe('least-plastic');
    expect(s.choice.options.map((o) => [o.architecture, o.mount, o.plasticG === null])).toEqual([['direct', 'floor', true], ['lever', 'floor', false]]);
    expect(s.choice.reason).toMatch(/^A lever valve standing on the container floor: the least plastic that fits within 120 mm, [\d.]+ g; a direct valve standing on the container floor does not fit \(/);
  });

  it('a deep bucket with its rim given is hung from the rim (the floor frame would pass the 250 mm part cap)', () => {
    const s = lever(size(BUCKET).result);
    expect(s.mount).toBe('rim');
    const floor = s.choice.options.find((o) => o.architecture === 'lever' && o.mount === 'floor')!;
    expect(floor.plasticG).toBeNull();
    expect(floor.note).toMatch(/^does not fit: /);
  });
});

describe('forced choices that cannot work: reasons and ways out that size (issue 13, Bad input)', () => {
  it('a direct valve on the rim', () => {
    const doc = { ...BUCKET, valve: { architecture: 'direct', mount: 'rim' } };
    const f = failed(size(doc).result);
    expect(f.reasons[0]!.code).toBe('direct-on-rim');
    expect(f.waysOut.map((w) => w.field)).toContain('valve.architecture');
    waysOutSize(doc, f);
  });

  it('a lever on the floor too tall for the 250 mm part cap (a 250 mm bucket): hang it from the rim', () => {
    const doc = { supply: BUCKET.supply, level: BUCKET.level, valve: { architecture: 'lever', mount: 'floor' } };
    const f = failed(size(doc).result);
    expect(f.reasons.map((r) => r.code)).toContain('part-size');
    expect(f.waysOut.some((w) => w.field === 'container.rimHeight')).toBe(true);
    waysOutSize(doc, f);
  });

  it('a lever in too small a footprint: the smallest that fits', () => {
    const doc = { ...TRAY, limits: { maxOuterDiameter: '60 mm' }, valve: { architecture: 'lever' } };
    const f = failed(size(doc).result);
    expect(f.reasons.map((r) => r.code)).toContain('outer-diameter-limit');
    const w = f.waysOut.find((x) => x.field === 'limits.maxOuterDiameter')!;
    expect(Number.parseFloat(w.value)).toBeGreaterThan(60);
    waysOutSize(doc, f);
  });

  // a tray too shallow for any valve at this head: the lever reaches a shallower level than the direct valve, so the
  // one deeper level offered is the lever's, and half a millimetre less than it gets no valve at all ("at least" holds)
  it('a tray too shallow for any valve (15 mm at 1.5 m, 90 mm): the lowest level any valve reaches, and no lower', () => {
    const doc = { supply: { headMax: '1.5 m', headMin: '1.125 m' }, level: { target: '15 mm' }, limits: { maxOuterDiameter: '90 mm' }, container: { rimHeight: '115 mm', wallThickness: '3 mm' } };
    const f = failed(size(doc).result);
    // the travel rule in the words of each mount: the floor alone on the floor, the stem's reach on the rim
    const travel = f.reasons.filter((r) => r.code === 'travel').map((r) => r.message);
    expect(travel.find((m) => m.startsWith('A lever valve standing on the container floor:'))).not.toMatch(/slotted stem/);
    expect(travel.find((m) => m.startsWith("A lever valve hung from the container's rim:"))).toMatch(/less the whole reach of the slotted stem/);
    const levels = f.waysOut.filter((w) => w.field === 'level.target');
    expect(levels).toHaveLength(1);
    const mm = Number.parseFloat(levels[0]!.value);
    expect(levels[0]!.message).toBe(`a water depth to hold of at least ${levels[0]!.value} at this head`);
    // the direct valve alone needs 39 mm here (measured before the lever's way out was offered)
    expect(mm).toBeLessThan(39);
    const at = (target: number) => size(mergeOverrides(doc, { 'level.target': `${target} mm` })).result;
    expect(lever(at(mm)).architecture).toBe('lever');
    expect(at(mm - 0.5).ok).toBe(false);
    // a lower tank: the highest on a 0.1 m grid that takes a lever here, and 0.1 m higher takes none
    const tank = f.waysOut.find((w) => w.field === 'supply.headMax')!;
    expect(tank.message).toBe(`tank full no higher than ${tank.value} above the nozzle for this water depth`);
    const head = Number.parseFloat(tank.value);
    expect(head).toBeLessThan(1.5);
    const higher = mergeOverrides(doc, { 'supply.headMax': `${(head + 0.1).toFixed(2)} m`, 'supply.headMin': `${Math.min(1.125, head + 0.1).toFixed(2)} m` });
    expect(size(higher).result.ok).toBe(false);
    waysOutSize(doc, f);
  });
});
