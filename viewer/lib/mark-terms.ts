/**
 * Running text with glossary words marked: the first time each listed term's
 * name appears (whole words, any case) it becomes an <fw-term>, which explains
 * it on hover and focus. Terms are listed by hand where the text is written, so
 * only the words worth explaining there get a tab stop.
 *
 * text: the sentence; terms: glossary keys to look for, in any order.
 */
import { html, type TemplateResult } from 'lit';
import { GLOSSARY, type TermKey } from '../../generator/doc/glossary.ts';
import '../components/fw-term.ts';

const escapeRegExp = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

export function markTerms(text: string, terms: readonly TermKey[]): TemplateResult {
  const found = terms
    .map((key) => ({ key, m: new RegExp(`\\b${escapeRegExp(GLOSSARY[key].name)}\\b`, 'i').exec(text) }))
    .filter((x): x is { key: TermKey; m: RegExpExecArray } => x.m !== null)
    .sort((a, b) => a.m.index - b.m.index);
  const parts: (string | TemplateResult)[] = [];
  let at = 0;
  for (const { key, m } of found) {
    if (m.index < at) continue; // overlaps a term already marked
    parts.push(text.slice(at, m.index), html`<fw-term term=${key}>${m[0]}</fw-term>`);
    at = m.index + m[0].length;
  }
  parts.push(text.slice(at));
  return html`${parts}`;
}
