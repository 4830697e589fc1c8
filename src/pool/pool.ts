/**
 * The one pool of worker threads every engine uses (piscina): a task is a named export of a
 * module, `(input, progress) => output`, with structured-clonable input and output. Progress
 * comes back through a message port; an AbortSignal stops the task (its thread is ended).
 * User errors keep their type (InputError, LimitError) across the thread boundary. Idle
 * threads never keep the process alive.
 */
import { availableParallelism } from 'node:os';
import { MessageChannel } from 'node:worker_threads';
import { Piscina } from 'piscina';
import { InputError, LimitError } from '../core/errors.js';

export type ProgressFn = (label: string, done: number, total?: number) => void;

/** The shape of a task function, as engines export it. */
export type TaskFunction<I, O> = (input: I, progress: ProgressFn) => O | Promise<O>;

export interface TaskHooks {
  readonly onProgress?: ProgressFn;
  readonly signal?: AbortSignal;
  /** Threads the caller wants at once (the pool grows to it; default: every core). */
  readonly threads?: number;
}

/** A task stopped by its AbortSignal. */
export class TaskCancelled extends Error {
  override readonly name = 'TaskCancelled';
  constructor() {
    super('cancelled');
  }
}

const ENTRY = new URL('./pool-entry.mjs', import.meta.url).href;

let pool: Piscina | undefined;
let size = 0;

function poolFor(threads: number): Piscina {
  if (!pool || threads > size) {
    const old = pool;
    size = Math.max(threads, availableParallelism());
    // idle threads stay a few seconds, so a run of small tasks pays the start-up once
    pool = new Piscina({ filename: ENTRY, minThreads: 0, maxThreads: size, idleTimeout: 3000, atomics: 'disabled' });
    void old?.close();
  }
  return pool;
}

interface Reply {
  readonly ok: boolean;
  readonly value?: unknown;
  readonly error?: { name: string; message: string; argument?: string; option?: string; stack?: string };
}

function rebuildError(e: NonNullable<Reply['error']>): Error {
  if (e.name === 'InputError' || e.name === 'ArithmeticError') return new InputError(e.message, e.argument);
  if (e.name === 'LimitError') return new LimitError(e.message, e.option);
  const err = new Error(e.message);
  if (e.stack) err.stack = e.stack;
  return err;
}

/** Run `name` from `module` (a URL of an engine module) in a pool thread. */
export async function runTask<O>(module: URL, name: string, input: unknown, hooks: TaskHooks = {}): Promise<O> {
  if (hooks.signal?.aborted) throw new TaskCancelled();
  const p = poolFor(hooks.threads ?? 1);
  const channel = hooks.onProgress ? new MessageChannel() : undefined;
  if (channel) {
    const on = hooks.onProgress!;
    channel.port1.on('message', (m: { label: string; done: number; total?: number }) => on(m.label, m.done, m.total));
    channel.port1.unref();
  }
  try {
    const reply = (await p.run(
      { module: module.href, name, input, ...(channel ? { port: channel.port2 } : {}) },
      { ...(channel ? { transferList: [channel.port2] } : {}), ...(hooks.signal ? { signal: hooks.signal } : {}) },
    )) as Reply;
    if (!reply.ok) throw rebuildError(reply.error!);
    return reply.value as O;
  } catch (e) {
    if (hooks.signal?.aborted || (e as Error).name === 'AbortError') throw new TaskCancelled();
    throw e;
  } finally {
    channel?.port1.close();
  }
}

/** Threads the pool runs at once. */
export function poolSize(): number {
  return Math.max(size, availableParallelism());
}

/** Stop every pool thread now (tests, and hosts that want them gone). */
export async function stopPool(): Promise<void> {
  const p = pool;
  pool = undefined;
  size = 0;
  await p?.destroy();
}
