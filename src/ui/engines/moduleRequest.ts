/**
 * A module request typed as the options of `gradus module` ("--seed monomial --n 3 …"):
 * parsed with that command's own option table, then turned into the engine's ModuleSpec.
 */
import { InputError } from '../../core/errors.js';
import { unknownNameMessage } from '../../core/suggest.js';
import { flagOpt, intOpt, listOpt, strOpt, type ParsedArgs } from '../../cli/command.js';
import { moduleCommand, parseWork } from '../../cli/commands/module.js';
import { parseArgs } from '../../cli/parse-args.js';
import type { ModuleMethod, ModuleSpec } from '../../modules/compute-module.js';
import { SEED_NAMES, type SeedName } from '../../modules/seeds.js';

export interface ModuleRequest {
  readonly spec: ModuleSpec;
  readonly method: ModuleMethod;
  readonly prime?: number;
  readonly maxWork?: number;
}

/** Split a line into words; "double quotes" keep spaces (for --poly). */
export function splitWords(line: string): string[] {
  const words: string[] = [];
  const re = /"([^"]*)"|(\S+)/g;
  for (let m = re.exec(line); m; m = re.exec(line)) words.push(m[1] ?? m[2]!);
  return words;
}

function intList(args: ParsedArgs, name: string): number[] | undefined {
  const raw = listOpt(args, name);
  if (!raw) return undefined;
  return raw.map((s) => {
    if (!/^\d+$/.test(s)) throw new InputError(`--${name} must be comma-separated non-negative integers (got "${s}")`, name);
    return Number(s);
  });
}

export function parseModuleRequest(line: string): ModuleRequest {
  const args = parseArgs(moduleCommand, splitWords(line));
  const seed = strOpt(args, 'seed');
  if (!seed) throw new InputError(`the request needs --seed NAME (${SEED_NAMES.join(', ')})`, 'seed');
  if (!(SEED_NAMES as readonly string[]).includes(seed)) throw new InputError(`--seed: ${unknownNameMessage('seed', seed, SEED_NAMES)}`, 'seed');
  const n = intOpt(args, 'n');
  if (n === undefined) throw new InputError('the request needs --n N (1..10)', 'n');
  const ops = listOpt(args, 'ops');
  if (!ops) throw new InputError('the request needs --ops (x, y, theta, polar1, …), e.g. --ops x,theta', 'ops');
  const method = (strOpt(args, 'method') ?? 'auto') as ModuleMethod;
  if (!['auto', 'young', 'iterated', 'exact'].includes(method)) throw new InputError(`--method must be auto, young, iterated or exact (got "${method}")`, 'method');
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
  };
}
