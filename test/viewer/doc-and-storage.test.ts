/**
 * Document paths and browser storage. No physics here: behaviour checks only
 * (common practice: a setting that cannot be saved must not lose what is on screen).
 */
import { describe, expect, it } from 'vitest';
import { getAt, setAt } from '../../viewer/lib/doc-path.ts';
import { loadSaved, save, STORAGE_KEY } from '../../viewer/lib/storage.ts';

describe('document paths', () => {
  it('sets a value without touching the original', () => {
    const doc = { supply: { headMax: '2 m' } };
    const next = setAt(doc, 'level.target', '40 mm');
    expect(next).toEqual({ supply: { headMax: '2 m' }, level: { target: '40 mm' } });
    expect(doc).toEqual({ supply: { headMax: '2 m' } });
    expect(getAt(next, 'level.target')).toBe('40 mm');
    expect(getAt(next, 'nope.deeper')).toBeUndefined();
  });
  it('removes a value and the section it leaves empty', () => {
    expect(setAt({ reservoir: { area: '1 m2' }, reserve: 2 }, 'reservoir.area', undefined)).toEqual({ reserve: 2 });
  });
  it('refuses prototype keys', () => {
    const doc = {};
    expect(setAt(doc, '__proto__.polluted', 1)).toBe(doc);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });
});

describe('storage', () => {
  const memory = () => {
    const m = new Map<string, string>();
    return { getItem: (k: string) => m.get(k) ?? null, setItem: (k: string, v: string) => void m.set(k, v), m };
  };
  it('keeps the design and the unit system', () => {
    const s = memory();
    save(s, { doc: { level: { target: '2 in' } }, units: 'imperial' });
    expect(loadSaved(s)).toEqual({ doc: { level: { target: '2 in' } }, units: 'imperial' });
  });
  it('ignores damaged or foreign data', () => {
    const s = memory();
    s.m.set(STORAGE_KEY, '{not json');
    expect(loadSaved(s)).toBeNull();
    s.m.set(STORAGE_KEY, JSON.stringify({ doc: [1, 2] }));
    expect(loadSaved(s)).toBeNull();
    expect(loadSaved(undefined)).toBeNull();
  });
  it('does not throw when storage is full', () => {
    expect(() => save({ setItem: () => { throw new Error('QuotaExceededError'); } }, { doc: {}, units: 'metric' })).not.toThrow();
  });
});
