/** "120 objects", "1 object", "? objects" (a count the family cannot give for these parameters). */
import type { Family, Params } from '../../enumerate/plugin.js';

export function objectsText(f: Family<unknown>, p: Params): string {
  try {
    const c = f.count(p);
    return `${c} object${c === 1n ? '' : 's'}`;
  } catch {
    return 'count unknown';
  }
}
