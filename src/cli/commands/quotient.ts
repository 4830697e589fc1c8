/** `gradus quotient`: Hilbert and Frobenius series of Q[vars]/I for built-in or typed ideals. */
import { InputError } from '../../core/errors.js';
import { computeQuotient } from '../../modules/compute-quotient.js';
import { resultToJson, resultToText } from '../../modules/format-result.js';
import { checkIdealName, IDEAL_NAMES } from '../../modules/ideals.js';
import { flagOpt, intOpt, listOpt, strOpt, type CommandSpec } from '../command.js';
import { toJsonText } from '../../core/json-text.js';

export const quotientCommand: CommandSpec = {
  name: 'quotient',
  summary: 'quotient rings Q[x,(y),(θ)]/I degree by degree: multigraded Hilbert and Frobenius series',
  usage: 'quotient --ideal NAME --n N [--k K] [--vars x[,y][,theta]] [--gens "p; q; …"] [--frobenius] [--prime P] [--json]',
  options: [
    { name: 'ideal', type: 'string', description: `ideal: ${IDEAL_NAMES.join(', ')}`, placeholder: 'NAME' },
    { name: 'n', type: 'int', description: 'number of variables of each kind', placeholder: 'N', min: 1, max: 8 },
    { name: 'k', type: 'int', description: 'k of the generalized coinvariant ideal (1..n)', placeholder: 'K', min: 1, max: 8 },
    { name: 'vars', type: 'list', description: 'variable sets: x, and optionally y and theta (default x)', placeholder: 'x,y,theta' },
    { name: 'gens', type: 'string', description: 'generators of the ideal `generators`, separated by ";"', placeholder: 'TEXT' },
    { name: 'frobenius', type: 'flag', description: 'also the Schur expansion of every cell' },
    { name: 'prime', type: 'int', description: 'first prime (below 2^26); a second prime always confirms', placeholder: 'P', min: 2, max: 2 ** 26 - 1 },
  ],
  producesData: true,
  details: [
    'ideals:',
    '  coinvariant               positive-degree S_n-invariants in the chosen variables',
    '  generalized-coinvariant   ⟨x_1^k, …, x_n^k, e_n, e_{n−1}, …, e_{n−k+1}⟩ (x only; dimension k!·S(n,k))',
    '  generators                the ideal of --gens "p; q; …" (typed superpolynomials)',
    'example: gradus quotient --ideal coinvariant --n 3 --vars x,theta --frobenius',
  ].join('\n'),
  run(args, io) {
    const name = strOpt(args, 'ideal');
    if (!name) throw new InputError(`quotient needs --ideal NAME (${IDEAL_NAMES.join(', ')})`, 'ideal');
    const ideal = checkIdealName(name);
    const n = intOpt(args, 'n');
    if (n === undefined) throw new InputError('quotient needs --n N (1..8)', 'n');
    const vars = listOpt(args, 'vars') ?? ['x'];
    for (const v of vars) if (!['x', 'y', 'theta'].includes(v)) throw new InputError(`--vars takes x, y, theta (got "${v}")`, 'vars');
    if (!vars.includes('x')) throw new InputError('--vars must include x', 'vars');
    const k = intOpt(args, 'k');
    const gens = strOpt(args, 'gens')?.split(';').map((s) => s.trim()).filter(Boolean);
    const prime = intOpt(args, 'prime');
    io.progress.start('quotient');
    const result = computeQuotient(
      { ideal, n, y: vars.includes('y'), theta: vars.includes('theta'), ...(k !== undefined ? { k } : {}), ...(gens ? { generators: gens } : {}) },
      { frobenius: flagOpt(args, 'frobenius'), ...(prime !== undefined ? { prime } : {}), onProgress: (done) => io.progress.update(done) },
    );
    io.progress.finish();
    io.out(flagOpt(args, 'json') ? toJsonText(resultToJson(result)) : resultToText(result));
  },
};
