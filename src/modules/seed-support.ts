/**
 * The support of a homogeneous seed over F_p in flat typed arrays: the derivative route reads
 * matrix entries from these coefficients and never stores a derivative.
 */
import { InputError } from '../core/errors.js';
import type { SuperPoly } from './super-algebra.js';
import { popcount, sum, type SuperSpace } from './superspace.js';

export interface SeedSupport {
  readonly space: SuperSpace;
  readonly p: number;
  readonly count: number;
  readonly keys: Float64Array;
  readonly coeffs: Float64Array;
  /** The coefficients mod a second prime, for builders that make both primes' entries at once. */
  readonly coeffs2?: Float64Array;
  /** x exponents, term-major: xs[t * n + i]. */
  readonly xs: Int32Array;
  readonly ys: Int32Array;
  readonly masks: Int32Array;
  /** (x-degree, y-degree, θ-degree) of every term. */
  readonly degree: readonly [number, number, number];
}

export function seedSupport(space: SuperSpace, p: number, f: SuperPoly<number>): SeedSupport {
  const n = space.n;
  const count = f.size;
  const keys = new Float64Array(count);
  const coeffs = new Float64Array(count);
  const xs = new Int32Array(count * n);
  const ys = new Int32Array(count * n);
  const masks = new Int32Array(count);
  const x = new Int32Array(n);
  const y = new Int32Array(n);
  let degree: [number, number, number] | undefined;
  let t = 0;
  for (const [k, c] of [...f].sort((a, b) => a[0] - b[0])) {
    const mask = space.decode(k, x, y);
    const d: [number, number, number] = [sum(x), space.hasY ? sum(y) : 0, popcount(mask)];
    if (!degree) degree = d;
    else if (d[0] !== degree[0] || d[1] !== degree[1] || d[2] !== degree[2]) {
      throw new InputError(`the seed must be homogeneous in x-, y- and θ-degree (found degrees ${degree.join('/')} and ${d.join('/')})`, 'poly');
    }
    keys[t] = k;
    coeffs[t] = c;
    masks[t] = mask;
    xs.set(x, t * n);
    ys.set(y, t * n);
    t++;
  }
  return { space, p, count, keys, coeffs, xs, ys, masks, degree: degree ?? [0, 0, 0] };
}
