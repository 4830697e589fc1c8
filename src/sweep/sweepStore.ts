/**
 * Sweeps kept in the catalogue: each in the results table under its canonical command
 * (`sweep run --family …`) with kind "sweep", beside the modules it computed, which are kept
 * there under their own request keys. No table of its own (no schema change): the row is
 * written whole, checked against its hash and our format when read.
 */
import { InputError } from '../core/errors.js';
import { shown } from '../core/shown.js';
import type { Catalogue } from '../store/catalogue.js';
import { checkSweepDocument, sweepId, type SweepDocument } from './sweepDocument.js';

export const SWEEP_KIND = 'sweep';

export function saveSweep(cat: Catalogue, doc: SweepDocument): void {
  if (!cat.writable) return;
  const largest = Math.max(0, ...doc.rows.flatMap((r) => r.places.map((p) => p.n)));
  cat.saveResult(doc.key, SWEEP_KIND, largest || undefined, undefined, doc, doc.provenance);
}

export function readSweep(cat: Catalogue, key: string): SweepDocument | undefined {
  const doc = cat.getResult(key);
  return doc === undefined ? undefined : checkSweepDocument(doc, `kept sweep "${shown(key, 60)}"`);
}

/** Keys of the kept sweeps, oldest first (read from the results table, which the store owns). */
function sweepKeys(cat: Catalogue): string[] {
  return (cat.db.prepare('SELECT key FROM results WHERE kind = ? ORDER BY id').all(SWEEP_KIND) as { key: string }[]).map((r) => r.key);
}

export function listSweeps(cat: Catalogue): SweepDocument[] {
  return sweepKeys(cat).flatMap((k) => {
    const d = readSweep(cat, k);
    return d ? [d] : [];
  });
}

/** A kept sweep by `sweep:ID` (or its id alone, or its whole command). */
export function findSweep(cat: Catalogue, ref: string): SweepDocument {
  const id = ref.startsWith('sweep:') ? ref.slice(6) : ref;
  if (/^[0-9a-f]{8}$/.test(id)) {
    const hit = sweepKeys(cat).find((k) => sweepId(k) === id);
    if (hit) return readSweep(cat, hit)!;
  } else {
    const key = ref.startsWith('sweep run ') ? ref : `sweep run ${ref}`;
    const d = readSweep(cat, key);
    if (d) return d;
  }
  const known = sweepKeys(cat).length;
  throw new InputError(`no kept sweep ${shown(ref, 60)} in ${cat.path} (${known} kept${known ? '; gradus sweep list names them' : ''})`, 'sweep');
}
