/**
 * A data command is a request kind with a printer: the options are the kind's own table,
 * `run` checks them into a typed request, computes it through the request model (progress
 * and estimates on stderr) and prints its JSON document or text.
 */
import { toJsonText } from '../core/json-text.js';
import { formatDuration } from '../core/progress.js';
import { compute } from '../requests/index.js';
import type { RequestKind } from '../requests/request-kind.js';
import { flagOpt, type CommandIO, type CommandSpec } from './command.js';
import { progressReporter } from './progress.js';

export interface DataCommandText<R, T> {
  readonly summary: string;
  readonly details?: string;
  /** The text form of a result (without --json). */
  print(request: R, result: T, io: CommandIO): void;
}

export function dataCommand<R extends { readonly kind: string }, T>(kind: RequestKind<R, T>, text: DataCommandText<R, T>): CommandSpec {
  return {
    name: kind.name,
    summary: text.summary,
    usage: kind.usage,
    options: kind.options,
    ...(kind.positionals ? { positionals: kind.positionals } : {}),
    producesData: true,
    ...(text.details ? { details: text.details } : {}),
    async run(args, io) {
      const request = kind.fromArgs(args, io.cwd);
      const computed = await compute<T>(request as never, {
        progress: progressReporter(io.progress),
        onEstimate: (units, seconds) => io.err(`estimated work: ${units.toExponential(2)} units (about ${formatDuration(seconds)} of processor time)`),
      });
      io.progress.finish();
      if (flagOpt(args, 'json')) io.out(toJsonText(computed.document));
      else text.print(request, computed.result, io);
    },
  };
}
