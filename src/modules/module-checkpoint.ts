/**
 * Resumable module and quotient runs: a JSON-lines file whose first line names our format and
 * the request, and whose other lines are finished units of work — a Young-subgroup task (its
 * ranks in every cell, for both primes), a whole one-prime run (its cells) or a quotient task
 * (the dimensions of its cells for one Young functional) — each with a check that ties it to
 * the request. A file is only written after it has been read as ours: anything else at the
 * path is refused untouched. A line torn by a kill is dropped; an edited line is refused.
 */
import { createHash } from 'node:crypto';
import { appendFileSync, linkSync, readFileSync, rmSync, statSync, truncateSync, writeFileSync } from 'node:fs';
import { z } from 'zod';
import { environmentReason } from '../core/environment-errors.js';
import { InputError } from '../core/errors.js';
import { parseWith } from '../core/schema.js';
import { stableJson } from '../core/stable-json.js';
import type { ModuleCell } from './module-cell.js';
import type { QuotientTaskResult } from './quotient-spec.js';

const FORMAT = 'gradus-checkpoint';
const VERSION = 1;

const COUNT = z.number().int().min(0).max(2 ** 53);
const TASK_LINE = z.object({ task: z.number().int().min(0).max(100_000), ranks: z.array(z.array(COUNT)), check: z.string() });
const CELL = z.object({ degree: z.tuple([COUNT, COUNT, COUNT]), dim: COUNT, multiplicities: z.array(z.number().int()).optional() });
const PRIME_LINE = z.object({ prime: z.number().int().min(2).max(2 ** 26), cells: z.array(CELL), check: z.string() });
const QUOTIENT_LINE = z.object({
  piece: z.string().max(2000),
  result: z.object({
    functional: z.number().int().min(0).max(100_000),
    primes: z.array(z.number().int().min(2).max(2 ** 26)).max(8),
    degrees: z.array(z.tuple([COUNT, COUNT, COUNT])),
    dims: z.array(z.array(z.number().int().min(-1).max(2 ** 53))),
    certificate: z.array(z.boolean()),
    stats: z.object({ columns: COUNT, rows: COUNT, zero: COUNT, applied: COUNT }),
  }),
  check: z.string(),
});
const LINE = z.union([TASK_LINE, PRIME_LINE, QUOTIENT_LINE]);

export class ModuleCheckpoint {
  private readonly tasks = new Map<number, number[][]>();
  private readonly primes = new Map<number, ModuleCell[]>();
  private readonly pieces = new Map<string, QuotientTaskResult>();
  private readonly header: string;
  /** Units read from the file (not recomputed). */
  readonly reused: number;

  /** Open FILE for a request (all fields that affect the result), or create it; InputError on anything else. */
  constructor(readonly file: string, request: Record<string, unknown>) {
    this.header = stableJson({ format: FORMAT, version: VERSION, request });
    const text = this.readOrCreate();
    if (text === undefined) {
      this.reused = 0;
      return;
    }
    const end = text.lastIndexOf('\n') + 1;
    const lines = text.slice(0, end).split('\n').filter((l) => l.length > 0);
    this.checkHeader(lines[0], request);
    for (const [i, line] of lines.slice(1).entries()) this.readLine(line, i + 2);
    // a torn last line (a kill during an append) is dropped, so appends start on a fresh line;
    // the file is ours (its first line and every line before were checked)
    if (end < text.length) truncateSync(file, Buffer.byteLength(text.slice(0, end)));
    this.reused = this.tasks.size + this.primes.size + this.pieces.size;
  }

  /** The file's text, or undefined when it was just created with our first line. */
  private readOrCreate(): string | undefined {
    let st;
    try {
      st = statSync(this.file);
    } catch {
      st = undefined;
    }
    if (!st) {
      // written beside it, then linked in place: the file appears whole, and a file made at
      // the same moment by another run is never overwritten (link fails on an existing name)
      const tmp = `${this.file}.${process.pid}.${Date.now()}.tmp`;
      try {
        writeFileSync(tmp, `${this.header}\n`, { flag: 'wx' });
        linkSync(tmp, this.file);
        return undefined;
      } catch (e) {
        if ((e as NodeJS.ErrnoException).code !== 'EEXIST') throw new InputError(`--resume: cannot write ${this.file} (${environmentReason(e) ?? (e as NodeJS.ErrnoException).code ?? (e as Error).message})`, 'resume');
      } finally {
        rmSync(tmp, { force: true });
      }
      st = statSync(this.file);
    }
    if (!st.isFile()) throw new InputError(`--resume: ${this.file} is not a regular file; give a file name for the checkpoint`, 'resume');
    try {
      return readFileSync(this.file, 'utf8');
    } catch (e) {
      throw new InputError(`--resume: cannot read ${this.file} (${environmentReason(e) ?? (e as Error).message})`, 'resume');
    }
  }

  private checkHeader(line: string | undefined, request: Record<string, unknown>): void {
    let first: unknown;
    try {
      first = line === undefined ? undefined : JSON.parse(line);
    } catch {
      first = undefined;
    }
    const o = first as { format?: unknown; version?: unknown; request?: Record<string, unknown> } | undefined;
    if (!o || o.format !== FORMAT) throw new InputError(`--resume: ${this.file} is not a module checkpoint of gradus; it is left alone (give a new file name)`, 'resume');
    if (o.version !== VERSION) throw new InputError(`--resume: ${this.file} is a checkpoint of version ${String(o.version)}; this gradus writes version ${VERSION} (give a new file name)`, 'resume');
    if (stableJson(first) !== this.header) {
      const got = o.request ?? {};
      const diff = Object.keys({ ...request, ...got }).filter((k) => stableJson(got[k]) !== stableJson(request[k]));
      throw new InputError(`--resume: ${this.file} was written for another request (differs in ${diff.join(', ') || 'format'}); use a new file or repeat that request`, 'resume');
    }
  }

  private check(payload: unknown): string {
    return createHash('sha1').update(this.header).update('\n').update(stableJson(payload)).digest('hex').slice(0, 20);
  }

  private readLine(line: string, lineNo: number): void {
    let raw: unknown;
    try {
      raw = JSON.parse(line);
    } catch {
      throw new InputError(`--resume: line ${lineNo} of ${this.file} is damaged (only a torn last line is dropped); use a new file`, 'resume');
    }
    const e = parseWith(LINE, raw, `--resume: line ${lineNo} of ${this.file}`, 'resume');
    const { check, ...payload } = e;
    if (check !== this.check(payload)) throw new InputError(`--resume: line ${lineNo} of ${this.file} was changed after gradus wrote it (its check does not match); use a new file`, 'resume');
    if ('task' in e) this.tasks.set(e.task, e.ranks);
    else if ('piece' in e) this.pieces.set(e.piece, e.result);
    else this.primes.set(e.prime, e.cells as ModuleCell[]);
  }

  private append(payload: Record<string, unknown>): void {
    try {
      appendFileSync(this.file, `${JSON.stringify({ ...payload, check: this.check(payload) })}\n`);
    } catch (e) {
      throw new InputError(`--resume: cannot write ${this.file} (${environmentReason(e) ?? (e as Error).message})`, 'resume');
    }
  }

  /** Ranks per prime of a recorded task. */
  task(i: number): number[][] | undefined {
    return this.tasks.get(i);
  }

  recordTask(task: number, ranks: number[][]): void {
    this.tasks.set(task, ranks);
    this.append({ task, ranks });
  }

  cells(prime: number): ModuleCell[] | undefined {
    return this.primes.get(prime);
  }

  recordCells(prime: number, cells: readonly ModuleCell[]): void {
    this.primes.set(prime, [...cells]);
    this.append({ prime, cells: cells.map((c) => ({ degree: c.degree, dim: c.dim, ...(c.multiplicities ? { multiplicities: c.multiplicities } : {}) })) });
  }

  /** A recorded quotient task, by the key of its work (functional, primes, degree bounds). */
  piece(key: string): QuotientTaskResult | undefined {
    return this.pieces.get(key);
  }

  recordPiece(key: string, result: QuotientTaskResult): void {
    this.pieces.set(key, result);
    this.append({ piece: key, result: { functional: result.functional, primes: result.primes, degrees: result.degrees, dims: result.dims, certificate: result.certificate, stats: result.stats } });
  }

  note(): string {
    return `${this.reused} finished unit${this.reused === 1 ? '' : 's'} (Young-subgroup tasks, one-prime runs or quotient tasks) read from the checkpoint ${this.file}`;
  }

  /** The given task indices not yet recorded. */
  missingTasks(tasks: readonly number[]): number[] {
    return tasks.filter((i) => !this.tasks.has(i));
  }

  /** Put the recorded tasks' ranks into ranks[prime][task]. */
  fillTasks(ranks: number[][][]): number[][][] {
    for (const [t, r] of this.tasks) r.forEach((perPrime, pi) => (ranks[pi]![t] = perPrime));
    return ranks;
  }
}
