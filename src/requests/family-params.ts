/**
 * Family parameters as options: every parameter name any family declares (n, k, shape,
 * content, …) is an option of `show` and `dist`, so a new family's parameters need no new
 * code here. Each family then checks its own.
 */
import { FAMILIES } from '../../objects/index.js';
import { composeStatistic } from '../../objects/transforms/compose-statistic.js';
import { transformsFrom } from '../../objects/transforms/index.js';
import { familyById } from '../../objects/index.js';
import { statisticsOfFamily } from '../../statistics/index.js';
import { InputError } from '../core/errors.js';
import { unknownNameMessage } from '../core/suggest.js';
import type { Family, Params, Statistic } from '../enumerate/plugin.js';
import { intOpt, listOpt, type OptionSpec, type ParsedArgs } from './options.js';
import { shown } from '../core/shown.js';

function paramOptions(): OptionSpec[] {
  const byName = new Map<string, { spec: OptionSpec; families: string[] }>();
  for (const f of FAMILIES) {
    for (const p of f.params) {
      const hit = byName.get(p.name);
      if (hit) {
        hit.families.push(f.id);
        continue;
      }
      const spec: OptionSpec =
        p.kind === 'int'
          ? { name: p.name, type: 'int', description: p.description, placeholder: p.name.toUpperCase(), min: 0, max: 1000 }
          : { name: p.name, type: 'list', description: p.description, placeholder: 'A,B,…' };
      byName.set(p.name, { spec, families: [f.id] });
    }
  }
  return [...byName.values()].map(({ spec, families }) => ({ ...spec, description: families.length > 3 ? spec.description : `${spec.description} (${families.join(', ')})` }));
}

/** The options that carry family parameters (each family uses some of them). */
export const FAMILY_PARAM_OPTIONS: readonly OptionSpec[] = paramOptions();

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
      if (v.some((s) => !/^\d{1,6}$/.test(s))) throw new InputError(`--${o.name} must be comma-separated non-negative integers such as 2,1 (got "${shown(v.join(','))}")`, o.name);
      params[o.name] = v.map(Number).filter((x, i, a) => !(o.name === 'shape' && x === 0 && a.length === 1));
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

/** Family params back as option values (for the canonical form of a request). */
export function paramOptionValues(params: Params): Record<string, number | readonly number[] | undefined> {
  return Object.fromEntries(Object.entries(params));
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
      throw new InputError(list.length ? unknownNameMessage(`transform from ${family.id}`, shown(name.slice(0, colon), 40), list) : `${family.id} has no transforms (asked for "${shown(name, 40)}")`, 'stat');
    }
    return composeStatistic(t, resolveStatistic(familyById(t.to), name.slice(colon + 1)));
  }
  const own = statisticsOfFamily(family.id);
  const hit = own.find((s) => s.id === name);
  if (hit) return hit;
  const list = own.map((s) => s.id);
  throw new InputError(list.length ? unknownNameMessage(`statistic of ${family.id}`, shown(name, 40), list) : `${family.id} has no statistics yet (asked for "${shown(name, 40)}")`, 'stat');
}
