// @vitest-environment happy-dom
/**
 * The glossary and its words on screen: one name per thing, each with a short
 * explanation that a focus or a hover shows and Escape hides (WCAG 2.2 SC
 * 1.4.13 Content on Hover or Focus, and the tooltip pattern of WAI-ARIA
 * Authoring Practices 1.2: role="tooltip" referenced by aria-describedby;
 * source: W3C). The figures in the "head" explanation are checked against
 * p = rho g h (any hydrostatics text) with NIST SP 811's psi.
 */
import { describe, expect, it } from 'vitest';
import { GLOSSARY, termLine, termName, type TermKey } from '../../generator/doc/glossary.ts';
import { FIELD_GROUPS } from '../../viewer/lib/form-fields.ts';
import '../../viewer/components/fw-term.ts';

const KEYS = Object.keys(GLOSSARY) as TermKey[];

describe('glossary', () => {
  it('has one name per thing, lower case, and a short explanation of one to three sentences for each', () => {
    const names = KEYS.map((k) => termName(k));
    expect(new Set(names).size).toBe(names.length);
    for (const key of KEYS) {
      const { name, explain } = GLOSSARY[key];
      expect(name, key).toBe(name.toLowerCase());
      expect(explain.length, key).toBeGreaterThan(30);
      expect(explain.length, key).toBeLessThan(260);
      expect(explain.split(/[.!?](\s|$)/).filter((s) => s && s.trim()).length, key).toBeLessThanOrEqual(3);
    }
    expect(termName('tank-full', true)).toBe('Tank full');
    expect(termLine('nozzle-hole')).toMatch(/^Nozzle hole \(orifice\): /);
  });

  it('says the push of a metre and a foot of water as p = rho g h gives it', () => {
    const rho = 998.2; // kg/m3, water at 20 degC (the schema's default liquid)
    const g = 9.80665; // m/s2, standard gravity (CGPM 1901; NIST SP 811)
    const psi = 6894.757; // Pa (NIST SP 811)
    expect((rho * g * 1) / 1000).toBeCloseTo(9.8, 1); // kPa per metre
    expect((rho * g * 0.3048) / psi).toBeCloseTo(0.43, 2); // psi per foot (1 ft = 0.3048 m exactly)
    expect(GLOSSARY.head.explain).toContain('9.8 kPa');
    expect(GLOSSARY.head.explain).toContain('0.43 psi');
  });

  it('knows every word a box of the valve page is explained by', () => {
    const used = FIELD_GROUPS.flatMap((g) => [...g.fields.map((f) => f.term), ...(g.introTerms ?? [])]).filter((t): t is TermKey => t !== undefined);
    expect(used.length).toBeGreaterThanOrEqual(8);
    for (const key of used) expect(KEYS).toContain(key);
  });
});

async function mountTerm(term: TermKey, marker = false): Promise<HTMLElement & { updateComplete: Promise<unknown> }> {
  const el = document.createElement('fw-term') as HTMLElement & { term: TermKey; marker: boolean; updateComplete: Promise<unknown> };
  el.term = term;
  el.marker = marker;
  document.body.append(el);
  await el.updateComplete;
  return el;
}

describe('fw-term', () => {
  it('is a focusable word tied to its tooltip, which focus opens and blur and Escape close', async () => {
    const el = await mountTerm('throttle-band');
    const root = el.shadowRoot!;
    const word = root.querySelector<HTMLElement>('[data-term]')!;
    const tip = root.querySelector<HTMLElement>('[role="tooltip"]')!;
    expect(word.getAttribute('tabindex')).toBe('0');
    expect(word.getAttribute('aria-describedby')).toBe(tip.id);
    expect(tip.textContent).toContain(GLOSSARY['throttle-band'].explain);
    expect(tip.hasAttribute('data-open')).toBe(false);
    word.dispatchEvent(new FocusEvent('focus'));
    await el.updateComplete;
    expect(tip.hasAttribute('data-open')).toBe(true);
    word.dispatchEvent(new KeyboardEvent('keydown', { key: 'Escape' }));
    await el.updateComplete;
    expect(tip.hasAttribute('data-open')).toBe(false);
    word.dispatchEvent(new MouseEvent('mouseenter'));
    await el.updateComplete;
    expect(tip.hasAttribute('data-open')).toBe(true);
    word.dispatchEvent(new FocusEvent('blur'));
    await el.updateComplete;
    expect(tip.hasAttribute('data-open')).toBe(false);
  });

  it('as a marker shows "?" with a name of its own, and says the trade word in the explanation', async () => {
    const el = await mountTerm('nozzle-hole', true);
    const marker = el.shadowRoot!.querySelector<HTMLElement>('[data-term]')!;
    expect(marker.textContent).toBe('?');
    expect(marker.getAttribute('aria-label')).toBe('What is this?');
    expect(el.shadowRoot!.querySelector('[role="tooltip"]')!.textContent).toMatch(/^Nozzle hole \(orifice\):/);
  });
});
