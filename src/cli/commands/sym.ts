/** `gradus sym "<expression>"`: evaluate a symmetric-function expression exactly (the request kind of src/requests). */
import { EXPRESSION_FUNCTIONS } from '../../symfun/expression-eval.js';
import { EXPRESSION_GRAMMAR } from '../../symfun/expression-parser.js';
import { formatLatex, formatText } from '../../symfun/sym-format.js';
import type { Basis } from '../../symfun/transitions.js';
import { symKind } from '../../requests/sym-request.js';
import { dataCommand } from '../data-command.js';

const BASIS_WORDS: Record<Basis, string> = { s: 'Schur', m: 'monomial', e: 'elementary', h: 'complete homogeneous', p: 'power sum' };

export const symCommand = dataCommand(symKind, {
  summary: 'evaluate symmetric functions over Q[q,t]: bases, H̃_μ, ∇, Δ_f, Δ′_f, ω, specialisations',
  details: [
    'grammar:',
    ...EXPRESSION_GRAMMAR.split('\n').map((l) => `  ${l}`),
    'functions:',
    ...EXPRESSION_FUNCTIONS.map((f) => `  ${f.signature.padEnd(18)}${f.description}`),
    'Coefficients are polynomials in q and t, written with * and ^: (q+t)*s(2,1), q^2*t*e(3).',
    'Products of symmetric functions of different degrees are allowed; the result may mix degrees.',
    'Output is in the chosen basis, one degree after another; the text form reads back as input.',
    'JSON: {"expression","degree","basis","terms":{"3,1,1": [[…]]},…}: each coefficient is a q,t table',
    '([i][j] = coefficient of q^i t^j); when some coefficient is not integral, "denominator" d is given',
    'and the tables hold d times the coefficients.',
    'examples:',
    '  gradus sym "nabla(e(3))"',
    '  gradus sym "deltaprime(e(1), e(4))" --basis m',
    '  gradus sym "subs(H(2,1), t=0)" --latex',
    '  gradus sym "(q+t)*s(2,1) - omega(h(3))" --json',
  ].join('\n'),
  print(r, result, io) {
    if (r.latex) return io.out(formatLatex(result.value, r.basis));
    const deg = typeof result.degree === 'number' ? `degree ${result.degree}` : `degrees ${result.degree.join(', ')}`;
    io.out(`${r.expression}   [${deg}, ${BASIS_WORDS[r.basis]} basis]`);
    io.out(formatText(result.value, r.basis));
  },
});
