/**
 * `gradus show <family> --n N [--k K] [--d D] [--shape λ] [--content μ] [--outer λ --inner μ] [--stat S…]
 * [--limit M] [--sample] [--seed S] [--json]`: draws objects of a family with the values
 * of chosen statistics beside each. familyParams turns the options into family params
 * (exported so other commands read family parameters the same way).
 */
import { familyById } from '../../../objects/index.js';
import { composeStatistic } from '../../../objects/transforms/compose-statistic.js';
import { transformsFrom } from '../../../objects/transforms/index.js';
import { InputError } from '../../core/errors.js';
import { unknownNameMessage } from '../../core/suggest.js';
import type { Family, Params, Statistic } from '../../enumerate/plugin.js';
import { statisticsOfFamily } from '../../../statistics/index.js';
import { flagOpt, intOpt, listOpt, type OptionSpec, type ParsedArgs, type CommandSpec } from '../command.js';
import { toJsonText } from '../json-output.js';

/** The options that carry family parameters (each family uses some of them). */
export const FAMILY_PARAM_OPTIONS: readonly OptionSpec[] = [
  { name: 'n', type: 'int', description: 'size n', placeholder: 'N', min: 0, max: 1000 },
  { name: 'k', type: 'int', description: 'second parameter k (blocks, parts, ones; Δ′_{e_{k−1}} for decorated paths)', placeholder: 'K', min: 0, max: 1000 },
  { name: 'd', type: 'int', description: 'number of decorated double rises (decorated-dyck-paths)', placeholder: 'D', min: 0, max: 1000 },
  { name: 'shape', type: 'list', description: 'a partition such as 3,1 (tableaux, fillings)', placeholder: 'A,B,…' },
  { name: 'content', type: 'list', description: 'letter multiplicities such as 2,1,1 (words, semistandard tableaux)', placeholder: 'A,B,…' },
  { name: 'outer', type: 'list', description: 'the outer shape λ of a skew shape λ/μ such as 3,2 (skew tableaux)', placeholder: 'A,B,…' },
  { name: 'inner', type: 'list', description: 'the inner shape μ of a skew shape λ/μ such as 1 (skew tableaux)', placeholder: 'A,B,…' },
];

/** Family params from the parsed options; the family's validate names any bad one. */
export function familyParams(family: Family<unknown>, args: ParsedArgs): Params {
  const params: Record<string, number | number[]> = {};
  for (const o of FAMILY_PARAM_OPTIONS) {
    if (o.type === 'int') {
      const v = intOpt(args, o.name);
      if (v !== undefined) params[o.name] = v;
    } else {
      const v = listOpt(args, o.name);
      if (v === undefined) continue;
      if (v.some((s) => !/^\d+$/.test(s))) throw new InputError(`--${o.name} must be comma-separated non-negative integers such as 2,1 (got "${v.join(',')}")`, o.name);
      params[o.name] = v.map(Number).filter((x, i, a) => !(['shape', 'outer', 'inner'].includes(o.name) && x === 0 && a.length === 1));
    }
  }
  for (const name of Object.keys(params)) {
    if (!family.params.some((p) => p.name === name)) {
      const own = family.params.map((p) => `--${p.name}`).join(', ') || 'none';
      throw new InputError(`${family.id} takes no --${name} (its options: ${own})`, name);
    }
  }
  family.validate(params);
  return params;
}

/**
 * The statistic named `name` on the family: a statistic id of the family, or `t:s`, the
 * statistic s read after the transform t (t from the family, s on t's target family).
 */
export function resolveStatistic(family: Family<unknown>, name: string): Statistic<unknown> {
  const colon = name.indexOf(':');
  if (colon >= 0) {
    const t = transformsFrom(family.id).find((x) => x.id === name.slice(0, colon));
    if (!t) {
      const list = transformsFrom(family.id).map((x) => x.id);
      throw new InputError(list.length ? unknownNameMessage(`transform from ${family.id}`, name.slice(0, colon), list) : `${family.id} has no transforms (asked for "${name}")`, 'stat');
    }
    return composeStatistic(t, resolveStatistic(familyById(t.to), name.slice(colon + 1)));
  }
  const own = statisticsOfFamily(family.id);
  const hit = own.find((s) => s.id === name);
  if (hit) return hit;
  const list = own.map((s) => s.id);
  throw new InputError(list.length ? unknownNameMessage(`statistic of ${family.id}`, name, list) : `${family.id} has no statistics yet (asked for "${name}")`, 'stat');
}

/** The statistics named by --stat, each checked against the family. */
export function chosenStatistics(family: Family<unknown>, names: readonly string[]): Statistic<unknown>[] {
  return names.map((name) => resolveStatistic(family, name));
}

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

function describeParams(p: Params): string {
  return Object.entries(p)
    .map(([k, v]) => `${k}=${typeof v === 'number' ? v : v!.join(',')}`)
    .join(' ');
}

export const showCommand: CommandSpec = {
  name: 'show',
  summary: 'draw objects of a family with the values of chosen statistics',
  usage: 'show <family> --n N [--k K] [--d D] [--shape A,B,…] [--content A,B,…] [--outer A,B,… [--inner A,B,…]] [--stat S …] [--limit M] [--sample [--seed S]] [--json]',
  positionals: [{ name: 'family', description: 'a family id (see gradus families)' }],
  options: [
    ...FAMILY_PARAM_OPTIONS,
    { name: 'stat', type: 'list', description: 'statistics to show beside each object (repeat or separate by commas); T:S reads S after the transform T', placeholder: 'S' },
    { name: 'limit', type: 'int', description: 'how many objects to draw (default 20)', placeholder: 'M', min: 1, max: 100000 },
    { name: 'sample', type: 'flag', description: 'draw uniformly random objects instead of the first ones' },
    { name: 'seed', type: 'int', description: 'seed for --sample (default 1)', placeholder: 'S', min: 0, max: 2 ** 31 - 1 },
  ],
  producesData: true,
  details: 'Objects come in the family\'s generation order (or at random with --sample). See `gradus families` for ids and parameters.',
  run(args, io) {
    const family = familyById(args.positionals[0]!);
    const params = familyParams(family, args);
    const stats = chosenStatistics(family, listOpt(args, 'stat') ?? []);
    const limit = intOpt(args, 'limit') ?? 20;
    const total = family.count(params);
    const sample = flagOpt(args, 'sample');
    if (!sample && intOpt(args, 'seed') !== undefined) throw new InputError('--seed needs --sample', 'seed');
    const drawn: unknown[] = [];
    if (sample && total > 0n) {
      const random = seeded(intOpt(args, 'seed') ?? 1);
      for (let i = 0; i < limit; i++) drawn.push(family.sample(params, random));
    } else if (!sample) {
      for (const x of family.generate(params)) {
        if (drawn.length >= limit) break;
        drawn.push(x);
      }
    }
    const rows = drawn.map((x) => ({
      key: family.key(x),
      text: family.render(x),
      object: x,
      stats: Object.fromEntries(stats.map((s) => [s.id, s.compute(x)])),
    }));
    if (flagOpt(args, 'json')) {
      io.out(toJsonText({ family: family.id, params, count: total, order: sample ? 'random' : 'generation', ...(sample ? { seed: intOpt(args, 'seed') ?? 1 } : {}), shown: rows.length, objects: rows }));
      return;
    }
    const how = sample ? `${rows.length} drawn at random (seed ${intOpt(args, 'seed') ?? 1})` : `showing ${BigInt(rows.length) === total ? 'all' : `the first ${rows.length}`}`;
    io.out(`${family.id} ${describeParams(params)}: ${total} objects; ${how}`);
    const multiLine = rows.some((r) => r.text.includes('\n'));
    const width = Math.max(0, ...rows.map((r) => r.text.length));
    for (const r of rows) {
      const values = stats.map((s) => `${s.id}=${r.stats[s.id]}`).join('  ');
      if (multiLine) {
        io.out('');
        io.out(r.text);
        if (values) io.out(values);
      } else io.out(values ? `${r.text.padEnd(width)}    ${values}` : r.text);
    }
  },
};
