/** "120 objects", "1 object", or "count unknown" when the family cannot count these parameters. */
import type { Family, Params } from '../../enumerate/plugin.js';
import { plural } from '../text/plural.js';

export function objectsText(f: Family<unknown>, p: Params): string {
  try {
    return plural(f.count(p), 'object');
  } catch {
    return 'count unknown';
  }
}
