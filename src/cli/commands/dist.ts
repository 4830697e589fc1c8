/**
 * `gradus dist <family> <stat> [--stat2 S2] [--transform T] --n N [--k K] [--shape λ]
 * [--content μ] [--frobenius] [--by-shape] [--max-objects M] [--workers W] [--json]`:
 * the distribution of one statistic (a polynomial in q) or two (in q and t) over a family,
 * optionally after a transform, optionally as a Frobenius-level sum.
 */
import { familyById } from '../../../objects/index.js';
import { InputError } from '../../core/errors.js';
import type { Poly } from '../../core/poly.js';
import { computeDistribution, DEFAULT_MAX_OBJECTS, paramsText, type Distribution } from '../../enumerate/distribution.js';
import type { FrobeniusKind } from '../../enumerate/request.js';
import { flagOpt, intOpt, strOpt, type CommandSpec, type ParsedArgs } from '../command.js';
import { qtTableJson, toJsonText } from '../json-output.js';
import { familyParams, FAMILY_PARAM_OPTIONS } from './show.js';

function seriesJson(p: Poly, two: boolean): unknown {
  return two ? qtTableJson(p) : p.toJson();
}

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

function parseMaxObjects(args: ParsedArgs): bigint {
  const raw = strOpt(args, 'max-objects');
  if (raw === undefined) return DEFAULT_MAX_OBJECTS;
  const t = raw.replace(/_/g, '').trim();
  const m = /^(\d+)(?:e(\d+))?$/i.exec(t);
  if (!m) throw new InputError(`--max-objects must be a positive integer such as 5000000000 or 5e9 (got "${raw}")`, 'max-objects');
  const v = BigInt(m[1]!) * 10n ** BigInt(m[2] ?? '0');
  if (v < 1n) throw new InputError(`--max-objects must be at least 1 (got "${raw}")`, 'max-objects');
  return v;
}

function printText(d: Distribution, out: (s: string) => void): void {
  const two = d.statistics.length === 2;
  const names = two ? `q^${d.statistics[0]} t^${d.statistics[1]}` : `q^${d.statistics[0]}`;
  out(`Σ ${names} over ${d.family} (${paramsText(d.params)})${d.transform ? ` after ${d.transform}` : ''}: ${d.count} objects`);
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
  out(`(${d.provenance.method}; ${d.provenance.ms} ms; gradus ${d.provenance.version})`);
}

export const distCommand: CommandSpec = {
  name: 'dist',
  summary: 'distribution of one or two statistics over a family (q- or q,t-polynomial, Frobenius-level sums)',
  usage: 'dist <family> <stat> [--stat2 S2] [--transform T] --n N [--k K] [--shape A,B,…] [--content A,B,…] [--outer A,B,… [--inner A,B,…]] [--frobenius] [--by-shape] [--max-objects M] [--workers W] [--json]',
  positionals: [
    { name: 'family', description: 'a family id (gradus families lists them)' },
    { name: 'stat', description: 'a statistic id of the family, or transform:statistic (gradus statistics --family F)' },
  ],
  options: [
    ...FAMILY_PARAM_OPTIONS,
    { name: 'stat2', type: 'string', description: 'a second statistic, marked by t', placeholder: 'S2' },
    { name: 'transform', type: 'string', description: 'apply this transform to each object before the statistics', placeholder: 'T' },
    { name: 'frobenius', type: 'flag', description: 'also the sum Σ q^stat F_{iDes(reading word)} by descent set (or by shape with --by-shape)' },
    { name: 'by-shape', type: 'flag', description: 'with --frobenius: Σ q^stat s_shape over the shapes of the objects' },
    { name: 'max-objects', type: 'string', description: `refuse runs over this many objects (default ${DEFAULT_MAX_OBJECTS})`, placeholder: 'M' },
    { name: 'workers', type: 'int', description: 'worker threads (default: every core for runs over 2·10^6 objects)', placeholder: 'W', min: 1, max: 64 },
  ],
  producesData: true,
  details: [
    'examples:',
    '  gradus dist permutations inversions --n 5',
    '  gradus dist dyck-paths dyck-dinv --stat2 dyck-area --n 4',
    '  gradus dist parking-functions parking-dinv --stat2 parking-area --n 3 --frobenius',
    '  gradus dist permutations inversions --transform foata --n 6',
  ].join('\n'),
  async run(args, io) {
    const family = familyById(args.positionals[0]!);
    const params = familyParams(family, args);
    const stat2 = strOpt(args, 'stat2');
    let frobenius: FrobeniusKind | undefined;
    if (flagOpt(args, 'frobenius')) frobenius = flagOpt(args, 'by-shape') ? 'shapes' : 'descents';
    else if (flagOpt(args, 'by-shape')) throw new InputError('--by-shape goes with --frobenius', 'by-shape');
    const transform = strOpt(args, 'transform');
    const workers = intOpt(args, 'workers');
    io.progress.start(`dist ${family.id} ${args.positionals[1]}`, Number(family.count(params)));
    const d = await computeDistribution(
      { family: family.id, params, statistics: [args.positionals[1]!, ...(stat2 ? [stat2] : [])], ...(transform ? { transform } : {}), ...(frobenius ? { frobenius } : {}) },
      {
        maxObjects: parseMaxObjects(args),
        ...(workers ? { workers } : {}),
        onProgress: (done) => io.progress.update(done),
      },
    );
    io.progress.finish();
    const two = d.statistics.length === 2;
    if (args.options['json']) {
      io.out(
        toJsonText({
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
          provenance: d.provenance,
        }),
      );
      return;
    }
    printText(d, io.out);
  },
};
