/** Text, LaTeX and JSON renderings of a symmetric function in a chosen basis. */
import { partitionKey, type Partition } from '../core/partitions.js';
import { PolyQ } from '../core/polyq.js';
import { lcm } from './lcm.js';
import type { SymFun } from './symfun.js';
import type { Basis } from './transitions.js';

function isSingleTerm(c: PolyQ): boolean {
  return c.num.termCount === 1;
}

/** Text that the expression language reads back, as `s(3) + (q + t)*s(2,1)`. */
export function formatText(f: SymFun, basis: Basis): string {
  const terms = f.toBasis(basis);
  if (terms.length === 0) return '0';
  let out = '';
  terms.forEach(([l, c], idx) => {
    const b = l.length === 0 ? '' : `${basis}(${l.join(',')})`;
    let neg = false;
    let coeff = c;
    if (isSingleTerm(c) && c.num.sortedTerms()[0]![2] < 0n) {
      neg = true;
      coeff = c.neg();
    }
    // a single term needs no parentheses: 3*q*s(2), q/2*s(2); a sum does: (q + t)/2*s(2)
    const single = isSingleTerm(coeff);
    const numText = single ? coeff.num.toString() : `(${coeff.num.toString()})`;
    const scalar = coeff.den === 1n ? numText : `${numText}/${coeff.den}`;
    let body: string;
    if (b === '') body = single || idx === 0 ? scalar : `(${scalar})`;
    else if (coeff.equals(PolyQ.one)) body = b;
    else body = `${scalar}*${b}`;
    if (idx === 0) out = (neg ? '-' : '') + body;
    else out += (neg ? ' - ' : ' + ') + body;
  });
  return out;
}

function latexIndex(l: Partition): string {
  return l.every((x) => x < 10) ? l.join('') : l.join(',');
}

export function formatLatex(f: SymFun, basis: Basis): string {
  const terms = f.toBasis(basis);
  if (terms.length === 0) return '0';
  let out = '';
  terms.forEach(([l, c], idx) => {
    const b = l.length === 0 ? '' : `${basis}_{${latexIndex(l)}}`;
    let neg = false;
    let coeff = c;
    if (isSingleTerm(c) && c.num.sortedTerms()[0]![2] < 0n) {
      neg = true;
      coeff = c.neg();
    }
    const num = coeff.num.toLatex();
    const scalar = coeff.den === 1n ? num : `\\frac{${num}}{${coeff.den}}`;
    let body: string;
    if (b === '') body = isSingleTerm(coeff) || idx === 0 ? scalar : `\\left(${scalar}\\right)`;
    else if (coeff.equals(PolyQ.one)) body = b;
    else if (isSingleTerm(coeff)) body = `${scalar}\\,${b}`;
    else body = coeff.den === 1n ? `\\left(${num}\\right)${b}` : `\\frac{${num}}{${coeff.den}}\\,${b}`;
    if (idx === 0) out = (neg ? '-' : '') + body;
    else out += (neg ? ' - ' : ' + ') + body;
  });
  return out;
}

/**
 * Coefficients for JSON: partition key → coefficient with every coefficient scaled by the
 * common denominator (1 when all coefficients are integral, the usual case).
 */
export function integralCoefficients(f: SymFun, basis: Basis): { denominator: bigint; terms: [string, PolyQ][] } {
  const terms = f.toBasis(basis);
  let den = 1n;
  for (const [, c] of terms) den = lcm(den, c.den);
  return { denominator: den, terms: terms.map(([l, c]) => [partitionKey(l), c.scale(den)]) };
}
