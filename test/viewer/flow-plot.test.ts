// @vitest-environment happy-dom
/**
 * The flow plot (fw-flow-plot) draws the two curves, the demand line and the
 * held level from the sizing result as it comes, and says the band in the
 * chosen units, with the very figures the sizing reports (nothing recomputed).
 * Inch conversion: 1 in = 25.4 mm exactly; 1 US gallon = 3.785411784 L exactly (NIST SP 811).
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import '../../viewer/components/fw-flow-plot.ts';
import { flowBandWords, type FlowBand } from '../../viewer/components/fw-flow-plot.ts';
import { parseDesign } from '../../generator/doc/schema.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';

function sizedPreset(name: string) {
  const parsed = parseDesign(JSON.parse(readFileSync(join(process.cwd(), 'presets', `${name}.json`), 'utf8')));
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  const s = sizeDesign(parsed.inputs);
  if (!s.ok) throw new Error('preset does not size');
  return s;
}

describe('fw-flow-plot', () => {
  const s = sizedPreset('rooftop-tubs');

  it('draws both curves from the result, the demand line and the held mark', async () => {
    const el = document.createElement('fw-flow-plot') as HTMLElement & { band: FlowBand; units: string; updateComplete: Promise<unknown> };
    el.band = s;
    document.body.append(el);
    await el.updateComplete;
    const root = el.shadowRoot!;
    expect(root.querySelector('path.full')!.getAttribute('d')!.split('L')).toHaveLength(s.characteristic.headMax.length);
    expect(root.querySelector('path.low')!.getAttribute('d')!.split('L')).toHaveLength(s.characteristic.headMin.length);
    expect(root.querySelector('line.demand')).not.toBeNull();
    expect(root.querySelector('[data-mark="held"]')).not.toBeNull();
    expect(root.querySelector('figcaption')!.textContent).toContain(`${s.levels.heldAtDemandMm.toFixed(1)} mm`);
    expect(root.querySelector('svg')!.textContent).toContain('flow (L/h)');
  });

  it('says the band in inches with the sizing\'s own figures', async () => {
    const words = flowBandWords(s, 'imperial').join(' ');
    expect(words).toContain(`${(s.levels.throttleStartMm / 25.4).toFixed(2)} in`);
    expect(words).toContain(`${(s.levels.heldAtDemandMm / 25.4).toFixed(2)} in`);
    expect(words).toContain(`${(s.levels.shutOffAtHeadMaxMm / 25.4).toFixed(2)} in`);
    expect(words).toContain(`${(s.inputs.demandLpd / 3.785411784).toFixed(2)} gal/day`);
    expect(words).not.toMatch(/\d mm/);
    const el = document.createElement('fw-flow-plot') as HTMLElement & { band: FlowBand; units: string; updateComplete: Promise<unknown> };
    el.band = s;
    el.units = 'imperial';
    document.body.append(el);
    await el.updateComplete;
    expect(el.shadowRoot!.querySelector('svg')!.textContent).toContain('flow (gal/h)');
  });

  it('a zero demand says the water rises to the tight shut-off', () => {
    expect(flowBandWords({ ...s, inputs: { ...s.inputs, demandLpd: 0 } }, 'metric').join(' ')).toMatch(/no water drawn/);
  });
});
