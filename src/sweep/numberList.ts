/**
 * Lists of small integers as a user types them for a sweep: `3..5`, `0,2,4`, or a mix such
 * as `1..3,6`; and back to the shortest text (runs of three or more as a..b), so that equal
 * lists give equal canonical sweep keys.
 */
import { InputError } from '../core/errors.js';
import { shown } from '../core/shown.js';

export function parseNumberList(text: string, option: string, min: number, max: number): number[] {
  const out = new Set<number>();
  const bad = (why: string): never => {
    throw new InputError(`--${option} must be integers from ${min} to ${max} as a..b or a,b,… (${why}; got "${shown(text, 40)}")`, option);
  };
  for (const part of text.split(',').map((s) => s.trim())) {
    if (part === '') continue;
    const m = /^(\d{1,4})(?:\s*\.\.\s*(\d{1,4}))?$/.exec(part);
    if (!m) bad(`"${shown(part, 20)}" is not a number or a range`);
    const a = Number(m![1]);
    const b = m![2] === undefined ? a : Number(m![2]);
    if (a > b) bad(`${a}..${b} is empty`);
    if (a < min || b > max) bad(`${part} is out of range`);
    for (let v = a; v <= b; v++) out.add(v);
  }
  if (out.size === 0) bad('nothing given');
  return [...out].sort((x, y) => x - y);
}

/** [1,2,3,5] -> "1..3,5"; [3,4] -> "3,4". */
export function numberListText(values: readonly number[]): string {
  const v = [...new Set(values)].sort((a, b) => a - b);
  const parts: string[] = [];
  for (let i = 0; i < v.length; ) {
    let j = i;
    while (j + 1 < v.length && v[j + 1] === v[j]! + 1) j++;
    if (j - i >= 2) parts.push(`${v[i]}..${v[j]}`);
    else for (let m = i; m <= j; m++) parts.push(String(v[m]));
    i = j + 1;
  }
  return parts.join(',');
}
