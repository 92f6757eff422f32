/**
 * Young's modulus of a solid rubber from its Shore A hardness, Gent's relation:
 *
 *   E = 0.0981 (56 + 7.62336 S) / (0.137505 (254 - 2.54 S))  MPa
 *
 * @param shoreA Shore A hardness S (the relation is fitted for about 20 to 80 A;
 *   it is refused outside 0 < S < 100, where it has no meaning)
 * @returns Young's modulus, Pa
 *
 * Example: 50 A gives 2.456 MPa (30 A: 1.142 MPa; 70 A: 5.521 MPa).
 * Source: A. N. Gent (1958), Trans. Inst. Rubber Ind. 34, 46.
 */
export function gentModulusPa(shoreA: number): number {
  if (!(shoreA > 0 && shoreA < 100)) throw new RangeError(`Shore A hardness ${shoreA} is outside 0 to 100`);
  const mpa = (0.0981 * (56 + 7.62336 * shoreA)) / (0.137505 * (254 - 2.54 * shoreA));
  return mpa * 1e6;
}
