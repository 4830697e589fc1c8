/**
 * Entry point of the expression language: text → symmetric function, with the degree and
 * the provenance of the result. Used by `gradus sym`, the terminal app and the search.
 */
import { makeProvenance, type Provenance } from '../core/provenance.js';
import { evaluateNode, type EvalOptions } from './expression-eval.js';
import { parseExpression } from './expression-parser.js';
import type { SymFun } from './symfun.js';

export const DEFAULT_MAX_DEGREE = 8;

export interface SymResult {
  readonly expression: string;
  readonly value: SymFun;
  /** The degree of a homogeneous result, or the list of degrees present. */
  readonly degree: number | readonly number[];
  readonly provenance: Provenance;
}

export function evaluateExpression(text: string, options: Partial<EvalOptions> = {}): SymResult {
  const t0 = Date.now();
  const node = parseExpression(text);
  const value = evaluateNode(node, { ...options, maxDegree: options.maxDegree ?? DEFAULT_MAX_DEGREE });
  const d = value.degrees();
  return {
    expression: text,
    value,
    degree: d.length <= 1 ? (d[0] ?? 0) : d,
    provenance: makeProvenance({
      request: text,
      method:
        'exact over Q[q,t]; H̃_μ by the Haglund–Haiman–Loehr filling formula; ∇, Δ, Δ′ by expansion in the H̃ basis ' +
        '(*-scalar product) summed over a common denominator and divided exactly',
      seconds: (Date.now() - t0) / 1000,
    }),
  };
}
