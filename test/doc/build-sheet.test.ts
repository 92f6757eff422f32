import { describe, expect, it } from 'vitest';
import { buildSheetHtml, buildSheetMarkdown } from '../../generator/doc/build-sheet.ts';
import { parseDesign } from '../../generator/doc/schema.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';

// A demo design of our own (2.2 m of head, 45 mm level); the figures checked are common practice named below.
function sheet(withPad = false) {
  const parsed = parseDesign({ supply: { headMax: '2.2 m', headMin: '1.6 m' }, level: { target: '45 mm' } });
  if (!parsed.ok) throw new Error('demo design refused');
  const sizing = sizeDesign(parsed.inputs);
  if (!sizing.ok) throw new Error('demo design infeasible');
  return { sizing, md: buildSheetMarkdown(sizing, parsed.document, { withPad }), html: buildSheetHtml(sizing, parsed.document, { withPad }) };
}

describe('build sheet: float acceptance test, strainer, pad', () => {
  it('gives the weigh-soak-weigh test with the expected dry mass, a few per cent either side, and the 0.5 g soak limit', () => {
    const { sizing, md, html } = sheet();
    const dry = sizing.float.dryMassG;
    expect(md).toContain(`it should weigh ${dry.toFixed(1)} g, within 5.0 %`);
    expect(md).toContain(`${(dry * 0.95).toFixed(1)} to ${(dry * 1.05).toFixed(1)} g`);
    expect(md).toContain('gained more than 0.5 g'); // DESIGN second part: reject a gain over 0.5 g after a day
    expect(html).toContain('gained more than 0.5 g');
  });
  it('lists an inline strainer finer than a third of the 2 mm bore (common practice): 0.67 mm', () => {
    expect(sheet().md).toMatch(/Inline strainer \| 1 \| [^|]*finer than 0\.67 mm/);
  });
  it('names the pad by its material, and calls the written disc a cutting template', () => {
    const { md } = sheet(true);
    expect(md).toContain('cut from closed-cell sponge, ASTM D1056 grade 2');
    expect(md).toContain('cutting template');
    expect(md).not.toContain('TPU 95A or softer');
  });
});
