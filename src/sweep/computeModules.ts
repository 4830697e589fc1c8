/**
 * The modules of a plan, each once: a module kept in the catalogue (by its canonical key) is
 * read back; small ones run side by side on the pool, one per core (`sweep-task.ts`); large
 * ones one at a time through the request model, whose engine spreads each over the cores.
 * Every module is kept as soon as it is done, so an interrupted sweep resumes where it stopped.
 */
import { isUserError } from '../core/errors.js';
import type { ResultCache } from '../match/resultCache.js';
import { poolSize, runTask, TaskCancelled } from '../pool/pool.js';
import { compute, type ModuleRequest } from '../requests/index.js';
import type { PlannedModule } from './plan.js';

/** Estimated seconds below which a module is one pool task rather than a run over both cores. */
export const SMALL_MODULE_SECONDS = 2;

export type ModuleOutcome =
  | { readonly status: 'kept' | 'computed'; readonly document: Record<string, unknown> }
  | { readonly status: 'skipped'; readonly why: string }
  | { readonly status: 'failed'; readonly why: string };

export interface ComputeHooks {
  readonly progress?: (label: string, done: number, total?: number) => void;
  readonly signal?: AbortSignal;
  readonly cache?: ResultCache;
  /** Per module (not in the canonical key): skip a module estimated above it. */
  readonly maxWork?: number;
  readonly onModule?: (key: string, outcome: ModuleOutcome) => void;
}

const TASK = new URL('./sweep-task.ts', import.meta.url);

function withLimit(r: ModuleRequest, maxWork: number | undefined): ModuleRequest {
  return maxWork === undefined ? r : { ...r, maxWork };
}

export async function computeModules(modules: readonly PlannedModule[], hooks: ComputeHooks = {}): Promise<Map<string, ModuleOutcome>> {
  const out = new Map<string, ModuleOutcome>();
  const todo: PlannedModule[] = [];
  for (const m of modules) {
    const doc = hooks.cache?.get(m.key);
    if (doc !== undefined && doc !== null && typeof doc === 'object') {
      const outcome: ModuleOutcome = { status: 'kept', document: doc as Record<string, unknown> };
      out.set(m.key, outcome);
      hooks.onModule?.(m.key, outcome);
    } else todo.push(m);
  }
  let done = 0;
  const total = todo.length;
  hooks.progress?.('modules', 0, total);
  const finish = (m: PlannedModule, outcome: ModuleOutcome): void => {
    if (outcome.status === 'computed') hooks.cache?.put(m.key, 'module', outcome.document, m.n, m.k);
    out.set(m.key, outcome);
    hooks.onModule?.(m.key, outcome);
    hooks.progress?.('modules', ++done, total);
  };
  const failure = (e: unknown): ModuleOutcome => {
    if (e instanceof TaskCancelled || hooks.signal?.aborted) throw new TaskCancelled();
    const why = (e instanceof Error ? e.message : String(e)).split('\n')[0]!;
    return isUserError(e) ? { status: 'skipped', why } : { status: 'failed', why };
  };
  // cheapest first: findings appear early, and the large ones are left for the end
  const ordered = [...todo].sort((a, b) => a.seconds - b.seconds);
  const small = ordered.filter((m) => m.seconds < SMALL_MODULE_SECONDS);
  const large = ordered.filter((m) => m.seconds >= SMALL_MODULE_SECONDS);
  const threads = Math.max(1, poolSize());
  let next = 0;
  const lane = async (): Promise<void> => {
    while (next < small.length) {
      const m = small[next++]!;
      let outcome: ModuleOutcome;
      try {
        const document = await runTask<Record<string, unknown>>(TASK, 'sweepModule', { request: withLimit(m.request, hooks.maxWork) }, { threads, ...(hooks.signal ? { signal: hooks.signal } : {}) });
        outcome = { status: 'computed', document };
      } catch (e) {
        outcome = failure(e);
      }
      finish(m, outcome);
    }
  };
  await Promise.all(Array.from({ length: Math.min(threads, small.length) }, lane));
  for (const m of large) {
    if (hooks.signal?.aborted) throw new TaskCancelled();
    let outcome: ModuleOutcome;
    try {
      const c = await compute(withLimit(m.request, hooks.maxWork), hooks.signal ? { signal: hooks.signal } : {});
      outcome = { status: 'computed', document: c.document };
    } catch (e) {
      outcome = failure(e);
    }
    finish(m, outcome);
  }
  return out;
}
