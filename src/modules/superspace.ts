/**
 * Super-monomials x^a y^b θ_S in n variables of each kind, packed into one number:
 * key = (Σ a_i R^i + Σ b_i R^(n+i)) · 2^n + mask(S) (no mask bits without θ), with a radix R above every exponent
 * that can occur. Keys stay below 2^53 (checked), so Maps and typed arrays can hold them.
 */
import { InputError, LimitError } from '../core/errors.js';

export const MAX_N = 12;

export class SuperSpace {
  readonly maskBase: number;
  /** R^i for i < 2n. */
  readonly powers: readonly number[];
  constructor(
    readonly n: number,
    readonly hasY: boolean,
    readonly hasTheta: boolean,
    readonly radix: number,
  ) {
    if (!Number.isInteger(n) || n < 1 || n > MAX_N) throw new InputError(`n must be an integer from 1 to ${MAX_N} (got ${n})`, 'n');
    if (!Number.isInteger(radix) || radix < 2) throw new RangeError(`radix ${radix}`);
    this.maskBase = hasTheta ? 2 ** n : 1; // no θ: keys carry no mask bits
    const kinds = hasY ? 2 : 1;
    const pw: number[] = [];
    let r = 1;
    for (let i = 0; i < kinds * n; i++) {
      pw.push(r);
      r *= radix;
    }
    if (r * this.maskBase > Number.MAX_SAFE_INTEGER) {
      throw new LimitError(`exponents up to ${radix - 1} in ${kinds * n} variables do not fit the monomial encoding (2^53); lower n or the degrees`, 'n');
    }
    this.powers = pw;
  }

  /** Largest key + 1 (for sizing). */
  get keyBound(): number {
    return this.powers.length === 0 ? this.maskBase : this.powers[this.powers.length - 1]! * this.radix * this.maskBase;
  }

  encode(x: ArrayLike<number>, y: ArrayLike<number> | undefined, mask: number): number {
    let lin = 0;
    const n = this.n;
    for (let i = 0; i < n; i++) {
      const e = x[i] ?? 0;
      if (e >= this.radix) throw new RangeError(`exponent ${e} beyond radix ${this.radix}`);
      lin += e * this.powers[i]!;
    }
    if (y && this.hasY) {
      for (let i = 0; i < n; i++) {
        const e = y[i] ?? 0;
        if (e >= this.radix) throw new RangeError(`exponent ${e} beyond radix ${this.radix}`);
        lin += e * this.powers[n + i]!;
      }
    }
    return lin * this.maskBase + mask;
  }

  /** Unpack into x (and y, when present); returns the θ mask. */
  decode(key: number, x: number[] | Int32Array, y?: number[] | Int32Array): number {
    let lin = Math.floor(key / this.maskBase);
    const mask = key - lin * this.maskBase;
    const n = this.n;
    const R = this.radix;
    for (let i = 0; i < n; i++) {
      const d = lin % R;
      x[i] = d;
      lin = (lin - d) / R;
    }
    if (this.hasY) {
      for (let i = 0; i < n; i++) {
        const d = lin % R;
        if (y) y[i] = d;
        lin = (lin - d) / R;
      }
    }
    return mask;
  }

  maskOf(key: number): number {
    return key % this.maskBase;
  }

  /** (x-degree, y-degree, θ-degree) of a key. */
  degrees(key: number): [number, number, number] {
    const x = new Array<number>(this.n);
    const y = new Array<number>(this.n).fill(0);
    const mask = this.decode(key, x, y);
    return [sum(x), sum(y), popcount(mask)];
  }
}

export function sum(a: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i]!;
  return s;
}

export function popcount(m: number): number {
  let c = 0;
  while (m) {
    m &= m - 1;
    c++;
  }
  return c;
}

/** Sign of θ_A θ_B re-sorted: (−1)^#{a ∈ A, b ∈ B, a > b}; 0 when A and B meet. */
export function thetaProductSign(a: number, b: number): number {
  if (a & b) return 0;
  let count = 0;
  let bb = b;
  while (bb) {
    const low = bb & -bb;
    count += popcount(a & ~(low * 2 - 1)); // elements of A above this element of B
    bb ^= low;
  }
  return count & 1 ? -1 : 1;
}

/**
 * Sign of ∂θ_T θ_S where ∂θ_T = ∂θ_{t1} ∘ … ∘ ∂θ_{tk} (t1 < … < tk, so the largest acts first):
 * (−1)^(Σ_{t∈T} #{s ∈ S : s < t}); 0 unless T ⊆ S.
 */
export function thetaDerivativeSign(t: number, s: number): number {
  if ((t & s) !== t) return 0;
  let count = 0;
  let tt = t;
  while (tt) {
    const low = tt & -tt;
    count += popcount(s & (low - 1));
    tt ^= low;
  }
  return count & 1 ? -1 : 1;
}

/** Sign of re-sorting θ_{σ(i1)}…θ_{σ(ir)} (σ 0-based), and the image mask. */
export function permuteMask(sigma: ArrayLike<number>, mask: number): [number, number] {
  let image = 0;
  let inversions = 0;
  for (let i = 0; mask >> i; i++) {
    if (!((mask >> i) & 1)) continue;
    const si = sigma[i]!;
    inversions += popcount(image & ~((2 << si) - 1)); // earlier θ's sent above σ(i)
    image |= 1 << si;
  }
  return [image, inversions & 1 ? -1 : 1];
}
