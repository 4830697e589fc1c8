/**
 * The places of size n a family gets in the catalogue:
 * - indexed by n: {n} when its checks accept n alone, else {n, k} for k = 1..n (a family whose
 *   k, or number of decorations, must be given);
 * - indexed by partitions: every partition of n for each required partition or content
 *   parameter (shape λ, content μ, outer shape λ; every pair for a shape and a content), and
 *   every shape of size n for an optional shape beside n; with a required k, k = 1..n;
 * - summed over contents: a family with a content (and no shape) also gets {n} (or {n, k}) summed
 *   over the contents μ ⊢ n, for Σ_μ m_μ Σ_{x of content μ} q^stat(x); a family with a shape
 *   and a content gets {content μ} summed over the shapes, for Σ q^stat s_shape.
 * Parameter sets the family's checks reject are left out.
 */
import { partitionList, type Partition } from '../core/partitions.js';
import type { Family, ParamSpec, Params } from '../enumerate/plugin.js';
import type { UnitPart } from './rawTally.js';

export interface Place {
  readonly params: Readonly<Record<string, number | readonly number[]>>;
  readonly n: number;
  readonly k?: number;
  readonly parts: readonly UnitPart[];
  readonly contents?: readonly Partition[];
}

const isList = (p: ParamSpec): boolean => p.kind === 'partition' || (p.kind === 'list' && p.name === 'content');

/** Why the catalogue cannot index the family by size, or undefined. */
export function placesUnderstood(family: Family<unknown>): string | undefined {
  const odd = family.params.filter((p) => !p.optional && p.name !== 'n' && p.name !== 'k' && !isList(p));
  if (odd.length) return `required parameters ${odd.map((p) => p.name).join(', ')} have no size the catalogue can run through (it fills n, k, partitions and contents)`;
  if (!family.params.some((p) => p.name === 'n' || (isList(p) && !p.optional) || (p.name === 'shape' && p.kind === 'partition'))) {
    return `no size parameter (n, a shape or a content) among ${family.params.map((p) => p.name).join(', ')}`;
  }
  return undefined;
}

function accepts(family: Family<unknown>, params: Params): boolean {
  try {
    family.validate(params);
    return true;
  } catch {
    return false;
  }
}

const ks = (n: number): number[] => Array.from({ length: n }, (_, i) => i + 1);

export function placesOf(family: Family<unknown>, n: number): Place[] {
  if (placesUnderstood(family)) return [];
  const out: Place[] = [];
  const one = (params: Record<string, number | readonly number[]>, k?: number): Place => ({ params, n, ...(k === undefined ? {} : { k }), parts: [{ params }] });
  const has = (name: string) => family.params.some((p) => p.name === name);
  const required = family.params.filter((p) => !p.optional);
  const lists = required.filter(isList);
  const needsK = required.some((p) => p.name === 'k');
  if (has('n') && lists.length === 0) {
    if (!needsK && accepts(family, { n })) out.push(one({ n }));
    else if (has('k')) for (const k of ks(n)) if (accepts(family, { n, k })) out.push(one({ n, k }, k));
  }
  const shapes = partitionList(n);
  if (lists.length > 0) {
    let sets: Record<string, readonly number[]>[] = [{}];
    for (const p of lists) sets = sets.flatMap((s) => shapes.map((l) => ({ ...s, [p.name]: l })));
    for (const s of sets) {
      if (needsK) for (const k of ks(n)) (accepts(family, { ...s, k }) ? out.push(one({ ...s, k }, k)) : 0);
      else if (accepts(family, s)) out.push(one(s));
    }
    out.push(...unions(family, n, lists, needsK));
  } else if (family.params.some((p) => p.name === 'shape' && p.kind === 'partition' && p.optional) && has('n')) {
    for (const l of shapes) if (accepts(family, { shape: l })) out.push(one({ shape: l }));
  }
  return out;
}

/** The units summed over contents (or over shapes at one content). */
function unions(family: Family<unknown>, n: number, lists: readonly ParamSpec[], needsK: boolean): Place[] {
  const shapes = partitionList(n);
  const names = lists.map((p) => p.name);
  const out: Place[] = [];
  if (names.length === 1 && names[0] === 'content') {
    for (const k of needsK ? ks(n) : [undefined]) {
      const parts = shapes.map((mu, content) => ({ params: { content: mu, ...(k === undefined ? {} : { k }) }, content })).filter((p) => accepts(family, p.params));
      if (parts.length) out.push({ params: k === undefined ? { n } : { n, k }, n, ...(k === undefined ? {} : { k }), parts, contents: shapes });
    }
  } else if (names.length === 2 && names.includes('shape') && names.includes('content') && !needsK && typeof family.shape === 'function') {
    for (const mu of shapes) {
      const parts = shapes.map((l) => ({ params: { shape: l, content: mu } })).filter((p) => accepts(family, p.params));
      if (parts.length) out.push({ params: { content: mu }, n, parts });
    }
  }
  return out;
}
