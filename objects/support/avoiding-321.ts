/**
 * 321-avoiding permutations and Krattenthaler's bijection with Dyck paths ("Permutations with
 * restricted patterns and Dyck paths", Adv. in Appl. Math. 27 (2001), from memory): a
 * 321-avoiding permutation is fixed by its left-to-right maxima m_1 < … < m_k at positions
 * p_1 = 1 < … < p_k (the other values fill the other positions increasingly); its path is
 * U^{m_1} D^{p_2 − p_1} U^{m_2 − m_1} D^{p_3 − p_2} … with p_{k+1} = n + 1 (U = north = 1, D = east = 0).
 */
import type { DyckPath, Permutation } from '../types.js';

/** The Dyck path of a 321-avoiding permutation. */
export function dyckOf321Avoiding(w: Permutation): (0 | 1)[] {
  const path: (0 | 1)[] = [];
  let max = 0;
  let lastPos = 0;
  w.forEach((x, i) => {
    if (x < max) return;
    if (i > 0) for (let d = lastPos; d < i; d++) path.push(0);
    for (let u = max; u < x; u++) path.push(1);
    max = x;
    lastPos = i;
  });
  for (let d = lastPos; d < w.length; d++) path.push(0);
  return path;
}

/** The 321-avoiding permutation of a Dyck path (inverse of dyckOf321Avoiding). */
export function avoiding321OfDyck(p: DyckPath): number[] {
  const n = p.length / 2;
  const w = new Array<number>(n).fill(0);
  const isMax = new Uint8Array(n + 1);
  let value = 0;
  let pos = 0;
  for (let i = 0; i < p.length; i++) {
    if (p[i] === 1) {
      value++;
      if (p[i + 1] === 0) {
        // A peak: the left-to-right maximum `value` sits at the current position.
        w[pos] = value;
        isMax[value] = 1;
      }
    } else pos++;
  }
  let next = 1;
  for (let i = 0; i < n; i++) {
    if (w[i] !== 0) continue;
    while (isMax[next]) next++;
    w[i] = next++;
  }
  return w;
}

/** True when w has no entries i < j < k with w(i) > w(j) > w(k). */
export function avoids321(w: Permutation): boolean {
  let max = 0;
  let second = 0; // the largest entry that is not a left-to-right maximum
  for (const x of w) {
    if (x > max) max = x;
    else if (x < second) return false;
    else second = x;
  }
  return true;
}
