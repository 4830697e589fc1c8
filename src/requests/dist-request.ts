/** `dist`: the distribution of one or two statistics over a family, optionally Frobenius-level. */
import { familyById } from '../../objects/index.js';
import { InputError } from '../core/errors.js';
import { qtTableJson } from '../core/json-text.js';
import type { Poly } from '../core/poly.js';
import { computeDistribution, DEFAULT_MAX_OBJECTS, type Distribution } from '../enumerate/distribution.js';
import type { Params } from '../enumerate/plugin.js';
import { resolveRequest, type FrobeniusKind } from '../enumerate/request.js';
import { FAMILY_PARAM_OPTIONS, familyParams, paramOptionValues } from './family-params.js';
import { flagOpt, intOpt, strOpt, type OptionSpec, type ParsedArgs } from './options.js';
import type { RequestKind } from './request-kind.js';

export interface DistRequestOf {
  readonly kind: 'dist';
  readonly family: string;
  readonly params: Params;
  readonly statistics: readonly string[];
  readonly transform?: string;
  readonly frobenius?: FrobeniusKind;
  readonly maxObjects: bigint;
  readonly workers?: number;
}

export const DIST_OPTIONS: readonly OptionSpec[] = [
  ...FAMILY_PARAM_OPTIONS,
  { name: 'stat2', type: 'string', description: 'a second statistic, marked by t', placeholder: 'S2' },
  { name: 'transform', type: 'string', description: 'apply this transform to each object before the statistics', placeholder: 'T' },
  { name: 'frobenius', type: 'flag', description: 'also the sum Σ q^stat F_{iDes(reading word)} by descent set (or by shape with --by-shape)' },
  { name: 'by-shape', type: 'flag', description: 'with --frobenius: Σ q^stat s_shape over the shapes of the objects' },
  { name: 'max-objects', type: 'string', description: `refuse runs over this many objects (default ${DEFAULT_MAX_OBJECTS})`, placeholder: 'M' },
  { name: 'workers', type: 'int', description: 'worker threads (default: every core for runs over 2·10^6 objects)', placeholder: 'W', min: 1, max: 64 },
];

function parseMaxObjects(args: ParsedArgs): bigint {
  const raw = strOpt(args, 'max-objects');
  if (raw === undefined) return DEFAULT_MAX_OBJECTS;
  const t = raw.replace(/_/g, '').trim();
  const m = /^(\d{1,30})(?:e(\d{1,2}))?$/i.exec(t);
  if (!m) throw new InputError(`--max-objects must be a positive integer such as 5000000000 or 5e9 (got "${raw.slice(0, 40)}")`, 'max-objects');
  const v = BigInt(m[1]!) * 10n ** BigInt(m[2] ?? '0');
  if (v < 1n) throw new InputError(`--max-objects must be at least 1 (got "${raw}")`, 'max-objects');
  return v;
}

function seriesJson(p: Poly, two: boolean): unknown {
  return two ? qtTableJson(p) : p.toJson();
}

export const distKind: RequestKind<DistRequestOf, Distribution> = {
  name: 'dist',
  usage: 'dist <family> <stat> [--stat2 S2] [--transform T] [family parameters] [--frobenius [--by-shape]] [--max-objects M] [--workers W] [--json]',
  positionals: [
    { name: 'family', description: 'a family id (gradus families lists them)' },
    { name: 'stat', description: 'a statistic id of the family, or transform:statistic (gradus statistics --family F)' },
  ],
  options: DIST_OPTIONS,
  fromArgs(args) {
    const family = familyById(args.positionals[0]!);
    const params = familyParams(family, args);
    const stat2 = strOpt(args, 'stat2');
    let frobenius: FrobeniusKind | undefined;
    if (flagOpt(args, 'frobenius')) frobenius = flagOpt(args, 'by-shape') ? 'shapes' : 'descents';
    else if (flagOpt(args, 'by-shape')) throw new InputError('--by-shape goes with --frobenius', 'by-shape');
    const transform = strOpt(args, 'transform');
    const workers = intOpt(args, 'workers');
    const request: DistRequestOf = {
      kind: 'dist',
      family: family.id,
      params,
      statistics: [args.positionals[1]!, ...(stat2 ? [stat2] : [])],
      ...(transform ? { transform } : {}),
      ...(frobenius ? { frobenius } : {}),
      maxObjects: parseMaxObjects(args),
      ...(workers ? { workers } : {}),
    };
    resolveRequest(engineRequest(request)); // names any bad statistic or transform now
    return request;
  },
  canonical(r) {
    return {
      positionals: [r.family, r.statistics[0]!],
      options: {
        ...paramOptionValues(r.params),
        stat2: r.statistics[1],
        transform: r.transform,
        frobenius: r.frobenius !== undefined || undefined,
        'by-shape': r.frobenius === 'shapes' || undefined,
      },
    };
  },
  compute(r, context) {
    const total = Number(familyById(r.family).count(r.params));
    return computeDistribution(engineRequest(r), {
      maxObjects: r.maxObjects,
      ...(r.workers ? { workers: r.workers } : {}),
      onProgress: (done) => context.progress?.(`dist ${r.family} ${r.statistics.join(' ')}`, done, total),
    });
  },
  document(_r, d, key) {
    const two = d.statistics.length === 2;
    return {
      family: d.family,
      params: d.params,
      statistics: d.statistics,
      ...(d.transform ? { transform: d.transform } : {}),
      variables: two ? ['q', 't'] : ['q'],
      series: seriesJson(d.series, two),
      count: d.count,
      ...(d.frobenius
        ? {
            frobenius: {
              basis: d.frobenius.kind === 'descents' ? 'fundamental-quasisymmetric' : 'schur',
              ...(d.frobenius.n !== undefined ? { n: d.frobenius.n } : {}),
              terms: d.frobenius.terms.map((t) => ({ ...(t.set ? { set: t.set } : { shape: t.shape }), series: seriesJson(t.series, two) })),
            },
          }
        : {}),
      provenance: { ...d.provenance, request: key },
    };
  },
};

/** The engine's own request (plain data that crosses to worker threads). */
export function engineRequest(r: DistRequestOf): Parameters<typeof computeDistribution>[0] {
  return { family: r.family, params: r.params, statistics: r.statistics, ...(r.transform ? { transform: r.transform } : {}), ...(r.frobenius ? { frobenius: r.frobenius } : {}) };
}
