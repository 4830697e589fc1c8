/**
 * Generators of the built-in ideals and of typed ones:
 * - `coinvariant`: the positive-degree S_n-invariants in the chosen variables, generated (over
 *   Q, and over F_p for p > n) by the polarized power sums Σ_i x_i^a y_i^b θ_i^c, c ∈ {0,1},
 *   0 < a + b + c, a + b ≤ n (for x alone: p_1..p_n; with θ the Σ x_i^a θ_i, a < n, are needed)
 *   (common practice);
 * - `generalized-coinvariant`: x_1^k, …, x_n^k, e_n, e_{n−1}, …, e_{n−k+1} (x only; Haglund–
 *   Rhoades–Shimozono, Ordered set partitions, generalized coinvariant algebras, and the Delta
 *   Conjecture, Adv. Math. 329 (2018));
 * - `generators`: typed superpolynomials.
 */
import { InputError } from '../core/errors.js';
import { unknownNameMessage } from '../core/suggest.js';
import type { Coeffs } from './coefficients.js';
import { parseSuperpoly } from './parse-superpoly.js';
import { rawShape, type RawPoly } from './raw-superpoly.js';
import { SuperAlgebra, type SuperPoly } from './super-algebra.js';
import { SuperSpace } from './superspace.js';
import { seedCharacter } from './seed-polynomial.js';

export const IDEAL_NAMES = ['coinvariant', 'generalized-coinvariant', 'generators'] as const;
export type IdealName = (typeof IDEAL_NAMES)[number];

export interface IdealSpec {
  readonly ideal: IdealName;
  readonly n: number;
  readonly k?: number;
  readonly y?: boolean;
  readonly theta?: boolean;
  readonly generators?: readonly string[];
}

export interface IdealGenerators<T> {
  readonly alg: SuperAlgebra<T>;
  readonly generators: SuperPoly<T>[];
  readonly stable: boolean;
  readonly maxDegree: number;
  readonly description: string;
}

export function checkIdealName(name: string): IdealName {
  if (!(IDEAL_NAMES as readonly string[]).includes(name)) throw new InputError(`--ideal: ${unknownNameMessage('ideal', name, IDEAL_NAMES)}`, 'ideal');
  return name as IdealName;
}

export function idealGenerators<T>(spec: IdealSpec, coeffs: Coeffs<T>): IdealGenerators<T> {
  const n = spec.n;
  const withY = Boolean(spec.y);
  const withTheta = Boolean(spec.theta);
  let raws: RawPoly[] = [];
  let maxDegree = (n * (n - 1)) / 2 + 1;
  if (spec.ideal === 'generators') {
    if (!spec.generators?.length) throw new InputError('--ideal generators needs --gens "<poly>; <poly>; …"', 'gens');
    raws = spec.generators.map((g) => parseSuperpoly(g, n, 'gens'));
    if (raws.some((r) => r.size === 0)) throw new InputError('--gens: a generator is zero', 'gens');
    maxDegree = Math.max(maxDegree, ...raws.map((r) => rawShape(r).maxX + rawShape(r).maxY)) + n;
  }
  if (spec.ideal === 'generalized-coinvariant') {
    const k = spec.k;
    if (k === undefined || k < 1 || k > n) throw new InputError(`--k must be an integer from 1 to n = ${n} (got ${k ?? 'none'})`, 'k');
    if (withY || withTheta) throw new InputError('the generalized coinvariant ideal lives in the x variables alone (--vars x)', 'vars');
  }
  const radix = maxDegree + 1;
  const space = new SuperSpace(n, withY, withTheta, radix);
  const alg = new SuperAlgebra(space, coeffs);
  const zeros = new Array<number>(n).fill(0);
  const term = (x: number[], y: number[], mask: number): SuperPoly<T> => new Map([[space.encode(x, y, mask), coeffs.one]]);
  const gens: SuperPoly<T>[] = [];
  let description = '';
  if (spec.ideal === 'coinvariant') {
    for (let a = 0; a <= n; a++) {
      for (let b = 0; a + b <= n; b++) {
        if (b > 0 && !withY) continue;
        for (let c = 0; c <= (withTheta ? 1 : 0); c++) {
          if (a + b + c === 0 || (c === 1 && a + b >= n)) continue;
          let g: SuperPoly<T> = new Map();
          for (let i = 0; i < n; i++) {
            const x = zeros.slice();
            const y = zeros.slice();
            x[i] = a;
            y[i] = b;
            g = alg.add(g, term(x, y, c ? 1 << i : 0));
          }
          gens.push(g);
        }
      }
    }
    description = `positive-degree S_${n}-invariants in ${['x', withY ? 'y' : '', withTheta ? 'θ' : ''].filter(Boolean).join(', ')}`;
  } else if (spec.ideal === 'generalized-coinvariant') {
    const k = spec.k!;
    for (let i = 0; i < n; i++) {
      const x = zeros.slice();
      x[i] = k;
      gens.push(term(x, zeros, 0));
    }
    for (let j = n; j >= n - k + 1; j--) gens.push(elementary(alg, j));
    description = `generalized coinvariant ideal ⟨x_i^${k}, e_${n}, …, e_${n - k + 1}⟩`;
  } else {
    for (const r of raws) {
      let g: SuperPoly<T> = new Map();
      for (const t of r.values()) {
        if (t.y.some((e) => e > 0) && !withY) throw new InputError('--gens uses y variables: add y to --vars', 'gens');
        if (t.mask && !withTheta) throw new InputError('--gens uses θ variables: add theta to --vars', 'gens');
        alg.addTerm(g, space.encode(t.x, t.y, t.mask), coeffs.fromRatio(t.coeff.s * t.coeff.n, t.coeff.d));
      }
      const degs = new Set([...g.keys()].map((key) => space.degrees(key).join('/')));
      if (degs.size > 1) throw new InputError('--gens: every generator must be homogeneous in x-, y- and θ-degree', 'gens');
      gens.push(g);
    }
    description = `ideal generated by ${spec.generators!.join('; ')}`;
  }
  // Frobenius needs S_n to act on the ideal; for typed generators we require each to be (anti)symmetric.
  const stable = spec.ideal !== 'generators' || gens.every((g) => seedCharacter(alg, g) !== 'none');
  return { alg, generators: gens, stable, maxDegree, description };
}

function elementary<T>(alg: SuperAlgebra<T>, j: number): SuperPoly<T> {
  const n = alg.space.n;
  const out: SuperPoly<T> = new Map();
  for (let m = 0; m < 1 << n; m++) {
    let c = 0;
    const x = new Array<number>(n).fill(0);
    for (let i = 0; i < n; i++) if ((m >> i) & 1) {
      x[i] = 1;
      c++;
    }
    if (c === j) alg.addTerm(out, alg.space.encode(x, undefined, 0), alg.coeffs.one);
  }
  return out;
}
