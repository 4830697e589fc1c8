/**
 * A distribution request (plain data, so it can cross to a worker thread) and its
 * resolution against the registries: the family, one or two statistics, an optional
 * transform applied before the statistics, and the kind of Frobenius-level sum.
 */
import { FAMILIES, familyById } from '../../objects/index.js';
import { TRANSFORMS, transformById } from '../../objects/transforms/index.js';
import { STATISTICS } from '../../statistics/index.js';
import { InputError } from '../core/errors.js';
import { unknownNameMessage } from '../core/suggest.js';
import type { Family, Params, Statistic, Transform } from './plugin.js';

/** 'descents': Σ q^stat F_{iDes(reading word)}; 'shapes': Σ q^stat s_{shape}. */
export type FrobeniusKind = 'descents' | 'shapes';

export interface DistRequest {
  readonly family: string;
  readonly params: Params;
  /** One or two statistic ids; an id may be written `transform:statistic`. */
  readonly statistics: readonly string[];
  /** A transform applied to each object before every statistic. */
  readonly transform?: string;
  readonly frobenius?: FrobeniusKind;
  /** Never take a prefix walk (src/enumerate/fast); the tests compare both paths. */
  readonly generic?: boolean;
}

export interface ResolvedRequest {
  readonly request: DistRequest;
  readonly family: Family<unknown>;
  readonly transform?: Transform<unknown, unknown>;
  readonly statistics: readonly Statistic<unknown>[];
}

/** A statistic of `familyId`, with `t:s` read as s after the transform t. */
function statisticFor(id: string, familyId: string): { stat: Statistic<unknown>; via?: Transform<unknown, unknown> } {
  const colon = id.indexOf(':');
  if (colon > 0) {
    const t = transformById(id.slice(0, colon));
    if (t.from !== familyId) throw new InputError(`transform ${t.id} starts from ${t.from}, not ${familyId}`, 'stat');
    return { stat: statisticFor(id.slice(colon + 1), t.to).stat, via: t };
  }
  const own = STATISTICS.filter((s) => s.family === familyId);
  const hit = own.find((s) => s.id === id);
  if (hit) return { stat: hit };
  const elsewhere = STATISTICS.find((s) => s.id === id);
  if (elsewhere) {
    throw new InputError(`statistic ${id} is defined on ${elsewhere.family}, not ${familyId}; statistics of ${familyId}: ${own.map((s) => s.id).join(', ') || '(none)'}`, 'stat');
  }
  const pool = own.length > 0 ? own : STATISTICS;
  throw new InputError(`${unknownNameMessage(`statistic of ${familyId}`, id, pool.map((s) => s.id))}`, 'stat');
}

function composed(stat: Statistic<unknown>, via: Transform<unknown, unknown> | undefined): Statistic<unknown> {
  if (!via) return stat;
  // No step: the per-step increments belong to the statistic, not to its composite.
  const { id, description, source } = stat;
  return { id: `${via.id}:${id}`, family: via.from, description, source, examples: [], compute: (x) => stat.compute(via.apply(x)) };
}

export function resolveRequest(request: DistRequest): ResolvedRequest {
  if (!FAMILIES.some((f) => f.id === request.family)) familyById(request.family); // throws with nearest names
  const family = familyById(request.family);
  family.validate(request.params);
  let transform: Transform<unknown, unknown> | undefined;
  if (request.transform !== undefined) {
    if (!TRANSFORMS.some((t) => t.id === request.transform)) transformById(request.transform);
    transform = transformById(request.transform);
    if (transform.from !== family.id) {
      const from = TRANSFORMS.filter((t) => t.from === family.id).map((t) => t.id);
      throw new InputError(`transform ${transform.id} starts from ${transform.from}, not ${family.id}; transforms from ${family.id}: ${from.join(', ') || '(none)'}`, 'transform');
    }
  }
  if (request.statistics.length < 1 || request.statistics.length > 2) {
    throw new InputError(`give one or two statistics (got ${request.statistics.length})`, 'stat');
  }
  const target = transform ? transform.to : family.id;
  const statistics = request.statistics.map((id) => {
    const { stat, via } = statisticFor(id, target);
    return composed(stat, via);
  });
  if (request.frobenius === 'descents' && !family.readingWord) {
    throw new InputError(`${family.id} has no reading word, so no sum over fundamental quasisymmetric functions${family.shape ? '; try the shape sum' : ''}`, 'frobenius');
  }
  if (request.frobenius === 'shapes' && !family.shape) {
    throw new InputError(`${family.id} has no shape, so no sum over Schur functions${family.readingWord ? '; try the descent sum' : ''}`, 'frobenius');
  }
  return { request, family, transform, statistics };
}
