/**
 * Hostile design and plan documents on the command line (size, build, plan):
 * wrong types, missing and extra keys, __proto__ / constructor / prototype
 * keys, numbers as junk text, NaN, Infinity (1e999 in JSON), -0, 1e308, deep
 * nesting, a 10 MB file, text that is not JSON, a binary file. Each must get a
 * clear message naming the field, exit status 2, no stack trace, and nothing
 * written. Exit codes per the project's command-line contract (0 / 2 / 1),
 * common practice for Unix tools. JSON text per RFC 8259 (source: the JSON
 * standard: NaN and Infinity are not JSON; 1e999 parses to Infinity in JavaScript).
 *
 * Most cases run the command in this process (runCli with captured streams);
 * the big and binary files also run as a grower runs them, `node generator/cli/bin.js`.
 */
import { execFile } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../generator/cli/main.ts';
import type { Io } from '../../generator/cli/command.ts';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const BIN = join(ROOT, 'generator/cli/bin.js');
const work = mkdtempSync(join(tmpdir(), 'fw-hostile-'));

function capture(): Io & { out$: string; err$: string } {
  const io = { out$: '', err$: '', out: (t: string) => void (io.out$ += t), err: (t: string) => void (io.err$ += t) };
  return io;
}

let fileCount = 0;
function file(content: string | Uint8Array): string {
  const path = join(work, `doc-${++fileCount}.json`);
  writeFileSync(path, content);
  return path;
}

/** A stack trace line ("    at fn (file:1:2)") anywhere in the text. */
const STACK = /^\s+at .+(:\d+:\d+|\(native\)|<anonymous>)/m;

const GOOD_LEVEL = '"level": { "target": "40 mm" }';
const GOOD_SUPPLY = '"supply": { "headMax": "2 m" }';
const deep = (n: number, inner: string) => '['.repeat(n) + inner + ']'.repeat(n);

/** Hostile design documents as file text, and a field path the message must name. */
const DESIGNS: { name: string; text: string | Uint8Array; field: RegExp }[] = [
  { name: 'a section of the wrong type', text: `{ "supply": 5, ${GOOD_LEVEL} }`, field: /supply/ },
  { name: 'a head of the wrong type', text: `{ "supply": { "headMax": true }, ${GOOD_LEVEL} }`, field: /supply\.headMax/ },
  { name: 'a head as a list', text: `{ "supply": { "headMax": [2] }, ${GOOD_LEVEL} }`, field: /supply\.headMax/ },
  { name: 'missing everything', text: '{}', field: /supply\.headMax/ },
  { name: 'missing the level', text: `{ ${GOOD_SUPPLY} }`, field: /level\.target/ },
  { name: 'an extra key (typo)', text: `{ "supply": { "headMax": "2 m", "headmin": "1 m" }, ${GOOD_LEVEL} }`, field: /supply\.headmin/ },
  { name: 'an extra top-level key', text: `{ ${GOOD_SUPPLY}, ${GOOD_LEVEL}, "colour": "red" }`, field: /colour/ },
  { name: '__proto__ at the top', text: `{ "__proto__": { "polluted": 1 }, ${GOOD_SUPPLY}, ${GOOD_LEVEL} }`, field: /__proto__/ },
  { name: '__proto__ in a section', text: `{ "supply": { "__proto__": { "headMax": "2 m" } }, ${GOOD_LEVEL} }`, field: /supply\.__proto__/ },
  { name: 'constructor.prototype', text: `{ "constructor": { "prototype": { "x": 1 } }, ${GOOD_SUPPLY}, ${GOOD_LEVEL} }`, field: /constructor/ },
  { name: 'prototype in the material', text: `{ ${GOOD_SUPPLY}, ${GOOD_LEVEL}, "print": { "material": { "prototype": 1, "name": "x", "density": 1.2 } } }`, field: /print\.material\.prototype/ },
  { name: 'a number with junk', text: `{ "supply": { "headMax": "2.2 mtrs" }, ${GOOD_LEVEL} }`, field: /supply\.headMax/ },
  { name: 'a number with two points', text: `{ "supply": { "headMax": "2..2 m" }, ${GOOD_LEVEL} }`, field: /supply\.headMax/ },
  { name: 'NaN as text', text: `{ "supply": { "headMax": "NaN" }, ${GOOD_LEVEL} }`, field: /supply\.headMax/ },
  { name: 'NaN as a bare token (not JSON)', text: `{ "supply": { "headMax": NaN }, ${GOOD_LEVEL} }`, field: /design/ },
  { name: '1e999 (Infinity once parsed)', text: `{ "supply": { "headMax": 1e999 }, ${GOOD_LEVEL} }`, field: /supply\.headMax/ },
  { name: 'Infinity as text', text: `{ ${GOOD_SUPPLY}, "level": { "target": "Infinity mm" } }`, field: /level\.target/ },
  { name: 'negative zero', text: `{ ${GOOD_SUPPLY}, "level": { "target": -0 } }`, field: /level\.target/ },
  { name: '1e308', text: `{ ${GOOD_SUPPLY}, "level": { "target": 1e308 } }`, field: /level\.target/ },
  { name: '1e308 m in a millimetre field', text: `{ "supply": { "headMax": "2 m", "tubeInnerDiameter": "1e308 m" }, ${GOOD_LEVEL} }`, field: /supply\.tubeInnerDiameter/ },
  { name: 'deeply nested value', text: `{ "supply": { "headMax": ${deep(5000, '2')} }, ${GOOD_LEVEL} }`, field: /supply\.headMax/ },
  { name: 'deeply nested document', text: deep(100_000, '1'), field: /design/ },
  { name: 'deeply nested objects', text: `{ ${GOOD_SUPPLY}, ${GOOD_LEVEL}, "notes": ${'{"a":'.repeat(3000)}1${'}'.repeat(3000)} }`, field: /notes/ },
  { name: 'a list, not a document', text: '[1, 2, 3]', field: /design/ },
  { name: 'null', text: 'null', field: /design/ },
  { name: 'an empty file', text: '', field: /design/ },
  { name: 'YAML, not JSON', text: 'supply:\n  headMax: 2 m\nlevel:\n  target: 40 mm\n', field: /design/ },
  { name: 'a binary file', text: Uint8Array.from({ length: 4096 }, (_, i) => (i * 2654435761) % 256), field: /design/ },
  { name: 'bench points that fall with head', text: `{ ${GOOD_SUPPLY}, ${GOOD_LEVEL}, "seal": { "calibration": [{ "head": 0.5, "mass": 40 }, { "head": 2, "mass": 10 }] } }`, field: /seal\.calibration/ },
];

/** A 10 MB file: a valid document with a huge note. */
const TEN_MB = `{ ${GOOD_SUPPLY}, ${GOOD_LEVEL}, "notes": "${'x'.repeat(10 * 1024 * 1024)}" }`;

function outcome(io: { out$: string; err$: string }, status: number, field: RegExp, outDir?: string): void {
  const text = io.err$ + io.out$;
  expect(status, text).toBe(2);
  expect(text).not.toMatch(STACK);
  expect(text).not.toMatch(/sorry, something went wrong/);
  expect(text).toMatch(field);
  expect(text).not.toMatch(/\[object Object\]|undefined/);
  if (outDir) {
    expect(!existsSync(outDir) || readdirSync(outDir).length === 0, `${outDir} holds ${existsSync(outDir) ? readdirSync(outDir) : ''}`).toBe(true);
  }
}

describe('floatwright size with hostile design files: exit 2, the field named, no stack trace', () => {
  it.each(DESIGNS)('$name', async ({ text, field }) => {
    const io = capture();
    outcome(io, await runCli(['size', '--design', file(text)], io), field);
    const json = capture();
    const status = await runCli(['size', '--design', file(text), '--json'], json);
    expect(status).toBe(2);
    const parsed = JSON.parse(json.out$);
    expect(parsed.ok).toBe(false);
    expect(parsed.errors.map((e: { field: string }) => e.field).join(' ')).toMatch(field);
  });
});

describe('floatwright build with hostile design files: exit 2 and nothing written', () => {
  it.each(DESIGNS)('$name', async ({ text, field }) => {
    const out = join(work, `build-${++fileCount}`);
    const io = capture();
    outcome(io, await runCli(['build', '--design', file(text), '--out', out, '--quality', 'preview'], io), field, out);
  });

  it('an existing folder keeps its files when the design is refused', async () => {
    const out = join(work, 'kept');
    mkdirSync(out);
    writeFileSync(join(out, 'mine.txt'), 'grower notes');
    const io = capture();
    expect(await runCli(['build', '--design', file(DESIGNS[0].text), '--out', out], io)).toBe(2);
    expect(readdirSync(out)).toEqual(['mine.txt']);
  });
});

/** Hostile plan documents (plan schema: tank, main, containers), with a path the message must name. */
const PLAN_OK = {
  tank: { fullSurfaceElevation: '2.4 m' },
  main: { innerDiameter: '8 mm' },
  containers: [{ name: 'a', count: 1, floorElevation: '0.5 m', level: '40 mm', mainLength: '2 m' }],
};
const planText = (patch: (p: any) => void) => {
  const p = structuredClone(PLAN_OK) as any;
  patch(p);
  return JSON.stringify(p);
};
const PLANS: { name: string; text: string | Uint8Array; field: RegExp }[] = [
  { name: 'containers not a list', text: planText((p) => (p.containers = 'many')), field: /containers/ },
  { name: 'a count of 1e308', text: planText((p) => (p.containers[0].count = 1e308)), field: /containers\.0\.count/ },
  { name: 'a floor elevation of NaN text', text: planText((p) => (p.containers[0].floorElevation = 'NaN')), field: /containers\.0\.floorElevation/ },
  { name: 'a missing tank', text: planText((p) => delete p.tank), field: /tank/ },
  { name: 'an extra key', text: planText((p) => (p.pump = { power: '1 kW' })), field: /pump/ },
  { name: '__proto__ in a container', text: planText(() => {}).replace('"name":"a"', '"__proto__":{"count":5},"name":"a"'), field: /containers\.0\.__proto__/ },
  { name: 'constructor at the top', text: planText(() => {}).replace('{', '{"constructor":{"prototype":{}},'), field: /constructor/ },
  { name: 'a design override with junk', text: planText((p) => (p.design = { print: { wall: '2.4 mmm' } })), field: /design\.print\.wall/ },
  { name: 'a level of -0', text: planText((p) => (p.containers[0].level = -0)), field: /containers\.0\.level/ },
  { name: 'deeply nested', text: deep(50_000, '{}'), field: /plan/ },
  { name: 'a deeply nested design override', text: planText(() => {}).replace('"name":"a"', `"design":{"notes":${deep(20_000, '1')}},"name":"a"`), field: /containers\.0\.design\.notes/ },
  { name: 'not JSON', text: 'tank = 2.4 m', field: /plan/ },
  { name: 'a binary file', text: Uint8Array.from({ length: 2048 }, (_, i) => (i * 40503) % 256), field: /plan/ },
];

describe('floatwright plan with hostile plan files: exit 2, the field named, nothing written', () => {
  it.each(PLANS)('$name', async ({ text, field }) => {
    const io = capture();
    outcome(io, await runCli(['plan', file(text)], io), field);
  });

  it('with --out, a refused plan leaves no folder and no partial folder behind', async () => {
    const parent = mkdtempSync(join(work, 'plan-'));
    const out = join(parent, 'bench');
    for (const { text, field } of PLANS.slice(0, 3)) {
      const io = capture();
      outcome(io, await runCli(['plan', file(text), '--out', out, '--quality', 'preview'], io), field, out);
    }
    expect(readdirSync(parent)).toEqual([]);
  });
});

/** Run the command line as a grower does. */
function floatwright(...args: string[]): Promise<{ status: number | null; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    execFile(process.execPath, [BIN, ...args], { cwd: ROOT, encoding: 'utf8', timeout: 60_000, maxBuffer: 64 * 1024 * 1024 }, (error, stdout, stderr) => {
      resolve({ status: error ? (typeof error.code === 'number' ? error.code : null) : 0, stdout, stderr });
    });
  });
}

describe('big and binary files through node generator/cli/bin.js', () => {
  it('a 10 MB design file: refused by size with its size named, exit 2, nothing written by build', async () => {
    const big = file(TEN_MB);
    const out = join(work, 'big-out');
    const [size, build] = await Promise.all([floatwright('size', '--design', big), floatwright('build', '--design', big, '--out', out)]);
    for (const run of [size, build]) {
      expect(run.status).toBe(2);
      expect(run.stderr.replace(/\s+/g, ' ')).toMatch(/10\.0 MB; a design document must be at most 1 MB/);
      expect(run.stderr).not.toMatch(STACK);
      expect(run.stderr.length).toBeLessThan(2000); // the message, not the file
    }
    expect(existsSync(out)).toBe(false);
  }, 60_000);

  it('a binary file and a 10 MB plan: exit 2 with a message, no stack trace', async () => {
    const [binary, plan] = await Promise.all([
      floatwright('size', '--design', file(DESIGNS.find((d) => d.name === 'a binary file')!.text)),
      floatwright('plan', file(TEN_MB)),
    ]);
    expect(binary.status).toBe(2);
    expect(binary.stderr).toMatch(/not valid JSON/);
    expect(binary.stderr).not.toMatch(STACK);
    expect(plan.status).toBe(2);
    expect(plan.stderr.replace(/\s+/g, ' ')).toMatch(/plan: .*10\.0 MB; a plan document must be at most 1 MB/);
  }, 60_000);
});
