/**
 * The plan document: one tank, one supply main, many containers. Checked with
 * the same machinery as the design document (generator/doc/fields.ts): every
 * quantity takes a number in its field's unit or a string with a unit, unknown
 * keys are refused by name, and each problem comes back as `{ field, message }`
 * with the field's path in the PLAN (`containers.2.floorElevation`).
 *
 * Each container's valve is a design document: the plan's `design` (defaults
 * for all), then the container's own `design` override, then the container's
 * fields mapped onto design fields (CONTAINER_FIELD_MAP). That merged document
 * goes through `parseDesign`, and its error paths are mapped back to where the
 * value was written in the plan.
 *
 * ```json
 * { "tank": { "fullSurfaceElevation": "2.4 m", "lowSurfaceElevation": "1.9 m" },
 *   "main": { "innerDiameter": "8 mm" },
 *   "design": { "print": { "material": "PETG" } },
 *   "starvingShare": 0.5,
 *   "containers": [ { "name": "top shelf", "count": 3, "floorElevation": "0.9 m", "level": "35 mm",
 *     "mainLength": "2 m", "branch": { "length": "1.2 m", "innerDiameter": "4 mm" },
 *     "reservoirArea": "0.08 m2", "rise": "20 mm" } ] }
 * ```
 */
import { nameKey } from '../doc/safe-text/name-key.ts';
import { z } from 'zod';
import {
  lengthField,
  numberField,
  scanForbiddenKeys,
  section,
  textField,
  zodIssuesToFieldErrors,
  ROOT_FIELD,
  type FieldError,
  type QuantitySpec,
} from '../doc/fields.ts';
import { parseDesign, MAX_NAME_LENGTH, MAX_NOTES_LENGTH } from '../doc/schema.ts';
import { formatNumber, showInput } from '../doc/units.ts';
import type { PlanContainerInput, PlanInputs, PlanParse } from './types.ts';

/** Root path for problems with the plan as a whole. */
export const PLAN_ROOT_FIELD = 'plan';

/** Range and wording of the plan's own fields (limits in the field's unit). */
export const PLAN_FIELD_SPECS = {
  surfaceElevation: { unit: 'm', label: 'a tank surface elevation (on the plan datum)', min: -100, max: 1000, example: '2.4 m' },
  mainInnerDiameter: { unit: 'mm', label: 'the supply main inner diameter', min: 1, max: 100, example: '8 mm' },
  starvingShare: { unit: '', label: 'the starving share (shared flow over flow alone below which a container starves)', min: 0, max: 1 },
  count: { unit: '', label: 'the count of identical containers', min: 1, max: 1000 },
  floorElevation: { unit: 'm', label: 'the container floor elevation (on the plan datum)', min: -100, max: 1000, example: '0.9 m' },
  mainLength: { unit: 'm', label: 'the length along the main from the tank to the tee', min: 0, max: 1000 },
} satisfies Record<string, QuantitySpec>;

export const DEFAULT_STARVING_SHARE = 0.5;
export const MAX_CONTAINERS = 500;
/**
 * Most valves one plan may hold (every row's count added up). A bench a grower
 * builds and tends by hand is tens to a few hundred containers; 1000 valves is
 * about 4000 printed parts and 80 kg of filament, months on one printer, and
 * keeps the plate set (a 3MF per bed of parts) to some hundreds of files, where
 * 500 rows x 1000 would write gigabytes. Common practice, not a physical limit.
 */
export const MAX_VALVES = 1000;

/**
 * Container fields that are design fields under another name:
 * container key path -> design-document path.
 */
export const CONTAINER_FIELD_MAP: Readonly<Record<string, string>> = {
  level: 'level.target',
  'branch.length': 'supply.tubeLength',
  'branch.innerDiameter': 'supply.tubeInnerDiameter',
  reservoirArea: 'reservoir.area',
  rise: 'reservoir.rise',
  maxOuterDiameter: 'limits.maxOuterDiameter',
};

/** Design paths a plan may not set: the plan works the heads out from the elevations. */
const COMPUTED_DESIGN_PATHS: Readonly<Record<string, string>> = {
  'supply.headMax': 'the plan works out each valve\'s head from tankFullSurfaceElevation and the container\'s floorElevation; remove it',
  'supply.headMin': 'the plan works out each valve\'s lowest head from tank.lowSurfaceElevation; remove it',
};

/** Placeholder head for checking a container's design before its head is known (replaced by the solve). */
const PLACEHOLDER_HEAD = '1 m';

const S = PLAN_FIELD_SPECS;
const EMPTY = {} as never;
/** A raw value passed on to the design document and checked there. */
const passOn = z.unknown().optional();

const containerSchema = section({
  name: textField('the container name', MAX_NAME_LENGTH),
  count: numberField({ ...S.count, fallback: 1 }),
  floorElevation: lengthField({ ...S.floorElevation }),
  mainLength: lengthField({ ...S.mainLength, fallback: 0 }),
  level: passOn,
  branch: section({ length: passOn, innerDiameter: passOn }).optional(),
  reservoirArea: passOn,
  rise: passOn,
  maxOuterDiameter: passOn,
  design: passOn,
});

const planSchema = section({
  name: textField('the plan name', MAX_NAME_LENGTH),
  notes: textField('the plan notes', MAX_NOTES_LENGTH),
  tank: section({
    fullSurfaceElevation: lengthField({ ...S.surfaceElevation, label: 'the tank surface elevation when full' }),
    lowSurfaceElevation: passOn,
  }).prefault(EMPTY),
  main: section({
    innerDiameter: lengthField({ ...S.mainInnerDiameter }),
  }).prefault(EMPTY),
  design: passOn,
  starvingShare: numberField({ ...S.starvingShare, fallback: DEFAULT_STARVING_SHARE }),
  containers: z.array(passOn, {
    error: (issue) =>
      issue.code === 'invalid_type'
        ? `${showInput(issue.input)} is not a list; give containers as [{ "name": "top shelf", "floorElevation": "0.9 m", "level": "35 mm" }, ...].`
        : undefined,
  })
    .min(1, { error: 'empty; give at least one container.' })
    .max(MAX_CONTAINERS, { error: `too many; a plan holds at most ${MAX_CONTAINERS} container rows (use count for identical ones).` }),
});

function isPlainObject(value: unknown): value is Record<string, unknown> {
  return value !== null && typeof value === 'object' && !Array.isArray(value);
}

/** Leaves of a raw object (arrays count as leaves), as dotted paths. */
function leafPaths(value: unknown, prefix: string[] = []): string[] {
  if (!isPlainObject(value) || (prefix.length > 0 && Object.keys(value).length === 0)) return prefix.length ? [prefix.join('.')] : [];
  return Object.keys(value).flatMap((k) => leafPaths(value[k], [...prefix, k]));
}

function getPath(obj: unknown, path: string): unknown {
  let node: unknown = obj;
  for (const key of path.split('.')) {
    if (!isPlainObject(node)) return undefined;
    node = node[key];
  }
  return node;
}

function setPath(obj: Record<string, unknown>, path: string, value: unknown): void {
  const keys = path.split('.');
  let node = obj;
  for (const key of keys.slice(0, -1)) {
    if (!isPlainObject(node[key])) node[key] = {};
    node = node[key] as Record<string, unknown>;
  }
  node[keys[keys.length - 1]!] = value;
}

/** `over` merged onto a copy of `base`, objects key by key, anything else replaced. */
function deepMerge(base: unknown, over: unknown): unknown {
  if (!isPlainObject(base) || !isPlainObject(over)) return over === undefined ? structuredClone(base) : structuredClone(over);
  const out: Record<string, unknown> = structuredClone(base);
  for (const [k, v] of Object.entries(over)) out[k] = deepMerge(out[k], v);
  return out;
}

/**
 * The plan path a design-document path came from. `origins` maps design paths
 * of written leaves to plan paths; a path under a leaf keeps its tail
 * (`seal.calibration.1.mass` under `seal.calibration`), a section above leaves
 * keeps their common head.
 */
export function planPathFor(designPath: string, origins: Readonly<Record<string, string>>, fallback: string): string {
  for (const [from, to] of Object.entries(origins)) {
    if (designPath === from || designPath.startsWith(`${from}.`)) return to + designPath.slice(from.length);
  }
  for (const [from, to] of Object.entries(origins)) {
    if (from.startsWith(`${designPath}.`)) return to.slice(0, to.length - (from.length - designPath.length));
  }
  return fallback;
}

function refuseComputed(design: unknown, at: string, errors: FieldError[], extra: Record<string, string> = {}): void {
  for (const [path, why] of Object.entries({ ...COMPUTED_DESIGN_PATHS, ...extra })) {
    const value = getPath(design, path);
    if (value !== undefined) errors.push({ field: `${at}.${path}`, message: `${showInput(value)} is not allowed here; ${why}.` });
  }
}

function pushUnique(errors: FieldError[], error: FieldError): void {
  if (!errors.some((e) => e.field === error.field && e.message === error.message)) errors.push(error);
}

/**
 * One row's valve as a design document: the plan's design, the row's own
 * design, then the row's fields (CONTAINER_FIELD_MAP), checked by parseDesign
 * with its error paths turned into plan paths. Null (with errors pushed) when wrong.
 */
function rowDesign(raw: Record<string, unknown>, at: string, shared: Record<string, unknown>, errors: FieldError[]) {
  const own = raw.design === undefined ? {} : raw.design;
  if (!isPlainObject(own)) {
    errors.push({ field: `${at}.design`, message: `${showInput(own)} is not a section; give this container's own design settings as a design document.` });
    return null;
  }
  const before = errors.length;
  refuseComputed(own, `${at}.design`, errors, { liquid: 'one tank holds one liquid: set it once, in the plan\'s design.liquid' });

  const origins: Record<string, string> = {};
  const claim = (designPath: string, planPath: string) => {
    for (const k of Object.keys(origins)) if (k === designPath || k.startsWith(`${designPath}.`) || designPath.startsWith(`${k}.`)) delete origins[k];
    origins[designPath] = planPath;
  };
  for (const p of leafPaths(shared)) origins[p] = `design.${p}`;
  for (const p of leafPaths(own)) claim(p, `${at}.design.${p}`);
  const merged = deepMerge(shared, own) as Record<string, unknown>;
  for (const [key, designPath] of Object.entries(CONTAINER_FIELD_MAP)) {
    const value = getPath(raw, key);
    if (value === undefined) continue;
    if (getPath(own, designPath) !== undefined) {
      errors.push({ field: `${at}.${key}`, message: `is also given as ${at}.design.${designPath}; give it once.` });
      continue;
    }
    setPath(merged, designPath, value);
    claim(designPath, `${at}.${key}`);
  }
  origins['level.target'] ??= `${at}.level`;
  setPath(merged, 'supply.headMax', PLACEHOLDER_HEAD);
  delete (merged.supply as Record<string, unknown>).headMin;
  if (typeof raw.name === 'string' && raw.name.length <= MAX_NAME_LENGTH) merged.name = raw.name;
  else delete merged.name;
  if (errors.length > before) return null;

  const design = parseDesign(merged);
  if (!design.ok) {
    for (const e of design.errors) pushUnique(errors, { field: planPathFor(e.field, origins, `design.${e.field}`), message: e.message });
    return null;
  }
  return { inputs: design.inputs, document: design.document, origins };
}

/**
 * Check a plan document (as from JSON.parse) and return it in SI with every
 * container's design inputs, or every problem found, each naming its plan
 * path, the value and the allowed range.
 */
export function parsePlan(doc: unknown): PlanParse {
  if (!isPlainObject(doc)) {
    return {
      ok: false,
      errors: [{
        field: PLAN_ROOT_FIELD,
        message: `${showInput(doc)} is not a plan document; expected an object such as { "tank": { "fullSurfaceElevation": "2.4 m" }, "main": { "innerDiameter": "8 mm" }, "containers": [...] }.`,
      }],
    };
  }
  const forbidden = scanForbiddenKeys(doc);
  if (forbidden.length) return { ok: false, errors: forbidden.map((e) => (e.field === ROOT_FIELD ? { ...e, field: PLAN_ROOT_FIELD } : e)) };

  const errors: FieldError[] = [];
  const parsed = planSchema.safeParse(doc);
  if (!parsed.success) {
    for (const e of zodIssuesToFieldErrors(parsed.error.issues)) errors.push(e.field === ROOT_FIELD ? { ...e, field: PLAN_ROOT_FIELD } : e);
    return { ok: false, errors };
  }
  const plan = parsed.data;
  // Each row on its own, so one bad row does not hide the others' problems.
  const rows = plan.containers.map((raw, i) => {
    const one = containerSchema.safeParse(raw);
    if (one.success) return one.data;
    for (const e of zodIssuesToFieldErrors(one.error.issues)) {
      errors.push({ ...e, field: e.field === ROOT_FIELD ? `containers.${i}` : `containers.${i}.${e.field}` });
    }
    return null;
  });

  // Tank: the low surface defaults to the full one and may not be above it.
  const full = plan.tank.fullSurfaceElevation;
  let lowM = full.si;
  if (plan.tank.lowSurfaceElevation !== undefined && plan.tank.lowSurfaceElevation !== null) {
    const low = lengthField({ ...S.surfaceElevation, label: 'the tank surface elevation at its lowest useful level' }).safeParse(
      plan.tank.lowSurfaceElevation,
    );
    if (!low.success) {
      errors.push({ field: 'tank.lowSurfaceElevation', message: low.error.issues[0]!.message });
    } else if (low.data.si > full.si + 1e-12) {
      errors.push({
        field: 'tank.lowSurfaceElevation',
        message: `${low.data.shown} is above tank.fullSurfaceElevation (${formatNumber(full.si)} m); the lowest useful surface must be at most the full one.`,
      });
    } else lowM = low.data.si;
  }

  const shared = plan.design === undefined ? {} : plan.design;
  if (!isPlainObject(shared)) {
    errors.push({ field: 'design', message: `${showInput(shared)} is not a section; give the defaults every container takes as a design document, e.g. { "print": { "material": "PETG" } }.` });
    return { ok: false, errors };
  }
  refuseComputed(shared, 'design', errors);

  const names = new Map<string, number>();
  const containers: PlanContainerInput[] = [];
  let liquid: { densityKgM3: number; viscosityPaS: number } | null = null;

  plan.containers.forEach((raw, i) => {
    const at = `containers.${i}`;
    const c = rows[i];
    if (c) {
      if (c.name === undefined || c.name.trim() === '') {
        errors.push({ field: `${at}.name`, message: 'missing; give each container a name, for example "top shelf".' });
      } else if (names.has(nameKey(c.name))) {
        // compared as people read them: case, spaces and Unicode form do not make two names (refused, not merged:
        // rows with one name would share one line of the report and one folder name)
        const first = names.get(nameKey(c.name))!;
        errors.push({ field: `${at}.name`, message: `${showInput(c.name)} is already the name of containers.${first} (${showInput(rows[first]?.name)}; names differing only in case, spaces or accents count as one); give each row its own name.` });
      } else names.set(nameKey(c.name), i);
      if (!Number.isInteger(c.count.si)) {
        errors.push({ field: `${at}.count`, message: `${formatNumber(c.count.si)} is not a whole number; ${S.count.label} must be a whole number from 1 to ${S.count.max}.` });
      }
    }
    // The design is checked from the raw row even when the row's own fields are wrong, so every problem shows at once.
    if (!isPlainObject(raw)) return;
    const design = rowDesign(raw, at, shared, errors);
    if (!design || !c || c.name === undefined) return;
    liquid ??= { densityKgM3: design.inputs.liquidDensityKgM3, viscosityPaS: design.inputs.liquidViscosityPaS };
    containers.push({
      index: i,
      name: c.name,
      count: c.count.si,
      floorElevationM: c.floorElevation.si,
      mainLengthM: c.mainLength.si,
      inputs: design.inputs,
      document: design.document,
      origins: design.origins,
    });
  });

  if (errors.length) return { ok: false, errors };

  const valves = containers.reduce((n, c) => n + c.count, 0);
  if (valves > MAX_VALVES) {
    errors.push({
      field: 'containers',
      message: `the rows hold ${valves} valves in all; a plan holds at most ${MAX_VALVES} (${MAX_VALVES} valves is about ${MAX_VALVES * 4} printed parts, months of printing on one printer). Split the bench into plans of at most ${MAX_VALVES} valves, each fed by its own tank or main.`,
    });
    return { ok: false, errors };
  }

  // A container above the low tank surface gets no water; say so at the door (the exact tip comes later).
  containers.forEach((c) => {
    if (c.floorElevationM >= lowM) {
      errors.push({
        field: `containers.${c.index}.floorElevation`,
        message: `${formatNumber(c.floorElevationM)} m is too high; the floor must be below the tank's lowest surface (${formatNumber(lowM)} m), by the valve's own height and more, or the valve gets no water.`,
      });
    }
  });
  if (errors.length) return { ok: false, errors };

  const inputs: PlanInputs = {
    ...(plan.name !== undefined ? { name: plan.name } : {}),
    ...(plan.notes !== undefined ? { notes: plan.notes } : {}),
    tankFullSurfaceElevationM: full.si,
    tankLowSurfaceElevationM: lowM,
    mainInnerDiameterM: plan.main.innerDiameter.si,
    starvingShare: plan.starvingShare.si,
    liquidDensityKgM3: liquid!.densityKgM3,
    liquidViscosityPaS: liquid!.viscosityPaS,
    containers,
  };
  return { ok: true, plan: inputs };
}
