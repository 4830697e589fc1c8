/**
 * What an export shows, independent of the format: the target and its range, the
 * recognised formula and recurrences, each matched candidate with the definitions and
 * sources of its family, statistics and transforms, a table of values, and provenance.
 */
import { familyById } from '../../objects/index.js';
import { transformById } from '../../objects/transforms/index.js';
import { statisticById } from '../../statistics/index.js';
import type { SearchDocument } from '../match/searchDocument.js';
import type { ExpressionMatch, SearchMatch } from '../match/search.js';
import { seriesAtOne, type Series } from '../series/series.js';
import { targetFromJson } from '../series/targetFile.js';
import type { Target } from '../series/target.js';
import { VERSION } from '../version.js';
import { publishedSource, withoutNotesCitations } from './publishedSource.js';

export interface Definition {
  readonly id: string;
  readonly description: string;
  readonly source: string;
}

export interface ExportMatch {
  readonly match: SearchMatch;
  readonly family: Definition;
  readonly statistics: readonly (Definition & { readonly via?: Definition })[];
}

export interface ExportModel {
  readonly title: string;
  readonly range: string;
  readonly recognition: SearchDocument['recognition'];
  readonly matches: readonly ExportMatch[];
  readonly totalMatches: number;
  /** Families of the expression library equal to the target, each with its source and range. */
  readonly expressions: readonly ExpressionMatch[];
  readonly totalExpressions: number;
  readonly tried: SearchDocument['tried'];
  readonly target: Target;
  readonly table: readonly { n: number; k?: number; series: Series; count: bigint }[];
  readonly provenance: { readonly search: SearchDocument['provenance']; readonly exportedBy: string };
}

/** The definition and published source of a family, statistic or transform, as exports print them. */
export function definitionOf(kind: 'family' | 'statistic' | 'transform', id: string): Definition {
  try {
    const x = kind === 'family' ? familyById(id) : kind === 'statistic' ? statisticById(id) : transformById(id);
    return { id, description: withoutNotesCitations(x.description), source: publishedSource(x.source) };
  } catch {
    return { id, description: `(no ${kind} ${id} in this gradus ${VERSION})`, source: 'unknown' };
  }
}

export function exportModel(doc: SearchDocument, limit: number): ExportModel {
  const target = targetFromJson(doc.target, 'saved search target');
  const matches = doc.matches.slice(0, limit).map((m) => ({
    match: m,
    family: definitionOf('family', m.family),
    statistics: m.statistics.map((id) => {
      const i = id.indexOf(':');
      if (i < 0) return definitionOf('statistic', id);
      return { ...definitionOf('statistic', id.slice(i + 1)), id, via: definitionOf('transform', id.slice(0, i)) };
    }),
  }));
  return {
    title: target.label,
    range: doc.range,
    recognition: doc.recognition,
    matches,
    totalMatches: doc.matches.length,
    expressions: (doc.expressions ?? []).slice(0, limit),
    totalExpressions: (doc.expressions ?? []).length,
    tried: doc.tried,
    target,
    table: target.entries.map((e) => ({ n: e.n, ...(e.k === undefined ? {} : { k: e.k }), series: e.series, count: seriesAtOne(e.series) })),
    provenance: { search: doc.provenance, exportedBy: `gradus ${VERSION}` },
  };
}
