/**
 * A name as people read it: Unicode NFC (one form for "é" typed as one
 * character or as e + accent), trimmed, every run of white space made one
 * space. Used for names that are shown and stored.
 * Source: Unicode Standard Annex #15 (normalization forms).
 * Example: cleanName("  Top\u00A0 tier ") === "Top tier".
 */
export function cleanName(name: string): string {
  return String(name).normalize('NFC').replace(/\s+/gu, ' ').trim();
}

/**
 * The key two names are compared by: the clean name, lower case. "Top tier",
 * " top  TIER" and "top tier" written with a decomposed accent are one container.
 * Example: nameKey("Café") === nameKey("cafe\u0301".toUpperCase()) (both "café").
 */
export function nameKey(name: string): string {
  return cleanName(name).toLowerCase().normalize('NFC');
}
