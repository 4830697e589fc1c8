/**
 * The q,t-Schröder statistics (Haglund, "The q,t-Catalan Numbers and the Space of Diagonal
 * Harmonics", AMS 2008, ch. 4; Haglund, "A proof of the q,t-Schröder conjecture", Int. Math.
 * Res. Not. 2004): Σ q^{area} t^{bounce} = Σ q^{dinv} t^{area} = ⟨∇e_n, e_{n−d}h_d⟩ over the
 * paths with d diagonal steps. Rows 1..n bottom to top; a_r = y − x where row r's step starts
 * (for a diagonal step, the lower triangle it cuts counts).
 * The definitions below are our restatement; the tests check both identities against the
 * symmetric-function engine for n ≤ 6 and every d.
 */
import { schroderRows } from '../objects/support/schroder.js';
import type { Statistic } from '../src/enumerate/plugin.js';
import type { SchroderPath } from '../objects/types.js';

const FAMILY = 'schroder-paths';
const HAGLUND = 'Haglund, The q,t-Catalan Numbers and the Space of Diagonal Harmonics (AMS 2008), ch. 4';

export const schroderArea: Statistic<SchroderPath> = {
  id: 'schroder-area',
  family: FAMILY,
  description: 'lower triangles between the path and the diagonal: Σ a_r over all rows',
  source: HAGLUND,
  examples: [
    [[1, 2, 0], 1],
    [[1, 0, 2], 0],
    [[1, 1, 0, 0], 1],
    [[1, 1, 2, 0, 0], 3],
    [[2, 2], 0],
  ],
  compute: (p) => schroderRows(p).area.reduce((a, b) => a + b, 0),
};

export const schroderBounce: Statistic<SchroderPath> = {
  id: 'schroder-bounce',
  family: FAMILY,
  description: 'bounce of the Dyck path left by deleting the diagonal steps (touch points 0 = j_0 < … < j_b = m, Σ (m − j_i) for 0 < i < b), plus, per diagonal step with x east steps before it, the number of j_i < x (i < b)',
  source: `${HAGLUND}; Haglund, Int. Math. Res. Not. 2004`,
  examples: [
    [[1, 0, 2], 1],
    [[1, 2, 0], 0],
    [[2, 1, 0], 0],
    [[1, 0, 1, 0, 2], 3],
    [[1, 1, 0, 2, 0], 1],
    [[1, 0, 1, 0], 1],
  ],
  compute(p) {
    const cols: number[] = []; // x of each north step of the reduced Dyck path
    let x = 0;
    for (const s of p) {
      if (s === 1) cols.push(x);
      else if (s === 0) x++;
    }
    const m = cols.length;
    // Touch points of the bounce path: from j go north to the top of column j, then east.
    const touches = [0];
    for (let j = 0; j < m; ) {
      let next = 0;
      while (next < m && cols[next]! <= j) next++;
      touches.push((j = next));
    }
    let s = 0;
    for (let i = 1; i < touches.length - 1; i++) s += m - touches[i]!;
    x = 0;
    for (const step of p) {
      if (step === 0) x++;
      else if (step === 2) for (let i = 0; i < touches.length - 1 && touches[i]! < x; i++) s++;
    }
    return s;
  },
};

export const schroderDinv: Statistic<SchroderPath> = {
  id: 'schroder-dinv',
  family: FAMILY,
  description: 'pairs of rows r < s with a_r = a_s and row r not diagonal, or a_r = a_s + 1 and row s not diagonal',
  source: HAGLUND,
  examples: [
    [[1, 0, 2], 1],
    [[1, 2, 0], 0],
    [[2, 1, 0], 0],
    [[2, 2], 0],
    [[1, 1, 0, 2, 0], 1],
    [[1, 0, 1, 0], 1],
  ],
  compute(p) {
    const { area: a, diagonal } = schroderRows(p);
    let s = 0;
    for (let i = 0; i < a.length; i++) {
      for (let j = i + 1; j < a.length; j++) {
        if (a[i] === a[j] && !diagonal[i]) s++;
        else if (a[i] === a[j]! + 1 && !diagonal[j]) s++;
      }
    }
    return s;
  },
};
