/** `gradus module`: closure of a seed under derivatives and polarizations (the request kind of src/requests). */
import { resultToText } from '../../modules/format-result.js';
import { moduleKind } from '../../requests/module-request.js';
import { dataCommand } from '../data-command.js';

export const moduleCommand = dataCommand(moduleKind, {
  summary: 'closure of a seed under derivatives and polarizations: multigraded Hilbert and Frobenius series',
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
  print: (_r, result, io) => io.out(resultToText(result)),
});
