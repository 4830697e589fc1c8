/**
 * How a candidate's family parameters follow the target's (n, k): n_f = n + dn, and
 * k_f = k + dk, k_f = n − k + dk, k_f = n + dk, or a fixed k_f — inferred from the anchor
 * entry where the candidate was found, then applied to every entry.
 */
export interface Mapping {
  readonly dn: number;
  readonly k?: { readonly from: 'k' | 'n-k' | 'n' | 'fixed'; readonly d: number };
  readonly text: string;
}

function plus(base: string, d: number): string {
  return d === 0 ? base : d > 0 ? `${base}+${d}` : `${base}${d}`;
}

export function mappingText(m: Omit<Mapping, 'text'>): string {
  const parts = [`n ↦ ${plus('n', m.dn)}`];
  if (m.k) parts.push(m.k.from === 'fixed' ? `k = ${m.k.d}` : `k ↦ ${plus(m.k.from, m.k.d)}`);
  return parts.join(', ');
}

/** Mappings that send the anchor (n, k) of the target to the row's (n_f, k_f), simplest first. */
export function mappingsFor(anchor: { n: number; k?: number }, row: { n: number; k?: number }): Mapping[] {
  const dn = row.n - anchor.n;
  if (Math.abs(dn) > 1) return [];
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

export function applyMapping(m: Mapping, e: { n: number; k?: number }): Record<string, number> {
  const n = e.n + m.dn;
  if (!m.k) return { n };
  const k = e.k ?? 0;
  const base = m.k.from === 'k' ? k : m.k.from === 'n-k' ? e.n - k : m.k.from === 'n' ? e.n : 0;
  return { n, k: base + m.k.d };
}

export function mappingCost(m: Mapping): number {
  return (m.dn !== 0 ? 1 : 0) + (m.k ? (m.k.from === 'k' && m.k.d === 0 ? 0 : 1) : 0);
}
