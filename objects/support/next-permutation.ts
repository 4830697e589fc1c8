/** The in-place lexicographic step behind permutations, words, labellings and fillings. */

/**
 * Next permutation (lexicographic) of a[start..] in place, leaving a[0..start−1] alone;
 * false (and a unchanged) after the last one. Works for multisets too (repeated letters).
 */
export function nextPermutationFrom(a: number[], start = 0): boolean {
  let i = a.length - 2;
  while (i >= start && a[i]! >= a[i + 1]!) i--;
  if (i < start) return false;
  let j = a.length - 1;
  while (a[j]! <= a[i]!) j--;
  let t = a[i]!;
  a[i] = a[j]!;
  a[j] = t;
  for (let l = i + 1, r = a.length - 1; l < r; l++, r--) {
    t = a[l]!;
    a[l] = a[r]!;
    a[r] = t;
  }
  return true;
}
