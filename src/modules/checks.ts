/**
 * Findings reported with every table (never assumed): Schur positivity, symmetry of the
 * Hilbert table (half-turn, and transpose for two axes), invariance of the Frobenius table
 * under ω combined with a half-turn, unimodality of every row and column.
 */
import { conjugate, partitionKey, partitionList } from '../core/partitions.js';
import type { ModuleCell } from './module-cell.js';
import { AXIS_INDEX, AXIS_LABEL, type Axis, type Finding } from './module-result.js';

function cellKey(d: readonly number[]): string {
  return d.join(',');
}

export function moduleChecks(n: number, cells: readonly ModuleCell[], axes: readonly Axis[]): Finding[] {
  const idx = axes.map((a) => AXIS_INDEX[a]);
  const at = new Map<string, ModuleCell>();
  for (const c of cells) if (c.dim > 0) at.set(cellKey(idx.map((i) => c.degree[i])), c);
  const live = [...at.values()];
  const lo = idx.map((i) => Math.min(...live.map((c) => c.degree[i])));
  const hi = idx.map((i) => Math.max(...live.map((c) => c.degree[i])));
  const coords = (c: ModuleCell): number[] => idx.map((i) => c.degree[i]);
  const label = (d: readonly number[]): string => axes.map((a, j) => `${AXIS_LABEL[a]}=${d[j]}`).join(' ');
  const findings: Finding[] = [];
  const hasFrob = live.length > 0 && live.every((c) => c.multiplicities);

  // Schur positivity
  if (hasFrob) {
    const shapes = partitionList(n);
    const bad = live.find((c) => c.multiplicities!.some((m) => m < 0));
    findings.push({
      check: 'Schur positivity',
      holds: !bad,
      detail: bad ? `fails at ${label(coords(bad))}: s(${partitionKey(shapes[bad.multiplicities!.findIndex((m) => m < 0)]!)}] has a negative coefficient` : 'every coefficient of every cell is ≥ 0',
    });
  } else findings.push({ check: 'Schur positivity', holds: null, detail: 'no Frobenius series (S_n does not act, or not requested)' });

  // half-turn symmetry of the Hilbert table
  const turn = (d: readonly number[]): number[] => d.map((v, j) => lo[j]! + hi[j]! - v);
  const dimAt = (d: readonly number[]): number => at.get(cellKey(d))?.dim ?? 0;
  const badTurn = live.find((c) => dimAt(turn(coords(c))) !== c.dim);
  findings.push({
    check: 'Hilbert table symmetric under a half-turn',
    holds: !badTurn,
    detail: badTurn ? `fails at ${label(coords(badTurn))} (${badTurn.dim} vs ${dimAt(turn(coords(badTurn)))} at ${label(turn(coords(badTurn)))})` : `dim at d equals dim at ${axes.length === 1 ? 'the reversed degree' : 'the opposite corner'} for every cell`,
  });
  if (axes.length === 2 && axes[0] === 'x' && axes[1] === 'y') {
    const badT = live.find((c) => dimAt([coords(c)[1]!, coords(c)[0]!]) !== c.dim);
    findings.push({
      check: 'Hilbert table symmetric under transposition',
      holds: !badT,
      detail: badT ? `fails at ${label(coords(badT))} (${badT.dim} vs ${dimAt([coords(badT)[1]!, coords(badT)[0]!])})` : 'dim(i, j) = dim(j, i) for every cell',
    });
  }

  // ω combined with a half-turn
  if (hasFrob) {
    const shapes = partitionList(n);
    const conjIndex = shapes.map((l) => shapes.findIndex((m) => partitionKey(m) === partitionKey(conjugate(l))));
    let bad: ModuleCell | undefined;
    for (const c of live) {
      const other = at.get(cellKey(turn(coords(c))));
      if (!other || c.multiplicities!.some((m, i) => other.multiplicities![conjIndex[i]!] !== m)) {
        bad = c;
        break;
      }
    }
    findings.push({
      check: 'Frobenius table invariant under ω with a half-turn',
      holds: !bad,
      detail: bad ? `fails at ${label(coords(bad))} against ${label(turn(coords(bad)))}` : 'Frob at d equals ω Frob at the opposite corner for every cell',
    });
  } else findings.push({ check: 'Frobenius table invariant under ω with a half-turn', holds: null, detail: 'no Frobenius series' });

  // unimodality of every line parallel to an axis
  let badLine: string | undefined;
  for (let j = 0; j < axes.length && !badLine; j++) {
    const lines = new Map<string, number[]>();
    for (const c of live) {
      const d = coords(c);
      const rest = d.filter((_, m) => m !== j);
      const key = cellKey(rest);
      const line = lines.get(key) ?? new Array<number>(hi[j]! + 1).fill(0);
      line[d[j]!] = c.dim;
      lines.set(key, line);
    }
    for (const [key, line] of lines) {
      const seq = line.slice(lo[j]!);
      if (!isUnimodal(seq)) {
        badLine = `fails along ${AXIS_LABEL[axes[j]!]}${axes.length > 1 ? ` at ${axes.filter((_, m) => m !== j).map((a) => AXIS_LABEL[a]).join(',')}=${key}` : ''}: ${seq.join(' ')}`;
        break;
      }
    }
  }
  findings.push({ check: 'unimodal rows and columns', holds: !badLine, detail: badLine ?? (axes.length === 1 ? 'the dimension sequence is unimodal' : 'every row and column of the dimension table is unimodal') });
  return findings;
}

/** Weakly increasing then weakly decreasing (interior zeros break unimodality). */
export function isUnimodal(seq: readonly number[]): boolean {
  let s = seq.slice();
  while (s.length && s[0] === 0) s = s.slice(1);
  while (s.length && s[s.length - 1] === 0) s = s.slice(0, -1);
  let i = 0;
  while (i + 1 < s.length && s[i + 1]! >= s[i]!) i++;
  while (i + 1 < s.length && s[i + 1]! <= s[i]!) i++;
  return i >= s.length - 1;
}
