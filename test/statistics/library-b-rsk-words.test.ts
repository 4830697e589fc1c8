/** RSK on words: onto pairs (P semistandard of the word's content, Q standard of the same shape), keeping descents. */
import { multinomial } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import { transformById } from '../../objects/transforms/index.js';
import type { Tableau } from '../../objects/types.js';

describe('RSK on words', () => {
  it('words of a content ↔ pairs (P, Q): P in the semistandard family of its shape and content, Q standard of the same shape, all pairs distinct, Des(Q) = Des(w) (Knuth 1970; Stanley EC2 §7.11, Lemma 7.23.1 from memory; mathjs multinomial)', () => {
    const ins = transformById('word-rsk-insertion');
    const rec = transformById('word-rsk-recording');
    const ssyt = familyById('semistandard-tableaux');
    const syt = familyById('standard-tableaux');
    for (const content of [[2, 1, 1], [2, 2, 1], [1, 3, 2], [2, 2, 2]]) {
      const pairs = new Set<string>();
      let words = 0;
      for (const w of familyById('words').generate({ content })) {
        words++;
        const p = ins.apply(w) as Tableau;
        const q = rec.apply(w) as Tableau;
        const shape = p.map((r) => r.length);
        expect(q.map((r) => r.length)).toEqual(shape);
        expect(new Set([...ssyt.generate({ shape, content })].map((t) => ssyt.key(t))).has(ssyt.key(p))).toBe(true);
        expect(new Set([...syt.generate({ shape })].map((t) => syt.key(t))).has(syt.key(q))).toBe(true);
        const rowOf = new Map<number, number>();
        q.forEach((r, i) => r.forEach((x) => rowOf.set(x, i)));
        const a = w as number[];
        for (let i = 1; i < a.length; i++) expect(rowOf.get(i + 1)! > rowOf.get(i)!).toBe(a[i - 1]! > a[i]!);
        pairs.add(`${ssyt.key(p)}|${syt.key(q)}`);
      }
      expect([words, pairs.size]).toEqual([multinomial(content), multinomial(content)]);
    }
  });
});
