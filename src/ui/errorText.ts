/**
 * One clear line for any error an engine throws: user errors (InputError, LimitError) as
 * they are, anything else labelled as an internal error. Never a stack trace. The engines
 * word their limits for the command line ("raise it with --max-objects"); `appWords` says
 * the same with the app's own keys and fields, for the screen it is shown on.
 */
import { isUserError } from '../core/errors.js';

export type Place = 'families' | 'statistics' | 'modules' | 'symfun' | 'search' | 'catalogue' | 'export' | 'session' | 'tour';

type Rule = readonly [RegExp, string | ((place: Place | undefined) => string)];

const RULES: readonly Rule[] = [
  [/;? raise it with --max-objects/, (p) => (p === 'catalogue' ? '; that is more than the app builds' : '; that is the most the app counts: lower n (-) or change the parameters (p)')],
  [/ \(raise it with --max-degree\)/, ' (the largest degree the app evaluates)'],
  [/; raise it with --max-work/, '; add --max-work N to the request (e edits it) to allow more'],
  [/\(use --method iterated\)/, '(add --method iterated to the request: e edits it)'],
  [/^--coeffs needs entries/, 'the series needs entries'],
  [/^--coeffs: /, 'series: '],
  [/; use --target-file for large targets/, '; type fewer entries'],
  [/^--(out|session file): /, 'file: '],
  [/ \(add --force to replace it\)/, ' (f overwrites it)'],
  [/^--from needs \{n\} in the command.*$/, 'the expression needs {n} to stand for a family over n'],
  [/; fill one with `gradus catalogue build[^`]*`/, '; b on the Search screen builds one'],
  [/; finish it with `gradus catalogue build[^`]*`/, '; b on the Search screen resumes the build'],
  [/; rebuild it with `gradus catalogue rebuild[^`]*`/, '; set GRADUS_CATALOGUE to another file before starting the app, or rebuild this one'],
  [/ \(give another --catalogue path\)/, ' (set GRADUS_CATALOGUE to another file before starting the app)'],
  [/ or another --catalogue/, ' or set GRADUS_CATALOGUE to another file'],
  [/^--catalogue: /, 'catalogue: '],
];

/** An engine's message in the app's words (keys and fields of the app, not command-line options). */
export function appWords(message: string, place?: Place): string {
  let m = message;
  for (const [re, to] of RULES) m = m.replace(re, typeof to === 'string' ? to : to(place));
  return m;
}

export function errorText(e: unknown, place?: Place): string {
  if (isUserError(e)) return appWords(e.message.split('\n')[0] ?? e.message, place);
  const msg = e instanceof Error ? e.message : String(e);
  return `internal error (a bug in gradus, please report it): ${msg.split('\n')[0] ?? ''}`;
}
