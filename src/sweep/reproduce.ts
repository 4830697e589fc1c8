/**
 * The commands that reproduce a row of the findings table: `gradus module …` at each place
 * (its canonical request, found again in the catalogue), and for a seed given over n (and k)
 * the search over the whole family, which prints the formula recognition again.
 */
import type { Place, SweepLine } from './plan.js';

export function reproduceCommands(line: SweepLine, places: readonly (Place & { key: string })[]): string[] {
  const out = places.map((p) => `gradus ${p.key}`);
  if (line.template && places.length >= 2) {
    const ns = places.map((p) => p.n);
    const template = line.template.replaceAll('"', '\\"');
    out.push(`gradus search --from "${template}" --n-range ${Math.min(...ns)}..${Math.max(...ns)} --take hilbert`);
  }
  return out;
}
