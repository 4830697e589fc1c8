/**
 * Series from the JSON documents the data commands print:
 *   dist   {family, params, statistics, series, count}
 *   sym    {expression, degree, basis, terms: {"3,1": <q,t table>}}
 *   module {…, axes, hilbertSeries, schur: {"3,1": <table>}}
 * `take` picks what to read: the whole Frobenius series, its graded dimension (hilbert),
 * or the coefficient of s_(1^n) (sign, = ⟨F, e_n⟩) or of s_(n) (trivial, = ⟨F, h_n⟩).
 */
import { InputError } from '../core/errors.js';
import { hilbertOfSchur, keyToPartition, schurCoefficient, type Series } from './series.js';
import { seriesFromJson } from './seriesJson.js';

export const TAKE_CHOICES = ['auto', 'frobenius', 'hilbert', 'sign', 'trivial'] as const;
export type Take = (typeof TAKE_CHOICES)[number];

export function parseTake(v: string | undefined): Take {
  if (v === undefined) return 'auto';
  if (!(TAKE_CHOICES as readonly string[]).includes(v)) {
    throw new InputError(`--take must be one of ${TAKE_CHOICES.join(', ')} (got "${v}")`, 'take');
  }
  return v as Take;
}

export function seriesFromDocument(doc: unknown, take: Take, where: string): Series {
  if (doc === null || typeof doc !== 'object') throw new InputError(`${where}: expected a JSON object`);
  const o = doc as Record<string, unknown>;
  let frob: Series | undefined;
  let graded: Series | undefined;
  if ('terms' in o && o['terms'] && typeof o['terms'] === 'object' && !Array.isArray(o['terms'])) {
    frob = seriesFromJson(o['terms'], `${where}.terms`);
  } else if ('schur' in o && o['schur'] && typeof o['schur'] === 'object') {
    frob = seriesFromJson(o['schur'], `${where}.schur`);
  }
  if ('hilbertSeries' in o) graded = seriesFromJson(o['hilbertSeries'], `${where}.hilbertSeries`);
  else if ('series' in o) {
    const s = seriesFromJson(o['series'], `${where}.series`);
    if (s.kind === 'schur') frob = s;
    else graded = s;
  }
  if (frob && frob.kind !== 'schur') frob = undefined;
  switch (take) {
    case 'auto':
    case 'frobenius':
      if (frob) return frob;
      if (take === 'auto' && graded) return graded;
      throw new InputError(`${where}: the document has no Frobenius series (terms or schur)`, 'take');
    case 'hilbert':
      if (graded) return graded;
      if (frob) return hilbertOfSchur(frob);
      throw new InputError(`${where}: the document has no Hilbert series`, 'take');
    case 'sign':
    case 'trivial': {
      if (!frob) throw new InputError(`${where}: --take ${take} needs a Frobenius series in the document`, 'take');
      const n = degreeOf(frob);
      const lambda = take === 'sign' ? new Array<number>(n).fill(1) : n > 0 ? [n] : [];
      return schurCoefficient(frob, lambda);
    }
  }
}

function degreeOf(s: Series): number {
  if (s.kind !== 'schur') return 0;
  for (const k of s.terms.keys()) return keyToPartition(k).reduce((a, b) => a + b, 0);
  return 0;
}
