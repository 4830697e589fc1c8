/**
 * plan → requests: a sweep expanded into lines (one seed of the family under one operator set,
 * over its places (n, k)) and the distinct module requests they need. Seeds equal up to S_n
 * and scalars share one request; seeds that vanish or are not defined at a place are counted
 * and left out. The request list is the sweep's whole work: computed here on the pool, or
 * sharded elsewhere, every module is kept in the catalogue under its canonical key.
 */
import { LimitError } from '../core/errors.js';
import { preEstimateWork } from '../modules/module-cost.js';
import { isDerivativeOnly, parseOperatorFamilies } from '../modules/operators.js';
import { polarizationReducible } from '../modules/polarized-seeds.js';
import { seedTerms, type SeedSpec } from '../modules/seeds.js';
import { requestKey, type ModuleRequest } from '../requests/index.js';
import { heightAt, heightItemText } from './heights.js';
import { classMonomial, classText, monomialCensus } from './monomialSeeds.js';
import { assignments, assignmentText, substitute } from './polyTemplate.js';
import { seedFingerprint } from './seedFingerprint.js';
import { familyTakesK, sweepKey, type SweepLimits, type SweepSpec } from './sweepSpec.js';

export interface Place {
  readonly n: number;
  readonly k?: number;
}

export interface PlannedModule {
  readonly key: string;
  readonly request: ModuleRequest;
  readonly n: number;
  readonly k?: number;
  /** Processor seconds estimated before the seed is built (enumeration only: a lower bound). */
  readonly seconds: number;
}

export interface SweepLine {
  readonly id: string;
  /** The seed in words, e.g. "ε(x1^2 θ1 x2)" or "δ_{n,k}, height k-1". */
  readonly seed: string;
  readonly ops: readonly string[];
  /** The module request at every place, with {n} and {k} (for families over n). */
  readonly template?: string;
  readonly places: readonly (Place & { readonly key: string })[];
  /** Places where the seed vanishes or is not defined. */
  readonly left: readonly (Place & { readonly why: string })[];
}

export interface SweepCounts {
  /** Seeds as the parameters list them, at every place and operator set. */
  readonly raw: string;
  readonly vanishing: string;
  /** Seeds equal (up to S_n and scalars) to one listed before. */
  readonly duplicates: string;
  readonly undefinedPlaces: number;
  readonly modules: number;
}

export interface SweepPlan {
  readonly key: string;
  readonly spec: SweepSpec;
  readonly lines: readonly SweepLine[];
  readonly modules: readonly PlannedModule[];
  readonly counts: SweepCounts;
}

function moduleRequest(spec: SeedSpec, ops: readonly string[]): ModuleRequest {
  return { kind: 'module', spec: { ...spec, ops }, frobenius: true, method: 'auto' };
}

function estimateSeconds(spec: SeedSpec, ops: readonly string[]): number {
  const families = parseOperatorFamilies(ops);
  const route = isDerivativeOnly(families) ? 'young' : polarizationReducible(families) ? 'polarized' : 'iterated';
  try {
    return preEstimateWork(seedTerms(spec), spec.n, families, route).seconds;
  } catch {
    return 0; // a seed not defined here is left out before it is computed
  }
}

/** Places of a family over n (and k where it takes one). */
function placesOf(spec: SweepSpec): Place[] {
  const out: Place[] = [];
  for (const n of spec.n) {
    if (!familyTakesK(spec.seeds)) out.push({ n });
    else for (let k = 1; k <= n; k++) if (!spec.k || spec.k.includes(k)) out.push({ n, k });
  }
  return out;
}

interface SeedAt {
  readonly place: Place;
  readonly spec?: SeedSpec;
  readonly why?: string;
}

/** The seeds of a family as lines before the operators: a label, a template and the seed at each place. */
function seedLines(spec: SweepSpec): { seed: string; template?: string; at: SeedAt[] }[] {
  const s = spec.seeds;
  const places = placesOf(spec);
  switch (s.family) {
    case 'heights':
      return s.heights.map((h) => ({
        seed: `δ_{n,k} with height ${heightItemText(h)}`,
        template: `module --seed superspace-vandermonde --n {n} --k {k}${h.kind === 'k' && h.offset === -1 ? '' : ` --height ${h.kind === 'fixed' ? h.value : h.offset === 0 ? '{k}' : `{k}${h.offset > 0 ? '+' : '-'}${Math.abs(h.offset)}`}`}`,
        at: places.map((p) => {
          const height = heightAt(h, p.k!);
          if (height === undefined) return { place: p, why: `height ${heightItemText(h)} is out of range at k = ${p.k}` };
          // the default height k−1 is left implicit (and at k = n no position carries it), so the
          // request has the key of `module` without --height
          return { place: p, spec: { seed: 'superspace-vandermonde', n: p.n, k: p.k!, ...(height === p.k! - 1 || p.k === p.n ? {} : { height }) } };
        }),
      }));
    case 'staircase':
      return [{ seed: 'θ-staircase', template: 'module --seed theta-staircase --n {n} --k {k}', at: places.map((p) => ({ place: p, spec: { seed: 'theta-staircase', n: p.n, k: p.k! } })) }];
    case 'poly':
      return assignments(s.params).map((a) => ({
        seed: `${s.symmetrizer === 'antisymmetrize' ? 'ε' : s.symmetrizer === 'symmetrize' ? 'sym' : ''}(${s.poly})${Object.keys(a).length ? ` at ${assignmentText(a)}` : ''}`,
        at: places.map((p) => {
          const poly = substitute(s.poly, { ...a, n: p.n, ...(p.k !== undefined ? { k: p.k } : {}) });
          if (poly === undefined) return { place: p, why: 'an exponent is negative here' };
          return { place: p, spec: { seed: 'poly', n: p.n, ...(p.k !== undefined ? { k: p.k } : {}), poly, ...(s.symmetrizer !== 'none' ? { symmetrizer: s.symmetrizer } : {}) } };
        }),
      }));
    case 'monomials':
      return []; // planned by their column classes (planMonomials)
  }
}

export function planSweep(spec: SweepSpec, limits: SweepLimits): SweepPlan {
  const modules = new Map<string, PlannedModule>();
  const byFingerprint = new Map<string, string>();
  const lines: SweepLine[] = [];
  let raw = 0n;
  let vanishing = 0n;
  let duplicates = 0n;
  let undefinedPlaces = 0;
  const add = (seed: SeedSpec, ops: readonly string[], fingerprint: string): string => {
    const fp = `${ops.join(',')}|${seed.n}|${fingerprint}`;
    const known = byFingerprint.get(fp);
    if (known) {
      duplicates++;
      return known;
    }
    const request = moduleRequest(seed, ops);
    const key = requestKey(request);
    byFingerprint.set(fp, key);
    if (!modules.has(key)) {
      if (modules.size >= limits.maxModules) throw new LimitError(`the sweep needs more than ${limits.maxModules} distinct modules; narrow it or raise --max-modules`, 'max-modules');
      modules.set(key, { key, request, n: seed.n, ...(seed.k !== undefined ? { k: seed.k } : {}), seconds: estimateSeconds(seed, ops) });
    }
    return key;
  };
  const s = spec.seeds;
  if (s.family === 'monomials') {
    for (const n of spec.n) {
      const census = monomialCensus(n, s.minDegree, s.maxDegree, s.thetas, s.symmetrize, limits.maxModules);
      for (const ops of spec.ops) {
        raw += census.raw;
        vanishing += census.vanishing;
        for (const c of census.classes) {
          const { x, theta } = classMonomial(c);
          const seed: SeedSpec = { seed: 'monomial', n, xExponents: x, ...(theta.length ? { theta } : {}), ...(s.symmetrize ? { symmetrizer: 'symmetrize' } : {}) };
          duplicates += c.arrangements - 1n;
          const key = add(seed, ops, `monomial ${x.join(',')} ${theta.join(',')}`);
          lines.push({ id: '', seed: `${classText(c, s.symmetrize)}, n = ${n}`, ops, places: [{ n, key }], left: [] });
        }
      }
    }
  } else {
    for (const line of seedLines(spec)) {
      for (const ops of spec.ops) {
        const places: (Place & { key: string })[] = [];
        const left: (Place & { why: string })[] = [];
        for (const at of line.at) {
          raw++;
          if (!at.spec) {
            undefinedPlaces++;
            left.push({ ...at.place, why: at.why! });
            continue;
          }
          const fp = seedFingerprint(at.spec);
          if (fp.kind === 'zero') {
            vanishing++;
            left.push({ ...at.place, why: at.spec.symmetrizer === undefined && at.spec.seed === 'poly' ? 'the polynomial is zero' : 'the seed vanishes after its symmetrizer' });
          } else if (fp.kind === 'undefined') {
            undefinedPlaces++;
            left.push({ ...at.place, why: fp.why });
          } else places.push({ ...at.place, key: add(at.spec, ops, fp.text) });
        }
        lines.push({ id: '', seed: line.seed, ops, ...(line.template ? { template: `${line.template} --ops ${ops.join(',')} --frobenius` } : {}), places, left });
      }
    }
  }
  const numbered = lines.map((l, i) => ({ ...l, id: `S${i + 1}` }));
  return {
    key: sweepKey(spec),
    spec,
    lines: numbered,
    modules: [...modules.values()],
    counts: { raw: raw.toString(), vanishing: vanishing.toString(), duplicates: duplicates.toString(), undefinedPlaces, modules: modules.size },
  };
}
