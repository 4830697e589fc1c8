/** The one-line formula of a matched candidate, written in terms of the original target. */
import type { Combine } from '../store/catalogue.js';

function statText(id: string): string {
  const i = id.indexOf(':');
  return i < 0 ? `${id}(x)` : `${id.slice(i + 1)}(${id.slice(0, i)}(x))`;
}

export function candidateFormula(family: string, params: string, statistics: readonly string[], combine: Combine, variant: string): string {
  const [a, b] = statistics.map(statText);
  const swap = variant.includes('q-t-swapped');
  const [qv, tv] = swap ? ['t', 'q'] : ['q', 't'];
  const sliced = combine.endsWith('-t0');
  const form = sliced ? combine.slice(0, -3) : combine;
  let weight: string;
  switch (combine) {
    case 'sum':
      weight = `${qv}^{${a} + ${b}}`;
      break;
    case 'joint':
      weight = `${qv}^{${a}} ${tv}^{${b}}`;
      break;
    default:
      weight = b === undefined || sliced ? `${qv}^{${a}}` : `${qv}^{${a}} ${tv}^{${b}}`;
  }
  const sym = form === 'shape' ? ' s_{shape(x)}' : form === 'fundamental' ? ' F_{Des(word(x))}' : form === 'ifundamental' ? ' F_{iDes(word(x))}' : '';
  const where = sliced ? `, ${b} = 0` : '';
  let body = form === 'content'
    ? `Σ_{μ ⊢ n} m_μ Σ_{x ∈ ${family}(μ${params.includes('k') ? ', k' : ''})${where}} ${weight}`
    : `Σ_{x ∈ ${family}(${params})${where}} ${weight}${sym}`;
  if (variant.includes('q-reversed')) body = `rev_q(${body})`;
  if (variant.startsWith('omega')) body = `ω(${body})`;
  return body;
}
