/**
 * Counts of objects by one or two statistic values, kept dense (a row per value of the
 * first statistic, growing as needed) so the inner loop is an array increment. Counts are
 * doubles, exact below 2^53, far above any run the engine allows.
 */
import { Poly } from '../core/poly.js';

/** The wire form of a tally: [v1, v2, count] triples (count > 0). */
export type TallyTriples = readonly (readonly [number, number, number])[];

export class Tally {
  private rows: Float64Array[] = [];
  total = 0;

  /** Adds one object with statistic values v1 (and v2, 0 when there is one statistic). */
  add(v1: number, v2: number): void {
    let row = this.rows[v1];
    if (row === undefined || v2 >= row.length) row = this.grow(v1, v2);
    row[v2]!++;
    this.total++;
  }

  private grow(v1: number, v2: number): Float64Array {
    if (!Number.isInteger(v1) || v1 < 0 || !Number.isInteger(v2) || v2 < 0 || v1 > 1e7 || v2 > 1e7) {
      throw new Error(`a statistic gave ${v1}, ${v2}: values must be integers from 0 to 10^7`);
    }
    const old = this.rows[v1];
    const next = new Float64Array(Math.max(8, v2 + 1, 2 * (old?.length ?? 0)));
    if (old) next.set(old);
    while (this.rows.length < v1) this.rows.push(new Float64Array(0));
    this.rows[v1] = next;
    return next;
  }

  addCount(v1: number, v2: number, c: number): void {
    let row = this.rows[v1];
    if (row === undefined || v2 >= row.length) row = this.grow(v1, v2);
    row[v2]! += c;
    this.total += c;
  }

  merge(triples: TallyTriples): void {
    for (const [a, b, c] of triples) this.addCount(a, b, c);
  }

  triples(): [number, number, number][] {
    const out: [number, number, number][] = [];
    this.rows.forEach((row, a) => row.forEach((c, b) => c > 0 && out.push([a, b, c])));
    return out;
  }

  /** Σ count · q^{v1} t^{v2}. */
  toPoly(): Poly {
    return Poly.fromTerms(this.triples().map(([a, b, c]) => [a, b, BigInt(c)] as const));
  }
}
