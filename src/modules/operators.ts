/**
 * Operator families of closures: `x`, `y`, `theta` (all ∂/∂x_i, ∂/∂y_i, ∂/∂θ_i) and
 * `polarJ` = Σ_i y_i (∂/∂x_i)^J. Each family is permuted by S_n.
 */
import { InputError } from '../core/errors.js';
import { unknownNameMessage } from '../core/suggest.js';

export type OperatorFamily = { readonly kind: 'x' | 'y' | 'theta' } | { readonly kind: 'polar'; readonly order: number };

export function familyName(f: OperatorFamily): string {
  return f.kind === 'polar' ? `polar${f.order}` : f.kind;
}

/** Parse "x,theta,polar1" (or a list of names); duplicates are dropped. */
export function parseOperatorFamilies(names: readonly string[]): OperatorFamily[] {
  const out: OperatorFamily[] = [];
  const seen = new Set<string>();
  for (const raw of names.flatMap((s) => s.split(','))) {
    const name = raw.trim();
    if (name === '' || seen.has(name)) continue;
    seen.add(name);
    if (name === 'x' || name === 'y' || name === 'theta') out.push({ kind: name });
    else {
      const m = /^polar(\d+)$/.exec(name);
      if (!m || Number(m[1]) < 1 || Number(m[1]) > 30) {
        throw new InputError(`--ops: ${unknownNameMessage('operator family', name, ['x', 'y', 'theta', 'polar1', 'polar2', 'polar3'])} (polarJ for J from 1 to 30)`, 'ops');
      }
      out.push({ kind: 'polar', order: Number(m[1]) });
    }
  }
  if (out.length === 0) throw new InputError('--ops needs at least one operator family (x, y, theta, polar1, polar2, …)', 'ops');
  return out;
}

/** Which derivative families are among the operators. */
export function derivativeFamilies(ops: readonly OperatorFamily[]): { x: boolean; y: boolean; theta: boolean } {
  return { x: ops.some((o) => o.kind === 'x'), y: ops.some((o) => o.kind === 'y'), theta: ops.some((o) => o.kind === 'theta') };
}

export function isDerivativeOnly(ops: readonly OperatorFamily[]): boolean {
  return ops.every((o) => o.kind !== 'polar');
}
