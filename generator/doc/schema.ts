/**
 * The design document: one JSON shape for the command line, the browser,
 * presets and saved files. `parseDesign` checks a document, fills in the
 * defaults and returns the sizing core's SI input plus the document written
 * out in full (every value with its unit).
 *
 * Every quantity takes a number in its field's unit (FIELD_UNITS) or a string
 * with a unit. Only supply.headMax and level.target are required.
 */
import { z } from 'zod';
import { HEAD_CAP_M, STANDARD_GRAVITY, WATER_DENSITY_20C, WATER_VISCOSITY_20C } from '../sizing/constants.ts';
import type { Architecture, CalibrationPoint, DesignInputs, Mount } from '../sizing/inputs.ts';
import { RIM_HEIGHT_RANGE_MM, WALL_THICKNESS_RANGE_MM } from '../sizing/rim/rim-input-problems.ts';
import { fitSealCalibration, headsDefineSlope } from '../sizing/hydrostatics/fit-seal-calibration.ts';
import { sameHeadClashes } from './same-head-clash.ts';
import { DEFAULT_MATERIAL_NAME, findMaterial, materialNames } from '../sizing/materials.ts';
import { AUTO_PAD, PADS, findPad, padNames } from '../sizing/seal/pads.ts';
import { chooseSeal } from '../sizing/seal/choose-seal.ts';
import {
  checkRange,
  choiceField,
  densityField,
  forceField,
  headField,
  lengthField,
  massField,
  normalizedText,
  numberField,
  optionalQuantityField,
  rangeText,
  resolveHead,
  scanForbiddenKeys,
  section,
  textField,
  viscosityField,
  zodIssuesToFieldErrors,
  type FieldError,
  type Measured,
  type QuantitySpec,
  ROOT_FIELD,
  measure,
} from './fields.ts';
import { formatNumber, fromSi, showInput, toSi } from './units.ts';

/** The unit a bare number means in each field (document path -> unit symbol; '' for plain numbers). */
export const FIELD_UNITS = {
  'supply.headMax': 'm',
  'supply.headMin': 'm',
  'supply.tubeInnerDiameter': 'mm',
  'supply.tubeLength': 'm',
  'level.target': 'mm',
  'liquid.density': 'kg/m3',
  'liquid.viscosity': 'mPa s',
  'nozzle.orifice': 'mm',
  'nozzle.sealDiameter': 'mm',
  'seal.padThickness': 'mm',
  'seal.padDensity': 'g/cm3',
  /** read from first-version files and ignored (the pad sets both now) */
  'seal.preload': 'N',
  'seal.indentation': 'mm',
  'seal.calibration.head': 'm',
  'seal.calibration.mass': 'g',
  'print.material.density': 'g/cm3',
  'print.wall': 'mm',
  'print.lineWidth': 'mm',
  'limits.maxOuterDiameter': 'mm',
  reserve: '',
  'reservoir.area': 'm2',
  'reservoir.rise': 'mm',
  'container.overflow': 'mm',
  'container.demand': 'L/day',
  'container.rimHeight': 'mm',
  'container.wallThickness': 'mm',
  'print.bed.width': 'mm',
  'print.bed.depth': 'mm',
} as const;

/**
 * The defaults, written as a grower would write them (DESIGN "Symbols and
 * defaults"; nozzle.orifice is 2 mm, not DESIGN's 3 mm: a 3 mm bore through a
 * barb for a 4 mm tube leaves walls thinner than two print lines). The pad is
 * chosen by the sizing ("auto": the softest closed-cell sponge that fits, see
 * generator/sizing/seal/pads.ts); its density comes from the pad table unless
 * given. Bed: 220 x 220 mm, a common size of hobby printers (common practice).
 */
export const DEFAULT_DOCUMENT = {
  supply: { tubeInnerDiameter: '4 mm', tubeLength: '5 m' },
  liquid: {
    density: `${WATER_DENSITY_20C} kg/m3`,
    viscosity: `${formatNumber(WATER_VISCOSITY_20C * 1e3)} mPa s`,
  },
  nozzle: { orifice: '2 mm', sealDiameter: '5 mm' },
  seal: { pad: AUTO_PAD, padThickness: '3 mm' },
  print: { material: DEFAULT_MATERIAL_NAME, wall: '2.25 mm', lineWidth: '0.45 mm', bed: '220 x 220 mm' },
  limits: { maxOuterDiameter: '120 mm' },
  reserve: 1.5,
  valve: { architecture: 'auto', mount: 'auto' },
} as const;

/**
 * The container's wall at the rim when the document gives none (container.wallThickness): 3 mm. Buckets,
 * tubs and totes are mostly 2 to 3 mm at the rim (common practice, from memory). The hanger's gap is the
 * wall plus a print clearance each side; its clamp screw takes up a thinner wall, but a thicker one will
 * not go in, so the default sits at the thick end: measure yours.
 */
export const DEFAULT_CONTAINER_WALL_MM = 3;

/**
 * The plants' peak use when the document gives none (container.demand): 3 L a day, a container of two or
 * three leafy or fruiting plants at a summer peak of 1 to 2 L each a day (common practice, from memory).
 * Used for the level held and the fill time; the valve is still sized for the tight shut-off.
 */
export const DEFAULT_DEMAND_LPD = 3;
const DEFAULT_DEMAND_M3S = (DEFAULT_DEMAND_LPD * 1e-3) / 86400;

const LOW_PRESSURE_NOTE =
  '3.05 m is about 10 ft (30 kPa, 4.3 psi of water): floatwright sizes valves for low-pressure gravity feed from a raised tank only. Never connect one to mains pressure.';

/** Range and wording of each field (limits in the field's unit). */
export const FIELD_SPECS = {
  headMax: {
    unit: 'm', label: "the head with the tank full (the tank's water surface above the nozzle tip)",
    min: 0, minExclusive: true, max: HEAD_CAP_M, note: LOW_PRESSURE_NOTE, example: '2.2 m',
  },
  headMin: { unit: 'm', label: 'the head with the tank low', min: 0, minExclusive: true, max: HEAD_CAP_M, note: LOW_PRESSURE_NOTE },
  tubeInnerDiameter: { unit: 'mm', label: "the feed tube's inside width", min: 1, max: 25 },
  tubeLength: { unit: 'm', label: "the feed tube's length", min: 0, max: 100 },
  target: { unit: 'mm', label: 'the water depth to hold (above the container floor)', min: 5, max: 300, example: '40 mm' },
  liquidDensity: { unit: 'kg/m3', label: 'the liquid density', min: 900, max: 1300 },
  viscosity: { unit: 'mPa s', label: 'the liquid viscosity', min: 0.2, max: 100 },
  orifice: { unit: 'mm', label: 'the nozzle hole', min: 0.5, max: 6 },
  sealDiameter: { unit: 'mm', label: "the nozzle lip's outside width", min: 1, max: 30 },
  preload: { unit: 'N', label: 'the pad preload', min: 0, max: 5 },
  padThickness: { unit: 'mm', label: 'the pad thickness', min: 0.5, max: 10 },
  indentation: { unit: 'mm', label: 'the pad squeeze when shut', min: 0.05, max: 5 },
  padDensity: { unit: 'g/cm3', label: 'the pad density', min: 0.05, max: 3 },
  calibrationHead: { unit: 'm', label: 'the head of a bench point', min: 0.01, max: HEAD_CAP_M, note: LOW_PRESSURE_NOTE },
  calibrationMass: { unit: 'g', label: 'the weight of a bench point', min: 0.1, max: 5000 },
  materialDensity: { unit: 'g/cm3', label: 'the filament density', min: 0.5, max: 3 },
  wall: { unit: 'mm', label: 'the housing wall', min: 0, minExclusive: true, max: 10 },
  lineWidth: { unit: 'mm', label: 'the line width', min: 0.2, max: 1.2 },
  maxOuterDiameter: { unit: 'mm', label: 'the widest valve that fits (across the housing foot)', min: 20, max: 250 },
  reserve: { unit: '', label: "the spare lift (the float's lift over the push needed to shut)", min: 1, max: 5 },
  reservoirArea: { unit: 'm2', label: 'the water surface area', min: 1e-4, max: 100 },
  reservoirRise: { unit: 'mm', label: 'the refill depth', min: 1, max: 1000 },
  overflow: { unit: 'mm', label: 'the overflow height (above the container floor)', min: 10, max: 2000, example: '60 mm' },
  demand: { unit: 'L/day', label: "the plants' peak use (container demand)", min: 0, max: 5000, example: '3 L/day' },
  bedSide: { unit: 'mm', label: 'a bed side', min: 50, max: 1000, example: '220 mm' },
  rimHeight: {
    unit: 'mm', label: 'the rim height (top of the container wall above its floor; only then can the valve hang from the rim)',
    ...RIM_HEIGHT_RANGE_MM, example: '350 mm',
  },
  containerWall: { unit: 'mm', label: "the container's wall thickness at the rim", ...WALL_THICKNESS_RANGE_MM, example: '3 mm' },
} satisfies Record<string, QuantitySpec>;

export const MAX_CALIBRATION_POINTS = 20;
export const MAX_NAME_LENGTH = 80;
export const MAX_NOTES_LENGTH = 2000;
const MAX_MATERIAL_NAME_LENGTH = 40;

const S = FIELD_SPECS;
/** An absent section parses as an empty one, so its fields take their defaults. */
const EMPTY = {} as never;
const D = DEFAULT_DOCUMENT;

const customMaterialSchema = section({
  name: textField('the material name', MAX_MATERIAL_NAME_LENGTH),
  density: densityField({ ...S.materialDensity }),
});

interface MaterialChoice {
  name: string;
  densityKgM3: number;
  /** table name, or null for a grower's own material */
  tableName: string | null;
  densityShown?: string;
}

/** `print.material`: a name from the table, or `{ name, density }`. */
const materialField = z.unknown().optional().transform((raw, ctx): MaterialChoice => {
  const value = raw === undefined ? D.print.material : raw;
  if (typeof value === 'string') {
    const found = findMaterial(value);
    if (found) return { name: found.name, densityKgM3: found.densityKgM3, tableName: found.name };
    ctx.issues.push({
      code: 'custom',
      input: raw,
      message: `${showInput(value)} is not a material in the table (${materialNames().join(', ')}); give one of those or { "name": "...", "density": "1.15 g/cm3" }.`,
    });
    return z.NEVER;
  }
  if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    const parsed = customMaterialSchema.safeParse(value);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) ctx.issues.push({ ...issue } as never);
      return z.NEVER;
    }
    const { name, density } = parsed.data;
    if (!name || name.trim() === '') {
      ctx.issues.push({ code: 'custom', input: value, path: ['name'], message: 'missing; give your material a name, for example "PETG-CF".' });
      return z.NEVER;
    }
    return { name, densityKgM3: density.si, tableName: null, densityShown: density.shown };
  }
  ctx.issues.push({
    code: 'custom',
    input: raw,
    message: `${showInput(raw)} is not a material; give a name (${materialNames().join(', ')}) or { "name": "...", "density": "1.15 g/cm3" }.`,
  });
  return z.NEVER;
}) as unknown as z.ZodType<MaterialChoice>;

/** `seal.pad`: a name from the pad table, or "auto" (the sizing chooses). Null: not a table pad. */
const padField = z.unknown().optional().transform((raw, ctx): string | null => {
  const value = raw === undefined ? D.seal.pad : raw;
  if (typeof value === 'string') {
    if (value.trim().toLowerCase() === AUTO_PAD) return null;
    const found = findPad(value);
    if (found) return found.name;
  }
  ctx.issues.push({
    code: 'custom',
    input: raw,
    message: `${showInput(value)} is not a pad in the table; give "${AUTO_PAD}" (floatwright chooses) or one of ${padNames().join(', ')}.`,
  });
  return z.NEVER;
}) as unknown as z.ZodType<string | null>;

const bedSectionSchema = section({
  width: lengthField({ ...S.bedSide, label: 'the bed width' }),
  depth: lengthField({ ...S.bedSide, label: 'the bed depth' }),
});

interface BedSize {
  widthM: number;
  depthM: number;
}

/** `print.bed`: "220 x 220 mm" (one unit for both, or one each) or `{ "width": "220 mm", "depth": "220 mm" }`. */
const bedField = z.unknown().optional().transform((raw, ctx): BedSize => {
  const value = raw === undefined ? D.print.bed : raw;
  if (typeof value === 'string') {
    const parts = value.split(/\s*[x\u00d7*]\s*(?=[\d.+-])/i);
    if (parts.length === 2) {
      // "220 x 220 mm": the unit written after the second number serves the first too
      const unit = parts[1].replace(/^[\s\d.+\-eE]*/, '');
      const first = /^[\s\d.+\-eE]*$/.test(parts[0]) && unit ? `${parts[0]} ${unit}` : parts[0];
      const sides = [first, parts[1]].map((text, i) => measure(text, 'length', { ...S.bedSide, label: i === 0 ? 'the bed width' : 'the bed depth' }));
      const bad = sides.find((r) => !r.ok);
      if (bad && !bad.ok) {
        ctx.issues.push({ code: 'custom', input: raw, message: `${showInput(value)}: ${bad.message}` });
        return z.NEVER;
      }
      const [w, d] = sides as { ok: true; measured: Measured }[];
      return { widthM: w.measured.si, depthM: d.measured.si };
    }
  } else if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    const parsed = bedSectionSchema.safeParse(value);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) ctx.issues.push({ ...issue } as never);
      return z.NEVER;
    }
    return { widthM: parsed.data.width.si, depthM: parsed.data.depth.si };
  }
  ctx.issues.push({
    code: 'custom',
    input: raw,
    message: `${showInput(value)} is not a bed size; give it as "220 x 220 mm" or { "width": "220 mm", "depth": "220 mm" }, each side ${rangeText(S.bedSide)}.`,
  });
  return z.NEVER;
}) as unknown as z.ZodType<BedSize>;

const calibrationPoint = section({
  head: headField({ ...S.calibrationHead, required: true }),
  mass: massField({ ...S.calibrationMass }),
});

const calibrationField = z
  .array(calibrationPoint, {
    error: (issue) =>
      issue.code === 'invalid_type'
        ? `${showInput(issue.input)} is not a list; give bench points as [{ "head": "0.8 m", "mass": "31 g" }, ...].`
        : undefined,
  })
  .max(MAX_CALIBRATION_POINTS, {
    error: (issue) =>
      `${Array.isArray(issue.input) ? issue.input.length : 'too many'} points is too many; give at most ${MAX_CALIBRATION_POINTS} calibration points.`,
  })
  .optional();

/** valve.architecture and valve.mount: the words they take and what each means (for the refusal). */
export const ARCHITECTURE_CHOICES: readonly { value: Architecture | 'auto'; means: string }[] = [
  { value: 'auto', means: 'floatwright picks the one with the least plastic' },
  { value: 'direct', means: 'the float pushes the pad straight up' },
  { value: 'lever', means: 'the float rides on an arm that multiplies its push' },
];
export const MOUNT_CHOICES: readonly { value: Mount | 'auto'; means: string }[] = [
  { value: 'auto', means: 'floatwright picks; the rim only when container.rimHeight is given' },
  { value: 'floor', means: 'it stands on the container floor' },
  { value: 'rim', means: 'it hangs from the container rim on a slotted stem' },
];

const documentShape = {
  name: textField('the name', MAX_NAME_LENGTH),
  notes: textField('the notes', MAX_NOTES_LENGTH),
  supply: section({
    headMax: headField({ ...S.headMax, required: true }),
    headMin: headField({ ...S.headMin, required: false }),
    tubeInnerDiameter: lengthField({ ...S.tubeInnerDiameter, fallback: D.supply.tubeInnerDiameter }),
    tubeLength: lengthField({ ...S.tubeLength, fallback: D.supply.tubeLength }),
  }).prefault(EMPTY),
  level: section({
    target: lengthField({ ...S.target }),
  }).prefault(EMPTY),
  liquid: section({
    density: densityField({ ...S.liquidDensity, fallback: D.liquid.density }),
    viscosity: viscosityField({ ...S.viscosity, fallback: D.liquid.viscosity }),
  }).prefault(EMPTY),
  nozzle: section({
    orifice: lengthField({ ...S.orifice, fallback: D.nozzle.orifice }),
    sealDiameter: lengthField({ ...S.sealDiameter, fallback: D.nozzle.sealDiameter }),
  }).prefault(EMPTY),
  seal: section({
    pad: padField,
    padThickness: lengthField({ ...S.padThickness, fallback: D.seal.padThickness }),
    // no fallback: the pad table gives the density unless the grower knows better
    padDensity: optionalQuantityField('density', S.padDensity, false),
    calibration: calibrationField,
    // first-version keys: still read (a saved file must open), checked, then ignored with a warning
    preload: optionalQuantityField('force', S.preload, false),
    indentation: optionalQuantityField('length', S.indentation, false),
  }).prefault(EMPTY),
  print: section({
    material: materialField,
    wall: lengthField({ ...S.wall, fallback: D.print.wall }),
    lineWidth: lengthField({ ...S.lineWidth, fallback: D.print.lineWidth }),
    bed: bedField,
  }).prefault(EMPTY),
  limits: section({
    maxOuterDiameter: lengthField({ ...S.maxOuterDiameter, fallback: D.limits.maxOuterDiameter }),
  }).prefault(EMPTY),
  reserve: numberField({ ...S.reserve, fallback: D.reserve }),
  reservoir: section({
    area: optionalQuantityField('area', S.reservoirArea),
    rise: optionalQuantityField('length', S.reservoirRise),
  }).optional(),
  container: section({
    overflow: optionalQuantityField('length', S.overflow),
    demand: optionalQuantityField('flow', S.demand),
    rimHeight: optionalQuantityField('length', S.rimHeight),
    wallThickness: optionalQuantityField('length', S.containerWall),
  }).optional(),
  valve: section({
    architecture: choiceField('a valve architecture', ARCHITECTURE_CHOICES, D.valve.architecture),
    mount: choiceField('a valve mount', MOUNT_CHOICES, D.valve.mount),
  }).prefault(EMPTY),
};

/** The document written out in full: every value in its field's unit, defaults filled in. Parses back to the same inputs. */
export interface NormalizedDoc {
  name?: string;
  notes?: string;
  supply: { headMax: string; headMin: string; tubeInnerDiameter: string; tubeLength: string };
  level: { target: string };
  liquid: { density: string; viscosity: string };
  nozzle: { orifice: string; sealDiameter: string };
  seal: { pad: string; padThickness: string; padDensity?: string; calibration: { head: string; mass: string }[] };
  print: { material: string | { name: string; density: string }; wall: string; lineWidth: string; bed: string };
  limits: { maxOuterDiameter: string };
  reserve: number;
  reservoir?: { area: string; rise: string };
  container?: { overflow?: string; demand?: string; rimHeight?: string; wallThickness?: string };
  valve: { architecture: Architecture | 'auto'; mount: Mount | 'auto' };
}

export interface ParsedDesign {
  inputs: DesignInputs;
  document: NormalizedDoc;
}

type Ctx = { issues: unknown[] };
function fail(ctx: Ctx, path: (string | number)[], input: unknown, message: string): void {
  (ctx.issues as object[]).push({ code: 'custom', path, input, message });
}

/** The design document schema: raw JSON in, `{ inputs, document }` out. */
export const designSchema = section(documentShape).transform((doc, ctx): ParsedDesign => {
  const rho = doc.liquid.density.si;
  const issuesBefore = ctx.issues.length;
  const { supply, nozzle, seal, print, reservoir, container } = doc;

  // Heads: a pressure becomes a height with the liquid's density (H = p / (rho g)).
  const headMaxResult = resolveHead(supply.headMax!, rho, S.headMax, STANDARD_GRAVITY);
  if (!headMaxResult.ok) fail(ctx, ['supply', 'headMax'], supply.headMax?.raw, headMaxResult.message);
  let headMin: Measured | null = null;
  if (headMaxResult.ok) {
    headMin = headMaxResult.measured;
    if (supply.headMin) {
      const lowResult = resolveHead(supply.headMin, rho, S.headMin, STANDARD_GRAVITY);
      if (!lowResult.ok) fail(ctx, ['supply', 'headMin'], supply.headMin.raw, lowResult.message);
      else if (lowResult.measured.si > headMaxResult.measured.si * (1 + 1e-12)) {
        fail(ctx, ['supply', 'headMin'], supply.headMin.raw,
          `${lowResult.measured.shown} is above supply.headMax (${normalizedText(headMaxResult.measured.si, 'm')}); the head with the tank low must be more than 0 m and at most the head with the tank full.`);
      } else headMin = lowResult.measured;
    }
  }

  if (nozzle.orifice.si >= nozzle.sealDiameter.si) {
    fail(ctx, ['nozzle', 'orifice'], undefined,
      `${nozzle.orifice.shown} is not smaller than nozzle.sealDiameter (${normalizedText(nozzle.sealDiameter.si, 'mm')}); the nozzle hole must be narrower than the nozzle lip that seals around it.`);
  }

  const retiredFields = (['preload', 'indentation'] as const).filter((k) => seal[k] !== null).map((k) => `seal.${k}`);
  const padDensityKgM3 = seal.padDensity?.si ?? (seal.pad === null ? PADS[0] : findPad(seal.pad)!).densityKgM3;

  const calibration: CalibrationPoint[] = [];
  const calibrationText: { head: string; mass: string }[] = [];
  (seal.calibration ?? []).forEach((point, i) => {
    const head = resolveHead(point.head!, rho, S.calibrationHead, STANDARD_GRAVITY);
    if (!head.ok) return fail(ctx, ['seal', 'calibration', i, 'head'], point.head?.raw, head.message);
    calibration.push({ headM: head.measured.si, massKg: point.mass.si });
    calibrationText.push({ head: normalizedText(head.measured.si, 'm'), mass: normalizedText(point.mass.si, 'g') });
  });
  // two different masses at one head cannot both be right: refused on the later one's mass, naming the earlier
  if (calibration.length === (seal.calibration ?? []).length) {
    for (const { index, earlier } of sameHeadClashes(calibration)) {
      const [p, q] = [calibrationText[index], calibrationText[earlier]];
      fail(ctx, ['seal', 'calibration', index, 'mass'], undefined,
        `${p.mass} at ${p.head}, but point ${earlier + 1} at the same head stopped the flow with ${q.mass}: at one head the pad stops the flow at one weight, so two more than 5 % apart cannot both be right. Weigh again, or remove one of them.`);
    }
  }
  // The sizing core fits F = F_pre + A_eff rho g H to the bench points; a fit whose area is not positive
  // (masses that fall as the head rises) cannot size a float, so it is refused here, at the door.
  const calibrationComplete = calibration.length > 0 && calibration.length === (seal.calibration ?? []).length;

  const lineMm = fromSi(print.lineWidth.si, 'mm');
  const wallSpec = { ...S.wall, min: 2 * lineMm, minExclusive: false, label: `the housing wall (at least two ${formatNumber(lineMm)} mm line widths)` };
  const wallProblem = checkRange(print.wall.si, print.wall.shown, wallSpec);
  if (wallProblem) fail(ctx, ['print', 'wall'], undefined, wallProblem);

  if (reservoir && (reservoir.area === null) !== (reservoir.rise === null)) {
    const missing = reservoir.area === null ? 'area' : 'rise';
    const other = missing === 'area' ? 'rise' : 'area';
    fail(ctx, ['reservoir', missing], undefined,
      `missing; give reservoir.${missing} together with reservoir.${other} (both are needed for a refill time), or leave both out.`);
  }

  // the rim: the valve hangs from it, so it cannot hold a level above it; a rim mount needs one
  const rimHeight = container?.rimHeight ?? null;
  if (rimHeight && rimHeight.si < doc.level.target.si * (1 - 1e-12)) {
    fail(ctx, ['container', 'rimHeight'], rimHeight.shown,
      `${rimHeight.shown} is below level.target (${normalizedText(doc.level.target.si, 'mm')}); the valve hangs from the rim, so the rim must be at least as high as the level it holds.`);
  }
  if (!rimHeight && doc.valve.mount === 'rim') {
    fail(ctx, ['container', 'rimHeight'], undefined,
      `missing; valve.mount "rim" hangs the valve from the container's rim: give the rim height, the top of its wall above the floor, e.g. "${S.rimHeight.example}".`);
  }

  if (ctx.issues.length > issuesBefore || !headMaxResult.ok || !headMin) return z.NEVER;

  const area = reservoir?.area ?? null;
  const rise = reservoir?.rise ?? null;
  const overflow = container?.overflow ?? null;
  const demand = container?.demand ?? null;
  const containerWall = container?.wallThickness ?? null;
  const inputs: DesignInputs = {
    headMaxM: headMaxResult.measured.si,
    headMinM: headMin.si,
    targetLevelM: doc.level.target.si,
    liquidDensityKgM3: rho,
    liquidViscosityPaS: doc.liquid.viscosity.si,
    orificeM: nozzle.orifice.si,
    sealDiameterM: nozzle.sealDiameter.si,
    padName: seal.pad,
    padThicknessM: seal.padThickness.si,
    padDensityKgM3,
    calibration,
    materialName: print.material.name,
    materialDensityKgM3: print.material.densityKgM3,
    wallM: print.wall.si,
    lineWidthM: print.lineWidth.si,
    maxOuterDiameterM: doc.limits.maxOuterDiameter.si,
    reserve: doc.reserve.si,
    tubeInnerDiameterM: supply.tubeInnerDiameter.si,
    tubeLengthM: supply.tubeLength.si,
    reservoirAreaM2: area ? area.si : null,
    reservoirRiseM: rise ? rise.si : null,
    overflowM: overflow ? overflow.si : null,
    demandM3s: demand ? demand.si : DEFAULT_DEMAND_M3S,
    bedWidthM: print.bed.widthM,
    bedDepthM: print.bed.depthM,
    architecture: doc.valve.architecture,
    mount: doc.valve.mount,
    rimHeightM: rimHeight ? rimHeight.si : null,
    containerWallM: containerWall ? containerWall.si : DEFAULT_CONTAINER_WALL_MM / 1e3,
    retiredFields,
  };
  // The sizing fits F = F_seat + A rho g H to the bench points (one point: A alone, F_seat from the pad model);
  // a fit whose area is not positive (masses that fall as the head rises) cannot size a float: refused at the door.
  if (calibrationComplete) {
    const seatN = chooseSeal({ ...inputs, calibration: [] }).seatN;
    const fit = calibrationFitProblem(calibration, calibrationText, rho, seatN);
    if (fit) {
      fail(ctx, ['seal', 'calibration'], undefined, fit);
      return z.NEVER;
    }
  }
  const U = FIELD_UNITS;
  const document: NormalizedDoc = {
    ...(doc.name !== undefined ? { name: doc.name } : {}),
    ...(doc.notes !== undefined ? { notes: doc.notes } : {}),
    supply: {
      headMax: normalizedText(inputs.headMaxM, U['supply.headMax']),
      headMin: normalizedText(inputs.headMinM, U['supply.headMin']),
      tubeInnerDiameter: normalizedText(inputs.tubeInnerDiameterM, U['supply.tubeInnerDiameter']),
      tubeLength: normalizedText(inputs.tubeLengthM, U['supply.tubeLength']),
    },
    level: { target: normalizedText(inputs.targetLevelM, U['level.target']) },
    liquid: {
      density: normalizedText(rho, U['liquid.density']),
      viscosity: normalizedText(inputs.liquidViscosityPaS, U['liquid.viscosity']),
    },
    nozzle: {
      orifice: normalizedText(inputs.orificeM, U['nozzle.orifice']),
      sealDiameter: normalizedText(inputs.sealDiameterM, U['nozzle.sealDiameter']),
    },
    seal: {
      pad: inputs.padName ?? AUTO_PAD,
      padThickness: normalizedText(inputs.padThicknessM, U['seal.padThickness']),
      ...(seal.padDensity ? { padDensity: normalizedText(inputs.padDensityKgM3, U['seal.padDensity']) } : {}),
      calibration: calibrationText,
    },
    print: {
      material: print.material.tableName ?? {
        name: print.material.name,
        density: normalizedText(print.material.densityKgM3, U['print.material.density']),
      },
      wall: normalizedText(inputs.wallM, U['print.wall']),
      lineWidth: normalizedText(inputs.lineWidthM, U['print.lineWidth']),
      bed: `${formatNumber(fromSi(inputs.bedWidthM, 'mm'))} x ${normalizedText(inputs.bedDepthM, U['print.bed.depth'])}`,
    },
    limits: { maxOuterDiameter: normalizedText(inputs.maxOuterDiameterM, U['limits.maxOuterDiameter']) },
    reserve: Number(formatNumber(inputs.reserve, 10)),
    ...(area && rise
      ? { reservoir: { area: normalizedText(area.si, U['reservoir.area']), rise: normalizedText(rise.si, U['reservoir.rise']) } }
      : {}),
    ...(overflow || demand || rimHeight || containerWall
      ? {
          container: {
            ...(overflow ? { overflow: normalizedText(overflow.si, U['container.overflow']) } : {}),
            ...(demand ? { demand: normalizedText(demand.si, U['container.demand']) } : {}),
            ...(rimHeight ? { rimHeight: normalizedText(rimHeight.si, U['container.rimHeight']) } : {}),
            // the wall counts only with a rim: written out then, default or not, so the file says what was used
            ...(containerWall || rimHeight ? { wallThickness: normalizedText(inputs.containerWallM, U['container.wallThickness']) } : {}),
          },
        }
      : {}),
    valve: { architecture: inputs.architecture, mount: inputs.mount },
  };
  return { inputs, document };
});

/** Why the bench points cannot be fitted (fitted seal area not positive), or null when they can. */
function calibrationFitProblem(points: CalibrationPoint[], text: { head: string; mass: string }[], rho: number, seatN: number): string | null {
  let areaM2: number;
  try {
    areaM2 = fitSealCalibration(points, rho, seatN).sealAreaM2;
  } catch {
    areaM2 = Number.NaN;
  }
  if (areaM2 > 0) return null;
  const shown = text.slice(0, 4).map((p) => `${p.mass} at ${p.head}`).join(', ') + (text.length > 4 ? ', ...' : '');
  const area = Number.isFinite(areaM2) ? ` (fitted seal area ${formatNumber(areaM2 * 1e6)} mm2)` : '';
  if (!headsDefineSlope(points)) {
    const one = points.length === 1 ? 'one bench point' : 'bench points at heads less than 1 % apart (they count as one head)';
    return `${shown}: ${one} can only set the seal's area, with the pad's own seating force of ${formatNumber(Number(seatN.toPrecision(3)))} N taken as the rest, so each mass must weigh more than that (${formatNumber(Number(((seatN / STANDARD_GRAVITY) * 1e3).toPrecision(3)))} g); for a line of your own, weigh at two heads well apart.`;
  }
  return `${shown} do not rise with head${area}; the mass that stops the flow must grow with the head (fitted seal area more than 0 mm2): check the heads and masses.`;
}

export type DesignParse = { ok: true; inputs: DesignInputs; document: NormalizedDoc } | { ok: false; errors: FieldError[] };

/**
 * Check a design document (as from JSON.parse) and return the sizing core's
 * SI input and the full normalized document, or every problem found, each
 * naming its document path, the value and the allowed range.
 */
export function parseDesign(doc: unknown): DesignParse {
  if (doc === null || typeof doc !== 'object' || Array.isArray(doc)) {
    return {
      ok: false,
      errors: [{ field: ROOT_FIELD, message: `${showInput(doc)} is not a design document; expected an object such as { "supply": { "headMax": "2.2 m" }, "level": { "target": "40 mm" } }.` }],
    };
  }
  const forbidden = scanForbiddenKeys(doc);
  if (forbidden.length) return { ok: false, errors: forbidden };
  const result = designSchema.safeParse(doc);
  if (!result.success) return { ok: false, errors: zodIssuesToFieldErrors(result.error.issues) };
  return { ok: true, inputs: result.data.inputs, document: result.data.document };
}

/** Check one field's value on its own (for forms and flags): null when fine, else the message. */
export function checkQuantity(kind: Parameters<typeof measure>[1], value: unknown, spec: QuantitySpec): string | null {
  const result = measure(value, kind, spec);
  return result.ok ? null : result.message;
}

/** Deeper than any document the schema takes (it refuses past 16 levels). */
const MAX_OVERRIDE_DEPTH = 64;

/** Whether a value nests deeper than `limit` levels (walked without recursion, so any depth is safe). */
function nestedDeeperThan(value: unknown, limit: number): boolean {
  const stack: [unknown, number][] = [[value, 0]];
  while (stack.length) {
    const [node, depth] = stack.pop()!;
    if (node === null || typeof node !== 'object') continue;
    if (depth >= limit) return true;
    for (const child of Object.values(node)) stack.push([child, depth + 1]);
  }
  return false;
}

function isPlainObject(value: unknown): value is Record<string, unknown> {
  return value !== null && typeof value === 'object' && !Array.isArray(value);
}

/**
 * A copy of `doc` with values set at dotted paths (`{ "supply.headMax": "2.4m" }`),
 * for command-line flags. The input is not changed. Missing sections are
 * created; a path through something that is not an object is left alone so
 * the schema reports the real problem. Prototype keys are never written.
 */
export function mergeOverrides(doc: unknown, overrides: Readonly<Record<string, unknown>>): unknown {
  // Nothing to set, or a document nested too deep to copy safely (structuredClone recurses and overflows the
  // stack near 5000 levels): hand it on as it is; parseDesign refuses runaway nesting with a message.
  if (!Object.values(overrides).some((v) => v !== undefined) || nestedDeeperThan(doc, MAX_OVERRIDE_DEPTH)) return doc === undefined ? {} : doc;
  const base: unknown = doc === undefined ? {} : structuredClone(doc);
  if (!isPlainObject(base)) return base;
  for (const [path, value] of Object.entries(overrides)) {
    if (value === undefined) continue;
    const keys = path.split('.');
    if (keys.some((k) => k === '' || ['__proto__', 'constructor', 'prototype'].includes(k))) continue;
    let node: Record<string, unknown> = base;
    let blocked = false;
    for (const key of keys.slice(0, -1)) {
      if (!Object.hasOwn(node, key) || node[key] === undefined) node[key] = {};
      const next = node[key];
      if (!isPlainObject(next)) {
        blocked = true;
        break;
      }
      node = next;
    }
    if (!blocked) node[keys[keys.length - 1]] = value;
  }
  return base;
}

/** Range text for a field spec, e.g. FIELD_SPECS.target -> "from 5 mm to 250 mm" (for help and forms). */
export function fieldRangeText(spec: QuantitySpec): string {
  return rangeText(spec);
}

export type { FieldError } from './fields.ts';
