/**
 * Conjugation of superpartitions: transpose the diagram, circles included (Desrosiers–
 * Lapointe–Mathieu, "Classical symmetric functions in superspace", J. Algebraic Combin. 24
 * (2006) §2). A circle ends its row and, a fermionic row lying above the bosonic rows of its
 * length, also ends its column; so after transposing it ends a row again: the circle in row r
 * gives the fermionic part r of the conjugate. An involution keeping n and m (tests).
 */
import { conjugate } from '../../src/core/partitions.js';
import type { Transform } from '../../src/enumerate/plugin.js';
import { diagramRows } from '../support/superpartition.js';
import type { Superpartition } from '../types.js';

export function conjugateSuperpartition(s: Superpartition): Superpartition {
  const rows = diagramRows(s);
  const plain = conjugate(rows.map((r) => r.length).filter((x) => x > 0));
  const circleColumns = new Set<number>();
  const fermionic: number[] = [];
  rows.forEach((r, i) => {
    if (!r.circle) return;
    circleColumns.add(r.length); // the circle sits in column r.length of row i
    fermionic.push(i);
  });
  const bosonic = plain.filter((len, c) => !circleColumns.has(c) && len > 0);
  return { fermionic: fermionic.sort((a, b) => b - a), bosonic };
}

export const superpartitionConjugate: Transform<Superpartition, Superpartition> = {
  id: 'superpartition-conjugate',
  from: 'superpartitions',
  to: 'superpartitions',
  description: 'the conjugate superpartition: the diagram transposed with its circles',
  source: 'Desrosiers–Lapointe–Mathieu, J. Algebraic Combin. 24 (2006) §2',
  examples: [
    [{ fermionic: [1], bosonic: [] }, { fermionic: [0], bosonic: [1] }],
    [{ fermionic: [0], bosonic: [1] }, { fermionic: [1], bosonic: [] }],
    [{ fermionic: [2, 0], bosonic: [1] }, { fermionic: [2, 0], bosonic: [1] }],
    [{ fermionic: [], bosonic: [3, 1] }, { fermionic: [], bosonic: [2, 1, 1] }],
  ],
  apply: conjugateSuperpartition,
  involution: true,
};
