/**
 * Series <-> JSON, following the data commands' convention: a q-series is an array of
 * coefficients (index = power of q), a q,t-series an array of rows ([i][j] = q^i t^j), a
 * Frobenius series an object {"3,1": <array or table>}, a multigraded table
 * {"axes": [...], "terms": [[[i,j,l], c], ...]}. Integers beyond 2^53 are strings.
 */
import { InputError } from '../core/errors.js';
import { bigToJson } from '../core/integers.js';
import { Poly } from '../core/poly.js';
import { shown } from '../core/shown.js';
import { byPartitionKey, qtSeries, schurSeries, type Series } from './series.js';

export type SeriesJson = unknown;

export function seriesToJson(s: Series): SeriesJson {
  switch (s.kind) {
    case 'q':
      return s.poly.toQArray().map(bigToJson);
    case 'qt':
      return s.poly.toQTTable().map((r) => r.map(bigToJson));
    case 'schur':
      return Object.fromEntries([...s.terms].sort(byPartitionKey).map(([k, c]) => [k, c.toJson()]));
    case 'multi':
      return { axes: s.axes, terms: [...s.terms].map(([k, c]) => [k.split(',').map(Number), bigToJson(c)]) };
  }
}

function toBig(v: unknown, where: string): bigint {
  // beyond 2^53 a JSON number has lost digits: the convention writes such integers as strings
  if (typeof v === 'number' && Number.isSafeInteger(v)) return BigInt(v);
  if (typeof v === 'string' && /^-?\d{1,2000}$/.test(v)) return BigInt(v);
  throw new InputError(`${where}: expected an integer coefficient (beyond 2^53 written as a string of digits), got ${shown(String(JSON.stringify(v)), 40)}`);
}

/** A Schur key "3,1,1": a partition with parts from 1 to 64 ("" is the empty partition). */
function checkPartitionKey(key: string, where: string): void {
  const parts = key === '' ? [] : key.split(',');
  const ok = parts.length <= 64 && parts.every((p, i) => /^\d{1,2}$/.test(p) && Number(p) >= 1 && Number(p) <= 64 && (i === 0 || Number(p) <= Number(parts[i - 1])));
  if (!ok) throw new InputError(`${where}: "${shown(key, 40)}" is not a partition written as weakly decreasing parts such as "3,1,1"`);
}

/** An array (q) or array of arrays (q,t) to a Poly. */
export function polyFromJson(v: unknown, where: string): Poly {
  if (!Array.isArray(v)) throw new InputError(`${where}: expected an array of coefficients`);
  if (v.length > 0 && v.every((r) => Array.isArray(r))) {
    return Poly.fromQTTable(v.map((r: unknown[], i) => r.map((c, j) => toBig(c, `${where}[${i}][${j}]`))));
  }
  return Poly.fromQCoeffs(v.map((c, i) => toBig(c, `${where}[${i}]`)));
}

/** Parse a series; `kind` (when known) says which of the shapes to expect. */
export function seriesFromJson(v: unknown, where: string, kind?: Series['kind']): Series {
  if (Array.isArray(v)) {
    const p = polyFromJson(v, where);
    if (kind === 'qt' && p.isUnivariate()) return { kind: 'qt', poly: p };
    return qtSeries(p);
  }
  if (v !== null && typeof v === 'object') {
    const o = v as Record<string, unknown>;
    if (Array.isArray(o['axes']) && Array.isArray(o['terms'])) {
      const axes = (o['axes'] as unknown[]).map(String);
      const m = new Map<string, bigint>();
      for (const t of o['terms'] as unknown[]) {
        if (!Array.isArray(t) || !Array.isArray(t[0]) || t[0].length !== axes.length) {
          throw new InputError(`${where}: each term is [[exponents, one per axis], coefficient]`);
        }
        const exps = t[0] as unknown[];
        if (!exps.every((e) => typeof e === 'number' && Number.isInteger(e) && e >= 0 && e <= 1000)) throw new InputError(`${where}: exponents must be integers from 0 to 1000`);
        m.set(exps.join(','), toBig(t[1], where));
      }
      return { kind: 'multi', axes, terms: m };
    }
    return schurSeries(Object.entries(o).map(([k, c]) => {
      checkPartitionKey(k, where);
      return [k, polyFromJson(c, `${where}.${k}`)] as const;
    }));
  }
  throw new InputError(`${where}: expected a series (array, table or object of Schur coefficients)`);
}
