/**
 * The lever valve's sizing (issue 13): the float on a printed arm, the pad near
 * the pivot. Pure functions, SI forces in newtons, lengths in millimetres.
 */
export { leverPadForceN } from './lever-pad-force-n.ts';
export { leverFloatPushN, type LeverFloatPushOptions } from './lever-float-push-n.ts';
export { armWeightInLiquidN } from './arm-weight-in-liquid-n.ts';
export { pivotFrictionTorqueNmm } from './pivot-friction-torque-nmm.ts';
export { frictionLevelBandMm } from './friction-level-band-mm.ts';
export { padArcContact } from './pad-arc-contact.ts';
export { widestExtentMm, type PlanShape } from './widest-extent-mm.ts';
export { pointedHoleAreaMm2, pointedHoleApexMm } from './pointed-hole-area-mm2.ts';
export { leverArmSpec, type LeverArmOptions } from './lever-arm-spec.ts';
export { leverArmVolume } from './lever-arm-volume.ts';
export { leverFrameSpec, type LeverFrameOptions } from './lever-frame-spec.ts';
export { leverFrameVolumeMm3 } from './lever-frame-volume-mm3.ts';
export { leverFloat, type LeverFloat } from './lever-float.ts';
export { leverPad } from './lever-pad.ts';
export { floatLowestZMm } from './float-lowest-z-mm.ts';
export { armStopTurnRad } from './arm-stop-turn-rad.ts';
export { armLoad, layoutLever, type ArmLoad, type LeverLayoutOptions } from './layout-lever.ts';
export { leverBasisFromDesign } from './lever-basis.ts';
export { leverSummary } from './lever-summary.ts';
export { leverHoldDown, type LeverHoldDownOptions } from './lever-hold-down.ts';
export { searchLever, shortestPadArmMm, type LeverSearchOptions, type LeverSearchOutcome } from './search-lever.ts';
export * from './lever-constants.ts';
export type * from './lever-types.ts';
export { LEVER_CONSTRAINT_TEXT } from './lever-constraint-text.ts';
