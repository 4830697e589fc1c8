/**
 * Dimension formulas in n, fitted on the first sizes computed and checked on (at least two of)
 * the next ones:
 * a polynomial in n (of the least degree that the first points fix), c·r^n, a product
 * d(n) = (αn+β)·d(n−1) (n!, (n+1)!/2, …), A·r^n + B, or a linear recurrence of order two with
 * constant coefficients (A·r^n + B·s^n when its roots are rational). Exact rationals; a formula is reported only when
 * at least one computed size beyond those it was fitted on agrees.
 */
import { frac, type Fraction } from '../core/rational.js';
import { finding, type SweepFinding } from './findings.js';
import type { ModuleData } from './moduleData.js';
import type { Place } from './plan.js';

/** Sizes beyond those that fix a formula that must agree with it: one agreeing size proves little. */
const MIN_CHECKS = 2;

interface Fit {
  readonly text: string;
  readonly fitted: number;
  readonly checked: number;
  readonly cost: number;
}

function fracText(f: Fraction): string {
  return f.toFraction();
}

/** Coefficients (constant first) of the polynomial through the points, by elimination over Q. */
function interpolate(xs: readonly number[], ys: readonly Fraction[]): Fraction[] {
  const m = xs.length;
  const rows = xs.map((x, i) => [...Array.from({ length: m }, (_, j) => frac(BigInt(x) ** BigInt(j))), ys[i]!]);
  for (let c = 0; c < m; c++) {
    const p = rows.findIndex((r, i) => i >= c && !r[c]!.equals(0));
    [rows[c], rows[p]] = [rows[p]!, rows[c]!];
    const piv = rows[c]![c]!;
    rows[c] = rows[c]!.map((v) => v.div(piv));
    for (let i = 0; i < m; i++) {
      if (i === c || rows[i]![c]!.equals(0)) continue;
      const f = rows[i]![c]!;
      rows[i] = rows[i]!.map((v, j) => v.sub(f.mul(rows[c]![j]!)));
    }
  }
  return rows.map((r) => r[m]!);
}

function polyText(coeffs: readonly Fraction[]): string {
  const parts: string[] = [];
  for (let j = coeffs.length - 1; j >= 0; j--) {
    const c = coeffs[j]!;
    if (c.equals(0)) continue;
    const mag = c.abs();
    const mono = j === 0 ? '' : j === 1 ? 'n' : `n^${j}`;
    const num = mag.equals(1) && mono ? '' : fracText(mag);
    const term = num && mono ? `${num}·${mono}` : num || mono;
    parts.push(parts.length === 0 ? (c.compare(0) < 0 ? `-${term}` : term) : `${c.compare(0) < 0 ? '-' : '+'} ${term}`);
  }
  return parts.join(' ') || '0';
}

function polynomialFit(ns: readonly number[], ds: readonly Fraction[]): Fit | undefined {
  // the least degree ≥ 1 whose interpolant on the first points agrees with every later one
  for (let deg = 1; deg + 1 + MIN_CHECKS <= ns.length; deg++) {
    const coeffs = interpolate(ns.slice(0, deg + 1), ds.slice(0, deg + 1));
    const value = (n: number) => coeffs.reduce((s, c, j) => s.add(c.mul(frac(BigInt(n) ** BigInt(j)))), frac(0));
    if (ns.slice(deg + 1).every((n, i) => value(n).equals(ds[deg + 1 + i]!))) {
      if (coeffs.slice(1).every((c) => c.equals(0))) return undefined; // a constant dimension is no formula
      return { text: polyText(coeffs), fitted: deg + 1, checked: ns.length - deg - 1, cost: deg };
    }
  }
  return undefined;
}

function factorial(m: number): bigint {
  let r = 1n;
  for (let i = 2; i <= m; i++) r *= BigInt(i);
  return r;
}

function ratioFit(ns: readonly number[], ds: readonly Fraction[]): Fit | undefined {
  const consecutive = ns.every((n, i) => i === 0 || n === ns[i - 1]! + 1);
  if (!consecutive || ds.some((d) => d.equals(0))) return undefined;
  const r = ds.slice(1).map((d, i) => d.div(ds[i]!));
  const n0 = ns[0]!;
  // constant ratio: c·r^n
  if (r.length >= 2 && r.every((x) => x.equals(r[0]!)) && !r[0]!.equals(1)) {
    const c = r[0]!;
    const a = ds[0]!.div(c.pow(n0));
    return { text: `${a.equals(1) ? '' : `${fracText(a)}·`}${c.compare(0) < 0 || !c.equals(c.floor()) ? `(${fracText(c)})` : fracText(c)}^n`, fitted: 2, checked: r.length - 1, cost: 1.5 };
  }
  // affine ratio: d(n) = (αn+β)·d(n−1)
  if (r.length < 3) return undefined;
  const alpha = r[1]!.sub(r[0]!);
  const beta = r[0]!.sub(alpha.mul(n0 + 1));
  if (alpha.equals(0) || !r.every((x, i) => x.equals(alpha.mul(n0 + 1 + i).add(beta)))) return undefined;
  if (alpha.equals(1) && beta.equals(beta.floor()) && n0 + Number(beta.valueOf()) >= 0) {
    const b = Number(beta.valueOf());
    const c = ds[0]!.div(frac(factorial(n0 + b)));
    const fact = b === 0 ? 'n!' : `(n${b > 0 ? '+' : '-'}${Math.abs(b)})!`;
    return { text: `${c.equals(1) ? '' : `${fracText(c)}·`}${fact}`, fitted: 3, checked: r.length - 2, cost: 2 };
  }
  return { text: `d(n) = (${polyText([beta, alpha])})·d(n-1), d(${n0}) = ${fracText(ds[0]!)}`, fitted: 3, checked: r.length - 2, cost: 3 };
}

/** The square root of a non-negative rational when it is rational. */
function ratSqrt(f: Fraction): Fraction | undefined {
  const root = (m: bigint): bigint | undefined => {
    if (m < 0n) return undefined;
    let r = BigInt(Math.floor(Math.sqrt(Number(m))));
    while (r * r > m) r--;
    while ((r + 1n) * (r + 1n) <= m) r++;
    return r * r === m ? r : undefined;
  };
  if (f.s < 0n) return undefined;
  const a = root(f.n);
  const b = root(f.d);
  return a === undefined || b === undefined ? undefined : frac(a, b);
}

function termText(c: Fraction, base: Fraction, first: boolean): string {
  const neg = c.compare(0) < 0;
  const mag = c.abs();
  const pow = base.equals(1) ? '' : `${base.compare(0) < 0 || !base.equals(base.floor()) ? `(${fracText(base)})` : fracText(base)}^n`;
  const num = mag.equals(1) && pow ? '' : fracText(mag);
  const body = num && pow ? `${num}·${pow}` : num || pow;
  return first ? `${neg ? '-' : ''}${body}` : `${neg ? '-' : '+'} ${body}`;
}

/** d(n) = α·d(n−1) + β with α ≠ 0, 1, fitted on the first three sizes: A·α^n + B (2^n − 1, …). */
function affineFit(ns: readonly number[], ds: readonly Fraction[]): Fit | undefined {
  const consecutive = ns.every((n, i) => i === 0 || n === ns[i - 1]! + 1);
  if (!consecutive || ds.length < 4) return undefined;
  const [d0, d1, d2] = ds as [Fraction, Fraction, Fraction];
  if (d1.equals(d0)) return undefined;
  const alpha = d2.sub(d1).div(d1.sub(d0));
  const beta = d1.sub(alpha.mul(d0));
  if (alpha.equals(0) || alpha.equals(1) || beta.equals(0)) return undefined; // polynomial or c·r^n: the other fits
  for (let i = 3; i < ds.length; i++) if (!alpha.mul(ds[i - 1]!).add(beta).equals(ds[i]!)) return undefined;
  const B = beta.div(frac(1).sub(alpha));
  const A = d0.sub(B).div(alpha.pow(ns[0]!));
  return { text: `${termText(A, alpha, true)} ${termText(B, frac(1), false)}`, fitted: 3, checked: ds.length - 3, cost: 2 };
}

/**
 * d(n) = α·d(n−1) + β·d(n−2), fitted on the first four sizes and checked on the rest; written
 * A·r^n + B·s^n when the characteristic roots are distinct rationals (3^n − 2^n, …).
 */
function recurrenceFit(ns: readonly number[], ds: readonly Fraction[]): Fit | undefined {
  const consecutive = ns.every((n, i) => i === 0 || n === ns[i - 1]! + 1);
  if (!consecutive || ds.length < 5) return undefined;
  const [d0, d1, d2, d3] = ds as [Fraction, Fraction, Fraction, Fraction];
  // d2 = α d1 + β d0, d3 = α d2 + β d1
  const det = d1.mul(d1).sub(d2.mul(d0));
  if (det.equals(0)) return undefined;
  const alpha = d2.mul(d1).sub(d3.mul(d0)).div(det);
  const beta = d1.mul(d3).sub(d2.mul(d2)).div(det);
  for (let i = 4; i < ds.length; i++) if (!alpha.mul(ds[i - 1]!).add(beta.mul(ds[i - 2]!)).equals(ds[i]!)) return undefined;
  if (beta.equals(0)) return undefined; // a constant ratio: ratioFit
  const n0 = ns[0]!;
  const disc = ratSqrt(alpha.mul(alpha).add(beta.mul(4)));
  let text = `d(n) = ${polyText([frac(0), alpha]).replace('n', 'd(n-1)')} ${beta.compare(0) < 0 ? '-' : '+'} ${beta.abs().equals(1) ? '' : `${fracText(beta.abs())}·`}d(n-2), d(${n0}) = ${fracText(d0)}, d(${n0 + 1}) = ${fracText(d1)}`;
  if (disc && !disc.equals(0)) {
    const r = alpha.add(disc).div(2);
    const s = alpha.sub(disc).div(2);
    // d(n) = A r^n + B s^n from d(n0), d(n0+1)
    const rn = r.pow(n0);
    const sn = s.pow(n0);
    const B = d1.sub(d0.mul(r)).div(sn.mul(s.sub(r)));
    const A = d0.sub(B.mul(sn)).div(rn);
    const terms = [[A, r], [B, s]].filter(([c]) => !c!.equals(0)) as [Fraction, Fraction][];
    terms.sort((x, y) => y[1].compare(x[1]));
    text = terms.map(([c, b], i) => termText(c, b, i === 0)).join(' ');
  }
  return { text, fitted: 4, checked: ds.length - 4, cost: 2.5 };
}

/** The places of a line in slices along n: all of them (no k), or each fixed k and each fixed n − k. */
function slices(data: readonly ModuleData[]): { label: string; data: ModuleData[] }[] {
  const hasK = data.some((d) => d.k !== undefined);
  if (!hasK) return [{ label: '', data: [...data].sort((a, b) => a.n - b.n) }];
  const out: { label: string; data: ModuleData[] }[] = [];
  const group = (f: (d: ModuleData) => number, name: (v: number) => string) => {
    const m = new Map<number, ModuleData[]>();
    for (const d of data) m.set(f(d), [...(m.get(f(d)) ?? []), d]);
    for (const [v, list] of [...m].sort((a, b) => a[0] - b[0])) out.push({ label: name(v), data: list.sort((a, b) => a.n - b.n) });
  };
  group((d) => d.k!, (v) => `k = ${v}`);
  group((d) => d.n - d.k!, (v) => (v === 0 ? 'k = n' : `k = n-${v}`));
  return out;
}

export function dimensionFindings(data: readonly ModuleData[]): SweepFinding[] {
  const out: SweepFinding[] = [];
  for (const s of slices(data)) {
    if (s.data.length < 3) continue;
    const ns = s.data.map((d) => d.n);
    const ds = s.data.map((d) => frac(d.dimension));
    const fits = [polynomialFit(ns, ds), ratioFit(ns, ds), affineFit(ns, ds), recurrenceFit(ns, ds)].filter((f): f is Fit => f !== undefined && f.checked >= MIN_CHECKS);
    fits.sort((a, b) => b.checked - a.checked || a.cost - b.cost);
    const best = fits[0];
    if (!best) continue;
    const places: Place[] = s.data.map((d) => ({ n: d.n, ...(d.k !== undefined ? { k: d.k } : {}) }));
    const fittedOn = ns.slice(0, best.fitted);
    const checkedOn = ns.slice(best.fitted);
    out.push(
      finding(
        'dimension',
        `dimension${s.label ? ` (${s.label})` : ''} = ${best.text}`,
        `fitted on n = ${fittedOn.join(', ')}, checked on n = ${checkedOn.join(', ')} (exact dimensions)`,
        places,
      ),
    );
  }
  return out;
}
