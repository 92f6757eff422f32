/**
 * The part builders' contract as the workbench uses it (generator/solids):
 * every part in print orientation resting on z = 0, in mm, and a 4x4
 * column-major matrix per part taking its print pose to its mounted pose.
 * The seal pad is drawn in the preview but not exported (it is bought foam or
 * rubber by default).
 */
import type { IndexedMesh } from '../../generator/solids/mesh/types.ts';
import type { PartName } from '../../generator/solids/assembly.ts';

export const PART_NAMES: readonly PartName[] = ['housing', 'float', 'nozzle', 'pin'];
export type { PartName };
export type ShownPart = PartName | 'pad';
export type PartMeshes = Record<PartName, IndexedMesh> & { pad?: IndexedMesh };
export type PartTransforms = Record<ShownPart, number[]>;
export type FloatPose = 'rest' | 'seal';
export type { IndexedMesh };
