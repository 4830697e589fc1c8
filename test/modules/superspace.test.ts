/** Monomial encoding and the sign rules of superspace (θ's anticommute: common practice; Rhoades–Wilson, Vandermondes in superspace, Trans. Amer. Math. Soc. (2020)). */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { primeCoeffs } from '../../src/modules/coefficients.js';
import { SuperAlgebra } from '../../src/modules/super-algebra.js';
import { permuteMask, SuperSpace, thetaDerivativeSign, thetaProductSign } from '../../src/modules/superspace.js';

const perm = (n: number) => fc.shuffledSubarray([...Array(n).keys()], { minLength: n, maxLength: n });

describe('SuperSpace encoding', () => {
  it('encode/decode round-trips (property)', () => {
    const sp = new SuperSpace(4, true, true, 7);
    fc.assert(
      fc.property(fc.array(fc.nat(6), { minLength: 4, maxLength: 4 }), fc.array(fc.nat(6), { minLength: 4, maxLength: 4 }), fc.nat(15), (x, y, m) => {
        const k = sp.encode(x, y, m);
        const x2 = new Array<number>(4);
        const y2 = new Array<number>(4);
        expect(sp.decode(k, x2, y2)).toBe(m);
        expect(x2).toEqual(x);
        expect(y2).toEqual(y);
      }),
    );
  });
  it('refuses encodings beyond 2^53 with a LimitError', () => {
    expect(() => new SuperSpace(10, true, true, 40)).toThrow(/--?n|encoding/);
  });
});

/** Reference sign by brute force: sort the concatenated index list by adjacent swaps (common practice). */
function sortSign(list: number[]): number {
  const a = list.slice();
  let s = 1;
  for (let i = 0; i < a.length; i++) for (let j = 0; j + 1 < a.length - i; j++) if (a[j]! > a[j + 1]!) {
    [a[j], a[j + 1]] = [a[j + 1]!, a[j]!];
    s = -s;
  }
  return s;
}
const bits = (m: number): number[] => [...Array(8).keys()].filter((i) => (m >> i) & 1);

describe('θ sign rules', () => {
  it('θ_A θ_B re-sorted carries the sign of the sorting permutation, 0 on overlap (property)', () => {
    fc.assert(
      fc.property(fc.nat(255), fc.nat(255), (a, b) => {
        const expected = a & b ? 0 : sortSign([...bits(a), ...bits(b)]);
        expect(thetaProductSign(a, b)).toBe(expected);
      }),
    );
  });
  it('∂θ_T = ∂θ_t1 ∘ … ∘ ∂θ_tk agrees with applying single derivatives (the left θ-derivative sign rule, common practice)', () => {
    const sp = new SuperSpace(5, false, true, 2);
    const alg = new SuperAlgebra(sp, primeCoeffs(101));
    fc.assert(
      fc.property(fc.nat(31), fc.nat(31), (t, s) => {
        let f = new Map([[sp.encode([0, 0, 0, 0, 0], undefined, s), 1]]);
        for (const i of bits(t).reverse()) f = alg.thetaDerivative(f, i);
        const sign = thetaDerivativeSign(t, s);
        if (sign === 0) expect(f.size).toBe(0);
        else expect([...f]).toEqual([[sp.encode([0, 0, 0, 0, 0], undefined, s & ~t), sign > 0 ? 1 : 100]]);
      }),
    );
  });
  it('σ acts by an action: σ(τ m) = (στ) m with signs (property)', () => {
    const sp = new SuperSpace(5, true, true, 4);
    const alg = new SuperAlgebra(sp, primeCoeffs(101));
    fc.assert(
      fc.property(perm(5), perm(5), fc.array(fc.nat(3), { minLength: 5, maxLength: 5 }), fc.nat(31), (s, t, x, m) => {
        const key = sp.encode(x, x.slice().reverse(), m);
        const [k1, s1] = alg.actMonomial(t, key);
        const [k2, s2] = alg.actMonomial(s, k1);
        const st = t.map((v) => s[v]!);
        const [k3, s3] = alg.actMonomial(st, key);
        expect(k2).toBe(k3);
        expect(s1 * s2).toBe(s3);
      }),
    );
  });
  it('permuteMask: the sign of re-sorting θ_{σ(i1)}…θ_{σ(ir)}', () => {
    // σ = (0 1) on θ_0 θ_1 gives θ_1 θ_0 = −θ_0 θ_1 (θ's anticommute, by hand)
    expect(permuteMask([1, 0, 2], 0b011)).toEqual([0b011, -1]);
    expect(permuteMask([1, 0, 2], 0b101)).toEqual([0b110, 1]);
  });
});
