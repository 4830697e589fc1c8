/**
 * One task of the quotient route: the dimensions of (R/I)^{G,χ} in every multidegree cell, for
 * one Young subgroup G with a character χ (young-plan), for one or more primes. The G,χ-part of
 * I is spanned by the folded products g·m (generator g, m an orbit representative of the
 * complementary degree); a cell's dimension is #representatives − rank.
 *
 * Most of those products are redundant, and an incremental criterion in the manner of
 * signature-based Gröbner algorithms (Faugère's F5) skips them before they are built: with
 * generators taken in a fixed order and cells by increasing total degree, the product g_k·m
 * lies in the span of products of earlier generators and of g_k·m' with m' below m whenever
 * m is the lead of some element of (g_1, …, g_{k−1}) in its own cell (multiply that element
 * by g_k: the syzygy gives the dependency); for an odd g_k also when m leads an element of
 * (g_1, …, g_k), since g_k² = 0. Every stored row remembers the generator that made it, so
 * each cell records, for every representative, which generator first led there. Rows are
 * built once and reduced for every prime; a row is skipped only when every prime allows it.
 *
 * A pure function of structured-clonable data (quotient-spec.ts): worker pools can run it.
 */
import { InputError } from '../core/errors.js';
import { CellOrbits, type CellDegree } from './cell-orbits.js';
import { KeyTable } from './key-table.js';
import { RowBuilder, type GeneratorTerm } from './quotient-rows.js';
import { cellsOfTotal, topDegree, yRadixOf, type QuotientGenerator, type QuotientTask, type QuotientTaskInput, type QuotientTaskResult } from './quotient-spec.js';
import { SparseEchelonModP } from './sparse-echelon.js';

interface CellData {
  /** Representative codes, increasing (the column order). */
  readonly codes: Float64Array;
  /** Per prime: the index of the generator whose row leads at each representative, or −1. */
  readonly creator: readonly Int16Array[];
  readonly orbits: CellOrbits;
}

export function runQuotientTask(
  input: QuotientTaskInput,
  task: QuotientTask,
  onCell?: (columns: number, cell: CellDegree, certificate: boolean) => void,
  signal?: AbortSignal,
): QuotientTaskResult {
  const { n, generators } = input;
  const fn = input.functionals[task.functional];
  if (!fn) throw new InputError(`no functional ${task.functional}`, 'functional');
  const primes = task.primes;
  const maxDegree = topDegree(task);
  const yR = yRadixOf(input, maxDegree);
  // integer generators: rows built once with exact entries serve every prime; otherwise one build per prime
  const exact = generators.every((g) => (g.terms ?? []).every((t) => t.den === '1' && Math.abs(Number(t.num)) < 2 ** 20));
  const moduli = exact ? [0] : primes;
  const terms = moduli.map((p) => generators.map((g) => g.terms?.map((t): GeneratorTerm => ({ x: t.x, y: t.y, mask: t.mask, coeff: p ? residue(t.num, t.den, p) : Number(t.num) }))));
  const builders = moduli.map((p) => new RowBuilder(n, p, yR));
  let scratch: Float64Array = new Float64Array(64);
  const maxGenTotal = Math.max(0, ...generators.map((g) => g.degree[0] + g.degree[1] + g.degree[2]));
  const flipped = fn.alt.map((a) => !a);
  const cells = new Map<string, CellData>();
  const degrees: [number, number, number][] = [];
  const certificate: boolean[] = [];
  const dims: number[][] = primes.map(() => []);
  const stats = { columns: 0, rows: 0, zero: 0, applied: 0 };
  const letters = new Int32Array(n);

  for (let total = 0; total <= maxDegree; total++) {
    for (const { cell, certificate: cert } of cellsOfTotal(input, task, total)) {
      signal?.throwIfAborted();
      const orbits = new CellOrbits(n, fn.blocks, fn.alt, yR, cell, input.xCap);
      const codeList: number[] = [];
      orbits.enumerate((_, code) => codeList.push(code));
      // columns by increasing code: rows come with small leads first and reduce through short chains
      const codes = Float64Array.from(codeList).sort();
      const N = codes.length;
      // a flat table when the code range is small against the columns, hashed otherwise
      const column = new KeyTable(orbits.range <= Math.max(1 << 16, 8 * N) ? orbits.range : Infinity);
      codes.forEach((c, i) => column.set(c, i));
      const active = cert ? [0] : primes.map((_, i) => i);
      const echs = primes.map((p, i) => (active.includes(i) ? new SparseEchelonModP(p, N) : undefined));
      const full = (): boolean => active.every((i) => echs[i]!.rank === N);
      const addRow = (g: QuotientGenerator, k: number, m: Int32Array, use: readonly boolean[]): void => {
        let len = 0;
        for (const i of active) {
          if (!use[i]) continue;
          const b = builders[exact ? 0 : i]!;
          if (!exact || len === 0) len = b.build(g, terms[exact ? 0 : i]![k], m, orbits, column);
          if (len === 0) return;
          stats.rows++;
          const vals = exact ? (scratch = b.residues(primes[i]!, scratch)) : b.vals;
          if (!echs[i]!.insert(b.cols, vals, len, k)) stats.zero++;
        }
      };
      const all = primes.map(() => true);
      for (let k = 0; k < generators.length && !full(); k++) {
        const g = generators[k]!;
        const from = { x: cell.x - g.degree[0], y: cell.y - g.degree[1], theta: cell.theta - g.degree[2] };
        if (from.x < 0 || from.y < 0 || from.theta < 0) continue;
        const src = g.character === 'sym' ? cells.get(key(from)) : undefined;
        if (!src) {
          // g·π_{χ·sgn}(m) for a sign-character g; or a certificate cell's multiplier cell lies outside the task
          new CellOrbits(n, fn.blocks, g.character === 'alt' ? flipped : fn.alt, yR, from, input.xCap).enumerate((m) => addRow(g, k, m, all));
          continue;
        }
        // an odd generator squares to zero, so g_k·(g_k·a + earlier) lies among earlier rows too
        const limit = g.degree[2] % 2 === 1 ? k + 1 : k;
        const use = primes.map(() => true);
        for (let r = 0; r < src.codes.length && !full(); r++) {
          let any = false;
          for (const i of active) {
            const c = src.creator[i]![r]!;
            use[i] = !(c >= 0 && c < limit); // the criterion: m leads an element of (g_1, …, g_{k−1})
            any ||= use[i]!;
          }
          if (!any) continue;
          src.orbits.decode(src.codes[r]!, letters);
          addRow(g, k, letters, use);
        }
      }
      const creator = primes.map((_, i) => {
        const out = new Int16Array(N).fill(-1);
        const e = echs[i];
        if (e) for (let r = 0; r < N; r++) out[r] = e.tagAt(r);
        return out;
      });
      cells.set(key(cell), { codes, creator, orbits });
      degrees.push([cell.x, cell.y, cell.theta]);
      certificate.push(cert);
      primes.forEach((_, i) => dims[i]!.push(echs[i] ? N - echs[i]!.rank : -1));
      stats.columns += N;
      for (const e of echs) stats.applied += e?.applied ?? 0;
      onCell?.(N, cell, cert);
    }
    // a cell serves as multiplier cell up to one generator degree above it
    for (const [k, c] of cells) if (c.orbits.degree.x + c.orbits.degree.y + c.orbits.degree.theta < total - maxGenTotal) cells.delete(k);
  }
  return { functional: task.functional, primes, degrees, dims, certificate, stats };
}

function key(d: CellDegree): string {
  return `${d.x},${d.y},${d.theta}`;
}

function residue(num: string, den: string, p: number): number {
  const P = BigInt(p);
  const a = ((BigInt(num) % P) + P) % P;
  const b = ((BigInt(den) % P) + P) % P;
  if (b === 0n) throw new InputError(`a coefficient's denominator ${den} vanishes mod ${p}`, 'prime');
  let inv = 1n;
  let base = b;
  let e = P - 2n;
  while (e > 0n) {
    if (e & 1n) inv = (inv * base) % P;
    base = (base * base) % P;
    e >>= 1n;
  }
  return Number((a * inv) % P);
}
