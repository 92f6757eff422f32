// @vitest-environment happy-dom
/**
 * The flow plot (fw-flow-plot) draws the two curves, the demand line and the
 * held level from the result it is given, and says the band in the chosen
 * units. The band below is a TEST FIXTURE (invented numbers in issue 10's
 * field names), standing in until the sizing core reports the band.
 * Inch conversion: 1 in = 25.4 mm exactly (NIST SP 811).
 */
import { describe, expect, it } from 'vitest';
import '../../viewer/components/fw-flow-plot.ts';
import { flowBandWords, type FlowBand } from '../../viewer/components/fw-flow-plot.ts';

const FIXTURE: FlowBand = {
  characteristic: {
    headMax: [ { levelMm: 30, flowLph: 12 }, { levelMm: 40, flowLph: 8 }, { levelMm: 48, flowLph: 2 }, { levelMm: 50.8, flowLph: 0 } ],
    headMin: [ { levelMm: 28, flowLph: 9 }, { levelMm: 38, flowLph: 6 }, { levelMm: 45, flowLph: 1 }, { levelMm: 47, flowLph: 0 } ],
  },
  inputs: { demandLpd: 48 },
  levels: { throttleStartMm: 30, heldAtDemandMm: 42, heldAtDemandLowTankMm: 39, shutOffAtHeadMaxMm: 50.8, shutOffAtHeadMinMm: 47 },
};

describe('fw-flow-plot', () => {
  it('draws both curves, the demand line and the held mark', async () => {
    const el = document.createElement('fw-flow-plot') as HTMLElement & { band: FlowBand; units: string; updateComplete: Promise<unknown> };
    el.band = FIXTURE;
    document.body.append(el);
    await el.updateComplete;
    const root = el.shadowRoot!;
    expect(root.querySelector('path.full')!.getAttribute('d')!.split('L')).toHaveLength(4);
    expect(root.querySelector('path.low')).not.toBeNull();
    expect(root.querySelector('line.demand')).not.toBeNull();
    expect(root.querySelector('[data-mark="held"]')).not.toBeNull();
    expect(root.querySelector('figcaption')!.textContent).toContain('42.0 mm');
  });

  it('says the band in inches: 50.8 mm is 2.00 in', () => {
    const words = flowBandWords(FIXTURE, 'imperial').join(' ');
    expect(words).toContain('2.00 in');
    expect(words).toContain('Throttling starts');
    expect(words).toContain('Tight shut-off');
  });
});
