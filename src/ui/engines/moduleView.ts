/** The engine's ModuleResult as the Modules screen shows it. */
import { partitionList } from '../../core/partitions.js';
import { AXIS_INDEX, AXIS_LABEL, type ModuleResult } from '../../modules/module-result.js';
import type { ModuleOutcome } from './moduleTypes.js';

export function moduleOutcome(r: ModuleResult, json: unknown): ModuleOutcome {
  const shapes = partitionList(r.n);
  const cells = r.cells.map((c) => ({
    exps: r.axes.map((a) => c.degree[AXIS_INDEX[a]]),
    dim: String(c.dim),
    frobenius: (c.multiplicities ?? [])
      .map((m, i) => (m === 0 ? '' : `${m === 1 ? '' : m === -1 ? '-' : `${m}·`}s[${shapes[i]!.join(',')}]`))
      .filter((t) => t !== '')
      .join(' + ')
      .replace(/\+ -/g, '- '),
  }));
  return {
    title: `${r.description}, n=${r.n}${r.k !== undefined ? `, k=${r.k}` : ''}`,
    n: r.n,
    ...(r.k !== undefined ? { k: r.k } : {}),
    axes: r.axes.map((a) => AXIS_LABEL[a]),
    cells,
    dimension: String(r.cells.reduce((s, c) => s + c.dim, 0)),
    findings: r.checks.map((f) => ({ label: f.check, holds: f.holds ?? undefined, detail: f.detail })),
    exactness: r.provenance.confirmation,
    elapsedMs: r.provenance.seconds * 1000,
    json,
  };
}
