/** `quotient`: Q[vars]/I degree by degree, for the built-in ideals or typed generators. */
import { resolve } from 'node:path';
import { InputError } from '../core/errors.js';
import { DEFAULT_MAX_WORK } from '../modules/compute-module.js';
import { computeQuotientAsync } from '../modules/compute-quotient.js';
import { resultToJson } from '../modules/format-result.js';
import { checkIdealName, IDEAL_NAMES, type IdealSpec } from '../modules/ideals.js';
import type { ModuleResult } from '../modules/module-result.js';
import { flagOpt, intOpt, listOpt, strOpt, type OptionSpec } from './options.js';
import type { RequestKind } from './request-kind.js';
import { parseWork } from './work-limit.js';

export interface QuotientRequest {
  readonly kind: 'quotient';
  readonly spec: IdealSpec;
  readonly frobenius: boolean;
  readonly prime?: number;
  /** Refuse estimated work above this (not part of the request's key: it does not change the result). */
  readonly maxWork?: number;
  /** --resume FILE (an absolute path): the checkpoint file of a resumable run. */
  readonly checkpoint?: string;
}

const VARS = ['x', 'y', 'theta'] as const;

export const QUOTIENT_OPTIONS: readonly OptionSpec[] = [
  { name: 'ideal', type: 'string', description: `ideal: ${IDEAL_NAMES.join(', ')}`, placeholder: 'NAME' },
  { name: 'n', type: 'int', description: 'number of variables of each kind', placeholder: 'N', min: 1, max: 8 },
  { name: 'k', type: 'int', description: 'k of the generalized coinvariant ideal (1..n)', placeholder: 'K', min: 1, max: 8 },
  { name: 'vars', type: 'list', description: 'variable sets: x, and optionally y and theta (default x)', placeholder: 'x,y,theta' },
  { name: 'gens', type: 'string', description: 'generators of the ideal `generators`, separated by ";"', placeholder: 'TEXT' },
  { name: 'frobenius', type: 'flag', description: 'also the Schur expansion of every cell' },
  { name: 'prime', type: 'int', description: 'first prime (below 2^26); a second prime always confirms', placeholder: 'P', min: 2, max: 2 ** 26 - 1 },
  { name: 'max-work', type: 'string', description: `refuse estimated work above W units (default ${DEFAULT_MAX_WORK.toExponential(1).replace('e+', 'e')}, about ten minutes)`, placeholder: 'W' },
  { name: 'resume', type: 'string', description: 'checkpoint file: each finished task is appended to it, and a rerun of the same request reads it back instead of recomputing', placeholder: 'FILE' },
];

export const quotientKind: RequestKind<QuotientRequest, ModuleResult> = {
  name: 'quotient',
  usage: 'quotient --ideal NAME --n N [--k K] [--vars x[,y][,theta]] [--gens "p; q; …"] [--frobenius] [--prime P] [--max-work W] [--resume FILE] [--json]',
  options: QUOTIENT_OPTIONS,
  fromArgs(args, cwd) {
    const name = strOpt(args, 'ideal');
    if (!name) throw new InputError(`quotient needs --ideal NAME (${IDEAL_NAMES.join(', ')})`, 'ideal');
    const ideal = checkIdealName(name);
    const n = intOpt(args, 'n');
    if (n === undefined) throw new InputError('quotient needs --n N (1..8)', 'n');
    const vars = listOpt(args, 'vars') ?? ['x'];
    for (const v of vars) if (!(VARS as readonly string[]).includes(v)) throw new InputError(`--vars takes x, y, theta (got "${v.slice(0, 20)}")`, 'vars');
    if (!vars.includes('x')) throw new InputError('--vars must include x', 'vars');
    const k = intOpt(args, 'k');
    const gens = strOpt(args, 'gens')?.split(';').map((s) => s.trim()).filter(Boolean);
    const prime = intOpt(args, 'prime');
    const maxWork = parseWork(strOpt(args, 'max-work'));
    const file = strOpt(args, 'resume');
    if (file !== undefined && file.trim() === '') throw new InputError('--resume needs a file name', 'resume');
    return {
      kind: 'quotient',
      spec: { ideal, n, y: vars.includes('y'), theta: vars.includes('theta'), ...(k !== undefined ? { k } : {}), ...(gens ? { generators: gens } : {}) },
      frobenius: flagOpt(args, 'frobenius'),
      ...(prime !== undefined ? { prime } : {}),
      ...(maxWork !== undefined ? { maxWork } : {}),
      ...(file !== undefined ? { checkpoint: resolve(cwd, file) } : {}),
    };
  },
  canonical(r) {
    const s = r.spec;
    const vars = ['x', ...(s.y ? ['y'] : []), ...(s.theta ? ['theta'] : [])];
    return {
      positionals: [],
      options: {
        ideal: s.ideal,
        n: s.n,
        k: s.k,
        vars: vars.length > 1 ? vars : undefined,
        gens: s.generators?.join('; '),
        frobenius: r.frobenius || undefined,
        prime: r.prime,
      },
    };
  },
  async compute(r, context) {
    return computeQuotientAsync(r.spec, {
      frobenius: r.frobenius,
      ...(r.prime !== undefined ? { prime: r.prime } : {}),
      ...(r.maxWork !== undefined ? { maxWork: r.maxWork } : {}),
      ...(r.checkpoint !== undefined ? { checkpoint: r.checkpoint } : {}),
      ...(context.onEstimate ? { onEstimate: context.onEstimate } : {}),
      ...(context.signal ? { signal: context.signal } : {}),
      onProgress: (done, total, label) => context.progress?.(label || 'quotient', done, total || undefined),
    });
  },
  document(_r, result, key) {
    return resultToJson({ ...result, provenance: { ...result.provenance, request: key } });
  },
};
