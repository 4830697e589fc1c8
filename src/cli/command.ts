/**
 * The shape of a command-line command. Each command lives in its own file under
 * src/cli/commands and is listed in src/cli/commands/index.ts.
 */
import type { Progress } from '../core/progress.js';

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

export interface CommandIO {
  /** Write to stdout (a newline is added). */
  out(text: string): void;
  /** Write to stderr (a newline is added). */
  err(text: string): void;
  /** Progress reporter on stderr (silent under --json when not a terminal is fine). */
  progress: Progress;
  /** Environment (for defaults such as the catalogue path). */
  env: Readonly<Record<string, string | undefined>>;
  /** Working directory for relative paths. */
  cwd: string;
}

export interface CommandSpec {
  readonly name: string;
  readonly summary: string; // one line for the command list
  readonly usage: string; // e.g. "qseries <name> --n N [--k K]"
  readonly positionals?: readonly PositionalSpec[];
  readonly options: readonly OptionSpec[];
  /** True when the command produces data and therefore accepts --json. */
  readonly producesData: boolean;
  /** Extra help text (grammar, names, examples). */
  readonly details?: string;
  run(args: ParsedArgs, io: CommandIO): Promise<void> | void;
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
