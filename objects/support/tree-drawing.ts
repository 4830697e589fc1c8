/** Text drawings of rooted trees (one vertex a line, children indented under their parent) and parent-array helpers. */

/** Draws the tree below `root`; `children(v)` in drawing order, `label(v)` the text of a vertex. */
export function drawRooted(root: number, children: (v: number) => readonly number[], label: (v: number) => string): string {
  const lines = [label(root)];
  const rec = (v: number, prefix: string): void => {
    const cs = children(v);
    cs.forEach((c, i) => {
      const last = i === cs.length - 1;
      lines.push(`${prefix}${last ? '└─' : '├─'}${label(c)}`);
      rec(c, prefix + (last ? '  ' : '│ '));
    });
  };
  rec(root, '');
  return lines.join('\n');
}

/** Children lists (increasing) of the tree on 0..n given by parent[i−1] = parent of i. */
export function childrenOf(parent: readonly number[]): number[][] {
  const out: number[][] = Array.from({ length: parent.length + 1 }, () => []);
  parent.forEach((p, i) => out[p]!.push(i + 1));
  return out;
}

/** Depth of every vertex 0..n (root 0 at depth 0), by a walk from the root. */
export function depthsOf(parent: readonly number[]): number[] {
  const children = childrenOf(parent);
  const depth = new Array<number>(parent.length + 1).fill(0);
  const stack = [0];
  while (stack.length > 0) {
    const v = stack.pop()!;
    for (const c of children[v]!) {
      depth[c] = depth[v]! + 1;
      stack.push(c);
    }
  }
  return depth;
}

/** A parent-array tree on 0..n drawn with its labels. */
export function drawParentTree(parent: readonly number[]): string {
  const children = childrenOf(parent);
  return drawRooted(0, (v) => children[v]!, String);
}
