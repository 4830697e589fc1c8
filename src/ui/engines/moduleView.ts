/** The engine's ModuleResult as the Modules screen shows it. */
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

type Nested = number | string | Nested[];

/** Every nonzero entry of a nested table (1, 2 or 3 axes) with its index. */
function entries(table: Nested, prefix: number[] = []): [number[], string][] {
  if (!Array.isArray(table)) return String(table) === '0' ? [] : [[prefix, String(table)]];
  return table.flatMap((t, i) => entries(t, [...prefix, i]));
}

function at(table: Nested | undefined, index: readonly number[]): string {
  let t: Nested | undefined = table;
  for (const i of index) t = Array.isArray(t) ? t[i] : undefined;
  return t === undefined || Array.isArray(t) ? '0' : String(t);
}

const AXIS_NAMES: Readonly<Record<string, string>> = { x: 'x', y: 'y', theta: 'θ' };

/**
 * The view of a module from its JSON document (as `gradus module --json` prints it): the same
 * for a result just computed and for one kept in the catalogue.
 */
export function moduleOutcome(json: Record<string, unknown>, spec?: ModuleSpec): ModuleOutcome {
  const axes = (json['axes'] as string[]) ?? ['x'];
  const schur = (json['schur'] as Record<string, Nested> | undefined) ?? {};
  const shapes = Object.keys(schur);
  const cells = entries(json['hilbert'] as Nested).map(([exps, dim]) => ({
    exps,
    dim,
    frobenius: shapes
      .map((lam) => [lam, at(schur[lam], exps)] as const)
      .filter(([, m]) => m !== '0')
      .map(([lam, m]) => `${m === '1' ? '' : m === '-1' ? '-' : `${m}·`}s(${lam})`)
      .join(' + ')
      .replace(/\+ -/g, '- '),
  }));
  const n = json['n'] as number;
  const k = json['k'] as number | null | undefined;
  const prov = (json['provenance'] as { confirmation?: string; seconds?: number } | undefined) ?? {};
  const checks = (json['checks'] as { check: string; holds: boolean | null; detail: string }[] | undefined) ?? [];
  const description = String(json['description'] ?? json['seed'] ?? json['ideal'] ?? 'module');
  return {
    title:
      spec?.seed === 'monomial'
        ? `closure of ${seedText(spec, description)} under ${opsText((json['ops'] as string[]) ?? [])}, n=${n}`
        : `${description}, n=${n}${k !== undefined && k !== null ? `, k=${k}` : ''}`,
    n,
    ...(k !== undefined && k !== null ? { k } : {}),
    axes: axes.map((a) => AXIS_NAMES[a] ?? a),
    cells,
    dimension: String(json['dimension'] ?? cells.reduce((s, c) => s + BigInt(c.dim), 0n)),
    findings: checks.map((f) => ({ label: f.check, holds: f.holds ?? undefined, detail: f.detail })),
    exactness: prov.confirmation ?? '',
    elapsedMs: (prov.seconds ?? 0) * 1000,
    json,
  };
}
