/**
 * Property-based tests (fast-check) of refusals: an accepted document with one
 * field moved just outside its range (or far past it), or set to junk, is
 * refused with a message that names that field's path, shows the value as
 * written and says what is allowed (the range, or the form a value takes);
 * nothing throws, and no message shows NaN, Infinity, "undefined" or
 * "[object Object]" unless the grower typed it. Ranges are the schema's (from
 * DESIGN.md "Symbols and defaults" and "Caps").
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { formatNumber, showInput } from '../../generator/doc/units.ts';
import { acceptedDocument, junkValue, outsideValue, setPath, type Mutation } from './arbitraries.ts';
import { fuzzSeed, REJECT_RUNS } from './budget.ts';

/** The ways a message may show the value: quoted text (cut at 37 characters), a number in full or to 10 digits, "a list", "an object". */
function shownAs(value: unknown): string[] {
  if (typeof value === 'number') return [formatNumber(value, 10), String(value)];
  if (typeof value === 'string') return [showInput(value).slice(0, 38)];
  if (value === null) return ['null', 'missing']; // null in a required field reads as left out
  return [showInput(value)];
}

/** Junk that is in fact a fine value for some fields: "1e-400 m" underflows to 0 m, inside 0 m to 100 m of tube. */
const FINE_FOR: Record<string, unknown[]> = { 'supply.tubeLength': ['1e-400 m'] };

const ALLOWED = /must be (from|more than|at least|at most|less than)|use a (number|plain number)|has a comma|give |allowed/;

function refusedWell(doc: unknown, m: Mutation): void {
  let parsed: ReturnType<typeof parseDesign>;
  try {
    parsed = parseDesign(doc);
  } catch (error) {
    throw new Error(`parseDesign threw for ${m.field} = ${String(m.value)}: ${(error as Error).message}`);
  }
  // null in an optional field with no default means "left out": accepted
  if (parsed.ok && m.value === null && ['supply.headMin'].includes(m.field)) return;
  if (parsed.ok && FINE_FOR[m.field]?.includes(m.value)) return;
  expect(parsed.ok, `${m.field} = ${JSON.stringify(m.value)} was accepted`).toBe(false);
  if (parsed.ok) return;
  const mine = parsed.errors.filter((e) => e.field === m.field || e.field.startsWith(`${m.field}.`));
  expect(mine.length, `${m.field}: errors were ${JSON.stringify(parsed.errors)}`).toBeGreaterThan(0);
  for (const e of mine) {
    expect(shownAs(m.value).some((text) => e.message.includes(text)), `${e.field}: ${e.message} should show ${shownAs(m.value)[0]}`).toBe(true);
    expect(e.message, e.field).toMatch(ALLOWED);
    const typed = typeof m.value === 'string' ? m.value : String(m.value);
    for (const word of ['NaN', 'Infinity', 'undefined', '[object Object]']) {
      if (!typed.includes(word)) expect(e.message, `${e.field}: ${e.message}`).not.toContain(word);
    }
  }
}

describe('refusals over the space just outside the accepted one (fast-check properties)', () => {
  it(`${REJECT_RUNS} documents with one field out of range or junk: refused, naming the path, the value and what is allowed`, () => {
    fc.assert(
      fc.property(acceptedDocument({ plausible: true }), fc.oneof(outsideValue(), junkValue()), (doc, m) => {
        // judged against a document that was good before the change (scattered bench points may not be)
        fc.pre(parseDesign(doc).ok);
        refusedWell(setPath(doc, m.field, m.value), m);
      }),
      { numRuns: REJECT_RUNS, seed: fuzzSeed(), endOnFailure: true },
    );
  }, 120_000);

  it('heads past the 3.05 m cap written as pressures are refused with the low-pressure caution', () => {
    // 3.05 m of water at 998.2 kg/m3: p = rho g H = 29.86 kPa (hydrostatics; g = 9.80665 m/s2, NIST SP 330)
    fc.assert(
      fc.property(fc.double({ min: 29.9, max: 1e4, noNaN: true }), fc.constantFrom('kPa', 'psi', 'bar', 'hPa'), (kPa, unit) => {
        const per = { kPa: 1, psi: 6.894757, bar: 100, hPa: 0.1 }[unit]!; // NIST SP 811 App. B
        const value = `${kPa / per} ${unit}`;
        const parsed = parseDesign({ supply: { headMax: value }, level: { target: '40 mm' } });
        expect(parsed.ok).toBe(false);
        if (parsed.ok) return;
        expect(parsed.errors[0].field).toBe('supply.headMax');
        expect(parsed.errors[0].message).toContain('mains pressure');
        expect(parsed.errors[0].message).toContain('3.05 m');
      }),
      { numRuns: 100, seed: fuzzSeed() },
    );
  });

  it('the lowest head above the highest, the orifice not inside the lip, a wall under two lines: refused on the right field', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.05, max: 3, noNaN: true }),
        fc.double({ min: 1.001, max: 50, noNaN: true }),
        fc.double({ min: 0.2, max: 1.2, noNaN: true }),
        (head, over, line) => {
          const base = { supply: { headMax: `${head} m` }, level: { target: '40 mm' } };
          const low = parseDesign(setPath(base, 'supply.headMin', `${Math.min(3.05, head * over)} m`));
          if (head * over <= 3.05) expect(!low.ok && low.errors.some((e) => e.field === 'supply.headMin' && /above supply.headMax/.test(e.message))).toBe(true);
          const lip = parseDesign(setPath(setPath(base, 'nozzle.orifice', '5 mm'), 'nozzle.sealDiameter', `${Math.max(1, 5 / over)} mm`));
          expect(!lip.ok && lip.errors.some((e) => e.field === 'nozzle.orifice')).toBe(true);
          const wall = parseDesign(setPath(setPath(base, 'print.lineWidth', `${line} mm`), 'print.wall', `${(2 * line) / over} mm`));
          expect(!wall.ok && wall.errors.some((e) => e.field === 'print.wall' && /two/.test(e.message))).toBe(true);
        },
      ),
      { numRuns: 200, seed: fuzzSeed() },
    );
  });
});
