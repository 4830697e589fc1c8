/**
 * Findings on the tables of a seed's modules, holding at every place: the module checks
 * (invariance of the Frobenius table under ω with a half-turn, a symmetric Hilbert table,
 * unimodal rows and columns), and Schur-unimodality along the x-degree — Frob_d − Frob_{d−1}
 * Schur-positive up to a peak and Schur-negative after it — which, unlike Schur positivity of
 * each cell (every cell is an S_n-module), the module structure does not give.
 */
import { finding, type FindingKind, type SweepFinding } from './findings.js';
import type { ModuleData } from './moduleData.js';

const CHECKS: readonly { check: RegExp; kind: FindingKind; claim: string }[] = [
  { check: /^Frobenius table invariant under ω with a half-turn$/, kind: 'omega-symmetry', claim: 'Frobenius table invariant under ω combined with a half-turn of the table' },
  { check: /^Hilbert table symmetric under a half-turn$/, kind: 'symmetric', claim: 'Hilbert table symmetric under a half-turn' },
  { check: /^Hilbert table symmetric under transposition$/, kind: 'symmetric', claim: 'Hilbert table symmetric under transposition (x ↔ y)' },
  { check: /^unimodal rows and columns$/, kind: 'unimodal', claim: 'every row and column of the dimension table is unimodal' },
];

function placesOf(data: readonly ModuleData[]) {
  return data.map((d) => ({ n: d.n, ...(d.k !== undefined ? { k: d.k } : {}) }));
}

function checkFindings(data: readonly ModuleData[]): SweepFinding[] {
  const out: SweepFinding[] = [];
  for (const c of CHECKS) {
    const states = data.map((d) => d.checks.find((x) => c.check.test(x.check))?.holds);
    if (!states.every((s) => s === true)) continue;
    // a one-cell table is symmetric and unimodal without saying anything
    if (data.every((d) => d.cells.length <= 1)) continue;
    const single = data.every((d) => d.axes.length === 1);
    const claim = c.kind === 'unimodal' && single ? 'the dimensions by degree are unimodal' : c.claim;
    out.push(finding(c.kind, claim, "the module engine's check of every cell", placesOf(data)));
  }
  return out;
}

type Vector = ReadonlyMap<string, number>;

function difference(a: Vector | undefined, b: Vector | undefined): Map<string, number> {
  const out = new Map<string, number>();
  for (const [k, v] of a ?? []) out.set(k, v);
  for (const [k, v] of b ?? []) out.set(k, (out.get(k) ?? 0) - v);
  return out;
}

/** +1 Schur-positive (and nonzero), −1 Schur-negative, 0 zero, undefined mixed. */
function signOf(v: ReadonlyMap<string, number>): number | undefined {
  let pos = false;
  let neg = false;
  for (const x of v.values()) {
    if (x > 0) pos = true;
    if (x < 0) neg = true;
  }
  if (pos && neg) return undefined;
  return pos ? 1 : neg ? -1 : 0;
}

/** Each line of fixed other degrees: Frobenius by x-degree rises then falls in the Schur order. Returns the longest line, or −1 when some line fails. */
function schurUnimodal(d: ModuleData): number {
  const lines = new Map<string, Map<number, Vector>>();
  for (const c of d.cells) {
    if (!c.schur) return -1;
    const rest = c.degree.slice(1).join(',');
    const line = lines.get(rest) ?? new Map<number, Vector>();
    line.set(c.degree[0]!, c.schur);
    lines.set(rest, line);
  }
  let longest = 0;
  for (const line of lines.values()) {
    const ds = [...line.keys()];
    const lo = Math.min(...ds);
    const hi = Math.max(...ds);
    longest = Math.max(longest, hi - lo + 1);
    let falling = false;
    for (let x = lo; x <= hi + 1; x++) {
      const s = signOf(difference(line.get(x), line.get(x - 1)));
      if (s === undefined) return -1;
      if (x > lo && x <= hi && !line.has(x)) return -1; // a gap inside the line
      if (s < 0) falling = true;
      else if (s > 0 && falling) return -1;
    }
  }
  return longest;
}

function schurUnimodalFinding(data: readonly ModuleData[]): SweepFinding | undefined {
  if (data.some((d) => !d.frobenius)) return undefined;
  const lengths = data.map(schurUnimodal);
  if (lengths.some((l) => l < 0) || Math.max(...lengths) < 3) return undefined;
  const rows = data.some((d) => d.axes.length > 1) ? ` in every line of fixed ${data[0]!.axes.slice(1).map((a) => (a === 'theta' ? 'θ' : a)).join(', ')}-degree` : '';
  return finding(
    'schur-unimodal',
    `Schur-unimodal along the x-degree${rows}: Frob_d − Frob_{d−1} is Schur-positive up to a peak and Schur-negative after it (not implied by the module structure)`,
    'exact Schur multiplicities of every cell',
    placesOf(data),
  );
}

export function tableFindings(data: readonly ModuleData[]): SweepFinding[] {
  if (data.length === 0) return [];
  const out = checkFindings(data);
  const su = schurUnimodalFinding(data);
  if (su) out.push(su);
  return out;
}
