/** The rim mount (issue 13): a hanger over the container wall and a slotted stem for +-10 mm of level after printing. */
export { rimInputProblems, RIM_HEIGHT_RANGE_MM, WALL_THICKNESS_RANGE_MM, type RimInputProblem } from './rim-input-problems.ts';
export { rimMountSpec, type RimMountOptions, type RimMountSpec } from './rim-mount-spec.ts';
export { rimMountVolumesMm3 } from './rim-mount-volumes.ts';
export * from './rim-constants.ts';
