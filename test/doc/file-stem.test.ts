/**
 * File-name stems from design names. Sources: accents dropped by Unicode
 * canonical decomposition (UAX #15, NFKD: "é" = "e" + U+0301 COMBINING ACUTE
 * ACCENT); letters with no decomposition spelled as the Unicode CLDR
 * "Latin-ASCII" transform spells them (ß -> ss, æ -> ae, ø -> o, œ -> oe,
 * ł -> l, þ -> th; recalled from memory); the portable file-name character set
 * of POSIX.1-2017 (3.282: letters, digits, ".", "_", "-").
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fileStem } from '../../generator/doc/file-stem.ts';

describe('fileStem', () => {
  it('turns a name into lower-case words joined by hyphens, accents dropped', () => {
    expect(fileStem("Tomates d'été")).toBe('tomates-d-ete');
    expect(fileStem('Rooftop planter tubs')).toBe('rooftop-planter-tubs');
    expect(fileStem('  Bac n°3 — côté sud  ')).toBe('bac-n-3-cote-sud'); // "°" (U+00B0) has no decomposition: a hyphen
  });

  it('spells out the letters NFKD keeps whole (CLDR Latin-ASCII)', () => {
    expect(fileStem('Straße')).toBe('strasse');
    expect(fileStem('Ærø Œuvre')).toBe('aero-oeuvre');
    expect(fileStem('Łódź')).toBe('lodz');
    expect(fileStem('Þingvellir')).toBe('thingvellir');
    expect(fileStem('ﬁcus')).toBe('ficus'); // the "fi" ligature U+FB01 decomposes to "f" "i" under NFKD
  });

  it('falls back when nothing is left, and for no name at all', () => {
    for (const name of ['', '   ', '***', '!?', '—', '日本', undefined, 42]) expect(fileStem(name)).toBe('floatwright-valve');
    expect(fileStem('***', { fallback: 'bench' })).toBe('bench');
  });

  it('is cut short without a hyphen at the end', () => {
    expect(fileStem('a'.repeat(47) + ' b', { maxLength: 48 })).toBe('a'.repeat(47));
    expect(fileStem('x'.repeat(100))).toHaveLength(48);
  });

  it('always gives POSIX portable file-name characters, no leading, trailing or double hyphen', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme', maxLength: 60 }), fc.integer({ min: 1, max: 80 }), (name, maxLength) => {
        const stem = fileStem(name, { maxLength });
        expect(stem === 'floatwright-valve' || (/^[a-z0-9]+(-[a-z0-9]+)*$/.test(stem) && stem.length <= maxLength)).toBe(true);
      }),
    );
  });
});
