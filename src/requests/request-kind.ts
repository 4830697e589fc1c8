/**
 * The shape of a data request kind (dist, show, module, quotient, sym, qanalog): its one
 * option table, the check that turns parsed options into a typed request, the canonical
 * form of a request (which also names it as a cache key), the engine call and its JSON
 * document. The command line, the search and the app all go through these.
 */
import type { OptionSpec, ParsedArgs, PositionalSpec } from './options.js';

export const DATA_COMMANDS = ['dist', 'show', 'module', 'quotient', 'sym', 'qanalog'] as const;
export type DataCommand = (typeof DATA_COMMANDS)[number];

export interface ComputeContext {
  /** Progress of the work: a label, the count done, the total when known. */
  readonly progress?: (label: string, done: number, total?: number) => void;
  /** The engine's estimate before long work: work units and seconds of processor time. */
  readonly onEstimate?: (units: number, seconds: number) => void;
  readonly signal?: AbortSignal;
}

/** The canonical form of a request: positionals and the options that change the result. */
export interface CanonicalArgs {
  readonly positionals: readonly string[];
  readonly options: Readonly<Record<string, string | number | boolean | readonly (string | number)[] | undefined>>;
}

export interface RequestKind<R, T> {
  readonly name: DataCommand;
  readonly usage: string;
  readonly options: readonly OptionSpec[];
  readonly positionals?: readonly PositionalSpec[];
  /** Check the parsed options and build the request; InputError names the option. Paths resolve against cwd. */
  fromArgs(args: ParsedArgs, cwd: string): R;
  /** Only what changes the result (limits, worker counts and checkpoint files are left out), defaults omitted. */
  canonical(request: R): CanonicalArgs;
  compute(request: R, context: ComputeContext): Promise<T>;
  /** The JSON document of a result (what `--json` prints); its provenance names the request. */
  document(request: R, result: T, key: string): Record<string, unknown>;
}
