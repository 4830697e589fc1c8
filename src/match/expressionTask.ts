/**
 * Pool task of the expression library: one family at one place, evaluated once by the
 * symmetric-function engine; the specialisations and the Hilbert series are derived from that
 * one value (never evaluated again). A failure names the family, the place and the reason.
 */
import { InputError, LimitError } from '../core/errors.js';
import { Poly } from '../core/poly.js';
import { byPartitionKey, hilbertOfSchur, schurSeries, type Series } from '../series/series.js';
import { seriesToJson, type SeriesJson } from '../series/seriesJson.js';
import { instantiate } from '../requests/template.js';
import { DEFAULT_MAX_DEGREE, evaluateExpression } from '../symfun/expression.js';
import type { SymFun } from '../symfun/symfun.js';
import type { ExpressionFamily } from '../store/expressionStore.js';
import { SPECIALISATIONS, type Place } from './expressionFamilies.js';

export interface ExpressionJob {
  readonly family: ExpressionFamily;
  readonly place: Place;
}

export interface ExpressionJobValue {
  readonly specialisation: string;
  readonly projection: 'frobenius' | 'hilbert';
  readonly expression: string;
  readonly series: SeriesJson;
}

export interface ExpressionJobResult {
  readonly values: readonly ExpressionJobValue[];
  readonly seconds: number;
}

function placeText(p: Place): string {
  return `n = ${p.n}${p.k === undefined ? '' : `, k = ${p.k}`}${p.partition ? `, λ = (${p.partition.join(',')})` : ''}`;
}

/** The Frobenius series of an integral homogeneous value (else a reason why it cannot be stored). */
function asSeries(f: SymFun): Series | string {
  const degrees = f.degrees();
  if (degrees.length > 1) return `the value is not homogeneous (degrees ${degrees.join(', ')})`;
  if (!f.isIntegral()) return 'the value has coefficients that are not integers';
  return schurSeries([...f.schurTerms()].map(([k, c]) => [k, c.toPoly()] as const));
}

/** −1 when the first non-zero coefficient (partitions in reverse-lex order, lowest q,t-term) is negative. */
function signOf(s: Series): 1n | -1n {
  if (s.kind !== 'schur') return 1n;
  for (const [, c] of [...s.terms].sort(byPartitionKey)) {
    const first = c.sortedTerms()[0];
    if (first) return first[2] < 0n ? -1n : 1n;
  }
  return 1n;
}

function fail(job: ExpressionJob, text: string, why: string, limit: boolean): never {
  const msg = `expression family ${job.family.id} fails at ${placeText(job.place)} (${text}): ${why}`;
  throw limit ? new LimitError(msg, 'n-max') : new InputError(msg, 'template');
}

export function evaluateExpressionJob(job: ExpressionJob): ExpressionJobResult {
  const t0 = Date.now();
  const { family, place } = job;
  let text = family.template;
  let value: SymFun;
  try {
    text = instantiate(family.template, { n: place.n, ...(place.k === undefined ? {} : { k: place.k }), ...(place.partition ? { lambda: place.partition } : {}) }, 'template');
    value = evaluateExpression(text, { maxDegree: DEFAULT_MAX_DEGREE }).value;
  } catch (e) {
    if (e instanceof InputError || e instanceof LimitError) fail(job, text, e.message.replace(/^--template: /, ''), e instanceof LimitError);
    throw e;
  }
  let base = asSeries(value);
  if (typeof base === 'string') fail(job, text, base, false);
  let expression = text;
  if (family.sign === 'positive' && signOf(base) < 0n) {
    base = schurSeries([...(base as Extract<Series, { kind: 'schur' }>).terms].map(([k, c]) => [k, c.neg()] as const));
    expression = `-${text}`;
  }
  // every specialisation is stored, even when equal to another (the series itself is stored once, by hash)
  const values: ExpressionJobValue[] = [];
  for (const spec of SPECIALISATIONS) {
    const f = specialise(base as Extract<Series, { kind: 'schur' }>, spec.id);
    const e = spec.wrap(expression);
    values.push({ specialisation: spec.id, projection: 'frobenius', expression: e, series: seriesToJson(f) });
    values.push({ specialisation: spec.id, projection: 'hilbert', expression: `hilbert(${e})`, series: seriesToJson(hilbertOfSchur(f)) });
  }
  return { values, seconds: (Date.now() - t0) / 1000 };
}

function specialise(s: Extract<Series, { kind: 'schur' }>, id: string): Series {
  const map = (f: (p: Poly) => Poly) => schurSeries([...s.terms].map(([k, c]) => [k, f(c)] as const));
  switch (id) {
    case 't=0':
      return map((p) => p.specialize({ t: 0 }));
    case 't=1':
      return map((p) => p.specialize({ t: 1 }));
    case 'q=0':
      return map((p) => p.specialize({ q: 0 }).swapQT());
    case 'q=1':
      return map((p) => p.specialize({ q: 1 }).swapQT());
    default:
      return s;
  }
}
