/**
 * Binary and plane trees and their classical Dyck-path codings (Stanley, EC2 §6.19, items on
 * binary and plane trees): a binary tree [L, R] is coded 1 B(L) 0 B(R); a plane forest is coded
 * by its depth-first walk, 1 down an edge and 0 back up. The rotation correspondence
 * (first child, next sibling) turns the forest of a plane tree's subtrees into a binary tree.
 */
import type { BinaryTree, DyckPath, PlaneTree } from '../types.js';

/** The binary tree coded by p[i..] up to the end or to an unmatched 0; returns it and where it stopped. */
function parseBinary(p: DyckPath, i: number): [BinaryTree, number] {
  if (i >= p.length || p[i] === 0) return [null, i];
  const [left, j] = parseBinary(p, i + 1);
  const [right, k] = parseBinary(p, j + 1);
  return [[left, right], k];
}

/** The binary tree with n nodes of a Dyck path of semilength n. */
export function binaryTreeOfDyck(p: DyckPath): BinaryTree {
  return parseBinary(p, 0)[0];
}

/** The Dyck path 1 B(L) 0 B(R) of a binary tree. */
export function dyckOfBinaryTree(t: BinaryTree): (0 | 1)[] {
  const out: (0 | 1)[] = [];
  const rec = (u: BinaryTree): void => {
    if (u === null) return;
    out.push(1);
    rec(u[0]);
    out.push(0);
    rec(u[1]);
  };
  rec(t);
  return out;
}

function parseForest(p: DyckPath, i: number): [PlaneTree[], number] {
  const out: PlaneTree[] = [];
  while (i < p.length && p[i] === 1) {
    const [sub, j] = parseForest(p, i + 1);
    out.push(sub);
    i = j + 1;
  }
  return [out, i];
}

/** The plane tree with n edges whose depth-first walk is the Dyck path. */
export function planeTreeOfDyck(p: DyckPath): PlaneTree {
  return parseForest(p, 0)[0];
}

/** The depth-first walk of a plane tree: 1 down each edge, 0 back up. */
export function dyckOfPlaneTree(t: PlaneTree): (0 | 1)[] {
  const out: (0 | 1)[] = [];
  const rec = (u: PlaneTree): void => {
    for (const c of u) {
      out.push(1);
      rec(c);
      out.push(0);
    }
  };
  rec(t);
  return out;
}

/** Rotation correspondence: first child becomes the left subtree, next sibling the right one. */
export function binaryOfForest(forest: readonly PlaneTree[]): BinaryTree {
  let t: BinaryTree = null;
  for (let i = forest.length - 1; i >= 0; i--) t = [binaryOfForest(forest[i]!), t];
  return t;
}

/** The inverse of binaryOfForest. */
export function forestOfBinary(t: BinaryTree): PlaneTree[] {
  const out: PlaneTree[] = [];
  for (let u = t; u !== null; u = u[1]) out.push(forestOfBinary(u[0]));
  return out;
}

/** Number of nodes of a binary tree. */
export function binarySize(t: BinaryTree): number {
  return t === null ? 0 : 1 + binarySize(t[0]) + binarySize(t[1]);
}
