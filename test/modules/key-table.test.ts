import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { KeyTable } from '../../src/modules/key-table.js';

describe('KeyTable', () => {
  it('agrees with a Map in hashed mode, keys up to 2^53 (growth included)', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.maxSafeNat(), fc.nat(1e6)), { maxLength: 3000 }), fc.array(fc.maxSafeNat(), { maxLength: 100 }), (pairs, probes) => {
        const t = new KeyTable(Number.POSITIVE_INFINITY);
        const m = new Map<number, number>();
        for (const [k, v] of pairs) {
          t.set(k, v);
          m.set(k, v);
        }
        expect(t.size).toBe(m.size);
        for (const [k, v] of m) expect(t.get(k)).toBe(v);
        for (const k of probes) expect(t.get(k)).toBe(m.get(k) ?? -2);
      }),
      { numRuns: 50 },
    );
  });

  it('clear() forgets every key, flat or hashed', () => {
    for (const bound of [1000, Number.POSITIVE_INFINITY]) {
      const t = new KeyTable(bound);
      for (let k = 0; k < 900; k++) t.set(k, k + 1);
      t.clear();
      for (let k = 0; k < 900; k++) expect(t.get(k)).toBe(-2);
      t.set(5, 7);
      expect(t.get(5)).toBe(7);
    }
  });

  it('uses a flat array below the limit and answers −2 for absent keys', () => {
    const t = new KeyTable(100);
    expect(t.array).toBeDefined();
    expect(t.get(7)).toBe(-2);
    t.set(7, 3);
    expect(t.get(7)).toBe(3);
  });
});
