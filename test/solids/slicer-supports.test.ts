/**
 * Every part prints with a slicer's automatic supports switched on and adds no
 * support at all (the direct valve's and, in the shallow-trays and deep-buckets presets, the lever's): none in the float's sealed cavity (where it could never be
 * removed), none under the housing's flare and holes, none at the nozzle's
 * flare and barbs or under the pin. Checked with PrusaSlicer (an independent,
 * general-purpose slicer; Debian's prusa-slicer), headless: each preset's parts
 * (preview-quality STL files, print poses) on one plate, automatic supports at
 * a 45-degree threshold (PrusaSlicer's own default threshold is 0, "auto"; 45
 * is the common rule of thumb for FDM overhangs, common practice), 0.3 mm
 * layers, five perimeters (found by hand: with five, a flat cavity roof under the
 * pad drew 23 m of support filament inside the float; the cavity now closes to a point); the support extruded is read from the G-code's ";TYPE:Support material"
 * and ";TYPE:Support material interface" sections.
 *
 * Skipped with a message when prusa-slicer is missing, except under CI (.ci/run installs it).
 */
import { execFile } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, describe, expect, it } from 'vitest';
import { writeDesignFiles } from '../../generator/solids/write-design-files.ts';
import { extrusionByType, presetFiles, sizeAnyPreset } from './helpers.ts';
import { valvePartNames } from '../../generator/solids/index.ts';

const SLICER = '/usr/bin/prusa-slicer';
const have = existsSync(SLICER);
if (!have && process.env.CI) throw new Error('prusa-slicer is missing under CI: .ci/run should have installed it (apt-get install -y prusa-slicer)');
if (!have) console.warn('prusa-slicer not found at /usr/bin/prusa-slicer: skipping the supports check (apt-get install -y prusa-slicer)');

const run = promisify(execFile);
const scratch = mkdtempSync(join(tmpdir(), 'fw-slicer-'));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

describe.skipIf(!have)('PrusaSlicer adds no support to any part, supports on at a 45-degree threshold', () => {
  it('reads extrusion per section from absolute and relative G-code', () => {
    const abs = extrusionByType(['M82', ';TYPE:Perimeter', 'G1 X1 E1.5', 'G1 X2 E2.0', ';TYPE:Support material', 'G1 X3 E2.7', 'G92 E0', 'G1 X4 E0.1'].join('\n'));
    expect(abs.get('Perimeter')).toBeCloseTo(2.0, 12);
    expect(abs.get('Support material')).toBeCloseTo(0.8, 12);
    const rel = extrusionByType(['M83', ';TYPE:Support material interface', 'G1 X1 E0.25', 'G1 X2 E-0.5', 'G1 X3 E0.25'].join('\n'));
    expect(rel.get('Support material interface')).toBeCloseTo(0.5, 12);
  });

  it.concurrent.each(presetFiles())('%s: no support anywhere', async (file) => {
    const { sizing, document } = sizeAnyPreset(file);
    const dir = join(scratch, file.replace(/\.json$/, ''));
    const written = await writeDesignFiles(sizing, document, dir, { quality: 'preview' });
    const stls = written.files.filter((p) => p.endsWith('.stl')).map((p) => (p.startsWith('/') ? p : join(dir, p)));
    expect(stls.length).toBe(valvePartNames(sizing).length);
    const out = join(dir, 'plate.gcode');
    await run(SLICER, [
      // --merge: every part on the one plate, sliced together (without it, PrusaSlicer's command line slices the
      // files one after another into the same output, which then holds only the last part: found by hand)
      '--export-gcode', '--merge', '--support-material', '--support-material-auto', '--support-material-threshold', '45',
      // five perimeters, the housing's wall count on the build sheet: a grower printing the one plate with one setting
      // lays more perimeters than the float's four-line shell, and perimeters laid over a bridge are supported
      '--perimeters', '5',
      '--layer-height', '0.3', '--first-layer-height', '0.3', '--bed-shape', '0x0,300x0,300x300,0x300', '--center', '150,150',
      '-o', out, ...stls,
    ], { timeout: 120_000 });
    const gcode = readFileSync(out, 'utf8');
    const byType = extrusionByType(gcode);
    expect(byType.get('External perimeter') ?? 0).toBeGreaterThan(100); // it did slice the parts
    // ... all of them: the last layer is the tallest part's top (the housing, or a lever's frame, within a layer)
    const topZ = Math.max(...[...gcode.matchAll(/^;Z:([\d.]+)/gm)].map((m) => Number(m[1])));
    const tallest = Math.max(...written.parts.map((p) => p.bounds.max[2] - p.bounds.min[2]));
    expect(Math.abs(topZ - tallest)).toBeLessThan(0.6);
    const support = (byType.get('Support material') ?? 0) + (byType.get('Support material interface') ?? 0);
    // filament length to volume: 1.75 mm filament (common practice), mm3
    expect(support * Math.PI * 0.875 ** 2).toBe(0);
  }, 120_000);
});
