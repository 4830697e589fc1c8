/**
 * From computed modules to the ranked table: for each seed (a line of the plan) its modules'
 * data at every place computed, its findings (Hilbert series, dimensions, tables, the
 * catalogue, other seeds with the same series), and the commands that reproduce it. Seeds are
 * ranked by their findings, compared kind by kind from the most remarkable.
 */
import type { Catalogue } from '../store/catalogue.js';
import type { ModuleOutcome } from './computeModules.js';
import { dimensionFindings } from './dimensionFit.js';
import { FINDING_WEIGHT, sortFindings, type SweepFinding } from './findings.js';
import { hilbertFindings } from './hilbertFindings.js';
import { identify } from './identify.js';
import { isomorphismCandidates, type IsomorphismGroup } from './isomorphism.js';
import { moduleData, type ModuleData } from './moduleData.js';
import type { Place, SweepLine, SweepPlan } from './plan.js';
import { reproduceCommands } from './reproduce.js';
import { tableFindings } from './tableFindings.js';

export interface RowPlace extends Place {
  readonly key: string;
  readonly dimension: string;
  /** Σ dim q^{x-degree}, as text. */
  readonly hilbert: string;
}

export interface SweepRow {
  readonly rank: number;
  readonly id: string;
  readonly seed: string;
  readonly ops: readonly string[];
  readonly places: readonly RowPlace[];
  /** Places where the seed vanishes or is not defined. */
  readonly left: readonly (Place & { readonly why: string })[];
  /** Places whose module was skipped (over the work limit) or failed. */
  readonly missing: readonly (Place & { readonly key: string; readonly why: string })[];
  readonly findings: readonly SweepFinding[];
  readonly reproduce: readonly string[];
}

export interface SweepAnalysis {
  readonly rows: readonly SweepRow[];
  readonly isomorphism: readonly IsomorphismGroup[];
  /** Why the catalogue gave no statistic findings, when it could not. */
  readonly catalogueNote?: string;
}

/** −1 when a ranks above b: heaviest findings first, kind by kind; then more places; then plan order. */
type Rankable = Pick<SweepRow, 'findings' | 'id'> & { readonly places: readonly unknown[] };

export function compareRows(a: Rankable, b: Rankable): number {
  const wa = [...new Set(a.findings.map((f) => FINDING_WEIGHT[f.kind]))].sort((x, y) => y - x);
  const wb = [...new Set(b.findings.map((f) => FINDING_WEIGHT[f.kind]))].sort((x, y) => y - x);
  for (let i = 0; i < Math.max(wa.length, wb.length); i++) {
    const d = (wb[i] ?? -1) - (wa[i] ?? -1);
    if (d !== 0) return d;
  }
  return b.places.length - a.places.length || Number(a.id.slice(1)) - Number(b.id.slice(1));
}

function lineData(line: SweepLine, data: ReadonlyMap<string, ModuleData>): ModuleData[] {
  // a module shared by two places of one line (never for distinct (n, k)) is read at each
  return line.places.flatMap((p) => {
    const d = data.get(p.key);
    return d ? [{ ...d, n: p.n, ...(p.k !== undefined ? { k: p.k } : {}) }] : [];
  });
}

export function analyse(plan: SweepPlan, outcomes: ReadonlyMap<string, ModuleOutcome>, cat: Catalogue | undefined): SweepAnalysis {
  const data = new Map<string, ModuleData>();
  for (const [key, o] of outcomes) if (o.status === 'kept' || o.status === 'computed') data.set(key, moduleData(key, o.document));
  const iso = isomorphismCandidates(plan.lines, data);
  const rows = plan.lines.map((line) => {
    const ds = lineData(line, data);
    const findings = [...hilbertFindings(ds), ...dimensionFindings(ds), ...tableFindings(ds), ...(cat ? identify(cat, line.seed, ds) : []), ...(iso.findings.get(line.id) ?? [])];
    const places: RowPlace[] = line.places.flatMap((p) => {
      const d = data.get(p.key);
      return d ? [{ ...p, dimension: d.dimension.toString(), hilbert: d.byX.toString() }] : [];
    });
    const missing = line.places.flatMap((p) => {
      const o = outcomes.get(p.key);
      return o && (o.status === 'skipped' || o.status === 'failed') ? [{ ...p, why: o.why }] : [];
    });
    return { rank: 0, id: line.id, seed: line.seed, ops: line.ops, places, left: line.left, missing, findings: sortFindings(findings), reproduce: reproduceCommands(line, places) };
  });
  const ranked = rows.filter((r) => r.places.length > 0).sort(compareRows).map((r, i) => ({ ...r, rank: i + 1 }));
  const empty = rows.filter((r) => r.places.length === 0);
  const maxN = cat?.maxN() ?? -1;
  const catalogueNote =
    !cat ? 'no catalogue: statistics were not searched' : maxN < 0 ? `the catalogue ${cat.path} holds no distributions: statistics were not searched (fill it with gradus catalogue build --n-max N)` : cat.unfinishedNote();
  return { rows: [...ranked, ...empty], isomorphism: iso.groups, ...(catalogueNote ? { catalogueNote } : {}) };
}
