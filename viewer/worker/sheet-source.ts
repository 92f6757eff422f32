/** Where the build sheet comes from (one line to switch to generator/doc/build-sheet.ts). */
import type { SizingSuccess } from '../../generator/sizing/result.ts';
import { buildSheetHtml } from './stand-in-sheet.ts';

export function buildSheet(sizing: SizingSuccess, document: unknown): string {
  return buildSheetHtml(sizing, document as never);
}
