/** Dyck paths of semilength n (1 = north, 0 = east), streamed in lexicographic order. */
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { drawDyckPath, firstDyckPath, nextDyckPath, randomDyckPath } from './support/dyck.js';
import { catalan } from './support/numbers.js';
import { intParam, validateBySpec } from './support/params.js';
import { shardParts } from './support/shards.js';
import type { DyckPath } from './types.js';

const PARAMS: readonly ParamSpec[] = [{ name: 'n', kind: 'int', description: 'semilength n', min: 0, max: 30 }];
const validate = (params: Params): void => validateBySpec('dyck-paths', PARAMS, params);

export const dyckPaths: Family<DyckPath> = {
  id: 'dyck-paths',
  description: 'Dyck paths of semilength n (north and east steps, never below the diagonal)',
  source: 'standard (Stanley, EC2 ch. 6 exercises on Catalan numbers; Haglund, The q,t-Catalan numbers, ch. 1)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const a = firstDyckPath(intParam(params, 'n'));
    do yield a.slice();
    while (nextDyckPath(a));
  },
  visit(params, f, shard) {
    validate(params);
    // Every shard steps all paths (cheap) and keeps every count-th one for f.
    const [index, count] = shardParts(shard);
    const a = firstDyckPath(intParam(params, 'n'));
    let j = 0;
    do if (j++ % count === index) f(a);
    while (nextDyckPath(a));
  },
  count(params) {
    validate(params);
    return catalan(intParam(params, 'n'));
  },
  render: (p) => drawDyckPath(p),
  sample(params, random) {
    validate(params);
    return randomDyckPath(intParam(params, 'n'), random);
  },
  key: (p) => p.map((s) => (s === 1 ? 'N' : 'E')).join(''),
  testParams: [{ n: 0 }, { n: 1 }, { n: 3 }, { n: 5 }],
};
