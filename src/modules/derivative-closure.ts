/**
 * Derivative closures (operators ∂x, ∂y, ∂θ only): every graded piece is the image of the
 * map g ↦ g(∂)f; its Frobenius multiplicities come from Young-subgroup ranks (young-plan),
 * its dimension as Σ_λ f^λ m_λ. For a seed that is neither symmetric nor antisymmetric only
 * the plain rank (no symmetry reduction, no Frobenius series) is computed. One enumeration
 * of the matrices serves every prime when the entries are exact integers below 2^53.
 */
import { fLambda, partitionList } from '../core/partitions.js';
import { EchelonModP } from './echelon-mod-p.js';
import { boxIndex, DerivativeMatrixBuilder, type CellMatrix, type DegreeBox, type SeedChi } from './derivative-matrices.js';
import type { ModuleCell } from './module-cell.js';
import type { SeedSupport } from './seed-support.js';
import { solveMultiplicities, youngPlan, type YoungTask } from './young-plan.js';

export interface DerivativeOps {
  readonly x: boolean;
  readonly y: boolean;
  readonly theta: boolean;
}

export interface ClosureHooks {
  readonly onProgress?: (done: number, total: number, label: string) => void;
  readonly signal?: AbortSignal;
  /** Called as each task finishes, with its ranks per prime (checkpoints). */
  readonly onTask?: (task: number, ranks: number[][]) => void;
}

/**
 * The tasks for a seed of this character; `mirrored` (see mirrorHolds) pairs tasks whose ranks
 * are each other's read backwards, which pays for a seed with the sign character.
 */
export function closurePlan(n: number, chi: SeedChi, mirrored = false): readonly YoungTask[] {
  return chi === 0 ? [{ blocks: new Array<number>(n).fill(1), modes: new Array<'sym'>(n).fill('sym'), pairing: [], label: 'all' }] : youngPlan(n, mirrored && chi === -1);
}

/**
 * Degree d and D − d are transposes of each other (young-plan) when there is one seed and the
 * operators differentiate in every kind of variable it has.
 */
export function mirrorHolds(seeds: readonly SeedSupport[], ops: DerivativeOps): boolean {
  if (seeds.length !== 1) return false;
  const [dx, dy, dt] = seeds[0]!.degree;
  return (dx === 0 || ops.x) && (dy === 0 || ops.y) && (dt === 0 || ops.theta);
}

/** Indices of the tasks that are computed (not read off a mirror). */
export function computedTasks(plan: readonly YoungTask[]): number[] {
  return plan.flatMap((t, i) => (t.mirrorOf === undefined ? [i] : []));
}

/** The box of target degrees reached from the seeds (ranges start at 0). */
export function degreeBox(seeds: readonly SeedSupport[]): DegreeBox {
  return {
    x: Math.max(...seeds.map((s) => s.degree[0])) + 1,
    y: Math.max(...seeds.map((s) => s.degree[1])) + 1,
    theta: Math.max(...seeds.map((s) => s.degree[2])) + 1,
  };
}

/**
 * Ranks of every cell for every task, one array per prime: ranks[prime][task][cell], cells in
 * the degree box of the seeds. The seeds hold exact integers (modulus 0) or residues mod the
 * single prime given.
 */
export function derivativeRanks(
  seeds: readonly SeedSupport[],
  ops: DerivativeOps,
  chi: SeedChi,
  primes: readonly number[],
  modulus: number,
  hooks: ClosureHooks = {},
  tasks?: readonly number[],
): number[][][] {
  const space = seeds[0]!.space;
  const plan = closurePlan(space.n, chi, mirrorHolds(seeds, ops));
  const box = degreeBox(seeds);
  const which = (tasks ?? plan.map((_, i) => i)).filter((i) => plan[i]!.mirrorOf === undefined);
  const out = primes.map(() => plan.map(() => [] as number[]));
  let done = 0;
  for (const ti of which) {
    hooks.signal?.throwIfAborted();
    // seeds carrying a second prime's coefficients: one enumeration makes both primes' entries
    const dual = seeds.length > 1 && primes.length === 2 && modulus === primes[0] && seeds.every((s) => s.coeffs2);
    if (seeds.length > 1 && primes.length > 1 && !dual) throw new RangeError('several seeds with several primes need the seeds’ coefficients for both primes');
    const builder = new DerivativeMatrixBuilder(space, box, plan[ti]!, chi, modulus, seeds.length === 1, dual ? primes[1] : 0);
    if (seeds.length === 1) {
      builder.addSeed(seeds[0]!, ops);
      primes.forEach((p, pi) => {
        out[pi]![ti] = builder.cells.map((m) => matrixRank(m, p));
      });
    } else {
      const ranks = incrementalRanks(builder, seeds, ops, primes, hooks.signal);
      primes.forEach((_, pi) => (out[pi]![ti] = ranks[pi]!));
    }
    hooks.onTask?.(ti, out.map((perPrime) => perPrime[ti]!));
    done++;
    hooks.onProgress?.(done, which.length, `task ${plan[ti]!.label}`);
  }
  return out;
}

/** Entries held before the rows gathered so far go into the echelons (about 16 bytes each). */
const FLUSH_ENTRIES = 1 << 22;

/**
 * Many seeds (polarized closures): their rows pass into one echelon per cell and prime as
 * they are produced, a batch of seeds at a time, so memory holds a batch of entries and the
 * echelons rather than whole matrices (rows of different seeds never share an index, columns
 * are shared by every seed).
 */
function incrementalRanks(builder: DerivativeMatrixBuilder, seeds: readonly SeedSupport[], ops: DerivativeOps, primes: readonly number[], signal?: AbortSignal): number[][] {
  const cells = builder.cells;
  const echelons = primes.map((p) => cells.map((m) => new EchelonModP(p, Math.max(16, m.cols))));
  const firstRow = new Int32Array(cells.length); // rows below this were flushed before
  const flush = (): void => {
    cells.forEach((m, ci) => {
      if (m.len === 0) return;
      const lo = firstRow[ci]!;
      const count = m.rows - lo;
      // every column seen so far is a pivot for every prime: these rows add nothing
      if (echelons.every((perCell) => perCell[ci]!.rank === m.cols)) {
        firstRow[ci] = m.rows;
        m.len = 0;
        return;
      }
      // group the entries by row (counting sort), then insert row by row
      const start = new Int32Array(count + 1);
      for (let e = 0; e < m.len; e++) start[m.r[e]! - lo + 1]!++;
      for (let r = 0; r < count; r++) start[r + 1]! += start[r]!;
      const fill = start.slice(0, count);
      const cols = new Int32Array(m.len);
      const vals = primes.map((_, pi) => (pi === 0 || m.v2 ? new Float64Array(m.len) : undefined));
      for (let e = 0; e < m.len; e++) {
        const at = fill[m.r[e]! - lo]!++;
        cols[at] = m.c[e]!;
        vals[0]![at] = m.v[e]!;
        if (m.v2) vals[1]![at] = m.v2[e]!;
      }
      // short rows first, as in directRank (less fill-in): a counting sort by length
      const order = rowsByLength(start, count);
      echelons.forEach((perCell, pi) => {
        const ech = perCell[ci]!;
        const v = vals[pi] ?? vals[0]!;
        for (const r of order) {
          // every column seen so far is a pivot: nothing more can be independent
          if (ech.rank === m.cols) break;
          ech.insert(cols.subarray(start[r]!), v.subarray(start[r]!), start[r + 1]! - start[r]!);
        }
      });
      firstRow[ci] = m.rows;
      m.len = 0;
    });
  };
  for (const seed of seeds) {
    signal?.throwIfAborted();
    builder.addSeed(seed, ops);
    if (cells.reduce((s, m) => s + m.len, 0) >= FLUSH_ENTRIES) flush();
  }
  flush();
  return echelons.map((perCell) => perCell.map((e) => e.rank));
}

/** Row indices 0..count−1 by increasing length (start[r + 1] − start[r]), stable. */
function rowsByLength(start: Int32Array, count: number): Int32Array {
  let maxLen = 0;
  for (let r = 0; r < count; r++) maxLen = Math.max(maxLen, start[r + 1]! - start[r]!);
  const bucket = new Int32Array(maxLen + 2);
  for (let r = 0; r < count; r++) bucket[start[r + 1]! - start[r]! + 1]!++;
  for (let l = 0; l <= maxLen; l++) bucket[l + 1]! += bucket[l]!;
  const order = new Int32Array(count);
  for (let r = 0; r < count; r++) order[bucket[start[r + 1]! - start[r]!]!++] = r;
  return order;
}

/**
 * Cells from the ranks of one prime (all cells of the box, zero ones included); mirrored tasks
 * read their source task at the opposite corner of the box.
 */
export function cellsFromRanks(n: number, box: DegreeBox, chi: SeedChi, ranks: readonly (readonly number[])[], mirrored = false): ModuleCell[] {
  const plan = closurePlan(n, chi, mirrored);
  const fl = partitionList(n).map((l) => Number(fLambda(l)));
  const cells: ModuleCell[] = [];
  for (let dx = box.x - 1; dx >= 0; dx--)
    for (let dy = box.y - 1; dy >= 0; dy--)
      for (let dt = box.theta - 1; dt >= 0; dt--) {
        const idx = boxIndex(box, dx, dy, dt);
        const degree: [number, number, number] = [dx, dy, dt];
        const opposite = boxIndex(box, box.x - 1 - dx, box.y - 1 - dy, box.theta - 1 - dt);
        const values = plan.map((t, ti) => (t.mirrorOf === undefined ? ranks[ti]![idx]! : ranks[t.mirrorOf]![opposite]!));
        if (chi === 0) {
          cells.push({ degree, dim: values[0]! });
          continue;
        }
        const mult = solveMultiplicities(n, plan, values);
        cells.push({ degree, dim: mult.reduce((s, m, i) => s + m * fl[i]!, 0), multiplicities: mult });
      }
  return cells;
}

/**
 * Rank mod p of one cell matrix. Tall matrices of small rank are first compressed by random
 * row combinations (rank(R·A) = rank(A) with probability ≥ 1 − k/p when rank(A) < k; it is
 * never larger), doubling k until the compressed rank falls below k.
 */
export function matrixRank(m: CellMatrix, p: number): number {
  const nRows = m.rows;
  const nCols = m.cols;
  if (nRows === 0 || nCols === 0) return 0;
  const limit = Math.min(nRows, nCols);
  // compression pays only when rows are sparse relative to the rank (measured: rarely here)
  for (let k = 32; 2 * k <= limit && m.len < (nRows * nCols) / 64; k *= 2) {
    const rk = compressedRank(m, p, k);
    if (rk < k) return rk;
  }
  return directRank(m, p);
}

function directRank(m: CellMatrix, p: number): number {
  const nRows = m.rows;
  const nCols = m.cols;
  const start = new Int32Array(nRows + 1);
  for (let e = 0; e < m.len; e++) start[m.r[e]! + 1]!++;
  for (let r = 0; r < nRows; r++) start[r + 1]! += start[r]!;
  const fill = start.slice(0, nRows);
  const cols = new Int32Array(m.len);
  const vals = new Float64Array(m.len);
  for (let e = 0; e < m.len; e++) {
    const at = fill[m.r[e]!]!++;
    cols[at] = m.c[e]!;
    vals[at] = m.v[e]!;
  }
  const order = Array.from({ length: nRows }, (_, r) => r).sort((a, b) => start[a + 1]! - start[a]! - (start[b + 1]! - start[b]!));
  const ech = new EchelonModP(p, nCols);
  for (const r of order) {
    ech.insert(cols.subarray(start[r]!), vals.subarray(start[r]!), start[r + 1]! - start[r]!);
    if (ech.rank === Math.min(nCols, nRows)) break;
  }
  return ech.rank;
}

/** Rank of R·A for a k × rows random R (deterministic generator, so runs repeat exactly). */
function compressedRank(m: CellMatrix, p: number, k: number): number {
  const nCols = m.cols;
  let state = (0x9e3779b9 ^ (k * 2654435761) ^ m.rows) >>> 0;
  const rand = new Float64Array(m.rows * k);
  for (let i = 0; i < rand.length; i++) {
    // xorshift32, two draws per residue (p < 2^26)
    state ^= state << 13;
    state >>>= 0;
    state ^= state >>> 17;
    state ^= state << 5;
    state >>>= 0;
    const hi = state & 0x3ffffff;
    rand[i] = hi % p;
  }
  const bt = new Float64Array(nCols * k); // transposed: bt[c·k + j]
  for (let e = 0; e < m.len; e++) {
    let v = m.v[e]! % p;
    if (v < 0) v += p;
    if (v === 0) continue;
    const rOff = m.r[e]! * k;
    const cOff = m.c[e]! * k;
    for (let j = 0; j < k; j++) bt[cOff + j] = (bt[cOff + j]! + rand[rOff + j]! * v) % p;
  }
  const ech = new EchelonModP(p, nCols);
  const row = new Float64Array(nCols);
  for (let j = 0; j < k; j++) {
    for (let c = 0; c < nCols; c++) row[c] = bt[c * k + j]!;
    ech.insertDense(row);
  }
  return ech.rank;
}
