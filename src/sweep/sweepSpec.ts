/**
 * A sweep: a family of seeds described by parameters, each under some sets of operator
 * families, over a range of n (and k). One option table for the command line and the app
 * (`--family monomials --max-degree 4 --thetas 1 --n 3..4 --ops x,theta`), and the canonical
 * key (what changes the modules, in a fixed order) under which the sweep is kept.
 */
import { InputError } from '../core/errors.js';
import { unknownNameMessage } from '../core/suggest.js';
import { familyName, parseOperatorFamilies } from '../modules/operators.js';
import { flagOpt, intOpt, strOpt, type OptionSpec, type ParsedArgs } from '../requests/options.js';
import { parseWork } from '../requests/work-limit.js';
import { numberListText, parseNumberList } from './numberList.js';
import { parseHeights, heightsText, type HeightItem } from './heights.js';
import { parsePolyParams, polyParamsText, templateNames, type PolyParam } from './polyTemplate.js';

export const SWEEP_FAMILIES = ['monomials', 'heights', 'staircase', 'poly'] as const;
export type SweepFamilyName = (typeof SWEEP_FAMILIES)[number];

/** Sweeps stay at sizes where a module takes seconds, not hours. */
export const SWEEP_MAX_N = 8;

export type SeedFamily =
  | { readonly family: 'monomials'; readonly minDegree: number; readonly maxDegree: number; readonly thetas: readonly number[]; readonly symmetrize: boolean }
  | { readonly family: 'heights'; readonly heights: readonly HeightItem[] }
  | { readonly family: 'staircase' }
  | { readonly family: 'poly'; readonly poly: string; readonly params: readonly PolyParam[]; readonly symmetrizer: 'antisymmetrize' | 'symmetrize' | 'none' };

export interface SweepSpec {
  readonly seeds: SeedFamily;
  readonly n: readonly number[];
  /** k values (kept where 1 ≤ k ≤ n); undefined: every k = 1..n, for families that take k. */
  readonly k?: readonly number[];
  /** Sets of operator families, each in the engine's canonical order. */
  readonly ops: readonly (readonly string[])[];
}

export interface SweepLimits {
  /** Per module: a module estimated above it is skipped and said so. */
  readonly maxWork?: number;
  /** Refuse a plan with more distinct modules than this. */
  readonly maxModules: number;
}

export const DEFAULT_MAX_MODULES = 5000;

export const SWEEP_OPTIONS: readonly OptionSpec[] = [
  { name: 'family', type: 'string', description: `seed family: ${SWEEP_FAMILIES.join(', ')}`, placeholder: 'F' },
  { name: 'n', type: 'string', description: `sizes n (1..${SWEEP_MAX_N}), as a..b or a,b,…`, placeholder: 'a..b' },
  { name: 'k', type: 'string', description: 'values of k where the family takes one (default every k = 1..n)', placeholder: 'a..b' },
  { name: 'ops', type: 'string', repeatable: true, description: 'a set of operator families (x, y, theta, polarJ); repeat --ops for several sets', placeholder: 'x,theta' },
  { name: 'max-degree', type: 'int', description: 'monomials: largest total x-degree', placeholder: 'D', min: 0, max: 30 },
  { name: 'min-degree', type: 'int', description: 'monomials: smallest total x-degree (default 0)', placeholder: 'D', min: 0, max: 30 },
  { name: 'thetas', type: 'string', description: 'monomials: numbers of θ variables (default 0)', placeholder: 'a..b' },
  { name: 'height', type: 'string', description: 'heights: heights s of δ_{n,k}, as numbers, ranges or k-1, k, k+1 (default k-1)', placeholder: 'S,…' },
  { name: 'poly', type: 'string', description: 'poly: a superpolynomial with integer parameters in braces, e.g. "x1^{a}*x2^{b}*th1"', placeholder: 'TEXT' },
  { name: 'param', type: 'string', repeatable: true, description: 'poly: the range of a parameter, e.g. a=0..3 (repeat for each)', placeholder: 'a=0..3' },
  { name: 'symmetrize', type: 'flag', description: 'symmetrize the seeds (monomials are antisymmetrized by default; typed polynomials are taken as they are)' },
  { name: 'antisymmetrize', type: 'flag', description: 'poly: antisymmetrize the typed polynomials' },
  { name: 'max-work', type: 'string', description: 'skip (and say so) a module estimated above W work units (default that of gradus module)', placeholder: 'W' },
  { name: 'max-modules', type: 'int', description: `refuse a sweep of more distinct modules than M (default ${DEFAULT_MAX_MODULES})`, placeholder: 'M', min: 1, max: 1_000_000 },
];

/** The operator families of one set in the order the module request writes them. */
export function canonicalOpSet(text: string): string[] {
  const rank = (name: string): number => (name === 'x' ? 0 : name === 'y' ? 1 : name === 'theta' ? 2 : 2 + Number(name.slice(5)));
  return parseOperatorFamilies([text]).map(familyName).sort((a, b) => rank(a) - rank(b));
}

const FAMILY_OPTIONS: Readonly<Record<SweepFamilyName, readonly string[]>> = {
  monomials: ['max-degree', 'min-degree', 'thetas', 'symmetrize'],
  heights: ['height'],
  staircase: [],
  poly: ['poly', 'param', 'symmetrize', 'antisymmetrize'],
};
const FAMILY_SPECIFIC = [...new Set(Object.values(FAMILY_OPTIONS).flat())];

function seedFamily(name: SweepFamilyName, args: ParsedArgs): SeedFamily {
  for (const o of FAMILY_SPECIFIC) {
    if (args.options[o] !== undefined && !FAMILY_OPTIONS[name].includes(o)) {
      const owners = SWEEP_FAMILIES.filter((f) => FAMILY_OPTIONS[f].includes(o));
      throw new InputError(`--${o} goes with --family ${owners.join(' or ')}, not ${name}`, o);
    }
  }
  switch (name) {
    case 'monomials': {
      const maxDegree = intOpt(args, 'max-degree');
      if (maxDegree === undefined) throw new InputError('--family monomials needs --max-degree D (the largest total x-degree)', 'max-degree');
      const minDegree = intOpt(args, 'min-degree') ?? 0;
      if (minDegree > maxDegree) throw new InputError(`--min-degree ${minDegree} is above --max-degree ${maxDegree}`, 'min-degree');
      const thetas = parseNumberList(strOpt(args, 'thetas') ?? '0', 'thetas', 0, SWEEP_MAX_N);
      return { family: 'monomials', minDegree, maxDegree, thetas, symmetrize: flagOpt(args, 'symmetrize') };
    }
    case 'heights':
      return { family: 'heights', heights: parseHeights(strOpt(args, 'height') ?? 'k-1') };
    case 'staircase':
      return { family: 'staircase' };
    case 'poly': {
      const poly = strOpt(args, 'poly');
      if (poly === undefined || poly.trim() === '') throw new InputError('--family poly needs --poly "<superpolynomial with {a}, {b}, …>"', 'poly');
      if (flagOpt(args, 'symmetrize') && flagOpt(args, 'antisymmetrize')) throw new InputError('--symmetrize and --antisymmetrize exclude each other', 'symmetrize');
      const raw = args.options['param'];
      const params = parsePolyParams(poly, Array.isArray(raw) ? raw : []);
      return { family: 'poly', poly: poly.trim(), params, symmetrizer: flagOpt(args, 'symmetrize') ? 'symmetrize' : flagOpt(args, 'antisymmetrize') ? 'antisymmetrize' : 'none' };
    }
  }
}

/** Whether the family's seeds take k. */
export function familyTakesK(s: SeedFamily): boolean {
  return s.family === 'heights' || s.family === 'staircase' || (s.family === 'poly' && templateNames(s.poly).includes('k'));
}

export function sweepFromArgs(args: ParsedArgs): { spec: SweepSpec; limits: SweepLimits } {
  const family = strOpt(args, 'family');
  if (family === undefined) throw new InputError(`a sweep needs --family (${SWEEP_FAMILIES.join(', ')})`, 'family');
  if (!(SWEEP_FAMILIES as readonly string[]).includes(family)) throw new InputError(`--family: ${unknownNameMessage('seed family', family, SWEEP_FAMILIES)}`, 'family');
  const seeds = seedFamily(family as SweepFamilyName, args);
  const nText = strOpt(args, 'n');
  if (nText === undefined) throw new InputError(`a sweep needs --n (sizes from 1 to ${SWEEP_MAX_N}, as a..b)`, 'n');
  const n = parseNumberList(nText, 'n', 1, SWEEP_MAX_N);
  const kText = strOpt(args, 'k');
  if (kText !== undefined && !familyTakesK(seeds)) throw new InputError(`--k goes with families that take k (heights, staircase, or a poly with {k}), not ${family}`, 'k');
  const k = kText === undefined ? undefined : parseNumberList(kText, 'k', 1, SWEEP_MAX_N);
  const rawOps = args.options['ops'];
  if (!Array.isArray(rawOps) || rawOps.length === 0) throw new InputError('a sweep needs --ops (a set of operator families such as x,theta; repeat --ops for several sets)', 'ops');
  const seen = new Set<string>();
  const ops: string[][] = [];
  for (const text of rawOps) {
    const set = canonicalOpSet(text);
    if (seen.has(set.join(','))) continue;
    seen.add(set.join(','));
    ops.push(set);
  }
  ops.sort((a, b) => a.join(',').localeCompare(b.join(',')));
  const maxWork = parseWork(strOpt(args, 'max-work'));
  return {
    spec: { seeds, n, ...(k ? { k } : {}), ops },
    limits: { ...(maxWork !== undefined ? { maxWork } : {}), maxModules: intOpt(args, 'max-modules') ?? DEFAULT_MAX_MODULES },
  };
}

function quoted(w: string): string {
  return /^[\w.,:+\-/=^*()]+$/.test(w) ? w : `"${w.replaceAll('"', '\\"')}"`;
}

/** The sweep's options as words, in a fixed order, with only what changes its modules. */
export function sweepWords(spec: SweepSpec): string[] {
  const s = spec.seeds;
  const words = ['--family', s.family];
  if (s.family === 'monomials') {
    words.push('--max-degree', String(s.maxDegree));
    if (s.minDegree > 0) words.push('--min-degree', String(s.minDegree));
    words.push('--thetas', numberListText(s.thetas));
    if (s.symmetrize) words.push('--symmetrize');
  } else if (s.family === 'heights') words.push('--height', heightsText(s.heights));
  else if (s.family === 'poly') {
    words.push('--poly', s.poly);
    for (const p of polyParamsText(s.params)) words.push('--param', p);
    if (s.symmetrizer !== 'none') words.push(`--${s.symmetrizer}`);
  }
  words.push('--n', numberListText(spec.n));
  if (spec.k) words.push('--k', numberListText(spec.k));
  for (const set of spec.ops) words.push('--ops', set.join(','));
  return words;
}

/** The canonical key: the command line that runs the sweep again (`sweep run --family …`). */
export function sweepKey(spec: SweepSpec): string {
  return `sweep run ${sweepWords(spec).map(quoted).join(' ')}`;
}
