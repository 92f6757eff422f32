/**
 * Export files from the real part builders at export quality. Checks: binary
 * STL layout and the closed-solid rule (every welded edge used twice, once each
 * way; 3MF Core Specification 4.1), a zip readable by fflate (a general-purpose
 * reference library), and the 3MF model's required parts (3MF Core Specification 2.1).
 */
import { strFromU8, unzipSync } from 'fflate';
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import { buildParts } from '../../generator/solids/index.ts';
import { baseName, exportFiles } from '../../viewer/worker/export-files.ts';
import { checkBinaryStl } from '../e2e/stl-check.ts';

describe('export files', async () => {
  const doc = { name: 'Bench 2, côté gauche', supply: { headMax: '1.8 m' }, level: { target: '50 mm' } };
  const p = parseDesign(doc);
  if (!p.ok) throw new Error('bad doc');
  const sizing = sizeDesign(p.inputs);
  if (!sizing.ok) throw new Error('no fit');
  const meshes = await buildParts(sizing, { quality: 'export' });

  it('names files after the design', () => {
    expect(baseName(doc)).toBe('bench-2-cote-gauche'); // accents dropped (Unicode NFKD, UAX #15)
    expect(baseName({})).toBe('floatwright-valve');
    expect(baseName({ name: '¿?' })).toBe('floatwright-valve');
  });

  it('writes each part as a closed binary STL resting on the bed', () => {
    const [file] = exportFiles('stl', sizing, doc, meshes, 'housing');
    expect(file.name).toBe('bench-2-cote-gauche-housing.stl');
    const check = checkBinaryStl(file.bytes);
    expect(check.closed).toBe(true);
    expect(check.volumeMm3).toBeGreaterThan(0);
    expect(check.min[2]).toBeCloseTo(0, 3);
  });

  it('zips every part, the plate, the build sheet and the design', () => {
    const [zip] = exportFiles('zip', sizing, doc, meshes);
    const entries = unzipSync(zip.bytes);
    const names = Object.keys(entries).sort();
    expect(names).toHaveLength(7);
    for (const part of ['housing', 'float', 'nozzle', 'pin']) {
      const stl = entries[`bench-2-cote-gauche-${part}.stl`];
      expect(checkBinaryStl(stl).closed, part).toBe(true);
    }
    expect(JSON.parse(strFromU8(entries['bench-2-cote-gauche-design.json']))).toEqual(doc);
    expect(strFromU8(entries['bench-2-cote-gauche-build-sheet.html'])).toContain('Low pressure only');
    const plate = unzipSync(entries['bench-2-cote-gauche-plate.3mf']);
    expect(Object.keys(plate)).toEqual(expect.arrayContaining(['[Content_Types].xml', '_rels/.rels', '3D/3dmodel.model']));
    expect(strFromU8(plate['3D/3dmodel.model']).match(/<object /g)).toHaveLength(4);
  });
});
