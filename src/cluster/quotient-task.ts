/** Pool task of a quotient shard: one prime of computeQuotient (the merge confirms with the other). */
import { computeQuotient } from '../modules/compute-quotient.js';
import type { IdealSpec } from '../modules/ideals.js';
import type { ModuleCell } from '../modules/module-cell.js';

export function quotientPrime(input: { readonly spec: IdealSpec; readonly frobenius: boolean; readonly prime: number }, progress: (label: string, done: number, total?: number) => void): readonly ModuleCell[] {
  return computeQuotient(input.spec, { frobenius: input.frobenius, prime: input.prime, onePrime: true, onProgress: (d, t, label) => progress(label || 'quotient', d, t) }).cells;
}
