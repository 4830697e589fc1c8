/**
 * Equal seeds give equal modules: the seed polynomial (after its symmetrizer) over Q, scaled
 * so that its first term has coefficient 1, written as text. A seed S_n does not act on is
 * also moved to the least text of its S_n-orbit: the closure of σf is σ of the closure of f,
 * with the same Hilbert series (the operator families are permuted by S_n). Exact rationals,
 * so two seeds are merged only when they are equal.
 */
import { InputError } from '../core/errors.js';
import { identity, nextPermutation } from '../core/permutations.js';
import type { Fraction } from '../core/rational.js';
import { rationalCoeffs } from '../modules/coefficients.js';
import { buildSeedPolynomial } from '../modules/seed-polynomial.js';
import { seedTerms, type SeedSpec } from '../modules/seeds.js';
import type { SuperAlgebra, SuperPoly } from '../modules/super-algebra.js';

export type Fingerprint = { readonly kind: 'seed'; readonly text: string } | { readonly kind: 'zero' } | { readonly kind: 'undefined'; readonly why: string };

/** Up to this n the orbit of a seed without symmetry is walked (n! images). */
const ORBIT_MAX_N = 6;

function normalText(alg: SuperAlgebra<Fraction>, f: SuperPoly<Fraction>): string {
  const n = alg.space.n;
  const x = new Array<number>(n).fill(0);
  const y = new Array<number>(n).fill(0);
  const terms: [string, Fraction][] = [];
  for (const [key, c] of f) {
    const mask = alg.space.decode(key, x, y);
    terms.push([`${x.join('.')}|${y.join('.')}|${mask}`, c]);
  }
  terms.sort((a, b) => (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0));
  const lead = terms[0]![1];
  return terms.map(([m, c]) => `${c.div(lead).toFraction()}:${m}`).join(' ');
}

export function seedFingerprint(spec: SeedSpec): Fingerprint {
  let built;
  try {
    built = buildSeedPolynomial(spec.n, seedTerms(spec), rationalCoeffs, { y: false, polar: false });
  } catch (e) {
    if (!(e instanceof InputError)) throw e;
    // the seed's own checks: zero after the symmetrizer, or not defined at this size
    if (e.argument === 'seed' || /is zero/.test(e.message)) return { kind: 'zero' };
    return { kind: 'undefined', why: e.message };
  }
  const { alg, f, character } = built;
  if (character !== 'none' || spec.n > ORBIT_MAX_N) return { kind: 'seed', text: normalText(alg, f) };
  let best: string | undefined;
  const w = identity(spec.n);
  do {
    const text = normalText(alg, alg.act(w.map((v) => v - 1), f));
    if (best === undefined || text < best) best = text;
  } while (nextPermutation(w));
  return { kind: 'seed', text: best! };
}
