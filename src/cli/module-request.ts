/**
 * The options of `gradus module` turned into the engine's request. The command line and the
 * terminal app (where a request is typed as those options) share this one mapping.
 */
import { InputError } from '../core/errors.js';
import { unknownNameMessage } from '../core/suggest.js';
import type { ModuleMethod, ModuleSpec } from '../modules/compute-module.js';
import { SEED_NAMES, type SeedName } from '../modules/seeds.js';
import { flagOpt, intOpt, listOpt, strOpt, type ParsedArgs } from './command.js';

export const MODULE_METHODS: readonly ModuleMethod[] = ['auto', 'young', 'iterated', 'exact'];

export interface ModuleRequest {
  readonly spec: ModuleSpec;
  readonly method: ModuleMethod;
  readonly prime?: number;
  readonly maxWork?: number;
  /** --resume FILE: the checkpoint file of a resumable run. */
  readonly checkpoint?: string;
}

function intList(args: ParsedArgs, name: string): number[] | undefined {
  const raw = listOpt(args, name);
  if (!raw) return undefined;
  return raw.map((s) => {
    if (!/^\d+$/.test(s)) throw new InputError(`--${name} must be comma-separated non-negative integers (got "${s}")`, name);
    return Number(s);
  });
}

export function parseWork(text: string | undefined, option = 'max-work'): number | undefined {
  if (text === undefined) return undefined;
  const v = Number(text);
  if (!/^\d+(\.\d+)?(e\d+)?$/i.test(text.trim()) || !Number.isFinite(v) || v <= 0) {
    throw new InputError(`--${option} must be a positive number of work units such as 5e9 (got "${text}")`, option);
  }
  return v;
}

/** Check the parsed options of `gradus module` and build the request; InputError names the option. */
export function moduleRequestFromArgs(args: ParsedArgs): ModuleRequest {
  const seed = strOpt(args, 'seed');
  if (!seed) throw new InputError(`module needs --seed NAME (${SEED_NAMES.join(', ')})`, 'seed');
  if (!(SEED_NAMES as readonly string[]).includes(seed)) throw new InputError(`--seed: ${unknownNameMessage('seed', seed, SEED_NAMES)}`, 'seed');
  const n = intOpt(args, 'n');
  if (n === undefined) throw new InputError('module needs --n N (1..10)', 'n');
  const ops = listOpt(args, 'ops');
  if (!ops) throw new InputError('module needs --ops (x, y, theta, polar1, polar2, …), e.g. --ops x,theta', 'ops');
  const method = (strOpt(args, 'method') ?? 'auto') as ModuleMethod;
  if (!MODULE_METHODS.includes(method)) throw new InputError(`--method: ${unknownNameMessage('method', method, MODULE_METHODS)}`, 'method');
  if (flagOpt(args, 'symmetrize') && flagOpt(args, 'antisymmetrize')) throw new InputError('--symmetrize and --antisymmetrize exclude each other', 'symmetrize');
  const symmetrizer = flagOpt(args, 'symmetrize') ? 'symmetrize' : flagOpt(args, 'antisymmetrize') ? 'antisymmetrize' : undefined;
  const k = intOpt(args, 'k');
  const height = intOpt(args, 'height');
  const xe = intList(args, 'x-exponents');
  const ye = intList(args, 'y-exponents');
  const th = intList(args, 'theta');
  const poly = strOpt(args, 'poly');
  const prime = intOpt(args, 'prime');
  const maxWork = parseWork(strOpt(args, 'max-work'));
  const checkpoint = strOpt(args, 'resume');
  if (checkpoint !== undefined && checkpoint.trim() === '') throw new InputError('--resume needs a file name', 'resume');
  return {
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
    method,
    ...(prime !== undefined ? { prime } : {}),
    ...(maxWork !== undefined ? { maxWork } : {}),
    ...(checkpoint !== undefined ? { checkpoint } : {}),
  };
}
