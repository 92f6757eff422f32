// The shipped presets are scenarios of our own; each must parse with the schema and say what it is.
// Heads stay under the 10 ft (3.048 m; 1 ft = 0.3048 m, NIST SP 811) low-pressure cap.
import { readFileSync, readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';

const DIR = fileURLToPath(new URL('../../presets/', import.meta.url));
// Design presets only; bench plans (plan-*.json) have their own schema and tests.
const files = readdirSync(DIR).filter((f) => f.endsWith('.json') && !f.startsWith('plan-'));

describe('presets', () => {
  it('has the five scenarios', () => {
    expect(files).toEqual(expect.arrayContaining(['bucket-tote.json', 'greenhouse-trays.json', 'rooftop-tubs.json', 'shallow-trays.json', 'deep-buckets.json']));
  });

  it.each(files)('%s parses, with a name and notes', (file) => {
    const result = parseDesign(JSON.parse(readFileSync(DIR + file, 'utf8')));
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    expect(result.document.name).toBeTruthy();
    expect(result.document.notes).toBeTruthy();
    expect(result.inputs.headMaxM).toBeLessThanOrEqual(3.048);
    expect(result.inputs.headMinM).toBeLessThan(result.inputs.headMaxM);
  });

  it('match their scenarios', () => {
    const read = (f: string) => {
      const r = parseDesign(JSON.parse(readFileSync(DIR + f, 'utf8')));
      if (!r.ok) throw new Error(f);
      return r.inputs;
    };
    expect(read('rooftop-tubs.json')).toMatchObject({ headMaxM: 2.2, headMinM: 1.6, targetLevelM: 0.045, materialName: 'PETG' });
    expect(read('greenhouse-trays.json')).toMatchObject({ headMaxM: 1.2, headMinM: 0.9, targetLevelM: 0.03, materialName: 'ASA' });
    expect(read('bucket-tote.json')).toMatchObject({ headMaxM: 0.6, headMinM: 0.3, targetLevelM: 0.025, materialName: 'PLA' });
    // issue 13's two: a 25 mm tray at 2 m, a 250 mm bucket at 1.5 m with its rim given (360 mm; 1 ft = 304.8 mm, NIST SP 811, for scale)
    expect(read('shallow-trays.json')).toMatchObject({ headMaxM: 2, headMinM: 1.5, targetLevelM: 0.025, architecture: 'auto', mount: 'auto' });
    expect(read('deep-buckets.json')).toMatchObject({ headMaxM: 1.5, targetLevelM: 0.25, rimHeightM: 0.36, containerWallM: 0.0025 });
  });
});
