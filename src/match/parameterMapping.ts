/**
 * How a candidate's family parameters follow the target's (n, k): n_f = n + dn, and
 * k_f = k + dk, k_f = n − k + dk, k_f = n + dk, or a fixed k_f — inferred from the anchor
 * entry where the candidate was found, then applied to every entry. A candidate indexed by a
 * shape or a content has it follow n (and k) by a partition template (partitionTemplates.ts).
 */
import { templateAt, templatesFor } from './partitionTemplates.js';

export interface Mapping {
  readonly dn: number;
  readonly k?: { readonly from: 'k' | 'n-k' | 'n' | 'fixed'; readonly d: number };
  /** Shape or content parameters, each by a template of n (and k) or held fixed. */
  readonly lists?: readonly { readonly name: string; readonly id: string; readonly fixed?: readonly number[] }[];
  readonly text: string;
}

function plus(base: string, d: number): string {
  return d === 0 ? base : d > 0 ? `${base}+${d}` : `${base}${d}`;
}

export function mappingText(m: Omit<Mapping, 'text'>): string {
  const parts = [`n ↦ ${plus('n', m.dn)}`];
  if (m.k) parts.push(m.k.from === 'fixed' ? `k = ${m.k.d}` : `k ↦ ${plus(m.k.from, m.k.d)}`);
  for (const l of m.lists ?? []) parts.push(`${l.name} = ${l.id}`);
  return parts.join(', ');
}

/** Mappings that send the anchor (n, k) of the target to the row's (n_f, k_f), simplest first. */
export function mappingsFor(anchor: { n: number; k?: number }, row: { n: number; k?: number; params?: Readonly<Record<string, number | readonly number[]>> }): Mapping[] {
  const dn = row.n - anchor.n;
  if (Math.abs(dn) > 1) return [];
  const lists = Object.entries(row.params ?? {}).filter((e): e is [string, readonly number[]] => typeof e[1] !== 'number');
  if (lists.length) return listMappings(anchor, row, dn, lists);
  const out: Omit<Mapping, 'text'>[] = [];
  if (row.k === undefined) {
    if (anchor.k === undefined) out.push({ dn });
  } else if (anchor.k !== undefined) {
    const opts: { from: 'k' | 'n-k'; d: number }[] = [
      { from: 'k', d: row.k - anchor.k },
      { from: 'n-k', d: row.k - (anchor.n - anchor.k) },
    ];
    for (const o of opts) if (Math.abs(o.d) <= 1) out.push({ dn, k: o });
  } else {
    if (Math.abs(row.k - anchor.n) <= 1) out.push({ dn, k: { from: 'n', d: row.k - anchor.n } });
    out.push({ dn, k: { from: 'fixed', d: row.k } });
  }
  return out.map((m) => ({ ...m, text: mappingText(m) }));
}

/** Partition-indexed rows: each list parameter by a template that gives its value at the anchor; k as the target's k (or fixed). */
function listMappings(anchor: { n: number; k?: number }, row: { n: number; k?: number }, dn: number, lists: readonly [string, readonly number[]][]): Mapping[] {
  let combos: { name: string; id: string; fixed?: readonly number[] }[][] = [[]];
  for (const [name, value] of lists) {
    const ts = templatesFor(value, row.n, anchor.k);
    combos = combos.flatMap((c) => ts.map((t) => [...c, { name, ...t }]));
  }
  const ks: Mapping['k'][] = row.k === undefined ? [undefined] : anchor.k !== undefined && Math.abs(row.k - anchor.k) <= 1 ? [{ from: 'k', d: row.k - anchor.k }] : [{ from: 'fixed', d: row.k }];
  return combos.flatMap((c) => ks.map((k) => ({ dn, ...(k ? { k } : {}), lists: c }))).map((m) => ({ ...m, text: mappingText(m) }));
}

/** The candidate's parameters at a target entry; undefined where a template has no partition. */
export function applyMapping(m: Mapping, e: { n: number; k?: number }): Record<string, number | readonly number[]> | undefined {
  const n = e.n + m.dn;
  const out: Record<string, number | readonly number[]> = m.lists ? {} : { n };
  if (m.k) {
    const k = e.k ?? 0;
    const base = m.k.from === 'k' ? k : m.k.from === 'n-k' ? e.n - k : m.k.from === 'n' ? e.n : 0;
    out['k'] = base + m.k.d;
  }
  for (const l of m.lists ?? []) {
    const p = templateAt(l, n, e.k);
    if (!p) return undefined;
    out[l.name] = p;
  }
  return out;
}

export function mappingCost(m: Mapping): number {
  const lists = (m.lists ?? []).reduce((s, l) => s + (l.fixed ? 2 : 1), 0);
  return (m.dn !== 0 ? 1 : 0) + (m.k ? (m.k.from === 'k' && m.k.d === 0 ? 0 : 1) : 0) + lists;
}
