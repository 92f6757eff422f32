/**
 * Types of a bench plan: one raised tank, one supply main, many containers at
 * their own floor elevations (SI units inside, names carry the unit).
 */
import type { NormalizedDoc } from '../doc/schema.ts';
import type { FieldError } from '../doc/fields.ts';
import type { DesignInputs } from '../sizing/inputs.ts';
import type { SizingFailure, SizingSuccess, WayOut } from '../sizing/result.ts';

/** One container row of a plan, checked and in SI. */
export interface PlanContainerInput {
  /** position in the plan's `containers` list */
  index: number;
  name: string;
  /** identical containers hanging off the same tee (whole number >= 1) */
  count: number;
  /** container floor (housing base) elevation on the plan's datum, m */
  floorElevationM: number;
  /** distance along the main from the tank to this container's tee, m */
  mainLengthM: number;
  /**
   * The container's design inputs, from the plan's `design` merged with the
   * container's own fields. headMaxM / headMinM are placeholders here: the
   * plan works them out from the elevations (solveTipElevation).
   */
  inputs: DesignInputs;
  /** the merged design document written out in full (headMax/headMin placeholders) */
  document: NormalizedDoc;
  /** design-document path -> plan path, for turning the sizing's ways out into plan fields */
  origins: Record<string, string>;
}

/** A checked plan, in SI. */
export interface PlanInputs {
  name?: string;
  notes?: string;
  /** tank water surface elevation when full, m */
  tankFullSurfaceElevationM: number;
  /** tank water surface elevation at its lowest useful level, m (<= full) */
  tankLowSurfaceElevationM: number;
  /** supply main inner diameter, m */
  mainInnerDiameterM: number;
  /** a container starves when its shared flow is below this share of its flow alone (0..1) */
  starvingShare: number;
  /** one liquid for the whole tank */
  liquidDensityKgM3: number;
  liquidViscosityPaS: number;
  containers: PlanContainerInput[];
}

export type PlanParse = { ok: true; plan: PlanInputs } | { ok: false; errors: FieldError[] };

/** The head range one container's valve sees, solved together with its own tip height. */
export interface TipSolution {
  sizing: SizingSuccess | SizingFailure;
  /** nozzle tip elevation on the plan datum, m (floor + tip height) */
  tipElevationM: number;
  headMaxM: number;
  headMinM: number;
  /** fixed-point steps taken */
  iterations: number;
  /** true when the tip height settled to 0.1 mm */
  converged: boolean;
}

/** Flow of one valve, m3/s and L/h, with the fill time of its reservoir (min, null when unknown or never). */
export interface ValveFlow {
  flowLph: number;
  fillTimeMin: number | null;
}

export interface PlanContainerResult {
  index: number;
  name: string;
  count: number;
  /** id of the design (file set) this container uses; null when its sizing failed */
  design: string | null;
  floorElevationM: number;
  tipElevationM: number;
  headMaxM: number;
  headMinM: number;
  targetMm: number;
  shutOffAtHeadMaxMm: number | null;
  shutOffAtHeadMinMm: number | null;
  /** one valve of this row open alone, others shut (main included), full and low tank */
  aloneFull: ValveFlow;
  aloneLow: ValveFlow;
  /** every valve of the plan wide open at once, full and low tank */
  sharedFull: ValveFlow;
  sharedLow: ValveFlow;
  starving: boolean;
  /** why it starves, in a sentence; null when it does not */
  starvingReason: string | null;
  tipConverged: boolean;
  sizing: SizingSuccess | SizingFailure;
  /** sizing failure's ways out, with plan paths */
  waysOut: WayOut[];
}

export interface PlanDesign {
  /** "d1", "d2", ... in order of first use */
  id: string;
  /** indices of the containers using it */
  containerIndices: number[];
  /** valves to print: the sum of the containers' counts */
  quantity: number;
  /** the first container's sizing (the file set is built from its parts) */
  sizing: SizingSuccess;
}

export interface PlanTotals {
  /** printed parts (housing, float, nozzle, pin per valve) */
  parts: number;
  valves: number;
  filamentG: number;
  filamentM: number;
  ballastSteelG: number;
  /** tank outflow with every valve open, full tank, L/h */
  mainFlowLph: number;
  mainFlowLowLph: number;
}

export interface PlanResult {
  /** false when some container could not be sized */
  ok: boolean;
  plan: PlanInputs;
  containers: PlanContainerResult[];
  designs: PlanDesign[];
  totals: PlanTotals;
}
