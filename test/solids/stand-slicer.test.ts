/**
 * The seal test stand prints without support and needs no repair: PrusaSlicer
 * (an independent slicer, run headless with automatic supports at a 45-degree
 * threshold) puts no support extrusion in either part's G-code, and admesh
 * (an independent STL checker) finds nothing to fix and one shell per part.
 * Skipped with a message when either program is missing, except under CI.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { writeStlBinary } from '../../generator/solids/mesh/index.ts';
import { buildStandBaseMesh } from '../../generator/solids/parts/stand-base-solid.ts';
import { buildStandPlungerMesh } from '../../generator/solids/parts/stand-plunger-solid.ts';
import { standSpecOf } from '../../generator/sizing/parts/stand-spec.ts';
import { sizePreset } from './helpers.ts';

const SLICER = '/usr/bin/prusa-slicer';
const ADMESH = '/usr/bin/admesh';
const present = existsSync(SLICER) && existsSync(ADMESH);
if (!present && process.env.CI) throw new Error('prusa-slicer or admesh is missing under CI');
if (!present) console.warn('stand-slicer.test.ts: prusa-slicer or admesh is not installed; skipped');

const dir = mkdtempSync(join(tmpdir(), 'fw-stand-slice-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe.skipIf(!present)('the test stand: no support from PrusaSlicer, nothing for admesh to repair', () => {
  it('rooftop-tubs (the largest cup of the presets)', async () => {
    const stand = standSpecOf(sizePreset('rooftop-tubs.json').sizing);
    for (const [name, mesh] of [
      ['stand-base', await buildStandBaseMesh(stand.base, 'export')],
      ['stand-plunger', await buildStandPlungerMesh(stand.plunger, 'export')],
    ] as const) {
      const stl = join(dir, `${name}.stl`);
      const gcode = join(dir, `${name}.gcode`);
      writeFileSync(stl, writeStlBinary(mesh));
      execFileSync(SLICER, ['--export-gcode', '--support-material', '--support-material-auto', '--support-material-threshold', '45', '--center', '110,110', '-o', gcode, stl], {
        stdio: 'ignore',
        timeout: 300_000,
      });
      const support = readFileSync(gcode, 'utf8').split('\n').filter((l) => l.startsWith(';TYPE:Support material')).length;
      expect(support, name).toBe(0);
      const report = execFileSync(ADMESH, [stl], { encoding: 'utf8' });
      const field = (label: string) => Number(new RegExp(`${label}\\s*:\\s*(-?[\\d.]+)`).exec(report)?.[1]);
      expect(field('Number of parts'), name).toBe(1);
      for (const label of ['Degenerate facets', 'Edges fixed', 'Facets removed', 'Facets added', 'Facets reversed', 'Backwards edges', 'Normals fixed']) {
        expect(field(label), `${name}: ${label}`).toBe(0);
      }
    }
  }, 600_000);
});
