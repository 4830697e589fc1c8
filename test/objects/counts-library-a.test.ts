/**
 * Counts of the Delta/Shuffle and superspace families (part A of the statistics library),
 * generated and by each family's own formula, against outside references named beside each.
 */
import { catalan, combinations, factorial, stirlingS2 } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import type { Params } from '../../src/enumerate/plugin.js';
import { SymFun } from '../../src/symfun/symfun.js';

function streamed(id: string, p: Params): number {
  let c = 0;
  for (const _ of familyById(id).generate(p)) c++;
  return c;
}
function both(id: string, p: Params): [number, number] {
  return [streamed(id, p), Number(familyById(id).count(p))];
}
function compositions(n: number): number[][] {
  if (n === 0) return [[]];
  const out: number[][] = [];
  for (let f = 1; f <= n; f++) for (const r of compositions(n - f)) out.push([f, ...r]);
  return out;
}

describe('ordered multiset partitions', () => {
  it('content 1^n: k!·S(n,k) (mathjs factorial, stirlingS2)', () => {
    for (let n = 1; n <= 6; n++) {
      for (let k = 1; k <= n; k++) {
        const ref = Number(factorial(k)) * Number(stirlingS2(n, k));
        expect(both('ordered-multiset-partitions', { content: new Array<number>(n).fill(1), k })).toEqual([ref, ref]);
      }
    }
  });
  it('content α: the coefficient of x^α in (e_1 + e_2 + …)^k, i.e. ⟨(Σ_j e_j)^k, h_α⟩ (each block is a set: common practice; computed with the symmetric-function engine)', () => {
    for (let n = 2; n <= 5; n++) {
      const blocks = Array.from({ length: n }, (_, j) => SymFun.basisElement('e', [j + 1])).reduce((a, b) => a.add(b));
      let power = SymFun.one;
      for (let k = 1; k <= n; k++) {
        power = power.mul(blocks);
        const degreeN = power.homogeneousPart(n);
        for (const alpha of compositions(n)) {
          const h = SymFun.basisElement('h', [...alpha].sort((a, b) => b - a));
          const ref = Number(degreeN.hallInner(h).toPoly().constantTerm());
          expect(both('ordered-multiset-partitions', { content: alpha, k }), `α=${alpha} k=${k}`).toEqual([ref, ref]);
        }
      }
    }
  });
});
