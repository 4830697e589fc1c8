/**
 * The built-in families of the expression library (symmetric functions of the Delta and
 * Shuffle literature, indexed by n, (n, k) or a partition λ ⊢ n), the places of a family, and
 * user families from a template. Each value is evaluated once; its specialisations are derived
 * from it, and the twists (ω, q-reversal, q ↔ t) are tried by the search on the target.
 */
import { InputError } from '../core/errors.js';
import { partitionList } from '../core/partitions.js';
import { templateUses } from '../requests/template.js';
import { parseExpression } from '../symfun/expression-parser.js';
import type { ExpressionFamily } from '../store/expressionStore.js';

const HRW = 'Haglund, Remmel, Wilson, "The Delta Conjecture", Trans. Amer. Math. Soc. 370 (2018)';
const DM = 'D\'Adderio, Mellit, "A proof of the compositional Delta conjecture", Adv. Math. 402 (2022)';
const HRS = 'Haglund, Rhoades, Shimozono, "Ordered set partitions, generalized coinvariant algebras, and the Delta Conjecture", Adv. Math. 329 (2018)';
const STANLEY = 'Stanley, "Invariants of finite groups and their applications to combinatorics", Bull. Amer. Math. Soc. 1 (1979) (principal specialisation; common practice)';

const builtIn = (f: Omit<ExpressionFamily, 'origin' | 'kMin' | 'sign'> & Partial<Pick<ExpressionFamily, 'kMin' | 'sign'>>): ExpressionFamily => ({ kMin: 1, sign: '', origin: 'built-in', ...f });

export const BUILT_IN_EXPRESSIONS: readonly ExpressionFamily[] = [
  builtIn({
    id: 'nabla-e', title: '∇e_n', template: 'nabla(e({n}))', index: 'n',
    source: 'Haiman, "Vanishing theorems and character formulas for the Hilbert scheme of points in the plane", Invent. Math. 149 (2002); Carlsson, Mellit, "A proof of the shuffle conjecture", J. Amer. Math. Soc. 31 (2018)',
  }),
  builtIn({
    id: 'nabla-p', title: '(−1)^{n−1} ∇p_n', template: '-(-1)^{n}*nabla(p({n}))', index: 'n',
    source: 'Loehr, Warrington, "Square q,t-lattice paths and ∇(p_n)", Trans. Amer. Math. Soc. 359 (2007); Sergel, "A proof of the square paths conjecture", J. Combin. Theory Ser. A 152 (2017)',
  }),
  builtIn({
    id: 'nabla-s', title: '±∇s_λ (sign making it Schur positive)', template: 'nabla(s({λ}))', index: 'partition', sign: 'positive',
    source: 'Bergeron, Garsia, Haiman, Tesler, "Identities and positivity conjectures for some remarkable operators in the theory of symmetric functions", Methods Appl. Anal. 6 (1999) (the sign conjecture); Loehr, Warrington, "Nested quantum Dyck paths and ∇(s_λ)", Int. Math. Res. Not. (2008) (from memory)',
  }),
  builtIn({ id: 'delta-e', title: 'Δ_{e_k} e_n', template: 'delta(e({k}), e({n}))', index: 'n,k', kMin: 0, source: HRW }),
  builtIn({
    id: 'deltaprime-e', title: 'Δ′_{e_{k−1}} e_n', template: 'deltaprime(e({k}-1), e({n}))', index: 'n,k',
    source: `${HRW}; proved in ${DM}; at t = 0: ${HRS}`,
  }),
  builtIn({ id: 'delta-h', title: 'Δ_{h_k} e_n', template: 'delta(h({k}), e({n}))', index: 'n,k', kMin: 0, source: `${HRW} (the generalized Delta conjecture, from memory)` }),
  builtIn({
    id: 'macdonald', title: 'H̃_λ (modified Macdonald)', template: 'H({λ})', index: 'partition',
    source: 'Haglund, Haiman, Loehr, "A combinatorial formula for Macdonald polynomials", J. Amer. Math. Soc. 18 (2005); Garsia, Haiman, "A graded representation model for Macdonald\'s polynomials", Proc. Nat. Acad. Sci. 90 (1993)',
  }),
  builtIn({
    id: 'hall-littlewood', title: 'H̃_λ(X;t) (modified Hall–Littlewood)', template: 'HL({λ})', index: 'partition',
    source: 'Macdonald, "Symmetric Functions and Hall Polynomials", 2nd ed., Oxford (1995), ch. III; Lascoux, Schützenberger, "Sur une conjecture de H. O. Foulkes", C. R. Acad. Sci. Paris 286 (1978) (charge)',
  }),
  builtIn({ id: 'pleth-e-q', title: '(q;q)_n e_n[X/(1−q)]', template: 'plethdiv(e({n}), 1-q)', index: 'n', source: STANLEY }),
  builtIn({ id: 'pleth-h-q', title: '(q;q)_n h_n[X/(1−q)] (coinvariant algebra)', template: 'plethdiv(h({n}), 1-q)', index: 'n', source: STANLEY }),
  builtIn({ id: 'pleth-e-qt', title: '(q;q)_n (t;t)_n e_n[X/((1−q)(1−t))]', template: 'plethdiv(e({n}), 1-q, 1-t)', index: 'n', source: 'common practice (plethystic notation; Macdonald, "Symmetric Functions and Hall Polynomials", 2nd ed. (1995), ch. I)' }),
  builtIn({ id: 'pleth-h-qt', title: '(q;q)_n (t;t)_n h_n[X/((1−q)(1−t))]', template: 'plethdiv(h({n}), 1-q, 1-t)', index: 'n', source: 'common practice (plethystic notation; Macdonald, "Symmetric Functions and Hall Polynomials", 2nd ed. (1995), ch. I)' }),
];

/** The specialisations stored for each value; the remaining variable is always q (q = 0, q = 1 are read back in q). */
export const SPECIALISATIONS: readonly { readonly id: string; readonly wrap: (e: string) => string }[] = [
  { id: 'none', wrap: (e) => e },
  { id: 't=0', wrap: (e) => `subs(${e}, t=0)` },
  { id: 'q=0', wrap: (e) => `swap(subs(${e}, q=0))` },
  { id: 't=1', wrap: (e) => `subs(${e}, t=1)` },
  { id: 'q=1', wrap: (e) => `swap(subs(${e}, q=1))` },
];

/** A target variant of the search, read back as a twist of the expression (each is its own inverse). */
export function twistExpression(variant: string, e: string): string {
  switch (variant) {
    case 'omega':
      return `omega(${e})`;
    case 'q-reversed':
      return `revq(${e})`;
    case 'omega-q-reversed':
      return `revq(omega(${e}))`;
    case 'q-t-swapped':
      return `swap(${e})`;
    case 'omega-q-t-swapped':
      return `swap(omega(${e}))`;
    default:
      return e;
  }
}

export interface Place {
  readonly n: number;
  readonly k?: number;
  readonly partition?: readonly number[];
}

export function placesOf(f: ExpressionFamily, n: number): Place[] {
  if (f.index === 'partition') return partitionList(n).map((partition) => ({ n, partition }));
  if (f.index === 'n,k') return Array.from({ length: n - f.kMin + 1 }, (_, i) => ({ n, k: f.kMin + i }));
  return [{ n }];
}

const ID = /^[a-z][a-z0-9-]{0,39}$/;

/** A user family from its name and template, checked: the name is free, the template parses. */
export function userFamily(id: string, template: string, source: string | undefined, title: string | undefined): ExpressionFamily {
  if (!ID.test(id)) throw new InputError(`the family name must be lower-case letters, digits and "-", starting with a letter, at most 40 characters (got "${id.slice(0, 50)}")`, 'name');
  if (BUILT_IN_EXPRESSIONS.some((f) => f.id === id)) throw new InputError(`${id} is a built-in family; choose another name`, 'name');
  const t = template.trim().replace(/\s+/g, ' ');
  if (t.length === 0 || t.length > 2000) throw new InputError('--template needs an expression of at most 2000 characters, such as "deltaprime(e({k}-1), e({n}))"', 'template');
  const uses = templateUses(t);
  if (uses.lambda && (uses.k || uses.n)) throw new InputError('--template uses {λ} (a partition of n) together with {n} or {k}; use either {λ} alone or {n} (and {k})', 'template');
  if (!uses.lambda && !uses.n) throw new InputError('--template needs {n} (and {k}, or {λ} for a partition of n), as "nabla(e({n}))"', 'template');
  // the grammar is checked once here, on the template with every placeholder set to 1
  parseExpression(t.replace(/\{(?:n|k|λ|lambda)\}/g, '1'));
  return {
    id,
    template: t,
    index: uses.lambda ? 'partition' : uses.k ? 'n,k' : 'n',
    kMin: 1,
    title: (title ?? t).slice(0, 200),
    source: (source ?? 'added by the user').slice(0, 500),
    origin: 'user',
    sign: '',
  };
}
