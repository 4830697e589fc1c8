/**
 * Which subgroup computes what: a task
 * is a product S_μ × S_ν of symmetric groups on consecutive blocks, with the trivial character
 * on the μ-blocks and the sign on the ν-blocks; the dimension of the vectors of M on which it
 * acts by that character is ⟨Frob(M), h_μ e_ν⟩ = Σ_λ ⟨s_λ, h_μ e_ν⟩ m_λ. Costs fall roughly
 * with the cube of the group order, so the plan takes functionals h_μ e_ν by decreasing
 * group order, keeping each one that is independent of those kept, until the pairing matrix
 * is invertible. Pure h_λ or e_λ are the special cases ν = ∅ and μ = ∅;
 * mixed ones replace the small groups of the middle partitions (n = 9: h_5 e_4, group 2880,
 * gives m_{6111} + m_{51111}, where S_{51111} has order 120). The multiplicities are then
 * the exact solution of the integer system.
 */
import { factorial } from '../core/integers.js';
import { conjugate, partitionKey, partitionList, partitions, type Partition } from '../core/partitions.js';
import { kostkaNumber } from '../symfun/kostka.js';
import { lrProduct } from '../symfun/littlewood-richardson.js';
import type { FoldMode } from './young-fold.js';

export interface YoungTask {
  /** Block sizes of μ and ν together, largest first. */
  readonly blocks: readonly number[];
  /** Character on each block: 'sym' (trivial, μ) or 'alt' (sign, ν). */
  readonly modes: readonly FoldMode[];
  /** ⟨s_λ, h_μ e_ν⟩ for λ in partitionList(n) order (empty for the plain rank task). */
  readonly pairing: readonly number[];
  /** Short name for progress lines: "h5,2 e1,1". */
  readonly label: string;
  /**
   * Not computed: its rank in the cell of degree d is the rank of task `mirrorOf` in the cell
   * of degree D − d (see youngPlan).
   */
  readonly mirrorOf?: number;
}

export function groupOrder(blocks: readonly number[]): number {
  return blocks.reduce((s, b) => s * Number(factorial(b)), 1);
}

/** ⟨s_λ, h_μ e_ν⟩ = Σ_{κ, ρ} K_{κμ} K_{ρ'ν} c^λ_{κρ}, for every λ ⊢ |μ| + |ν|. */
function pairingRow(mu: Partition, nu: Partition): number[] {
  const a = mu.reduce((s, x) => s + x, 0);
  const b = nu.reduce((s, x) => s + x, 0);
  const out = new Map<string, bigint>();
  for (const kappa of partitionList(a)) {
    const k1 = kostkaNumber(kappa, mu);
    if (k1 === 0n) continue;
    for (const rho of partitionList(b)) {
      const k2 = kostkaNumber(conjugate(rho), nu);
      if (k2 === 0n) continue;
      for (const [key, c] of lrProduct(kappa, rho)) out.set(key, (out.get(key) ?? 0n) + k1 * k2 * c);
    }
  }
  return partitionList(a + b).map((l) => Number(out.get(partitionKey(l)) ?? 0n));
}

/** Rank over Q of integer rows (fraction-free elimination; the rows are small). */
function rankOf(rows: readonly (readonly number[])[]): number {
  const m = rows.map((r) => r.map(BigInt));
  let rank = 0;
  const width = m[0]?.length ?? 0;
  for (let c = 0; c < width && rank < m.length; c++) {
    const piv = m.findIndex((r, i) => i >= rank && r[c] !== 0n);
    if (piv < 0) continue;
    [m[rank], m[piv]] = [m[piv]!, m[rank]!];
    const p = m[rank]!;
    for (let i = rank + 1; i < m.length; i++) {
      const f = m[i]![c]!;
      if (f === 0n) continue;
      m[i] = m[i]!.map((v, j) => v * p[c]! - f * p[j]!);
    }
    rank++;
  }
  return rank;
}

const planCache = new Map<string, readonly YoungTask[]>();

/**
 * With `mirrored`, every computed task h_μ e_ν also yields e_μ h_ν for free: for one seed f of
 * multidegree D with sign character, under derivatives in every kind of variable f has, the
 * matrix of degree d is the transpose of the matrix of degree D − d up to row and column
 * scales and one global sign (the form (g, h) ↦ [g(∂)h(∂)f]_0 is symmetric; the θ signs
 * multiply to (−1)^C(|θ-degree|,2)), and transposing swaps the roles of operators, whose
 * character is twisted by the seed's sign, and targets. So
 * ⟨Frob M_d, h_μ e_ν⟩ = ⟨Frob M_{D−d}, e_μ h_ν⟩, and the plan keeps such pairs together.
 */
export function youngPlan(n: number, mirrored = false): readonly YoungTask[] {
  const cacheKey = `${n}|${mirrored}`;
  const hit = planCache.get(cacheKey);
  if (hit) return hit;
  const candidates: { mu: Partition; nu: Partition; order: number }[] = [];
  for (let a = n; a >= 0; a--)
    for (const mu of a === 0 ? [[]] : partitions(a))
      for (const nu of a === n ? [[]] : partitions(n - a)) candidates.push({ mu, nu, order: groupOrder([...mu, ...nu]) });
  // largest groups first; among equals, fewer blocks, then the h-heavier (stable order)
  const ranked = candidates.map((c, i) => ({ ...c, i })).sort((x, y) => y.order - x.order || x.mu.length + x.nu.length - (y.mu.length + y.nu.length) || x.i - y.i);
  const target = partitionList(n).length;
  const plan: YoungTask[] = [];
  const rows: number[][] = [];
  const taken = new Set<string>();
  const add = (mu: Partition, nu: Partition, mirrorOf?: number): boolean => {
    const label = [mu.length ? `h${mu.join(',')}` : '', nu.length ? `e${nu.join(',')}` : ''].filter(Boolean).join(' ');
    if (plan.length === target || taken.has(label)) return false;
    const row = pairingRow(mu, nu);
    if (rankOf([...rows, row]) === rows.length) return false;
    rows.push(row);
    taken.add(label);
    // large blocks first: the enumeration's strictness constraints then prune near the root
    const blocks = [...mu.map((b) => [b, 'sym'] as const), ...nu.map((b) => [b, 'alt'] as const)].sort((x, y) => y[0] - x[0]);
    plan.push({
      blocks: blocks.map(([b]) => b),
      modes: blocks.map(([, m]) => m),
      pairing: row,
      label,
      ...(mirrorOf === undefined ? {} : { mirrorOf }),
    });
    return true;
  };
  for (const c of ranked) {
    if (plan.length === target) break;
    if (!add(c.mu, c.nu)) continue;
    if (mirrored) add(c.nu, c.mu, plan.length - 1);
  }
  planCache.set(cacheKey, plan);
  return plan;
}

const inverseCache = new WeakMap<readonly YoungTask[], { diag: bigint[]; rhs: bigint[][] }>();

/**
 * Gauss–Jordan on [P | I] with integer row operations (row_i ← p·row_i − f·row_c, then divided
 * by its content): P becomes diagonal, and row i reads diag_i · m_i = Σ_j rhs_ij · values_j.
 */
function diagonalForm(plan: readonly YoungTask[]): { diag: bigint[]; rhs: bigint[][] } {
  const hit = inverseCache.get(plan);
  if (hit) return hit;
  const size = plan.length;
  const a: bigint[][] = plan.map((t, i) => [...t.pairing.map(BigInt), ...Array.from({ length: size }, (_, j) => (i === j ? 1n : 0n))]);
  for (let c = 0; c < size; c++) {
    const piv = a.findIndex((r, i) => i >= c && r[c] !== 0n);
    if (piv < 0) throw new Error('young plan: singular pairing matrix');
    [a[c], a[piv]] = [a[piv]!, a[c]!];
    const pr = a[c]!;
    for (let i = 0; i < size; i++) {
      const f = a[i]![c]!;
      if (i === c || f === 0n) continue;
      const row = a[i]!.map((v, j) => v * pr[c]! - f * pr[j]!);
      const g = row.reduce((s, v) => gcd(s, v), 0n);
      a[i] = g > 1n ? row.map((v) => v / g) : row;
    }
  }
  const out = { diag: a.map((r, i) => r[i]!), rhs: a.map((r) => r.slice(size)) };
  inverseCache.set(plan, out);
  return out;
}

function abs(x: bigint): bigint {
  return x < 0n ? -x : x;
}
function gcd(a: bigint, b: bigint): bigint {
  a = abs(a);
  b = abs(b);
  while (b) [a, b] = [b, a % b];
  return a;
}

/**
 * Multiplicities m_λ (partitionList(n) order) from the plan's dimensions (values[i] for
 * plan[i]): the exact solution of Σ_λ ⟨s_λ, h_μ e_ν⟩ m_λ = values. Dimensions that no
 * S_n-module has (a non-integral solution) mean ranks were lost mod p: an error, not a result.
 */
export function solveMultiplicities(n: number, plan: readonly YoungTask[], values: readonly number[]): number[] {
  const { diag, rhs } = diagonalForm(plan);
  // after the swaps, row i of the diagonal form has its pivot in column i (the i-th partition)
  return rhs.map((row, i) => {
    const s = row.reduce((acc, a, j) => acc + a * BigInt(values[j]!), 0n);
    if (s % diag[i]! !== 0n) throw new Error(`the subgroup dimensions ${values.join(',')} fit no S_${n}-module (multiplicity ${i} is ${s}/${diag[i]}): ranks were lost mod p`);
    return Number(s / diag[i]!);
  });
}
