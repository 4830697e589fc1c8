/**
 * Recurrences with q-integer coefficients, verified on every entry whose predecessors
 * are known:  f(n) = A(n) f(n−1)  and  f(n,k) = A(n,k) f(n−1,k−1) + B(n,k) f(n−1,k),
 * also after dividing by a prefactor ([k]_q!, [n]_q!, [n−k]_q!) when that is exact.
 * Out of range, f(n,0) = 0 for n ≥ 1 and f(n,k) = 0 for k > n.
 */
import { ArithmeticError } from '../core/errors.js';
import { Poly } from '../core/poly.js';
import { qFactorial, qInteger } from '../core/qanalogs.js';
import type { FamilyPoint } from './familyFormula.js';

interface Coefficient {
  readonly text: string;
  readonly value: (n: number, k: number) => Poly | undefined;
}

const qint = (m: number) => (m >= 0 ? qInteger(m) : undefined);
const qpow = (m: number) => (m >= 0 ? Poly.monomial(1n, m) : undefined);

const COEFFS: readonly Coefficient[] = [
  { text: '0', value: () => Poly.zero },
  { text: '1', value: () => Poly.one },
  { text: '[k]_q', value: (_n, k) => qint(k) },
  { text: '[n]_q', value: (n) => qint(n) },
  { text: '[k-1]_q', value: (_n, k) => qint(k - 1) },
  { text: '[k+1]_q', value: (_n, k) => qint(k + 1) },
  { text: '[n-1]_q', value: (n) => qint(n - 1) },
  { text: '[n-k]_q', value: (n, k) => qint(n - k) },
  { text: '[n-k+1]_q', value: (n, k) => qint(n - k + 1) },
  { text: 'q^k', value: (_n, k) => qpow(k) },
  { text: 'q^(k-1)', value: (_n, k) => qpow(k - 1) },
  { text: 'q^(n-1)', value: (n) => qpow(n - 1) },
  { text: 'q^(n-k)', value: (n, k) => qpow(n - k) },
  { text: 'q^(k-1)·[k]_q', value: (_n, k) => (k >= 1 ? qpow(k - 1)!.mul(qInteger(k)) : undefined) },
  { text: 'q^(n-1)·[n]_q', value: (n) => (n >= 1 ? qpow(n - 1)!.mul(qInteger(n)) : undefined) },
];

const PREFACTORS: readonly Coefficient[] = [
  { text: '', value: () => Poly.one },
  { text: '[k]_q!', value: (_n, k) => qFactorial(k) },
  { text: '[n]_q!', value: (n) => qFactorial(n) },
  { text: '[n-k]_q!', value: (n, k) => (n >= k ? qFactorial(n - k) : undefined) },
];

export interface Recurrence {
  /** One line, e.g. "f(n,k) = [k]_q! · S(n,k), S(n,k) = S(n-1,k-1) + [k]_q · S(n-1,k)". */
  readonly text: string;
  /** A name from the trade when the recurrence is a known one. */
  readonly name?: string;
  readonly prefactor: string;
  readonly coefficients: readonly string[];
  /** How many entries the recurrence was checked on. */
  readonly checked: number;
}

const MIN_CHECKS = 3;

function divide(p: Poly, d: Poly | undefined): Poly | undefined {
  if (!d || d.isZero()) return undefined;
  try {
    return p.divExact(d);
  } catch (e) {
    if (e instanceof ArithmeticError) return undefined;
    throw e;
  }
}

function knownName(hasK: boolean, a: string, b: string): string | undefined {
  if (!hasK) return a === '[n]_q' ? 'q-factorial recurrence' : undefined;
  if (a === '1' && b === '[k]_q') return 'q-Stirling recurrence';
  if (a === '1' && b === 'q^k') return 'q-Pascal recurrence';
  if (a === 'q^(n-k)' && b === '1') return 'q-Pascal recurrence';
  return undefined;
}

export function findRecurrences(points: readonly FamilyPoint[]): Recurrence[] {
  if (points.some((p) => !p.poly.isUnivariate())) return [];
  const hasK = points.some((p) => p.k !== undefined);
  const out: Recurrence[] = [];
  for (const pre of PREFACTORS) {
    if (!hasK && pre.text.includes('k')) continue;
    const g = new Map<string, Poly>();
    let ok = true;
    for (const p of points) {
      const v = pre.text === '' ? p.poly : divide(p.poly, pre.value(p.n, p.k ?? 0));
      if (!v) {
        ok = false;
        break;
      }
      g.set(`${p.n},${p.k ?? ''}`, v);
    }
    if (!ok) continue;
    const at = (n: number, k: number | undefined): Poly | undefined => {
      if (k === undefined) return g.get(`${n},`);
      if (n >= 1 && (k === 0 || k > n)) return Poly.zero;
      return g.get(`${n},${k}`);
    };
    const sym = pre.text === '' ? 'f' : 'g';
    const head = pre.text === '' ? '' : `f = ${pre.text} · g, `;
    if (!hasK) {
      for (const a of COEFFS.slice(2)) {
        const checked = check(points, (n) => {
          const prev = at(n - 1, undefined);
          const c = a.value(n, 0);
          return prev && c ? c.mul(prev) : undefined;
        }, (p) => g.get(`${p.n},`)!);
        if (checked >= MIN_CHECKS) {
          const name = knownName(false, a.text, '');
          out.push({ text: `${head}${sym}(n) = ${a.text} · ${sym}(n-1)`, ...(name ? { name } : {}), prefactor: pre.text, coefficients: [a.text], checked });
        }
      }
      continue;
    }
    for (const a of COEFFS) {
      for (const b of COEFFS) {
        if (a.text === '0' && b.text === '0') continue;
        const checked = check(points, (n, k) => {
          const x = at(n - 1, k - 1);
          const y = at(n - 1, k);
          const ca = a.value(n, k);
          const cb = b.value(n, k);
          if (!x || !y || !ca || !cb) return undefined;
          return ca.mul(x).add(cb.mul(y));
        }, (p) => g.get(`${p.n},${p.k}`)!);
        if (checked >= MIN_CHECKS) {
          const name = knownName(true, a.text, b.text);
          const rhs = [a.text === '0' ? '' : `${a.text === '1' ? '' : `${a.text} · `}${sym}(n-1,k-1)`, b.text === '0' ? '' : `${b.text === '1' ? '' : `${b.text} · `}${sym}(n-1,k)`].filter(Boolean).join(' + ');
          out.push({ text: `${head}${sym}(n,k) = ${rhs}`, ...(name ? { name } : {}), prefactor: pre.text, coefficients: [a.text, b.text], checked });
        }
      }
    }
  }
  // named recurrences first, then those without a prefactor, then the most checked
  return out.sort((x, y) => Number(!x.name) - Number(!y.name) || Number(x.prefactor !== '') - Number(y.prefactor !== '') || y.checked - x.checked);
}

/** Count of entries where the right side is defined and equal; −1 (fail) on any mismatch. */
function check(points: readonly FamilyPoint[], rhs: (n: number, k: number) => Poly | undefined, lhs: (p: FamilyPoint) => Poly): number {
  let checked = 0;
  let nonzero = 0;
  for (const p of points) {
    const r = rhs(p.n, p.k ?? 0);
    if (!r) continue;
    if (!r.equals(lhs(p))) return -1;
    checked++;
    if (!r.isZero()) nonzero++;
  }
  return nonzero >= MIN_CHECKS ? checked : -1;
}
