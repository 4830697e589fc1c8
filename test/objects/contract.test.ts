/**
 * Contract tests over the family registry: for each family's testParams, the stream
 * matches count() with distinct keys, the fast path (visit, with shards) streams the
 * same objects, samples are members, renders are non-empty, bad params raise InputError.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { FAMILIES } from '../../objects/index.js';
import { InputError } from '../../src/core/errors.js';
import type { Family, Params } from '../../src/enumerate/plugin.js';
import { seeded } from './seeded.js';

function keysOf(f: Family<unknown>, p: Params): string[] {
  const out: string[] = [];
  for (const x of f.generate(p)) out.push(f.key(x));
  return out;
}

function sizeOf(p: Params): number | undefined {
  const n = p['n'];
  if (typeof n === 'number') return n;
  for (const name of ['shape', 'content']) {
    const v = p[name];
    if (Array.isArray(v)) return v.reduce((a: number, b: number) => a + b, 0);
  }
  return undefined;
}

describe.each(FAMILIES.map((f) => [f.id, f] as const))('family %s', (_id, f) => {
  it('has testParams, described params and a source', () => {
    expect(f.testParams.length).toBeGreaterThan(0);
    expect(f.description.length).toBeGreaterThan(0);
    expect(f.source.length).toBeGreaterThan(0);
    for (const s of f.params) expect(s.description.length).toBeGreaterThan(0);
  });

  it.each(f.testParams.map((p) => [JSON.stringify(p), p] as const))('params %s: stream = count, keys distinct, render non-empty', (_s, p) => {
    const keys = keysOf(f, p);
    expect(BigInt(keys.length)).toBe(f.count(p));
    expect(new Set(keys).size).toBe(keys.length);
    let shown = 0;
    for (const x of f.generate(p)) {
      if (shown++ > 30) break;
      expect(f.render(x).trim().length).toBeGreaterThan(0);
      const size = sizeOf(p);
      if (f.shape && size !== undefined) expect(f.shape(x).reduce((a, b) => a + b, 0)).toBe(size);
      if (f.readingWord && size !== undefined) expect(f.readingWord(x).length).toBe(size);
    }
  });

  it.each(f.testParams.map((p) => [JSON.stringify(p), p] as const))('params %s: visit (whole and in shards) streams the same objects', (_s, p) => {
    if (!f.visit) return;
    const all = keysOf(f, p).sort();
    const whole: string[] = [];
    f.visit(p, (x) => whole.push(f.key(x)));
    expect(whole.sort()).toEqual(all);
    for (const count of [2, 3]) {
      const parts: string[] = [];
      for (let index = 0; index < count; index++) f.visit(p, (x) => parts.push(f.key(x)), { index, count });
      expect(parts.sort()).toEqual(all);
    }
  });

  it('samples are members of the family (seeded, fast-check)', () => {
    for (const p of f.testParams) {
      if (f.count(p) === 0n) continue;
      const keys = new Set(keysOf(f, p));
      fc.assert(
        fc.property(fc.integer(), (seed) => {
          expect(keys.has(f.key(f.sample(p, seeded(seed))))).toBe(true);
        }),
        { numRuns: 25 },
      );
    }
  });

  it('samples are fair: on a small case every object comes up about equally often (seeded)', () => {
    const p = f.testParams.find((q) => f.count(q) >= 3n && f.count(q) <= 60n);
    if (!p) return;
    const keys = keysOf(f, p);
    const seen = new Map<string, number>(keys.map((k) => [k, 0]));
    const per = 200;
    const random = seeded(12345);
    for (let i = 0; i < per * keys.length; i++) {
      const k = f.key(f.sample(p, random));
      seen.set(k, seen.get(k)! + 1);
    }
    // 200 expected per object; ±35% is five standard deviations.
    for (const [k, c] of seen) expect(Math.abs(c - per), k).toBeLessThan(0.35 * per);
  });

  it('validate rejects out-of-range, unknown and missing parameters with InputError', () => {
    const p = f.testParams[f.testParams.length - 1]!;
    expect(() => f.validate({ ...p, zzz: 1 })).toThrow(InputError);
    for (const s of f.params) {
      if (s.kind === 'int') {
        expect(() => f.validate({ ...p, [s.name]: (s.max ?? 1000) + 1 })).toThrow(InputError);
        expect(() => f.validate({ ...p, [s.name]: (s.min ?? 0) - 1 })).toThrow(InputError);
        expect(() => f.validate({ ...p, [s.name]: 1.5 })).toThrow(InputError);
      } else {
        expect(() => f.validate({ ...p, [s.name]: [-1] })).toThrow(InputError);
        if (s.kind === 'partition') expect(() => f.validate({ ...p, [s.name]: [1, 2] })).toThrow(InputError);
      }
      if (!s.optional) {
        const rest = { ...p };
        delete (rest as Record<string, unknown>)[s.name];
        expect(() => f.validate(rest)).toThrow(InputError);
      }
    }
    // The messages name the parameter.
    const first = f.params.find((s) => s.kind === 'int');
    if (first) expect(() => f.validate({ ...p, [first.name]: 99999 })).toThrow(new RegExp(first.name));
  });
});
