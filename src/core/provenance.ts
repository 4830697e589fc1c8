/**
 * Provenance carried by every result, stored row and saved search: what was computed (the
 * canonical request), how, with which primes and how they were confirmed, when, how long it
 * took and by which version of gradus.
 */
import { VERSION } from '../version.js';

export interface Provenance {
  /** What was computed: the canonical request (a gradus command line) or the inputs in words. */
  readonly request: string;
  readonly method: string;
  /** Primes of a modular computation; empty for exact work. */
  readonly primes: readonly number[];
  /** How the result is exact: "exact integer arithmetic", or how a second prime confirmed it. */
  readonly confirmation: string;
  readonly notes: readonly string[];
  readonly seconds: number;
  /** ISO time the computation finished. */
  readonly time: string;
  readonly version: string;
}

export const EXACT = 'exact integer arithmetic (no modular step)';

export function makeProvenance(fields: {
  readonly request: string;
  readonly method: string;
  readonly seconds: number;
  readonly primes?: readonly number[];
  readonly confirmation?: string;
  readonly notes?: readonly string[];
}): Provenance {
  return {
    request: fields.request,
    method: fields.method,
    primes: fields.primes ?? [],
    confirmation: fields.confirmation ?? EXACT,
    notes: fields.notes ?? [],
    seconds: fields.seconds,
    time: new Date().toISOString(),
    version: VERSION,
  };
}
