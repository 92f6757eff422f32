// @vitest-environment happy-dom
/**
 * The chosen unit system reaches the ways out, the plots, the build sheet and
 * the share link (issue 12, "Units throughout"). Sources: NIST SP 811 (2008),
 * appendix B (1 in = 25.4 mm, 1 ft = 0.3048 m, 1 oz = 28.349523125 g exactly);
 * a push read as a weight divides by standard gravity, 9.80665 m/s2 (CGPM 1901,
 * NIST SP 330). A way out must still work after rounding: each one is re-sized
 * with the sizing core, as the command line's tests do with the metric values.
 */
import { strFromU8 } from 'fflate';
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import type { SizingSuccess, WayOut } from '../../generator/sizing/result.ts';
import { setAt, type Doc } from '../../viewer/lib/doc-path.ts';
import { wayOutInUnits } from '../../viewer/lib/way-out-in-units.ts';
import { joinedWaysOut } from '../../viewer/lib/joined-ways-out.ts';
import { messageInUnits } from '../../viewer/lib/message-in-units.ts';
import { shareUrl, unitsFromHash } from '../../viewer/lib/share-link.ts';
import { exportFiles } from '../../viewer/worker/export-files.ts';
import '../../viewer/components/fw-push-plot.ts';

function size(doc: unknown) {
  const parsed = parseDesign(doc);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  return sizeDesign(parsed.inputs);
}
function waysOut(doc: Doc): WayOut[] {
  const r = size(doc);
  if (r.ok) throw new Error('expected no fit');
  return r.waysOut;
}
const apply = (doc: Doc, w: WayOut) => [w, ...(w.also ?? [])].reduce((d, c) => setAt(d, c.field, c.value), doc);

describe('ways out in the box\'s unit', () => {
  it('"at least 22 mm" becomes 0.867 in (rounded up from 0.8661 in), and the design sizes with it', () => {
    const doc = { supply: { headMax: '3 m' }, level: { target: '10 mm' } };
    const [level] = waysOut(doc);
    // the lever's lowest level at 3 m (the direct valve alone would need 35 mm)
    expect(level).toMatchObject({ field: 'level.target', value: '22 mm' });
    const inches = wayOutInUnits(level, doc, 'imperial');
    expect(inches.value).toBe('0.867 in'); // 22 / 25.4 = 0.86614 in, up to three figures
    expect(inches.message).toBe('a water depth to hold of at least 0.867 in at this head');
    expect(size(apply(doc, inches)).ok).toBe(true);
  });

  it('"at most" rounds down, "at least" up, and both still size (overflow too close)', () => {
    const doc = { supply: { headMax: '2 m' }, level: { target: '40 mm' }, container: { overflow: '45 mm' } };
    const ways = waysOut(doc).map((w) => wayOutInUnits(w, doc, 'imperial'));
    expect(ways.map((w) => w.value)).toEqual(['1.37 in', '1.97 in']); // 35 mm = 1.378 in down; 50 mm = 1.969 in up
    for (const w of ways) expect(size(apply(doc, w)).ok, w.value).toBe(true);
  });

  it('a lower tank goes down to the hundredth of a foot, the lowest head with it; print boxes keep millimetres', () => {
    const doc = { supply: { headMax: '2 m', headMin: '1.5 m' }, level: { target: '40 mm' } };
    const head: WayOut = { field: 'supply.headMax', value: '1.23 m', message: 'a tank no higher than 1.23 m above the nozzle', also: [{ field: 'supply.headMin', value: '1.23 m' }] };
    const feet = wayOutInUnits(head, doc, 'imperial');
    expect(feet.value).toBe('4.03 ft'); // 1.23 / 0.3048 = 4.035 ft, down
    expect(feet.also).toEqual([{ field: 'supply.headMin', value: '4.03 ft' }]);
    expect(feet.message).toBe('a tank no higher than 4.03 ft above the nozzle');
    const lip: WayOut = { field: 'nozzle.sealDiameter', value: '4.2 mm', message: 'a nozzle lip of at most 4.2 mm across' };
    expect(wayOutInUnits(lip, doc, 'imperial')).toEqual(lip);
    expect(wayOutInUnits(head, doc, 'metric')).toBe(head);
  });

  it('a pair offered together is one way out setting both boxes; either alone does not size, both do, in inches too', () => {
    const doc = { supply: { headMax: '3 m' }, level: { target: '10 mm' }, limits: { maxOuterDiameter: '40 mm' } };
    const ways = waysOut(doc);
    expect(ways).toHaveLength(2); // the sizing's two entries with one message
    for (const w of ways) expect(size(setAt(doc, w.field, w.value)).ok, `${w.field} alone`).toBe(false);
    const [joined, ...rest] = joinedWaysOut(ways);
    expect(rest).toEqual([]);
    expect(joined.also).toEqual([{ field: ways[1].field, value: ways[1].value }]);
    expect(size(apply(doc, joined)).ok).toBe(true);
    const inches = wayOutInUnits(joined, doc, 'imperial');
    expect([inches.value, ...inches.also!.map((c) => c.value)].every((v) => v.endsWith(' in'))).toBe(true);
    expect(size(apply(doc, inches)).ok).toBe(true);
    expect(inches.message).not.toMatch(/\d mm/);
  });

  it('box messages: an inch box\'s limits in inches, a print box\'s in millimetres', () => {
    expect(messageInUnits('container.overflow', 'from 10 mm to 2000 mm', 'imperial')).toBe('from 0.394 in to 78.74 in');
    expect(messageInUnits('print.wall', 'from 0.9 mm to 10 mm', 'imperial')).toBe('from 0.9 mm to 10 mm');
  });
});

describe('the push plot in imperial', () => {
  it('reads the push as ounces of weight: N / 9.80665 x 1000 / 28.349523125', async () => {
    const s = size({ supply: { headMax: '2.2 m' }, level: { target: '45 mm' } }) as SizingSuccess;
    const plot = document.createElement('fw-push-plot') as HTMLElement & { sizing: SizingSuccess; units: string; updateComplete: Promise<unknown> };
    Object.assign(plot, { sizing: s, units: 'imperial' });
    document.body.append(plot);
    await plot.updateComplete;
    const texts = [...plot.shadowRoot!.querySelectorAll('text')].map((t) => t.textContent);
    expect(texts).toContain('float push (oz of weight)');
    expect(texts).toContain('water depth in the container (in)');
    const oz = ((s.closingForce.atHeadMaxN / 9.80665) * 1000) / 28.349523125;
    const ticks = texts.map(Number).filter(Number.isFinite);
    expect(Math.max(...ticks)).toBeGreaterThan(oz); // the axis reaches past the push needed, in ounces
    expect(Math.max(...ticks)).toBeLessThan(oz * 2.5);
  });
});

describe('the build sheet made in the browser', () => {
  it('in imperial: levels in inches, the tank in feet, the demand in gallons; print settings in mm; the cautions kept', () => {
    const doc = { supply: { headMax: '2.2 m' }, level: { target: '45 mm' } };
    const s = size(doc) as SizingSuccess;
    const [sheet] = exportFiles('sheet', s, doc, null, undefined, 'imperial');
    const text = strFromU8(sheet.bytes).replace(/<[^>]*>/g, ' ');
    expect(text).toContain('1.77 in'); // 45 mm / 25.4
    expect(text).toContain('7.22 ft'); // 2.2 m / 0.3048
    expect(text).toMatch(/gal a day|gal\/day/);
    expect(text).toContain('0.2 mm'); // layer height stays in mm
    expect(text).toContain('Low pressure only');
    expect(text).not.toMatch(/(?<![\d.])45(\.0)? mm\b/);
    const [metric] = exportFiles('sheet', s, doc, null);
    expect(strFromU8(metric.bytes)).toMatch(/(?<![\d.])45(\.0)? mm\b/);
  });
});

describe('the share link', () => {
  it('says the system it was made in; a link without it opens as it is', () => {
    const link = shareUrl('http://x/#old', { name: 'a' }, 'imperial');
    expect(unitsFromHash(new URL(link).hash)).toBe('imperial');
    expect(unitsFromHash(new URL(shareUrl('http://x/', { name: 'a' }, 'metric')).hash)).toBeNull();
    expect(unitsFromHash('#design=abc&units=furlongs')).toBeNull();
  });
});
