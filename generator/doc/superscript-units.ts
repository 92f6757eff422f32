/**
 * Units with powers written for reading: "m2" -> "m²", "kg/m3" -> "kg/m³",
 * "mm2" -> "mm²", in any text ("0.18 m2 is too low" -> "0.18 m² is too low").
 * Only a length unit directly followed by 2 or 3 is touched, so "M3 screws",
 * "PA12" and "95A" stay as they are. The units parser reads both spellings
 * (unit-table.ts folds ² and ³ to digits), so shown text can be typed back.
 *
 * text: any text; returns the text with those units superscripted.
 */
const POWER_OF_LENGTH = /\b(mm|cm|m|in|ft)([23])\b/g;
const SUPERSCRIPT: Record<string, string> = { '2': '\u00b2', '3': '\u00b3' };

export function superscriptUnits(text: string): string {
  return text.replace(POWER_OF_LENGTH, (_, unit: string, power: string) => `${unit}${SUPERSCRIPT[power]}`);
}
