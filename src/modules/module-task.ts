/** Pool task of the module engine: one closure computation for one prime (the caller confirms with another). */
import { computeModule, type ModuleOptions, type ModuleSpec } from './compute-module.js';
import type { ModuleCell } from './module-cell.js';

export function modulePrime(input: { readonly spec: ModuleSpec; readonly options: Pick<ModuleOptions, 'frobenius' | 'method' | 'maxWork' | 'prime'> }): readonly ModuleCell[] {
  return computeModule(input.spec, { ...input.options, onePrime: true }).cells;
}
