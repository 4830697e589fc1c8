/** The text of a module or quotient result: the Hilbert table's columns line up under their labels. */
import { describe, expect, it } from 'vitest';
import { tableLines } from '../../src/modules/format-result.js';

describe('Hilbert table text', () => {
  it('keeps two-digit column labels (y=10) apart and right-aligned with their values', () => {
    // A table with y-degrees 0..11 (the shape of the diagonal coinvariants of n = 5 and beyond).
    const row = [1, 4, 9, 15, 20, 22, 20, 15, 9, 4, 1, 0];
    const lines = tableLines([row, row.map(() => 0)], ['x', 'y']);
    const head = lines[0]!;
    expect(head).toContain(' y=9 ');
    expect(head).toContain(' y=10 ');
    const labels = [...head.matchAll(/y=\d+/g)];
    expect(labels.length).toBe(12);
    // Each label ends in the column where the value under it ends.
    const values = [...lines[1]!.matchAll(/\d+/g)].slice(1); // after the row label x=0
    expect(values.map((m) => m.index! + m[0].length)).toEqual(labels.map((m) => m.index! + m[0].length));
  });
});
