/** `gradus sym "<expression>"`: evaluate a symmetric-function expression exactly. */
import { InputError } from '../../core/errors.js';
import { DEFAULT_MAX_DEGREE, evaluateExpression } from '../../symfun/expression.js';
import { EXPRESSION_FUNCTIONS } from '../../symfun/expression-eval.js';
import { EXPRESSION_GRAMMAR } from '../../symfun/expression-parser.js';
import { MACDONALD_MAX_N } from '../../symfun/macdonald.js';
import { formatLatex, formatText, integralCoefficients } from '../../symfun/sym-format.js';
import { BASES, type Basis } from '../../symfun/transitions.js';
import { flagOpt, intOpt, strOpt, type CommandSpec } from '../command.js';
import { qtTableJson, toJsonText } from '../../core/json-text.js';

const BASIS_WORDS: Record<Basis, string> = { s: 'Schur', m: 'monomial', e: 'elementary', h: 'complete homogeneous', p: 'power sum' };

export const symCommand: CommandSpec = {
  name: 'sym',
  summary: 'evaluate symmetric functions over Q[q,t]: bases, H̃_μ, ∇, Δ_f, Δ′_f, ω, specialisations',
  usage: 'sym "<expression>" [--basis s|m|e|h|p] [--latex] [--max-degree N] [--json]',
  positionals: [{ name: 'expression', description: 'an expression such as "deltaprime(e(1), e(4))" (quote it for the shell)' }],
  options: [
    { name: 'basis', type: 'string', description: 'basis of the output: s (default), m, e, h or p', placeholder: 'B' },
    { name: 'latex', type: 'flag', description: 'print LaTeX instead of plain text' },
    {
      name: 'max-degree',
      type: 'int',
      description: `largest degree for nabla, delta, deltaprime (default ${DEFAULT_MAX_DEGREE}, about 2 s a call there; cost grows faster than n!)`,
      placeholder: 'N',
      min: 0,
      max: MACDONALD_MAX_N,
    },
  ],
  producesData: true,
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
  run(args, io) {
    const text = args.positionals[0]!;
    const basisText = strOpt(args, 'basis') ?? 's';
    if (!(BASES as readonly string[]).includes(basisText)) {
      throw new InputError(`--basis must be one of ${BASES.join(', ')} (got "${basisText}")`, 'basis');
    }
    const basis = basisText as Basis;
    let current = '';
    const result = evaluateExpression(text, {
      maxDegree: intOpt(args, 'max-degree') ?? DEFAULT_MAX_DEGREE,
      onProgress: (label, done, total) => {
        if (label !== current || done === 1) {
          io.progress.start(`sym: ${label}`, total);
          current = label;
        }
        io.progress.update(done);
        if (done === total) io.progress.finish();
      },
    });
    if (flagOpt(args, 'json')) {
      const { denominator, terms } = integralCoefficients(result.value, basis);
      io.out(
        toJsonText({
          expression: text,
          degree: result.degree,
          basis,
          ...(denominator === 1n ? {} : { denominator }),
          terms: Object.fromEntries(terms.map(([k, c]) => [k, qtTableJson(c.num)])),
          provenance: result.provenance,
        }),
      );
      return;
    }
    if (flagOpt(args, 'latex')) {
      io.out(formatLatex(result.value, basis));
      return;
    }
    const deg = typeof result.degree === 'number' ? `degree ${result.degree}` : `degrees ${result.degree.join(', ')}`;
    io.out(`${text}   [${deg}, ${BASIS_WORDS[basis]} basis]`);
    io.out(formatText(result.value, basis));
  },
};
