/** Items dealt into at most `bins` shards, the costliest first to the least loaded (longest-processing-time rule). */
export function packByCost<T>(items: readonly { readonly cost: number; readonly item: T }[], bins: number): T[][] {
  const count = Math.max(1, Math.min(bins, items.length));
  const load = new Array<number>(count).fill(0);
  const out: { at: number; item: T }[][] = Array.from({ length: count }, () => []);
  const order = items.map((x, at) => ({ ...x, at })).sort((a, b) => b.cost - a.cost || a.at - b.at);
  for (const x of order) {
    let best = 0;
    for (let i = 1; i < count; i++) if (load[i]! < load[best]!) best = i;
    load[best]! += x.cost;
    out[best]!.push({ at: x.at, item: x.item });
  }
  // within a shard, the plan's own order (stable labels and files)
  return out.map((bin) => bin.sort((a, b) => a.at - b.at).map((x) => x.item));
}
