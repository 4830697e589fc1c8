/** The result of a module or quotient computation: cells, checks and provenance. */
import type { Provenance } from '../core/provenance.js';
import type { ModuleCell } from './module-cell.js';

export type Axis = 'x' | 'y' | 'theta';

export interface Finding {
  readonly check: string;
  /** null when the check does not apply (e.g. no Frobenius series). */
  readonly holds: boolean | null;
  readonly detail: string;
}

export interface ModuleResult {
  readonly kind: 'module' | 'quotient';
  /** Seed name or ideal name. */
  readonly name: string;
  readonly description: string;
  readonly n: number;
  readonly k?: number;
  readonly ops: readonly string[];
  readonly axes: readonly Axis[];
  /** Nonzero cells only, in decreasing lexicographic degree. */
  readonly cells: readonly ModuleCell[];
  readonly frobenius: boolean;
  readonly checks: readonly Finding[];
  readonly provenance: Provenance;
}

export const AXIS_INDEX: Readonly<Record<Axis, 0 | 1 | 2>> = { x: 0, y: 1, theta: 2 };
export const AXIS_LABEL: Readonly<Record<Axis, string>> = { x: 'x', y: 'y', theta: 'θ' };
