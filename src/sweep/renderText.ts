/** The plain-text report of a sweep: counts, then the ranked seeds with their findings. */
import { countsText, rowDimensionsText, rowKindsText, rowPlacesText, stateText } from './summary.js';
import type { SweepDocument } from './sweepDocument.js';

export function sweepText(d: SweepDocument, limit: number, findingsPerRow = 3): string[] {
  const lines: string[] = [];
  lines.push(`gradus ${d.key}`);
  lines.push(`sweep:${d.id}, ${stateText(d)}`);
  lines.push(countsText(d));
  if (d.catalogueNote) lines.push(`note: ${d.catalogueNote}`);
  const rows = d.rows.filter((r) => r.places.length > 0);
  lines.push('');
  lines.push(`${rows.length} seed${rows.length === 1 ? '' : 's'} ranked, most remarkable first${rows.length > limit ? ` (the first ${limit}; --limit for more)` : ''}:`);
  for (const r of rows.slice(0, limit)) {
    lines.push(`${String(r.rank).padStart(4)}. ${r.seed}  [${r.ops.join(',')}]  ${rowPlacesText(r)}, ${rowDimensionsText(r)}`);
    lines.push(`      ${rowKindsText(r)}`);
    for (const f of r.findings.slice(0, findingsPerRow)) lines.push(`      · ${f.claim}  (${f.verified})`);
    if (r.findings.length > findingsPerRow) lines.push(`      · … ${r.findings.length - findingsPerRow} more (gradus sweep show sweep:${d.id} --json)`);
    for (const m of r.missing) lines.push(`      ! n=${m.n}${m.k !== undefined ? `, k=${m.k}` : ''}: ${m.why}`);
  }
  const empty = d.rows.filter((r) => r.places.length === 0);
  if (empty.length) lines.push(`${empty.length} seed${empty.length === 1 ? '' : 's'} with no module computed (vanishing, not defined, or skipped everywhere)`);
  if (d.isomorphism.length) lines.push(`${d.isomorphism.length} group${d.isomorphism.length === 1 ? '' : 's'} of different seeds with equal series (isomorphism candidates)`);
  return lines;
}
