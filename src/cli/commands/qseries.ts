/** `gradus qseries <name> --n N [--k K]`: the q-analogs of src/core/qanalogs. */
import { InputError } from '../../core/errors.js';
import type { Poly } from '../../core/poly.js';
import { qBinomial, qFactorial, qInteger, qMultinomial, qOrderedStirling, qStirling2 } from '../../core/qanalogs.js';
import { unknownNameMessage } from '../../core/suggest.js';
import { intOpt, listOpt, type CommandSpec, type ParsedArgs } from '../command.js';
import { toJsonText } from '../../core/json-text.js';

interface QSeriesKind {
  readonly name: string;
  readonly description: string;
  readonly needsK: boolean;
  readonly title: (n: number, k?: number, parts?: number[]) => string;
  readonly compute: (n: number, k: number, parts: number[]) => Poly;
}

const N_MAX = 200;

export const QSERIES_KINDS: readonly QSeriesKind[] = [
  { name: 'integer', description: '[n]_q = 1 + q + … + q^(n-1)', needsK: false, title: (n) => `[${n}]_q`, compute: (n) => qInteger(n) },
  { name: 'factorial', description: '[n]_q! = [1]_q [2]_q … [n]_q', needsK: false, title: (n) => `[${n}]_q!`, compute: (n) => qFactorial(n) },
  { name: 'binomial', description: 'Gaussian binomial [n choose k]_q', needsK: true, title: (n, k) => `[${n} choose ${k}]_q`, compute: (n, k) => qBinomial(n, k) },
  {
    name: 'multinomial',
    description: 'q-multinomial [n; a1,…,ar]_q (give --parts a1,…,ar; n is their sum)',
    needsK: false,
    title: (n, _k, parts) => `[${n}; ${parts?.join(',')}]_q`,
    compute: (_n, _k, parts) => qMultinomial(parts),
  },
  { name: 'stirling', description: 'q-Stirling number of the second kind Stir_q(n,k)', needsK: true, title: (n, k) => `Stir_q(${n},${k})`, compute: (n, k) => qStirling2(n, k) },
  {
    name: 'ordered-stirling',
    description: '[k]_q! Stir_q(n,k), the q-count of ordered set partitions of [n] into k blocks',
    needsK: true,
    title: (n, k) => `[${k}]_q! Stir_q(${n},${k})`,
    compute: (n, k) => qOrderedStirling(n, k),
  },
];

export const qseriesCommand: CommandSpec = {
  name: 'qseries',
  summary: 'q-integers, q-factorials, q-binomials, q-multinomials and q-Stirling numbers',
  usage: 'qseries <name> --n N [--k K] [--parts A,B,…] [--json]',
  positionals: [{ name: 'name', description: QSERIES_KINDS.map((k) => k.name).join(', ') }],
  options: [
    { name: 'n', type: 'int', description: 'size n', placeholder: 'N', min: 0, max: N_MAX },
    { name: 'k', type: 'int', description: 'second parameter k (binomial, stirling, ordered-stirling)', placeholder: 'K', min: 0, max: N_MAX },
    { name: 'parts', type: 'list', description: 'parts of a q-multinomial', placeholder: 'A,B,…' },
  ],
  producesData: true,
  details: ['names:', ...QSERIES_KINDS.map((k) => `  ${k.name.padEnd(17)}${k.description}`)].join('\n'),
  run(args: ParsedArgs, io) {
    const name = args.positionals[0]!;
    const kind = QSERIES_KINDS.find((k) => k.name === name);
    if (!kind) throw new InputError(`qseries: ${unknownNameMessage('name', name, QSERIES_KINDS.map((k) => k.name))}`, 'name');
    let parts: number[] = [];
    let n = intOpt(args, 'n');
    if (kind.name === 'multinomial') {
      const raw = listOpt(args, 'parts');
      if (!raw) throw new InputError('qseries multinomial needs --parts A,B,… (non-negative integers)', 'parts');
      parts = raw.map((s) => {
        if (!/^\d+$/.test(s)) throw new InputError(`--parts must be non-negative integers (got "${s}")`, 'parts');
        return Number(s);
      });
      const sum = parts.reduce((a, b) => a + b, 0);
      if (sum > N_MAX) throw new InputError(`--parts must sum to at most ${N_MAX} (got ${sum})`, 'parts');
      if (n !== undefined && n !== sum) throw new InputError(`--n must equal the sum of --parts (${sum}), got ${n}`, 'n');
      n = sum;
    }
    if (n === undefined) throw new InputError(`qseries ${name} needs --n N (0..${N_MAX})`, 'n');
    const k = intOpt(args, 'k');
    if (kind.needsK && k === undefined) throw new InputError(`qseries ${name} needs --k K (0..${N_MAX})`, 'k');
    const p = kind.compute(n, k ?? 0, parts);
    const title = kind.title(n, k, parts);
    if (args.options['json']) {
      io.out(toJsonText({ name, n, ...(kind.needsK ? { k } : {}), ...(parts.length ? { parts } : {}), series: p, atOne: p.sumCoefficients() }));
      return;
    }
    io.out(`${title} = ${p.toString()}`);
    io.out(`coefficients (q^0 up): ${p.toQArray().join(' ')}`);
    io.out(`value at q = 1: ${p.sumCoefficients()}`);
  },
};
