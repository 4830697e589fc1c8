/**
 * Quotients on a cluster: one shard per prime (a whole one-prime run of the quotient engine),
 * merged as the one-machine run merges its two primes.
 *
 * The seam for a finer split: when the quotient engine offers its work as tasks (one Young
 * functional × one prime each, with a function merging their results into cells), a plan
 * holds those tasks as shards of a `quotient-task` kind, run-shard sends one to the pool, and
 * `mergeQuotient` passes the merged cells per prime as `precomputed`: the document is then
 * still assembled by computeQuotient, so it stays the one-machine document.
 */
import { CONFIRM_PRIME, DEFAULT_PRIME } from '../core/modp.js';
import { computeQuotient } from '../modules/compute-quotient.js';
import type { ModuleCell } from '../modules/module-cell.js';
import type { ModuleResult } from '../modules/module-result.js';
import type { QuotientRequest } from '../requests/index.js';
import type { ManifestBody } from './manifest.js';
import type { ShardResult } from './shard-file.js';

export function planQuotient(r: QuotientRequest): Omit<ManifestBody, 'key'> {
  const p1 = r.prime ?? DEFAULT_PRIME;
  const p2 = p1 === CONFIRM_PRIME ? DEFAULT_PRIME : CONFIRM_PRIME;
  const primes: [number, number] = [p1, p2];
  return {
    kind: 'quotient',
    route: 'one shard per prime (a whole one-prime run each; the quotient engine has no finer split yet)',
    primes,
    shards: primes.map((prime, id) => ({ id, label: `prime ${prime}`, work: { type: 'prime' as const, prime } })),
  };
}

export function mergeQuotient(r: QuotientRequest, results: readonly ShardResult[]): ModuleResult {
  const cells = new Map<number, readonly ModuleCell[]>();
  for (const x of results) if (x.type === 'prime') cells.set(x.prime, x.cells as ModuleCell[]);
  return computeQuotient(r.spec, { frobenius: r.frobenius, ...(r.prime !== undefined ? { prime: r.prime } : {}), precomputed: cells });
}
