/**
 * Partitions that follow a target's (n, k), for candidates indexed by a shape or a content
 * (fillings of μ, tableaux of shape λ and content μ, words of content μ): the one-row and
 * one-column shapes, hooks, two-row shapes, or the partition seen at the anchor held fixed.
 * m is the candidate's size (n, or n ± 1 under the mapping of n).
 */
export interface PartitionTemplate {
  readonly id: string;
  /** The partition at size m (and k), or undefined where the form has none. */
  readonly at: (m: number, k: number | undefined) => number[] | undefined;
  readonly needsK: boolean;
}

const ones = (c: number): number[] => new Array<number>(c).fill(1);
const valid = (p: number[]): number[] | undefined => (p.every((x) => Number.isInteger(x) && x > 0) ? p : undefined);

export const PARTITION_TEMPLATES: readonly PartitionTemplate[] = [
  { id: '(n)', needsK: false, at: (m) => (m >= 1 ? [m] : undefined) },
  { id: '(1^n)', needsK: false, at: (m) => (m >= 1 ? ones(m) : undefined) },
  { id: '(n−1,1)', needsK: false, at: (m) => (m >= 3 ? [m - 1, 1] : undefined) },
  { id: '(2,1^(n−2))', needsK: false, at: (m) => (m >= 3 ? [2, ...ones(m - 2)] : undefined) },
  { id: '(k,1^(n−k))', needsK: true, at: (m, k) => (k !== undefined && k >= 1 && k <= m ? valid([k, ...ones(m - k)]) : undefined) },
  { id: '(n−k+1,1^(k−1))', needsK: true, at: (m, k) => (k !== undefined && k >= 1 && k <= m ? valid([m - k + 1, ...ones(k - 1)]) : undefined) },
  { id: '(max(k,n−k),min(k,n−k))', needsK: true, at: (m, k) => (k !== undefined && k >= 0 && k <= m ? [Math.max(k, m - k), Math.min(k, m - k)].filter((x) => x > 0) : undefined) },
];

function same(a: readonly number[], b: readonly number[]): boolean {
  return a.length === b.length && a.every((x, i) => x === b[i]);
}

/** The templates giving `value` at the anchor (size m, k), simplest first; the fixed partition last. */
export function templatesFor(value: readonly number[], m: number, k: number | undefined): { id: string; fixed?: readonly number[] }[] {
  const out: { id: string; fixed?: readonly number[] }[] = [];
  for (const t of PARTITION_TEMPLATES) {
    if (t.needsK && k === undefined) continue;
    const p = t.at(m, k);
    if (p && same(p, value)) out.push({ id: t.id });
  }
  out.push({ id: `(${value.join(',')})`, fixed: value });
  return out;
}

/** The partition of a template at size m (and k). */
export function templateAt(t: { id: string; fixed?: readonly number[] }, m: number, k: number | undefined): readonly number[] | undefined {
  if (t.fixed) return t.fixed.reduce((a, b) => a + b, 0) === m ? t.fixed : undefined;
  return PARTITION_TEMPLATES.find((x) => x.id === t.id)?.at(m, k);
}
