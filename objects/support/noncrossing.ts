/**
 * The classical bijection between noncrossing partitions of [n] and Dyck paths of
 * semilength n: reading i = 1..n, write N^{|B|} when i is the least element of its block B,
 * then E. Blocks become peaks. Decoding gives each i that opens no block to the innermost
 * block still open, which is what noncrossing forces (Simion, "Noncrossing partitions",
 * Discrete Math. 217 (2000) — from memory; the tests check bijectivity).
 */
import type { DyckPath, SetPartition } from '../types.js';

export function noncrossingToDyck(p: SetPartition): (0 | 1)[] {
  const n = p.reduce((s, b) => s + b.length, 0);
  const sizeAtMin = new Array<number>(n + 1).fill(0);
  for (const b of p) sizeAtMin[b[0]!] = b.length;
  const out: (0 | 1)[] = [];
  for (let i = 1; i <= n; i++) {
    for (let j = 0; j < sizeAtMin[i]!; j++) out.push(1);
    out.push(0);
  }
  return out;
}

export function dyckToNoncrossing(path: DyckPath): number[][] {
  const blocks: number[][] = [];
  const open: { block: number[]; left: number }[] = [];
  let run = 0;
  let i = 0;
  for (const s of path) {
    if (s === 1) {
      run++;
      continue;
    }
    i++;
    if (run > 0) {
      const block = [i];
      blocks.push(block);
      if (run > 1) open.push({ block, left: run - 1 });
      run = 0;
    } else {
      const top = open[open.length - 1]!;
      top.block.push(i);
      if (--top.left === 0) open.pop();
    }
  }
  return blocks;
}

/** True when no a < b < c < d has a, c in one block and b, d in another. */
export function isNoncrossing(p: SetPartition): boolean {
  const n = p.reduce((s, b) => s + b.length, 0);
  const blockOf = new Array<number>(n + 1).fill(-1);
  p.forEach((b, j) => b.forEach((x) => (blockOf[x] = j)));
  // Consecutive elements of each block as arcs; two arcs cross when they interleave.
  const arcs: [number, number][] = [];
  for (const b of p) for (let t = 1; t < b.length; t++) arcs.push([b[t - 1]!, b[t]!]);
  for (const [a, c] of arcs) for (const [b, d] of arcs) if (a < b && b < c && c < d) return false;
  return true;
}
