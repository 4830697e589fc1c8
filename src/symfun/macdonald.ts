/**
 * Modified Macdonald polynomials H̃_μ(X;q,t) by the filling formula of Haglund–Haiman–Loehr
 * (A combinatorial formula for Macdonald polynomials, J. Amer. Math. Soc. 18 (2005)), summed
 * over standard fillings as Σ q^inv t^maj F_{iDes(reading word)}:
 * a filling with repeated entries standardises (equal entries increasing in reading order)
 * without changing inv or maj. The fillings are generated cell by cell in reading order
 * with inv, maj and the inverse descent set kept incrementally, tallied in plain numbers,
 * then turned into Schur coefficients through fundamentalToSchur's route (done here on
 * number arrays). Results are cached per μ.
 */
import { LimitError } from '../core/errors.js';
import { checkPartition, partitionKey, partitionList, size, type Partition } from '../core/partitions.js';
import { Poly, packExponents } from '../core/poly.js';
import { PolyQ } from '../core/polyq.js';
import { cellStats } from './cell-data.js';
import { inverseKostkaMatrix } from './kostka.js';
import { compositionMask, maskComposition } from './quasisym.js';
import { SymFun } from './symfun.js';

export const MACDONALD_MAX_N = 10;

interface Layout {
  readonly n: number;
  /** cells in reading order: rows top to bottom, left to right */
  readonly attackers: readonly (readonly number[])[]; // earlier cells attacking each cell
  readonly below: readonly number[]; // reading index of the cell directly below, or −1
  readonly majWeight: readonly number[]; // leg + 1 of the cell
  readonly arm: readonly number[];
  readonly invMax: number;
  readonly majMax: number;
}

function layout(mu: Partition): Layout {
  const stats = cellStats(mu);
  const rows = mu.length;
  const order: number[] = [];
  const pos = new Map<string, number>();
  for (let r = rows - 1; r >= 0; r--)
    for (let j = 0; j < mu[r]!; j++) {
      pos.set(`${r},${j}`, order.length);
      order.push(stats.findIndex((c) => c.coleg === r && c.coarm === j));
    }
  const attackers: number[][] = [];
  const below: number[] = [];
  const majWeight: number[] = [];
  const arm: number[] = [];
  let invMax = 0;
  let majMax = 0;
  order.forEach((si, idx) => {
    const c = stats[si]!;
    const att: number[] = [];
    for (let j = 0; j < c.coarm; j++) att.push(pos.get(`${c.coleg},${j}`)!); // same row, to the left
    // the row above comes earlier; an upper cell strictly right of this one attacks it
    const upLen = mu[c.coleg + 1] ?? 0;
    for (let j = c.coarm + 1; j < upLen; j++) att.push(pos.get(`${c.coleg + 1},${j}`)!);
    attackers.push(att);
    invMax += att.length;
    below.push(c.coleg > 0 ? pos.get(`${c.coleg - 1},${c.coarm}`)! : -1);
    majWeight.push(c.leg + 1);
    arm.push(c.arm);
    if (c.coleg > 0) majMax += c.leg + 1;
  });
  return { n: order.length, attackers, below, majWeight, arm, invMax, majMax };
}

/** Dense tally [mask][inv][maj] of all standard fillings. */
function tally(L: Layout): Float64Array {
  const { n, attackers, below, majWeight, arm, invMax, majMax } = L;
  const W = majMax + 1;
  const H = invMax + 1;
  const acc = new Float64Array((n === 0 ? 1 : 1 << (n - 1)) * H * W);
  const entry = new Int32Array(n);
  const usedAt = new Uint8Array(n + 2); // usedAt[v] = 1 when value v is placed
  // a descent at an upper cell is decided when the cell below is filled
  const rec = (idx: number, inv: number, maj: number, mask: number): void => {
    if (idx === n) {
      if (inv < 0 || inv > invMax) throw new Error(`internal: inv = ${inv} outside 0..${invMax}`);
      acc[(mask * H + inv) * W + maj]! += 1;
      return;
    }
    const att = attackers[idx]!;
    for (let v = 1; v <= n; v++) {
      if (usedAt[v]) continue;
      let dInv = 0;
      for (const a of att) if (entry[a]! > v) dInv++;
      let dMaj = 0;
      const up = upperOf[idx]!;
      if (up >= 0 && entry[up]! > v) {
        dMaj = majWeight[up]!;
        dInv -= arm[up]!;
      }
      let m = mask;
      if (v > 1 && !usedAt[v - 1]) m |= 1 << (v - 2); // v before v−1 ⇒ v−1 ∈ iDes
      if (v < n && usedAt[v + 1]) m |= 1 << (v - 1); // v+1 before v ⇒ v ∈ iDes
      entry[idx] = v;
      usedAt[v] = 1;
      rec(idx + 1, inv + dInv, maj + dMaj, m);
      usedAt[v] = 0;
    }
  };
  const upperOf = new Int32Array(n).fill(-1);
  below.forEach((bl, u) => {
    if (bl >= 0) upperOf[bl] = u;
  });
  rec(0, 0, 0, 0);
  return acc;
}

const cache = new Map<string, readonly Poly[]>();

/** Schur coefficients of H̃_μ as integer polynomials, in partitionList(|μ|) order (cached). */
export function modifiedMacdonaldSchur(mu: Partition): readonly Poly[] {
  checkPartition(mu, 'mu');
  const n = size(mu);
  if (n > MACDONALD_MAX_N) throw new LimitError(`H̃_μ needs |μ|! fillings; |μ| = ${n} is above the limit ${MACDONALD_MAX_N}`);
  const key = partitionKey(mu);
  const hit = cache.get(key);
  if (hit) return hit;
  const L = layout(mu);
  const acc = tally(L);
  const H = L.invMax + 1;
  const W = L.majMax + 1;
  const block = H * W;
  const size2 = n === 0 ? 1 : 1 << (n - 1);
  // zeta transform over subsets in place: block T ← Σ_{S ⊆ T} block S (the M_T coefficients)
  for (let b = 0; b < n - 1; b++)
    for (let T = 0; T < size2; T++)
      if (T & (1 << b)) {
        const src = (T ^ (1 << b)) * block;
        const dst = T * block;
        for (let i = 0; i < block; i++) acc[dst + i]! += acc[src + i]!;
      }
  const ps = partitionList(n);
  // symmetry check on every composition (a bug check: the filling sum is symmetric)
  for (let T = 0; T < size2; T++) {
    const sorted = maskComposition(n, T).sort((a, b) => b - a);
    const ref = compositionMask(sorted) * block;
    for (let i = 0; i < block; i++) {
      if (acc[T * block + i] !== acc[ref + i]) throw new Error(`internal: filling sum for H̃_${key} is not symmetric`);
    }
  }
  const Ki = inverseKostkaMatrix(n);
  const out: Poly[] = ps.map((_l, j) => {
    const m = new Map<number, bigint>();
    ps.forEach((p, i) => {
      const k = Ki[i]![j]!;
      if (k === 0n) return;
      const base = compositionMask(p) * block;
      for (let inv = 0; inv < H; inv++)
        for (let maj = 0; maj < W; maj++) {
          const c = acc[base + inv * W + maj]!;
          if (c === 0) continue;
          const pk = packExponents(inv, maj);
          m.set(pk, (m.get(pk) ?? 0n) + k * BigInt(c));
        }
    });
    return Poly.fromPackedMap(m);
  });
  cache.set(key, out);
  return out;
}

/** H̃_μ(X;q,t) as a symmetric function. */
export function modifiedMacdonald(mu: Partition): SymFun {
  const coeffs = modifiedMacdonaldSchur(mu);
  const ps = partitionList(size(mu));
  return SymFun.fromBasis('s', ps.map((l, i) => [l, PolyQ.of(coeffs[i]!)] as const));
}

