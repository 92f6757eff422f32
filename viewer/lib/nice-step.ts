/** A round axis step (1, 2 or 5 times a power of ten) giving about `ticks` ticks over `span`. Example: span 37, 5 ticks -> 5. */
export function niceStep(span: number, ticks = 5): number {
  const raw = span / ticks;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const n = raw / mag;
  return (n < 1.5 ? 1 : n < 3 ? 2 : n < 7 ? 5 : 10) * mag;
}
