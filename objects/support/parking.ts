/**
 * Labelled Dyck path helpers: labelling the runs of north steps, the shuffle-theorem
 * reading word, and uniform sampling by Pollak's circular argument.
 */
import type { DyckPath, LabelledDyckPath } from '../types.js';
import { areaSequence, northColumns } from './dyck.js';
import { randomBelow } from './random.js';

/** Lengths of the maximal runs of north steps (the columns of the path), bottom up. */
export function northRuns(path: DyckPath): number[] {
  const runs: number[] = [];
  let prev = 0;
  for (const s of path) {
    if (s === 1) {
      if (prev === 1) runs[runs.length - 1]!++;
      else runs.push(1);
    }
    prev = s;
  }
  return runs;
}

/**
 * Writes into `labels` the labelling where car c sits in run runOf[c−1], each run's cars
 * increasing upward. `runStart[j]` is the first row (0-based) of run j; `fill` is scratch.
 */
export function labelRuns(runOf: readonly number[], runStart: readonly number[], fill: number[], labels: number[]): void {
  for (let j = 0; j < runStart.length; j++) fill[j] = runStart[j]!;
  for (let c = 1; c <= runOf.length; c++) labels[fill[runOf[c - 1]!]!++] = c;
}

/**
 * The reading word of the shuffle theorem: cars read diagonal by diagonal from the one
 * farthest from the main diagonal down to the main diagonal, each diagonal from its
 * highest row to its lowest (Haglund, The q,t-Catalan numbers and the space of diagonal
 * harmonics, AMS 2008, ch. 5; from memory, checked against ∇e_2 and ∇e_3 in the tests).
 * The Frobenius-level sum uses F_{iDes(word)}.
 */
export function parkingReadingWord(p: LabelledDyckPath): number[] {
  const a = areaSequence(p.path);
  const rows = a.map((_, r) => r).sort((r, s) => a[s]! - a[r]! || s - r);
  return rows.map((r) => p.labels[r]!);
}

/**
 * A uniform parking function: n cars with random preferred spots on a circle of n+1
 * spots park (moving on when taken); rotating so that the empty spot comes last gives a
 * parking function, each one from exactly n+1 preference lists (Pollak's argument, as in
 * Stanley EC2 ch. 5 exercises — from memory; the contract tests check fairness). Car c's preference j puts it in column j of the path.
 */
export function randomParkingFunction(n: number, random: () => number): LabelledDyckPath {
  const pref = Array.from({ length: n }, () => randomBelow(random, n + 1));
  const taken = new Uint8Array(n + 1);
  for (const p of pref) {
    let s = p;
    while (taken[s]) s = (s + 1) % (n + 1);
    taken[s] = 1;
  }
  const empty = taken.indexOf(0);
  const byColumn: number[][] = Array.from({ length: n }, () => []);
  pref.forEach((p, i) => byColumn[(p - empty - 1 + 2 * (n + 1)) % (n + 1)]!.push(i + 1));
  const path: (0 | 1)[] = [];
  const labels: number[] = [];
  for (const cars of byColumn) {
    for (const c of cars) {
      path.push(1);
      labels.push(c);
    }
    path.push(0);
  }
  return { path, labels };
}

/** Checks the labelling: a permutation of 1..n increasing up each run of north steps. */
export function isValidLabelling(p: LabelledDyckPath): boolean {
  const cols = northColumns(p.path);
  const n = cols.length;
  if (p.labels.length !== n) return false;
  const seen = new Set(p.labels);
  if (seen.size !== n || p.labels.some((x) => !Number.isInteger(x) || x < 1 || x > n)) return false;
  for (let r = 1; r < n; r++) if (cols[r] === cols[r - 1] && p.labels[r]! < p.labels[r - 1]!) return false;
  return true;
}
