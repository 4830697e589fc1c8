/**
 * The zeta map on Schröder paths, extending Haglund's map on Dyck paths (Haglund, The
 * q,t-Catalan Numbers and the Space of Diagonal Harmonics, AMS 2008, ch. 3–4): it carries
 * (dinv, area) to (area, bounce). Recipe: with the row data (a_r, diagonal or not) bottom to
 * top, for v = 0, 1, …, max + 1 scan the rows upwards writing a north step for each north row
 * with a_r = v, an east step for each north row with a_r = v − 1, and a diagonal step for each
 * diagonal row with a_r = v. The tests check both identities and bijectivity for n ≤ 7.
 */
import type { Transform } from '../../src/enumerate/plugin.js';
import { schroderRows } from '../support/schroder.js';
import type { SchroderPath } from '../types.js';

export function schroderZetaMap(path: SchroderPath): (0 | 1 | 2)[] {
  const { area, diagonal } = schroderRows(path);
  const max = area.reduce((m, x) => Math.max(m, x), 0);
  const out: (0 | 1 | 2)[] = [];
  for (let v = 0; v <= max + 1; v++) {
    area.forEach((a, r) => {
      if (diagonal[r]) {
        if (a === v) out.push(2);
      } else if (a === v) out.push(1);
      else if (a === v - 1) out.push(0);
    });
  }
  return out;
}

export const schroderZeta: Transform<SchroderPath, SchroderPath> = {
  id: 'schroder-zeta',
  from: 'schroder-paths',
  to: 'schroder-paths',
  description: 'the zeta map extended to Schröder paths: carries (dinv, area) to (area, bounce)',
  source: 'Haglund, The q,t-Catalan Numbers and the Space of Diagonal Harmonics (AMS 2008), ch. 3–4',
  examples: [
    [[1, 0, 2], [1, 2, 0]],
    [[2, 1, 0], [2, 1, 0]],
    [[1, 2, 0], [1, 0, 2]],
    [[1, 0, 1, 0], [1, 1, 0, 0]],
  ],
  apply: schroderZetaMap,
};
