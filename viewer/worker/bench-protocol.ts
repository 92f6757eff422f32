/** Messages between the bench page and the bench worker (whole-bench planning off the page). */
import type { PlanReport } from '../../generator/plan/report.ts';
import type { WayOut } from '../../generator/sizing/result.ts';
import type { ExportFile } from './protocol.ts';

export type BenchRequest =
  /** check and solve a plan document (as a plan file holds it) */
  | { type: 'plan'; id: number; plan: unknown }
  /** every file set, the plates and the plan report, in one zip */
  | { type: 'export'; id: number; plan: unknown };

/** One container group as the page shows it (SI and the report's units: m, mm, L/h, min). */
export interface BenchGroup {
  /** position in the plan's containers list */
  index: number;
  name: string;
  count: number;
  /** design id ("d1"...) shared by groups whose valves print the same; null when no size fits */
  design: string | null;
  floorElevationM: number;
  /** distance along the main from the tank to its tee, m */
  mainLengthM: number;
  tipElevationM: number;
  headMaxM: number;
  headMinM: number;
  targetMm: number;
  levelFullMm: number | null;
  levelLowMm: number | null;
  aloneFullLph: number;
  sharedFullLph: number;
  aloneLowLph: number;
  sharedLowLph: number;
  fillSharedMin: number | null;
  starving: boolean;
  starvingReason: string | null;
  /** why no valve size fits (sentences), empty when one does */
  noFit: string[];
  waysOut: WayOut[];
  /** warnings of its sizing, in words */
  warnings: string[];
  /** this group's valve as a design document, heads filled in (for the valve page) */
  valveDoc: Record<string, unknown>;
}

export interface BenchSolved {
  tankFullM: number;
  tankLowM: number;
  mainInnerDiameterMm: number;
  starvingShare: number;
  groups: BenchGroup[];
  designs: number;
  report: PlanReport;
}

export type BenchReply =
  | { type: 'planned'; id: number; ok: true; solved: BenchSolved; solveMs: number }
  | { type: 'planned'; id: number; ok: false; errors: { field: string; message: string }[]; solveMs: number }
  | { type: 'exported'; id: number; file: ExportFile }
  | { type: 'error'; id: number; message: string };
