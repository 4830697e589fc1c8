/** Shard bookkeeping for the families' visit fast paths. */
import { InputError } from '../../src/core/errors.js';
import type { Shard } from '../../src/enumerate/plugin.js';

/** Checks a shard and returns [index, count] ([0, 1] when none is given). */
export function shardParts(shard: Shard | undefined): [number, number] {
  if (!shard) return [0, 1];
  const { index, count } = shard;
  if (!Number.isInteger(count) || count < 1 || !Number.isInteger(index) || index < 0 || index >= count) {
    throw new InputError(`shard must have 1 ≤ count and 0 ≤ index < count (got ${index} of ${count})`, 'shard');
  }
  return [index, count];
}
