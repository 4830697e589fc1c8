/**
 * Trees on the vertices 0..n (rooted at 0, coded by parent arrays): Prüfer codes and the
 * breadth-first bijection with parking functions.
 */
import type { LabelledDyckPath, LabelledTree, PruferCode } from '../types.js';

/**
 * The tree of a Prüfer code of length n−1 over 0..n, rooted at 0, written into `parent`
 * (length n). Classical decoding: each letter is joined to the smallest current leaf; the
 * last two leaves are joined at the end. `scratch` (length ≥ 2n+2) avoids allocation.
 */
export function decodePrufer(code: readonly number[], n: number, parent: number[], scratch?: Int32Array): number[] {
  if (n === 0) return parent;
  const s = scratch ?? new Int32Array(2 * n + 2);
  const deg = s.subarray(0, n + 1);
  const other = s.subarray(n + 1, 2 * n + 2); // other[v] = neighbour of v recorded when v was removed
  deg.fill(1);
  for (const c of code) deg[c]!++;
  // Walk the code once with a moving pointer to the smallest leaf (linear-time decoding).
  let ptr = 0;
  while (deg[ptr] !== 1) ptr++;
  let leaf = ptr;
  for (const c of code) {
    other[leaf] = c;
    deg[leaf] = 0;
    if (--deg[c]! === 1 && c < ptr) leaf = c;
    else {
      ptr++;
      while (deg[ptr] !== 1) ptr++;
      leaf = ptr;
    }
  }
  // The two vertices left: `leaf` and the largest vertex n (never the smallest leaf before the end).
  other[leaf] = n;
  // Orient the edges {v, other[v]} (v ≠ n) towards 0 by walking from each vertex.
  return orientTowardsZero(n, other, parent);
}

/** Rooting at 0 the tree with edges {v, other[v]} for every v ≠ n (a tree on 0..n). */
function orientTowardsZero(n: number, other: Int32Array, parent: number[]): number[] {
  const head = new Int32Array(n + 1).fill(-1);
  const next = new Int32Array(2 * n);
  const to = new Int32Array(2 * n);
  let e = 0;
  const link = (a: number, b: number): void => {
    to[e] = b;
    next[e] = head[a]!;
    head[a] = e++;
  };
  for (let v = 0; v < n; v++) {
    link(v, other[v]!);
    link(other[v]!, v);
  }
  const stack = [0];
  const seen = new Uint8Array(n + 1);
  seen[0] = 1;
  while (stack.length > 0) {
    const v = stack.pop()!;
    for (let k = head[v]!; k !== -1; k = next[k]!) {
      const u = to[k]!;
      if (seen[u]) continue;
      seen[u] = 1;
      parent[u - 1] = v;
      stack.push(u);
    }
  }
  return parent;
}

/** The Prüfer code of a tree on 0..n: remove the smallest leaf n−1 times, writing its neighbour. */
export function encodePrufer(parent: LabelledTree): number[] {
  const n = parent.length;
  if (n <= 1) return [];
  const adj: Set<number>[] = Array.from({ length: n + 1 }, () => new Set<number>());
  parent.forEach((p, i) => {
    adj[p]!.add(i + 1);
    adj[i + 1]!.add(p);
  });
  const removed = new Uint8Array(n + 1);
  const code: number[] = [];
  for (let step = 0; step < n - 1; step++) {
    let v = 0;
    while (removed[v] || adj[v]!.size !== 1) v++;
    const [u] = adj[v]!;
    code.push(u!);
    adj[u!]!.delete(v);
    removed[v] = 1;
  }
  return code;
}

/**
 * Breadth-first bijection (trees on 0..n → parking functions of size n): visit the tree
 * from 0, children in increasing order; a vertex whose parent is the j-th vertex visited
 * (0-based) is a car preferring spot j, i.e. it sits in column j of the labelled Dyck path.
 */
export function parkingOfTree(parent: LabelledTree): LabelledDyckPath {
  const n = parent.length;
  const children: number[][] = Array.from({ length: n + 1 }, () => []);
  parent.forEach((p, i) => children[p]!.push(i + 1));
  const order = [0];
  const path: (0 | 1)[] = [];
  const labels: number[] = [];
  for (let j = 0; j < n; j++) {
    for (const c of children[order[j]!]!) {
      order.push(c);
      path.push(1);
      labels.push(c);
    }
    path.push(0);
  }
  return { path, labels };
}

/** The inverse: the cars of column j become the children of the j-th vertex in breadth-first order. */
export function treeOfParking(pf: LabelledDyckPath): number[] {
  const n = pf.labels.length;
  const parent = new Array<number>(n);
  const order = [0];
  let column = 0;
  let row = 0;
  for (const s of pf.path) {
    if (s === 0) {
      column++;
      continue;
    }
    const car = pf.labels[row++]!;
    parent[car - 1] = order[column]!;
    order.push(car);
  }
  return parent;
}
