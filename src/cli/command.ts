/**
 * The shape of a command-line command. Each command lives in its own file under
 * src/cli/commands and is listed in src/cli/commands/index.ts. Options are parsed with the
 * request model's one option table (src/requests/options.ts).
 */
import type { Progress } from '../core/progress.js';
import type { ArgTable, ParsedArgs } from '../requests/options.js';

export type { OptionSpec, OptionType, OptionValue, ParsedArgs, PositionalSpec } from '../requests/options.js';
export { flagOpt, intOpt, listOpt, strOpt } from '../requests/options.js';

export interface CommandIO {
  /** Write to stdout (a newline is added). */
  out(text: string): void;
  /** Write to stderr (a newline is added). */
  err(text: string): void;
  /** Progress reporter on stderr. */
  progress: Progress;
  /** Environment (for defaults such as the catalogue path). */
  env: Readonly<Record<string, string | undefined>>;
  /** Working directory for relative paths. */
  cwd: string;
}

export interface CommandSpec extends ArgTable {
  readonly summary: string; // one line for the command list
  /** True when the command produces data and therefore accepts --json. */
  readonly producesData: boolean;
  /** Extra help text (grammar, names, examples). */
  readonly details?: string;
  run(args: ParsedArgs, io: CommandIO): Promise<void> | void;
}
