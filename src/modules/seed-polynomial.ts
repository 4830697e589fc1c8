/**
 * Turn seed terms into an encoded superpolynomial over F_p or Q: choose the space (radix
 * above every exponent the chosen operators can produce), apply the (anti)symmetrizer, and
 * find how S_n acts on the result (sign, trivial, or neither).
 */
import { InputError } from '../core/errors.js';
import { identity, nextPermutation, sign as permSign } from '../core/permutations.js';
import type { Coeffs } from './coefficients.js';
import { rawShape } from './raw-superpoly.js';
import type { SeedTerms } from './seeds.js';
import { SuperAlgebra, type SuperPoly } from './super-algebra.js';
import { SuperSpace } from './superspace.js';

/** How S_n acts on the seed: by the sign, trivially, or neither (then no Frobenius series). */
export type SeedCharacter = 'sign' | 'trivial' | 'none';

export interface SeedPolynomial<T> {
  readonly alg: SuperAlgebra<T>;
  readonly f: SuperPoly<T>;
  readonly character: SeedCharacter;
}

export interface SpaceNeeds {
  /** Operators that create y's (polarizations) or act on y's. */
  readonly y: boolean;
  /** The largest j among the polarizations Σ y_i ∂x_i^j (0 when none). */
  readonly polar: boolean;
}

export function buildSeedPolynomial<T>(n: number, seed: SeedTerms, coeffs: Coeffs<T>, needs: SpaceNeeds): SeedPolynomial<T> {
  const shape = rawShape(seed.raw);
  const hasY = shape.hasY || needs.y || needs.polar;
  const radix = Math.max(shape.maxX, shape.maxY + (needs.polar ? shape.maxX : 0)) + 1;
  const space = new SuperSpace(n, hasY, shape.hasTheta, Math.max(2, radix));
  const alg = new SuperAlgebra(space, coeffs);
  let f: SuperPoly<T> = new Map();
  for (const t of seed.raw.values()) {
    alg.addTerm(f, space.encode(t.x, t.y, t.mask), coeffs.fromRatio(t.coeff.s * t.coeff.n, t.coeff.d));
  }
  if (seed.symmetrizer !== 'none') f = symmetrizeAll(alg, f, seed.symmetrizer === 'antisymmetrize');
  if (f.size === 0) throw new InputError(`the seed ${seed.description} ${seed.symmetrizer === 'none' ? 'is zero' : `vanishes after the ${seed.symmetrizer === 'antisymmetrize' ? 'antisymmetrizer' : 'symmetrizer'}`}`, 'seed');
  return { alg, f, character: seedCharacter(alg, f) };
}

/** Σ_σ (sgn σ) σ f over all of S_n. */
export function symmetrizeAll<T>(alg: SuperAlgebra<T>, f: SuperPoly<T>, anti: boolean): SuperPoly<T> {
  const n = alg.space.n;
  const out: SuperPoly<T> = new Map();
  const w = identity(n);
  const sigma = new Int32Array(n);
  const C = alg.coeffs;
  do {
    for (let i = 0; i < n; i++) sigma[i] = w[i]! - 1;
    const s = anti ? permSign(w) : 1;
    for (const [k, c] of f) {
      const [k2, s2] = alg.actMonomial(sigma, k);
      alg.addTerm(out, k2, s * s2 < 0 ? C.neg(c) : c);
    }
  } while (nextPermutation(w));
  return out;
}

/** Sign or trivial when every adjacent transposition acts by −1 or by +1 on f. */
export function seedCharacter<T>(alg: SuperAlgebra<T>, f: SuperPoly<T>): SeedCharacter {
  const n = alg.space.n;
  if (n === 1) return 'trivial';
  let anti = true;
  let triv = true;
  const neg = alg.scale(f, alg.coeffs.neg(alg.coeffs.one));
  for (let i = 0; i + 1 < n; i++) {
    const sigma = Array.from({ length: n }, (_, j) => (j === i ? i + 1 : j === i + 1 ? i : j));
    const g = alg.act(sigma, f);
    if (triv && !alg.equals(g, f)) triv = false;
    if (anti && !alg.equals(g, neg)) anti = false;
  }
  return triv ? 'trivial' : anti ? 'sign' : 'none';
}
