/** `show`: objects of a family drawn as text, with chosen statistics beside each. */
import { familyById } from '../../objects/index.js';
import { arrayFrom, map, range, take } from 'iter-tools';
import { InputError } from '../core/errors.js';
import type { Params } from '../enumerate/plugin.js';
import { FAMILY_PARAM_OPTIONS, familyParams, paramOptionValues, resolveStatistic } from './family-params.js';
import { flagOpt, intOpt, listOpt, type OptionSpec } from './options.js';
import type { RequestKind } from './request-kind.js';

export interface ShowRequest {
  readonly kind: 'show';
  readonly family: string;
  readonly params: Params;
  readonly statistics: readonly string[];
  readonly limit: number;
  /** Draw at random with this seed instead of the first objects. */
  readonly sample?: number;
}

export interface ShownObject {
  readonly key: string;
  readonly text: string;
  readonly object: unknown;
  readonly stats: Readonly<Record<string, number>>;
}

export interface ShowResult {
  readonly family: string;
  readonly params: Params;
  readonly count: bigint;
  readonly statistics: readonly string[];
  readonly objects: readonly ShownObject[];
  readonly sample?: number;
}

export const SHOW_OPTIONS: readonly OptionSpec[] = [
  ...FAMILY_PARAM_OPTIONS,
  { name: 'stat', type: 'list', description: 'statistics to show beside each object (repeat or separate by commas); T:S reads S after the transform T', placeholder: 'S' },
  { name: 'limit', type: 'int', description: 'how many objects to draw (default 20)', placeholder: 'M', min: 1, max: 100000 },
  { name: 'sample', type: 'flag', description: 'draw uniformly random objects instead of the first ones' },
  { name: 'seed', type: 'int', description: 'seed for --sample (default 1)', placeholder: 'S', min: 0, max: 2 ** 31 - 1 },
];

/** A small seeded generator (mulberry32, common practice) so --sample --seed repeats. */
function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = Math.imul(a ^ (a >>> 15), a | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export const showKind: RequestKind<ShowRequest, ShowResult> = {
  name: 'show',
  usage: 'show <family> [family parameters] [--stat S …] [--limit M] [--sample [--seed S]] [--json]',
  positionals: [{ name: 'family', description: 'a family id (see gradus families)' }],
  options: SHOW_OPTIONS,
  fromArgs(args) {
    const family = familyById(args.positionals[0]!);
    const params = familyParams(family, args);
    const statistics = listOpt(args, 'stat') ?? [];
    for (const s of statistics) resolveStatistic(family, s);
    const sample = flagOpt(args, 'sample');
    if (!sample && intOpt(args, 'seed') !== undefined) throw new InputError('--seed needs --sample', 'seed');
    return { kind: 'show', family: family.id, params, statistics, limit: intOpt(args, 'limit') ?? 20, ...(sample ? { sample: intOpt(args, 'seed') ?? 1 } : {}) };
  },
  canonical(r) {
    return {
      positionals: [r.family],
      options: { ...paramOptionValues(r.params), stat: r.statistics.length ? r.statistics : undefined, limit: r.limit === 20 ? undefined : r.limit, sample: r.sample !== undefined || undefined, seed: r.sample },
    };
  },
  async compute(r) {
    const family = familyById(r.family);
    const stats = r.statistics.map((s) => resolveStatistic(family, s));
    const count = family.count(r.params);
    const random = seeded(r.sample ?? 1);
    // objects drawn lazily: a family of billions is read only as far as --limit
    const source: Iterable<unknown> =
      r.sample === undefined ? family.generate(r.params) : count > 0n ? map(() => family.sample(r.params, random), range(r.limit)) : [];
    const objects = arrayFrom(map((x) => ({ key: family.key(x), text: family.render(x), object: x, stats: Object.fromEntries(stats.map((s) => [s.id, s.compute(x)])) }), take(r.limit, source)));
    return { family: r.family, params: r.params, count, statistics: stats.map((s) => s.id), objects, ...(r.sample !== undefined ? { sample: r.sample } : {}) };
  },
  document(r, result) {
    return {
      family: result.family,
      params: result.params,
      count: result.count,
      order: r.sample !== undefined ? 'random' : 'generation',
      ...(r.sample !== undefined ? { seed: r.sample } : {}),
      shown: result.objects.length,
      objects: result.objects,
    };
  },
};
