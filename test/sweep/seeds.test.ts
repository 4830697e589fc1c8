/**
 * Seeds of a sweep: the census of monomial seeds by column multisets against brute force
 * through the module engine's own (anti)symmetrizer over Q, the merging of equal seeds in a
 * plan, canonical keys, and refusals of malformed sweeps.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError, LimitError } from '../../src/core/errors.js';
import type { Fraction } from '../../src/core/rational.js';
import { rationalCoeffs } from '../../src/modules/coefficients.js';
import { buildSeedPolynomial } from '../../src/modules/seed-polynomial.js';
import { seedTerms } from '../../src/modules/seeds.js';
import { parseArgs } from '../../src/requests/options.js';
import { monomialCensus } from '../../src/sweep/monomialSeeds.js';
import { planSweep } from '../../src/sweep/plan.js';
import { SWEEP_OPTIONS, sweepFromArgs, sweepKey } from '../../src/sweep/sweepSpec.js';

/** Every exponent vector of length n and total degree in [lo, hi]. */
function vectors(n: number, lo: number, hi: number): number[][] {
  const out: number[][] = [];
  const rec = (prefix: number[], left: number): void => {
    if (prefix.length === n) {
      const d = prefix.reduce((a, b) => a + b, 0);
      if (d >= lo) out.push(prefix);
      return;
    }
    for (let e = 0; e <= left; e++) rec([...prefix, e], left - e);
  };
  rec([], hi);
  return out;
}

function subsets(n: number, size: number): number[][] {
  const out: number[][] = [];
  const rec = (start: number, cur: number[]): void => {
    if (cur.length === size) return void out.push(cur);
    for (let i = start; i <= n; i++) rec(i + 1, [...cur, i]);
  };
  rec(1, []);
  return out;
}

/** The (anti)symmetrized seed over Q up to a scalar, as text; undefined when it vanishes. */
function seedUpToScalar(n: number, x: number[], theta: number[], symmetrize: boolean): string | undefined {
  let built;
  try {
    built = buildSeedPolynomial(n, seedTerms({ seed: 'monomial', n, xExponents: x, theta, ...(symmetrize ? { symmetrizer: 'symmetrize' } : {}) }), rationalCoeffs, { y: false, polar: false });
  } catch (e) {
    if (e instanceof InputError) return undefined;
    throw e;
  }
  const xs = new Array<number>(n).fill(0);
  const terms: [string, Fraction][] = [...built.f].map(([key, c]) => {
    const mask = built.alg.space.decode(key, xs);
    return [`${xs.join(',')}/${mask}`, c];
  });
  terms.sort((a, b) => (a[0] < b[0] ? -1 : 1));
  const lead = terms[0]![1];
  return terms.map(([m, c]) => `${c.div(lead).toFraction()}*${m}`).join(' ');
}

describe('monomial census', () => {
  it('counts raw, vanishing and distinct seeds as brute force over the module engine does (common practice: ε kills equal bosonic columns, sym equal fermionic ones)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 4 }), fc.integer({ min: 0, max: 4 }), fc.integer({ min: 0, max: 2 }), fc.subarray([0, 1, 2], { minLength: 1 }), fc.boolean(), (n, hi, loShift, thetas, symmetrize) => {
        const lo = Math.max(0, hi - loShift - 1);
        const census = monomialCensus(n, lo, hi, thetas, symmetrize, 10_000);
        let raw = 0;
        let vanishing = 0;
        const distinct = new Set<string>();
        for (const t of thetas) {
          if (t > n) continue;
          for (const x of vectors(n, lo, hi)) {
            for (const theta of subsets(n, t)) {
              raw++;
              const s = seedUpToScalar(n, x, theta, symmetrize);
              if (s === undefined) vanishing++;
              else distinct.add(s);
            }
          }
        }
        expect(census.raw).toBe(BigInt(raw));
        expect(census.vanishing).toBe(BigInt(vanishing));
        expect(census.classes.length).toBe(distinct.size);
        expect(census.classes.reduce((s, c) => s + c.arrangements, 0n)).toBe(BigInt(raw - vanishing));
      }),
      { numRuns: 12 },
    );
  });

  it('refuses past the limit of modules, naming --max-modules', () => {
    expect(() => monomialCensus(5, 0, 12, [0, 1, 2], false, 50)).toThrow(LimitError);
  });
});

const sweepOf = (words: string[]) => sweepFromArgs(parseArgs({ name: 'sweep', usage: '', options: SWEEP_OPTIONS }, words));

describe('plans', () => {
  it('gives one key whatever the order and spelling of the options', () => {
    const a = sweepOf(['--ops', 'theta,x', '--n', '4,3', '--family', 'monomials', '--thetas', '1', '--max-degree', '4']);
    const b = sweepOf(['--family', 'monomials', '--max-degree', '4', '--thetas', '1..1', '--n', '3..4', '--ops', 'x,theta', '--ops', 'x,theta']);
    expect(sweepKey(a.spec)).toBe(sweepKey(b.spec));
    expect(sweepKey(a.spec)).toBe('sweep run --family monomials --max-degree 4 --thetas 1 --n 3,4 --ops x,theta');
  });

  it('merges equal seeds: at k = n every height gives the Vandermonde, one module per n', () => {
    const { spec, limits } = sweepOf(['--family', 'heights', '--height', '0..2,k-1', '--n', '1..4', '--ops', 'x']);
    const plan = planSweep(spec, limits);
    const kn = plan.lines.map((l) => l.places.filter((p) => p.k === p.n).map((p) => p.key));
    // every line reaches the same module at (n, n)
    for (const keys of kn) expect(keys).toEqual(kn[0]);
    // 4 lines × 10 places. Equal seeds: at k = n all four lines (3 repeats for each n = 1..4),
    // and a fixed height h equal to k − 1 at k = h + 1 < n (h = 0: n = 2..4; h = 1: n = 3, 4; h = 2: n = 4)
    expect(Number(plan.counts.raw)).toBe(40);
    expect(Number(plan.counts.duplicates)).toBe(12 + 6);
    expect(plan.counts.modules).toBe(40 - 18);
  });

  it('substitutes poly parameters, leaves out negative exponents and counts a vanishing seed', () => {
    const { spec, limits } = sweepOf(['--family', 'poly', '--poly', 'x1^{a}*x2^{a-1}*th1', '--param', 'a=0..2', '--antisymmetrize', '--n', '2', '--ops', 'x,theta']);
    const plan = planSweep(spec, limits);
    expect(plan.lines.map((l) => l.seed)).toEqual(['ε(x1^{a}*x2^{a-1}*th1) at a=0', 'ε(x1^{a}*x2^{a-1}*th1) at a=1', 'ε(x1^{a}*x2^{a-1}*th1) at a=2']);
    expect(plan.lines[0]!.left[0]!.why).toMatch(/negative/);
    expect(plan.lines[1]!.places[0]!.key).toBe('module --seed poly --n 2 --poly x1^1*x2^0*th1 --antisymmetrize --ops x,theta --frobenius');
    expect(plan.counts.modules).toBe(2);
  });

  it('refuses malformed sweeps with the option named', () => {
    const cases: [string[], string][] = [
      [['--n', '3', '--ops', 'x'], 'family'],
      [['--family', 'monomials', '--n', '3', '--ops', 'x'], 'max-degree'],
      [['--family', 'monomials', '--max-degree', '3', '--height', '1', '--n', '3', '--ops', 'x'], 'height'],
      [['--family', 'heights', '--n', '0..3', '--ops', 'x'], 'n'],
      [['--family', 'heights', '--n', '3', '--ops', 'z'], 'ops'],
      [['--family', 'poly', '--poly', 'x1^{b}', '--n', '3', '--ops', 'x'], 'param'],
      [['--family', 'poly', '--poly', 'x1^{b*2}', '--param', 'b=1', '--n', '3', '--ops', 'x'], 'poly'],
      [['--family', 'monomials', '--max-degree', '3', '--k', '2', '--n', '3', '--ops', 'x'], 'k'],
    ];
    for (const [words, option] of cases) {
      let caught: unknown;
      try {
        sweepOf(words);
      } catch (e) {
        caught = e;
      }
      expect(caught, words.join(' ')).toBeInstanceOf(InputError);
      expect((caught as InputError).argument, words.join(' ')).toBe(option);
    }
  });
});
