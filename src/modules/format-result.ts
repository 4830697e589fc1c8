/**
 * Renderings of a ModuleResult: the JSON document of the command line (axes in the order
 * x, y, θ; Hilbert table and Schur coefficients in the same nested shape: 1 axis an array,
 * 2 axes [i][j] = coefficient of q^i t^j) and the plain text report.
 */
import { partitionList } from '../core/partitions.js';
import { AXIS_LABEL, type ModuleResult } from './module-result.js';
import { frobeniusTables, hilbertTable, tableToPoly, type Nested } from './tables.js';

export function resultToJson(r: ModuleResult): Record<string, unknown> {
  const hilbert = hilbertTable(r.cells, r.axes);
  const doc: Record<string, unknown> = {
    [r.kind === 'module' ? 'seed' : 'ideal']: r.name,
    description: r.description,
    n: r.n,
    k: r.k ?? null,
    ops: r.ops,
    axes: r.axes,
    dimension: r.cells.reduce((s, c) => s + c.dim, 0),
    hilbert,
    hilbertSeries: hilbert,
  };
  if (r.frobenius) doc['schur'] = Object.fromEntries(frobeniusTables(r.n, r.cells, r.axes));
  doc['checks'] = r.checks;
  doc['provenance'] = r.provenance;
  return doc;
}

const VARS = ['q', 't', 'u'];

/** The Hilbert table as text lines (one, two or three axes). */
export function tableLines(table: Nested, axes: readonly string[]): string[] {
  if (axes.length === 1) {
    const row = table as number[];
    const w = Math.max(...row.map((v) => String(v).length), String(row.length - 1).length + 2);
    return [`  ${axes[0]}-degree ${row.map((_, i) => String(i).padStart(w)).join(' ')}`, `  dimension${' '.repeat(Math.max(0, axes[0]!.length - 1))}${row.map((v) => String(v).padStart(w)).join(' ')}`];
  }
  if (axes.length === 2) {
    const rows = table as number[][];
    // Wide enough for every value and every column label ("y=10"), with a space before each.
    const labelW = Math.max(0, ...(rows[0] ?? []).map((_, j) => `${axes[1]}=${j}`.length + 1));
    const w = Math.max(4, labelW, ...rows.flat().map((v) => String(v).length + 1));
    const head = `  ${''.padEnd(6)}${(rows[0] ?? []).map((_, j) => `${axes[1]}=${j}`.padStart(w)).join('')}`;
    return [head, ...rows.map((row, i) => `  ${`${axes[0]}=${i}`.padEnd(6)}${row.map((v) => String(v).padStart(w)).join('')}`)];
  }
  return (table as Nested[]).flatMap((slice, i) => [`  ${axes[0]}=${i}:`, ...tableLines(slice, axes.slice(1)).map((l) => '  ' + l)]);
}

export function resultToText(r: ModuleResult): string {
  const labels = r.axes.map((a) => AXIS_LABEL[a]);
  const hilbert = hilbertTable(r.cells, r.axes);
  const lines: string[] = [];
  lines.push(`${r.description} (n = ${r.n}${r.k !== undefined ? `, k = ${r.k}` : ''})`);
  lines.push(`dimension ${r.cells.reduce((s, c) => s + c.dim, 0)}`);
  lines.push('');
  lines.push(`Hilbert table (${r.axes.length === 1 ? `by ${labels[0]}-degree` : `rows: ${labels[0]}-degree, columns: ${labels[1]}-degree${r.axes.length === 3 ? `, blocks: ${labels[0]}-degree` : ''}`})`);
  lines.push(...tableLines(hilbert, labels));
  if (r.axes.length <= 2) {
    const vars = r.axes.map((a, i) => `${VARS[i]} marks ${AXIS_LABEL[a]}-degree`).join(', ');
    lines.push(`Hilbert series (${vars}): ${tableToPoly(hilbert, r.axes.length).toString()}`);
  }
  if (r.frobenius) {
    lines.push('');
    lines.push('Frobenius series (Schur expansion)');
    const tables = frobeniusTables(r.n, r.cells, r.axes);
    if (r.axes.length <= 2) {
      const w = Math.max(...[...tables.keys()].map((l) => l.length)) + 3;
      for (const [lam, t] of tables) lines.push(`  ${`s(${lam})`.padEnd(w)} ${tableToPoly(t, r.axes.length).toString()}`);
    } else {
      const shapes = partitionList(r.n);
      for (const c of r.cells) {
        const terms = (c.multiplicities ?? []).map((m, i) => (m === 0 ? '' : `${m === 1 ? '' : `${m} `}s(${shapes[i]!.join(',')})`)).filter(Boolean);
        lines.push(`  ${r.axes.map((a) => `${AXIS_LABEL[a]}=${c.degree[['x', 'y', 'theta'].indexOf(a)]}`).join(' ')}: ${terms.join(' + ')}`);
      }
    }
  }
  lines.push('');
  lines.push('checks');
  for (const f of r.checks) lines.push(`  ${f.holds === null ? 'n/a  ' : f.holds ? 'holds' : 'FAILS'}  ${f.check}: ${f.detail}`);
  lines.push('');
  const pv = r.provenance;
  lines.push('provenance');
  lines.push(`  ${pv.confirmation}`);
  lines.push(`  method: ${pv.method}`);
  for (const note of pv.notes) lines.push(`  note: ${note}`);
  lines.push(`  time: ${pv.seconds.toFixed(2)} s; gradus ${pv.version}`);
  return lines.join('\n');
}
