/**
 * Sums Σ_i N_i / D_i of polynomials over denominators that are products of binomials
 * q^a − t^b, brought to one common denominator and divided exactly at the end.
 * Each binomial is split into the factors Ψ_d(q^{a/g}, t^{b/g}) for d | g = gcd(a, b),
 * Ψ_d(x, y) = y^{φ(d)} Φ_d(x/y) (so x^g − y^g = Π_{d|g} Ψ_d), and the common denominator
 * takes each factor to its largest multiplicity: a much smaller multiple than the product.
 */
import { ArithmeticError } from '../core/errors.js';
import { Poly } from '../core/poly.js';
import { divideDense, fromDense, sumOfProducts, toDense } from './dense-poly.js';

const cyclotomicCache = new Map<number, Poly>();

/** Φ_d(q) (univariate). */
export function cyclotomic(d: number): Poly {
  let hit = cyclotomicCache.get(d);
  if (hit) return hit;
  let p = Poly.monomial(1n, d).sub(Poly.one);
  for (let e = 1; e < d; e++) if (d % e === 0) p = p.divExact(cyclotomic(e));
  hit = p;
  cyclotomicCache.set(d, hit);
  return hit;
}

function gcdNum(a: number, b: number): number {
  while (b) [a, b] = [b, a % b];
  return a;
}

/** Key "α,β,d" of the factor Ψ_d(q^α, t^β). */
function splitBinomial(a: number, b: number): string[] {
  const g = gcdNum(a, b);
  const out: string[] = [];
  for (let d = 1; d <= g; d++) if (g % d === 0) out.push(`${a / g},${b / g},${d}`);
  return out;
}

const factorCache = new Map<string, Poly>();

function factorPoly(key: string): Poly {
  let hit = factorCache.get(key);
  if (hit) return hit;
  const [al, be, d] = key.split(',').map(Number) as [number, number, number];
  const phi = cyclotomic(d);
  const deg = phi.degQ();
  hit = Poly.fromTerms([...phi.terms()].map(([i, , c]) => [al * i, be * (deg - i), c] as const));
  factorCache.set(key, hit);
  return hit;
}

/** Called after each step of a long sum with (steps done, steps in all). */
export type StepReporter = (done: number, total: number) => void;

export interface BinomialDenominator {
  /** pairs [a, b] meaning q^a − t^b */
  readonly factors: readonly (readonly [number, number])[];
  /** overall sign ±1 */
  readonly sign: bigint;
}

function multiset(d: BinomialDenominator): Map<string, number> {
  const m = new Map<string, number>();
  for (const [a, b] of d.factors) for (const k of splitBinomial(a, b)) m.set(k, (m.get(k) ?? 0) + 1);
  return m;
}

/**
 * Σ_i Σ_j numerators[i] · vectors[i][j] / den_i for each position j, as polynomials.
 * Throws ArithmeticError when a component is not a polynomial.
 */
export function sumOverCommonDenominator(
  terms: readonly { readonly numerator: Poly; readonly vector: readonly Poly[]; readonly den: BinomialDenominator }[],
  length: number,
  onStep?: StepReporter,
): Poly[] {
  const steps = terms.length + length;
  let done = 0;
  const sets = terms.map((t) => multiset(t.den));
  // cancel factors that divide the numerator already (keeps the common denominator small)
  const nums = terms.map((t, i) => {
    let num = t.numerator;
    if (num.isZero()) return num;
    const set = sets[i]!;
    for (const [k, m] of set) {
      let left = m;
      let dense = toDense(num);
      while (left > 0) {
        const qd = divideDense(dense, factorPoly(k));
        if (!qd) break;
        dense = qd;
        left--;
      }
      num = fromDense(dense);
      if (left === 0) set.delete(k);
      else set.set(k, left);
    }
    return num;
  });
  const common = new Map<string, number>();
  for (const s of sets) for (const [k, m] of s) common.set(k, Math.max(common.get(k) ?? 0, m));
  // cofactor_i = numerator_i · (common denominator / den_i)
  const cofs = terms.map((t, i) => {
    if (nums[i]!.isZero()) return Poly.zero;
    let cof = Poly.constant(t.den.sign).mul(nums[i]!);
    for (const [k, m] of common) {
      const extra = m - (sets[i]!.get(k) ?? 0);
      if (extra > 0) cof = cof.mul(factorPoly(k).pow(extra));
    }
    onStep?.(++done, steps);
    return cof;
  });
  done = terms.length;
  // divide by the smallest factors first (cheaper quotients later)
  const order = [...common.entries()].sort((x, y) => factorPoly(x[0]).termCount - factorPoly(y[0]).termCount);
  return Array.from({ length }, (_, j) => {
    let r = sumOfProducts(terms.map((t, i) => [cofs[i]!, t.vector[j] ?? Poly.zero] as const));
    for (const [k, m] of order) {
      const f = factorPoly(k);
      for (let i = 0; i < m; i++) {
        const qd = divideDense(r, f);
        if (!qd) throw new ArithmeticError(`the result is not a polynomial (not divisible by ${f.toString()})`);
        r = qd;
      }
    }
    onStep?.(++done, steps);
    return fromDense(r);
  });
}
