/**
 * Symmetric functions with coefficients in Q[q,t], kept in the Schur basis: a map from a
 * partition key ("3,1,1"; "" for the constant) to a non-zero PolyQ coefficient. Several
 * degrees may be mixed (products of different degrees, sums). Immutable.
 */
import { InputError } from '../core/errors.js';
import { checkPartition, conjugate, fLambda, partitionKey, partitionList, size, type Partition } from '../core/partitions.js';
import { Poly } from '../core/poly.js';
import { PolyQ } from '../core/polyq.js';
import { lrProduct } from './littlewood-richardson.js';
import { basisToSchur, schurToBasis, type Basis } from './transitions.js';

export function keyToPartition(key: string): Partition {
  return key === '' ? [] : key.split(',').map(Number);
}

function addInto(m: Map<string, PolyQ>, key: string, c: PolyQ): void {
  if (c.isZero()) return;
  const prev = m.get(key);
  const s = prev ? prev.add(c) : c;
  if (s.isZero()) m.delete(key);
  else m.set(key, s);
}

/**
 * Zero parts are dropped (e_0 = h_0 = 1 as factors); the multiplicative bases e, h,
 * p accept their parts in any order, s and m need a partition.
 */
function normalizeIndex(basis: Basis, nu: readonly number[]): Partition {
  for (const x of nu) {
    if (!Number.isInteger(x) || x < 0) throw new InputError(`${basis}: parts must be non-negative integers (got ${nu.join(',')})`, 'partition');
  }
  if (basis === 'p' && nu.includes(0)) throw new InputError('p: parts must be positive (p_0 is not defined)', 'partition');
  const parts = nu.filter((x) => x > 0);
  if (basis === 'e' || basis === 'h' || basis === 'p') return parts.sort((a, b) => b - a);
  return checkPartition(parts, `${basis} index`);
}

export class SymFun {
  private constructor(private readonly schur: ReadonlyMap<string, PolyQ>) {}

  static readonly zero = new SymFun(new Map());
  static readonly one = new SymFun(new Map([['', PolyQ.one]]));

  /** A constant (degree 0) with a polynomial coefficient. */
  static scalar(c: PolyQ | Poly): SymFun {
    const pq = c instanceof Poly ? PolyQ.of(c) : c;
    return pq.isZero() ? SymFun.zero : new SymFun(new Map([['', pq]]));
  }

  /** Σ c_ν b_ν from coefficients in the basis b, keyed by partition. */
  static fromBasis(basis: Basis, coeffs: Iterable<readonly [Partition, PolyQ | Poly]>): SymFun {
    const m = new Map<string, PolyQ>();
    for (const [nu0, c0] of coeffs) {
      const nu = normalizeIndex(basis, nu0);
      const c = c0 instanceof Poly ? PolyQ.of(c0) : c0;
      if (c.isZero()) continue;
      const n = size(nu);
      const ps = partitionList(n);
      if (basis === 's') {
        addInto(m, partitionKey(nu), c);
        continue;
      }
      const idx = ps.findIndex((p) => partitionKey(p) === partitionKey(nu));
      if (idx < 0) throw new InputError(`not a partition: ${nu.join(',')}`, 'partition');
      for (const [j, v] of basisToSchur(basis, n)[idx]!) addInto(m, partitionKey(ps[j]!), c.scale(v));
    }
    return new SymFun(m);
  }

  /** The basis element b_λ. */
  static basisElement(basis: Basis, lambda: Partition): SymFun {
    return SymFun.fromBasis(basis, [[lambda, PolyQ.one]]);
  }

  /** Wrap a Schur-coefficient map (zeros are dropped). */
  static fromSchurMap(m: ReadonlyMap<string, PolyQ>): SymFun {
    const out = new Map<string, PolyQ>();
    for (const [k, v] of m) if (!v.isZero()) out.set(k, v);
    return new SymFun(out);
  }

  isZero(): boolean {
    return this.schur.size === 0;
  }
  /** Schur coefficients (keys in no particular order). */
  schurTerms(): ReadonlyMap<string, PolyQ> {
    return this.schur;
  }
  coeff(lambda: Partition): PolyQ {
    return this.schur.get(partitionKey(lambda)) ?? PolyQ.zero;
  }
  /** The degrees present, ascending. */
  degrees(): number[] {
    const d = new Set<number>();
    for (const k of this.schur.keys()) d.add(size(keyToPartition(k)));
    return [...d].sort((a, b) => a - b);
  }
  /** The degree of a homogeneous function (0 for zero); InputError when degrees are mixed. */
  degree(): number {
    const d = this.degrees();
    if (d.length > 1) throw new InputError(`expected a homogeneous symmetric function (got degrees ${d.join(', ')})`);
    return d[0] ?? 0;
  }
  /** The part of degree n. */
  homogeneousPart(n: number): SymFun {
    const m = new Map<string, PolyQ>();
    for (const [k, v] of this.schur) if (size(keyToPartition(k)) === n) m.set(k, v);
    return new SymFun(m);
  }

  /**
   * Coefficients in the basis b, partitions of each degree in partitionList order
   * (degrees ascending), zeros left out.
   */
  toBasis(basis: Basis): [Partition, PolyQ][] {
    const out: [Partition, PolyQ][] = [];
    for (const n of this.degrees()) {
      const ps = partitionList(n);
      if (basis === 's') {
        for (const l of ps) {
          const c = this.schur.get(partitionKey(l));
          if (c) out.push([l, c]);
        }
        continue;
      }
      const acc: PolyQ[] = ps.map(() => PolyQ.zero);
      const mat = schurToBasis(basis, n);
      ps.forEach((l, i) => {
        const c = this.schur.get(partitionKey(l));
        if (!c) return;
        for (const [j, v] of mat[i]!) acc[j] = acc[j]!.add(c.scale(v));
      });
      ps.forEach((l, j) => {
        if (!acc[j]!.isZero()) out.push([l, acc[j]!]);
      });
    }
    return out;
  }

  add(o: SymFun): SymFun {
    if (o.isZero()) return this;
    const m = new Map(this.schur);
    for (const [k, v] of o.schur) addInto(m, k, v);
    return new SymFun(m);
  }
  sub(o: SymFun): SymFun {
    return this.add(o.neg());
  }
  neg(): SymFun {
    return this.mapCoefficients((c) => c.neg());
  }
  scale(c: PolyQ | Poly): SymFun {
    const pq = c instanceof Poly ? PolyQ.of(c) : c;
    return this.mapCoefficients((v) => v.mul(pq));
  }
  /** Apply f to every coefficient (results that vanish are dropped). */
  mapCoefficients(f: (c: PolyQ) => PolyQ): SymFun {
    const m = new Map<string, PolyQ>();
    for (const [k, v] of this.schur) {
      const w = f(v);
      if (!w.isZero()) m.set(k, w);
    }
    return new SymFun(m);
  }
  /** Product, by the Littlewood–Richardson rule on the Schur terms. */
  mul(o: SymFun): SymFun {
    if (this.isZero() || o.isZero()) return SymFun.zero;
    const m = new Map<string, PolyQ>();
    for (const [k1, c1] of this.schur)
      for (const [k2, c2] of o.schur) {
        const c = c1.mul(c2);
        for (const [nu, mult] of lrProduct(keyToPartition(k1), keyToPartition(k2))) addInto(m, nu, c.scale(mult));
      }
    return new SymFun(m);
  }
  pow(e: number): SymFun {
    let r: SymFun = SymFun.one;
    for (let i = 0; i < e; i++) r = r.mul(this);
    return r;
  }
  /** ω: s_λ ↦ s_λ'. */
  omega(): SymFun {
    const m = new Map<string, PolyQ>();
    for (const [k, v] of this.schur) m.set(partitionKey(conjugate(keyToPartition(k))), v);
    return new SymFun(m);
  }
  /** Exchange q and t in every coefficient. */
  swapQT(): SymFun {
    return this.mapCoefficients((c) => PolyQ.of(c.num.swapQT(), c.den));
  }
  /**
   * rev_q: q^D F(1/q, t) with D the largest q-degree over all coefficients, so the whole
   * function is reversed as one (as the graded Frobenius series of a module is).
   */
  reverseQ(): SymFun {
    const d = Math.max(-1, ...[...this.schur.values()].map((c) => c.num.degQ()));
    return this.mapCoefficients((c) => PolyQ.of(Poly.fromTerms(c.num.sortedTerms().map(([i, j, v]) => [d - i, j, v] as const)), c.den));
  }
  /** Set q and/or t to integers in every coefficient. */
  specialize(values: { q?: bigint | number; t?: bigint | number }): SymFun {
    return this.mapCoefficients((c) => PolyQ.of(c.num.specialize(values), c.den));
  }
  /** The Hall inner product (⟨s_λ, s_μ⟩ = δ). */
  hallInner(o: SymFun): PolyQ {
    let s = PolyQ.zero;
    for (const [k, v] of this.schur) {
      const w = o.schur.get(k);
      if (w) s = s.add(v.mul(w));
    }
    return s;
  }
  /** ⟨F, p_1^n⟩ summed over the degrees present (the Hilbert series of a Frobenius series). */
  hilbert(): PolyQ {
    let s = PolyQ.zero;
    for (const [k, v] of this.schur) s = s.add(v.scale(fLambda(keyToPartition(k))));
    return s;
  }
  equals(o: SymFun): boolean {
    if (this.schur.size !== o.schur.size) return false;
    for (const [k, v] of this.schur) {
      const w = o.schur.get(k);
      if (!w || !w.equals(v)) return false;
    }
    return true;
  }
  /** True when every coefficient has integer coefficients. */
  isIntegral(): boolean {
    for (const v of this.schur.values()) if (!v.isIntegral()) return false;
    return true;
  }
}
