/**
 * fast-check generators (property-based testing) for design documents.
 *
 * `designSpec` draws a design as plain numbers (SI-ish, in each field's unit)
 * plus spelling choices; `toDocument` writes it as a grower might: a bare
 * number in the field's unit or a string in any accepted unit, any spelling
 * the unit table knows, with or without a space, in any case. Numbers stay
 * numbers (shrinking works on them), and the document is a pure function of
 * the spec, so a failing seed replays exactly.
 *
 * The accepted space (ranges copied from the design-document schema, which
 * takes them from DESIGN.md "Symbols and defaults" and "Caps"): heads from a
 * few centimetres to the 3.05 m (10 ft) cap, given as heights or as pressures
 * (H = p / (rho g), hydrostatics); targets 5 mm to 300 mm; every table
 * material and custom densities; walls from two line widths upward; orifice
 * and seal sizes with the orifice inside the lip; 0 to 20 calibration points.
 *
 * `outsideMutation` takes one field just outside its range (or to a junk
 * value), for the rejection properties; it says which field path the message
 * must name.
 *
 * Unit factors: NIST SP 811 App. B (1 in = 25.4 mm, 1 ft = 0.3048 m,
 * 1 oz = 28.349523125 g, 1 psi = 6894.757 Pa); standard gravity 9.80665 m/s2
 * (NIST SP 330).
 */
import fc from 'fast-check';

export const G = 9.80665; // NIST SP 330
const INCH_MM = 25.4; // NIST SP 811
const FOOT_M = 0.3048; // NIST SP 811
const OUNCE_G = 28.349523125; // NIST SP 811
const POUND_G = 453.59237; // NIST SP 811
const PSI_PA = 6894.757; // NIST SP 811 App. B.9

/** Every print material name of the table, with spellings a grower types (DESIGN materials table). */
/** Pad names as a grower may type them (the table's own rows; spelled freely), and "auto". */
export const PAD_SPELLINGS: readonly string[] = ['auto', 'AUTO', 'sponge grade 0', 'Sponge Grade 1', 'sponge-2', 'sponge grade 3', 'sponge 5', 'rubber 30A', 'Rubber-50a', 'rubber 70A', 'rubber 80A'];

export const MATERIAL_SPELLINGS: readonly string[] = [
  'PLA', 'pla', 'PETG', 'petg', 'PET-G', 'ABS', 'abs', 'ASA', 'PP', 'polypropylene', 'PA12', 'nylon 12', 'Nylon12', 'TPU 95A', 'tpu', 'tpu-95a',
];

/** A length in mm written in one of many spellings (value scaled so it means the same length). */
const LENGTH_UNITS: readonly [string, number][] = [
  ['mm', 1], ['MM', 1], ['millimetres', 1], ['millimeter', 1], ['cm', 10], ['centimeters', 10], ['m', 1000], ['metre', 1000],
  ['in', INCH_MM], ['inch', INCH_MM], ['inches', INCH_MM], ['"', INCH_MM], ['ft', FOOT_M * 1000], ['feet', FOOT_M * 1000], ["'", FOOT_M * 1000],
];
/** Pressure spellings, Pa per unit. */
const PRESSURE_UNITS: readonly [string, number][] = [
  ['kPa', 1000], ['kpa', 1000], ['kilopascals', 1000], ['Pa', 1], ['hPa', 100], ['mbar', 100], ['bar', 1e5], ['psi', PSI_PA], ['PSI', PSI_PA], ['lbf/in2', PSI_PA],
];
/** Density spellings, kg/m3 per unit. */
const DENSITY_UNITS: readonly [string, number][] = [
  ['kg/m3', 1], ['kg/m³', 1], ['kg/m^3', 1], ['g/l', 1], ['g/cm3', 1000], ['g/cm³', 1000], ['g/cc', 1000], ['g/ml', 1000], ['kg/l', 1000],
];
/** Force spellings, N per unit (a mass means its weight in standard gravity). */
const FORCE_UNITS: readonly [string, number][] = [
  ['N', 1], ['newtons', 1], ['mN', 1e-3], ['gf', G / 1000], ['g', G / 1000], ['grams', G / 1000], ['kgf', G], ['oz', (OUNCE_G * G) / 1000], ['ozf', (OUNCE_G * G) / 1000],
];
/** Mass spellings, g per unit. */
const MASS_UNITS: readonly [string, number][] = [['g', 1], ['grams', 1], ['kg', 1000], ['mg', 1e-3], ['oz', OUNCE_G], ['lb', POUND_G], ['lbs', POUND_G]];
/** Area spellings, m2 per unit. */
const AREA_UNITS: readonly [string, number][] = [['m2', 1], ['m²', 1], ['m^2', 1], ['sqm', 1], ['cm2', 1e-4], ['ft2', FOOT_M ** 2], ['sq ft', FOOT_M ** 2], ['in2', (INCH_MM / 1000) ** 2]];
/** Viscosity spellings, mPa s per unit. */
const VISCOSITY_UNITS: readonly [string, number][] = [['mPa s', 1], ['mPa·s', 1], ['mPa.s', 1], ['cP', 1], ['cp', 1], ['centipoise', 1], ['Pa s', 1000]];

/** How a value is written: unit index (or -1 for a bare number), space before the unit, number style. */
export interface Spelling {
  unit: number;
  space: number;
  style: number;
}

const spelling = (units: number): fc.Arbitrary<Spelling> =>
  fc.record({ unit: fc.integer({ min: -1, max: units - 1 }), space: fc.integer({ min: 0, max: 2 }), style: fc.integer({ min: 0, max: 3 }) });

/** A number as text that parses back to exactly the same double. */
function numberText(value: number, style: number): string {
  switch (style) {
    case 1:
      return value.toExponential();
    case 2:
      return `+${String(value)}`;
    case 3:
      return ` ${String(value)} `;
    default:
      return String(value);
  }
}

/**
 * `valueInBase` (in the base unit of `units`, factor 1) written with spelling `s`;
 * a bare number is given in the field's unit (`fieldFactor` base units per field unit).
 */
function write(valueInBase: number, s: Spelling, units: readonly [string, number][], fieldFactor: number): number | string {
  if (s.unit < 0) {
    const v = valueInBase / fieldFactor;
    return s.style === 0 ? v : numberText(v, s.style);
  }
  const [symbol, factor] = units[s.unit];
  return `${numberText(valueInBase / factor, s.style === 3 ? 0 : s.style)}${' '.repeat(s.space)}${symbol}`;
}

export interface DesignSpec {
  headMaxM: number;
  /** H_min as a share of H_max, or null to leave it out */
  headMinShare: number | null;
  headMaxSpelling: Spelling;
  headMinSpelling: Spelling;
  /** write the heads as pressures */
  headAsPressure: boolean;
  targetMm: number;
  targetSpelling: Spelling;
  densityKgM3: number | null;
  densitySpelling: Spelling;
  viscosityMPaS: number | null;
  viscositySpelling: Spelling;
  orificeMm: number | null;
  sealDiameterMm: number | null;
  preloadN: number | null;
  padChoice: string | null;
  forceSpelling: Spelling;
  padThicknessMm: number | null;
  /** indentation as a share of half the pad */
  indentationShare: number | null;
  padDensityGcm3: number | null;
  /** bench points: on a line F = F_pre + A rho g H (scattered by `scatter`), or anywhere when `line` is null */
  calibration: {
    line: { sealDiameterMm: number; preloadN: number; scatter: number } | null;
    points: { headM: number; massG: number; noise: number; massSpelling: Spelling }[];
  } | null;
  material: { table: number } | { name: string; densityGcm3: number } | null;
  lineWidthMm: number | null;
  /** wall in line widths (at least 2) */
  wallLines: number | null;
  maxOuterDiameterMm: number | null;
  reserve: number | null;
  tubeInnerDiameterMm: number | null;
  tubeLengthM: number | null;
  reservoir: { areaM2: number; riseMm: number; areaSpelling: Spelling } | null;
  lengthSpelling: Spelling;
  name: string | null;
  /** issue 13: valve.architecture and valve.mount as written (any case), or null to leave the section out */
  valve: { architecture: string | null; mount: string | null } | null;
  /** the container's rim above its level (mm; the rim at least the level) and its wall, or null */
  rim: { aboveLevelMm: number; wallMm: number | null } | null;
}

/** A float in [min, max] (no NaN, no infinities), with the ends themselves likely. */
const between = (min: number, max: number) =>
  fc.oneof(
    { weight: 8, arbitrary: fc.double({ min, max, noNaN: true, noDefaultInfinity: true }) },
    { weight: 1, arbitrary: fc.constantFrom(min, max) },
  );
/** Leave the field out (default) most of the time: `absent` weight against 1 for a value. */
const maybe = <T>(arb: fc.Arbitrary<T>, absent = 2) => fc.oneof({ weight: absent, arbitrary: fc.constant(null) }, { weight: 1, arbitrary: arb });

export interface SpecOptions {
  /** lean towards designs a float can meet (defaults more often, milder heads) */
  plausible?: boolean;
}

/** A design spec anywhere in the accepted input space. */
export function designSpec(options: SpecOptions = {}): fc.Arbitrary<DesignSpec> {
  const p = options.plausible === true;
  const absent = p ? 4 : 1;
  return fc.record({
    // a few centimetres to the 3.05 m cap (cap from DESIGN "Caps"); log-spread so short heads are common too
    headMaxM: p ? between(0.03, 3.05) : fc.oneof(between(0.01, 3.05), between(0.01, 0.3)),
    headMinShare: maybe(between(0.01, 1), p ? 2 : 1),
    headMaxSpelling: spelling(LENGTH_UNITS.length),
    headMinSpelling: spelling(LENGTH_UNITS.length),
    headAsPressure: fc.boolean(),
    targetMm: p ? fc.oneof(between(25, 300), between(5, 300)) : between(5, 300),
    targetSpelling: spelling(LENGTH_UNITS.length),
    densityKgM3: maybe(between(900, 1300), absent),
    densitySpelling: spelling(DENSITY_UNITS.length),
    viscosityMPaS: maybe(between(0.2, 100), absent),
    viscositySpelling: spelling(VISCOSITY_UNITS.length),
    orificeMm: maybe(p ? between(0.5, 2.5) : between(0.5, 6), absent),
    sealDiameterMm: maybe(p ? between(2, 8) : between(1, 30), absent),
    preloadN: maybe(p ? between(0, 1) : between(0, 5), absent),
    forceSpelling: spelling(FORCE_UNITS.length),
    padThicknessMm: maybe(between(0.5, 10), absent),
    padChoice: maybe(fc.constantFrom(...PAD_SPELLINGS), absent),
    indentationShare: maybe(between(0, 1), absent),
    padDensityGcm3: maybe(between(0.05, 3), absent),
    calibration: maybe(
      fc.record({
        line: fc.oneof(
          { weight: 4, arbitrary: fc.record({ sealDiameterMm: between(2, 12), preloadN: between(0, 0.5), scatter: fc.oneof(fc.constant(0), between(0, 0.1)) }) },
          { weight: p ? 0 : 1, arbitrary: fc.constant(null) },
        ),
        points: fc.array(
          fc.record({ headM: between(0.01, 3.05), massG: between(0.1, 5000), noise: between(-1, 1), massSpelling: spelling(MASS_UNITS.length) }),
          { minLength: 1, maxLength: 20 },
        ),
      }),
      p ? 8 : 2,
    ),
    material: maybe(
      fc.oneof(
        { weight: 4, arbitrary: fc.record({ table: fc.integer({ min: 0, max: MATERIAL_SPELLINGS.length - 1 }) }) },
        { weight: 1, arbitrary: fc.record({ name: fc.constantFrom('PETG-CF', 'my resin', 'Filament X', 'PLA+'), densityGcm3: between(0.5, 3) }) },
      ),
      1,
    ),
    lineWidthMm: maybe(between(0.2, 1.2), absent),
    wallLines: maybe(p ? between(2, 8) : fc.oneof(between(2, 10), fc.integer({ min: 2, max: 8 })), absent),
    maxOuterDiameterMm: maybe(p ? between(60, 250) : between(20, 250), absent),
    reserve: maybe(p ? between(1, 3) : between(1, 5), absent),
    tubeInnerDiameterMm: maybe(p ? between(3, 12) : between(1, 25), absent),
    tubeLengthM: maybe(between(0, 100), absent),
    reservoir: maybe(fc.record({ areaM2: between(1e-4, 100), riseMm: between(1, 1000), areaSpelling: spelling(AREA_UNITS.length) }), 1),
    lengthSpelling: spelling(LENGTH_UNITS.length),
    name: maybe(fc.string({ maxLength: 80 }), 1),
    valve: maybe(
      fc.record({
        architecture: maybe(fc.constantFrom('auto', 'direct', 'lever', 'Lever', ' DIRECT '), 1),
        mount: maybe(fc.constantFrom('auto', 'floor', 'rim', 'Rim'), 1),
      }),
      p ? 4 : 3,
    ),
    rim: maybe(fc.record({ aboveLevelMm: fc.oneof(between(0, 300), between(50, 150)), wallMm: maybe(between(0.5, 25), 1) }), p ? 2 : 3),
  });
}

/** Default line width (DESIGN): 0.45 mm. */
const DEFAULT_LINE_MM = 0.45;
/** Default pad thickness (DESIGN): 3 mm. */
const DEFAULT_PAD_MM = 3;
/** Default water density (DESIGN: 998.2 kg/m3, water at 20 C, CRC Handbook, from memory). */
const DEFAULT_DENSITY = 998.2;
/** Default orifice of the schema (2 mm) and seal diameter (5 mm). */
const DEFAULT_ORIFICE_MM = 2;
const DEFAULT_SEAL_MM = 5;

/** The design document for a spec: only fields the spec sets are written. */
export function toDocument(s: DesignSpec): Record<string, unknown> {
  const doc: Record<string, any> = { supply: {}, level: {} };
  const rho = s.densityKgM3 ?? DEFAULT_DENSITY;
  const head = (m: number, sp: Spelling) => {
    if (s.headAsPressure) {
      // H = p / (rho g): a head written as the pressure of that column of this liquid (hydrostatics)
      const pa = m * rho * G;
      const unit = PRESSURE_UNITS[Math.max(0, sp.unit) % PRESSURE_UNITS.length];
      return `${numberText(pa / unit[1], sp.style === 3 ? 0 : sp.style)}${' '.repeat(sp.space)}${unit[0]}`;
    }
    return write(m * 1000, sp, LENGTH_UNITS, 1000);
  };
  doc.supply.headMax = head(s.headMaxM, s.headMaxSpelling);
  if (s.headMinShare !== null) doc.supply.headMin = head(s.headMaxM * s.headMinShare, s.headMinSpelling);
  if (s.tubeInnerDiameterMm !== null) doc.supply.tubeInnerDiameter = write(s.tubeInnerDiameterMm, s.lengthSpelling, LENGTH_UNITS, 1);
  if (s.tubeLengthM !== null) doc.supply.tubeLength = write(s.tubeLengthM * 1000, s.lengthSpelling, LENGTH_UNITS, 1000);
  doc.level.target = write(s.targetMm, s.targetSpelling, LENGTH_UNITS, 1);
  if (s.densityKgM3 !== null || s.viscosityMPaS !== null) {
    doc.liquid = {};
    if (s.densityKgM3 !== null) doc.liquid.density = write(s.densityKgM3, s.densitySpelling, DENSITY_UNITS, 1);
    if (s.viscosityMPaS !== null) doc.liquid.viscosity = write(s.viscosityMPaS, s.viscositySpelling, VISCOSITY_UNITS, 1);
  }
  // the orifice must be narrower than the lip: draw both, then order them
  if (s.orificeMm !== null || s.sealDiameterMm !== null) {
    let orifice = s.orificeMm ?? DEFAULT_ORIFICE_MM;
    let seal = s.sealDiameterMm ?? DEFAULT_SEAL_MM;
    if (orifice >= seal) {
      orifice = Math.max(0.5, Math.min(orifice, seal) * 0.6);
      seal = Math.max(seal, orifice + 0.5);
      if (seal > 30) seal = 30;
    }
    doc.nozzle = { orifice: write(orifice, s.lengthSpelling, LENGTH_UNITS, 1), sealDiameter: write(seal, s.targetSpelling, LENGTH_UNITS, 1) };
  }
  const seal: Record<string, unknown> = {};
  // a first-version preload: still read (range-checked), then ignored
  if (s.preloadN !== null) seal.preload = write(s.preloadN, s.forceSpelling, FORCE_UNITS, 1);
  const pad = s.padThicknessMm ?? DEFAULT_PAD_MM;
  if (s.padThicknessMm !== null) seal.padThickness = write(pad, s.lengthSpelling, LENGTH_UNITS, 1);
  if (s.padChoice !== null) seal.pad = s.padChoice;
  // indentation from 0.05 mm to half the pad (schema's cross-field rule)
  // (the default 0.5 mm indentation is refused under a 1 mm pad, so a thin pad always carries its own)
  const share = s.indentationShare ?? (pad < 1 ? 0.5 : null);
  if (share !== null) seal.indentation = 0.05 + share * (pad / 2 - 0.05);
  if (s.padDensityGcm3 !== null) seal.padDensity = write(s.padDensityGcm3 * 1000, s.densitySpelling, DENSITY_UNITS, 1000);
  if (s.calibration !== null) {
    const { line, points } = s.calibration;
    const bench = points.map((c) => {
      const head = Number(c.headM.toPrecision(12));
      // a bench point on the line m g = F_pre + A rho g H (hydrostatics), scattered a little
      const massG = line
        ? ((line.preloadN + (Math.PI / 4) * (line.sealDiameterMm / 1000) ** 2 * rho * G * head) / G) * 1000 * (1 + line.scatter * c.noise)
        : c.massG;
      return { head, massG, spelling: c.massSpelling };
    });
    // points off the scale's 0.1 g to 5000 g are not weighed (clamping them would bend the line)
    const weighed = bench.filter((b) => b.massG >= 0.1 && b.massG <= 5000);
    if (weighed.length) seal.calibration = weighed.map((b) => ({ head: b.head, mass: write(b.massG, b.spelling, MASS_UNITS, 1) }));
  }
  if (Object.keys(seal).length) doc.seal = seal;
  const print: Record<string, unknown> = {};
  if (s.material !== null) {
    print.material = 'table' in s.material ? MATERIAL_SPELLINGS[s.material.table] : { name: s.material.name, density: `${s.material.densityGcm3} g/cm3` };
  }
  const line = s.lineWidthMm ?? DEFAULT_LINE_MM;
  if (s.lineWidthMm !== null) print.lineWidth = write(line, s.lengthSpelling, LENGTH_UNITS, 1);
  if (s.wallLines !== null) {
    // at least two line widths (schema); a hair over so rounding in another unit never dips under
    const wall = Math.min(10, Math.max(s.wallLines * line, 2 * line * (1 + 1e-12)));
    print.wall = write(wall, s.targetSpelling, LENGTH_UNITS, 1);
  } else if (s.lineWidthMm !== null && 2 * line > 2.25) {
    print.wall = 2 * line * (1 + 1e-12); // the default wall would be under two lines
  }
  if (Object.keys(print).length) doc.print = print;
  if (s.maxOuterDiameterMm !== null) doc.limits = { maxOuterDiameter: write(s.maxOuterDiameterMm, s.lengthSpelling, LENGTH_UNITS, 1) };
  if (s.reserve !== null) doc.reserve = s.reserve;
  if (s.reservoir !== null) {
    doc.reservoir = { area: write(s.reservoir.areaM2, s.reservoir.areaSpelling, AREA_UNITS, 1), rise: write(s.reservoir.riseMm, s.targetSpelling, LENGTH_UNITS, 1) };
  }
  if (s.name !== null) doc.name = s.name;
  if (s.rim !== null || (s.valve && s.valve.mount !== null && s.valve.mount.trim().toLowerCase() === 'rim')) {
    // a rim is needed for the rim mount (the schema refuses one without); never below the level, never over its 1000 mm
    const above = s.rim?.aboveLevelMm ?? 100;
    doc.container = {
      ...(doc.container ?? {}),
      // at least 2 mm over the level: the two are written in their own units and roundings
      rimHeight: write(Math.min(1000, Math.max(10, s.targetMm + Math.max(2, above))), s.lengthSpelling, LENGTH_UNITS, 1),
      ...(s.rim?.wallMm != null ? { wallThickness: write(s.rim.wallMm, s.lengthSpelling, LENGTH_UNITS, 1) } : {}),
    };
  }
  if (s.valve !== null) {
    doc.valve = {};
    if (s.valve.architecture !== null) doc.valve.architecture = s.valve.architecture;
    if (s.valve.mount !== null) doc.valve.mount = s.valve.mount;
  }
  return doc;
}

/** Accepted design documents (whole input space). */
export const acceptedDocument = (options: SpecOptions = {}) => designSpec(options).map(toDocument);

/** One field of a document taken out of its range or to junk: the path the message must name. */
export interface Mutation {
  /** dotted path the error must name */
  field: string;
  /** the value written there */
  value: unknown;
  /** a word the message must carry (the value as shown, or part of the range) */
  kind: 'out-of-range' | 'junk';
}

/** Each field's range in its own unit (from the schema) for out-of-range values just past either end. */
const RANGES: readonly { path: string; min: number; max: number; minExclusive?: boolean; unit: string }[] = [
  { path: 'supply.headMax', min: 0, max: 3.05, minExclusive: true, unit: 'm' },
  { path: 'supply.tubeInnerDiameter', min: 1, max: 25, unit: 'mm' },
  { path: 'supply.tubeLength', min: 0, max: 100, unit: 'm' },
  { path: 'level.target', min: 5, max: 300, unit: 'mm' },
  { path: 'container.rimHeight', min: 10, max: 1000, unit: 'mm' },
  { path: 'container.wallThickness', min: 0.5, max: 25, unit: 'mm' },
  { path: 'liquid.density', min: 900, max: 1300, unit: 'kg/m3' },
  { path: 'liquid.viscosity', min: 0.2, max: 100, unit: 'mPa s' },
  { path: 'nozzle.sealDiameter', min: 1, max: 30, unit: 'mm' },
  { path: 'seal.preload', min: 0, max: 5, unit: 'N' },
  { path: 'seal.padThickness', min: 0.5, max: 10, unit: 'mm' },
  { path: 'seal.padDensity', min: 0.05, max: 3, unit: 'g/cm3' },
  { path: 'print.lineWidth', min: 0.2, max: 1.2, unit: 'mm' },
  { path: 'limits.maxOuterDiameter', min: 20, max: 250, unit: 'mm' },
  { path: 'reserve', min: 1, max: 5, unit: '' },
];
export const RANGE_PATHS = RANGES.map((r) => r.path);
/** Optional fields of the document that take null for "not given". */
const NULL_MEANS_NOT_GIVEN: readonly string[] = ['container.rimHeight', 'container.wallThickness'];

/** Junk for a quantity field (each must be refused with a message naming the field). */
export const JUNK_VALUES: readonly unknown[] = [
  'NaN', 'Infinity', '-Infinity', '1e308 m', '1e309', '12 parsecs', '2,4 m', '4O mm', '', '   ', 'mm', '--3', '0x10', '1_000', '∞',
  '1e-400 m', 'null', 'undefined', '<script>alert(1)</script>', 'x'.repeat(500), true, false, null, [], [1], {}, { value: 2 }, { __proto__: { polluted: 1 } },
  Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, 1e308, -1e308, Number.MAX_VALUE, -Number.MAX_VALUE,
];

/**
 * An out-of-range number (in the field's unit) just past one end, or far past it. "Just" is at least a
 * millionth of the bound: the schema forgives a billionth (unit conversion rounding) by design.
 */
export function outsideValue(): fc.Arbitrary<Mutation> {
  return fc
    .record({
      range: fc.constantFrom(...RANGES),
      side: fc.constantFrom('low', 'high'),
      by: fc.oneof(fc.double({ min: 1e-6, max: 1, noNaN: true }), fc.double({ min: 1, max: 1e6, noNaN: true })),
      asText: fc.boolean(),
    })
    .map(({ range, side, by, asText }) => {
      const d = by * Math.max(1, Math.abs(range.min), Math.abs(range.max));
      const v = side === 'low' ? range.min - d : range.max + d;
      const value = asText && range.unit ? `${v} ${range.unit}` : v;
      return { field: range.path, value, kind: 'out-of-range' as const };
    });
}

/** A junk value at a quantity field. */
export function junkValue(): fc.Arbitrary<Mutation> {
  return fc
    .record({ path: fc.constantFrom(...RANGE_PATHS, 'supply.headMin', 'nozzle.orifice', 'seal.indentation', 'print.wall'), value: fc.constantFrom(...JUNK_VALUES) })
    // in these optional fields an explicit null means "not given" (as for container.overflow): junk there is the text "null"
    .map(({ path, value }) => ({ field: path, value: value === null && NULL_MEANS_NOT_GIVEN.includes(path) ? 'null' : value, kind: 'junk' as const }));
}

/** Set a dotted path in a copy of `doc` (sections created as needed). */
export function setPath(doc: Record<string, unknown>, path: string, value: unknown): Record<string, unknown> {
  const copy = structuredClone(doc) as Record<string, any>;
  const keys = path.split('.');
  let node = copy;
  for (const k of keys.slice(0, -1)) {
    if (node[k] === undefined || node[k] === null || typeof node[k] !== 'object') node[k] = {};
    node = node[k];
  }
  Object.defineProperty(node, keys[keys.length - 1], { value, enumerable: true, writable: true, configurable: true });
  return copy;
}
