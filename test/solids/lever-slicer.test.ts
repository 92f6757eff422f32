/**
 * A slicer adds no support to the lever's and the rim mount's parts: each part,
 * written as STL in its print pose, is sliced by PrusaSlicer (a program
 * independent of this project; Debian's /usr/bin/prusa-slicer) with automatic
 * supports at a 45-degree threshold, and its G-code must hold no extrusion of
 * the "Support material" type. Skipped with a message where PrusaSlicer is not
 * installed. Designs: our own demo scenarios (a 25 mm tray at 2 m, a 250 mm
 * bucket at 1.5 m hung from a rim 100 mm higher).
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { writeStlBinary, type IndexedMesh } from '../../generator/solids/mesh/index.ts';
import { buildLeverArmMesh } from '../../generator/solids/parts/lever-arm-solid.ts';
import { buildLeverFrameMesh } from '../../generator/solids/parts/lever-frame-solid.ts';
import { buildPinMesh } from '../../generator/solids/parts/pin-solid.ts';
import { buildRimHangerMesh } from '../../generator/solids/parts/rim-hanger-solid.ts';
import { buildSlottedStemMesh } from '../../generator/solids/parts/slotted-stem-solid.ts';
import { demoBucket, demoTray } from './lever-demos.ts';

const SLICER = '/usr/bin/prusa-slicer';
const present = existsSync(SLICER);
if (!present) console.warn(`lever-slicer.test.ts: ${SLICER} is not installed; the support check is skipped (apt-get install -y prusa-slicer)`);

const dir = mkdtempSync(join(tmpdir(), 'floatwright-lever-slice-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function supportLines(name: string, mesh: IndexedMesh): number {
  const stl = join(dir, `${name}.stl`);
  const gcode = join(dir, `${name}.gcode`);
  writeFileSync(stl, writeStlBinary(mesh));
  execFileSync(SLICER, ['--export-gcode', '--support-material', '--support-material-auto', '--support-material-threshold', '45', '--center', '110,110', '-o', gcode, stl], {
    stdio: 'ignore',
    timeout: 120_000,
  });
  return readFileSync(gcode, 'utf8').split('\n').filter((l) => l.startsWith(';TYPE:Support material')).length;
}

describe.skipIf(!present)('PrusaSlicer adds no support (45-degree threshold) to the lever and rim parts', () => {
  it('arm, pivot pin, floor frame, rim frame, hanger and stem', async () => {
    const tray = demoTray();
    const bucket = demoBucket();
    const parts: [string, IndexedMesh][] = [
      ['arm', await buildLeverArmMesh(tray.arm, 'preview')],
      ['pivot-pin', await buildPinMesh(tray.pin, 'preview')],
      ['frame-floor', await buildLeverFrameMesh(tray.frame, 'preview')],
      ['frame-rim', await buildLeverFrameMesh(bucket.frame, 'preview')],
      ['hanger', await buildRimHangerMesh(bucket.rim!, 'preview')],
      ['stem', await buildSlottedStemMesh(bucket.rim!, 'preview')],
    ];
    for (const [name, mesh] of parts) expect(supportLines(name, mesh), name).toBe(0);
  }, 120_000);
});
