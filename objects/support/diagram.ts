/** Text drawings of Young diagrams and tableaux. */

/** Rows of cells `□`, top row first (English). */
export function drawDiagram(shape: readonly number[]): string {
  return shape.length === 0 ? '(empty diagram)' : shape.map((r) => '□'.repeat(r)).join('\n');
}

/** Rows of entries, right-aligned in columns of equal width, in the order given. */
export function drawRows(rows: readonly (readonly number[])[]): string {
  if (rows.length === 0 || rows.every((r) => r.length === 0)) return '(empty tableau)';
  const w = Math.max(...rows.flat().map((x) => String(x).length));
  return rows.map((r) => r.map((x) => String(x).padStart(w)).join(' ')).join('\n');
}
