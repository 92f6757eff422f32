/** Where the workbench gets its part builders (one line to switch). */
export { buildParts, assemblyTransforms } from './stand-in-solids.ts';
