/**
 * Messages in box labels: every document path a message can hold becomes the
 * label of the box on screen (or, for a setting with no box, its name in
 * words), so the grower never reads "supply.headMax".
 *
 * Reference: WCAG 2.2 SC 3.3.1 Error Identification (source: W3C): "the item
 * that is in error is identified and the error is described to the user in
 * text"; the document paths are the schema's own (generator/doc/schema.ts).
 */
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { inLabels, labelFor, problemsInLabels } from '../../viewer/lib/field-label.ts';
import { ALL_FIELDS } from '../../viewer/lib/form-fields.ts';

const DOCUMENT_PATH = /\b[a-z]+\.[a-zA-Z]+(\.[a-zA-Z]+)*\b/;

describe('field labels in messages', () => {
  it('gives every box its on-screen label, bench rows their row, and a setting with no box its name in words', () => {
    for (const f of ALL_FIELDS) expect(labelFor(f.path)).toBe(f.label);
    expect(labelFor('seal.calibration.1.mass')).toBe('Weight, point 2');
    expect(labelFor('seal.calibration.0.head')).toBe('Head, point 1');
    expect(labelFor('print.bed')).toBe('Printer bed size');
    expect(labelFor('container.rimHeight')).toBe('Rim height');
    expect(labelFor('design')).toBe('The design');
  });

  it('replaces every path inside a sentence, and leaves numbers and units alone', () => {
    expect(inLabels('"3 m" is above supply.headMax (2.9 m); see nozzle.sealDiameter and seal.calibration.1.mass.')).toBe(
      '"3 m" is above "Tank full: water height above the valve" (2.9 m); see "Nozzle lip, outside width" and "Weight, point 2".',
    );
    expect(inLabels('2.5 kg/m3 at 0.5 mm')).toBe('2.5 kg/m3 at 0.5 mm');
  });

  it('leaves no document path in the problems of bad documents the schema refuses', () => {
    const bad = [
      { supply: { headMax: '2 m', headMin: '3 m' }, level: { target: '40 mm' } },
      { supply: { headMax: '2 m' }, level: { target: '40 mm' }, nozzle: { orifice: '5 mm', sealDiameter: '4 mm' } },
      { supply: { headMax: '2 m' }, level: { target: '40 mm' }, reservoir: { area: '0.1 m2' } },
      { supply: { headMax: '2 m' }, level: { target: '40 mm' }, print: { wall: '0.5 mm', lineWidth: '0.4 mm' } },
      { supply: { headMax: '2 m' }, level: {} },
      { supply: { headMax: 'abc' }, level: { target: '-1' }, seal: { calibration: [{ head: 'x', mass: '99999 g' }] } },
    ];
    for (const doc of bad) {
      const parsed = parseDesign(doc);
      expect(parsed.ok).toBe(false);
      if (parsed.ok) continue;
      const text = problemsInLabels(parsed.errors);
      expect(text, JSON.stringify(doc)).not.toMatch(DOCUMENT_PATH);
    }
  });
});
