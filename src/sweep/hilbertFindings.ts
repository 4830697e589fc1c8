/**
 * Findings on a seed's Hilbert series over its places: a product of q-integers, or a quotient
 * of such products (one formula
 * in n and k when there are several places, by src/match's cyclotomic recognition), else a
 * named q-analog ([K]_q!·Stir_q(N,K), Stir_q(N,K), [N choose K]_q, possibly q-reversed, with
 * N, K simple in n and k), and a recurrence with q-integer coefficients.
 */
import type { Poly } from '../core/poly.js';
import { qBinomial, qOrderedStirling, qStirling2 } from '../core/qanalogs.js';
import { recogniseFamily } from '../match/familyFormula.js';
import { asQProduct, productText, qProductText, type QProduct } from '../match/qProduct.js';
import { findRecurrences } from '../match/recurrence.js';
import { finding, FINDING_WEIGHT, placesText, type SweepFinding } from './findings.js';
import type { ModuleData } from './moduleData.js';

/** A genuine product reads as one: q-integers, not factorials with a denominator. */
function productTextOf(p: QProduct): string {
  const genuine = [...p.integers.values()].every((e) => e > 0);
  if (!genuine || [...p.factorials.values()].every((e) => e > 0)) return qProductText(p);
  const prefix = [...(p.content !== 1n ? [String(p.content)] : []), ...(p.qPower > 0 ? [p.qPower === 1 ? 'q' : `q^${p.qPower}`] : [])];
  return [...prefix, productText(p.integers, (m) => `[${m}]_q`)].join(' · ');
}

const EXACT = 'exact equality of every coefficient, each module confirmed by two primes';

interface Grading {
  readonly name: string;
  readonly of: (d: ModuleData) => Poly;
}

/** The single gradings looked at: by x-degree, and by total degree when there are other axes. */
export function gradings(data: readonly ModuleData[]): Grading[] {
  const list: Grading[] = [{ name: 'by x-degree', of: (d) => d.byX }];
  if (data.some((d) => d.axes.length > 1)) list.push({ name: 'by total degree', of: (d) => d.byTotal });
  return list;
}

function productFinding(data: readonly ModuleData[], g: Grading): SweepFinding | undefined {
  const products = data.map((d) => asQProduct(g.of(d)));
  // a constant (or c·q^s) is no formula: at least one q-integer factor somewhere
  if (products.some((p) => !p) || products.every((p) => p!.integers.size === 0)) return undefined;
  const places = data.map((d) => ({ n: d.n, ...(d.k !== undefined ? { k: d.k } : {}) }));
  // a genuine product Π [m]_q^{c_m}, c_m ≥ 0, at every place; else a quotient such as [n choose k]_q
  const kind = products.every((p) => [...p!.integers.values()].every((e) => e > 0)) ? 'product' : 'quotient';
  if (data.length >= 2) {
    const formula = recogniseFamily(data.map((d) => ({ n: d.n, ...(d.k !== undefined ? { k: d.k } : {}), poly: g.of(d) })));
    if (formula) return finding(kind, `Hilbert series ${g.name} = ${formula.text}`, `${EXACT}; one formula in n${data.some((d) => d.k !== undefined) ? ' and k' : ''} fitted and checked on ${placesText(places)}`, places);
  }
  const each = data.map((d, i) => `${data.length > 1 ? `n=${d.n}${d.k !== undefined ? `,k=${d.k}` : ''}: ` : ''}${productTextOf(products[i]!)}`);
  return finding(kind, `Hilbert series ${g.name} = ${each.join('; ')}`, `exact cyclotomic factorisation of every Hilbert series, each module confirmed by two primes`, places);
}

interface Named {
  readonly text: (N: string, K: string) => string;
  readonly value: (N: number, K: number) => Poly;
}

const NAMED: readonly Named[] = [
  { text: (N, K) => `[${K}]_q!·Stir_q(${N},${K})`, value: qOrderedStirling },
  { text: (N, K) => `Stir_q(${N},${K})`, value: qStirling2 },
  { text: (N, K) => `[${N} choose ${K}]_q`, value: qBinomial },
];

interface IndexMap {
  readonly N: string;
  readonly K: string;
  readonly at: (n: number, k: number | undefined) => [number, number] | undefined;
}

function indexMaps(hasK: boolean, single: ModuleData | undefined): IndexMap[] {
  const ns: [string, number][] = [['n', 0], ['n-1', -1], ['n+1', 1]];
  const out: IndexMap[] = [];
  if (hasK) {
    const ks: [string, (n: number, k: number) => number][] = [['k', (_n, k) => k], ['n-k', (n, k) => n - k], ['k-1', (_n, k) => k - 1], ['k+1', (_n, k) => k + 1], ['n-k+1', (n, k) => n - k + 1]];
    for (const [N, dn] of ns) for (const [K, f] of ks) out.push({ N, K, at: (n, k) => [n + dn, f(n, k ?? 0)] });
  } else if (single) {
    // one place: every K at this n (N = n), the formula's K written as a number
    for (let K = 1; K <= single.n; K++) out.push({ N: 'n', K: String(K), at: (n) => [n, K] });
  } else {
    for (const [N, dn] of ns) for (let c = 0; c <= 3; c++) out.push({ N, K: c === 0 ? 'n' : `n-${c}`, at: (n) => [n + dn, n - c] });
  }
  return out;
}

function namedFinding(data: readonly ModuleData[], g: Grading): SweepFinding | undefined {
  const hasK = data.some((d) => d.k !== undefined);
  if (!hasK && data.length > 1 && data.length < 3) return undefined; // two places of a family in n alone prove little
  const polys = data.map(g.of);
  for (const map of indexMaps(hasK, data.length === 1 ? data[0] : undefined)) {
    for (const named of NAMED) {
      for (const reversed of [false, true]) {
        let products = 0;
        const ok = data.every((d, i) => {
          const idx = map.at(d.n, d.k);
          if (!idx || idx[0] < 0 || idx[1] < 0) return false;
          const v = named.value(idx[0], idx[1]);
          if (v.isZero()) return false;
          if (asQProduct(v)) products++;
          return (reversed ? v.reverseQ() : v).equals(polys[i]!);
        });
        // where every value is a product of q-integers (or a constant) the product finding says more
        if (!ok || products === data.length) continue;
        const places = data.map((d) => ({ n: d.n, ...(d.k !== undefined ? { k: d.k } : {}) }));
        const body = named.text(map.N, map.K);
        return finding('q-analog', `Hilbert series ${g.name} = ${reversed ? `rev_q(${body})` : body}`, `${EXACT}, against the q-analog (q-Stirling numbers by their recurrence), on ${placesText(places)}`, places);
      }
    }
  }
  return undefined;
}

function recurrenceFinding(data: readonly ModuleData[], g: Grading): SweepFinding | undefined {
  if (data.length < 3) return undefined;
  const recs = findRecurrences(data.map((d) => ({ n: d.n, ...(d.k !== undefined ? { k: d.k } : {}), poly: g.of(d) })));
  const r = recs[0];
  if (!r) return undefined;
  const places = data.map((d) => ({ n: d.n, ...(d.k !== undefined ? { k: d.k } : {}) }));
  return finding('recurrence', `Hilbert series ${g.name}: ${r.text}${r.name ? ` (${r.name})` : ''}`, `checked on the ${r.checked} places whose predecessors were computed (f(n,0) = 0 and f(n,k) = 0 for k > n)`, places);
}

/** Product, named q-analog and recurrence findings, the first grading that gives each. */
export function hilbertFindings(data: readonly ModuleData[]): SweepFinding[] {
  if (data.length === 0) return [];
  const out: SweepFinding[] = [];
  const gs = gradings(data);
  const products = gs.map((g) => productFinding(data, g)).filter((f): f is SweepFinding => f !== undefined);
  // both gradings in one finding, of the stronger kind (a product before a quotient)
  products.sort((a, b) => FINDING_WEIGHT[b.kind] - FINDING_WEIGHT[a.kind]);
  if (products.length) out.push(products.length === 1 ? products[0]! : { ...products[0]!, claim: products.map((p) => p.claim).join('; ') });
  else {
    const named = gs.map((g) => namedFinding(data, g)).find(Boolean);
    if (named) out.push(named);
  }
  const rec = gs.map((g) => recurrenceFinding(data, g)).find(Boolean);
  if (rec) out.push(rec);
  return out;
}
