/**
 * A cost estimate before starting, in units of about 4·10^-8 s of processor time (one seed
 * term and operator monomial visited by the enumeration), with a rough time calibrated on this code (measured in the
 * benchmark). Two parts for the subgroup route: the enumeration (pairs of seed term and
 * operator monomial visited, shrunk by the plan's group orders) and the eliminations, from
 * the sizes of the matrices: the operator and target monomials of every cell are the
 * S_n-orbits of the divisors of the seed's terms, counted exactly from one term per orbit,
 * and each task divides both sides by its group order.
 */
import { derivativeFamilies, type OperatorFamily } from './operators.js';
import type { SeedSupport } from './seed-support.js';
import type { SeedTerms } from './seeds.js';
import { groupOrder, youngPlan } from './young-plan.js';

// measured on the derivative route (Vandermonde n = 8 and 9, δ_{8,k}; both primes, CPU time)
export const SECONDS_PER_UNIT = 4e-8;
const SECONDS_PER_ELIMINATION_UNIT = 2e-10;
// iterated closures: measured on δ_{6,6} with P_1..P_5 (about 400 s of CPU, both primes)
const SECONDS_PER_UNIT_POLAR = 4e-6;
// polarized closures by the derivative route: per (unit of one seed's closure, candidate seed P_J f)
const SECONDS_PER_POLARIZED_PAIR = 3e-6;
/** Orbits of seed terms looked at for the matrix sizes (antisymmetrized seeds have one). */
const MAX_ORBITS = 64;
/** Divisor steps walked for the matrix sizes before scaling up from the terms seen. */
const MAX_STEPS = 500_000;

export interface ModuleWork {
  readonly units: number;
  readonly seconds: number;
}

/**
 * Routes: 'young' (derivative closures), 'polarized' (polarizations normal-ordered into the
 * derivative closures of the seeds P_J f), 'iterated' (anything else).
 */
export function estimateModuleWork(seed: SeedSupport, ops: readonly OperatorFamily[], route: 'young' | 'polarized' | 'iterated', mirrored = false, symmetric = true): ModuleWork {
  const n = seed.space.n;
  if (route === 'polarized') {
    // one derivative closure per candidate seed P_J f: the multisets J of the polarization
    // orders with Σ J ≤ the x-degree (measured on δ_{6,k} and δ_{7,3}: within a factor 5 above)
    const single = estimateModuleWork(seed, ops, 'young', false, symmetric);
    const orders = ops.flatMap((o) => (o.kind === 'polar' ? [o.order] : []));
    const seconds = single.units * multisetsUpTo(orders, seed.degree[0]) * SECONDS_PER_POLARIZED_PAIR;
    return { units: seconds / SECONDS_PER_UNIT, seconds };
  }
  // Σ over the terms of their divisor boxes: the pairs (term, operator monomial) enumerated
  let boxes = 0;
  for (let t = 0; t < seed.count; t++) boxes += termBox(seed.xs.subarray(t * n, t * n + n), seed.ys.subarray(t * n, t * n + n), seed.masks[t] ?? 0);
  if (route !== 'young') return iteratedWork(boxes, n, ops);
  // a seed S_n does not act on is one task over the trivial group, its matrices whole
  const units = symmetric ? boxes * planShrink(n, mirrored) : boxes;
  const plan = symmetric ? youngPlan(n, mirrored).filter((t) => t.mirrorOf === undefined) : [{ blocks: new Array<number>(n).fill(1) }];
  const sizes = cellSizes(seed, derivativeFamilies(ops), symmetric);
  let elimination = 0;
  for (const t of plan) {
    const g = groupOrder(t.blocks);
    for (const [rowsAll, colsAll] of sizes) {
      const rows = rowsAll / g;
      const cols = colsAll / g;
      elimination += rows * cols * Math.min(rows, cols);
    }
  }
  // the eliminations in enumeration units, so one limit covers both parts
  const total = units + (elimination * SECONDS_PER_ELIMINATION_UNIT) / SECONDS_PER_UNIT;
  return { units: total, seconds: total * SECONDS_PER_UNIT };
}

/** Divisors of one term x^a y^b θ_S: Π (a_i + 1)(b_i + 1) · 2^|S|. */
function termBox(xs: ArrayLike<number>, ys: ArrayLike<number>, mask: number): number {
  let box = 1;
  for (let i = 0; i < xs.length; i++) box *= (xs[i]! + 1) * ((ys[i] ?? 0) + 1) * ((mask >> i) & 1 ? 2 : 1);
  return box;
}

/** Σ 1/|G| over the computed tasks of the plan (mirrored tasks cost nothing). */
function planShrink(n: number, mirrored: boolean): number {
  let shrink = 0;
  for (const t of youngPlan(n, mirrored)) if (t.mirrorOf === undefined) shrink += 1 / groupOrder(t.blocks);
  return shrink;
}

function iteratedWork(boxes: number, n: number, ops: readonly OperatorFamily[]): ModuleWork {
  const polar = ops.some((o) => o.kind === 'polar');
  const steps = boxes * ops.length * (polar ? 4 * n : 1);
  const units = (steps * SECONDS_PER_UNIT_POLAR) / SECONDS_PER_UNIT;
  return { units, seconds: units * SECONDS_PER_UNIT };
}

/** n! / Π (multiplicity of each variable's (x, y, θ) column)!: the monomials in a term's S_n-orbit. */
function orbitSize(t: { readonly x: readonly number[]; readonly y: readonly number[]; readonly mask: number }, n: number): number {
  const counts = new Map<string, number>();
  for (let i = 0; i < n; i++) {
    const key = `${t.x[i] ?? 0},${t.y[i] ?? 0},${(t.mask >> i) & 1}`;
    counts.set(key, (counts.get(key) ?? 0) + 1);
  }
  let size = 1;
  let k = 0;
  for (const c of counts.values()) for (let j = 1; j <= c; j++) size = (size * ++k) / j;
  return size;
}

/**
 * Before the seed is built (which for a symmetrized seed holds up to n! terms per typed term):
 * a bound of the enumeration work from the typed terms alone, so that a request far past the
 * limit is refused at once instead of after minutes of building. Elimination is left out: the
 * full estimate follows once the seed is built.
 */
export function preEstimateWork(terms: SeedTerms, n: number, ops: readonly OperatorFamily[], route: 'young' | 'polarized' | 'iterated'): ModuleWork {
  let boxes = 0;
  // a symmetrized term spreads over its S_n-orbit, n!/|stabilizer| terms of the same box
  for (const t of terms.raw.values()) boxes += termBox(t.x, t.y, t.mask) * (terms.symmetrizer === 'none' ? 1 : orbitSize(t, n));
  if (route === 'iterated') return iteratedWork(boxes, n, ops);
  // with the mirrored (smaller) plan this stays below the full estimate: refusing on it is safe
  const units = boxes * planShrink(n, true);
  if (route === 'young') return { units, seconds: units * SECONDS_PER_UNIT };
  const orders = ops.flatMap((o) => (o.kind === 'polar' ? [o.order] : []));
  let xDegree = 0;
  for (const t of terms.raw.values()) xDegree = Math.max(xDegree, t.x.reduce((a, b) => a + b, 0));
  const seconds = units * multisetsUpTo(orders, xDegree) * SECONDS_PER_POLARIZED_PAIR;
  return { units: seconds / SECONDS_PER_UNIT, seconds };
}

/**
 * (operator monomials, target monomials) of every cell: for a symmetric seed, whole S_n-orbits
 * of the divisors of the seed's terms (one term per orbit); otherwise the divisors themselves.
 * Past a budget of steps the counts are scaled by the share of terms seen.
 */
export function cellSizes(seed: SeedSupport, fam: { x: boolean; y: boolean; theta: boolean }, symmetric = true): [number, number][] {
  const n = seed.space.n;
  const fact = [1];
  for (let i = 1; i <= n; i++) fact.push(fact[i - 1]! * i);
  const orbitSize = (letters: number[]): number => {
    let s = fact[n]!;
    let run = 1;
    for (let i = 1; i <= n; i++) {
      if (i < n && letters[i] === letters[i - 1]) run++;
      else {
        s /= fact[run]!;
        run = 1;
      }
    }
    return s;
  };
  const seenTerms = new Set<string>();
  const ops = new Map<number, Map<number, number>>();
  const targets = new Map<number, Map<number, number>>();
  const sorted = new Array<number>(n).fill(0);
  // orbit key: the sorted letters hashed mod a prime below 2^44 (letters < 2^9, so no
  // overflow of 2^53); a collision would only miscount an estimate
  const HASH_P = 17592186044399;
  const note = (table: Map<number, Map<number, number>>, cell: number, letters: number[]): void => {
    for (let i = 0; i < n; i++) {
      const l = letters[i]!;
      let j = i - 1;
      while (j >= 0 && sorted[j]! > l) {
        sorted[j + 1] = sorted[j]!;
        j--;
      }
      sorted[j + 1] = l;
    }
    let key = 0;
    for (let i = 0; i < n; i++) key = (key * 512 + (symmetric ? sorted[i]! : letters[i]!)) % HASH_P;
    let m = table.get(cell);
    if (!m) table.set(cell, (m = new Map()));
    if (!m.has(key)) m.set(key, symmetric ? orbitSize(sorted) : 1);
  };
  const R = seed.space.radix;
  let steps = 0;
  let t = 0;
  for (; t < seed.count && seenTerms.size < (symmetric ? MAX_ORBITS : Infinity) && steps < MAX_STEPS; t++) {
    const x = Array.from(seed.xs.subarray(t * n, (t + 1) * n));
    const y = Array.from(seed.ys.subarray(t * n, (t + 1) * n));
    const th = Array.from({ length: n }, (_, i) => (seed.masks[t]! >> i) & 1);
    const columns = x.map((v, i) => (v * R + y[i]!) * 2 + th[i]!);
    const orbitKey = (symmetric ? [...columns].sort((a, b) => a - b) : columns).join(',');
    if (seenTerms.has(orbitKey)) continue;
    seenTerms.add(orbitKey);
    const op = new Array<number>(n).fill(0);
    const tg = new Array<number>(n).fill(0);
    const walk = (i: number, dx: number, dy: number, dt: number): void => {
      if (i === n) {
        steps++;
        const cell = (dx * 1024 + dy) * 1024 + dt;
        note(ops, cell, op);
        note(targets, cell, tg);
        return;
      }
      for (let a = 0; a <= (fam.x ? x[i]! : 0); a++)
        for (let b = 0; b <= (fam.y ? y[i]! : 0); b++)
          for (let c = 0; c <= (fam.theta ? th[i]! : 0); c++) {
            op[i] = (a * R + b) * 2 + c;
            tg[i] = ((x[i]! - a) * R + (y[i]! - b)) * 2 + (th[i]! - c);
            walk(i + 1, dx + a, dy + b, dt + c);
          }
    };
    walk(0, 0, 0, 0);
  }
  // terms not looked at (budget spent): scale as if they were like the ones seen
  const scale = !symmetric && t < seed.count ? seed.count / t : 1;
  const total = (m: Map<number, number> | undefined): number => scale * [...(m?.values() ?? [])].reduce((s, v) => s + v, 0);
  return [...targets.keys()].map((cell) => [total(ops.get(cell)), total(targets.get(cell))]);
}

/** Number of multisets of the given parts (with repetition) whose sum is at most `max`. */
export function multisetsUpTo(parts: readonly number[], max: number): number {
  const ways = new Array<number>(max + 1).fill(0);
  ways[0] = 1;
  for (const part of new Set(parts)) for (let m = part; m <= max; m++) ways[m]! += ways[m - part]!;
  return ways.reduce((s, w) => s + w, 0);
}
