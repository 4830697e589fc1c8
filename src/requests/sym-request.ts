/** `sym`: a symmetric-function expression evaluated exactly over Q[q,t]. */
import { InputError } from '../core/errors.js';
import { qtTableJson } from '../core/json-text.js';
import { DEFAULT_MAX_DEGREE, evaluateExpression, type SymResult } from '../symfun/expression.js';
import { MACDONALD_MAX_N } from '../symfun/macdonald.js';
import { integralCoefficients } from '../symfun/sym-format.js';
import { BASES, type Basis } from '../symfun/transitions.js';
import { flagOpt, intOpt, strOpt, type OptionSpec } from './options.js';
import type { RequestKind } from './request-kind.js';

export interface SymRequest {
  readonly kind: 'sym';
  readonly expression: string;
  readonly basis: Basis;
  readonly latex: boolean;
  readonly maxDegree: number;
}

export const SYM_OPTIONS: readonly OptionSpec[] = [
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
];

/** Longest expression read (a typed formula is far shorter; a file pasted by mistake is refused at once). */
export const MAX_EXPRESSION_LENGTH = 10_000;

export const symKind: RequestKind<SymRequest, SymResult> = {
  name: 'sym',
  usage: 'sym "<expression>" [--basis s|m|e|h|p] [--latex] [--max-degree N] [--json]',
  positionals: [{ name: 'expression', description: 'an expression such as "deltaprime(e(1), e(4))" (quote it for the shell)' }],
  options: SYM_OPTIONS,
  fromArgs(args) {
    const expression = args.positionals[0]!.trim().replace(/\s+/g, ' ');
    if (expression === '') throw new InputError('sym needs an expression such as "nabla(e(3))"', 'expression');
    if (expression.length > MAX_EXPRESSION_LENGTH) throw new InputError(`the expression has ${expression.length} characters; at most ${MAX_EXPRESSION_LENGTH} are read`, 'expression');
    const basisText = strOpt(args, 'basis') ?? 's';
    if (!(BASES as readonly string[]).includes(basisText)) throw new InputError(`--basis must be one of ${BASES.join(', ')} (got "${basisText.slice(0, 20)}")`, 'basis');
    return { kind: 'sym', expression, basis: basisText as Basis, latex: flagOpt(args, 'latex'), maxDegree: intOpt(args, 'max-degree') ?? DEFAULT_MAX_DEGREE };
  },
  canonical(r) {
    return { positionals: [r.expression], options: { basis: r.basis === 's' ? undefined : r.basis } };
  },
  async compute(r, context) {
    return evaluateExpression(r.expression, {
      maxDegree: r.maxDegree,
      onProgress: (label, done, total) => context.progress?.(`sym: ${label}`, done, total),
    });
  },
  document(r, result, key) {
    const { denominator, terms } = integralCoefficients(result.value, r.basis);
    return {
      expression: r.expression,
      degree: result.degree,
      basis: r.basis,
      ...(denominator === 1n ? {} : { denominator }),
      terms: Object.fromEntries(terms.map(([k, c]) => [k, qtTableJson(c.num)])),
      provenance: { ...result.provenance, request: key },
    };
  },
};
