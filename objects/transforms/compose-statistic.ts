/**
 * A statistic read through a transform: (t then s)(x) = s(t(x)), a statistic on the
 * transform's source family. Named `t:s` (e.g. `foata:inversions`, equal to the major index).
 */
import { InputError } from '../../src/core/errors.js';
import type { Statistic, Transform } from '../../src/enumerate/plugin.js';

export function composeStatistic<A, B>(t: Transform<A, B>, s: Statistic<B>): Statistic<A> {
  if (s.family !== t.to) {
    throw new InputError(`statistic ${s.id} is defined on ${s.family}, but transform ${t.id} leads to ${t.to}`, 'stat');
  }
  return {
    id: `${t.id}:${s.id}`,
    family: t.from,
    description: `${s.id} of the image under ${t.id} (${s.description})`,
    source: `${s.source}; transform: ${t.source}`,
    examples: t.examples.map(([a, b]) => [a, s.compute(b)] as const),
    compute: (x) => s.compute(t.apply(x)),
  };
}
