/**
 * Printable solids of a sized design: the part builders, the assembly
 * transforms, and the writer for the files a grower prints.
 */
export { buildPart, buildParts, PartBuildError, type BuildOptions, type BuiltParts } from './build-parts.ts';
export { assemblyTransforms, PART_NAMES, valvePartNames, type AssemblyState, type DirectPartName, type LeverPartName, type PartName } from './assembly.ts';
export type { IndexedMesh, Quality } from './mesh/index.ts';
