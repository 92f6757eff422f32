/**
 * The part builders' contract as the workbench uses it (generator/solids/index.ts
 * will provide it): every part in print orientation resting on z = 0, in mm,
 * and a 4x4 column-major matrix per part taking its print pose to its mounted pose.
 */
import type { IndexedMesh } from '../../generator/solids/mesh/types.ts';

export const PART_NAMES = ['housing', 'float', 'nozzle', 'pin'] as const;
export type PartName = (typeof PART_NAMES)[number];
export type PartMeshes = Record<PartName, IndexedMesh>;
export type PartTransforms = Record<PartName, number[]>;
export type FloatPose = 'rest' | 'seal';
export type { IndexedMesh };
