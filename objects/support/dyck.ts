/**
 * Dyck path helpers shared by the Dyck, parking and decorated families. A path is a
 * 0/1 array of length 2n (1 = north, 0 = east) never going below the diagonal.
 */
import type { DyckPath } from '../types.js';
import { shuffleInPlace } from './random.js';

/** The first path in lexicographic order (0 < 1): (north east)^n. */
export function firstDyckPath(n: number): (0 | 1)[] {
  const a: (0 | 1)[] = [];
  for (let i = 0; i < n; i++) a.push(1, 0);
  return a;
}

/**
 * Next Dyck path in lexicographic order (east 0 < north 1) in place; false after the
 * last one (north^n east^n). The suffix after the changed step is the smallest valid one.
 */
export function nextDyckPath(a: (0 | 1)[]): boolean {
  const n = a.length / 2;
  let ups = 0;
  let downs = 0;
  for (const s of a) s === 1 ? ups++ : downs++;
  for (let i = a.length - 1; i >= 0; i--) {
    // Remove step i: (ups, downs) now count a[0..i−1].
    if (a[i] === 1) ups--;
    else downs--;
    if (a[i] === 0 && ups < n) {
      a[i] = 1;
      let u = ups + 1;
      let d = downs;
      for (let j = i + 1; j < a.length; j++) {
        if (d < u) {
          a[j] = 0;
          d++;
        } else {
          a[j] = 1;
          u++;
        }
      }
      return true;
    }
  }
  return false;
}

/** For each row r = 1..n (bottom up), the number of east steps before its north step. */
export function northColumns(path: DyckPath): number[] {
  const cols: number[] = [];
  let east = 0;
  for (const s of path) {
    if (s === 1) cols.push(east);
    else east++;
  }
  return cols;
}

/** The area sequence a_r = (r−1) − column of row r: full cells between path and diagonal. */
export function areaSequence(path: DyckPath): number[] {
  const a = new Array<number>(path.length >> 1);
  let row = 0;
  let east = 0;
  for (const s of path) {
    if (s === 1) a[row] = row++ - east;
    else east++;
  }
  return a;
}

/** A uniform Dyck path by the cycle lemma (rotate a random ±1 word of sum −1). */
export function randomDyckPath(n: number, random: () => number): (0 | 1)[] {
  const w: (0 | 1)[] = shuffleInPlace([...new Array<0 | 1>(n).fill(1), ...new Array<0 | 1>(n + 1).fill(0)], random);
  let sum = 0;
  let min = 0;
  let at = 0;
  w.forEach((s, i) => {
    sum += s === 1 ? 1 : -1;
    if (sum < min) {
      min = sum;
      at = i + 1;
    }
  });
  const rotated = [...w.slice(at), ...w.slice(0, at)];
  return rotated.slice(0, 2 * n);
}

/** Checks that a 0/1 word is a Dyck path. */
export function isDyckPath(path: readonly number[]): boolean {
  let h = 0;
  for (const s of path) {
    if (s !== 0 && s !== 1) return false;
    h += s === 1 ? 1 : -1;
    if (h < 0) return false;
  }
  return h === 0 && path.length % 2 === 0;
}

/**
 * A small drawing, top row first (French grid: row 1 at the bottom). Each cell is two
 * characters; `|` marks the north step, `#` the full cells between path and diagonal,
 * `\` the diagonal cell; `labels` (cars) are written left of the north steps when given.
 */
export function drawDyckPath(path: DyckPath, labels?: readonly number[], marks?: ReadonlySet<number>): string {
  const cols = northColumns(path);
  const n = cols.length;
  if (n === 0) return '(empty path)';
  const w = labels ? String(n).length : 1;
  const lines: string[] = [];
  for (let r = n; r >= 1; r--) {
    const c = cols[r - 1]!;
    let line = '';
    for (let col = 0; col < r; col++) {
      const content = col === r - 1 ? '\\' : col >= c ? '#' : '.';
      if (col === c) line += (labels ? String(labels[r - 1]).padStart(w) : '') + '|' + content;
      else line += (labels ? ' '.repeat(w) : '') + ' ' + content;
    }
    if (marks?.has(r)) line += '  *';
    lines.push(line);
  }
  lines.push(path.map((s) => (s === 1 ? 'N' : 'E')).join(''));
  return lines.join('\n');
}
