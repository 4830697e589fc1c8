/**
 * Parameter checking shared by the family files: every family validates its params
 * against its own ParamSpec list, so messages name the parameter and its range.
 */
import { InputError } from '../../src/core/errors.js';
import type { ParamSpec, Params, ParamValue } from '../../src/enumerate/plugin.js';

function describe(spec: ParamSpec): string {
  const range = `${spec.min ?? 0}..${spec.max ?? '∞'}`;
  if (spec.kind === 'int') return `an integer from ${spec.min ?? 0} to ${spec.max ?? '∞'}`;
  if (spec.kind === 'partition') return `a partition (weakly decreasing positive integers, such as 3,1) of size ${range}`;
  return `a list of non-negative integers (such as 2,1,1) with sum ${range}`;
}

function show(v: ParamValue): string {
  return typeof v === 'number' ? String(v) : v.join(',');
}

/** Checks names, presence and ranges (for lists: entries and their sum); throws InputError. */
export function validateBySpec(familyId: string, specs: readonly ParamSpec[], params: Params): void {
  for (const [name, v] of Object.entries(params)) {
    if (v !== undefined && !specs.some((s) => s.name === name)) {
      const names = specs.map((s) => s.name).join(', ') || 'none';
      throw new InputError(`${familyId} takes no parameter ${name} (its parameters: ${names})`, name);
    }
  }
  for (const spec of specs) {
    const v = params[spec.name];
    const bad = (): never => {
      throw new InputError(`${familyId}: ${spec.name} must be ${describe(spec)} (got ${v === undefined ? 'nothing' : show(v)})`, spec.name);
    };
    if (v === undefined) {
      if (!spec.optional) bad();
      continue;
    }
    if (spec.kind === 'int') {
      if (typeof v !== 'number' || !Number.isInteger(v) || v < (spec.min ?? 0) || v > (spec.max ?? Infinity)) bad();
      continue;
    }
    if (typeof v === 'number' || !v.every((x) => Number.isInteger(x) && x >= 0)) bad();
    const list = v as readonly number[];
    if (spec.kind === 'partition' && list.some((x, i) => x === 0 || (i > 0 && x > list[i - 1]!))) bad();
    const total = list.reduce((a, b) => a + b, 0);
    if (total < (spec.min ?? 0) || total > (spec.max ?? Infinity)) bad();
  }
}

/** The integer parameter `name` (call after validation). */
export function intParam(params: Params, name: string): number {
  const v = params[name];
  if (typeof v !== 'number') throw new InputError(`parameter ${name} must be an integer`, name);
  return v;
}

/** The optional integer parameter `name`. */
export function optIntParam(params: Params, name: string): number | undefined {
  const v = params[name];
  return v === undefined ? undefined : intParam(params, name);
}

/** The list (or partition) parameter `name` (call after validation). */
export function listParam(params: Params, name: string): readonly number[] {
  const v = params[name];
  if (v === undefined || typeof v === 'number') throw new InputError(`parameter ${name} must be a list of integers`, name);
  return v;
}

/** Throws the InputError for an optional k larger than the size n. */
export function checkAtMost(familyId: string, name: string, value: number | undefined, max: number, maxName: string): void {
  if (value !== undefined && value > max) {
    throw new InputError(`${familyId}: ${name} must be at most ${maxName} = ${max} (got ${value})`, name);
  }
}

/** Thrown by a sampler asked for an object of an empty family. */
export function emptyFamilyError(familyId: string, params: Params): InputError {
  const shown = Object.entries(params)
    .filter(([, v]) => v !== undefined)
    .map(([k, v]) => `${k}=${typeof v === 'number' ? v : v!.join(',')}`)
    .join(' ');
  return new InputError(`${familyId} has no objects for ${shown || 'these parameters'}`);
}
