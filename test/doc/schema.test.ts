// Design document schema: defaults, conversions and refusals.
// Sources: defaults are DESIGN's "Symbols and defaults" (water at 20 C: 998.2 kg/m3,
// CRC Handbook (IAPWS-95), from memory; 1.0016 mPa s, IAPWS 2008, from memory);
// unit constants NIST SP 811; material densities typical datasheet values, from memory.
import { describe, expect, it } from 'vitest';
import {
  DEFAULT_DOCUMENT,
  FIELD_SPECS,
  mergeOverrides,
  parseDesign,
  type DesignParse,
} from '../../generator/doc/schema.ts';
import { closestKey, lengthField, rangeText, scanForbiddenKeys, section, zodIssuesToFieldErrors } from '../../generator/doc/fields.ts';

const MINIMAL = { supply: { headMax: '2.2 m' }, level: { target: '45 mm' } };

function ok(result: DesignParse) {
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return result;
}
function errors(result: DesignParse) {
  if (result.ok) throw new Error('expected errors');
  return result.errors;
}
function errorFor(doc: unknown, field: string): string {
  const found = errors(parseDesign(doc)).find((e) => e.field === field);
  if (!found) throw new Error(`no error for ${field}: ${JSON.stringify(errors(parseDesign(doc)))}`);
  return found.message;
}
function withField(path: string, value: unknown): unknown {
  return mergeOverrides(MINIMAL, { [path]: value });
}

describe('defaults', () => {
  it('fills every default of DESIGN (orifice 2 mm per the lead) from a minimal document', () => {
    const { inputs } = ok(parseDesign(MINIMAL));
    expect(inputs).toEqual({
      headMaxM: 2.2,
      headMinM: 2.2, // H_min defaults to H_max
      targetLevelM: 0.045,
      liquidDensityKgM3: 998.2,
      liquidViscosityPaS: 1.0016e-3,
      orificeM: 0.002,
      sealDiameterM: 0.005,
      padName: null, // "auto": the sizing chooses the pad
      padThicknessM: 0.003,
      padDensityKgM3: 200, // closed-cell sponge, about 0.2 g/cm3 (from memory), the kind "auto" chooses
      calibration: [],
      materialName: 'PETG',
      materialDensityKgM3: 1270,
      wallM: 0.00225, // five 0.45 mm lines (the lead moved the default from 2.4 mm so it prints without gap fill)
      lineWidthM: 0.00045,
      maxOuterDiameterM: 0.12,
      reserve: 1.5,
      tubeInnerDiameterM: 0.004,
      tubeLengthM: 5,
      reservoirAreaM2: null,
      reservoirRiseM: null,
      overflowM: null,
      // container.demand default: 3 L/day (the schema's stated common-practice peak) = 3e-3 m3 / 86400 s
      demandM3s: 3e-3 / 86400,
      bedWidthM: 0.22, // 220 x 220 mm, a common hobby printer bed (common practice)
      bedDepthM: 0.22,
      // valve.architecture and valve.mount: "auto", the sizing picks; no rim unless given
      architecture: 'auto',
      mount: 'auto',
      rimHeightM: null,
      containerWallM: 0.003, // DEFAULT_CONTAINER_WALL_MM: buckets and totes 2 to 3 mm at the rim (common practice)
      retiredFields: [],
    });
  });

  it('parses DESIGN\'s example document', () => {
    const { inputs, document } = ok(
      parseDesign({
        supply: { headMax: '2.4 m', headMin: '1.6 m', tubeInnerDiameter: '4 mm', tubeLength: '6 m' },
        level: { target: '40 mm' },
        liquid: { density: '998.2 kg/m3' },
        nozzle: { orifice: '3 mm', sealDiameter: '5 mm' },
        seal: {
          preload: '0.1 N', padThickness: '3 mm', indentation: '0.5 mm',
          calibration: [{ head: '0.8 m', mass: '31 g' }, { head: '2.1 m', mass: '66 g' }],
        },
        print: { material: 'PETG', wall: '2.4 mm', lineWidth: '0.45 mm' },
        limits: { maxOuterDiameter: '90 mm' },
        reserve: 1.5,
        reservoir: { area: '0.12 m2', rise: '20 mm' },
      }),
    );
    expect(inputs.headMinM).toBe(1.6);
    expect(inputs.orificeM).toBe(0.003);
    expect(inputs.calibration).toEqual([{ headM: 0.8, massKg: 0.031 }, { headM: 2.1, massKg: 0.066 }]);
    expect(inputs.reservoirAreaM2).toBe(0.12);
    expect(inputs.reservoirRiseM).toBe(0.02);
    expect(document.seal.calibration).toEqual([{ head: '0.8 m', mass: '31 g' }, { head: '2.1 m', mass: '66 g' }]);
  });

  it('writes the normalized document with units, and it parses back to the same inputs', () => {
    const first = ok(parseDesign({ ...MINIMAL, supply: { headMax: '7 ft', headMin: '3 psi' }, print: { material: 'asa' } }));
    expect(first.document.supply.headMax).toBe('2.1336 m');
    expect(first.document.print.material).toBe('ASA');
    expect(first.document.nozzle.orifice).toBe('2 mm');
    const second = ok(parseDesign(first.document));
    expect(second.inputs.headMaxM).toBeCloseTo(first.inputs.headMaxM, 9);
    expect(second.inputs.headMinM).toBeCloseTo(first.inputs.headMinM, 9);
    expect(second.document).toEqual(first.document);
  });

  it('DEFAULT_DOCUMENT merged with a head and a level is a complete valid document', () => {
    const doc = mergeOverrides(DEFAULT_DOCUMENT, { 'supply.headMax': 1.2, 'level.target': 30 });
    expect(ok(parseDesign(doc)).inputs.headMaxM).toBe(1.2);
  });

  it('takes bare numbers in each field\'s stated unit', () => {
    const { inputs } = ok(
      parseDesign({
        supply: { headMax: 2.4, headMin: 1.6, tubeInnerDiameter: 4, tubeLength: 6 },
        level: { target: 40 },
        liquid: { density: 1000, viscosity: 1.2 },
        seal: { preload: 0.2, padDensity: 0.3, calibration: [{ head: 1, mass: 40 }] },
        print: { material: { name: 'Spool 7', density: 1.15 } },
        reservoir: { area: 0.5, rise: 25 },
      }),
    );
    expect(inputs.headMaxM).toBe(2.4);
    expect(inputs.tubeInnerDiameterM).toBe(0.004);
    expect(inputs.tubeLengthM).toBe(6);
    expect(inputs.targetLevelM).toBe(0.04);
    expect(inputs.liquidDensityKgM3).toBe(1000);
    expect(inputs.liquidViscosityPaS).toBeCloseTo(1.2e-3, 15);
    expect(inputs.retiredFields).toEqual(['seal.preload']);
    expect(inputs.padDensityKgM3).toBeCloseTo(300, 9);
    expect(inputs.calibration).toEqual([{ headM: 1, massKg: 0.04 }]);
    expect(inputs.materialName).toBe('Spool 7');
    expect(inputs.materialDensityKgM3).toBeCloseTo(1150, 9);
    expect(inputs.reservoirRiseM).toBe(0.025);
  });

  it('converts a head given as a pressure with the liquid density: H = p / (rho g)', () => {
    // 1 psi = 6894.757 Pa (NIST SP 811); 1 psi of water ~ 0.703 m (common practice: 2.31 ft).
    const water = ok(parseDesign({ ...MINIMAL, supply: { headMax: '3 psi' } }));
    expect(water.inputs.headMaxM).toBeCloseTo((3 * 6894.757) / (998.2 * 9.80665), 12);
    const brine = ok(parseDesign({ ...MINIMAL, supply: { headMax: '20 kPa' }, liquid: { density: '1.1 g/cm3' } }));
    expect(brine.inputs.headMaxM).toBeCloseTo(20000 / (1100 * 9.80665), 12);
  });

  it('accepts viscosity as mPa s, Pa s or cP; a first-version preload as N, gf or g (read, then ignored)', () => {
    for (const v of ['1.2 mPa s', '0.0012 Pa s', '1.2 cP']) {
      expect(ok(parseDesign(withField('liquid.viscosity', v))).inputs.liquidViscosityPaS).toBeCloseTo(1.2e-3, 15);
    }
    for (const p of ['0.0980665 N', '10 gf', '10 g']) {
      expect(ok(parseDesign(withField('seal.preload', p))).inputs.retiredFields).toEqual(['seal.preload']);
    }
  });

  it('keeps an optional name and notes', () => {
    const { document } = ok(parseDesign({ name: 'Tub 3', notes: 'north corner', ...MINIMAL }));
    expect(document.name).toBe('Tub 3');
    expect(document.notes).toBe('north corner');
    expect(errorFor({ name: 'x'.repeat(81), ...MINIMAL }, 'name')).toContain('at most 80');
    expect(errorFor({ notes: 'x'.repeat(2001), ...MINIMAL }, 'notes')).toContain('at most 2000');
  });
});

describe('refusals name the field, the value and the range', () => {
  it('requires the head and the level', () => {
    const list = errors(parseDesign({}));
    expect(list.map((e) => e.field).sort()).toEqual(['level.target', 'supply.headMax']);
    expect(list.find((e) => e.field === 'supply.headMax')!.message).toContain('missing');
  });

  it('caps the head at 3.05 m (10 ft) with the low-pressure caution', () => {
    const message = errorFor(withField('supply.headMax', '4 m'), 'supply.headMax');
    expect(message).toContain('"4 m"');
    expect(message).toContain('3.05 m');
    expect(message).toContain('mains pressure');
    expect(errorFor(withField('supply.headMax', '11 ft'), 'supply.headMax')).toContain('(3.3528 m)');
    // 40 kPa of water is 4.09 m: refused with the conversion shown.
    expect(errorFor(withField('supply.headMax', '40 kPa'), 'supply.headMax')).toMatch(/"40 kPa" \(4\.08\d* m of liquid/);
    expect(ok(parseDesign(withField('supply.headMax', '10 ft'))).inputs.headMaxM).toBeCloseTo(3.048, 12);
    expect(errorFor(withField('supply.headMax', 0), 'supply.headMax')).toContain('more than 0 m');
    expect(errorFor(withField('supply.headMax', -1), 'supply.headMax')).toContain('too low');
  });

  it('keeps the lowest head at or below the highest', () => {
    const doc = { supply: { headMax: '1.2 m', headMin: '1.5 m' }, level: { target: '30 mm' } };
    const message = errorFor(doc, 'supply.headMin');
    expect(message).toContain('"1.5 m"');
    expect(message).toContain('supply.headMax (1.2 m)');
  });

  it.each([
    ['level.target', '4 mm', 'from 5 mm to 300 mm'],
    ['level.target', '31 cm', 'from 5 mm to 300 mm'],
    ['container.rimHeight', '5 mm', 'from 10 mm to 1000 mm'],
    ['container.wallThickness', '30 mm', 'from 0.5 mm to 25 mm'],
    ['liquid.density', '1.4 g/cm3', 'from 900 kg/m3 to 1300 kg/m3'],
    ['nozzle.orifice', '0.3 mm', 'from 0.5 mm to 6 mm'],
    ['nozzle.sealDiameter', '31 mm', 'from 1 mm to 30 mm'],
    ['seal.preload', '6 N', 'from 0 N to 5 N'],
    ['seal.padThickness', '11 mm', 'from 0.5 mm to 10 mm'],
    ['seal.indentation', '0.01 mm', 'from 0.05 mm'],
    ['print.lineWidth', '1.5 mm', 'from 0.2 mm to 1.2 mm'],
    ['print.wall', '11 mm', 'at most 10 mm'],
    ['limits.maxOuterDiameter', '300 mm', 'from 20 mm to 250 mm'],
    ['reserve', 0.9, 'from 1 to 5'],
    ['reserve', '6', 'from 1 to 5'],
    ['supply.tubeInnerDiameter', '30 mm', 'from 1 mm to 25 mm'],
    ['supply.tubeLength', '150 m', 'from 0 m to 100 m'],
  ])('%s = %s is refused: %s', (field, value, range) => {
    const message = errorFor(withField(field, value), field);
    expect(message).toContain(typeof value === 'string' ? JSON.stringify(value) : String(value));
    expect(message).toContain(range);
  });

  it('checks the fields that depend on each other', () => {
    expect(errorFor(withField('nozzle.orifice', '5 mm'), 'nozzle.orifice')).toContain('nozzle.sealDiameter (5 mm)');
    expect(errorFor(withField('print.wall', '0.8 mm'), 'print.wall')).toContain('from 0.9 mm to 10 mm');
    expect(errorFor(withField('reservoir', { area: '0.1 m2' }), 'reservoir.rise')).toContain('reservoir.area');
    expect(errorFor(withField('reservoir', { rise: '10 mm' }), 'reservoir.area')).toContain('missing');
    expect(ok(parseDesign(withField('reservoir', { area: '0.2 m2', rise: '1 cm' }))).inputs.reservoirRiseM).toBe(0.01);
  });

  it('checks reservoir and calibration ranges, and at most 20 calibration points', () => {
    expect(errorFor(withField('reservoir', { area: '101 m2', rise: '10 mm' }), 'reservoir.area')).toContain('0.0001 m2 to 100 m2');
    expect(errorFor(withField('reservoir', { area: '1 m2', rise: '2 m' }), 'reservoir.rise')).toContain('from 1 mm to 1000 mm');
    const points = [{ head: '0.5 m', mass: '20 g' }, { head: '0.8 m', mass: '6 kg' }];
    expect(errorFor(withField('seal.calibration', points), 'seal.calibration.1.mass')).toContain('from 0.1 g to 5000 g');
    expect(errorFor(withField('seal.calibration', [{ head: '5 m', mass: '20 g' }]), 'seal.calibration.0.head')).toContain('mains pressure');
    expect(errorFor(withField('seal.calibration', [{ head: '0.5 m' }]), 'seal.calibration.0.mass')).toContain('missing');
    const many = Array.from({ length: 21 }, (_, i) => ({ head: `${0.1 * (i + 1)} m`, mass: '20 g' }));
    expect(errorFor(withField('seal.calibration', many), 'seal.calibration')).toContain('at most 20');
    expect(errorFor(withField('seal.calibration', 'lots'), 'seal.calibration')).toContain('not a list');
    // 20 points that rise with head (hydrostatics: F = F_pre + A rho g H); flat masses cannot be fitted and are refused
    const rising = many.slice(0, 20).map((p, i) => ({ ...p, mass: `${20 + 10 * i} g` }));
    expect(ok(parseDesign(withField('seal.calibration', rising))).inputs.calibration).toHaveLength(20);
    expect(errorFor(withField('seal.calibration', many.slice(0, 20)), 'seal.calibration')).toContain('do not rise with head');
  });

  it('checks materials: unknown name, custom density range, custom name needed', () => {
    expect(errorFor(withField('print.material', 'wood'), 'print.material')).toContain('PLA, PETG, ABS, ASA, PP, PA12, TPU 95A');
    expect(errorFor(withField('print.material', { name: 'X', density: '4 g/cm3' }), 'print.material.density')).toContain('from 0.5 g/cm3 to 3 g/cm3');
    expect(errorFor(withField('print.material', { density: '1.1 g/cm3' }), 'print.material.name')).toContain('missing');
    expect(errorFor(withField('print.material', 3), 'print.material')).toContain('not a material');
    expect(ok(parseDesign(withField('print.material', 'tpu'))).inputs.materialName).toBe('TPU 95A');
  });

  it('refuses unknown keys by name, with a guess for a typo', () => {
    expect(errorFor({ ...MINIMAL, supply: { headMax: '2 m', headmin: '1 m' } }, 'supply.headmin')).toBe('unknown key "headmin"; did you mean "headMin"?');
    expect(errorFor({ ...MINIMAL, levl: {} }, 'levl')).toContain('did you mean "level"?');
    expect(errorFor({ ...MINIMAL, colour: 'red' }, 'colour')).toContain('the keys allowed here are name, notes, supply');
    expect(errorFor({ ...MINIMAL, seal: { calibration: [{ head: '1 m', mass: '9 g', temp: 20 }] } }, 'seal.calibration.0.temp')).toContain('unknown key');
  });

  it('refuses __proto__, constructor and prototype keys anywhere', () => {
    const doc = JSON.parse('{"supply": {"headMax": "2 m", "__proto__": {"polluted": 1}}, "level": {"target": 40}}');
    expect(errorFor(doc, 'supply.__proto__')).toContain('not allowed');
    expect(errorFor({ ...MINIMAL, constructor: {} }, 'constructor')).toContain('not allowed');
    expect(errorFor({ ...MINIMAL, print: { prototype: 1 } }, 'print.prototype')).toContain('not allowed');
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });

  it('refuses a document that is not an object, and sections that are not objects', () => {
    for (const bad of [null, 3, 'doc', [MINIMAL]]) {
      expect(errors(parseDesign(bad))[0].field).toBe('design');
    }
    expect(errorFor({ ...MINIMAL, supply: 2 }, 'supply')).toContain('not a section');
  });

  it('reports every problem at once, each naming its path', () => {
    const list = errors(parseDesign({ supply: { headMax: '9 m', tubeLength: 'long' }, level: { target: '2,5 cm' }, print: { wall: true } }));
    expect(list.map((e) => e.field).sort()).toEqual(['level.target', 'print.wall', 'supply.headMax', 'supply.tubeLength']);
  });
});

describe('mergeOverrides (for command-line flags)', () => {
  it('sets values at dotted paths on a copy, creating sections', () => {
    const original = { supply: { headMax: '2 m' } };
    const merged = mergeOverrides(original, { 'supply.headMin': '1 m', 'level.target': '40mm', reserve: '2' }) as Record<string, any>;
    expect(merged).toEqual({ supply: { headMax: '2 m', headMin: '1 m' }, level: { target: '40mm' }, reserve: '2' });
    expect(original).toEqual({ supply: { headMax: '2 m' } });
  });

  it('overrides file values, skips undefined, never writes prototype keys, leaves non-objects for the schema', () => {
    expect(mergeOverrides({ supply: { headMax: '2 m' } }, { 'supply.headMax': '1 m', 'level.target': undefined })).toEqual({ supply: { headMax: '1 m' } });
    const merged = mergeOverrides({}, { '__proto__.polluted': 1, 'constructor.prototype.x': 1 });
    expect(merged).toEqual({});
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(mergeOverrides({ supply: 5 }, { 'supply.headMax': 1 })).toEqual({ supply: 5 });
    expect(mergeOverrides(undefined, { 'level.target': 1 })).toEqual({ level: { target: 1 } });
    expect(mergeOverrides([1], { a: 1 })).toEqual([1]);
  });
});

describe('reusable field machinery (for later documents)', () => {
  it('builds a section with a ranged length field and maps zod issues to dotted paths', () => {
    const schema = section({ width: lengthField({ unit: 'mm', label: 'the width', min: 10, max: 20, fallback: 15 }) });
    const good = schema.safeParse({ width: '1.5 cm' });
    expect(good.success && good.data.width.si).toBeCloseTo(0.015, 12);
    const bad = schema.safeParse({ width: '3 cm', widht: 1 });
    expect(bad.success).toBe(false);
    const mapped = zodIssuesToFieldErrors(bad.error!.issues);
    expect(mapped).toEqual([
      { field: 'width', message: '"3 cm" (30 mm) is too high; the width must be from 10 mm to 20 mm.' },
      { field: 'widht', message: 'unknown key "widht"; did you mean "width"?' },
    ]);
  });

  it('writes ranges and finds close keys', () => {
    expect(rangeText(FIELD_SPECS.headMax)).toBe('more than 0 m and at most 3.05 m');
    expect(rangeText(FIELD_SPECS.target)).toBe('from 5 mm to 300 mm');
    expect(closestKey('tubelength', ['tubeLength', 'headMax'])).toBe('tubeLength');
    expect(closestKey('zzzzzz', ['tubeLength', 'headMax'])).toBeUndefined();
    expect(scanForbiddenKeys({ a: [{ b: 1 }] })).toEqual([]);
  });
});

describe('valve.architecture, valve.mount, container.rimHeight and wallThickness (issue 13)', () => {
  it('take auto, direct, lever / auto, floor, rim in any case; absent: auto; written back', () => {
    const d = ok(parseDesign({ ...MINIMAL, valve: { architecture: ' Lever ', mount: 'FLOOR' } }));
    expect(d.inputs.architecture).toBe('lever');
    expect(d.inputs.mount).toBe('floor');
    expect(d.document.valve).toEqual({ architecture: 'lever', mount: 'floor' });
    expect(ok(parseDesign(MINIMAL)).document.valve).toEqual({ architecture: 'auto', mount: 'auto' });
    const again = ok(parseDesign(d.document));
    expect(again.inputs).toEqual(d.inputs);
  });
  it('refuse a word they do not take, naming the field and listing the words', () => {
    const a = errorFor({ ...MINIMAL, valve: { architecture: 'siphon' } }, 'valve.architecture');
    for (const w of ['"siphon"', '"auto"', '"direct"', '"lever"']) expect(a).toContain(w);
    expect(errorFor({ ...MINIMAL, valve: { mount: 3 } }, 'valve.mount')).toContain('"rim"');
    expect(errorFor({ ...MINIMAL, valve: { mount: 'rim', kind: 'lever' } }, 'valve.kind')).toContain('architecture, mount');
  });
  it('a rim height: in any length unit, written back with the wall (default 3 mm) used with it', () => {
    // 1 ft = 304.8 mm exactly (NIST SP 811)
    const d = ok(parseDesign({ ...MINIMAL, container: { rimHeight: '1 ft' } }));
    expect(d.inputs.rimHeightM).toBeCloseTo(0.3048, 12);
    expect(d.inputs.containerWallM).toBeCloseTo(0.003, 12);
    expect(d.document.container).toEqual({ rimHeight: '304.8 mm', wallThickness: '3 mm' });
    const w = ok(parseDesign({ ...MINIMAL, container: { rimHeight: '300 mm', wallThickness: '0.1 in' } }));
    expect(w.inputs.containerWallM).toBeCloseTo(0.00254, 12);
    expect(ok(parseDesign(w.document)).inputs).toEqual(w.inputs);
  });
  it('refuses a rim below the target level, naming container.rimHeight, the value and the level', () => {
    const m = errorFor({ supply: { headMax: '1.5 m' }, level: { target: '250 mm' }, container: { rimHeight: '180 mm' } }, 'container.rimHeight');
    expect(m).toContain('180 mm');
    expect(m).toContain('level.target (250 mm)');
    // at the level itself it is taken (the sizing then says whether a valve fits under it)
    expect(ok(parseDesign({ supply: { headMax: '1.5 m' }, level: { target: '250 mm' }, container: { rimHeight: '25 cm' } })).inputs.rimHeightM).toBeCloseTo(0.25, 12);
  });
  it('a rim mount asked for with no rim height is refused on container.rimHeight', () => {
    expect(errorFor({ ...MINIMAL, valve: { mount: 'rim' } }, 'container.rimHeight')).toMatch(/^missing; valve.mount "rim"/);
    expect(ok(parseDesign({ ...MINIMAL, valve: { mount: 'rim' }, container: { rimHeight: '150 mm' } })).inputs.mount).toBe('rim');
  });
  it('takes a 300 mm level (deep-water buckets; issue 13)', () => {
    expect(ok(parseDesign({ supply: { headMax: '1.5 m' }, level: { target: '300 mm' } })).inputs.targetLevelM).toBeCloseTo(0.3, 12);
  });
});

describe('seal.pad, container.overflow, print.bed', () => {
  it('takes a pad from the table by name, in any case and spacing; "auto" or nothing lets the sizing choose', () => {
    expect(ok(parseDesign(withField('seal.pad', 'Sponge-Grade-2'))).inputs.padName).toBe('sponge grade 2');
    expect(ok(parseDesign(withField('seal.pad', 'rubber 50'))).inputs.padName).toBe('rubber 50A');
    expect(ok(parseDesign(withField('seal.pad', 'AUTO'))).inputs.padName).toBeNull();
    expect(ok(parseDesign(withField('seal.pad', 'rubber 50A'))).document.seal.pad).toBe('rubber 50A');
    // a solid rubber's density, about 1.2 g/cm3 (from memory), unless the document gives one
    expect(ok(parseDesign(withField('seal.pad', 'rubber 50A'))).inputs.padDensityKgM3).toBeCloseTo(1200, 9);
  });
  it('refuses an unknown pad and lists the known ones', () => {
    const message = errorFor(withField('seal.pad', 'felt'), 'seal.pad');
    expect(message).toContain('"felt"');
    for (const name of ['auto', 'sponge grade 0', 'sponge grade 5', 'rubber 30A', 'rubber 70A']) expect(message).toContain(name);
    expect(errorFor(withField('seal.pad', 3), 'seal.pad')).toContain('not a pad');
  });
  it('reads a first-version file: seal.preload and seal.indentation are checked, then ignored (listed for a warning)', () => {
    const old = ok(parseDesign({ ...MINIMAL, seal: { preload: '0.1 N', padThickness: '3 mm', indentation: '0.5 mm', padDensity: '1.2 g/cm3' } }));
    expect(old.inputs.retiredFields).toEqual(['seal.preload', 'seal.indentation']);
    expect(old.inputs.padDensityKgM3).toBeCloseTo(1200, 9);
    expect(Object.keys(old.document.seal)).not.toContain('preload');
    expect(Object.keys(old.document.seal)).not.toContain('indentation');
    expect(errorFor({ ...MINIMAL, seal: { indentation: '-1 mm' } }, 'seal.indentation')).toContain('-1 mm');
  });
  it('takes an overflow height and writes it back', () => {
    const d = ok(parseDesign({ ...MINIMAL, container: { overflow: '3 in' } }));
    expect(d.inputs.overflowM).toBeCloseTo(0.0762, 12); // 1 in = 25.4 mm exactly (NIST SP 811)
    expect(d.document.container).toEqual({ overflow: '76.2 mm' });
    expect(errorFor({ ...MINIMAL, container: { overflow: '5 mm' } }, 'container.overflow')).toContain('from 10 mm');
  });
  it('takes the bed as "W x D unit", one unit each, or { width, depth }; refuses a bed that is not one', () => {
    const bed = (value: unknown) => ok(parseDesign(withField('print.bed', value))).inputs;
    expect(bed('250 x 210 mm')).toMatchObject({ bedWidthM: 0.25, bedDepthM: 0.21 });
    expect(bed('25 cm x 210 mm')).toMatchObject({ bedWidthM: 0.25, bedDepthM: 0.21 });
    expect(bed('10x10 in').bedWidthM).toBeCloseTo(0.254, 12); // NIST SP 811: 1 in = 25.4 mm
    expect(bed({ width: '300 mm', depth: 200 })).toMatchObject({ bedWidthM: 0.3, bedDepthM: 0.2 });
    expect(ok(parseDesign(withField('print.bed', '250 x 210 mm'))).document.print.bed).toBe('250 x 210 mm');
    expect(ok(parseDesign(MINIMAL)).document.print.bed).toBe('220 x 220 mm');
    expect(errorFor(withField('print.bed', '220 mm'), 'print.bed')).toContain('"220 x 220 mm"');
    expect(errorFor(withField('print.bed', '20 x 220 mm'), 'print.bed')).toContain('from 50 mm');
    expect(errorFor(withField('print.bed', { width: '220 mm' }), 'print.bed.depth')).toBeTruthy();
  });
});
