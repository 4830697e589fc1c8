/**
 * The request model: every data command (dist, show, module, quotient, sym, qanalog) as a
 * typed request with one option table, a canonical key and one engine call. The command
 * line parses and prints; the search, the app and cluster shards call `compute` directly.
 */
import { InputError } from '../core/errors.js';
import { toJsonText } from '../core/json-text.js';
import { shown } from '../core/shown.js';
import { distKind } from './dist-request.js';
import { moduleKind } from './module-request.js';
import { parseArgs, type ParsedArgs } from './options.js';
import { quotientKind } from './quotient-request.js';
import { qanalogKind } from './qanalog-request.js';
import { DATA_COMMANDS, type CanonicalArgs, type ComputeContext, type DataCommand, type RequestKind } from './request-kind.js';
import { showKind } from './show-request.js';
import { symKind } from './sym-request.js';

export type { ComputeContext, DataCommand } from './request-kind.js';
export { DATA_COMMANDS } from './request-kind.js';
export type { DistRequestOf } from './dist-request.js';
export type { ModuleRequest } from './module-request.js';
export type { QuotientRequest } from './quotient-request.js';
export type { QAnalogRequest } from './qanalog-request.js';
export type { ShowRequest } from './show-request.js';
export type { SymRequest } from './sym-request.js';

type AnyKind = RequestKind<{ readonly kind: DataCommand }, unknown>;

export const REQUEST_KINDS: Readonly<Record<DataCommand, AnyKind>> = {
  dist: distKind as unknown as AnyKind,
  show: showKind as unknown as AnyKind,
  module: moduleKind as unknown as AnyKind,
  quotient: quotientKind as unknown as AnyKind,
  sym: symKind as unknown as AnyKind,
  qanalog: qanalogKind as unknown as AnyKind,
};

/** A typed request of any data kind. */
export interface DataRequest {
  readonly kind: DataCommand;
}

/** The result of a request: the engine's typed value, its JSON document, and the canonical key. */
export interface Computed<T = unknown> {
  readonly request: DataRequest;
  readonly key: string;
  readonly result: T;
  readonly document: Record<string, unknown>;
}

export function isDataCommand(name: string): name is DataCommand {
  return (DATA_COMMANDS as readonly string[]).includes(name);
}

export function requestFromArgs(kind: DataCommand, args: ParsedArgs, cwd: string): DataRequest {
  return REQUEST_KINDS[kind].fromArgs(args, cwd);
}

/**
 * A request from words as typed after `gradus` ("module --seed … --n 4"); only data
 * commands are requests (others: InputError naming the allowed ones). A `--json` word is
 * ignored: every request has a JSON document.
 */
export function requestFromWords(words: readonly string[], cwd: string, option = 'from'): DataRequest {
  const [name, ...rest] = words[0] === 'gradus' ? words.slice(1) : words;
  if (name === undefined || !isDataCommand(name)) {
    throw new InputError(`--${option} takes a data command (${DATA_COMMANDS.join(', ')}), got ${name === undefined ? 'nothing' : `"${shown(name, 40)}"`}`, option);
  }
  const kind = REQUEST_KINDS[name];
  return kind.fromArgs(parseArgs(kind, rest.filter((w) => w !== '--json')), cwd);
}

/** Quote a word for a shell-like command line (our splitWords reads it back). */
function quoted(w: string): string {
  return /^[\w.,:+\-/=^*()]+$/.test(w) ? w : `"${w.replaceAll('"', '\\"')}"`;
}

function canonicalWords(name: string, c: CanonicalArgs, kind: AnyKind): string[] {
  const words = [name, ...c.positionals.map(quoted)];
  for (const o of kind.options) {
    const v = c.options[o.name];
    if (v === undefined || v === false) continue;
    if (v === true) words.push(`--${o.name}`);
    else words.push(`--${o.name}`, quoted(Array.isArray(v) ? v.join(',') : String(v)));
  }
  return words;
}

/**
 * The canonical key of a request: a gradus command line with only what changes the result,
 * options in table order, defaults left out. Requests equal up to option order, spelling of
 * lists or limits share it; it reads back as the same request.
 */
export function requestKey(request: DataRequest): string {
  const kind = REQUEST_KINDS[request.kind];
  return canonicalWords(request.kind, kind.canonical(request), kind).join(' ');
}

/** Compute a request with its engine: the typed result, its JSON document and its key. */
export async function compute<T = unknown>(request: DataRequest, context: ComputeContext = {}): Promise<Computed<T>> {
  const kind = REQUEST_KINDS[request.kind];
  const key = requestKey(request);
  const result = await kind.compute(request, context);
  return { request, key, result: result as T, document: documentOf(request, result) };
}

/**
 * The JSON document of a result as the command line prints it: plain JSON (polynomials as
 * arrays, big integers as strings). Results assembled elsewhere (cluster merges) go through it too.
 */
export function documentOf(request: DataRequest, result: unknown): Record<string, unknown> {
  const kind = REQUEST_KINDS[request.kind];
  return JSON.parse(toJsonText(kind.document(request, result, requestKey(request)))) as Record<string, unknown>;
}
