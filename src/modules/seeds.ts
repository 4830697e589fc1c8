/**
 * Seeds of closure modules (Rhoades–Wilson, Vandermondes in superspace, Trans. Amer. Math.
 * Soc. (2020) — from memory): the classical Vandermonde, the superspace
 * Vandermonde δ_{n,k} with height s, the θ-staircase, any super-monomial (antisymmetrized
 * or symmetrized), and any typed superpolynomial (optionally (anti)symmetrized).
 */
import { InputError } from '../core/errors.js';
import { frac } from '../core/rational.js';
import { parseSuperpoly } from './parse-superpoly.js';
import { rawMonomial, type RawPoly } from './raw-superpoly.js';

export const SEED_NAMES = ['vandermonde', 'superspace-vandermonde', 'theta-staircase', 'monomial', 'poly'] as const;
export type SeedName = (typeof SEED_NAMES)[number];

export type Symmetrizer = 'antisymmetrize' | 'symmetrize' | 'none';

export interface SeedSpec {
  readonly seed: SeedName;
  readonly n: number;
  readonly k?: number;
  readonly height?: number;
  readonly xExponents?: readonly number[];
  readonly yExponents?: readonly number[];
  /** θ indices, 1-based. */
  readonly theta?: readonly number[];
  readonly poly?: string;
  /** Default: antisymmetrize for monomial seeds, none for typed polynomials. */
  readonly symmetrizer?: Symmetrizer;
}

export interface SeedTerms {
  readonly raw: RawPoly;
  readonly symmetrizer: Symmetrizer;
  readonly description: string;
}

function needK(spec: SeedSpec): number {
  const k = spec.k;
  if (k === undefined || !Number.isInteger(k) || k < 1 || k > spec.n) {
    throw new InputError(`seed ${spec.seed} needs --k from 1 to n = ${spec.n} (got ${k ?? 'none'})`, 'k');
  }
  return k;
}

function exps(list: readonly number[] | undefined, n: number, name: string): number[] {
  const out = new Array<number>(n).fill(0);
  if (!list) return out;
  if (list.length > n) throw new InputError(`--${name} lists ${list.length} exponents, at most n = ${n}`, name);
  list.forEach((e, i) => {
    if (!Number.isInteger(e) || e < 0 || e > 30) throw new InputError(`--${name} must be integers from 0 to 30 (got ${e})`, name);
    out[i] = e;
  });
  return out;
}

/** The seed before (anti)symmetrization, with the symmetrizer to apply. */
export function seedTerms(spec: SeedSpec): SeedTerms {
  const n = spec.n;
  const zeros = new Array<number>(n).fill(0);
  switch (spec.seed) {
    case 'vandermonde': {
      const x = Array.from({ length: n }, (_, i) => n - 1 - i);
      return { raw: rawMonomial(x, zeros, 0), symmetrizer: 'antisymmetrize', description: `Vandermonde Δ_${n}` };
    }
    case 'superspace-vandermonde': {
      const k = needK(spec);
      const s = spec.height ?? k - 1;
      if (!Number.isInteger(s) || s < 0 || s > 30) throw new InputError(`--height must be an integer from 0 to 30 (got ${s})`, 'height');
      const x = Array.from({ length: n }, (_, i) => (i < n - k ? s : n - 1 - i));
      const mask = (1 << (n - k)) - 1;
      return { raw: rawMonomial(x, zeros, mask), symmetrizer: 'antisymmetrize', description: `superspace Vandermonde δ_{${n},${k}} height ${s}` };
    }
    case 'theta-staircase': {
      const k = needK(spec);
      const x = Array.from({ length: n }, (_, i) => (i < n - k ? 0 : n - 1 - i));
      return { raw: rawMonomial(x, zeros, (1 << (n - k)) - 1), symmetrizer: 'antisymmetrize', description: `θ-staircase n=${n} k=${k}` };
    }
    case 'monomial': {
      const x = exps(spec.xExponents, n, 'x-exponents');
      const y = exps(spec.yExponents, n, 'y-exponents');
      let mask = 0;
      for (const t of spec.theta ?? []) {
        if (!Number.isInteger(t) || t < 1 || t > n) throw new InputError(`--theta indices must be from 1 to n = ${n} (got ${t})`, 'theta');
        if (mask & (1 << (t - 1))) throw new InputError(`--theta lists ${t} twice (θ_${t}² = 0)`, 'theta');
        mask |= 1 << (t - 1);
      }
      const symmetrizer = spec.symmetrizer ?? 'antisymmetrize';
      return { raw: rawMonomial(x, y, mask, frac(1)), symmetrizer, description: `${symmetrizer === 'none' ? '' : symmetrizer + 'd '}monomial` };
    }
    case 'poly': {
      if (!spec.poly) throw new InputError('seed poly needs --poly "<superpolynomial>"', 'poly');
      const raw = parseSuperpoly(spec.poly, n);
      if (raw.size === 0) throw new InputError('--poly is zero', 'poly');
      const symmetrizer = spec.symmetrizer ?? 'none';
      return { raw, symmetrizer, description: `${symmetrizer === 'none' ? '' : symmetrizer + 'd '}${spec.poly}` };
    }
  }
}
