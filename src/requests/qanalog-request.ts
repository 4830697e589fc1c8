/** `qanalog`: the q-analogs of src/core/qanalogs as exact polynomials in q. */
import { InputError } from '../core/errors.js';
import { makeProvenance } from '../core/provenance.js';
import type { Poly } from '../core/poly.js';
import { qBinomial, qFactorial, qInteger, qMultinomial, qOrderedStirling, qStirling2 } from '../core/qanalogs.js';
import { unknownNameMessage } from '../core/suggest.js';
import { intListOpt, intOpt, type OptionSpec } from './options.js';
import type { RequestKind } from './request-kind.js';

interface QAnalogKind {
  readonly name: string;
  readonly description: string;
  readonly needsK: boolean;
  readonly title: (n: number, k?: number, parts?: readonly number[]) => string;
  readonly compute: (n: number, k: number, parts: readonly number[]) => Poly;
}

const N_MAX = 200;

export const QANALOG_KINDS: readonly QAnalogKind[] = [
  { name: 'integer', description: '[n]_q = 1 + q + … + q^(n-1)', needsK: false, title: (n) => `[${n}]_q`, compute: (n) => qInteger(n) },
  { name: 'factorial', description: '[n]_q! = [1]_q [2]_q … [n]_q', needsK: false, title: (n) => `[${n}]_q!`, compute: (n) => qFactorial(n) },
  { name: 'binomial', description: 'Gaussian binomial [n choose k]_q', needsK: true, title: (n, k) => `[${n} choose ${k}]_q`, compute: (n, k) => qBinomial(n, k) },
  {
    name: 'multinomial',
    description: 'q-multinomial [n; a1,…,ar]_q (give --parts a1,…,ar; n is their sum)',
    needsK: false,
    title: (n, _k, parts) => `[${n}; ${parts?.join(',')}]_q`,
    compute: (_n, _k, parts) => qMultinomial([...parts]),
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

export interface QAnalogRequest {
  readonly kind: 'qanalog';
  readonly name: string;
  readonly n: number;
  readonly k?: number;
  readonly parts?: readonly number[];
}

export interface QAnalogResult {
  readonly title: string;
  readonly series: Poly;
}

export const qanalogKind: RequestKind<QAnalogRequest, QAnalogResult> = {
  name: 'qanalog',
  usage: 'qanalog <name> --n N [--k K] [--parts A,B,…] [--json]',
  positionals: [{ name: 'name', description: QANALOG_KINDS.map((k) => k.name).join(', ') }],
  options: [
    { name: 'n', type: 'int', description: 'size n', placeholder: 'N', min: 0, max: N_MAX },
    { name: 'k', type: 'int', description: 'second parameter k (binomial, stirling, ordered-stirling)', placeholder: 'K', min: 0, max: N_MAX },
    { name: 'parts', type: 'list', description: 'parts of a q-multinomial', placeholder: 'A,B,…' },
  ],
  fromArgs(args) {
    const name = args.positionals[0]!;
    const kind = QANALOG_KINDS.find((k) => k.name === name);
    if (!kind) throw new InputError(`qanalog: ${unknownNameMessage('name', name, QANALOG_KINDS.map((k) => k.name))}`, 'name');
    let n = intOpt(args, 'n');
    let parts: number[] | undefined;
    if (kind.name === 'multinomial') {
      parts = intListOpt(args, 'parts');
      if (!parts) throw new InputError('qanalog multinomial needs --parts A,B,… (non-negative integers)', 'parts');
      const sum = parts.reduce((a, b) => a + b, 0);
      if (sum > N_MAX) throw new InputError(`--parts must sum to at most ${N_MAX} (got ${sum})`, 'parts');
      if (n !== undefined && n !== sum) throw new InputError(`--n must equal the sum of --parts (${sum}), got ${n}`, 'n');
      n = sum;
    } else if (intListOpt(args, 'parts') !== undefined) throw new InputError(`--parts goes with qanalog multinomial, not ${name}`, 'parts');
    if (n === undefined) throw new InputError(`qanalog ${name} needs --n N (0..${N_MAX})`, 'n');
    const k = intOpt(args, 'k');
    if (kind.needsK && k === undefined) throw new InputError(`qanalog ${name} needs --k K (0..${N_MAX})`, 'k');
    if (!kind.needsK && k !== undefined) throw new InputError(`qanalog ${name} takes no --k`, 'k');
    return { kind: 'qanalog', name, n, ...(k !== undefined ? { k } : {}), ...(parts ? { parts } : {}) };
  },
  canonical(r) {
    return { positionals: [r.name], options: { n: r.parts ? undefined : r.n, k: r.k, parts: r.parts } };
  },
  async compute(r) {
    const kind = QANALOG_KINDS.find((k) => k.name === r.name)!;
    return { title: kind.title(r.n, r.k, r.parts), series: kind.compute(r.n, r.k ?? 0, r.parts ?? []) };
  },
  document(r, result, key) {
    return {
      name: r.name,
      n: r.n,
      ...(r.k !== undefined ? { k: r.k } : {}),
      ...(r.parts ? { parts: r.parts } : {}),
      series: result.series,
      atOne: result.series.sumCoefficients(),
      provenance: makeProvenance({ request: key, method: 'product and recurrence formulas of the q-analogs, exact integers', seconds: 0 }),
    };
  },
};
