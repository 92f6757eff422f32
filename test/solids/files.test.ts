/**
 * Written files: every preset builds; each STL reads back through three's
 * STLLoader (three 0.187, a general-purpose npm reference reader, not our
 * writer) with the same triangle count and volume; the 3MF holds every part
 * as a welded mesh whose edges are each used twice (3MF Core Specification
 * 4.1, "Manifold Edges"); writing is all or nothing; the build command's exit
 * codes and JSON.
 */
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { unzipSync, strFromU8 } from 'fflate';
import { STLLoader } from 'three/examples/jsm/loaders/STLLoader.js';
import { afterAll, describe, expect, it } from 'vitest';
import { runCli } from '../../generator/cli/main.ts';
import type { Io } from '../../generator/cli/command.ts';
import { buildSheetHtml, buildSheetMarkdown } from '../../generator/doc/build-sheet.ts';
import { CAUTIONS } from '../../generator/doc/cautions.ts';
import { buildParts } from '../../generator/solids/index.ts';
import { countEdgeUses, meshVolumeMm3, segmentsFor, writeStlBinary, type IndexedMesh } from '../../generator/solids/mesh/index.ts';
import { floatShellVolumeMm3 } from '../../generator/sizing/float/float-shape.ts';
import { writeDesignFiles } from '../../generator/solids/write-design-files.ts';
import { cornersOn, facetedHousingMm3, facetedNozzleMm3, facetedPinMm3, presetFiles, ROOT, sizeAnyPreset, sizePreset } from './helpers.ts';

const scratch = mkdtempSync(join(tmpdir(), 'fw-solids-'));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

function soupVolume(xyz: ArrayLike<number>): number {
  let sum = 0;
  for (let i = 0; i < xyz.length; i += 9) {
    const [ax, ay, az, bx, by, bz, cx, cy, cz] = Array.from({ length: 9 }, (_, k) => xyz[i + k]);
    sum += ax * (by * cz - bz * cy) - ay * (bx * cz - bz * cx) + az * (bx * cy - by * cx);
  }
  return sum / 6;
}

function capture(): Io & { out_: () => string; err_: () => string } {
  let out = '';
  let err = '';
  return { out: (t) => (out += t), err: (t) => (err += t), out_: () => out, err_: () => err };
}

describe('every preset builds', () => {
  const presets = presetFiles();
  it('there are design presets to build', () => expect(presets.length).toBeGreaterThanOrEqual(5));
  it.each(presets)('%s: closed parts, STL read back by three with the same triangles and volume', async (file) => {
    const { sizing } = sizeAnyPreset(file);
    const parts = await buildParts(sizing, { quality: 'preview', withPad: true });
    for (const [name, mesh] of Object.entries(parts) as [string, IndexedMesh][]) {
      expect(countEdgeUses(mesh).closed, `${file} ${name}`).toBe(true);
      const bytes = writeStlBinary(mesh);
      const geometry = new STLLoader().parse(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer);
      const position = geometry.getAttribute('position');
      expect(position.count / 3, `${file} ${name}`).toBe(mesh.indices.length / 3);
      expect(Math.abs(soupVolume(position.array) / meshVolumeMm3(mesh) - 1), `${file} ${name}`).toBeLessThan(1e-6);
    }
    // volumes against the sizing core's formulas for the drawn facets (helpers.ts), within 1 %
    // (the lever's parts against theirs in lever-parts.test.ts)
    if (sizing.architecture !== 'direct') return;
    const expected = {
      housing: facetedHousingMm3(sizing, 'preview'),
      float: floatShellVolumeMm3(sizing.parts.float) * cornersOn(segmentsFor(sizing.parts.float.outerDiameterMm / 2, 'preview')),
      nozzle: facetedNozzleMm3(sizing, 'preview'),
      pin: facetedPinMm3(sizing, 'preview'),
    };
    for (const [name, v] of Object.entries(expected)) {
      expect(Math.abs(meshVolumeMm3(parts[name as keyof typeof expected]!) / v - 1), `${file} ${name}`).toBeLessThan(0.01);
    }
  });
});

describe('writeDesignFiles', () => {
  it('writes one STL per part, the 3MF plate, the design and the build sheet, named for the design', async () => {
    const { sizing, document } = sizePreset('rooftop-tubs.json');
    const dir = join(scratch, 'roof');
    const written = await writeDesignFiles(sizing, document, dir, { quality: 'export' });
    const names = readdirSync(dir).sort();
    expect(names).toEqual(
      [
        'rooftop-planter-tubs-build-sheet.html',
        'rooftop-planter-tubs-build-sheet.md',
        'rooftop-planter-tubs-design.json',
        'rooftop-planter-tubs-float.stl',
        'rooftop-planter-tubs-housing.stl',
        'rooftop-planter-tubs-nozzle.stl',
        'rooftop-planter-tubs-pin.stl',
        'rooftop-planter-tubs-plate.3mf',
      ].sort(),
    );
    expect(written.files).toHaveLength(8);
    expect(written.parts.map((p) => p.name)).toEqual(['housing', 'float', 'nozzle', 'pin']);
    for (const p of written.parts) {
      // mass = volume x density (PETG 1.27 g/cm3, typical datasheet value, from memory)
      expect(p.massG).toBeCloseTo(p.volumeMm3 * 1.27e-3, 6);
      expect(p.bounds.min[2]).toBe(0);
      const bytes = readFileSync(p.file);
      expect(bytes.length).toBe(84 + 50 * p.triangles); // binary STL layout
    }
    // the float's printed plastic matches the sizing's mass within 1 % (export quality)
    const float = written.parts.find((p) => p.name === 'float')!;
    expect(Math.abs(float.massG / sizing.mass.byPart.float - 1)).toBeLessThan(0.01);

    const zip = unzipSync(new Uint8Array(readFileSync(join(dir, 'rooftop-planter-tubs-plate.3mf'))));
    const model = strFromU8(zip['3D/3dmodel.model']);
    const objects = model.split('<object ').slice(1);
    expect(objects).toHaveLength(4);
    for (const object of objects) {
      const vertices = [...object.matchAll(/<vertex x="([^"]+)" y="([^"]+)" z="([^"]+)"/g)].map((m) => [+m[1], +m[2], +m[3]]);
      const triangles = [...object.matchAll(/<triangle v1="(\d+)" v2="(\d+)" v3="(\d+)"/g)].map((m) => [+m[1], +m[2], +m[3]]);
      const mesh: IndexedMesh = { positions: new Float32Array(vertices.flat()), indices: new Uint32Array(triangles.flat()) };
      expect(countEdgeUses(mesh).closed).toBe(true);
      expect(Math.min(...vertices.map((v) => v[2]))).toBe(0); // on the plate
    }
    const sheet = readFileSync(join(dir, 'rooftop-planter-tubs-build-sheet.md'), 'utf8');
    for (const c of CAUTIONS) expect(sheet).toContain(c.text);
    expect(JSON.parse(readFileSync(join(dir, 'rooftop-planter-tubs-design.json'), 'utf8'))).toEqual(JSON.parse(JSON.stringify(document)));
  });

  it('writes nothing when a part fails, and names the part', async () => {
    const { sizing, document } = sizePreset('bucket-tote.json');
    const broken = structuredClone(sizing);
    broken.parts.nozzle.orificeMm = Number.NaN;
    const dir = join(scratch, 'broken');
    await expect(writeDesignFiles(broken, document, dir, { quality: 'preview' })).rejects.toThrow(/^nozzle: /);
    expect(() => readdirSync(dir)).toThrow(); // the folder was never made
    await expect(writeDesignFiles(sizing, document, dir, { quality: 'preview', baseName: '../escape' })).rejects.toThrow(/baseName/);
  });

  it('build sheet: figures with units, bill of materials with pad and ballast, print settings, steps, cautions', () => {
    const { sizing, document } = sizePreset('greenhouse-trays.json');
    const md = buildSheetMarkdown(sizing, document);
    for (const heading of ['## Cautions', '## Sizing', '## Bill of materials', '## Print settings', '## Assembly']) expect(md).toContain(heading);
    expect(md).toMatch(/\| outer diameter \| [\d.]+ \| mm \|/);
    expect(md).toContain('Seal pad');
    expect(md).toContain('deck down');
    // "supports off" is the first thing the print settings say, with its reason (issue 9)
    const settings = md.slice(md.indexOf('## Print settings') + '## Print settings'.length).trim();
    expect(settings.startsWith('**Supports: off.')).toBe(true);
    expect(settings.split('\n')[0]).toMatch(/sealed.*never come out/);
    const html = buildSheetHtml(sizing, document);
    expect(html).toMatch(/<h2>Print settings<\/h2>\s*<p><strong>Supports: off\./);
    expect(html.startsWith('<!doctype html>')).toBe(true);
    for (const c of CAUTIONS) expect(html).toContain(c.title);
  });
});

describe('floatwright build', () => {
  it('writes the files and, with --json, lists each part with name, file, volume, mass, triangles and bounds', async () => {
    const io = capture();
    const out = join(scratch, 'cli');
    const code = await runCli(['build', '--design', join(ROOT, 'presets/bucket-tote.json'), '--out', out, '--quality', 'preview', '--json'], io);
    expect(code, io.err_()).toBe(0);
    const json = JSON.parse(io.out_());
    expect(json.ok).toBe(true);
    expect(json.parts.map((p: { name: string }) => p.name)).toEqual(['housing', 'float', 'nozzle', 'pin']);
    for (const p of json.parts) {
      expect(Object.keys(p).sort()).toEqual(['bounds', 'file', 'massG', 'name', 'triangles', 'volumeMm3']);
      expect(readFileSync(p.file).length).toBe(84 + 50 * p.triangles);
    }
    expect(json.partSpecs.housing.boreMm).toBeGreaterThan(0);
  });

  it('bad input: exit 2 with the field named, nothing written', async () => {
    const out = join(scratch, 'bad');
    const a = capture();
    expect(await runCli(['build', '--design', join(ROOT, 'presets/bucket-tote.json'), '--out', out, '--quality', 'fine'], a)).toBe(2);
    expect(a.err_()).toContain('--quality');
    const b = capture();
    expect(await runCli(['build', '--design', join(ROOT, 'presets/bucket-tote.json')], b)).toBe(2);
    expect(b.err_()).toContain('--out');
    const c = capture();
    expect(await runCli(['build', '--head-max', '12 m', '--level', '40 mm', '--out', out], c)).toBe(2);
    expect(c.err_()).toContain('supply.headMax');
    expect(() => readdirSync(out)).toThrow();
  });
});
