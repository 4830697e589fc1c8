/** Where a fast path promises generate's order (no shard), it keeps it. */
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import type { Params } from '../../src/enumerate/plugin.js';

function both(id: string, p: Params): [string[], string[]] {
  const f = familyById(id);
  const visited: string[] = [];
  f.visit!(p, (x) => visited.push(f.key(x)));
  return [visited, [...f.generate(p)].map((x) => f.key(x))];
}

describe('visit order', () => {
  it.each([
    ['standard-tableaux', { shape: [3, 2, 1] }],
    ['standard-tableaux', { shape: [4, 4, 1] }],
    ['standard-tableaux', { n: 6 }],
    ['permutations', { n: 5 }],
    ['words', { content: [2, 0, 3, 1] }],
    ['dyck-paths', { n: 6 }],
    ['parking-functions', { n: 4 }],
    ['fillings', { shape: [2, 2, 1] }],
  ] as const)('%s %j: visit without shards streams in generate order', (id, p) => {
    const [v, g] = both(id, p);
    expect(v).toEqual(g);
  });
});
