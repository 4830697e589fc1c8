/**
 * `gradus dist <family> <stat> …`: the distribution of one statistic (a polynomial in q) or two
 * (in q and t) over a family, optionally after a transform, optionally as a Frobenius-level sum
 * (the request kind of src/requests).
 */
import type { Poly } from '../../core/poly.js';
import { paramsText, type Distribution } from '../../enumerate/distribution.js';
import { distKind } from '../../requests/dist-request.js';
import { dataCommand } from '../data-command.js';

/** Coefficients as text: one line in q, or a table with rows q^i and columns t^j. */
export function coefficientText(p: Poly, two: boolean): string[] {
  if (!two) return [`coefficients (q^0 up): ${p.toQArray().join(' ')}`];
  const table = p.toQTTable();
  const cols = Math.max(0, ...table.map((r) => r.length));
  const cells = table.map((r) => Array.from({ length: cols }, (_, j) => String(r[j] ?? 0n)));
  const width = Math.max(3, ...cells.flat().map((c) => c.length));
  const head = ['     ', ...Array.from({ length: cols }, (_, j) => `t^${j}`.padStart(width))].join(' ');
  return ['coefficients (row q^i, column t^j):', head, ...cells.map((r, i) => [`q^${i}`.padEnd(5), ...r.map((c) => c.padStart(width))].join(' '))];
}

function printText(d: Distribution, out: (s: string) => void): void {
  const two = d.statistics.length === 2;
  const names = two ? `q^${d.statistics[0]} t^${d.statistics[1]}` : `q^${d.statistics[0]}`;
  out(`Σ ${names} over ${d.family} (${paramsText(d.params)})${d.transform ? ` after ${d.transform}` : ''}: ${d.count} object${d.count === 1n ? '' : 's'}`);
  out(d.series.toString());
  for (const line of coefficientText(d.series, two)) out(line);
  if (d.frobenius) {
    out('');
    if (d.frobenius.kind === 'descents') {
      out(`Frobenius-level sum Σ ${names} F_{${d.frobenius.n}, iDes(reading word)} (fundamental quasisymmetric functions):`);
      for (const t of d.frobenius.terms) out(`  F{${t.set!.join(',')}}: ${t.series.toString()}`);
    } else {
      out(`Frobenius-level sum Σ ${names} s_shape (Schur functions):`);
      for (const t of d.frobenius.terms) out(`  s(${t.shape!.join(',')}): ${t.series.toString()}`);
    }
  }
  out(`(${d.provenance.method}; ${Math.round(d.provenance.seconds * 1000)} ms; gradus ${d.provenance.version})`);
}

export const distCommand = dataCommand(distKind, {
  summary: 'distribution of one or two statistics over a family (q- or q,t-polynomial, Frobenius-level sums)',
  details: [
    'examples:',
    '  gradus dist permutations inversions --n 5',
    '  gradus dist dyck-paths dyck-dinv --stat2 dyck-area --n 4',
    '  gradus dist parking-functions parking-dinv --stat2 parking-area --n 3 --frobenius',
    '  gradus dist permutations inversions --transform foata --n 6',
  ].join('\n'),
  print: (_r, d, io) => printText(d, io.out),
});
