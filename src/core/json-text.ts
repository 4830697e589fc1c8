/**
 * The JSON convention of every data command: a polynomial in q is an array of integer
 * coefficients (index = power of q); in q and t an array of arrays ([i][j] = coefficient
 * of q^i t^j); integers beyond 2^53 are strings.
 */
import { bigToJson } from './integers.js';
import { Poly } from './poly.js';

/** JSON.stringify that writes BigInt per the convention and Poly as its coefficient array(s). */
export function toJsonText(value: unknown): string {
  return JSON.stringify(value, (_k, v: unknown) => {
    if (typeof v === 'bigint') return bigToJson(v);
    if (v instanceof Poly) return v.toJson();
    if (v instanceof Map) return Object.fromEntries(v);
    return v;
  });
}

/** A q,t-polynomial always as a table, even when it has no t (for axes that must be 2-D). */
export function qtTableJson(p: Poly): (number | string)[][] {
  return p.toQTTable().map((row) => row.map(bigToJson));
}
