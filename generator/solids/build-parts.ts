/**
 * The printable parts of a sized design, each an indexed mesh in its print
 * pose resting on z = 0 (DESIGN "Parts"): housing deck down, float bottom
 * down, nozzle tip down, pin on its flat; the pad disc (cutting template) flat.
 * Every dimension comes from `sizing.parts` (the sizing result alone).
 *
 * Options: quality 'preview' (chord error 0.3 mm, for the view) or 'export'
 * (0.05 mm, for files); withPad (default false) adds the pad disc (a cutting template);
 * withTestStand (default false) adds the seal test stand's base and plunger.
 * A builder that fails throws an Error whose message starts with the part's
 * name (e.g. "housing: ...").
 */
import { QUALITY, type IndexedMesh, type Quality } from './mesh/index.ts';
import type { SizingSuccess } from '../sizing/result.ts';
import { PART_NAMES, valvePartNames, type PartName } from './assembly.ts';
import { buildLeverArmMesh } from './parts/lever-arm-solid.ts';
import { buildLeverFrameMesh } from './parts/lever-frame-solid.ts';
import { buildRimHangerMesh } from './parts/rim-hanger-solid.ts';
import { buildSlottedStemMesh } from './parts/slotted-stem-solid.ts';
import { buildFloatMesh } from './parts/float-solid.ts';
import { buildHousingMesh } from './parts/housing-solid.ts';
import { buildNozzleMesh } from './parts/nozzle-solid.ts';
import { buildPadMesh } from './parts/pad-solid.ts';
import { buildPinMesh } from './parts/pin-solid.ts';
import { buildStandBaseMesh } from './parts/stand-base-solid.ts';
import { buildStandPlungerMesh } from './parts/stand-plunger-solid.ts';
import { standSpecOf } from '../sizing/parts/stand-spec.ts';
import { partCapProblems } from './part-caps.ts';

export interface BuildOptions {
  quality: Quality;
  /** add the printed flexible seal pad; default false */
  withPad?: boolean;
  /** add the seal test stand's two parts (stand-base, stand-plunger); default false */
  withTestStand?: boolean;
}

export type StandPartName = 'stand-base' | 'stand-plunger';
export const STAND_PART_NAMES: readonly StandPartName[] = ['stand-base', 'stand-plunger'];
/** Every part buildPart makes: the valve's, the pad template and the test stand's. */
export type AnyPartName = PartName | 'pad' | StandPartName;

/** The meshes a build made: the valve's parts (valvePartNames: the direct valve's or the lever's), the pad and the stand on request. */
export type BuiltParts = Partial<Record<AnyPartName, IndexedMesh>>;

/** The parts a build makes, in order, for these options (the direct valve's without a sizing, for the old callers). */
export function partNamesFor(opts: Pick<BuildOptions, 'withPad' | 'withTestStand'>, sizing?: SizingSuccess): AnyPartName[] {
  const valve = sizing ? valvePartNames(sizing) : [...PART_NAMES];
  return [...valve, ...(opts.withPad ? (['pad'] as const) : []), ...(opts.withTestStand ? STAND_PART_NAMES : [])];
}

/** Error from a part builder, naming the part. */
export class PartBuildError extends Error {
  constructor(
    readonly part: AnyPartName,
    cause: unknown,
  ) {
    super(`${part}: ${cause instanceof Error ? cause.message : String(cause)}`, { cause });
    this.name = 'PartBuildError';
  }
}

function checkInput(sizing: SizingSuccess, opts: BuildOptions, names: readonly AnyPartName[]): void {
  if (!sizing || sizing.ok !== true || !sizing.parts) {
    throw new TypeError('buildParts.sizing is not a successful sizing result (sizeDesign(...).ok must be true)');
  }
  if (!opts || !Object.hasOwn(QUALITY, opts.quality)) {
    throw new RangeError(`buildParts.opts.quality = ${JSON.stringify(opts?.quality)}; allowed: "preview" or "export"`);
  }
  // Caps (DESIGN "Caps": 250 mm, 200,000 triangles) before any geometry is made, with a message naming the part.
  const over = partCapProblems(sizing, opts.quality, names);
  if (over.length) throw new PartBuildError(over[0].part, over.map((p, i) => (i === 0 ? p.message : `${p.part}: ${p.message}`)).join('; '));
}

async function buildUnchecked(name: AnyPartName, sizing: SizingSuccess, quality: Quality): Promise<IndexedMesh> {
  switch (name) {
    case 'stand-base':
      return buildStandBaseMesh(standSpecOf(sizing).base, quality);
    case 'stand-plunger':
      return buildStandPlungerMesh(standSpecOf(sizing).plunger, quality);
    case 'float':
      return buildFloatMesh(sizing.parts.float, quality);
    case 'nozzle':
      return buildNozzleMesh(sizing.parts.nozzle, quality);
    case 'pin':
      return buildPinMesh(sizing.parts.pin, quality);
  }
  if (sizing.architecture === 'direct') {
    const p = sizing.parts;
    if (name === 'housing') return buildHousingMesh(p.housing, quality);
    if (name === 'pad') return buildPadMesh(p.float, quality);
  } else {
    const p = sizing.parts;
    if (name === 'frame') return buildLeverFrameMesh(p.frame, quality);
    if (name === 'arm') return buildLeverArmMesh(p.arm, quality);
    if (name === 'pad') return buildPadMesh({ padDiameterMm: p.pad.diameterMm, padThicknessMm: p.pad.thicknessMm }, quality);
    if (name === 'hanger' && p.rim) return buildRimHangerMesh(p.rim, quality);
    if (name === 'stem' && p.rim) return buildSlottedStemMesh(p.rim, quality);
  }
  const allowed = [...valvePartNames(sizing), 'pad', ...STAND_PART_NAMES];
  throw new RangeError(`buildPart.name = ${JSON.stringify(name)}; allowed for this ${sizing.architecture} valve: ${allowed.map((n) => `"${n}"`).join(', ')}`);
}

/** One part's mesh in print pose. */
export async function buildPart(name: AnyPartName, sizing: SizingSuccess, opts: BuildOptions): Promise<IndexedMesh> {
  checkInput(sizing, opts, [name]);
  try {
    const mesh = await buildUnchecked(name, sizing, opts.quality);
    if (mesh.indices.length === 0) throw new Error('the builder made an empty mesh');
    return mesh;
  } catch (error) {
    throw error instanceof PartBuildError ? error : new PartBuildError(name, error);
  }
}

/** Every part's mesh in print pose (the pad only with withPad, the stand's parts only with withTestStand). */
export async function buildParts(sizing: SizingSuccess, opts: BuildOptions): Promise<BuiltParts> {
  const names = partNamesFor(opts ?? {}, sizing?.ok === true && sizing.parts ? sizing : undefined);
  checkInput(sizing, opts, names);
  const meshes = await Promise.all(names.map((name) => buildPart(name, sizing, opts)));
  const out = {} as BuiltParts;
  names.forEach((name, i) => {
    out[name] = meshes[i];
  });
  return out;
}
