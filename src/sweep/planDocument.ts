/**
 * The plan of a sweep as data ("gradus-sweep-plan", version 1): its canonical command, the
 * counts, and the list of module requests by canonical key — the whole work, in a form any
 * runner can take (one machine here, or shards of a cluster that keep each module in the
 * catalogue under the same key, after which `sweep run` only reads and ranks).
 */
import type { SweepPlan } from './plan.js';

export const PLAN_FORMAT = 'gradus-sweep-plan';

export function planDocument(plan: SweepPlan, kept: (key: string) => boolean = () => false): Record<string, unknown> {
  return {
    format: PLAN_FORMAT,
    version: 1,
    key: plan.key,
    counts: plan.counts,
    requests: plan.modules.map((m) => ({ key: m.key, n: m.n, ...(m.k !== undefined ? { k: m.k } : {}), seconds: Number(m.seconds.toPrecision(3)), kept: kept(m.key) })),
    lines: plan.lines.map((l) => ({ id: l.id, seed: l.seed, ops: l.ops, ...(l.template ? { template: l.template } : {}), places: l.places, left: l.left })),
  };
}
