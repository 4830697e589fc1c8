/**
 * Stirling permutations and increasing plane trees, both built by insertion codes
 * s_1 … s_n with 0 ≤ s_i ≤ 2i − 2 (so (2n−1)!! of each), and Janson's depth-first bijection
 * between them ("Plane recursive trees, Stirling permutations and an urn model", Fifth
 * Colloquium on Mathematics and Computer Science, DMTCS Proc. AI (2008)).
 */
import type { IncreasingPlaneTree, StirlingPermutation } from '../types.js';

/** Radix of the insertion code: step i (0-based) has 2i + 1 choices. */
export const insertionRadix = (n: number): number[] => Array.from({ length: n }, (_, i) => 2 * i + 1);

/** The Stirling permutation obtained by inserting i i into gap s_i (0 = front) of the word built so far. */
export function stirlingOfCode(code: readonly number[], out: number[] = []): number[] {
  out.length = 0;
  code.forEach((g, i) => out.splice(g, 0, i + 1, i + 1));
  return out;
}

/** The tree of a Stirling permutation: a first occurrence opens a child of the current vertex, a second closes it. */
export function planeTreeOfStirling(w: StirlingPermutation): number[][] {
  const children: number[][] = Array.from({ length: w.length / 2 + 1 }, () => []);
  const stack = [0];
  for (const x of w) {
    if (stack[stack.length - 1] === x) stack.pop();
    else {
      children[stack[stack.length - 1]!]!.push(x);
      stack.push(x);
    }
  }
  return children;
}

/** The depth-first word of an increasing plane tree: each child's label going down its edge and again coming back. */
export function stirlingOfPlaneTree(children: IncreasingPlaneTree): number[] {
  const out: number[] = [];
  const rec = (v: number): void => {
    for (const c of children[v]!) {
      out.push(c);
      rec(c);
      out.push(c);
    }
  };
  if (children.length > 0) rec(0);
  return out;
}

/** Checks the defining property: two copies of 1..n, letters between the two i's all larger than i. */
export function isStirlingPermutation(w: readonly number[]): boolean {
  const n = w.length / 2;
  const first = new Map<number, number>();
  const seen = new Map<number, number>();
  for (let i = 0; i < w.length; i++) {
    const x = w[i]!;
    seen.set(x, (seen.get(x) ?? 0) + 1);
    if (!first.has(x)) first.set(x, i);
    else for (let j = first.get(x)! + 1; j < i; j++) if (w[j]! < x) return false;
  }
  return Number.isInteger(n) && seen.size === n && [...seen].every(([x, c]) => c === 2 && x >= 1 && x <= n);
}
