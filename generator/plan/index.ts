/** Whole-bench planning: one tank, one main, many containers at their own heights. Pure (no I/O). */
export { parsePlan, planPathFor, CONTAINER_FIELD_MAP, PLAN_FIELD_SPECS, DEFAULT_STARVING_SHARE, PLAN_ROOT_FIELD } from './schema.ts';
export { solveTipElevation, type TipElevationOptions } from './solve-tip-elevation.ts';
export { groupDesigns, designKey, SAME_DESIGN_STEP_MM, type DesignGroup } from './group-designs.ts';
export { planNetwork, starvingReason, type NetworkRow, type PlanNetworkFlows, type PlanNetworkOptions } from './plan-network.ts';
export { solvePlan, memoisedSizer, type PlanSolve } from './solve-plan.ts';
export { planJson, sizingFields, documentWithHeads } from './plan-json.ts';
export { planReport, planMarkdown, planHtml, type PlanReport, type PlanReportTable } from './report.ts';
export type * from './types.ts';
