// Minimal types for js-quantities 1.8 (the independent unit reference used by the tests; it ships none).
declare module 'js-quantities' {
  interface Qty {
    scalar: number;
    to(unit: string): Qty;
    mul(other: Qty | number): Qty;
    div(other: Qty | number): Qty;
    kind(): string;
  }
  function Qty(text: string): Qty;
  export default Qty;
}
