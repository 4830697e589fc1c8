/**
 * Haglund's zeta map on Dyck paths: dinv(π) = area(ζ(π)) and area(π) = bounce(ζ(π))
 * (Haglund, The q,t-Catalan numbers and the space of diagonal harmonics, AMS 2008,
 * ch. 3 — from memory; both identities and bijectivity are checked in the tests).
 * Recipe: with the area sequence a of π, for v = 0, 1, …, max+1 scan a from left to right
 * writing a north step for each a_i = v and an east step for each a_i = v − 1.
 */
import type { Transform } from '../../src/enumerate/plugin.js';
import { areaSequence } from '../support/dyck.js';
import type { DyckPath } from '../types.js';

export function zetaMap(path: DyckPath): (0 | 1)[] {
  const a = areaSequence(path);
  const max = a.reduce((m, x) => Math.max(m, x), 0);
  const out: (0 | 1)[] = [];
  for (let v = 0; v <= max + 1; v++) {
    for (const x of a) {
      if (x === v) out.push(1);
      else if (x === v - 1) out.push(0);
    }
  }
  return out;
}

export const zeta: Transform<DyckPath, DyckPath> = {
  id: 'zeta',
  from: 'dyck-paths',
  to: 'dyck-paths',
  description: "Haglund's zeta map: carries (dinv, area) to (area, bounce)",
  source: 'Haglund, The q,t-Catalan numbers and the space of diagonal harmonics (AMS 2008), ch. 3',
  examples: [
    [[1, 0, 1, 0], [1, 1, 0, 0]],
    [[1, 1, 0, 0], [1, 0, 1, 0]],
    [[1, 1, 0, 1, 0, 0], [1, 0, 1, 1, 0, 0]],
  ],
  apply: zetaMap,
};
