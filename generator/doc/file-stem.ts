/**
 * A file-name stem from a design's name, the same on every system: lower-case
 * ASCII letters and digits joined by single hyphens.
 *
 * Accented letters lose their accents (Unicode canonical decomposition, NFKD,
 * then the combining marks U+0300 to U+036F dropped: "é" -> "e"); the Latin
 * letters NFKD keeps whole are spelled out as they usually are in ASCII
 * ("ß" -> "ss", "æ" -> "ae", "ø" -> "o"; common practice, as in passports'
 * machine-readable lines). Anything else (spaces, apostrophes, symbols, other
 * scripts) becomes a hyphen.
 *
 * Example: fileStem("Tomates d'été") = "tomates-d-ete"; fileStem("***") = "floatwright-valve".
 *
 * Options: fallback (default "floatwright-valve"), the stem of a name with no
 * letter or digit left; maxLength (default 48), the longest stem, cut at a
 * hyphen-free end.
 */
export interface FileStemOptions {
  fallback?: string;
  maxLength?: number;
}

const SPELLED_OUT: Record<string, string> = {
  ß: 'ss', ẞ: 'ss', æ: 'ae', œ: 'oe', ø: 'o', ł: 'l', đ: 'd', ð: 'd', þ: 'th', ı: 'i', ħ: 'h', ŧ: 't', ŋ: 'ng',
};

export function fileStem(name: unknown, options: FileStemOptions = {}): string {
  const { fallback = 'floatwright-valve', maxLength = 48 } = options;
  if (typeof name !== 'string') return fallback;
  const stem = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[ßẞæœøłđðþıħŧŋ]/g, (c) => SPELLED_OUT[c] ?? '-')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+/, '')
    .slice(0, maxLength)
    .replace(/-+$/, '');
  return stem || fallback;
}
