/**
 * Shortest decimal text that reads back as the same float32 (what a mesh
 * stores): 6 to 9 significant digits, never more. Keeps 3MF files small
 * without moving any vertex. Exponent form ("1e-7") is valid in 3MF's
 * ST_Number.
 *
 * Example: 0.1 as float32 (0.100000001490116...) → "0.1".
 */
export function formatFloat32(value: number): string {
  const f = Math.fround(value);
  if (f === 0) return '0';
  for (let digits = 6; digits < 9; digits++) {
    const text = f.toPrecision(digits);
    if (Math.fround(Number(text)) === f) return String(Number(text));
  }
  return String(Number(f.toPrecision(9)));
}
