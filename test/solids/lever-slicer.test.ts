/**
 * A slicer adds no support to a lever valve's parts, the float included (its
 * sealed cavity closes to a point inside the collar: no flat roof, no bridge).
 * Each design's file set (writeDesignFiles, print poses) is sliced on one plate
 * by PrusaSlicer (a program independent of this project; Debian's
 * /usr/bin/prusa-slicer) with --merge, automatic supports at a 45-degree
 * threshold and five perimeters, as test/solids/slicer-supports.test.ts slices
 * the presets; the G-code must hold no "Support material" extrusion, and its last
 * layer must reach the tallest part (every part was sliced). Skipped with a
 * message where PrusaSlicer is not installed, except under CI. Designs: our own
 * scenarios (a 25 mm tray at 2 m on the floor, a 250 mm bucket at 1.5 m hung
 * from a rim 100 mm higher).
 */
import { execFile } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, describe, expect, it } from 'vitest';
import { writeDesignFiles } from '../../generator/solids/write-design-files.ts';
import { valvePartNames } from '../../generator/solids/index.ts';
import { extrusionByType, sizeAnyDoc } from './helpers.ts';
import { BUCKET_RIM, TRAY_LEVER } from './lever-demos.ts';

const SLICER = '/usr/bin/prusa-slicer';
const present = existsSync(SLICER);
if (!present && process.env.CI) throw new Error('prusa-slicer is missing under CI: .ci/run should have installed it (apt-get install -y prusa-slicer)');
if (!present) console.warn(`lever-slicer.test.ts: ${SLICER} is not installed; the support check is skipped (apt-get install -y prusa-slicer)`);

const run = promisify(execFile);
const scratch = mkdtempSync(join(tmpdir(), 'fw-lever-slice-'));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

describe.skipIf(!present)('PrusaSlicer adds no support to a lever valve, float included (45-degree threshold, five perimeters)', () => {
  it.concurrent.each([
    ['tray lever on the floor', TRAY_LEVER],
    ['bucket lever on the rim', BUCKET_RIM],
  ] as const)('%s', async (label, doc) => {
    const { sizing, document } = sizeAnyDoc(doc);
    const dir = join(scratch, label.replace(/\W+/g, '-'));
    const written = await writeDesignFiles(sizing, document, dir, { quality: 'preview' });
    const stls = written.files.filter((p) => p.endsWith('.stl')).map((p) => (p.startsWith('/') ? p : join(dir, p)));
    expect(stls.length).toBe(valvePartNames(sizing).length);
    const out = join(dir, 'plate.gcode');
    await run(SLICER, [
      '--export-gcode', '--merge', '--support-material', '--support-material-auto', '--support-material-threshold', '45',
      '--perimeters', '5',
      '--layer-height', '0.3', '--first-layer-height', '0.3', '--bed-shape', '0x0,300x0,300x300,0x300', '--center', '150,150',
      '-o', out, ...stls,
    ], { timeout: 120_000 });
    const gcode = readFileSync(out, 'utf8');
    const byType = extrusionByType(gcode);
    expect(byType.get('External perimeter') ?? 0).toBeGreaterThan(100);
    const tallest = Math.max(...written.parts.map((p) => p.bounds.max[2] - p.bounds.min[2]));
    const topZ = Math.max(...[...gcode.matchAll(/^;Z:([\d.]+)/gm)].map((m) => Number(m[1])));
    expect(Math.abs(topZ - tallest)).toBeLessThan(0.6);
    const support = (byType.get('Support material') ?? 0) + (byType.get('Support material interface') ?? 0);
    expect(support * Math.PI * 0.875 ** 2).toBe(0);
  }, 180_000);
});
