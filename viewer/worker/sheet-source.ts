/** The printable build sheet, from the shared generator/doc/build-sheet.ts (the same sheet the command line writes). */
import { buildSheetHtml } from '../../generator/doc/build-sheet.ts';
import { parseDesign } from '../../generator/doc/schema.ts';
import { htmlInUnits, type TextUnits } from '../../generator/doc/text-in-units.ts';
import type { SizingSuccess } from '../../generator/sizing/result.ts';
import { PART_NAMES } from './parts-contract.ts';

/** `units`: metric as the command line writes it, or imperial (quantities rewritten by htmlInUnits; print settings stay in mm). */
export function buildSheet(sizing: SizingSuccess, document: unknown, base: string, units: TextUnits = 'metric'): string {
  const parsed = parseDesign(document);
  if (!parsed.ok) throw new Error(`the design has problems: ${parsed.errors.map((e) => `${e.field}: ${e.message}`).join(' ')}`);
  const stl = Object.fromEntries(PART_NAMES.map((p) => [p, `${base}-${p}.stl`]));
  return htmlInUnits(buildSheetHtml(sizing, parsed.document, { stl, plate3mf: `${base}-plate.3mf` }), units);
}
