// The `size` command, run as a grower runs it: `node generator/cli/bin.js size ...`.
// Outside checks: the closing force at the highest head against F = rho g H (pi/4) d_s^2 + F_pre
// (hydrostatics, p A; g = 9.80665 m/s2, NIST SP 330; water 998.2 kg/m3, CRC Handbook, from memory);
// the 10 ft head cap, 1 ft = 0.3048 m (NIST SP 811). The cautions are the shared project text.
import { execFile } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import { CAUTIONS } from '../../generator/doc/cautions.ts';
import { reportFault, runCli } from '../../generator/cli/main.ts';
import type { Io } from '../../generator/cli/command.ts';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const BIN = join(ROOT, 'generator/cli/bin.js');
const PRESETS = ['rooftop-tubs', 'greenhouse-trays', 'bucket-tote', 'shallow-trays', 'deep-buckets'];

interface Run {
  status: number | null;
  stdout: string;
  stderr: string;
}
/** Run the command line in a child process (several can run at once). */
function floatwright(...args: string[]): Promise<Run> {
  return new Promise((resolve) => {
    execFile(process.execPath, [BIN, ...args], { cwd: ROOT, encoding: 'utf8', timeout: 60_000 }, (error, stdout, stderr) => {
      const status = error ? (typeof error.code === 'number' ? error.code : null) : 0;
      resolve({ status, stdout, stderr });
    });
  });
}
function json(run: Run): any {
  return JSON.parse(run.stdout);
}
const flat = (text: string) => text.replace(/\s+/g, ' ');

/** Every field the issue asks the JSON to carry (paths into SizingSuccess); the direct valve's own and the lever's own below. */
const REQUIRED_NUMBERS = [
  'footprintMm',
  'closingForce.atHeadMaxN', 'closingForce.atHeadMinN',
  'float.outerDiameterMm', 'float.heightMm', 'float.massG', 'float.volumeMm3', 'float.availableForceN',
  'nozzle.tipHeightMm', 'nozzle.travelMm',
  'levels.shutOffAtHeadMaxMm', 'levels.shutOffAtHeadMinMm', 'levels.liftOffMm', 'levels.minimumReachableMm',
  'flow.atHeadMaxLph', 'flow.atHeadMinLph', 'flow.reynoldsAtHeadMax',
  'holdDown.upliftN', 'holdDown.ballastSteelG',
  // issue 9 (seal and float integrity)
  'float.shellMm', 'float.leakToleranceMl', 'float.levelRisePerMlMm',
  'seal.padStiffnessKpa', 'seal.indentationMm', 'seal.worstStrain',
  'closingForce.modelAreaMm2', 'closingForce.seatN',
];
const DIRECT_NUMBERS = [
  'housing.boreMm', 'housing.outerDiameterMm', 'housing.heightMm', 'housing.massG',
  'drain.requiredAreaMm2', 'drain.providedAreaMm2', 'holdDown.netWeightN', 'tilt.maxAngleDeg', 'tilt.lipGapMm',
];
/** issue 13, Interface: a lever's own (rim.adjustMm on the rim) */
const LEVER_NUMBERS = ['lever.ratio', 'lever.pivotHeightMm', 'lever.armLengthMm', 'lever.hysteresisMm', 'frame.heightMm', 'holdDown.anchorForceN'];
const at = (obj: any, path: string) => path.split('.').reduce((o, k) => (o == null ? undefined : o[k]), obj);

describe('floatwright size --design PRESET --json', () => {
  const runs = new Map<string, Run>();
  beforeAll(async () => {
    const done = await Promise.all(PRESETS.map((preset) => floatwright('size', '--design', `presets/${preset}.json`, '--json')));
    PRESETS.forEach((preset, i) => runs.set(preset, done[i]));
  });

  it.each(PRESETS)('%s: exits 0 with every required field', (preset) => {
    const run = runs.get(preset)!;
    expect(run.stderr).toBe('');
    expect(run.status).toBe(0);
    const result = json(run);
    expect(result.ok).toBe(true);
    const own = result.architecture === 'lever' ? [...LEVER_NUMBERS, ...(result.mount === 'rim' ? ['rim.adjustMm'] : [])] : DIRECT_NUMBERS;
    for (const path of [...REQUIRED_NUMBERS, ...own]) {
      expect(Number.isFinite(at(result, path)), path).toBe(true);
    }
    expect(['direct', 'lever']).toContain(result.architecture);
    expect(['floor', 'rim']).toContain(result.mount);
    expect(Array.isArray(result.boundBy)).toBe(true);
    expect(result.boundBy.length).toBeGreaterThan(0);
    expect(Array.isArray(result.warnings)).toBe(true);
    expect(result.levels.shutOffAtHeadMaxMm).toBeCloseTo(result.levels.targetMm, 6);
  });

  it('rooftop-tubs: tight-seal force at 2.2 m by the gasket-factor form on a grade 2 sponge (ASME VIII-1 App. 2; ASTM D1056)', async () => {
    const result = json(runs.get('rooftop-tubs')!);
    // Lip 2 / 5 mm: G = 3.5 mm, b = 0.75 mm; m = 0.5 gives 17.87 mm2 (ASME BPVC VIII-1 Mandatory App. 2 form; m from memory).
    const area = (Math.PI / 4) * 3.5 ** 2 + 2 * Math.PI * 0.75 * 3.5 * 0.5; // mm2
    expect(area).toBeCloseTo(17.87, 2);
    const ring = Math.PI * 3.5 * 1.5; // land pi G 2b = (pi/4)(5^2 - 2^2) = 16.49 mm2
    const p = 998.2 * 9.80665 * 2.2; // Pa, rho g H
    // Grade 1 sponge (14-34 kPa at 25 %, ASTM D1056 from memory; middle 24 kPa, so 96 kPa secant) would be squeezed
    // past the 20 % the choice allows: land stress (F - p A_o)/A_land over E, seated by 0.2 mm of the 3 mm pad.
    const strain = (E: number) => ((p * area * 1e-6 + E * (0.2 / 3) * ring * 1e-6 - p * Math.PI * 1e-6) / (ring * 1e-6)) / E;
    expect(strain(96e3)).toBeGreaterThan(0.2);
    expect(strain(192e3)).toBeLessThan(0.2); // grade 2: 34-62 kPa, middle 48 kPa, 192 kPa secant
    expect(result.seal.padMaterial).toBe('sponge grade 2');
    const expected = p * area * 1e-6 + 192e3 * (0.2 / 3) * ring * 1e-6; // 0.385 + 0.211 = 0.596 N
    expect(result.closingForce.atHeadMaxN).toBeCloseTo(expected, 6);
    expect(result.closingForce.seatN).toBeCloseTo(192e3 * (0.2 / 3) * ring * 1e-6, 9);
    expect(result.closingForce.modelAreaMm2).toBeCloseTo(area, 9);
    expect(result.seal.indentationMm).toBeCloseTo(strain(192e3) * 3, 9);
    expect(result.seal.stopIndentationMm).toBeCloseTo(0.75, 12); // 25 % of 3 mm (common practice)
    expect(result.float.shellMm).toBeCloseTo(4 * 0.45, 12); // four 0.45 mm lines
    expect(result.inputs.headMinM).toBe(1.6);
    expect(result.inputs.materialName).toBe('PETG');
  });
});

describe('seal pad and overflow on the command line', () => {
  it('--pad names a table pad; an unknown one is refused by its field and flag, listing the known pads', async () => {
    const [named, unknown] = await Promise.all([
      floatwright('size', '--design', 'presets/rooftop-tubs.json', '--pad', 'Sponge-2', '--json'),
      floatwright('size', '--design', 'presets/rooftop-tubs.json', '--pad', 'felt'),
    ]);
    expect(named.status).toBe(0);
    expect(json(named).seal.padMaterial).toBe('sponge grade 2');
    expect(json(named).seal.padChosen).toBe(false);
    expect(unknown.status).toBe(2);
    expect(flat(unknown.stderr)).toContain('seal.pad (--pad): "felt" is not a pad in the table');
    expect(flat(unknown.stderr)).toContain('sponge grade 0');
    expect(flat(unknown.stderr)).toContain('rubber 80A');
  });
  it('--overflow within 10 mm of the shut-off is refused with a way out naming container.overflow', async () => {
    const run = await floatwright('size', '--design', 'presets/rooftop-tubs.json', '--overflow', '50mm');
    expect(run.status).toBe(2);
    const out = flat(run.stdout + run.stderr);
    expect(out).toContain('within 10 mm of the container\'s overflow at 50 mm');
    expect(out).toContain('container.overflow = 55 mm');
  });
});

describe('input handling', () => {
  it('flags override the file', async () => {
    const result = json(await floatwright('size', '--design', 'presets/rooftop-tubs.json', '--level', '50mm', '--material', 'pla', '--head-min', '1.8 m', '--json'));
    expect(result.ok).toBe(true);
    expect(result.levels.targetMm).toBeCloseTo(50, 9);
    expect(result.inputs.targetLevelM).toBe(0.05);
    expect(result.inputs.materialName).toBe('PLA');
    expect(result.inputs.headMinM).toBe(1.8);
    expect(result.inputs.headMaxM).toBe(2.2); // from the file
  });

  it('--architecture and --mount (issue 13): size --json carries the architecture, mount, footprint, lever and rim figures', async () => {
    const [onFloor, onRim, noRim] = await Promise.all([
      floatwright('size', '--head-max', '2m', '--head-min', '1.5m', '--level', '25mm', '--architecture', 'lever', '--json'),
      floatwright('size', '--head-max', '1.5m', '--level', '250mm', '--rim-height', '350mm', '--mount', 'rim', '--json'),
      floatwright('size', '--head-max', '1.5m', '--level', '250mm', '--mount', 'rim', '--json'),
    ]);
    const floor = json(onFloor);
    expect(floor).toMatchObject({ ok: true, architecture: 'lever', mount: 'floor', rim: null });
    for (const key of ['ratio', 'pivotHeightMm', 'armLengthMm', 'hysteresisMm']) expect(typeof floor.lever[key]).toBe('number');
    expect(floor.footprintMm).toBeLessThanOrEqual(120);
    const rim = json(onRim);
    expect(rim).toMatchObject({ ok: true, architecture: 'lever', mount: 'rim', rim: { adjustMm: 10 } });
    // a rim mount with no rim height is refused by its field and flag
    expect(noRim.status).toBe(2);
    expect(json(noRim).errors[0].field).toBe('container.rimHeight');
  });

  it('flags alone size a valve; without --head-max they name the field', async () => {
    const [sized, missing] = await Promise.all([
      floatwright('size', '--head-max', '7ft', '--level', '1.5in', '--json'),
      floatwright('size', '--level', '40mm', '--json'),
    ]);
    expect(sized.status).toBe(0);
    expect(json(sized).inputs.headMaxM).toBeCloseTo(7 * 0.3048, 12); // 1 ft = 0.3048 m (NIST SP 811)
    expect(missing.status).toBe(2);
    expect(json(missing)).toEqual({ ok: false, errors: [expect.objectContaining({ field: 'supply.headMax' })] });
  });

  it('bad input exits 2 naming the field, the value and the range, with no stack trace', async () => {
    const [asJson, asText] = await Promise.all([
      floatwright('size', '--design', 'presets/greenhouse-trays.json', '--head-max', '11 ft', '--json'),
      floatwright('size', '--head-max', '2m', '--level', 'deep'),
    ]);
    expect(asJson.status).toBe(2);
    const body = json(asJson);
    expect(body.ok).toBe(false);
    expect(body.errors[0].field).toBe('supply.headMax');
    expect(body.errors[0].message).toContain('"11 ft"');
    expect(body.errors[0].message).toContain('3.05 m');
    expect(body.errors[0].message).toContain('mains pressure');

    expect(asText.status).toBe(2);
    expect(asText.stdout).toBe('');
    expect(asText.stderr).toContain('level.target (--level)');
    expect(asText.stderr).toContain('"deep" is not a length');
    expect(asText.stderr).not.toMatch(/\n\s+at /);
  });

  it('a missing, non-JSON or oversized file is a "design" error', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'floatwright-cli-'));
    const notJson = join(dir, 'broken.json');
    writeFileSync(notJson, '{ "supply": { "headMax": "2 m" ');
    const big = join(dir, 'big.json');
    writeFileSync(big, `{"notes": "${'x'.repeat(1_100_000)}"}`);
    const cases: [string, string][] = [
      [join(dir, 'absent.json'), 'cannot find'],
      [notJson, 'not valid JSON'],
      [big, 'at most 1 MB'],
      [dir, 'not a file'],
    ];
    const runs = await Promise.all(cases.map(([path]) => floatwright('size', '--design', path, '--json')));
    for (const [i, [path, text]] of cases.entries()) {
      const run = runs[i];
      expect(run.status, path).toBe(2);
      const body = json(run);
      expect(body.errors[0].field).toBe('design');
      expect(body.errors[0].message).toContain(text);
    }
  });

  it('an unknown key in the file is named, with a guess', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'floatwright-cli-'));
    const file = join(dir, 'typo.json');
    writeFileSync(file, JSON.stringify({ supply: { headMax: '1 m', headmin: '0.5 m' }, level: { target: '30 mm' } }));
    const body = json(await floatwright('size', '--design', file, '--json'));
    expect(body.errors).toEqual([{ field: 'supply.headmin', message: 'unknown key "headmin"; did you mean "headMin"?' }]);
  });

  it('an unknown option or a stray word exits 2 with a guess', async () => {
    const [run, stray] = await Promise.all([
      floatwright('size', '--design', 'presets/bucket-tote.json', '--materal', 'pla', '--json'),
      floatwright('size', 'presets/bucket-tote.json'),
    ]);
    expect(run.status).toBe(2);
    expect(json(run).errors[0]).toEqual({ field: '--materal', message: expect.stringContaining('did you mean --material?') });
    expect(stray.status).toBe(2);
  });
});

describe('infeasible designs', () => {
  it('exit 2 with reasons and ways out, in JSON and in text', async () => {
    // A 6 mm target at the 10 ft cap cannot be reached by any float within a 60 mm limit.
    const args = ['size', '--head-max', '3m', '--level', '6mm', '--max-diameter', '60mm'];
    const [asJson, asText] = await Promise.all([floatwright(...args, '--json'), floatwright(...args)]);
    expect(asJson.status).toBe(2);
    const body = json(asJson);
    expect(body.ok).toBe(false);
    expect(Array.isArray(body.reasons) && body.reasons.length > 0).toBe(true);
    expect(Array.isArray(body.waysOut)).toBe(true);
    expect(asText.status).toBe(2);
    expect(asText.stderr).toContain('No valve size works');
    expect(asText.stderr).toContain('Ways out');
  });
});

describe('text output', () => {
  it('shows the tables, what bound the size, the warnings and every caution', async () => {
    const run = await floatwright('size', '--design', 'presets/rooftop-tubs.json');
    expect(run.status).toBe(0);
    for (const heading of ['Push needed to shut tight', 'Float', 'Housing', 'Nozzle', 'Levels', 'Flow', 'Drain slots', 'Hold-down', 'Tilt', 'Mass', 'What set the size', 'Warnings', 'Cautions']) {
      expect(run.stdout).toContain(heading);
    }
    const text = flat(run.stdout);
    for (const caution of CAUTIONS) expect(text).toContain(flat(`${caution.title}: ${caution.text}`));
    expect(text).toMatch(/shut tight, tank full 45\.0 mm/);
  });

  it('answers --help for the program and the command', async () => {
    const [top, size, helpSize, typo] = await Promise.all([
      floatwright('--help'),
      floatwright('size', '--help'),
      floatwright('help', 'size'),
      floatwright('sise'),
    ]);
    expect(top.status).toBe(0);
    expect(top.stdout).toContain('size');
    expect(size.status).toBe(0);
    for (const flag of ['--design', '--head-max', '--head-min', '--level', '--material', '--wall', '--orifice', '--seal-diameter', '--tube-diameter', '--tube-length', '--max-diameter', '--reserve', '--json']) {
      expect(size.stdout).toContain(flag);
    }
    expect(helpSize.stdout).toBe(size.stdout);
    expect(typo.status).toBe(2);
  });
});

describe('faults inside floatwright', () => {
  function capture(): Io & { text: () => string } {
    let buffer = '';
    return { out: (t) => (buffer += t), err: (t) => (buffer += t), text: () => buffer };
  }

  it('exit 1 with a one-line apology and how to report; the stack only with --debug', async () => {
    const quiet = capture();
    expect(reportFault(new Error('boom'), false, quiet)).toBe(1);
    expect(quiet.text().trim().split('\n')).toHaveLength(1);
    expect(quiet.text()).toContain('sorry');
    expect(quiet.text()).toContain('report');
    expect(quiet.text()).toContain('--debug');
    const loud = capture();
    reportFault(new Error('boom'), true, loud);
    expect(loud.text()).toMatch(/\n\s+at /);
  });

  it('runs in-process and returns exit codes', async () => {
    const io = capture();
    expect(await runCli(['size', '--design', join(ROOT, 'presets/bucket-tote.json'), '--json'], io)).toBe(0);
    expect(JSON.parse(io.text()).ok).toBe(true);
    expect(await runCli(['--version'], capture())).toBe(0);
  });
});
