/**
 * The one option table of every request: `--name value`, `--name=value`, `--flag`,
 * positionals, and `--` to end options. The command line and the app parse typed requests
 * with it, so a request means the same wherever it is typed.
 */
import { InputError } from '../core/errors.js';
import { shown } from '../core/shown.js';
import { unknownNameMessage } from '../core/suggest.js';

export { shown };

export type OptionType = 'string' | 'int' | 'flag' | 'list';

export interface OptionSpec {
  readonly name: string; // without the leading dashes
  readonly type: OptionType;
  readonly description: string;
  readonly placeholder?: string; // shown in help, e.g. N
  readonly min?: number; // for int
  readonly max?: number; // for int
  readonly repeatable?: boolean; // for string: collect every occurrence
}

export interface PositionalSpec {
  readonly name: string;
  readonly description: string;
  readonly optional?: boolean;
  readonly variadic?: boolean;
}

export type OptionValue = string | number | boolean | string[];

export interface ParsedArgs {
  readonly positionals: readonly string[];
  readonly options: Readonly<Record<string, OptionValue | undefined>>;
}

/** What a parser needs to know of a command or request: its name, options and positionals. */
export interface ArgTable {
  readonly name: string;
  readonly usage: string;
  readonly options: readonly OptionSpec[];
  readonly positionals?: readonly PositionalSpec[];
}

export function parseArgs(spec: ArgTable, argv: readonly string[]): ParsedArgs {
  const byName = new Map(spec.options.map((o) => [o.name, o]));
  const options: Record<string, OptionValue | undefined> = {};
  const positionals: string[] = [];
  let onlyPositionals = false;
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    if (onlyPositionals || !a.startsWith('--') || a === '-') {
      if (!onlyPositionals && a.startsWith('-') && a.length > 1 && !/^-\d/.test(a)) {
        throw new InputError(`options are written with two dashes, as --name (got "${shown(a)}")`);
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
      throw new InputError(`${spec.name}: ${unknownNameMessage('option', `--${shown(name, 40)}`, spec.options.map((x) => `--${x.name}`))}`);
    }
    // a second value would silently replace the first: say so instead
    if (options[name] !== undefined && o.type !== 'list' && !o.repeatable) {
      throw new InputError(`--${name} is given twice; give it once`, name);
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
  const declared = spec.positionals ?? [];
  const required = declared.filter((p) => !p.optional).length;
  const variadic = declared.some((p) => p.variadic);
  if (positionals.length < required) {
    const missing = declared[positionals.length]!;
    throw new InputError(`${spec.name}: missing <${missing.name}> (${missing.description}); usage: gradus ${spec.usage}`, missing.name);
  }
  if (!variadic && positionals.length > declared.length) {
    throw new InputError(`${spec.name}: unexpected argument "${shown(positionals[declared.length]!)}"; usage: gradus ${spec.usage}`);
  }
  return { positionals, options };
}

function convert(o: OptionSpec, value: string, previous: OptionValue | undefined): OptionValue {
  switch (o.type) {
    case 'int': {
      const lo = o.min ?? Number.MIN_SAFE_INTEGER;
      const hi = o.max ?? Number.MAX_SAFE_INTEGER;
      if (!/^-?\d+$/.test(value.trim())) {
        throw new InputError(`--${o.name} must be an integer from ${lo} to ${hi} (got "${shown(value)}")`, o.name);
      }
      const v = Number(value);
      if (v < lo || v > hi) throw new InputError(`--${o.name} must be an integer from ${lo} to ${hi} (got ${shown(value.trim())})`, o.name);
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

/** Typed accessors for parsed options. */
export function intOpt(args: ParsedArgs, name: string): number | undefined {
  const v = args.options[name];
  return typeof v === 'number' ? v : undefined;
}
export function strOpt(args: ParsedArgs, name: string): string | undefined {
  const v = args.options[name];
  return typeof v === 'string' ? v : undefined;
}
export function flagOpt(args: ParsedArgs, name: string): boolean {
  return args.options[name] === true;
}
export function listOpt(args: ParsedArgs, name: string): string[] | undefined {
  const v = args.options[name];
  return Array.isArray(v) ? v : undefined;
}

/** Comma-separated non-negative integers of a list option. */
export function intListOpt(args: ParsedArgs, name: string): number[] | undefined {
  const raw = listOpt(args, name);
  if (!raw) return undefined;
  return raw.map((s) => {
    if (!/^\d{1,9}$/.test(s)) throw new InputError(`--${name} must be comma-separated non-negative integers (got "${shown(s)}")`, name);
    return Number(s);
  });
}
