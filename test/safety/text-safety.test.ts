/**
 * Text that leaves the program is safe where it lands (issue 11, item 5 and 10).
 * XML: the 3MF's XML parts are read by saxes, a conforming XML 1.0 parser
 * (general-purpose npm library), which refuses the characters XML 1.0
 * section 2.2 production [2] Char leaves out (U+0000-U+001F except tab, LF, CR;
 * lone surrogates; U+FFFE, U+FFFF). Markdown: a line break never survives into
 * the text, so no name can start a heading (CommonMark 0.31.2, 4.2 ATX headings:
 * "#" only at a line's start); backslash escapes per CommonMark 2.4.
 * Terminal: ECMA-48 control sets C0 (00-1F), DEL and C1 (80-9F) never printed.
 */
import { strFromU8, unzipSync } from 'fflate';
import { SaxesParser } from 'saxes';
import { describe, expect, it } from 'vitest';
import { markdownText, nameKey, cleanName, terminalText, xmlText } from '../../generator/doc/safe-text/index.ts';
import { write3mf, type IndexedMesh } from '../../generator/solids/mesh/index.ts';

/** A closed tetrahedron, 10 mm legs, outward winding. */
const TETRA: IndexedMesh = {
  positions: new Float32Array([0, 0, 0, 10, 0, 0, 0, 10, 0, 0, 0, 10]),
  indices: new Uint32Array([0, 2, 1, 0, 1, 3, 0, 3, 2, 1, 2, 3]),
};

/** Every character XML 1.0 refuses, and neighbours it allows, in one name. */
export const HOSTILE_NAMES = [
  'nul\u0000here',
  'bell\u0007and esc\u001b[31mred',
  'all C0: ' + Array.from({ length: 32 }, (_, i) => String.fromCharCode(i)).join(''),
  'non-chars \uFFFE\uFFFF',
  'lone high \uD800 and low \uDC00',
  'pair ok \uD83D\uDE00, é, tab\tline\nreturn\r',
  '<tag attr="x">&amp;\'',
];

/** The first XML error saxes reports, or null for a well-formed document. */
function xmlError(text: string): string | null {
  const parser = new SaxesParser();
  let error: string | null = null;
  parser.on('error', (e) => void (error ??= e.message));
  parser.write(text).close();
  return error;
}

describe('3MF text is XML 1.0', () => {
  it('the parser used really refuses what XML 1.0 refuses (the check can fail)', () => {
    expect(xmlError('<a>\u0001</a>')).not.toBeNull();
    expect(xmlError('<a>\uFFFF</a>')).not.toBeNull();
    expect(xmlError('<a n="\uD800"/>')).not.toBeNull();
    expect(xmlError('<a>é \uD83D\uDE00</a>')).toBeNull();
  });

  it.each(HOSTILE_NAMES)('a part and title named %j give well-formed XML in every part of the package', (name) => {
    const bytes = write3mf([{ name, mesh: TETRA }], { plateWidthMm: 256, plateDepthMm: 256, spacingMm: 10, title: name });
    const files = unzipSync(bytes);
    const xmlParts = Object.keys(files).filter((f) => f.endsWith('.xml') || f.endsWith('.model') || f.endsWith('.rels'));
    expect(xmlParts.length).toBeGreaterThanOrEqual(3);
    for (const f of xmlParts) expect(xmlError(strFromU8(files[f]!)), f).toBeNull();
    const model = strFromU8(files['3D/3dmodel.model']!);
    // what XML allows is kept (escaped): the readable part of the name survives
    expect(model).toContain(xmlText(name).split(/[\u0000-\u001f<>&"']/)[0]!.slice(0, 4));
  });

  it('xmlText keeps tab, newline, CR, pairs and the BMP; replaces the rest with U+FFFD', () => {
    expect(xmlText('a\tb\nc\rd\uD83D\uDE00\uFFFD')).toBe('a\tb\nc\rd\uD83D\uDE00\uFFFD');
    expect(xmlText('\u0000\u001f\uFFFE\uFFFF\uD800\uDFFF'.split('').reverse().join(''))).toBe('\uFFFD'.repeat(6));
  });
});

describe('Markdown, terminal and name keys', () => {
  it('a newline in a name never starts a heading or a list', () => {
    const md = markdownText('tub\n# injected\r\n- item\u2028## more');
    expect(md.split('\n')).toHaveLength(1);
    expect(md).not.toMatch(/(^|\n)#/);
    expect(md).toBe('tub \\# injected - item \\#\\# more');
  });

  it('table and emphasis characters are escaped, plain text left readable', () => {
    expect(markdownText('a|b *c* _d_ [e](f) <b> `g` \\')).toBe('a\\|b \\*c\\* \\_d\\_ \\[e\\](f) \\<b\\> \\`g\\` \\\\');
    expect(markdownText('top tier (!)')).toBe('top tier (!)');
  });

  it('terminal text loses every C0 / C1 control but tab and newline, and bidi overrides', () => {
    const all = Array.from({ length: 160 }, (_, i) => String.fromCharCode(i)).join('') + '\u202E\u2066';
    const kept = terminalText(all);
    expect([...kept].every((c) => c === '\t' || c === '\n' || (c >= ' ' && c !== '\u007f' && c < '\u0080') || c >= '\u00a0')).toBe(true);
    expect(kept).toContain('\t');
    expect(terminalText('ok\u001b]0;title\u0007\u001b[2J')).toBe('ok]0;title[2J');
  });

  it('names differing only by case, spaces or Unicode form have one key (UAX #15: NFC)', () => {
    expect(nameKey('  Top   Tier ')).toBe(nameKey('top tier'));
    expect(nameKey('Caf\u00e9')).toBe(nameKey('CAFE\u0301'));
    expect(nameKey('top\u00a0tier')).toBe(nameKey('top tier'));
    expect(nameKey('top tier')).not.toBe(nameKey('top tiers'));
    expect(cleanName(' a \t b ')).toBe('a b');
  });
});

describe('where the text lands', () => {
  it('build sheet Markdown: a newline and "#" in the name or notes never start a heading (CommonMark 4.2)', async () => {
    const { parseDesign } = await import('../../generator/doc/schema.ts');
    const { sizeDesign } = await import('../../generator/sizing/size-design.ts');
    const { buildSheetMarkdown } = await import('../../generator/doc/build-sheet.ts');
    const parsed = parseDesign({ name: 'tubs\n# injected name', notes: 'line one\n## injected notes\n| a | b |', supply: { headMax: '2.2 m' }, level: { target: '45 mm' } });
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    const sized = sizeDesign(parsed.inputs);
    if (!sized.ok) throw new Error('no size');
    const md = buildSheetMarkdown(sized, parsed.document);
    expect(md).not.toMatch(/^#+ injected/m);
    expect(md).not.toMatch(/^\| a \| b \|/m);
    expect(md.split('\n')[0]).toBe('# tubs \\# injected name: build sheet');
  });

  it('the command line prints no control character from a name (ECMA-48 C0 / C1), in text or JSON', async () => {
    const { mkdtempSync, writeFileSync } = await import('node:fs');
    const { tmpdir } = await import('node:os');
    const { join } = await import('node:path');
    const { floatwright } = await import('./helpers.ts');
    const dir = mkdtempSync(join(tmpdir(), 'fw-term-'));
    const design = join(dir, 'd.json');
    writeFileSync(design, JSON.stringify({ name: 'tub\u001b]0;owned\u0007\u001b[2J\u009b31m\u202e', supply: { headMax: '2.2 m' }, level: { target: '45 mm' } }));
    for (const args of [['size', '--design', design], ['size', '--design', design, '--json'], ['size', '--design', design, '--level', '9\u001b[2J\u009bkm']]) {
      const run = await floatwright(...args);
      expect(run.stdout + run.stderr).toMatch(/tub|level/);
      expect(run.stdout + run.stderr).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u202e]/);
    }
  }, 60_000);
});

describe('plan plates', () => {
  it('a container named with control characters gives plate 3MF files and design 3MFs that saxes reads (XML 1.0, 2.2)', async () => {
    const { mkdtempSync, readdirSync, readFileSync, writeFileSync } = await import('node:fs');
    const { tmpdir } = await import('node:os');
    const { join } = await import('node:path');
    const { runCli } = await import('../../generator/cli/main.ts');
    const dir = mkdtempSync(join(tmpdir(), 'fw-plates-'));
    const plan = join(dir, 'plan.json');
    writeFileSync(plan, JSON.stringify({
      name: 'bench \u0001\u001b[2J\uffff',
      tank: { fullSurfaceElevation: '2.2 m', lowSurfaceElevation: '1.8 m' },
      main: { innerDiameter: '8 mm' },
      containers: [{ name: 'tub \u0000\u0007 <a>', floorElevation: '0.3 m', level: '45 mm' }],
    }));
    const out = join(dir, 'bench');
    const io = { out: () => {}, err: () => {} };
    expect(await runCli(['plan', plan, '--out', out, '--quality', 'preview'], io)).toBe(0);
    const threeMfs = [
      ...readdirSync(join(out, 'plates')).map((f) => join(out, 'plates', f)),
      ...readdirSync(out).filter((d) => d.startsWith('d1-')).flatMap((d) => readdirSync(join(out, d)).map((f) => join(out, d, f))),
    ].filter((f) => f.endsWith('.3mf'));
    expect(threeMfs.length).toBeGreaterThanOrEqual(2);
    for (const f of threeMfs) {
      for (const [part, bytes] of Object.entries(unzipSync(readFileSync(f)))) expect(xmlError(strFromU8(bytes)), `${f} ${part}`).toBeNull();
    }
  }, 60_000);
});
