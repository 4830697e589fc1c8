/** The search engine's saved-search document as the Search screen shows it. */
import type { SearchDocument } from '../../match/searchDocument.js';
import type { SearchOutcome } from './searchTypes.js';
import { plural } from '../text/plural.js';

export function triedText(d: SearchDocument): string {
  const t = d.tried;
  const at = t.anchor ? `n = ${t.anchor.n}${t.anchor.k === undefined ? '' : `, k = ${t.anchor.k}`}` : 'no size in the catalogue';
  return (
    `${plural(t.candidates, 'candidate')} at ${at} (whole distributions: ${t.sameCount} with the same count at q = 1, ${t.exactAtAnchor} equal there${t.combines.includes('slice') ? '; slices checked apart' : ''}) ` +
    `over ${plural(t.families.length, 'family', 'families')} and ${plural(t.statistics.length, 'statistic')}, forms ${t.combines.join('/')}, ` +
    `variants ${t.variants.join(', ')}; catalogue n ≤ ${t.catalogueMaxN}` +
    (t.expressions ? `; expression library: ${plural(t.expressions.families, 'family', 'families')}, n ≤ ${t.expressions.maxN}` : '')
  );
}

export function searchOutcome(d: SearchDocument, id: number | undefined, elapsedMs: number): SearchOutcome {
  const r = d.recognition;
  const recognition: string[] = [];
  if (r.formula) recognition.push(`formula: ${r.formula} (on ${d.range})`);
  for (const x of r.recurrences) recognition.push(`recurrence: ${x.text}${x.name ? ` [${x.name}]` : ''}`);
  recognition.push(`every entry: ${r.palindromic ? 'palindromic' : 'not palindromic'}, ${r.unimodal ? 'unimodal' : 'not unimodal'}`);
  return {
    targetLabel: String((d.target as { label?: unknown }).label ?? ''),
    // expressions first (which known function is this?), then the statistics that count it
    candidates: [
      ...(d.expressions ?? []).map((m) => ({
        kind: 'expression' as const,
        title: `≡ ${m.marker ? `Σ_k ${m.marker}·` : ''}${m.expression}`,
        range: m.verified,
        formula: `${m.title} — at ${m.exampleAt}: gradus sym "${m.example}"`,
        detail: [`${m.family} (${m.origin}); parameters ${m.mapping}; specialisation ${m.specialisation}${m.projection === 'hilbert' ? ', Hilbert series' : ''}; variant ${m.variant}`, `source: ${m.source}`],
      })),
      ...d.matches.map((m) => ({
        kind: 'statistic' as const,
        title: `${m.marker ? `Σ_k ${m.marker}· ` : ''}${m.statistics.join(' & ')} on ${m.family} (${m.combine}${m.transform ? `, via ${m.transform}` : ''})`,
        range: m.verified,
        formula: m.formula,
        detail: [
          `parameters ${m.mapping}; variant ${m.variant}`,
          ...(m.complete ? [] : [`not checked: ${m.unchecked.map((p) => `(${p.n}${p.k === undefined ? '' : `,${p.k}`})`).join(' ')}`]),
        ],
      })),
    ],
    tried: triedText(d),
    recognition,
    elapsedMs,
    json: { ...d, ...(id !== undefined ? { id: `search:${id}` } : {}) },
  };
}
