/** `gradus quotient`: Hilbert and Frobenius series of Q[vars]/I (the request kind of src/requests). */
import { resultToText } from '../../modules/format-result.js';
import { quotientKind } from '../../requests/quotient-request.js';
import { dataCommand } from '../data-command.js';

export const quotientCommand = dataCommand(quotientKind, {
  summary: 'quotient rings Q[x,(y),(θ)]/I degree by degree: multigraded Hilbert and Frobenius series',
  details: [
    'ideals:',
    '  coinvariant               positive-degree S_n-invariants in the chosen variables',
    '  generalized-coinvariant   ⟨x_1^k, …, x_n^k, e_n, e_{n−1}, …, e_{n−k+1}⟩ (x only; dimension k!·S(n,k))',
    '  generators                the ideal of --gens "p; q; …" (typed superpolynomials)',
    'example: gradus quotient --ideal coinvariant --n 3 --vars x,theta --frobenius',
  ].join('\n'),
  print: (_r, result, io) => io.out(resultToText(result)),
});
