/**
 * How a family indexed by a partition λ ⊢ n follows a target over n (and k): λ = (n), (1^n),
 * hooks, two rows or two columns — inferred from the anchor entry, then applied to every entry.
 * A target at one n alone may also name one λ.
 */
import { conjugate, partitionKey, type Partition } from '../core/partitions.js';

export interface ShapeRule {
  readonly text: string;
  readonly apply: (n: number, k?: number) => Partition | undefined;
}

const ones = (m: number): number[] => new Array<number>(Math.max(0, m)).fill(1);
const valid = (p: number[]): Partition | undefined => (p.every((x) => x > 0) ? [...p].sort((a, b) => b - a) : undefined);

const RULES: readonly ShapeRule[] = [
  { text: 'λ = (n)', apply: (n) => [n] },
  { text: 'λ = (1^n)', apply: (n) => ones(n) },
  { text: 'λ = (n−1, 1)', apply: (n) => (n >= 2 ? valid([n - 1, 1]) : undefined) },
  { text: 'λ = (2, 1^{n−2})', apply: (n) => (n >= 2 ? valid([2, ...ones(n - 2)]) : undefined) },
  { text: 'λ = (k, 1^{n−k})', apply: (n, k) => (k !== undefined && k >= 1 && k <= n ? [k, ...ones(n - k)] : undefined) },
  { text: 'λ = (n−k+1, 1^{k−1})', apply: (n, k) => (k !== undefined && k >= 1 && k <= n ? [n - k + 1, ...ones(k - 1)] : undefined) },
  { text: 'λ = (n−k, k) sorted (two rows)', apply: (n, k) => (k !== undefined && k >= 0 && k <= n ? valid([n - k, k].filter((x) => x > 0)) : undefined) },
  { text: "λ = (n−k, k)' (two columns)", apply: (n, k) => (k !== undefined && k >= 0 && k <= n ? conjugate(valid([n - k, k].filter((x) => x > 0)) ?? []) : undefined) },
];

/** The rules sending the anchor to λ, simplest first; a fixed λ when the target lives at one n. */
export function shapeRulesFor(anchor: { n: number; k?: number }, lambda: Partition, oneSize: boolean): ShapeRule[] {
  const key = partitionKey(lambda);
  const out = RULES.filter((r) => {
    const p = r.apply(anchor.n, anchor.k);
    return p !== undefined && partitionKey(p) === key;
  });
  if (oneSize && out.length === 0) out.push({ text: `λ = (${lambda.join(',')})`, apply: (n) => (n === anchor.n ? lambda : undefined) });
  return out;
}
