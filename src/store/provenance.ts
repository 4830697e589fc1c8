/** Provenance carried by every stored result: inputs, method, primes, time, tool version. */
import { VERSION } from '../version.js';

export interface Provenance {
  readonly inputs: Readonly<Record<string, unknown>>;
  readonly method: string;
  /** Primes used by a modular computation (empty for exact integer work). */
  readonly primes: readonly number[];
  readonly time: string;
  readonly seconds?: number;
  readonly gradusVersion: string;
}

export function provenance(inputs: Record<string, unknown>, method: string, primes: readonly number[] = [], seconds?: number): Provenance {
  return { inputs, method, primes, time: new Date().toISOString(), ...(seconds === undefined ? {} : { seconds }), gradusVersion: VERSION };
}
