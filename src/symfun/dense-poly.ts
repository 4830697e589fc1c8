/**
 * Dense polynomials in q, t with BigInt coefficients (row i = power of q, column j = power
 * of t), for the exact divisions that end a common-denominator sum: division by a factor
 * with few terms costs |dividend| × |factor|, with no search for leading terms.
 */
import { Poly } from '../core/poly.js';

export interface DensePoly {
  readonly rows: number; // q-degree + 1
  readonly cols: number; // t-degree + 1
  readonly c: bigint[]; // c[i * cols + j]
}

export function toDense(p: Poly): DensePoly {
  const rows = Math.max(p.degQ() + 1, 1);
  const cols = Math.max(p.degT() + 1, 1);
  const c = new Array<bigint>(rows * cols).fill(0n);
  for (const [i, j, v] of p.terms()) c[i * cols + j] = v;
  return { rows, cols, c };
}

export function fromDense(d: DensePoly): Poly {
  const terms: [number, number, bigint][] = [];
  for (let i = 0; i < d.rows; i++)
    for (let j = 0; j < d.cols; j++) {
      const v = d.c[i * d.cols + j]!;
      if (v !== 0n) terms.push([i, j, v]);
    }
  return Poly.fromTerms(terms);
}

/**
 * The exact quotient a / f, or null when f does not divide a. Long division in the lex
 * order (q first, then t); the leading coefficient of f must divide every step exactly.
 */
export function divideDense(a: DensePoly, f: Poly): DensePoly | null {
  if (f.isZero()) return null;
  const terms = f.sortedTerms(); // ascending in q then t
  const [fi, fj, lc] = terms[terms.length - 1]!;
  const rest = terms.slice(0, -1).map(([i, j, v]) => [fi - i, fj - j, v] as const); // offsets below the lead
  const { rows, cols } = a;
  const r = a.c.slice();
  const qRows = rows - fi;
  const qCols = cols; // the quotient's t-degree may exceed cols − fj − 1 only if a is not divisible
  if (qRows <= 0) return a.c.every((v) => v === 0n) ? { rows: 1, cols: 1, c: [0n] } : null;
  const quo = new Array<bigint>(qRows * qCols).fill(0n);
  for (let i = rows - 1; i >= fi; i--) {
    for (let j = cols - 1; j >= 0; j--) {
      const v = r[i * cols + j]!;
      if (v === 0n) continue;
      if (j < fj || v % lc !== 0n) return null;
      const qc = v / lc;
      quo[(i - fi) * qCols + (j - fj)] = qc;
      r[i * cols + j] = 0n;
      for (const [di, dj, fv] of rest) {
        const ii = i - di;
        const jj = j - dj;
        if (jj < 0 || jj >= cols) return null; // the remainder would leave the box: not divisible
        r[ii * cols + jj]! -= qc * fv;
      }
    }
  }
  for (let k = 0; k < fi * cols; k++) if (r[k] !== 0n) return null;
  return { rows: qRows, cols: qCols, c: quo };
}

/**
 * Σ_k a_k · b_k as a dense polynomial, for polynomials a_k, b_k. Accumulates in doubles
 * when a bound on every partial sum (Σ_k max|a_k| · Σ|b_k|) stays below 2^53, so that
 * every step is exact, and in BigInt otherwise.
 */
interface Flat {
  readonly i: Int32Array;
  readonly j: Int32Array;
  readonly c: readonly bigint[];
  readonly cn: Float64Array;
  readonly maxAbs: number;
  readonly l1: number;
}

const flatCache = new WeakMap<Poly, Flat>();

/** Terms of p as parallel arrays (cached: a cofactor meets every Schur coefficient). */
function flatten(p: Poly): Flat {
  let hit = flatCache.get(p);
  if (!hit) {
    const ts = [...p.terms()];
    const cn = Float64Array.from(ts, (t) => Number(t[2]));
    let maxAbs = 0;
    let l1 = 0;
    for (const v of cn) {
      maxAbs = Math.max(maxAbs, Math.abs(v));
      l1 += Math.abs(v);
    }
    hit = { i: Int32Array.from(ts, (t) => t[0]), j: Int32Array.from(ts, (t) => t[1]), c: ts.map((t) => t[2]), cn, maxAbs, l1 };
    flatCache.set(p, hit);
  }
  return hit;
}

export function sumOfProducts(pairs: readonly (readonly [Poly, Poly])[]): DensePoly {
  let rows = 1;
  let cols = 1;
  let bound = 0;
  const live = pairs.filter(([a, b]) => !a.isZero() && !b.isZero());
  for (const [a, b] of live) {
    const fa = flatten(a);
    const fb = flatten(b);
    rows = Math.max(rows, Math.max(...fa.i) + Math.max(...fb.i) + 1);
    cols = Math.max(cols, Math.max(...fa.j) + Math.max(...fb.j) + 1);
    bound += fa.maxAbs * fb.l1;
  }
  const flat = (p: Poly) => {
    const f = flatten(p);
    return { off: Int32Array.from(f.i, (i, x) => i * cols + f.j[x]!), c: f.c, cn: f.cn };
  };
  if (bound < 2 ** 52) {
    const acc = new Float64Array(rows * cols);
    for (const [a, b] of live) {
      const fa = flat(a);
      const fb = flat(b);
      const ca = fa.cn;
      for (let y = 0; y < fb.off.length; y++) {
        const ob = fb.off[y]!;
        const cb = fb.cn[y]!;
        for (let x = 0; x < fa.off.length; x++) acc[fa.off[x]! + ob]! += ca[x]! * cb;
      }
    }
    return { rows, cols, c: Array.from(acc, (v) => BigInt(v)) };
  }
  const acc = new Array<bigint>(rows * cols).fill(0n);
  for (const [a, b] of live) {
    const fa = flat(a);
    const fb = flat(b);
    for (let y = 0; y < fb.off.length; y++) {
      const ob = fb.off[y]!;
      const cb = fb.c[y]!;
      for (let x = 0; x < fa.off.length; x++) acc[fa.off[x]! + ob]! += fa.c[x]! * cb;
    }
  }
  return { rows, cols, c: acc };
}
