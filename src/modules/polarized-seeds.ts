/**
 * Polarized closures as sums of derivative closures: P_j = Σ_i y_i ∂x_i^j commutes with every
 * ∂x_i, with ∂θ_i and with the other P's, and ∂y_i P_j = P_j ∂y_i + ∂x_i^j, so every word in
 * ∂x, ∂y, ∂θ and the P's normal-orders into Σ ∂x^α ∂y^β ∂θ_T P_J. Hence, when ∂x is among
 * the operators (or ∂y is not), the closure of f is the sum over multisets J of the derivative
 * closures of the seeds P_J f, each (anti)symmetric like f since P_J is S_n-invariant.
 *
 * The seeds are made in flat typed arrays (keys, and residues for one or two primes at once,
 * so one enumeration of the derivative matrices can serve both primes).
 */
import { EchelonModP } from './echelon-mod-p.js';
import { KeyTable } from './key-table.js';
import type { OperatorFamily } from './operators.js';
import type { SuperAlgebra, SuperPoly } from './super-algebra.js';
import type { SeedSupport } from './seed-support.js';
import { popcount, type SuperSpace } from './superspace.js';

/** True when the normal-ordering argument applies to this operator set. */
export function polarizationReducible(ops: readonly OperatorFamily[]): boolean {
  const hasX = ops.some((o) => o.kind === 'x');
  const hasY = ops.some((o) => o.kind === 'y');
  return ops.some((o) => o.kind === 'polar') && (hasX || !hasY);
}

/** A polynomial as parallel arrays: keys, and coefficients mod each prime. */
interface FlatPoly {
  readonly keys: Float64Array;
  readonly coeffs: readonly Float64Array[];
}

/**
 * The seeds P_J f (J a multiset of the given orders, f itself for J empty) that are
 * independent, mod some prime, of those before them in their multidegree (a seed in the span
 * of others mod p adds nothing mod p to the sum of derivative closures). `fs` holds f mod each
 * prime (one or two). Each P_J f is made from its parent and dropped once its subtree is done,
 * so one chain of polynomials is held at a time. With two primes every seed carries coeffs2.
 */
export function polarizedSeeds(space: SuperSpace, fs: readonly SuperPoly<number>[], orders: readonly number[], primes: readonly number[]): SeedSupport[] {
  const sorted = [...new Set(orders)].sort((a, b) => a - b);
  const groups = new Map<string, { echs: EchelonModP[]; index: KeyTable; size: number }>();
  const kept: SeedSupport[] = [];
  const independent = (g: FlatPoly): boolean => {
    const key = space.degrees(g.keys[0]!).join(',');
    let grp = groups.get(key);
    if (!grp) {
      grp = { echs: primes.map((p) => new EchelonModP(p)), index: new KeyTable(Infinity), size: 0 };
      groups.set(key, grp);
    }
    const cols = new Int32Array(g.keys.length);
    for (let t = 0; t < g.keys.length; t++) {
      let c = grp.index.get(g.keys[t]!);
      if (c < 0) grp.index.set(g.keys[t]!, (c = grp.size++));
      cols[t] = c;
    }
    // every prime's echelon is kept up to date; the seed stays when any prime needs it
    let any = false;
    grp.echs.forEach((e, pi) => (any = e.insert(cols, g.coeffs[pi]!, cols.length) || any));
    return any;
  };
  const walk = (g: FlatPoly, from: number): void => {
    if (independent(g)) kept.push(toSupport(space, g, primes));
    for (let i = from; i < sorted.length; i++) {
      const h = polarize(space, g, sorted[i]!, primes);
      if (h.keys.length > 0) walk(h, i);
    }
  };
  walk(flatten(fs, primes), 0);
  return kept;
}

/** One prime (the algebra's polynomials mod p). */
export function independentPolarizedSeeds(alg: SuperAlgebra<number>, f: SuperPoly<number>, orders: readonly number[], p: number): SeedSupport[] {
  return polarizedSeeds(alg.space, [f], orders, [p]);
}

function flatten(fs: readonly SuperPoly<number>[], primes: readonly number[]): FlatPoly {
  const index = new Map<number, number>();
  for (const f of fs) for (const k of f.keys()) if (!index.has(k)) index.set(k, index.size);
  const keys = Float64Array.from(index.keys());
  const coeffs = primes.map((_, pi) => {
    const c = new Float64Array(keys.length);
    for (const [k, v] of fs[pi]!) c[index.get(k)!] = v;
    return c;
  });
  return { keys, coeffs };
}

/** Σ_i y_i (∂/∂x_i)^j g, terms added up through a hash table, zero terms dropped. */
function polarize(space: SuperSpace, g: FlatPoly, j: number, primes: readonly number[]): FlatPoly {
  const n = space.n;
  const R = space.radix;
  const mb = space.maskBase;
  const table = new KeyTable(Infinity);
  const cap = g.keys.length * n;
  const keys = new Float64Array(cap);
  const acc = primes.map(() => new Float64Array(cap));
  const [p0, p1] = [primes[0]!, primes[1] ?? 0];
  const [c0, c1] = [g.coeffs[0]!, g.coeffs[1]];
  const [a0, a1] = [acc[0]!, acc[1]];
  let size = 0;
  const x = new Int32Array(n);
  const y = new Int32Array(n);
  for (let t = 0; t < g.keys.length; t++) {
    const key = g.keys[t]!;
    space.decode(key, x, y);
    for (let i = 0; i < n; i++) {
      const e = x[i]!;
      if (e < j) continue;
      if (y[i]! + 1 >= R) throw new RangeError('exponent beyond the space radix');
      let ff = 1;
      for (let a = 0; a < j; a++) ff *= e - a;
      const k2 = key + (space.powers[n + i]! - j * space.powers[i]!) * mb;
      let at = table.get(k2);
      if (at < 0) {
        table.set(k2, (at = size++));
        keys[at] = k2;
      }
      a0[at] = (a0[at]! + ((ff % p0) * c0[t]!) % p0) % p0;
      if (a1) a1[at] = (a1[at]! + ((ff % p1) * c1![t]!) % p1) % p1;
    }
  }
  let live = 0;
  for (let t = 0; t < size; t++) {
    if (a0[t] === 0 && (!a1 || a1[t] === 0)) continue;
    keys[live] = keys[t]!;
    a0[live] = a0[t]!;
    if (a1) a1[live] = a1[t]!;
    live++;
  }
  return { keys: keys.slice(0, live), coeffs: acc.map((a) => a.slice(0, live)) };
}

function toSupport(space: SuperSpace, g: FlatPoly, primes: readonly number[]): SeedSupport {
  // in key order; zero residues mod the first prime stay (the second prime may need them)
  const at = new KeyTable(Infinity);
  g.keys.forEach((k, t) => at.set(k, t));
  const keys = g.keys.slice().sort();
  const n = space.n;
  const count = keys.length;
  const xs = new Int32Array(count * n);
  const ys = new Int32Array(count * n);
  const masks = new Int32Array(count);
  const coeffs = primes.map(() => new Float64Array(count));
  const x = new Int32Array(n);
  const y = new Int32Array(n);
  for (let o = 0; o < count; o++) {
    const t = at.get(keys[o]!);
    coeffs.forEach((c, pi) => (c[o] = g.coeffs[pi]![t]!));
    masks[o] = space.decode(keys[o]!, x, y);
    xs.set(x, o * n);
    ys.set(y, o * n);
  }
  const degree: [number, number, number] = [sumRange(xs, 0, n), space.hasY ? sumRange(ys, 0, n) : 0, popcount(masks[0] ?? 0)];
  return { space, p: primes[0]!, count, keys, coeffs: coeffs[0]!, ...(primes.length > 1 ? { coeffs2: coeffs[1]! } : {}), xs, ys, masks, degree };
}

function sumRange(a: Int32Array, s: number, len: number): number {
  let v = 0;
  for (let i = s; i < s + len; i++) v += a[i]!;
  return v;
}

