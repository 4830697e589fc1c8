/**
 * Kostka–Foulkes polynomials by charge (Lascoux–Schützenberger):
 * K_{λμ}(t) = Σ_{T ∈ SSYT(λ, μ)} t^{charge(T)}, and the modified Hall–Littlewood functions
 * H̃_μ(X;t) = Σ_λ t^{n(μ)} K_{λμ}(1/t) s_λ (cocharge), which equal H̃_μ(X;0,t).
 */
import { LimitError } from '../core/errors.js';
import { checkPartition, nStat, partitionKey, partitionList, size, type Partition } from '../core/partitions.js';
import { Poly } from '../core/poly.js';
import { PolyQ } from '../core/polyq.js';
import { SymFun } from './symfun.js';

export const HALL_LITTLEWOOD_MAX_N = 12;

/** Semistandard tableaux of shape λ and content μ, as rows (English). */
export function* semistandardTableaux(lambda: Partition, mu: Partition): Generator<number[][]> {
  const rows: number[][] = lambda.map(() => []);
  function* rec(letter: number): Generator<number[][]> {
    if (letter > mu.length) {
      if (rows.every((r, i) => r.length === lambda[i])) yield rows.map((r) => r.slice());
      return;
    }
    // add a horizontal strip of μ_letter copies of `letter`
    const k = mu[letter - 1]!;
    const adds = new Array<number>(rows.length).fill(0);
    function* place(i: number, left: number): Generator<number[][]> {
      if (i === rows.length) {
        if (left > 0) return;
        for (let r = 0; r < rows.length; r++) for (let c = 0; c < adds[r]!; c++) rows[r]!.push(letter);
        yield* rec(letter + 1);
        for (let r = 0; r < rows.length; r++) rows[r]!.length -= adds[r]!;
        return;
      }
      const cur = rows[i]!.length;
      const limit = i === 0 ? lambda[0]! : rows[i - 1]!.length; // strip: stays under the old row above
      const max = Math.min(left, limit - cur, lambda[i]! - cur);
      for (let a = max; a >= 0; a--) {
        adds[i] = a;
        yield* place(i + 1, left - a);
      }
      adds[i] = 0;
    }
    yield* place(0, k);
  }
  yield* rec(1);
}

/** Charge of a word whose content is a partition (letters 1..m). */
export function charge(word: readonly number[]): number {
  const w = word.slice();
  const alive = w.map(() => true);
  let total = 0;
  let remaining = w.length;
  while (remaining > 0) {
    // extract a standard subword: 1 scanning leftwards from the right end, then 2, … cyclically
    let pos = w.length;
    let index = 0;
    let letter = 1;
    for (;;) {
      let found = -1;
      for (let p = pos - 1; p >= 0; p--) if (alive[p] && w[p] === letter) { found = p; break; }
      if (found < 0) {
        for (let p = w.length - 1; p > pos; p--) if (alive[p] && w[p] === letter) { found = p; break; }
        if (found < 0) break;
        if (letter > 1) index++; // wrapped around: letter lies to the right of its predecessor
      }
      total += index;
      alive[found] = false;
      remaining--;
      pos = found;
      letter++;
    }
  }
  return total;
}

/** The reading word of a tableau: rows from bottom to top, each left to right. */
export function readingWord(rows: readonly (readonly number[])[]): number[] {
  return [...rows].reverse().flat();
}

const kfCache = new Map<string, Poly>();

/** K_{λμ}(t) as a polynomial in t. */
export function kostkaFoulkes(lambda: Partition, mu: Partition): Poly {
  checkPartition(lambda, 'lambda');
  checkPartition(mu, 'mu');
  if (size(lambda) !== size(mu)) return Poly.zero;
  if (size(mu) > HALL_LITTLEWOOD_MAX_N) throw new LimitError(`Kostka–Foulkes polynomials enumerate tableaux; n = ${size(mu)} is above ${HALL_LITTLEWOOD_MAX_N}`);
  const key = `${partitionKey(lambda)}|${partitionKey(mu)}`;
  let hit = kfCache.get(key);
  if (!hit) {
    const m = new Map<number, bigint>();
    for (const T of semistandardTableaux(lambda, mu)) {
      const c = charge(readingWord(T));
      m.set(c, (m.get(c) ?? 0n) + 1n);
    }
    hit = Poly.fromTerms([...m].map(([e, c]) => [0, e, c] as const));
    kfCache.set(key, hit);
  }
  return hit;
}

/** H̃_μ(X;t) = Σ_λ t^{n(μ)} K_{λμ}(1/t) s_λ. */
export function modifiedHallLittlewood(mu: Partition): SymFun {
  const n = size(mu);
  const top = nStat(mu);
  return SymFun.fromBasis(
    's',
    partitionList(n).map((l) => {
      const k = kostkaFoulkes(l, mu);
      return [l, PolyQ.of(Poly.fromTerms([...k.terms()].map(([, e, c]) => [0, top - e, c] as const)))] as const;
    }),
  );
}
