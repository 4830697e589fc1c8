/**
 * Resumable module runs: a JSON-lines file whose first line is the request and whose other
 * lines are finished units of work — a Young-subgroup task (its ranks in every cell, for both
 * primes) or a whole one-prime run (its cells). A line torn by a kill is dropped on reading.
 */
import { appendFileSync, existsSync, readFileSync, truncateSync, writeFileSync } from 'node:fs';
import { InputError } from '../core/errors.js';
import type { ModuleCell } from './module-cell.js';

type Entry = { readonly task: number; readonly ranks: number[][] } | { readonly prime: number; readonly cells: ModuleCell[] };

/** JSON with object keys sorted, so equal requests give equal text. */
function stable(v: unknown): string {
  if (Array.isArray(v)) return `[${v.map(stable).join(',')}]`;
  if (v !== null && typeof v === 'object') {
    const o = v as Record<string, unknown>;
    return `{${Object.keys(o).filter((k) => o[k] !== undefined).sort().map((k) => `${JSON.stringify(k)}:${stable(o[k])}`).join(',')}}`;
  }
  return JSON.stringify(v);
}

export class ModuleCheckpoint {
  private readonly tasks = new Map<number, number[][]>();
  private readonly primes = new Map<number, ModuleCell[]>();
  /** Units read from the file (not recomputed). */
  readonly reused: number;

  /** Open or create FILE for a request (all fields that affect the result); InputError on mismatch. */
  constructor(readonly file: string, request: Record<string, unknown>) {
    const header = stable(request);
    const text = existsSync(file) ? readFileSync(file, 'utf8') : '';
    const end = text.lastIndexOf('\n') + 1;
    // drop a torn last line (no newline yet), so appends start on a fresh line
    if (end < text.length) truncateSync(file, Buffer.byteLength(text.slice(0, end)));
    const lines = text.slice(0, end).split('\n').filter((l) => l.length > 0);
    if (lines.length === 0) {
      try {
        writeFileSync(file, `${header}\n`);
      } catch (e) {
        throw new InputError(`--resume: cannot write ${file} (${(e as Error).message})`, 'resume');
      }
      this.reused = 0;
      return;
    }
    let first: unknown;
    try {
      first = JSON.parse(lines[0]!);
    } catch {
      throw new InputError(`--resume: ${file} is not a module checkpoint (its first line is not JSON)`, 'resume');
    }
    if (stable(first) !== header) {
      const got = (first ?? {}) as Record<string, unknown>;
      const diff = Object.keys({ ...request, ...got }).filter((k) => stable(got[k]) !== stable(request[k]));
      throw new InputError(`--resume: ${file} was written for another request (differs in ${diff.join(', ') || 'format'}); use a new file or repeat that request`, 'resume');
    }
    for (const [i, line] of lines.slice(1).entries()) {
      let e: Entry;
      try {
        e = JSON.parse(line) as Entry;
      } catch {
        throw new InputError(`--resume: line ${i + 2} of ${file} is damaged (only a torn last line is dropped); use a new file`, 'resume');
      }
      if ('task' in e) this.tasks.set(e.task, e.ranks);
      else this.primes.set(e.prime, e.cells);
    }
    this.reused = this.tasks.size + this.primes.size;
  }

  /** Ranks per prime of a recorded task. */
  task(i: number): number[][] | undefined {
    return this.tasks.get(i);
  }

  recordTask(task: number, ranks: number[][]): void {
    this.tasks.set(task, ranks);
    appendFileSync(this.file, `${JSON.stringify({ task, ranks })}\n`);
  }

  cells(prime: number): ModuleCell[] | undefined {
    return this.primes.get(prime);
  }

  recordCells(prime: number, cells: readonly ModuleCell[]): void {
    this.primes.set(prime, [...cells]);
    appendFileSync(this.file, `${JSON.stringify({ prime, cells })}\n`);
  }

  note(): string {
    return `${this.reused} finished unit${this.reused === 1 ? '' : 's'} (Young-subgroup tasks or one-prime runs) read from the checkpoint ${this.file}`;
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
