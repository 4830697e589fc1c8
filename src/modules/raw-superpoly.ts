/**
 * Superpolynomials with rational coefficients in a form that needs no space yet (exponent
 * arrays and a θ mask): what the parser and the seed constructors produce before the
 * encoding radix is known.
 */
import { Fraction, frac } from '../core/rational.js';
import { thetaProductSign } from './superspace.js';

export interface RawTerm {
  readonly x: readonly number[];
  readonly y: readonly number[];
  readonly mask: number;
  readonly coeff: Fraction;
}

export type RawPoly = ReadonlyMap<string, RawTerm>;

function termKey(x: readonly number[], y: readonly number[], mask: number): string {
  return `${x.join(',')}|${y.join(',')}|${mask}`;
}

export function rawAdd(target: Map<string, RawTerm>, x: readonly number[], y: readonly number[], mask: number, c: Fraction): void {
  if (c.n === 0n) return;
  const key = termKey(x, y, mask);
  const old = target.get(key);
  const s = old ? old.coeff.add(c) : c;
  if (s.n === 0n) target.delete(key);
  else target.set(key, { x, y, mask, coeff: s });
}

export function rawConstant(n: number, c: Fraction): RawPoly {
  const m = new Map<string, RawTerm>();
  rawAdd(m, new Array<number>(n).fill(0), new Array<number>(n).fill(0), 0, c);
  return m;
}

export function rawMonomial(x: readonly number[], y: readonly number[], mask: number, c: Fraction = frac(1)): RawPoly {
  const m = new Map<string, RawTerm>();
  rawAdd(m, x, y, mask, c);
  return m;
}

export function rawSum(a: RawPoly, b: RawPoly, sign = 1): RawPoly {
  const m = new Map(a);
  for (const t of b.values()) rawAdd(m, t.x, t.y, t.mask, sign < 0 ? t.coeff.neg() : t.coeff);
  return m;
}

export function rawProduct(a: RawPoly, b: RawPoly): RawPoly {
  const m = new Map<string, RawTerm>();
  for (const s of a.values()) {
    for (const t of b.values()) {
      const sign = thetaProductSign(s.mask, t.mask);
      if (sign === 0) continue;
      const x = s.x.map((e, i) => e + t.x[i]!);
      const y = s.y.map((e, i) => e + t.y[i]!);
      const c = s.coeff.mul(t.coeff);
      rawAdd(m, x, y, s.mask | t.mask, sign < 0 ? c.neg() : c);
    }
  }
  return m;
}

/** Largest x- and y-exponent and whether any y or θ occurs. */
export function rawShape(p: RawPoly): { maxX: number; maxY: number; hasY: boolean; hasTheta: boolean } {
  let maxX = 0;
  let maxY = 0;
  let hasTheta = false;
  for (const t of p.values()) {
    for (const e of t.x) maxX = Math.max(maxX, e);
    for (const e of t.y) maxY = Math.max(maxY, e);
    if (t.mask) hasTheta = true;
  }
  return { maxX, maxY, hasY: maxY > 0, hasTheta };
}
