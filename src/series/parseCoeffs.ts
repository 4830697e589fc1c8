/**
 * Coefficients typed on the command line: entries separated by ";", each
 * "n=4:1,3,5,3,1" or "n=4,k=2:1,2,1"; a q,t table writes its rows (one per power of q)
 * separated by "|", e.g. "n=2:1,1|1".
 */
import { InputError } from '../core/errors.js';
import { Poly } from '../core/poly.js';
import { shown } from '../core/shown.js';
import { qtSeries } from './series.js';
import { makeTarget, type Target, type TargetEntry } from './target.js';

const ENTRY = /^n\s*=\s*(\d+)\s*(?:,\s*k\s*=\s*(\d+)\s*)?:(.*)$/;

export function parseCoeffs(text: string): Target {
  if (text.length > 1_000_000) throw new InputError(`--coeffs has ${text.length} characters; use --target-file for large targets`, 'coeffs');
  const parts = text.split(';').map((s) => s.trim()).filter((s) => s !== '');
  if (parts.length === 0) throw new InputError('--coeffs needs entries such as "n=3:1,2,2,1;n=4:1,3,5,6,5,3,1"', 'coeffs');
  const entries: TargetEntry[] = parts.map((p) => {
    const m = ENTRY.exec(p);
    if (!m) throw new InputError(`--coeffs: each entry is n=N:c0,c1,… or n=N,k=K:c0,c1,… (got "${shown(p, 60)}")`, 'coeffs');
    if (Number(m[1]) > 64 || Number(m[2] ?? 0) > 64) throw new InputError(`--coeffs: n and k go up to 64 (got "${shown(p, 60)}")`, 'coeffs');
    const rows = m[3]!.split('|').map((row) =>
      row.split(',').map((c) => {
        const s = c.trim();
        if (!/^-?\d{1,2000}$/.test(s)) throw new InputError(`--coeffs: coefficients must be integers (got "${shown(s, 40)}" in "${shown(p, 60)}")`, 'coeffs');
        return BigInt(s);
      }),
    );
    const poly = rows.length === 1 ? Poly.fromQCoeffs(rows[0]!) : Poly.fromQTTable(rows);
    return { n: Number(m[1]), ...(m[2] === undefined ? {} : { k: Number(m[2]) }), series: qtSeries(poly) };
  });
  return makeTarget(`coefficients typed: ${text}`, entries);
}
