/**
 * The part builders' contract as the workbench uses it (generator/solids):
 * every part in print orientation resting on z = 0, in mm, and a 4x4
 * column-major matrix per part taking its print pose to its mounted pose.
 * The seal pad is drawn in the preview but not exported (it is bought foam or
 * rubber by default).
 */
import type { IndexedMesh } from '../../generator/solids/mesh/types.ts';
import { PART_NAMES, PART_WORDS, valvePartNames, type PartName } from '../../generator/solids/part-names.ts';

/** The direct valve's parts (PART_NAMES) or a sized valve's own (valvePartNames: a lever's frame, arm, ...). */
export { PART_NAMES, PART_WORDS, valvePartNames };
export type { PartName };
export type ShownPart = PartName | 'pad';
/** The meshes of the parts the valve has (a direct valve's housing, a lever's frame and arm, ...). */
export type PartMeshes = Partial<Record<PartName, IndexedMesh>> & { pad?: IndexedMesh };
export type PartTransforms = Partial<Record<ShownPart, number[]>>;
export type FloatPose = 'rest' | 'seal';
export type { IndexedMesh };
