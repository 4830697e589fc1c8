/** The engine's ModuleResult as the Modules screen shows it. */
import { partitionList } from '../../core/partitions.js';
import { AXIS_INDEX, AXIS_LABEL, type ModuleResult } from '../../modules/module-result.js';
import type { ModuleSpec } from '../../modules/compute-module.js';
import type { ModuleOutcome } from './moduleTypes.js';

function power(v: string, i: number, e: number): string {
  return e === 0 ? '' : e === 1 ? `${v}${i}` : `${v}${i}^${e}`;
}

/** A monomial seed as ε(x1^2 x2 θ3) (Sym(…) when symmetrized); other seeds by the engine's words. */
export function seedText(spec: ModuleSpec | undefined, fallback: string): string {
  if (!spec || spec.seed !== 'monomial') return fallback;
  const parts = [
    ...(spec.xExponents ?? []).map((e, i) => power('x', i + 1, e)),
    ...(spec.yExponents ?? []).map((e, i) => power('y', i + 1, e)),
    ...[...(spec.theta ?? [])].sort((a, b) => a - b).map((i) => `θ${i}`),
  ].filter((p) => p !== '');
  const body = parts.join(' ') || '1';
  return spec.symmetrizer === 'symmetrize' ? `Sym(${body})` : spec.symmetrizer === 'none' ? body : `ε(${body})`;
}

function opsText(ops: readonly string[]): string {
  return ops.map((o) => (o === 'x' ? '∂x' : o === 'y' ? '∂y' : o === 'theta' ? '∂θ' : o.replace(/^polar(\d+)$/, 'P$1'))).join(', ');
}

export function moduleOutcome(r: ModuleResult, json: unknown, spec?: ModuleSpec): ModuleOutcome {
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
    title:
      spec?.seed === 'monomial'
        ? `closure of ${seedText(spec, r.description)} under ${opsText(r.ops)}, n=${r.n}`
        : `${r.description}, n=${r.n}${r.k !== undefined ? `, k=${r.k}` : ''}`,
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
