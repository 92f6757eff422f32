/**
 * The words of the build sheet and the text report: the size-setting rules said
 * as a grower would say them (never the sizing's internal rule names such as
 * "reserve", "travel" or "least-mass"), one name per thing from the glossary,
 * and a list of the glossary words the sheet uses with their explanations.
 *
 * Reference: ISO 24495-1:2023, Plain language - Part 1: Governing principles and
 * guidelines (readers find, understand and use the text; the same word for the
 * same thing), recalled from memory; the rule names are the sizing's own
 * (generator/sizing/layout/constraint-text.ts), the words the glossary's.
 */
import { LEVER_CONSTRAINT_TEXT } from '../../generator/sizing/lever/lever-constraint-text.ts';
import { readFileSync, readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildSheetHtml, buildSheetMarkdown } from '../../generator/doc/build-sheet.ts';
import { formatFailureText, formatSizingText } from '../../generator/doc/format-sizing.ts';
import { GLOSSARY, termLine } from '../../generator/doc/glossary.ts';
import { parseDesign } from '../../generator/doc/schema.ts';
import { CONSTRAINT_TEXT } from '../../generator/sizing/layout/constraint-text.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';

const PRESETS = new URL('../../presets/', import.meta.url);
const valvePresets = readdirSync(PRESETS)
  .filter((n) => n.endsWith('.json') && !n.startsWith('plan-'))
  .map((n) => ({ name: n, doc: JSON.parse(readFileSync(new URL(n, PRESETS), 'utf8')) as unknown }));

/** the sizing's rule names, as whole words ("reserve" but not "reservoir") */
const RULE_NAMES = new RegExp(`\\b(${Object.keys(CONSTRAINT_TEXT).join('|')})\\b`, 'i');
/** the second names things went by before the glossary (one name per thing) */
const OLD_NAMES = /\b(highest head|lowest head|supply tube|target level|indentation|reserve|full tank|low tank|tank height)\b/i;

function reports(doc: unknown) {
  const parsed = parseDesign(doc);
  if (!parsed.ok) throw new Error('preset refused');
  const sizing = sizeDesign(parsed.inputs);
  if (!sizing.ok) throw new Error('preset infeasible');
  return {
    sizing,
    md: buildSheetMarkdown(sizing, parsed.document, { withPad: true, withTestStand: true }),
    html: buildSheetHtml(sizing, parsed.document, { withPad: true, withTestStand: true }),
    text: formatSizingText(sizing, 'heading'),
  };
}

describe('build sheet and text report in plain words', () => {
  it.each(valvePresets)('$name: the rules that set the size in words, no rule names, one name per thing', ({ doc }) => {
    const { sizing, md, html, text } = reports(doc);
    expect(sizing.boundBy.length).toBeGreaterThan(0);
    for (const code of sizing.boundBy) {
      // a lever's rules in the lever's words (issue 13)
      const words = ((sizing.architecture === 'lever' ? LEVER_CONSTRAINT_TEXT : CONSTRAINT_TEXT) as Record<string, string>)[code];
      expect(md).toContain(words);
      expect(text.replace(/\s+/g, ' ')).toContain(words);
    }
    for (const [what, body] of [['Markdown sheet', md], ['HTML sheet', html], ['text report', text]] as const) {
      expect(body, what).not.toMatch(RULE_NAMES);
      expect(body, what).not.toMatch(OLD_NAMES);
      expect(body, what).toContain('What set the size');
    }
  });

  it('lists the glossary words the sheet uses, each with its explanation, and raises the powers of units', () => {
    const { md, html } = reports(valvePresets[0].doc);
    const words = md.slice(md.indexOf('## Words on this sheet'));
    for (const key of ['head', 'tank-full', 'nozzle-hole', 'nozzle-lip', 'pad-squeeze', 'spare-lift', 'throttle-band', 'feed-tube'] as const) {
      const firstWords = GLOSSARY[key].explain.split(' ').slice(0, 3).join(' '); // no Markdown or HTML escapes in them
      expect(words, key).toContain(`- ${termLine(key).split(':')[0]}: ${firstWords}`);
      expect(html).toContain(`${termLine(key).split(':')[0]}: ${firstWords}`);
    }
    expect(md).toContain('mm²');
    expect(md).not.toMatch(/\bmm2\b|\bcm3\b|g\/cm3\b/);
    // the command line's text report too ("area the water pushes on", "displaced volume")
    const { text } = reports(valvePresets[0].doc);
    expect(text).toContain('mm²');
    expect(text).toContain('cm³');
    expect(text).not.toMatch(/\bmm2\b|\bcm3\b/);
  });

  it('says why no valve fits in the same words', () => {
    const parsed = parseDesign({ supply: { headMax: '3 m' }, level: { target: '10 mm' } });
    if (!parsed.ok) throw new Error('demo refused');
    const failure = sizeDesign(parsed.inputs);
    expect(failure.ok).toBe(false);
    if (failure.ok) return;
    const text = formatFailureText(failure);
    expect(text).not.toMatch(/\b(mm|cm|m)[23]\b/);
    expect(text).not.toMatch(RULE_NAMES);
    expect(text).not.toMatch(OLD_NAMES);
  });
});
