/**
 * Heights of the superspace Vandermonde δ_{n,k} in a sweep: fixed numbers (`0..3`) or a
 * height that follows k (`k-1`, the published one, `k`, `k+1`), written back in one order.
 */
import { InputError } from '../core/errors.js';
import { shown } from '../core/shown.js';
import { numberListText, parseNumberList } from './numberList.js';

export type HeightItem = { readonly kind: 'fixed'; readonly value: number } | { readonly kind: 'k'; readonly offset: number };

export const MAX_HEIGHT = 30;

export function parseHeights(text: string): HeightItem[] {
  const fixed: string[] = [];
  const offsets = new Set<number>();
  for (const part of text.split(',').map((s) => s.trim()).filter((s) => s !== '')) {
    const m = /^k\s*(?:([+-])\s*(\d{1,2}))?$/.exec(part);
    if (m) offsets.add(m[1] === undefined ? 0 : (m[1] === '-' ? -1 : 1) * Number(m[2]));
    else if (/^[\d.\s]+$/.test(part)) fixed.push(part);
    else throw new InputError(`--height takes numbers, ranges a..b and k, k-1, k+1, … (got "${shown(part, 20)}")`, 'height');
  }
  const values = fixed.length ? parseNumberList(fixed.join(','), 'height', 0, MAX_HEIGHT) : [];
  if (values.length === 0 && offsets.size === 0) throw new InputError('--height needs at least one height', 'height');
  return [...values.map((value) => ({ kind: 'fixed' as const, value })), ...[...offsets].sort((a, b) => a - b).map((offset) => ({ kind: 'k' as const, offset }))];
}

export function heightItemText(h: HeightItem): string {
  if (h.kind === 'fixed') return String(h.value);
  return h.offset === 0 ? 'k' : `k${h.offset > 0 ? '+' : '-'}${Math.abs(h.offset)}`;
}

export function heightsText(items: readonly HeightItem[]): string {
  const fixed = items.flatMap((h) => (h.kind === 'fixed' ? [h.value] : []));
  const rest = items.filter((h) => h.kind === 'k').map(heightItemText);
  return [...(fixed.length ? [numberListText(fixed)] : []), ...rest].join(',');
}

/** The height at k, or undefined when it is negative or too large (that place is left out). */
export function heightAt(h: HeightItem, k: number): number | undefined {
  const s = h.kind === 'fixed' ? h.value : k + h.offset;
  return s >= 0 && s <= MAX_HEIGHT ? s : undefined;
}
