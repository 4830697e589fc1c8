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
