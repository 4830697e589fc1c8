/**
 * The families with a prefix walk, and how to run one: a fused enumeration that adds each
 * statistic's per-step increments (Statistic.step) instead of computing it per object.
 */
import type { Params, PrefixStep, Shard } from '../plugin.js';
import { walkOrderedSetPartitions } from './osp-walk.js';
import { walkPermutations } from './permutation-walk.js';
import { walkWords } from './word-walk.js';

export type Walk = (params: Params, s1: PrefixStep, s2: PrefixStep, leaf: (a: number, b: number) => void, shard?: Shard) => void;

const WALKS: Readonly<Record<string, Walk>> = {
  permutations: (p, s1, s2, leaf, shard) => walkPermutations(p['n'] as number, s1, s2, leaf, shard),
  'ordered-set-partitions': (p, s1, s2, leaf, shard) => walkOrderedSetPartitions(p['n'] as number, p['k'] as number, s1, s2, leaf, shard),
  words: (p, s1, s2, leaf, shard) => walkWords(p['content'] as readonly number[], s1, s2, leaf, shard),
};

/** The walk of a family (undefined when it has none). Sizes are capped by the bit masks. */
export function walkFor(familyId: string, params: Params): Walk | undefined {
  const w = WALKS[familyId];
  if (!w) return undefined;
  const size = familyId === 'permutations' ? params['n'] : familyId === 'words' ? (params['content'] as readonly number[] | undefined)?.length : params['k'];
  return typeof size === 'number' && size <= 30 ? w : undefined;
}

export const zeroStep: PrefixStep = () => 0;
