/**
 * Contract tests run on every statistic of the registry: its worked examples (computed by
 * hand from the definition in the statistic's file) hold, compute is deterministic and gives
 * a non-negative integer, on the examples and on random objects of the family when the
 * family is registered.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { FAMILIES } from '../../objects/index.js';
import { InputError } from '../../src/core/errors.js';
import { STATISTICS } from '../../statistics/index.js';

describe('statistics registry contract', () => {
  it('has at least 45 statistics with unique kebab-case ids, descriptions and sources', () => {
    expect(STATISTICS.length).toBeGreaterThanOrEqual(45);
    expect(new Set(STATISTICS.map((s) => s.id)).size).toBe(STATISTICS.length);
    for (const s of STATISTICS) {
      expect(s.id).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
      expect(s.description.length, s.id).toBeGreaterThan(5);
      expect(s.source.length, s.id).toBeGreaterThan(5);
      expect(s.examples.length, `${s.id} has worked examples`).toBeGreaterThanOrEqual(3);
    }
  });

  for (const s of STATISTICS) {
    describe(s.id, () => {
      it('reproduces its worked examples (computed by hand)', () => {
        for (const [obj, value] of s.examples) expect(s.compute(obj), `${s.id} on ${JSON.stringify(obj)}`).toBe(value);
      });
      const family = FAMILIES.find((f) => f.id === s.family);
      it.runIf(family !== undefined)('is deterministic and a non-negative integer on random objects of its family', () => {
        const fam = family!;
        const params = fam.testParams.filter((p) => fam.count(p) > 0n);
        let computed = 0;
        fc.assert(
          fc.property(fc.nat(params.length - 1), fc.integer({ min: 1, max: 2 ** 30 }), (pi, seed) => {
            let x = seed;
            const random = (): number => ((x = (Math.imul(x, 1103515245) + 12345) >>> 0) / 2 ** 32); // seeded stream
            const obj = fam.sample(params[pi]!, random);
            let v: number;
            try {
              v = s.compute(obj);
            } catch (e) {
              // A statistic with a narrower domain (charge needs a partition content) says so.
              expect(e).toBeInstanceOf(InputError);
              expect(() => s.compute(obj)).toThrow(InputError);
              return;
            }
            computed++;
            expect(Number.isInteger(v) && v >= 0).toBe(true);
            expect(s.compute(obj)).toBe(v);
          }),
          { numRuns: 40 },
        );
        expect(computed).toBeGreaterThan(0);
      });
    });
  }
});
