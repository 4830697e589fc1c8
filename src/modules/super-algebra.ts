/**
 * Superpolynomials as Maps from packed super-monomials (SuperSpace) to coefficients, with
 * the operations of superspace (Rhoades–Wilson, Vandermondes in superspace, Trans. Amer.
 * Math. Soc. (2020)): products with the θ sign rule, ∂/∂x_i, ∂/∂y_i, ∂/∂θ_i,
 * polarizations Σ_i y_i (∂/∂x_i)^j and the diagonal S_n action with its re-sorting sign.
 */
import type { Coeffs } from './coefficients.js';
import { permuteMask, popcount, thetaProductSign, type SuperSpace } from './superspace.js';

export type SuperPoly<T> = Map<number, T>;

export class SuperAlgebra<T> {
  private readonly xa: number[];
  private readonly ya: number[];
  private readonly xb: number[];
  private readonly yb: number[];
  constructor(
    readonly space: SuperSpace,
    readonly coeffs: Coeffs<T>,
  ) {
    const n = space.n;
    this.xa = new Array<number>(n).fill(0);
    this.ya = new Array<number>(n).fill(0);
    this.xb = new Array<number>(n).fill(0);
    this.yb = new Array<number>(n).fill(0);
  }

  addTerm(f: SuperPoly<T>, key: number, c: T): void {
    if (this.coeffs.isZero(c)) return;
    const old = f.get(key);
    if (old === undefined) f.set(key, c);
    else {
      const s = this.coeffs.add(old, c);
      if (this.coeffs.isZero(s)) f.delete(key);
      else f.set(key, s);
    }
  }

  add(f: SuperPoly<T>, g: SuperPoly<T>): SuperPoly<T> {
    const out = new Map(f);
    for (const [k, c] of g) this.addTerm(out, k, c);
    return out;
  }

  scale(f: SuperPoly<T>, c: T): SuperPoly<T> {
    const out: SuperPoly<T> = new Map();
    if (this.coeffs.isZero(c)) return out;
    for (const [k, v] of f) this.addTerm(out, k, this.coeffs.mul(v, c));
    return out;
  }

  /** Product of two monomials: [key, sign] or undefined when a θ repeats or a radix overflows. */
  mulMonomial(k1: number, k2: number): [number, number] | undefined {
    const sp = this.space;
    const m1 = sp.decode(k1, this.xa, this.ya);
    const m2 = sp.decode(k2, this.xb, this.yb);
    const sign = thetaProductSign(m1, m2);
    if (sign === 0) return undefined;
    for (let i = 0; i < sp.n; i++) {
      this.xa[i]! += this.xb[i]!;
      this.ya[i]! += this.yb[i]!;
      if (this.xa[i]! >= sp.radix || this.ya[i]! >= sp.radix) throw new RangeError('exponent beyond the space radix');
    }
    return [sp.encode(this.xa, this.ya, m1 | m2), sign];
  }

  mul(f: SuperPoly<T>, g: SuperPoly<T>): SuperPoly<T> {
    const out: SuperPoly<T> = new Map();
    for (const [k1, c1] of f) {
      for (const [k2, c2] of g) {
        const r = this.mulMonomial(k1, k2);
        if (!r) continue;
        const c = this.coeffs.mul(c1, c2);
        this.addTerm(out, r[0], r[1] < 0 ? this.coeffs.neg(c) : c);
      }
    }
    return out;
  }

  /** ∂/∂x_i (kind 'x') or ∂/∂y_i (kind 'y'), i 0-based, applied `order` times. */
  derivative(f: SuperPoly<T>, kind: 'x' | 'y', i: number, order = 1): SuperPoly<T> {
    const sp = this.space;
    const out: SuperPoly<T> = new Map();
    const shift = kind === 'x' ? sp.powers[i]! : sp.powers[sp.n + i]!;
    for (const [k, c] of f) {
      sp.decode(k, this.xa, this.ya);
      const e = kind === 'x' ? this.xa[i]! : this.ya[i]!;
      if (e < order) continue;
      let factor = 1;
      for (let j = 0; j < order; j++) factor *= e - j;
      this.addTerm(out, k - order * shift * sp.maskBase, this.coeffs.mul(c, this.coeffs.fromInt(factor)));
    }
    return out;
  }

  /** ∂/∂θ_i: on θ_{j1}…θ_{jr} with i = j_m the sign is (−1)^(m−1). */
  thetaDerivative(f: SuperPoly<T>, i: number): SuperPoly<T> {
    const out: SuperPoly<T> = new Map();
    const bit = 1 << i;
    for (const [k, c] of f) {
      const mask = this.space.maskOf(k);
      if (!(mask & bit)) continue;
      const before = popcount(mask & (bit - 1));
      this.addTerm(out, k - bit, before & 1 ? this.coeffs.neg(c) : c);
    }
    return out;
  }

  /** Σ_i y_i (∂/∂x_i)^j. */
  polarization(f: SuperPoly<T>, j: number): SuperPoly<T> {
    const sp = this.space;
    const out: SuperPoly<T> = new Map();
    for (let i = 0; i < sp.n; i++) {
      const shiftY = sp.powers[sp.n + i]! * sp.maskBase;
      for (const [k, c] of this.derivative(f, 'x', i, j)) {
        sp.decode(k, this.xa, this.ya);
        if (this.ya[i]! + 1 >= sp.radix) throw new RangeError('exponent beyond the space radix');
        this.addTerm(out, k + shiftY, c);
      }
    }
    return out;
  }

  /** σ·m for a monomial (σ 0-based: position i goes to σ[i]): [key, sign]. */
  actMonomial(sigma: ArrayLike<number>, key: number): [number, number] {
    const sp = this.space;
    const mask = sp.decode(key, this.xa, this.ya);
    for (let i = 0; i < sp.n; i++) {
      this.xb[sigma[i]!] = this.xa[i]!;
      this.yb[sigma[i]!] = this.ya[i]!;
    }
    const [image, sign] = permuteMask(sigma, mask);
    return [sp.encode(this.xb, this.yb, image), sign];
  }

  act(sigma: ArrayLike<number>, f: SuperPoly<T>): SuperPoly<T> {
    const out: SuperPoly<T> = new Map();
    for (const [k, c] of f) {
      const [k2, s] = this.actMonomial(sigma, k);
      this.addTerm(out, k2, s < 0 ? this.coeffs.neg(c) : c);
    }
    return out;
  }

  equals(f: SuperPoly<T>, g: SuperPoly<T>): boolean {
    if (f.size !== g.size) return false;
    for (const [k, c] of f) {
      const d = g.get(k);
      if (d === undefined || !this.coeffs.equals(c, d)) return false;
    }
    return true;
  }

  /** Plain text in the input syntax, e.g. "x1^2*x2*th1 - 3*y2*th1*th3" (terms in key order). */
  format(f: SuperPoly<T>): string {
    if (f.size === 0) return '0';
    const sp = this.space;
    const parts: string[] = [];
    for (const k of [...f.keys()].sort((a, b) => b - a)) {
      const c = this.coeffs.format(f.get(k)!);
      const mask = sp.decode(k, this.xa, this.ya);
      const factors: string[] = [];
      for (let i = 0; i < sp.n; i++) if (this.xa[i]) factors.push(this.xa[i] === 1 ? `x${i + 1}` : `x${i + 1}^${this.xa[i]}`);
      if (sp.hasY) for (let i = 0; i < sp.n; i++) if (this.ya[i]) factors.push(this.ya[i] === 1 ? `y${i + 1}` : `y${i + 1}^${this.ya[i]}`);
      for (let i = 0; i < sp.n; i++) if ((mask >> i) & 1) factors.push(`th${i + 1}`);
      const neg = c.startsWith('-');
      const abs = neg ? c.slice(1) : c;
      const body = factors.length === 0 ? abs : abs === '1' ? factors.join('*') : `${abs}*${factors.join('*')}`;
      parts.push(parts.length === 0 ? (neg ? `-${body}` : body) : `${neg ? '-' : '+'} ${body}`);
    }
    return parts.join(' ');
  }
}
