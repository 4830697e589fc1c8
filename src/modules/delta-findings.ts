/**
 * The computed Frobenius series against the Delta-operator formulas of the symmetric-function
 * engine, reported as a finding (holds, or the first cell where it fails) — never assumed.
 * Cell (a, b, c) is the coefficient of q^a t^b in the formula for θ-degree c (k = n − c):
 * - quotient by the invariants in x, y: ∇e_n = Δ′_{e_{n−1}} e_n (Haiman, "Vanishing theorems
 *   and character formulas for the Hilbert scheme of points in the plane", 2002, a theorem);
 *   in x alone its t = 0 part (the coinvariant algebra);
 * - with θ: Σ_k z^{n−k} Δ′_{e_{k−1}} e_n (conjectured in "A module for the Delta conjecture",
 *   2019; in x, θ alone at t = 0);
 * - generalized coinvariant ring R_{n,k}: rev_q ω of Δ′_{e_{k−1}} e_n at t = 0 (Haglund–Rhoades–
 *   Shimozono, "Ordered set partitions, generalized coinvariant algebras, and the Delta
 *   Conjecture", Adv. Math. 329 (2018), a theorem);
 * - closure of δ_{n,k} under ∂x, ∂y and the polarizations: Δ′_{e_{k−1}} e_n (conjectured in
 *   "Vandermondes in superspace"; for k = n Haiman's theorem).
 */
import { conjugate, partitionKey, partitionList } from '../core/partitions.js';
import { deltaPrimeOfEn } from '../symfun/operators.js';
import { SymFun } from '../symfun/symfun.js';
import type { ModuleCell } from './module-cell.js';
import type { Finding } from './module-result.js';

export type DeltaSubject =
  | { readonly kind: 'quotient'; readonly ideal: string; readonly n: number; readonly k?: number | undefined; readonly y: boolean; readonly theta: boolean }
  | { readonly kind: 'polarized'; readonly n: number; readonly k: number };

/** Largest n for which the formulas are evaluated (about 10 s of symmetric functions at n = 8). */
export const DELTA_MAX_N = 8;

type Table = Map<string, Map<string, bigint>>;

export function deltaFindings(subject: DeltaSubject, cells: readonly ModuleCell[]): Finding[] {
  const spec = formulaOf(subject);
  if (!spec) return [];
  if (subject.n > DELTA_MAX_N) return [{ check: spec.check, holds: null, detail: `not evaluated for n > ${DELTA_MAX_N}` }];
  const expected = spec.table();
  const shapes = partitionList(subject.n);
  const got: Table = new Map();
  for (const c of cells) {
    if (!c.multiplicities) return [{ check: spec.check, holds: null, detail: 'no Frobenius series' }];
    const m = new Map<string, bigint>();
    c.multiplicities.forEach((v, i) => v !== 0 && m.set(partitionKey(shapes[i]!), BigInt(v)));
    if (m.size) got.set(c.degree.join(','), m);
  }
  for (const key of new Set([...got.keys(), ...expected.keys()])) {
    const a = got.get(key) ?? new Map<string, bigint>();
    const b = expected.get(key) ?? new Map<string, bigint>();
    const bad = [...new Set([...a.keys(), ...b.keys()])].find((s) => (a.get(s) ?? 0n) !== (b.get(s) ?? 0n));
    if (bad !== undefined) {
      return [{ check: spec.check, holds: false, detail: `fails at degree ${key.replaceAll(',', '/')}: s[${bad}] has ${a.get(bad) ?? 0n} here, ${b.get(bad) ?? 0n} in the formula` }];
    }
  }
  return [{ check: spec.check, holds: true, detail: `every coefficient of every cell agrees (${expected.size} nonzero cells)` }];
}

function formulaOf(s: DeltaSubject): { check: string; table: () => Table } | undefined {
  const n = s.n;
  if (s.kind === 'polarized') return { check: `Frobenius series equals Δ′_{e_${s.k - 1}} e_${n}`, table: () => deltaTable(n, [s.k], true, false, false) };
  if (s.ideal === 'coinvariant') {
    const ks = s.theta ? Array.from({ length: n }, (_, i) => i + 1) : [n];
    const what = s.theta ? `Σ_k z^(${n}−k) Δ′_{e_(k−1)} e_${n}` : `∇e_${n}`;
    return { check: `Frobenius series equals ${what}${s.y ? '' : ' at t = 0'}`, table: () => deltaTable(n, ks, s.y, false, true) };
  }
  const k = s.k;
  if (s.ideal === 'generalized-coinvariant' && k !== undefined) {
    return { check: `Frobenius series equals rev_q ω (Δ′_{e_${k - 1}} e_${n} at t = 0)`, table: () => deltaTable(n, [k], false, true, false) };
  }
  return undefined;
}

/**
 * Δ′_{e_{k−1}} e_n for each k, at cells (a, b, n − k) when `thetaFromK` (else θ-degree 0); with
 * `reverse`, rev_q ω of the t = 0 part.
 */
function deltaTable(n: number, ks: readonly number[], withT: boolean, reverse: boolean, thetaFromK: boolean): Table {
  const out: Table = new Map();
  for (const k of ks) {
    const f = deltaPrimeOfEn(k === 1 ? SymFun.one : SymFun.basisElement('e', [k - 1]), n);
    const terms: [number, number, string, bigint][] = [];
    for (const [shape, c] of f.schurTerms()) {
      for (const [a, b, v] of c.toPoly().terms()) {
        if (v === 0n || (!withT && b !== 0)) continue;
        terms.push([a, b, shape, v]);
      }
    }
    const top = Math.max(0, ...terms.map((t) => t[0]));
    for (const [a, b, shape, v] of terms) {
      const c = thetaFromK ? n - k : 0;
      const key = `${reverse ? top - a : a},${b},${c}`;
      const s = reverse ? partitionKey(conjugate(shape.split(',').map(Number))) : shape;
      const m = out.get(key) ?? new Map<string, bigint>();
      m.set(s, (m.get(s) ?? 0n) + v);
      out.set(key, m);
    }
  }
  return out;
}
