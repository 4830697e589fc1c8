/** fast-check generators shared by the tests. */
import fc from 'fast-check';
import { Poly } from '../../src/core/poly.js';

/** Random polynomials in q and t with small degrees and coefficients that may be large. */
export const arbPoly: fc.Arbitrary<Poly> = fc
  .array(fc.tuple(fc.nat(6), fc.nat(4), fc.bigInt(-(10n ** 20n), 10n ** 20n)), { maxLength: 8 })
  .map((terms) => Poly.fromTerms(terms));

export const arbSmallPoly: fc.Arbitrary<Poly> = fc
  .array(fc.tuple(fc.nat(4), fc.nat(3), fc.bigInt(-5n, 5n)), { maxLength: 5 })
  .map((terms) => Poly.fromTerms(terms));
