/**
 * The quotient route's input from an ideal request (ideals.ts names them): generators as
 * structured-clonable data, the functionals of the plan (young-plan) when S_n acts, and the
 * total degree by which the quotient is expected to vanish (a bound to stop at; the result
 * checks that the last layer is zero rather than trusting it).
 * - coinvariant: the polarized power sums Σ_i x_i^a y_i^b θ_i^c of ideals.ts, as power sums;
 * - generalized-coinvariant: x_i^k as a monomial cap on the letters, then e_n, …, e_{n−k+1};
 * - generators: the typed superpolynomials; S_n acts when each is symmetric or antisymmetric.
 */
import { InputError } from '../core/errors.js';
import { numerator, denominator } from '../core/rational.js';
import { rationalCoeffs } from './coefficients.js';
import { IDEAL_NAMES, type IdealSpec } from './ideals.js';
import { parseSuperpoly } from './parse-superpoly.js';
import type { QuotientFunctional, QuotientGenerator, QuotientTaskInput } from './quotient-spec.js';
import { rawShape, type RawPoly } from './raw-superpoly.js';
import { SuperAlgebra } from './super-algebra.js';
import { SuperSpace } from './superspace.js';
import { seedCharacter } from './seed-polynomial.js';
import { youngPlan } from './young-plan.js';

export interface QuotientRequest {
  readonly input: QuotientTaskInput;
  /** S_n acts on the ideal (Frobenius series are possible). */
  readonly stable: boolean;
  /** The functionals are the plan's (young-plan), not the one trivial-group task. */
  readonly symmetric: boolean;
  readonly maxDegree: number;
  /**
   * Per θ-degree c, the x+y degree up to which the quotient is expected to live (a guess that
   * saves work: the run certifies the layer above it, and retries with fullBounds when the
   * certificate fails). For the built-in ideals the top degree of
   * [k]_q!·Stir_q(n, k), k = n − c, that is C(k, 2) + (n − k)(k − 1).
   */
  readonly expectedBounds: readonly number[];
  /** Per θ-degree c: maxDegree − 1 − c, the bounds of the stated limit. */
  readonly fullBounds: readonly number[];
  readonly description: string;
}

export function quotientRequest(spec: IdealSpec, frobenius: boolean): QuotientRequest {
  const n = spec.n;
  if (!Number.isInteger(n) || n < 1 || n > 8) throw new InputError(`--n must be an integer from 1 to 8 (got ${n})`, 'n');
  if (!(IDEAL_NAMES as readonly string[]).includes(spec.ideal)) throw new InputError(`--ideal must be one of ${IDEAL_NAMES.join(', ')}`, 'ideal');
  const hasY = Boolean(spec.y);
  const hasTheta = Boolean(spec.theta);
  const varNames = ['x', hasY ? 'y' : '', hasTheta ? 'θ' : ''].filter(Boolean).join(', ');
  const gens: QuotientGenerator[] = [];
  let xCap: number | undefined;
  let stable = true;
  let maxDegree = (n * (n - 1)) / 2 + 1;
  let description: string;
  if (spec.ideal === 'coinvariant') {
    for (let a = 0; a <= n; a++)
      for (let b = 0; a + b <= n; b++) {
        if (b > 0 && !hasY) continue;
        for (let c = 0; c <= (hasTheta ? 1 : 0); c++) {
          if (a + b + c === 0 || (c === 1 && a + b >= n)) continue;
          gens.push({ degree: [a, b, c], character: 'sym', power: [a, b, c] });
        }
      }
    description = `positive-degree S_${n}-invariants in ${varNames}`;
  } else if (spec.ideal === 'generalized-coinvariant') {
    const k = spec.k;
    if (k === undefined || !Number.isInteger(k) || k < 1 || k > n) throw new InputError(`--k must be an integer from 1 to n = ${n} (got ${k ?? 'none'})`, 'k');
    if (hasY || hasTheta) throw new InputError('the generalized coinvariant ideal lives in the x variables alone (--vars x)', 'vars');
    xCap = k;
    for (let j = n; j >= n - k + 1; j--) gens.push(elementary(n, j));
    description = `generalized coinvariant ideal ⟨x_i^${k}, e_${n}, …, e_${n - k + 1}⟩`;
  } else {
    if (!spec.generators?.length) throw new InputError('--ideal generators needs --gens "<poly>; <poly>; …"', 'gens');
    const raws = spec.generators.map((g) => parseSuperpoly(g, n, 'gens'));
    const shapes = raws.map(rawShape);
    if (raws.some((r) => r.size === 0)) throw new InputError('--gens: a generator is zero', 'gens');
    if (shapes.some((s) => s.hasY) && !hasY) throw new InputError('--gens uses y variables: add y to --vars', 'gens');
    if (shapes.some((s) => s.hasTheta) && !hasTheta) throw new InputError('--gens uses θ variables: add theta to --vars', 'gens');
    if (hasY && !shapes.some((s) => s.hasY)) throw new InputError('--vars has y but no generator uses y: the quotient would be infinite-dimensional (drop y from --vars)', 'vars');
    if (!raws.some((r) => [...r.values()].some((t) => t.x.some((e) => e > 0)))) throw new InputError('no generator uses x: the quotient would be infinite-dimensional', 'gens');
    const radix = Math.max(2, ...shapes.map((s) => Math.max(s.maxX, s.maxY) + 1));
    const alg = new SuperAlgebra(new SuperSpace(n, hasY, hasTheta, radix), rationalCoeffs);
    for (const [i, r] of raws.entries()) {
      const degs = new Set([...r.values()].map((t) => [sum(t.x), sum(t.y), popcount(t.mask)].join('/')));
      if (degs.size > 1) throw new InputError(`--gens: generator ${i + 1} is not homogeneous in x-, y- and θ-degree (degrees ${[...degs].join(', ')})`, 'gens');
      const t0 = r.values().next().value!;
      const degree: [number, number, number] = [sum(t0.x), sum(t0.y), popcount(t0.mask)];
      if (degree[0] + degree[1] + degree[2] === 0) throw new InputError(`--gens: generator ${i + 1} is a nonzero constant, so the quotient is 0`, 'gens');
      const f = new Map([...r.values()].map((t) => [alg.space.encode(t.x, t.y, t.mask), t.coeff]));
      const ch = seedCharacter(alg, f);
      if (ch === 'none') stable = false;
      gens.push({ degree, character: ch === 'sign' ? 'alt' : 'sym', terms: termsOf(r) });
      maxDegree = Math.max(maxDegree, degree[0] + degree[1] + degree[2] + n);
    }
    description = `ideal generated by ${spec.generators.join('; ')}`;
  }
  const useSymmetry = stable && frobenius;
  // without S_n acting (or without Frobenius series) one task over the trivial group
  const functionals: QuotientFunctional[] = useSymmetry
    ? // the largest block last, where codes are most significant (measured: far shorter reductions)
      youngPlan(n).map((t) => ({ blocks: [...t.blocks].reverse(), alt: t.modes.map((m) => m === 'alt').reverse(), label: t.label }))
    : [{ blocks: new Array<number>(n).fill(1), alt: new Array<boolean>(n).fill(false), label: 'all' }];
  // over the trivial group every generator is invariant
  const ordered = gens.map((g) => (useSymmetry ? g : { ...g, character: 'sym' as const })).sort((a, b) => total(a) - total(b));
  const cMax = hasTheta ? n : 0;
  const fullBounds = Array.from({ length: cMax + 1 }, (_, c) => maxDegree - 1 - c);
  const top = (k: number): number => (k < 1 ? -1 : (k * (k - 1)) / 2 + (n - k) * (k - 1));
  const expectedBounds =
    spec.ideal === 'coinvariant' ? fullBounds.map((f, c) => Math.min(f, top(n - c))) : spec.ideal === 'generalized-coinvariant' ? [top(spec.k!)] : fullBounds;
  return {
    input: { n, hasY, hasTheta, generators: ordered, ...(xCap !== undefined ? { xCap } : {}), functionals },
    stable,
    symmetric: useSymmetry,
    maxDegree,
    expectedBounds,
    fullBounds,
    description,
  };
}

function total(g: QuotientGenerator): number {
  return g.degree[0] + g.degree[1] + g.degree[2];
}

function termsOf(r: RawPoly): QuotientGenerator['terms'] {
  return [...r.values()].map((t) => ({ x: [...t.x], y: [...t.y], mask: t.mask, num: String(numerator(t.coeff)), den: String(denominator(t.coeff)) }));
}

function elementary(n: number, j: number): QuotientGenerator {
  const terms: { x: number[]; y: number[]; mask: number; num: string; den: string }[] = [];
  for (let m = 0; m < 1 << n; m++) {
    if (popcount(m) !== j) continue;
    terms.push({ x: Array.from({ length: n }, (_, i) => (m >> i) & 1), y: new Array<number>(n).fill(0), mask: 0, num: '1', den: '1' });
  }
  return { degree: [j, 0, 0], character: 'sym', terms };
}

function sum(a: readonly number[]): number {
  return a.reduce((s, v) => s + v, 0);
}

function popcount(m: number): number {
  let c = 0;
  for (; m; m &= m - 1) c++;
  return c;
}

