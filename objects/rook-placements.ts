/**
 * Non-attacking rook placements on a Ferrers board (columns bottom-justified, heights
 * weakly increasing left to right): on the board of a partition λ (--shape, columns of
 * heights λ_ℓ ≤ … ≤ λ_1), or on the staircase of size n (--n, columns of heights 1..n−1,
 * whose placements of k rooks match the set partitions of [n] into n − k blocks); all, or
 * with k rooks. Counted column by column (a column of height h with j rooks to its left
 * offers h − j free rows): the rook numbers of Goldman–Joichi–White, "Rook theory I",
 * Proc. Amer. Math. Soc. 52 (1975). The q-count is Garsia–Remmel, "Q-counting rook
 * configurations and a formula of Frobenius", J. Combin. Theory Ser. A 41 (1986).
 */
import { InputError } from '../src/core/errors.js';
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { emptyFamilyError, intParam, listParam, optIntParam, validateBySpec } from './support/params.js';
import { randomBelow, weightedIndex } from './support/random.js';
import type { RookPlacement } from './types.js';

const ID = 'rook-placements';
const PARAMS: readonly ParamSpec[] = [
  { name: 'shape', kind: 'partition', description: 'the board: a partition λ, read as column heights (give this or n)', min: 0, max: 40, optional: true },
  { name: 'n', kind: 'int', description: 'the staircase board of size n, columns of heights 1..n−1 (give this or shape)', min: 1, max: 12, optional: true },
  { name: 'k', kind: 'int', description: 'number of rooks; any number when omitted', min: 0, max: 12, optional: true },
];

/** Column heights left to right (weakly increasing, positive), validating the params. */
function heightsOf(params: Params): number[] {
  validateBySpec(ID, PARAMS, params);
  if ((params['shape'] === undefined) === (params['n'] === undefined)) {
    throw new InputError(`${ID} needs exactly one of shape (a partition such as 3,2,2) and n (the staircase, 1..12)`, 'shape');
  }
  const n = optIntParam(params, 'n');
  return n === undefined ? [...listParam(params, 'shape')].reverse() : Array.from({ length: n - 1 }, (_, i) => i + 1);
}

/** N[i][j]: completions from column i with j rooks placed so far (k rooks in all when k is given). */
function completionTable(h: readonly number[], k: number | undefined): bigint[][] {
  const c = h.length;
  const table: bigint[][] = Array.from({ length: c + 1 }, () => new Array<bigint>(c + 2).fill(0n));
  for (let j = 0; j <= c; j++) table[c]![j] = k === undefined || j === k ? 1n : 0n;
  for (let i = c - 1; i >= 0; i--) {
    for (let j = 0; j <= i; j++) table[i]![j] = table[i + 1]![j]! + (h[i]! > j ? BigInt(h[i]! - j) * table[i + 1]![j + 1]! : 0n);
  }
  return table;
}

export const rookPlacements: Family<RookPlacement> = {
  id: ID,
  description: 'non-attacking rooks on a Ferrers board (--shape λ) or on the staircase of size n (--n), with k rooks',
  source: 'Goldman–Joichi–White, Proc. Amer. Math. Soc. 52 (1975); Garsia–Remmel, J. Combin. Theory Ser. A 41 (1986)',
  params: PARAMS,
  validate: (params) => void heightsOf(params),
  *generate(params) {
    const heights = heightsOf(params);
    const k = optIntParam(params, 'k');
    const rows = new Array<number>(heights.length).fill(0);
    const used = new Set<number>();
    function* column(i: number, placed: number): Generator<RookPlacement> {
      if (k !== undefined && (placed > k || placed + heights.length - i < k)) return;
      if (i === heights.length) {
        yield { heights, rows: rows.slice() };
        return;
      }
      yield* column(i + 1, placed);
      for (let r = 1; r <= heights[i]!; r++) {
        if (used.has(r)) continue;
        used.add(r);
        rows[i] = r;
        yield* column(i + 1, placed + 1);
        rows[i] = 0;
        used.delete(r);
      }
    }
    yield* column(0, 0);
  },
  count(params) {
    const heights = heightsOf(params);
    return completionTable(heights, optIntParam(params, 'k'))[0]![0]!;
  },
  render(p) {
    const top = p.heights.reduce((m, h) => Math.max(m, h), 0);
    if (p.heights.length === 0) return '(empty board)';
    const lines: string[] = [];
    for (let y = top; y >= 1; y--) lines.push(p.heights.map((h, c) => (y > h ? ' ' : p.rows[c] === y ? 'R' : '.')).join(' ').trimEnd());
    return lines.join('\n');
  },
  sample(params, random) {
    const heights = heightsOf(params);
    const table = completionTable(heights, optIntParam(params, 'k'));
    if (table[0]![0] === 0n) throw emptyFamilyError(ID, params);
    const rows = new Array<number>(heights.length).fill(0);
    const used: number[] = [];
    for (let i = 0, j = 0; i < heights.length; i++) {
      const free = heights[i]! - j;
      const place = free > 0 ? BigInt(free) * table[i + 1]![j + 1]! : 0n;
      if (weightedIndex(random, [table[i + 1]![j]!, place]) === 0) continue;
      const open = Array.from({ length: heights[i]! }, (_, r) => r + 1).filter((r) => !used.includes(r));
      rows[i] = open[randomBelow(random, open.length)]!;
      used.push(rows[i]!);
      j++;
    }
    return { heights, rows };
  },
  key: (p) => `${p.heights.join(',')}:${p.rows.join(',')}`,
  testParams: [{ n: 1 }, { n: 4 }, { n: 5, k: 2 }, { shape: [2, 2] }, { shape: [3, 2, 2], k: 2 }, { shape: [4, 3, 1], k: 3 }, { shape: [] }, { shape: [1], k: 2 }],
};
