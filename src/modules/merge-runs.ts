/**
 * Confirmation with a second prime: run with two primes and compare every cell. A rank mod p
 * is a lower bound of the rank over Q, so on disagreement a third prime is run and every cell
 * takes the run with the largest dimension; the provenance says so.
 */
import type { ModuleCell } from './module-cell.js';

export interface MergedRuns {
  readonly cells: readonly ModuleCell[];
  readonly primes: number[];
  readonly confirmation: string;
}

function key(c: ModuleCell): string {
  return c.degree.join(',');
}

function same(a: ModuleCell | undefined, b: ModuleCell | undefined): boolean {
  const da = a?.dim ?? 0;
  const db = b?.dim ?? 0;
  if (da !== db) return false;
  const ma = a?.multiplicities;
  const mb = b?.multiplicities;
  if (!ma || !mb) return !ma === !mb || da === 0;
  return ma.every((m, i) => m === mb[i]);
}

export function mergeRuns(primes: readonly [number, number], run: (p: number) => readonly ModuleCell[], pool: readonly number[]): MergedRuns {
  const first = run(primes[0]);
  const second = run(primes[1]);
  const index = (cells: readonly ModuleCell[]): Map<string, ModuleCell> => new Map(cells.map((c) => [key(c), c]));
  const a = index(first);
  const b = index(second);
  const keys = new Set([...a.keys(), ...b.keys()]);
  const differ = [...keys].filter((k) => !same(a.get(k), b.get(k)));
  if (differ.length === 0) {
    return { cells: first, primes: [...primes], confirmation: `confirmed: primes ${primes[0]} and ${primes[1]} agree on every cell` };
  }
  const third = pool.find((p) => p !== primes[0] && p !== primes[1])!;
  const c = index(run(third));
  const merged = [...keys].map((k) => [a.get(k), b.get(k), c.get(k)].reduce((best, x) => ((x?.dim ?? 0) > (best?.dim ?? 0) ? x : best))!).filter(Boolean);
  return {
    cells: merged,
    primes: [...primes, third],
    confirmation: `primes ${primes[0]} and ${primes[1]} disagree at ${differ.length} cell(s) (${differ.slice(0, 3).join('; ')}); a third prime ${third} was run and each cell takes the largest rank`,
  };
}
