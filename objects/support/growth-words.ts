/**
 * Restricted growth words: a[i] = block of i+1 in a set partition of [n], blocks numbered
 * 0, 1, … by their minima (a[0] = 0, a[i] ≤ 1 + max a[0..i−1]). Lexicographic stepping,
 * optionally with exactly k blocks.
 */

/** Smallest completion of a[from..] given b blocks used so far (opening blocks only when k forces it). */
function complete(a: number[], from: number, b: number, k: number | undefined): void {
  for (let j = from; j < a.length; j++) {
    if (k !== undefined && k - b >= a.length - j) a[j] = b++;
    else a[j] = 0;
  }
}

/** The first growth word of length n (with exactly k blocks when k is given; assumes one exists). */
export function firstGrowthWord(n: number, k?: number): number[] {
  const a = new Array<number>(n).fill(0);
  if (n > 0) complete(a, 1, 1, k);
  return a;
}

/** Next restricted growth word (with exactly k blocks when k is given) in place; false after the last. */
export function nextGrowthWord(a: number[], k?: number): boolean {
  const n = a.length;
  const before: number[] = new Array<number>(n); // blocks used by a[0..i−1]
  let b = 0;
  for (let i = 0; i < n; i++) {
    before[i] = b;
    b = Math.max(b, a[i]! + 1);
  }
  for (let i = n - 1; i >= 1; i--) {
    const v = a[i]! + 1;
    if (v > before[i]!) continue;
    const used = Math.max(before[i]!, v + 1);
    if (k !== undefined && (used > k || k - used > n - 1 - i)) continue;
    a[i] = v;
    complete(a, i + 1, used, k);
    return true;
  }
  return false;
}

/** The blocks of a restricted growth word (fresh arrays). */
export function growthWordToBlocks(a: readonly number[]): number[][] {
  const blocks: number[][] = [];
  a.forEach((v, i) => (blocks[v] ??= []).push(i + 1));
  return blocks;
}

/** Blocks joined by |, elements by nothing when all are < 10 (as 13|2|45) and by commas otherwise. */
export function renderBlocks(blocks: readonly (readonly number[])[]): string {
  if (blocks.length === 0) return '(empty)';
  const sep = blocks.some((b) => b.some((x) => x >= 10)) ? ',' : '';
  return blocks.map((b) => b.join(sep)).join('|');
}
