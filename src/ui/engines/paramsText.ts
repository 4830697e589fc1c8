/**
 * Family parameters as one line of text, "n=4 k=2 shape=3,1": how the Families and
 * Statistics screens show and edit them. The family's own validate() checks the values.
 */
import { InputError } from '../../core/errors.js';
import type { ParamSpec, Params } from '../../enumerate/plugin.js';

export function paramsToText(params: Params): string {
  return Object.entries(params)
    .filter(([, v]) => v !== undefined)
    .map(([k, v]) => `${k}=${typeof v === 'number' ? v : (v as readonly number[]).join(',')}`)
    .join(' ');
}

export function parseParamsText(text: string, specs: readonly ParamSpec[]): Params {
  const out: Record<string, number | readonly number[]> = {};
  for (const part of text.trim().split(/\s+/).filter((s) => s !== '')) {
    const m = /^([A-Za-z_][\w-]*)=(.*)$/.exec(part);
    if (!m) throw new InputError(`parameters are written name=value, separated by spaces (got "${part}")`);
    const name = m[1]!;
    const spec = specs.find((s) => s.name === name);
    if (!spec) {
      throw new InputError(`unknown parameter ${name} (this family takes: ${specs.map((s) => s.name).join(', ') || 'none'})`, name);
    }
    const raw = m[2]!;
    if (spec.kind === 'int') {
      if (!/^\d+$/.test(raw)) throw new InputError(`${name} must be a non-negative integer (got "${raw}")`, name);
      out[name] = Number(raw);
    } else {
      const items = raw.split(',').filter((s) => s !== '');
      if (!items.every((s) => /^\d+$/.test(s))) throw new InputError(`${name} must be integers separated by commas (got "${raw}")`, name);
      out[name] = items.map(Number);
    }
  }
  return out;
}

/** Change the size parameter n by delta, within its range. */
export function bumpSize(params: Params, specs: readonly ParamSpec[], delta: number): Params {
  const spec = specs.find((s) => s.name === 'n' && s.kind === 'int');
  const n = params['n'];
  if (!spec || typeof n !== 'number') return params;
  const next = Math.min(spec.max ?? n + delta, Math.max(spec.min ?? 0, n + delta));
  return { ...params, n: next };
}
