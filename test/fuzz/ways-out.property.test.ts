/**
 * Ways out always apply (issue 11, item 8): every way out the sizing offers,
 * applied as offered (with the fields it sets together: `also`, or the pair that
 * shares one message), gives a document the schema accepts, and the sizing
 * runs on it. Property-based testing with fast-check over the whole accepted
 * input space, range edges included (generators in arbitraries.ts); the ranges
 * and rules are the design document's (orifice 0.5-6 mm and narrower than the
 * lip; lowest head at most the highest; DESIGN.md "Symbols and defaults").
 * The share that makes the design size is counted and printed.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import { designSpec, toDocument } from './arbitraries.ts';
import { wayOutProblems } from './checks.ts';
import { fuzzSeed, SIZING_RUNS } from './budget.ts';

describe('every way out lies inside the document (fast-check)', () => {
  it('known cases: a barb too thin for the bore, and a head too high for the level, offer only ways out the document accepts', () => {
    // a 6 mm bore in a 1 mm tube's barb: no narrower bore of at least 0.5 mm can fit, so none is offered
    const thin = parseDesign({ supply: { headMax: '1 m', tubeInnerDiameter: '1 mm' }, nozzle: { orifice: '6 mm', sealDiameter: '30 mm' }, level: { target: '45 mm' } });
    if (!thin.ok) throw new Error(JSON.stringify(thin.errors));
    const r = sizeDesign(thin.inputs);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    for (const w of r.waysOut) if (w.field === 'nozzle.orifice') expect(Number.parseFloat(w.value)).toBeGreaterThanOrEqual(0.5);
    // a lower highest head below the given lowest head takes the lowest head with it
    const high = parseDesign({ supply: { headMax: '3 m', headMin: '2.9 m' }, level: { target: '5 mm' }, limits: { maxOuterDiameter: '20 mm' } });
    if (!high.ok) throw new Error(JSON.stringify(high.errors));
    const h = sizeDesign(high.inputs);
    if (!h.ok) {
      for (const w of h.waysOut.filter((x) => x.field === 'supply.headMax')) {
        if (Number.parseFloat(w.value) < 2.9) expect(w.also).toEqual([{ field: 'supply.headMin', value: w.value }]);
      }
    }
  });

  it(`${SIZING_RUNS} designs: each way out applied re-parses and re-sizes`, () => {
    const tally = { infeasible: 0, waysOut: 0, sized: 0 };
    fc.assert(
      fc.property(designSpec(), (spec) => {
        const doc = toDocument(spec);
        const parsed = parseDesign(doc);
        if (!parsed.ok) return; // scattered bench points may be refused: rejected.property.test.ts covers refusals
        const result = sizeDesign(parsed.inputs);
        if (result.ok) return;
        tally.infeasible++;
        const found = wayOutProblems(doc, result);
        if (found.problems.length) throw new Error(`${found.problems.join('\n')}\n${JSON.stringify(doc)}`);
        tally.waysOut += found.applied;
        tally.sized += found.sized;
      }),
      { numRuns: SIZING_RUNS, seed: fuzzSeed(), endOnFailure: true },
    );
    expect(tally.infeasible).toBeGreaterThan(0);
    console.info(`[fuzz] ways out: ${JSON.stringify(tally)}`);
  }, 300_000);
});
