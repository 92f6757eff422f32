/** Where the workbench gets its part builders. */
export { buildParts, assemblyTransforms } from '../../generator/solids/index.ts';
