/** A canonical hash of a series for exact look-up in the catalogue. */
import { createHash } from 'node:crypto';
import { seriesCanonical, type Series } from '../series/series.js';

export function seriesHash(s: Series): string {
  return createHash('sha1').update(seriesCanonical(s)).digest('hex');
}
