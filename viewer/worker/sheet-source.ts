/** The printable build sheet, from the shared generator/doc/build-sheet.ts (the same sheet the command line writes). */
import { buildSheetHtml } from '../../generator/doc/build-sheet.ts';
import { parseDesign } from '../../generator/doc/schema.ts';
import type { SizingSuccess } from '../../generator/sizing/result.ts';
import { PART_NAMES } from './parts-contract.ts';

export function buildSheet(sizing: SizingSuccess, document: unknown, base: string): string {
  const parsed = parseDesign(document);
  if (!parsed.ok) throw new Error(`the design has problems: ${parsed.errors.map((e) => `${e.field}: ${e.message}`).join(' ')}`);
  const stl = Object.fromEntries(PART_NAMES.map((p) => [p, `${base}-${p}.stl`]));
  return buildSheetHtml(sizing, parsed.document, { stl, plate3mf: `${base}-plate.3mf` });
}
