/**
 * Operators diagonal in the modified Macdonald basis: ∇ H̃_μ = T_μ H̃_μ,
 * Δ_f H̃_μ = f[B_μ] H̃_μ, Δ'_f H̃_μ = f[B_μ − 1] H̃_μ (as in Haglund–Remmel–Wilson, The Delta
 * Conjecture, Trans. Amer. Math. Soc. 370 (2018)).
 * A homogeneous F of degree n is expanded as F = Σ_μ ⟨F, H̃_μ⟩_* / w_μ · H̃_μ, by the
 * orthogonality ⟨H̃_λ, H̃_μ⟩_* = δ_{λμ} w_μ of the *-scalar product
 * ⟨p_λ, p_μ⟩_* = δ (−1)^{n−ℓ(μ)} z_μ Π_i (1 − q^{μ_i})(1 − t^{μ_i}) (verified in the tests by
 * summing back). The sum over μ is taken over one common denominator and divided exactly.
 */
import { partitionKey, partitionList, zee, type Partition } from '../core/partitions.js';
import { Poly } from '../core/poly.js';
import { PolyQ } from '../core/polyq.js';
import { lcm } from './lcm.js';
import { bigB, bigM, bigPi, bigT, wFactors } from './cell-data.js';
import { sumOverCommonDenominator, type StepReporter } from './common-denominator.js';
import { modifiedMacdonald, modifiedMacdonaldSchur } from './macdonald.js';
import { evaluateAtAlphabet } from './plethysm.js';
import { SymFun } from './symfun.js';

/** The *-scalar product of two symmetric functions (degree by degree). */
export function starScalar(f: SymFun, g: SymFun): PolyQ {
  const gp = new Map(g.toBasis('p').map(([r, c]) => [partitionKey(r), c]));
  let s = PolyQ.zero;
  for (const [rho, c] of f.toBasis('p')) {
    const d = gp.get(partitionKey(rho));
    if (!d) continue;
    const n = rho.reduce((a, b) => a + b, 0);
    let w = Poly.constant(((n - rho.length) % 2 === 0 ? 1n : -1n) * zee(rho));
    for (const k of rho) w = w.mul(Poly.one.sub(Poly.monomial(1n, k))).mul(Poly.one.sub(Poly.monomial(1n, 0, k)));
    s = s.add(c.mul(d).mul(PolyQ.of(w)));
  }
  return s;
}

/** ⟨F, H̃_μ⟩_* for every μ ⊢ n (F homogeneous of degree n): the H̃-coefficients times w_μ. */
export function macdonaldNumerators(f: SymFun, n: number): PolyQ[] {
  return partitionList(n).map((mu) => starScalar(f, modifiedMacdonald(mu)));
}

/** ⟨e_n, H̃_μ⟩_* = M B_μ Π_μ (Garsia–Haiman's expansion of e_n; the tests check it). */
export function enNumerators(n: number): PolyQ[] {
  return partitionList(n).map((mu) => PolyQ.of(bigM.mul(bigB(mu)).mul(bigPi(mu))));
}

/** Σ_μ eig(μ)·num_μ / w_μ · H̃_μ for μ ⊢ n, exactly. */
export function sumInMacdonaldBasis(n: number, nums: readonly PolyQ[], eig: (mu: Partition) => PolyQ, onStep?: StepReporter): SymFun {
  const ps = partitionList(n);
  if (n === 0) return SymFun.scalar(nums[0]!.mul(eig([])));
  const weighted = ps.map((mu, i) => nums[i]!.mul(eig(mu)));
  const den = weighted.reduce((a, w) => lcm(a, w.den), 1n);
  const terms = ps.map((mu, i) => ({
    numerator: weighted[i]!.num.scale(den / weighted[i]!.den),
    vector: modifiedMacdonaldSchur(mu),
    den: wFactors(mu),
  }));
  const coeffs = sumOverCommonDenominator(terms, ps.length, onStep);
  return SymFun.fromBasis('s', ps.map((l, j) => [l, PolyQ.of(coeffs[j]!, den)] as const));
}

/** Apply the operator with eigenvalue eig(μ) on H̃_μ to any symmetric function. */
export function applyDiagonal(f: SymFun, eig: (mu: Partition) => PolyQ, onStep?: StepReporter): SymFun {
  let out = SymFun.zero;
  for (const n of f.degrees()) {
    const part = f.homogeneousPart(n);
    out = out.add(sumInMacdonaldBasis(n, macdonaldNumerators(part, n), eig, onStep));
  }
  return out;
}

export function nablaEigen(mu: Partition): PolyQ {
  return PolyQ.of(bigT(mu));
}
export function deltaEigen(g: SymFun): (mu: Partition) => PolyQ {
  return (mu) => evaluateAtAlphabet(g, bigB(mu));
}
export function deltaPrimeEigen(g: SymFun): (mu: Partition) => PolyQ {
  return (mu) => evaluateAtAlphabet(g, bigB(mu).sub(Poly.one));
}

export function nabla(f: SymFun, onStep?: StepReporter): SymFun {
  return applyDiagonal(f, nablaEigen, onStep);
}
export function delta(g: SymFun, f: SymFun, onStep?: StepReporter): SymFun {
  return applyDiagonal(f, deltaEigen(g), onStep);
}
export function deltaPrime(g: SymFun, f: SymFun, onStep?: StepReporter): SymFun {
  return applyDiagonal(f, deltaPrimeEigen(g), onStep);
}

/** Δ'_g e_n through the closed expansion of e_n (no change of basis needed). */
export function deltaPrimeOfEn(g: SymFun, n: number, onStep?: StepReporter): SymFun {
  return sumInMacdonaldBasis(n, enNumerators(n), deltaPrimeEigen(g), onStep);
}
