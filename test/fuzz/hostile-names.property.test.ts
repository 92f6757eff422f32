/**
 * Hostile names and notes (issue 11): any text a grower or a shared file can
 * put in a name lands safely wherever it goes. Property-based testing with
 * fast-check over strings rich in control characters, lone surrogates,
 * non-characters, direction overrides, line breaks and Markdown / XML / HTML
 * syntax:
 * - the 3MF's XML parts are well-formed to saxes, a conforming XML 1.0 parser
 *   (XML 1.0 Fifth Edition, 2.2 Char);
 * - the Markdown plan report and build sheet hold no line the name started
 *   (CommonMark 0.31.2: a heading or list needs a line of its own);
 * - the command line's printed text holds no ECMA-48 control character;
 * - plan container names that read the same (NFC, case, spaces; UAX #15) are
 *   refused as one name, and names that differ are accepted.
 */
import fc from 'fast-check';
import { strFromU8, unzipSync } from 'fflate';
import { SaxesParser } from 'saxes';
import { describe, expect, it } from 'vitest';
import { buildSheetMarkdown } from '../../generator/doc/build-sheet.ts';
import { nameKey } from '../../generator/doc/safe-text/index.ts';
import { terminalText } from '../../generator/doc/safe-text/terminal-text.ts';
import { parseDesign } from '../../generator/doc/schema.ts';
import { planMarkdown, planReport } from '../../generator/plan/report.ts';
import { parsePlan } from '../../generator/plan/schema.ts';
import { solvePlan } from '../../generator/plan/solve-plan.ts';
import { write3mf, type IndexedMesh } from '../../generator/solids/mesh/index.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import { fuzzSeed } from './budget.ts';

const RUNS = 150;

/** Characters that cause trouble somewhere, mixed with ordinary text. */
const nasty = fc.constantFrom(
  '\u0000', '\u0001', '\u0007', '\u0008', '\u000b', '\u000c', '\u001b', '\u001b[2J', '\u001b]0;t\u0007', '\u007f', '\u0085', '\u009b',
  '\uD800', '\uDFFF', '\uD83D\uDE00', '\uFFFE', '\uFFFF', '\u202E', '\u2066', '\u2028', '\u2029', '\n', '\r\n', '\r', '\t',
  '# ', '## ', '- ', '* ', '1. ', '| a |', '`', '<b>', '&amp;', ']]>', '<!--', '"', "'", '\\', 'e\u0301', '\u00e9', ' (!)',
);
const hostileText = (maxLength: number) =>
  fc.array(fc.oneof({ weight: 2, arbitrary: nasty }, { weight: 1, arbitrary: fc.string({ maxLength: 6 }) }, { weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 4 }) }), { maxLength: 14 })
    .map((parts) => parts.join('').slice(0, maxLength));

const TETRA: IndexedMesh = { positions: new Float32Array([0, 0, 0, 10, 0, 0, 0, 10, 0, 0, 0, 10]), indices: new Uint32Array([0, 2, 1, 0, 1, 3, 0, 3, 2, 1, 2, 3]) };

function xmlError(text: string): string | null {
  const parser = new SaxesParser();
  let error: string | null = null;
  parser.on('error', (e) => void (error ??= e.message));
  parser.write(text).close();
  return error;
}

const sized = (() => {
  const p = parseDesign({ supply: { headMax: '2.2 m' }, level: { target: '45 mm' } });
  if (!p.ok) throw new Error('bad');
  const s = sizeDesign(p.inputs);
  if (!s.ok) throw new Error('no fit');
  return { document: p.document, sizing: s };
})();

/** A line of the Markdown that the hostile text started: it begins with a piece of the text's own markup. */
function injectedLine(md: string, marker: string): boolean {
  return md.split('\n').some((line) => line.startsWith(marker));
}

describe('hostile names land safely (fast-check)', () => {
  it(`${RUNS} names in a 3MF: every XML part well-formed`, () => {
    fc.assert(
      fc.property(hostileText(200), (name) => {
        const files = unzipSync(write3mf([{ name: name.trim() ? name : `x${name}`, mesh: TETRA }], { plateWidthMm: 256, plateDepthMm: 256, spacingMm: 10, title: name }));
        for (const [path, bytes] of Object.entries(files)) {
          if (path.endsWith('.png')) continue;
          const problem = xmlError(strFromU8(bytes));
          if (problem) throw new Error(`${path}: ${problem} for ${JSON.stringify(name)}`);
        }
      }),
      { numRuns: RUNS, seed: fuzzSeed() },
    );
  });

  it(`${RUNS} names and notes in the build sheet and a plan report: no line of their own, nothing printed that drives a terminal`, () => {
    let reports = 0;
    fc.assert(
      fc.property(hostileText(60), hostileText(300), (name, notes) => {
        const tagged = `${name}\n#INJECT`;
        const sheet = buildSheetMarkdown(sized.sizing, { ...sized.document, name: tagged, notes: `${notes}\n- INJECT` });
        expect(injectedLine(sheet, '#INJECT')).toBe(false);
        expect(injectedLine(sheet, '- INJECT')).toBe(false);
        const plan = parsePlan({
          name: tagged,
          tank: { fullSurfaceElevation: '2 m' },
          main: { innerDiameter: '8 mm' },
          containers: [{ name: name.trim() ? `${name}\n#INJECT` : 'row', floorElevation: '0.3 m', level: '45 mm' }],
        });
        if (!plan.ok) return; // a name of only spaces is refused as missing: checked elsewhere
        const solved = solvePlan(plan.plan);
        if (!solved.ok) return;
        const md = planMarkdown(planReport(solved.result));
        reports++;
        expect(injectedLine(md, '#INJECT')).toBe(false);
        expect(terminalText(md)).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/);
      }),
      { numRuns: 40, seed: fuzzSeed() },
    );
    expect(reports).toBeGreaterThan(10); // most drawn names make a plan: the report check is not vacuous
  }, 120_000);

  it(`${RUNS} pairs of container names: the same name as people read it is refused, different names are accepted`, () => {
    const spelling = fc.tuple(fc.string({ minLength: 1, maxLength: 12 }), fc.constantFrom('', ' ', '  ', '\u00a0', '\t'), fc.boolean(), fc.boolean());
    fc.assert(
      fc.property(spelling, spelling, ([a, pad, upper, nfd], [b]) => {
        const variant = `${pad}${upper ? a.toUpperCase() : a}${pad}`.normalize(nfd ? 'NFD' : 'NFC');
        for (const [first, second] of [[a, variant], [a, b]]) {
          const parsed = parsePlan({
            tank: { fullSurfaceElevation: '2 m' },
            main: { innerDiameter: '8 mm' },
            containers: [{ name: first, floorElevation: '0.3 m', level: '45 mm' }, { name: second, floorElevation: '0.2 m', level: '45 mm' }],
          });
          const same = nameKey(first!) === nameKey(second!);
          const duplicate = !parsed.ok && parsed.errors.some((e) => e.field === 'containers.1.name' && /already the name of containers\.0/.test(e.message));
          if (first!.trim() === '' || second!.trim() === '') continue;
          expect(duplicate).toBe(same);
          if (first === a && second === variant) expect(same).toBe(true);
        }
      }),
      { numRuns: RUNS, seed: fuzzSeed() },
    );
  });
});
