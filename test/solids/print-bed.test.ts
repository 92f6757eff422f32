/**
 * The printer bed (print.bed): plates never exceed it, more plates when the
 * parts need them, and a part larger than the bed is refused naming print.bed.
 * Sizes are our own scenarios; the packing is checked by arithmetic (shelf
 * packing: widths plus gaps along a row, elementary).
 */
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import type { DesignInputs } from '../../generator/sizing/inputs.ts';
import type { SizingFailure } from '../../generator/sizing/result.ts';
import { packPlates } from '../../generator/solids/mesh/index.ts';
import { writeDesignFiles } from '../../generator/solids/write-design-files.ts';
import { defaultInputs } from '../sizing/fixtures.ts';
import { sizePreset } from './helpers.ts';

const scratch = mkdtempSync(join(tmpdir(), 'fw-bed-'));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

const part = (name: string, w: number, d = w) => ({ name, widthMm: w, depthMm: d });
const BED = { plateWidthMm: 220, plateDepthMm: 220, spacingMm: 10 };

describe('packPlates', () => {
  it('puts parts on one plate while a row fits: 100 + 10 + 100 = 210 <= 220', () => {
    expect(packPlates([part('a', 100), part('b', 100)], BED)).toEqual([[0, 1]]);
  });
  it('starts a new plate when they do not: three 120 mm parts need three 220 mm plates (120 + 10 + 120 > 220)', () => {
    expect(packPlates([part('a', 120), part('b', 120), part('c', 120)], BED)).toEqual([[0], [1], [2]]);
  });
  it('refuses a part larger than the bed, naming print.bed, the part, its size and the bed', () => {
    expect(() => packPlates([part('a', 50), part('housing', 230, 230)], BED)).toThrow(/^print\.bed = 220 x 220 mm is too small for the housing \(230\.0 x 230\.0 mm/);
  });
});

describe('the bed in the sizing and the written plates', () => {
  const bed = (mm: number): Partial<DesignInputs> => ({ bedWidthM: mm / 1e3, bedDepthM: mm / 1e3 });

  it('a bed too small for the housing refuses the design and offers a bed that works', () => {
    const inp = defaultInputs({ ...bed(60), architecture: 'direct' });
    const r = sizeDesign(inp) as SizingFailure;
    expect(r.ok).toBe(false);
    expect(r.reasons.map((x) => x.code)).toContain('bed-size');
    const way = r.waysOut.find((w) => w.field === 'print.bed')!;
    expect(way.value).toMatch(/^\d+ x \d+ mm$/);
    const side = parseFloat(way.value);
    expect(sizeDesign({ ...inp, ...bed(side) }).ok).toBe(true);
  });

  it('a small bed gets more plates, each no larger than the bed (write3mf refuses a layout past its plate)', async () => {
    const { sizing, document } = sizePreset('rooftop-tubs.json');
    const small = { ...sizing, inputs: { ...sizing.inputs, ...bed(100) } };
    const dir = join(scratch, 'small');
    await writeDesignFiles(small, document, dir, { quality: 'preview' });
    const plates = readdirSync(dir).filter((f) => f.endsWith('.3mf')).sort();
    expect(plates.length).toBeGreaterThan(1);
    expect(plates[0]).toMatch(/-plate-1\.3mf$/);
    // the default 220 x 220 mm bed holds the whole valve on one plate
    const one = join(scratch, 'default');
    await writeDesignFiles(sizing, document, one, { quality: 'preview' });
    expect(readdirSync(one).filter((f) => f.endsWith('.3mf'))).toEqual(['rooftop-planter-tubs-plate.3mf']);
  });

  it('a part larger than the bed is refused by name when writing', async () => {
    const { sizing, document } = sizePreset('rooftop-tubs.json');
    const tiny = { ...sizing, inputs: { ...sizing.inputs, ...bed(60) } };
    await expect(writeDesignFiles(tiny, document, join(scratch, 'tiny'), { quality: 'preview' })).rejects.toThrow(/^print\.bed = 60 x 60 mm is too small for the rooftop-planter-tubs housing/);
  });
});
