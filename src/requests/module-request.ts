/**
 * `module`: the closure of a seed under operator families. The option table of the command
 * line and of the app's Modules screen, the typed request, and the engine call.
 */
import { resolve } from 'node:path';
import { InputError } from '../core/errors.js';
import { unknownNameMessage } from '../core/suggest.js';
import { computeModuleAsync, DEFAULT_MAX_WORK, type ModuleMethod, type ModuleSpec } from '../modules/compute-module.js';
import { resultToJson } from '../modules/format-result.js';
import type { ModuleResult } from '../modules/module-result.js';
import { familyName, parseOperatorFamilies } from '../modules/operators.js';
import { SEED_NAMES, type SeedName } from '../modules/seeds.js';
import { flagOpt, intListOpt, intOpt, listOpt, strOpt, type OptionSpec, type ParsedArgs } from './options.js';
import type { RequestKind } from './request-kind.js';
import { parseWork } from './work-limit.js';

export const MODULE_METHODS: readonly ModuleMethod[] = ['auto', 'young', 'iterated', 'exact'];

export interface ModuleRequest {
  readonly kind: 'module';
  readonly spec: ModuleSpec;
  readonly frobenius: boolean;
  readonly method: ModuleMethod;
  readonly prime?: number;
  readonly maxWork?: number;
  /** --resume FILE (an absolute path): the checkpoint file of a resumable run. */
  readonly checkpoint?: string;
}

export const MODULE_OPTIONS: readonly OptionSpec[] = [
  { name: 'seed', type: 'string', description: `seed: ${SEED_NAMES.join(', ')}`, placeholder: 'NAME' },
  { name: 'n', type: 'int', description: 'number of variables of each kind', placeholder: 'N', min: 1, max: 10 },
  { name: 'k', type: 'int', description: 'k of δ_{n,k} and of the θ-staircase (1..n)', placeholder: 'K', min: 1, max: 10 },
  { name: 'height', type: 'int', description: 'height s of the first n−k positions of δ_{n,k} (default k−1)', placeholder: 'S', min: 0, max: 30 },
  { name: 'x-exponents', type: 'list', description: 'x-exponents of a monomial seed', placeholder: 'A,B,…' },
  { name: 'y-exponents', type: 'list', description: 'y-exponents of a monomial seed', placeholder: 'A,B,…' },
  { name: 'theta', type: 'list', description: 'θ indices (1-based) of a monomial seed', placeholder: 'I,J,…' },
  { name: 'poly', type: 'string', description: 'a superpolynomial such as "x1^2*x2*th1 - 3*y2*th1*th3" (seed poly)', placeholder: 'TEXT' },
  { name: 'symmetrize', type: 'flag', description: 'symmetrize the monomial or polynomial seed (monomials are antisymmetrized by default)' },
  { name: 'antisymmetrize', type: 'flag', description: 'antisymmetrize a typed polynomial seed' },
  { name: 'ops', type: 'list', description: 'operator families: x, y, theta (all ∂/∂x_i, ∂/∂y_i, ∂/∂θ_i), polarJ = Σ y_i ∂x_i^J', placeholder: 'x,theta,…' },
  { name: 'frobenius', type: 'flag', description: 'also the Schur expansion of every cell' },
  { name: 'prime', type: 'int', description: 'first prime (below 2^26); a second prime always confirms', placeholder: 'P', min: 2, max: 2 ** 26 - 1 },
  { name: 'method', type: 'string', description: `route: ${MODULE_METHODS.join(', ')} (auto: young for derivative operators, iterated otherwise; exact: over Q, small cases)`, placeholder: 'M' },
  { name: 'max-work', type: 'string', description: `refuse estimated work above W units (default ${DEFAULT_MAX_WORK.toExponential(1).replace('e+', 'e')}, about ten minutes)`, placeholder: 'W' },
  { name: 'resume', type: 'string', description: 'checkpoint file: finished work is appended to it, and a rerun of the same request reads it back instead of recomputing', placeholder: 'FILE' },
];

/** The operator families in one order (x, y, θ, then polarizations by order), as the engine names them. */
function canonicalOps(ops: readonly string[]): string[] {
  const rank = (name: string): number => (name === 'x' ? 0 : name === 'y' ? 1 : name === 'theta' ? 2 : 2 + Number(name.slice(5)));
  return parseOperatorFamilies(ops).map(familyName).sort((a, b) => rank(a) - rank(b));
}

export const moduleKind: RequestKind<ModuleRequest, ModuleResult> = {
  name: 'module',
  usage:
    'module --seed NAME --n N [--k K] [--height S] [--x-exponents …] [--y-exponents …] [--theta …] [--poly "…"] [--symmetrize|--antisymmetrize] --ops x,theta,… [--frobenius] [--prime P] [--method M] [--max-work W] [--resume FILE] [--json]',
  options: MODULE_OPTIONS,
  fromArgs(args: ParsedArgs, cwd: string): ModuleRequest {
    const seed = strOpt(args, 'seed');
    if (!seed) throw new InputError(`module needs --seed NAME (${SEED_NAMES.join(', ')})`, 'seed');
    if (!(SEED_NAMES as readonly string[]).includes(seed)) throw new InputError(`--seed: ${unknownNameMessage('seed', seed, SEED_NAMES)}`, 'seed');
    const n = intOpt(args, 'n');
    if (n === undefined) throw new InputError('module needs --n N (1..10)', 'n');
    const rawOps = listOpt(args, 'ops');
    if (!rawOps) throw new InputError('module needs --ops (x, y, theta, polar1, polar2, …), e.g. --ops x,theta', 'ops');
    const ops = canonicalOps(rawOps);
    const method = (strOpt(args, 'method') ?? 'auto') as ModuleMethod;
    if (!MODULE_METHODS.includes(method)) throw new InputError(`--method: ${unknownNameMessage('method', method, MODULE_METHODS)}`, 'method');
    if (flagOpt(args, 'symmetrize') && flagOpt(args, 'antisymmetrize')) throw new InputError('--symmetrize and --antisymmetrize exclude each other', 'symmetrize');
    const symmetrizer = flagOpt(args, 'symmetrize') ? 'symmetrize' : flagOpt(args, 'antisymmetrize') ? 'antisymmetrize' : undefined;
    const k = intOpt(args, 'k');
    const height = intOpt(args, 'height');
    const xe = intListOpt(args, 'x-exponents');
    const ye = intListOpt(args, 'y-exponents');
    const th = intListOpt(args, 'theta');
    const poly = strOpt(args, 'poly');
    const prime = intOpt(args, 'prime');
    const maxWork = parseWork(strOpt(args, 'max-work'));
    const file = strOpt(args, 'resume');
    if (file !== undefined && file.trim() === '') throw new InputError('--resume needs a file name', 'resume');
    return {
      kind: 'module',
      spec: {
        seed: seed as SeedName,
        n,
        ops,
        ...(k !== undefined ? { k } : {}),
        ...(height !== undefined ? { height } : {}),
        ...(xe ? { xExponents: xe } : {}),
        ...(ye ? { yExponents: ye } : {}),
        ...(th ? { theta: th } : {}),
        ...(poly !== undefined ? { poly } : {}),
        ...(symmetrizer ? { symmetrizer } : {}),
      },
      frobenius: flagOpt(args, 'frobenius'),
      method,
      ...(prime !== undefined ? { prime } : {}),
      ...(maxWork !== undefined ? { maxWork } : {}),
      ...(file !== undefined ? { checkpoint: resolve(cwd, file) } : {}),
    };
  },
  canonical(r) {
    const s = r.spec;
    return {
      positionals: [],
      options: {
        seed: s.seed,
        n: s.n,
        k: s.k,
        height: s.height,
        'x-exponents': s.xExponents,
        'y-exponents': s.yExponents,
        theta: s.theta,
        poly: s.poly,
        symmetrize: s.symmetrizer === 'symmetrize' || undefined,
        antisymmetrize: s.symmetrizer === 'antisymmetrize' || undefined,
        ops: s.ops,
        frobenius: r.frobenius || undefined,
        prime: r.prime,
        method: r.method === 'auto' ? undefined : r.method,
      },
    };
  },
  compute(r, context) {
    return computeModuleAsync(r.spec, {
      frobenius: r.frobenius,
      method: r.method,
      ...(r.prime !== undefined ? { prime: r.prime } : {}),
      ...(r.maxWork !== undefined ? { maxWork: r.maxWork } : {}),
      ...(r.checkpoint !== undefined ? { checkpoint: r.checkpoint } : {}),
      ...(context.onEstimate ? { onEstimate: context.onEstimate } : {}),
      ...(context.signal ? { signal: context.signal } : {}),
      onProgress: (done, total, label) => context.progress?.(label || 'module', done, total || undefined),
    });
  },
  document(_r, result, key) {
    return resultToJson({ ...result, provenance: { ...result.provenance, request: key } });
  },
};
