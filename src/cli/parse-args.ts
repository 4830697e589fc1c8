/**
 * Argument parsing for one command: `--name value`, `--name=value`, `--flag`,
 * positionals, and `--` to end options. Every data command also takes `--json`.
 */
import { InputError } from '../core/errors.js';
import { unknownNameMessage } from '../core/suggest.js';
import type { CommandSpec, OptionSpec, OptionValue, ParsedArgs } from './command.js';

export const JSON_OPTION: OptionSpec = {
  name: 'json',
  type: 'flag',
  description: 'print exactly one JSON document on stdout',
};

export function optionsOf(spec: CommandSpec): OptionSpec[] {
  return spec.producesData ? [...spec.options, JSON_OPTION] : [...spec.options];
}

export function parseArgs(spec: CommandSpec, argv: readonly string[]): ParsedArgs {
  const opts = optionsOf(spec);
  const byName = new Map(opts.map((o) => [o.name, o]));
  const options: Record<string, OptionValue | undefined> = {};
  const positionals: string[] = [];
  let onlyPositionals = false;
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    if (onlyPositionals || !a.startsWith('--') || a === '-') {
      if (!onlyPositionals && a.startsWith('-') && a.length > 1 && !/^-\d/.test(a)) {
        throw new InputError(`options are written with two dashes, as --name (got "${a}")`);
      }
      positionals.push(a);
      continue;
    }
    if (a === '--') {
      onlyPositionals = true;
      continue;
    }
    const eq = a.indexOf('=');
    const name = eq >= 0 ? a.slice(2, eq) : a.slice(2);
    const o = byName.get(name);
    if (!o) {
      throw new InputError(`${spec.name}: ${unknownNameMessage('option', `--${name}`, opts.map((x) => `--${x.name}`))}`);
    }
    if (o.type === 'flag') {
      if (eq >= 0) throw new InputError(`--${name} takes no value`, name);
      options[name] = true;
      continue;
    }
    let value: string;
    if (eq >= 0) value = a.slice(eq + 1);
    else {
      const next = argv[i + 1];
      if (next === undefined || (next.startsWith('--') && next.length > 2)) {
        throw new InputError(`--${name} needs a value${o.placeholder ? ` (${o.placeholder})` : ''}`, name);
      }
      value = next;
      i++;
    }
    options[name] = convert(o, value, options[name]);
  }
  const required = (spec.positionals ?? []).filter((p) => !p.optional).length;
  const variadic = (spec.positionals ?? []).some((p) => p.variadic);
  if (positionals.length < required) {
    const missing = spec.positionals![positionals.length]!;
    throw new InputError(`${spec.name}: missing <${missing.name}> (${missing.description}); usage: gradus ${spec.usage}`, missing.name);
  }
  if (!variadic && positionals.length > (spec.positionals ?? []).length) {
    throw new InputError(`${spec.name}: unexpected argument "${positionals[(spec.positionals ?? []).length]}"; usage: gradus ${spec.usage}`);
  }
  return { positionals, options };
}

function convert(o: OptionSpec, value: string, previous: OptionValue | undefined): OptionValue {
  switch (o.type) {
    case 'int': {
      const lo = o.min ?? Number.MIN_SAFE_INTEGER;
      const hi = o.max ?? Number.MAX_SAFE_INTEGER;
      if (!/^-?\d+$/.test(value.trim())) {
        throw new InputError(`--${o.name} must be an integer from ${lo} to ${hi} (got "${value}")`, o.name);
      }
      const v = Number(value);
      if (v < lo || v > hi) throw new InputError(`--${o.name} must be an integer from ${lo} to ${hi} (got ${v})`, o.name);
      return v;
    }
    case 'list': {
      const items = value.split(',').map((s) => s.trim()).filter((s) => s !== '');
      return [...(Array.isArray(previous) ? previous : []), ...items];
    }
    case 'string':
      if (o.repeatable) return [...(Array.isArray(previous) ? previous : []), value];
      return value;
    default:
      return true;
  }
}
