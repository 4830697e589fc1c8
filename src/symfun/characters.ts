/**
 * Irreducible characters of S_n by the Murnaghan–Nakayama rule on beta-sets (removing a
 * rim hook of length r = moving a bead r places down; the sign counts the beads jumped),
 * the character table (cached), and the Schur expansion of a class function.
 */
import { InputError } from '../core/errors.js';
import { checkPartition, partitionKey, partitionList, size, zee, type Partition } from '../core/partitions.js';
import { Fraction, frac } from '../core/rational.js';

const memo = new Map<string, bigint>();

function betaSet(lambda: Partition): number[] {
  const L = lambda.length;
  return lambda.map((x, i) => x + (L - 1 - i)); // strictly decreasing
}

function fromBeta(beta: readonly number[]): number[] {
  const sorted = [...beta].sort((a, b) => b - a);
  const L = sorted.length;
  const out = sorted.map((b, i) => b - (L - 1 - i));
  while (out.length > 0 && out[out.length - 1] === 0) out.pop();
  return out;
}

function mn(lambda: Partition, rho: readonly number[], from: number): bigint {
  if (from === rho.length) return lambda.length === 0 ? 1n : 0n;
  const key = `${partitionKey(lambda)}|${rho.slice(from).join(',')}`;
  const hit = memo.get(key);
  if (hit !== undefined) return hit;
  const r = rho[from]!;
  const beta = betaSet(lambda);
  const present = new Set(beta);
  let s = 0n;
  for (let idx = 0; idx < beta.length; idx++) {
    const b = beta[idx]!;
    const target = b - r;
    if (target < 0 || present.has(target)) continue;
    let jumped = 0;
    for (const c of beta) if (c < b && c > target) jumped++;
    const next = beta.slice();
    next[idx] = target;
    const v = mn(fromBeta(next), rho, from + 1);
    s += jumped % 2 === 0 ? v : -v;
  }
  memo.set(key, s);
  return s;
}

/** χ^λ(ρ): the irreducible character λ on the class of cycle type ρ (|λ| = |ρ|). */
export function character(lambda: Partition, rho: Partition): bigint {
  checkPartition(lambda, 'lambda');
  checkPartition(rho, 'rho');
  if (size(lambda) !== size(rho)) {
    throw new InputError(`lambda and rho must be partitions of the same n (got ${size(lambda)} and ${size(rho)})`, 'rho');
  }
  return mn(lambda, rho, 0);
}

const tableCache = new Map<number, readonly (readonly bigint[])[]>();

/** [i][j] = χ^{λ_i}(ρ_j), both in partitionList(n) order. */
export function characterTable(n: number): readonly (readonly bigint[])[] {
  let hit = tableCache.get(n);
  if (!hit) {
    const ps = partitionList(n);
    hit = ps.map((l) => ps.map((r) => mn(l, r, 0)));
    tableCache.set(n, hit);
  }
  return hit;
}

/**
 * Multiplicities ⟨χ, χ^λ⟩ = Σ_ρ χ(ρ) χ^λ(ρ) / z_ρ of a class function given by its values
 * on cycle types. Keys "3,1,1", every λ ⊢ n in partitionList order (zeros included).
 */
export function classFunctionToSchur(n: number, values: (rho: Partition) => bigint | Fraction): Map<string, Fraction> {
  if (!Number.isInteger(n) || n < 0) throw new InputError(`n must be a non-negative integer (got ${n})`, 'n');
  const ps = partitionList(n);
  const table = characterTable(n);
  const weighted = ps.map((rho) => {
    const v = values(rho);
    const f = v instanceof Fraction ? v : frac(v);
    return f.div(frac(zee(rho)));
  });
  const out = new Map<string, Fraction>();
  ps.forEach((lambda, i) => {
    let s = frac(0n);
    const row = table[i]!;
    weighted.forEach((w, j) => {
      const c = row[j]!;
      if (c !== 0n && !w.equals(0)) s = s.add(w.mul(c));
    });
    out.set(partitionKey(lambda), s);
  });
  return out;
}
