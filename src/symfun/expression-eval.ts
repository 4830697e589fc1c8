/**
 * Evaluation of a parsed expression to a symmetric function over Q[q,t]; scalars are
 * symmetric functions of degree 0. The function table doubles as the documentation.
 */
import { InputError, LimitError } from '../core/errors.js';
import { Poly } from '../core/poly.js';
import { PolyQ } from '../core/polyq.js';
import { unknownNameMessage } from '../core/suggest.js';
import type { Arg, Node } from './expression-parser.js';
import { HALL_LITTLEWOOD_MAX_N, modifiedHallLittlewood } from './hall-littlewood.js';
import { MACDONALD_MAX_N, modifiedMacdonald } from './macdonald.js';
import { delta, deltaEigen, deltaPrime, deltaPrimeOfEn, enNumerators, nabla, nablaEigen, starScalar, sumInMacdonaldBasis } from './operators.js';
import { plethysmDividedCleared, plethysmTimes } from './plethysm.js';
import { SymFun } from './symfun.js';
import type { Basis } from './transitions.js';

export interface EvalOptions {
  /** Largest degree for the operators ∇, Δ, Δ′ (their cost grows faster than n!). */
  readonly maxDegree: number;
  /** Told about the steps of long work: a label, steps done, steps in all. */
  readonly onProgress?: (label: string, done: number, total: number) => void;
}

export interface FunctionDoc {
  readonly name: string;
  readonly signature: string;
  readonly description: string;
}

export const EXPRESSION_FUNCTIONS: readonly FunctionDoc[] = [
  { name: 's', signature: 's(2,1)', description: 'Schur function (parts of a partition; s() = 1)' },
  { name: 'm', signature: 'm(2,1)', description: 'monomial symmetric function' },
  { name: 'e', signature: 'e(2,1)', description: 'elementary symmetric functions e_2 e_1 (e(0) = 1)' },
  { name: 'h', signature: 'h(2,1)', description: 'complete homogeneous symmetric functions' },
  { name: 'p', signature: 'p(2,1)', description: 'power sums' },
  { name: 'H', signature: 'H(2,1)', description: 'modified Macdonald polynomial H̃_μ(X;q,t)' },
  { name: 'HL', signature: 'HL(2,1)', description: 'modified Hall–Littlewood function H̃_μ(X;t) = H̃_μ(X;0,t)' },
  { name: 'nabla', signature: 'nabla(F)', description: '∇: H̃_μ ↦ T_μ H̃_μ' },
  { name: 'delta', signature: 'delta(f, F)', description: 'Δ_f: H̃_μ ↦ f[B_μ] H̃_μ' },
  { name: 'deltaprime', signature: 'deltaprime(f, F)', description: "Δ'_f: H̃_μ ↦ f[B_μ − 1] H̃_μ" },
  { name: 'omega', signature: 'omega(F)', description: 'ω: s_λ ↦ s_λ′' },
  { name: 'subs', signature: 'subs(F, t=0)', description: 'set q and/or t to integers (subs(F, q=1, t=1))' },
  { name: 'swap', signature: 'swap(F)', description: 'exchange q and t' },
  { name: 'pleth', signature: 'pleth(F, 1-q)', description: 'plethysm F[X·A] by a q,t-polynomial A with integer coefficients' },
  { name: 'revq', signature: 'revq(F)', description: 'q-reversal q^D F(1/q), D the largest q-degree of F' },
  { name: 'plethdiv', signature: 'plethdiv(F, 1-q, 1-t)', description: '(q;q)_n (t;t)_n F[X/((1-q)(1-t))] (each alphabet 1-u, u a monomial; the factors (u;u)_n make it a polynomial)' },
  { name: 'hall', signature: 'hall(F, G)', description: 'Hall scalar product ⟨F, G⟩, ⟨s_λ, s_μ⟩ = δ (a scalar)' },
  { name: 'hilbert', signature: 'hilbert(F)', description: 'Hilbert series ⟨F, p_1^n⟩ (a scalar)' },
  { name: 'star', signature: 'star(F, G)', description: '*-scalar product, ⟨H̃_λ, H̃_μ⟩_* = δ w_μ (a scalar)' },
];

const BASIS_NAMES = new Set(['s', 'm', 'e', 'h', 'p']);

function fail(col: number, msg: string): never {
  throw new InputError(`column ${col}: ${msg}`, 'expression');
}

function constantOf(f: SymFun): PolyQ | undefined {
  const d = f.degrees();
  if (d.length === 0) return PolyQ.zero;
  if (d.length === 1 && d[0] === 0) return f.coeff([]);
  return undefined;
}

/** The largest degree the expression language handles (changes of basis need p(n)² entries). */
export const EXPRESSION_MAX_DEGREE = 16;

function limitDegree(n: number, col: number): void {
  if (n > EXPRESSION_MAX_DEGREE) {
    throw new LimitError(`column ${col}: degree ${n} is above ${EXPRESSION_MAX_DEGREE}, the largest degree handled here (changes of basis grow like p(n)²)`);
  }
}

function checkSize(f: SymFun, col: number): SymFun {
  limitDegree(Math.max(0, ...f.degrees()), col);
  return f;
}

export function evaluateNode(node: Node, opts: EvalOptions): SymFun {
  return checkSize(evaluateUnchecked(node, opts), node.col);
}

function evaluateUnchecked(node: Node, opts: EvalOptions): SymFun {
  const ev = (n: Node): SymFun => evaluateNode(n, opts);
  switch (node.kind) {
    case 'num':
      return SymFun.scalar(Poly.constant(node.value));
    case 'var':
      return SymFun.scalar(node.name === 'q' ? Poly.q : Poly.t);
    case 'neg':
      return ev(node.arg).neg();
    case 'pow': {
      const b = ev(node.base);
      const c = constantOf(b);
      if (c) return SymFun.scalar(PolyQ.of(c.num.pow(node.exp), c.den ** BigInt(node.exp)));
      limitDegree(Math.max(0, ...b.degrees()) * node.exp, node.col);
      return b.pow(node.exp);
    }
    case 'bin': {
      const a = ev(node.left);
      const b = ev(node.right);
      if (node.op === '+') return a.add(b);
      if (node.op === '-') return a.sub(b);
      if (node.op === '*') {
        const ca = constantOf(a);
        const cb = constantOf(b);
        if (cb) return a.scale(cb);
        if (ca) return b.scale(ca);
        const deg = Math.max(0, ...a.degrees()) + Math.max(0, ...b.degrees());
        limitDegree(deg, node.col);
        return a.mul(b);
      }
      const c = constantOf(b);
      if (!c || !c.num.isConstant() || c.isZero()) fail(node.right.col, 'division is only by a non-zero integer');
      return a.scale(PolyQ.of(Poly.constant(c.den), c.num.constantTerm()));
    }
    case 'call':
      return evaluateCall(node, opts);
  }
}

function exprArgs(node: Extract<Node, { kind: 'call' }>, count: number, sig: string): Node[] {
  if (node.args.length !== count) fail(node.col, `${node.name} takes ${count} argument${count === 1 ? '' : 's'}: ${sig}`);
  return node.args.map((a) => {
    if (a.kind !== 'expr') fail(a.col, `${node.name} takes no "${a.name}=" argument: ${sig}`);
    return a.expr;
  });
}

function partsOf(node: Extract<Node, { kind: 'call' }>): number[] {
  return node.args.map((a: Arg) => {
    if (a.kind !== 'expr' || a.expr.kind !== 'num') fail(a.col, `${node.name}(…) takes the parts of a partition as integers, as ${node.name}(2,1)`);
    const v = (a.expr as { value: bigint }).value;
    if (v > 1000n) fail(a.col, `a part must be at most 1000`);
    return Number(v);
  });
}

function checkDegree(f: SymFun, what: string, col: number, opts: EvalOptions): void {
  const n = Math.max(0, ...f.degrees());
  if (n > opts.maxDegree) {
    throw new LimitError(`column ${col}: ${what} in degree ${n} needs every H̃_μ with μ ⊢ ${n}; the limit is degree ${opts.maxDegree} (raise it with --max-degree)`, 'max-degree');
  }
}

function reporter(label: string, opts: EvalOptions): ((done: number, total: number) => void) | undefined {
  const sink = opts.onProgress;
  return sink ? (done, total) => sink(label, done, total) : undefined;
}

/** The monomial u = q^a t^b of an alphabet 1 − u (u ≠ 1). */
function oneMinusMonomial(f: SymFun, col: number): [number, number] {
  const c = constantOf(f);
  const u = c && c.isIntegral() ? Poly.one.sub(c.num) : undefined;
  const terms = u ? [...u.terms()] : [];
  if (terms.length !== 1 || terms[0]![2] !== 1n || terms[0]![0] + terms[0]![1] === 0) fail(col, 'the alphabet must be 1 - u for a monomial u in q, t, as 1-q or 1-q*t');
  return [terms[0]![0], terms[0]![1]];
}

/** F = c·e_n (n ≥ 1): then the operators use the closed H̃-expansion of e_n. */
function multipleOfEn(f: SymFun): { n: number; c: PolyQ } | undefined {
  const d = f.degrees();
  if (d.length !== 1 || d[0]! === 0) return undefined;
  const c = f.coeff(new Array(d[0]!).fill(1));
  return !c.isZero() && f.equals(SymFun.basisElement('e', [d[0]!]).scale(c)) ? { n: d[0]!, c } : undefined;
}

function evaluateCall(node: Extract<Node, { kind: 'call' }>, opts: EvalOptions): SymFun {
  const ev = (n: Node): SymFun => evaluateNode(n, opts);
  const name = node.name;
  if (BASIS_NAMES.has(name)) {
    const parts = partsOf(node);
    const deg = parts.reduce((x, y) => x + y, 0);
    limitDegree(deg, node.col);
    try {
      return SymFun.basisElement(name as Basis, parts);
    } catch (e) {
      if (e instanceof InputError) fail(node.col, e.message);
      throw e;
    }
  }
  switch (name) {
    case 'H':
    case 'HL': {
      const parts = partsOf(node);
      if (parts.some((x, i) => x === 0 || (i > 0 && x > parts[i - 1]!))) fail(node.col, `${name}(…) needs a partition: positive, weakly decreasing parts`);
      const n = parts.reduce((a, b) => a + b, 0);
      const max = name === 'H' ? MACDONALD_MAX_N : HALL_LITTLEWOOD_MAX_N;
      if (n > max) throw new LimitError(`column ${node.col}: ${name}(…) of size ${n} is above the fixed limit ${max} (its cost grows like n!)`);
      return name === 'H' ? modifiedMacdonald(parts) : modifiedHallLittlewood(parts);
    }
    case 'nabla': {
      const [a] = exprArgs(node, 1, 'nabla(F)');
      const f = ev(a!);
      checkDegree(f, 'nabla', node.col, opts);
      const en = multipleOfEn(f);
      if (en) return sumInMacdonaldBasis(en.n, enNumerators(en.n), nablaEigen, reporter('nabla', opts)).scale(en.c);
      return nabla(f, reporter('nabla', opts));
    }
    case 'delta':
    case 'deltaprime': {
      const [a, b] = exprArgs(node, 2, `${name}(f, F)`);
      const g = ev(a!);
      const f = ev(b!);
      checkDegree(f, name, node.col, opts);
      const onStep = reporter(name, opts);
      // e_n has a closed expansion in the H̃ basis: use it when F is a multiple of e_n
      const en = multipleOfEn(f);
      if (name === 'delta') return en ? sumInMacdonaldBasis(en.n, enNumerators(en.n), deltaEigen(g), onStep).scale(en.c) : delta(g, f, onStep);
      if (en) return deltaPrimeOfEn(g, en.n, onStep).scale(en.c);
      return deltaPrime(g, f, onStep);
    }
    case 'omega': {
      const [a] = exprArgs(node, 1, 'omega(F)');
      return ev(a!).omega();
    }
    case 'swap': {
      const [a] = exprArgs(node, 1, 'swap(F)');
      return ev(a!).swapQT();
    }
    case 'subs': {
      if (node.args.length < 2 || node.args[0]!.kind !== 'expr') fail(node.col, 'subs takes a function and one or two assignments: subs(F, t=0) or subs(F, q=1, t=1)');
      const f = ev((node.args[0] as { expr: Node }).expr);
      const values: { q?: bigint; t?: bigint } = {};
      for (const a of node.args.slice(1)) {
        if (a.kind !== 'assign' || (a.name !== 'q' && a.name !== 't')) fail(a.col, 'expected an assignment q=<integer> or t=<integer>');
        const asg = a as Extract<Arg, { kind: 'assign' }>;
        const c = constantOf(ev(asg.value));
        if (!c || !c.num.isConstant() || !c.isIntegral()) fail(asg.value.col, `the value of ${asg.name} must be an integer`);
        values[asg.name as 'q' | 't'] = c!.num.constantTerm();
      }
      return f.specialize(values);
    }
    case 'pleth': {
      const [a, b] = exprArgs(node, 2, 'pleth(F, A)');
      const f = ev(a!);
      const alpha = constantOf(ev(b!));
      if (!alpha || !alpha.isIntegral()) fail(b!.col, 'the alphabet must be a polynomial in q, t with integer coefficients, as 1-q');
      return plethysmTimes(f, alpha!.num);
    }
    case 'revq': {
      const [a] = exprArgs(node, 1, 'revq(F)');
      return ev(a!).reverseQ();
    }
    case 'plethdiv': {
      if (node.args.length < 2 || node.args.some((x) => x.kind !== 'expr')) fail(node.col, 'plethdiv takes a function and one or more alphabets 1-u: plethdiv(F, 1-q) or plethdiv(F, 1-q, 1-t)');
      const [a, ...alphabets] = node.args.map((x) => (x as { expr: Node }).expr);
      return plethysmDividedCleared(ev(a!), alphabets.map((b) => oneMinusMonomial(ev(b), b.col)));
    }
    case 'hall': {
      const [a, b] = exprArgs(node, 2, 'hall(F, G)');
      return SymFun.scalar(ev(a!).hallInner(ev(b!)));
    }
    case 'star': {
      const [a, b] = exprArgs(node, 2, 'star(F, G)');
      return SymFun.scalar(starScalar(ev(a!), ev(b!)));
    }
    case 'hilbert': {
      const [a] = exprArgs(node, 1, 'hilbert(F)');
      return SymFun.scalar(ev(a!).hilbert());
    }
    default:
      return fail(node.col, unknownNameMessage('function', name, EXPRESSION_FUNCTIONS.map((f) => f.name)));
  }
}
