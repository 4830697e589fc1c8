/**
 * One formula for a whole family of q-series: c · q^{s(n,k)} · Π [A_i(n,k)]_q!^{e_i} with
 * each A_i affine in n and k (small coefficients) and s a small integer combination of
 * 1, n, k, C(n,2), C(k,2), nk — found on the richest entry and verified on every entry.
 * The integer factor c is a constant or itself affine in n and k, as in (n+1)·[n]_q!.
 */
import type { Poly } from '../core/poly.js';
import { asQProduct, productText, type QProduct } from './qProduct.js';

export interface FamilyPoint {
  readonly n: number;
  readonly k?: number;
  readonly poly: Poly;
}

/** The argument αn + βk + γ of a q-factorial. */
export interface Affine {
  readonly a: number;
  readonly b: number;
  readonly c: number;
}

export interface FamilyFormula {
  /** The constant integer factor (1 when the factor is affine). */
  readonly content: bigint;
  /** The integer factor as an affine function of n and k, when it varies. */
  readonly contentArg?: Affine;
  readonly shift: readonly number[]; // coefficients of SHIFT_BASIS
  readonly factors: readonly { readonly arg: Affine; readonly exp: number }[];
  readonly text: string;
  readonly verifiedOn: number;
}

const SHIFT_BASIS: readonly { name: string; needsK: boolean; f: (n: number, k: number) => number }[] = [
  { name: '1', needsK: false, f: () => 1 },
  { name: 'n', needsK: false, f: (n) => n },
  { name: 'k', needsK: true, f: (_n, k) => k },
  { name: 'C(n,2)', needsK: false, f: (n) => (n * (n - 1)) / 2 },
  { name: 'C(k,2)', needsK: true, f: (_n, k) => (k * (k - 1)) / 2 },
  { name: 'nk', needsK: true, f: (n, k) => n * k },
];

const MAX_COMBINATIONS = 50_000;

export function affineText(x: Affine): string {
  const parts: string[] = [];
  if (x.a) parts.push(x.a === 1 ? 'n' : `${x.a}n`);
  if (x.b) parts.push(x.b === 1 ? 'k' : x.b === -1 ? '-k' : `${x.b}k`);
  if (x.c || parts.length === 0) parts.push(String(x.c));
  return parts.join('+').replace(/\+-/g, '-');
}

function evalAffine(x: Affine, n: number, k: number): number {
  return x.a * n + x.b * k + x.c;
}

function findShift(points: readonly FamilyPoint[], products: readonly QProduct[], hasK: boolean): number[] | undefined {
  const basis = SHIFT_BASIS.map((b, i) => ({ ...b, i })).filter((b) => hasK || !b.needsK);
  const vectors: number[][] = [];
  const rec = (i: number, cur: number[], nz: number): void => {
    if (i === basis.length) {
      vectors.push([...cur]);
      return;
    }
    for (const v of [0, 1, -1, 2, -2]) {
      if (v !== 0 && nz >= 3) continue;
      cur.push(v);
      rec(i + 1, cur, nz + (v ? 1 : 0));
      cur.pop();
    }
  };
  rec(0, [], 0);
  const cost = (v: number[]) => v.reduce((s, x) => s + Math.abs(x) + (x ? 1 : 0), 0);
  vectors.sort((x, y) => cost(x) - cost(y));
  for (const v of vectors) {
    if (points.every((p, j) => basis.reduce((s, b, i) => s + v[i]! * b.f(p.n, p.k ?? 0), 0) === products[j]!.qPower)) {
      const full = new Array<number>(SHIFT_BASIS.length).fill(0);
      basis.forEach((b, i) => (full[b.i] = v[i]!));
      return full;
    }
  }
  return undefined;
}

function sameMaps(a: ReadonlyMap<number, number>, b: ReadonlyMap<number, number>): boolean {
  if (a.size !== b.size) return false;
  for (const [k, v] of a) if (b.get(k) !== v) return false;
  return true;
}

/** Exponents of [a]! (a ≥ 2) that a template gives at (n, k); undefined when an argument is negative. */
function templateAt(factors: readonly { arg: Affine; exp: number }[], n: number, k: number): Map<number, number> | undefined {
  const m = new Map<number, number>();
  for (const f of factors) {
    const a = evalAffine(f.arg, n, k);
    if (a < 0) return undefined;
    if (a <= 1) continue;
    const v = (m.get(a) ?? 0) + f.exp;
    if (v === 0) m.delete(a);
    else m.set(a, v);
  }
  return m;
}

export function recogniseFamily(points: readonly FamilyPoint[]): FamilyFormula | undefined {
  if (points.length === 0) return undefined;
  const products: QProduct[] = [];
  for (const p of points) {
    const qp = asQProduct(p.poly);
    if (!qp) return undefined;
    products.push(qp);
  }
  const hasK = points.some((p) => p.k !== undefined);
  let content = products[0]!.content;
  let contentArg: Affine | undefined;
  if (products.some((p) => p.content !== content)) {
    contentArg = affineContent(points, products, hasK);
    if (!contentArg) return undefined;
    content = 1n;
  }
  const shift = findShift(points, products, hasK);
  if (!shift) return undefined;
  // the richest entry: most distinct factorial arguments, then the largest n
  let ref = 0;
  products.forEach((p, i) => {
    const r = products[ref]!;
    if (p.factorials.size > r.factorials.size || (p.factorials.size === r.factorials.size && points[i]!.n > points[ref]!.n)) ref = i;
  });
  const n0 = points[ref]!.n;
  const k0 = points[ref]!.k ?? 0;
  const slots = [...products[ref]!.factorials];
  const choices = slots.map(([a]) => {
    const list: Affine[] = [];
    for (const al of [0, 1, 2]) {
      for (const be of hasK ? [0, 1, -1, 2] : [0]) {
        const c = a - al * n0 - be * k0;
        if (Math.abs(c) <= 3 && (al !== 0 || be !== 0 || c >= 2)) list.push({ a: al, b: be, c });
      }
    }
    return list.sort((x, y) => affCost(x) - affCost(y));
  });
  let total = 1;
  for (const c of choices) total *= Math.max(c.length, 1);
  if (total > MAX_COMBINATIONS || choices.some((c) => c.length === 0)) return undefined;
  let best: { factors: { arg: Affine; exp: number }[]; cost: number } | undefined;
  const pick: Affine[] = [];
  const rec = (i: number): void => {
    if (i === slots.length) {
      const factors = slots.map(([, e], j) => ({ arg: pick[j]!, exp: e }));
      const cost = factors.reduce((s, f) => s + affCost(f.arg), 0);
      if (best && cost >= best.cost) return;
      const ok = points.every((p, j) => {
        const m = templateAt(factors, p.n, p.k ?? 0);
        return m !== undefined && sameMaps(m, products[j]!.factorials);
      });
      if (ok) best = { factors, cost };
      return;
    }
    for (const c of choices[i]!) {
      pick.push(c);
      rec(i + 1);
      pick.pop();
    }
  };
  rec(0);
  if (!best) return undefined;
  return {
    content,
    ...(contentArg ? { contentArg } : {}),
    shift,
    factors: best.factors,
    text: formulaText(contentArg ? `(${affineText(contentArg)})` : content !== 1n ? String(content) : '', shift, best.factors),
    verifiedOn: points.length,
  };
}

/** The integer factors as a·n + b·k + c (small coefficients, a ≠ 0 or b ≠ 0), or undefined. */
function affineContent(points: readonly FamilyPoint[], products: readonly QProduct[], hasK: boolean): Affine | undefined {
  const options: Affine[] = [];
  for (const a of [0, 1, 2]) for (const b of hasK ? [0, 1, -1, 2] : [0]) for (let c = -3; c <= 3; c++) if (a || b) options.push({ a, b, c });
  options.sort((x, y) => affCost(x) - affCost(y));
  return options.find((x) => points.every((p, j) => BigInt(evalAffine(x, p.n, p.k ?? 0)) === products[j]!.content));
}

function affCost(x: Affine): number {
  return Math.abs(x.a) + Math.abs(x.b) + Math.abs(x.c) + (x.a && x.b ? 0.5 : 0);
}

function shiftText(shift: readonly number[]): string {
  const parts: string[] = [];
  shift.forEach((v, i) => {
    if (!v) return;
    const name = SHIFT_BASIS[i]!.name;
    parts.push(name === '1' ? String(v) : v === 1 ? name : v === -1 ? `-${name}` : `${v}${name}`);
  });
  return parts.join('+').replace(/\+-/g, '-');
}

function sameAffine(x: Affine, y: Affine): boolean {
  return x.a === y.a && x.b === y.b && x.c === y.c;
}

function formulaText(factor: string, shift: readonly number[], factors: readonly { arg: Affine; exp: number }[]): string {
  const prefix: string[] = [];
  if (factor) prefix.push(factor);
  const s = shiftText(shift);
  if (s) prefix.push(/[+-]/.test(s) ? `q^(${s})` : `q^${s}`);
  const num = factors.filter((f) => f.exp > 0);
  const den = factors.filter((f) => f.exp < 0);
  let body: string;
  const denSum = den.reduce((acc, f) => ({ a: acc.a - f.exp * f.arg.a, b: acc.b - f.exp * f.arg.b, c: acc.c - f.exp * f.arg.c }), { a: 0, b: 0, c: 0 });
  if (num.length === 1 && num[0]!.exp === 1 && den.length >= 1 && sameAffine(denSum, num[0]!.arg)) {
    const parts = den.flatMap((f) => new Array<string>(-f.exp).fill(affineText(f.arg)));
    body = parts.length === 2 ? `[${affineText(num[0]!.arg)} choose ${parts[0]}]_q` : `[${affineText(num[0]!.arg)}; ${parts.join(', ')}]_q`;
  } else {
    const m = new Map<string, number>();
    for (const f of factors) m.set(affineText(f.arg), f.exp);
    const idx = [...m.keys()];
    body = productText(new Map(idx.map((key, i) => [i, m.get(key)!])), (i) => `[${idx[i]}]_q!`);
  }
  return [...prefix, ...(body === '1' && prefix.length ? [] : [body])].join(' · ');
}
