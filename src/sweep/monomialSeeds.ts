/**
 * Monomial seeds x^a θ_S up to S_n and sign. The (anti)symmetrization of a monomial depends,
 * up to sign, only on the multiset of its columns (a_i, i ∈ S): permuting the variables
 * permutes the columns. Antisymmetrized, two equal columns without θ make it vanish (the
 * transposition fixes the monomial and has sign −1), while equal θ-columns do not (θ_iθ_j
 * changes sign too); symmetrized, the other way round (common practice). So the distinct
 * seeds are enumerated directly as column multisets, and the raw seeds are counted, not listed.
 */
import { LimitError } from '../core/errors.js';

export interface MonomialClass {
  /** Exponents of the θ-columns (placed first), weakly decreasing. */
  readonly thetaExps: readonly number[];
  /** Exponents of the columns without θ, weakly decreasing. */
  readonly plainExps: readonly number[];
  /** How many raw monomials (exponent vector and θ set) give this seed: n!/Π (multiplicities)!. */
  readonly arrangements: bigint;
}

export interface MonomialCensus {
  readonly classes: readonly MonomialClass[];
  /** Exponent vectors × θ sets with the degree and θ-count asked for. */
  readonly raw: bigint;
  /** Raw monomials whose (anti)symmetrization vanishes. */
  readonly vanishing: bigint;
}

function binomial(n: number, k: number): bigint {
  if (k < 0 || k > n) return 0n;
  let r = 1n;
  for (let i = 0; i < k; i++) r = (r * BigInt(n - i)) / BigInt(i + 1);
  return r;
}

function factorial(n: number): bigint {
  let r = 1n;
  for (let i = 2; i <= n; i++) r *= BigInt(i);
  return r;
}

/** Weakly (or strictly) decreasing sequences of length len, entries ≤ max, with sum ≤ budget. */
function* sequences(len: number, max: number, budget: number, strict: boolean): Generator<number[]> {
  if (len === 0) {
    yield [];
    return;
  }
  for (let first = Math.min(max, budget); first >= 0; first--) {
    if (strict && first < len - 1) break; // room for len−1 smaller distinct entries
    for (const rest of sequences(len - 1, strict ? first - 1 : first, budget - first, strict)) yield [first, ...rest];
  }
}

function arrangementsOf(n: number, thetaExps: readonly number[], plainExps: readonly number[]): bigint {
  let denom = 1n;
  for (const list of [thetaExps, plainExps]) {
    const mult = new Map<number, number>();
    for (const e of list) mult.set(e, (mult.get(e) ?? 0) + 1);
    for (const m of mult.values()) denom *= factorial(m);
  }
  return factorial(n) / denom;
}

/**
 * The distinct non-vanishing seeds at n with total x-degree in [minDegree, maxDegree] and a
 * number of θ's in `thetas`; refuses (LimitError naming --max-modules) past `limit` classes.
 */
export function monomialCensus(n: number, minDegree: number, maxDegree: number, thetas: readonly number[], symmetrize: boolean, limit: number): MonomialCensus {
  const classes: MonomialClass[] = [];
  let raw = 0n;
  let kept = 0n;
  for (const t of thetas) {
    if (t > n) continue;
    // raw: C(n, t) θ sets times the exponent vectors of degree d, C(d + n − 1, n − 1)
    for (let d = minDegree; d <= maxDegree; d++) raw += binomial(n, t) * binomial(d + n - 1, n - 1);
    // antisymmetrized: plain columns distinct; symmetrized: θ-columns distinct
    for (const thetaExps of sequences(t, maxDegree, maxDegree, symmetrize)) {
      const used = thetaExps.reduce((a, b) => a + b, 0);
      for (const plainExps of sequences(n - t, maxDegree, maxDegree - used, !symmetrize)) {
        const degree = used + plainExps.reduce((a, b) => a + b, 0);
        if (degree < minDegree) continue;
        const arrangements = arrangementsOf(n, thetaExps, plainExps);
        classes.push({ thetaExps, plainExps, arrangements });
        kept += arrangements;
        if (classes.length > limit) {
          throw new LimitError(`the monomial seeds at n = ${n} give more than ${limit} distinct modules; narrow the degrees or θ counts, or raise --max-modules`, 'max-modules');
        }
      }
    }
  }
  return { classes, raw, vanishing: raw - kept };
}

/** The exponent vector and θ indices (1-based) of a class's representative: θ-columns first. */
export function classMonomial(c: MonomialClass): { x: number[]; theta: number[] } {
  return { x: [...c.thetaExps, ...c.plainExps], theta: c.thetaExps.map((_, i) => i + 1) };
}

/** "ε(x1^2 θ1 · x2 x3^0)"-style text: the representative monomial, ε or sym around it. */
export function classText(c: MonomialClass, symmetrize: boolean): string {
  const { x, theta } = classMonomial(c);
  const factors: string[] = [];
  x.forEach((e, i) => {
    if (e > 0) factors.push(e === 1 ? `x${i + 1}` : `x${i + 1}^${e}`);
    if (theta.includes(i + 1)) factors.push(`θ${i + 1}`);
  });
  return `${symmetrize ? 'sym' : 'ε'}(${factors.join(' ') || '1'})`;
}
