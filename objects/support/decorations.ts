/**
 * Shared by the decorated Dyck path families: the number of decorations n − k asked for (k of
 * Δ′_{e_{k−1}} e_n) and the rises and valleys of a path.
 */
import { InputError } from '../../src/core/errors.js';
import type { ParamSpec, Params } from '../../src/enumerate/plugin.js';
import type { DyckPath } from '../types.js';
import { intParam, validateBySpec } from './params.js';

/**
 * The params n, k of a decorated family whose n runs up to maxN: k is required (not given as
 * an alternative d = n − k) so that the catalogue, which fills families by n and k, takes it.
 */
export function decorationParams(maxN: number, what: string): ParamSpec[] {
  return [
    { name: 'n', kind: 'int', description: 'size n (number of rows)', min: 1, max: maxN },
    { name: 'k', kind: 'int', description: `k of Δ′_{e_{k−1}} e_n (1..n): n − k decorated ${what}`, min: 1, max: maxN },
  ];
}

/** Validates and returns d = n − k, the number of decorations. */
export function decorationCount(id: string, specs: readonly ParamSpec[], params: Params): number {
  validateBySpec(id, specs, params);
  const n = intParam(params, 'n');
  const k = intParam(params, 'k');
  if (k > n) throw new InputError(`${id}: k must be at most n = ${n} (got ${k})`, 'k');
  return n - k;
}

/** Rows r (1-based, r ≥ 2) whose north step directly follows the north step of row r − 1. */
export function riseRows(path: DyckPath): number[] {
  const out: number[] = [];
  let row = 0;
  for (let i = 0; i < path.length; i++) {
    if (path[i] !== 1) continue;
    row++;
    if (i > 0 && path[i - 1] === 1) out.push(row);
  }
  return out;
}

/** Rows r (1-based, r ≥ 2) whose north step follows an east step (the valleys). */
export function valleyRows(path: DyckPath): number[] {
  const out: number[] = [];
  let row = 0;
  for (let i = 0; i < path.length; i++) {
    if (path[i] !== 1) continue;
    row++;
    if (i > 0 && path[i - 1] === 0) out.push(row);
  }
  return out;
}
