/**
 * Monotone triangles of order n with bottom row 1, 2, …, n: row k (k = 1..n, top down) has k
 * strictly increasing entries, each weakly between the two entries below it. They code the
 * alternating sign matrices of order n, so they are as many (10 850 216 at n = 8).
 * Fast path: `visit` steps one set of rows; shards by the two rows above the bottom one.
 */
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { asmCount, firstMonotoneTriangle, nextMonotoneTriangle, randomMonotoneTriangle, visitMonotoneTriangles } from './support/monotone-triangles.js';
import { intParam, validateBySpec } from './support/params.js';
import type { MonotoneTriangle } from './types.js';

const PARAMS: readonly ParamSpec[] = [{ name: 'n', kind: 'int', description: 'order n (bottom row 1..n)', min: 0, max: 12 }];
const validate = (params: Params): void => validateBySpec('monotone-triangles', PARAMS, params);

function draw(rows: MonotoneTriangle): string {
  if (rows.length === 0) return '(empty triangle)';
  const w = String(rows.length).length;
  const n = rows.length;
  return rows.map((r, k) => ' '.repeat((n - 1 - k) * Math.ceil((w + 1) / 2)) + r.map((x) => String(x).padStart(w)).join(' ')).join('\n');
}

export const monotoneTriangles: Family<MonotoneTriangle> = {
  id: 'monotone-triangles',
  description: 'monotone triangles with bottom row 1..n (rows strictly increasing, each entry between its two neighbours below)',
  source: 'Mills–Robbins–Rumsey, J. Combin. Theory Ser. A 34 (1983); Bressoud, Proofs and Confirmations (1999) §1.2',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const rows = firstMonotoneTriangle(intParam(params, 'n'));
    do yield rows.map((r) => r.slice());
    while (nextMonotoneTriangle(rows));
  },
  visit(params, f, shard) {
    validate(params);
    visitMonotoneTriangles(intParam(params, 'n'), f, shard);
  },
  count(params) {
    validate(params);
    return asmCount(intParam(params, 'n'));
  },
  render: draw,
  sample(params, random) {
    validate(params);
    return randomMonotoneTriangle(intParam(params, 'n'), random);
  },
  key: (rows) => rows.map((r) => r.join(',')).join('/'),
  testParams: [{ n: 0 }, { n: 1 }, { n: 3 }, { n: 5 }],
};
