// The plan command run as a grower runs it: `node generator/cli/bin.js plan FILE --out DIR --json`.
// Outside checks: STL files are read back with three's STLLoader (an independent reader, general-purpose
// npm library) and their triangle edges counted after welding by position (a closed 2-manifold uses every
// edge twice: common practice for mesh checks); the cautions are the shared project text.
import { execFile } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { unzipSync, strFromU8 } from 'fflate';
import { STLLoader } from 'three/examples/jsm/loaders/STLLoader.js';
import { describe, expect, it } from 'vitest';
import { CAUTIONS } from '../../generator/doc/cautions.ts';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const BIN = join(ROOT, 'generator/cli/bin.js');
const PRESET = join(ROOT, 'presets/plan-rooftop-shelf.json');

function floatwright(...args: string[]): Promise<{ status: number | null; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    execFile(process.execPath, [BIN, ...args], { cwd: ROOT, encoding: 'utf8', timeout: 120_000 }, (error, stdout, stderr) => {
      resolve({ status: error ? (typeof error.code === 'number' ? error.code : null) : 0, stdout, stderr });
    });
  });
}

/** Edge uses after welding STL corners by exact position: every edge twice means closed. */
function closedStl(bytes: Buffer): boolean {
  const geometry = new STLLoader().parse(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer);
  const p = geometry.getAttribute('position');
  const key = (i: number) => `${p.getX(i)},${p.getY(i)},${p.getZ(i)}`;
  const uses = new Map<string, number>();
  for (let t = 0; t < p.count; t += 3) {
    for (const [a, b] of [[t, t + 1], [t + 1, t + 2], [t + 2, t]] as const) {
      const [x, y] = [key(a), key(b)].sort();
      const k = `${x}|${y}`;
      uses.set(k, (uses.get(k) ?? 0) + 1);
    }
  }
  return p.count > 0 && [...uses.values()].every((n) => n === 2);
}

describe('floatwright plan', () => {
  it('writes a folder per design, the report and plan.json from the preset, and prints the JSON contract', async () => {
    const out = join(mkdtempSync(join(tmpdir(), 'fw-plan-')), 'bench');
    const run = await floatwright('plan', PRESET, '--out', out, '--quality', 'preview', '--json');
    expect(run.status).toBe(0);
    const j = JSON.parse(run.stdout);
    expect(j.ok).toBe(true);
    for (const key of ['name', 'count', 'design', 'floorElevationM', 'tipElevationM', 'headMaxM', 'headMinM', 'shutOffAtHeadMaxMm', 'shutOffAtHeadMinMm', 'flowAloneLph', 'flowSharedLph', 'fillTimeAloneMin', 'starving']) {
      expect(j.containers[0]).toHaveProperty(key);
    }
    for (const key of ['parts', 'filamentG', 'filamentM', 'ballastSteelG', 'mainFlowLph']) expect(typeof j.totals[key]).toBe('number');
    expect(j.designs.map((d: { id: string }) => d.id)).toEqual(['d1', 'd2', 'd3', 'd4']);
    expect(j.designs[0].float.outerDiameterMm).toBeGreaterThan(0);
    expect(j.containers.filter((c: { starving: boolean }) => c.starving).map((c: { name: string }) => c.name)).toEqual(['top tier', 'middle tier']);
    expect(run.stderr).toBe(''); // no progress bar when not at a terminal or with --json

    const top = readdirSync(out).sort();
    expect(top).toEqual(['.floatwright-output', 'd1-top-tier', 'd2-middle-tier', 'd3-bottom-tier', 'd4-deck-buckets', 'plan-report.html', 'plan-report.md', 'plan.json', 'plates']);
    // The plate set holds every part to print once: 4 parts x 11 valves. 3MF is a zip with 3D/3dmodel.model
    // (3MF Core Specification), read here with fflate's unzip and a count of <object> elements.
    let objects = 0;
    for (const plate of j.plates as string[]) {
      const model = strFromU8(unzipSync(new Uint8Array(readFileSync(join(out, plate))))['3D/3dmodel.model']!);
      objects += (model.match(/<object /g) ?? []).length;
    }
    expect(objects).toBe(4 * j.totals.valves);
    for (const d of j.designs) {
      for (const f of d.files) expect(existsSync(join(out, f))).toBe(true);
      const stl = d.files.find((f: string) => f.endsWith('-float.stl'));
      expect(closedStl(readFileSync(join(out, stl)))).toBe(true);
    }
    const report = readFileSync(join(out, 'plan-report.md'), 'utf8');
    for (const c of CAUTIONS) expect(report).toContain(c.title);
    expect(report).toContain('top tier (!)');
    expect(readdirSync(join(out, '..'))).toEqual(['bench']); // no temporary folder left beside it
  }, 120_000);

  it('refuses bad input with the plan path, exit 2, and writes nothing', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'fw-plan-bad-'));
    const file = join(dir, 'plan.json');
    writeFileSync(file, JSON.stringify({ tank: { fullSurfaceElevation: '2.4 m' }, main: { innerDiameter: '8 mm' }, containers: [{ name: 'a', floorElevation: '9 parsecs', level: '40 mm' }] }));
    const run = await floatwright('plan', file, '--out', join(dir, 'out'), '--json');
    expect(run.status).toBe(2);
    const j = JSON.parse(run.stdout);
    expect(j.ok).toBe(false);
    expect(j.errors[0].field).toBe('containers.0.floorElevation');
    expect(readdirSync(dir)).toEqual(['plan.json']);

    const text = await floatwright('plan', file, '--out', join(dir, 'out'));
    expect(text.status).toBe(2);
    expect(text.stderr).toMatch(/containers\.0\.floorElevation: "9 parsecs" is not a length/);
    expect(readdirSync(dir)).toEqual(['plan.json']);
  }, 60_000);

  it('refuses to write over a folder that holds files unless --force', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'fw-plan-full-'));
    writeFileSync(join(dir, 'keep.txt'), 'mine');
    const run = await floatwright('plan', PRESET, '--out', dir);
    expect(run.status).toBe(2);
    expect(run.stderr).toMatch(/--out: .* already holds files/);
    expect(readFileSync(join(dir, 'keep.txt'), 'utf8')).toBe('mine');
  }, 60_000);
});
