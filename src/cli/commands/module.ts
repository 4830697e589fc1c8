/** `gradus module`: closure of a seed under operator families, with Hilbert and Frobenius series. */
import { computeModuleAsync, DEFAULT_MAX_WORK } from '../../modules/compute-module.js';
import { resultToJson, resultToText } from '../../modules/format-result.js';
import { SEED_NAMES } from '../../modules/seeds.js';
import { MODULE_METHODS as METHODS, moduleRequestFromArgs } from '../module-request.js';
import { formatDuration } from '../../core/progress.js';
import { flagOpt, type CommandSpec } from '../command.js';
import { toJsonText } from '../../core/json-text.js';

export const moduleCommand: CommandSpec = {
  name: 'module',
  summary: 'closure of a seed under derivatives and polarizations: multigraded Hilbert and Frobenius series',
  usage:
    'module --seed NAME --n N [--k K] [--height S] [--x-exponents …] [--y-exponents …] [--theta …] [--poly "…"] [--symmetrize|--antisymmetrize] --ops x,theta,… [--frobenius] [--prime P] [--method M] [--max-work W] [--resume FILE] [--json]',
  options: [
    { name: 'seed', type: 'string', description: `seed: ${SEED_NAMES.join(', ')}`, placeholder: 'NAME' },
    { name: 'n', type: 'int', description: 'number of variables of each kind', placeholder: 'N', min: 1, max: 10 },
    { name: 'k', type: 'int', description: 'k of δ_{n,k} and of the θ-staircase (1..n)', placeholder: 'K', min: 1, max: 10 },
    { name: 'height', type: 'int', description: 'height s of the first n−k positions of δ_{n,k} (default k−1)', placeholder: 'S', min: 0, max: 30 },
    { name: 'x-exponents', type: 'list', description: 'x-exponents of a monomial seed', placeholder: 'A,B,…' },
    { name: 'y-exponents', type: 'list', description: 'y-exponents of a monomial seed', placeholder: 'A,B,…' },
    { name: 'theta', type: 'list', description: 'θ indices (1-based) of a monomial seed', placeholder: 'I,J,…' },
    { name: 'poly', type: 'string', description: 'a superpolynomial such as "x1^2*x2*th1 - 3*y2*th1*th3" (seed poly)', placeholder: 'TEXT' },
    { name: 'symmetrize', type: 'flag', description: 'symmetrize the monomial or polynomial seed (monomials are antisymmetrized by default)' },
    { name: 'antisymmetrize', type: 'flag', description: 'antisymmetrize a typed polynomial seed' },
    { name: 'ops', type: 'list', description: 'operator families: x, y, theta (all ∂/∂x_i, ∂/∂y_i, ∂/∂θ_i), polarJ = Σ y_i ∂x_i^J', placeholder: 'x,theta,…' },
    { name: 'frobenius', type: 'flag', description: 'also the Schur expansion of every cell' },
    { name: 'prime', type: 'int', description: 'first prime (below 2^26); a second prime always confirms', placeholder: 'P', min: 2, max: 2 ** 26 - 1 },
    { name: 'method', type: 'string', description: `route: ${METHODS.join(', ')} (auto: young for derivative operators, iterated otherwise; exact: over Q, small cases)`, placeholder: 'M' },
    { name: 'max-work', type: 'string', description: `refuse estimated work above W units (default ${DEFAULT_MAX_WORK.toExponential(0)})`, placeholder: 'W' },
    { name: 'resume', type: 'string', description: 'checkpoint file: finished work is appended to it, and a rerun of the same request reads it back instead of recomputing', placeholder: 'FILE' },
  ],
  producesData: true,
  details: [
    'seeds:',
    '  vandermonde              ε_n(x1^(n−1) x2^(n−2) … xn^0)',
    '  superspace-vandermonde   δ_{n,k} = ε_n(Π_{i≤n−k} x_i^s θ_i · Π_j x_{n−k+j}^{k−j}), s = --height (default k−1)',
    '  theta-staircase          ε_n(θ1…θ_{n−k} · Π_j x_{n−k+j}^{k−j})',
    '  monomial                 --x-exponents, --y-exponents, --theta; antisymmetrized (or --symmetrize)',
    '  poly                     --poly "<superpolynomial>" as typed (or --symmetrize / --antisymmetrize)',
    'example: gradus module --seed superspace-vandermonde --n 4 --k 2 --ops x,theta --frobenius',
    'long runs: add --resume run.ckpt; after an interruption the same command continues where it stopped',
  ].join('\n'),
  async run(args, io) {
    const request = moduleRequestFromArgs(args);
    const result = await computeModuleAsync(
      request.spec,
      {
        frobenius: flagOpt(args, 'frobenius'),
        method: request.method,
        ...(request.prime !== undefined ? { prime: request.prime } : {}),
        ...(request.maxWork !== undefined ? { maxWork: request.maxWork } : {}),
        ...(request.checkpoint !== undefined ? { checkpoint: request.checkpoint } : {}),
        onEstimate: (units, seconds) => io.err(`estimated work: ${units.toExponential(2)} units (about ${formatDuration(seconds)} of processor time, both primes)`),
        onProgress: (done, total, label) => {
          if (done <= 1) io.progress.start('module', total || undefined);
          io.progress.update(done);
          void label;
        },
      },
    );
    io.progress.finish();
    io.out(flagOpt(args, 'json') ? toJsonText(resultToJson(result)) : resultToText(result));
  },
};
