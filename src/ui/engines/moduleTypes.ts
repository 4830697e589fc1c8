/**
 * What the Modules screen shows of a computed module, as plain data that crosses the
 * worker boundary: the multigraded Hilbert table, the Frobenius series of each cell as
 * text, the findings, and the engine's own JSON document (kept whole for export).
 */

export interface ModuleCell {
  /** Exponents, one per axis, in the order of `axes`. */
  readonly exps: readonly number[];
  /** Dimension as a decimal string (BigInt does not cross the worker boundary as such). */
  readonly dim: string;
  /** Frobenius series of the cell in the Schur basis, as text (empty when not computed). */
  readonly frobenius: string;
}

export interface ModuleFinding {
  readonly label: string;
  /** undefined: not applicable or not decided. */
  readonly holds: boolean | undefined;
  readonly detail: string;
}

export interface ModuleOutcome {
  readonly title: string;
  readonly n: number;
  readonly k?: number;
  readonly axes: readonly string[];
  readonly cells: readonly ModuleCell[];
  readonly dimension: string;
  readonly findings: readonly ModuleFinding[];
  /** How exact the result is (primes used, confirmation). */
  readonly exactness: string;
  readonly elapsedMs: number;
  /** The engine's JSON document for this module (the `--json` output of the command line). */
  readonly json: unknown;
}

/** The Hilbert table of two axes (rows = second axis, columns = first), summing any others. */
export function tableOf(outcome: ModuleOutcome, colAxis = 0, rowAxis = 1): bigint[][] {
  const rows: bigint[][] = [];
  let cols = 0;
  for (const c of outcome.cells) cols = Math.max(cols, (c.exps[colAxis] ?? 0) + 1);
  for (const c of outcome.cells) {
    const i = outcome.axes.length > 1 ? (c.exps[rowAxis] ?? 0) : 0;
    const j = c.exps[colAxis] ?? 0;
    while (rows.length <= i) rows.push(new Array<bigint>(cols).fill(0n));
    rows[i]![j] = (rows[i]![j] ?? 0n) + BigInt(c.dim);
  }
  return rows.length ? rows : [[0n]];
}

/** Cells at table position (row, col): one cell for two axes, several for more. */
export function cellsAt(outcome: ModuleOutcome, row: number, col: number, colAxis = 0, rowAxis = 1): ModuleCell[] {
  return outcome.cells.filter((c) => (c.exps[colAxis] ?? 0) === col && (outcome.axes.length > 1 ? (c.exps[rowAxis] ?? 0) : 0) === row);
}
