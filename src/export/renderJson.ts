/** An export as JSON: our versioned schema "gradus-export" (version 1), with provenance. */
import { toJsonText } from '../core/json-text.js';
import { seriesToJson } from '../series/seriesJson.js';
import type { ExportModel } from './exportModel.js';

export const EXPORT_FORMAT = 'gradus-export';
export const EXPORT_VERSION = 1;

export function renderJson(m: ExportModel): string {
  return toJsonText({
    format: EXPORT_FORMAT,
    version: EXPORT_VERSION,
    title: m.title,
    range: m.range,
    recognition: m.recognition,
    matches: m.matches.map((x) => ({
      formula: x.match.formula,
      family: x.family,
      statistics: x.statistics,
      combine: x.match.combine,
      transform: x.match.transform,
      variant: x.match.variant,
      mapping: x.match.mapping,
      verified: x.match.verified,
      complete: x.match.complete,
      ...(x.match.marker ? { marker: x.match.marker } : {}),
    })),
    totalMatches: m.totalMatches,
    expressions: m.expressions.map((x) => ({
      expression: x.expression,
      title: x.title,
      family: x.family,
      origin: x.origin,
      source: x.source,
      specialisation: x.specialisation,
      projection: x.projection,
      variant: x.variant,
      mapping: x.mapping,
      verified: x.verified,
      complete: x.complete,
      example: { at: x.exampleAt, expression: x.example },
      ...(x.marker ? { marker: x.marker } : {}),
    })),
    totalExpressions: m.totalExpressions,
    tried: m.tried,
    kind: m.target.kind,
    values: m.table.map((e) => ({ n: e.n, ...(e.k === undefined ? {} : { k: e.k }), series: seriesToJson(e.series), valueAtOne: e.count })),
    provenance: m.provenance,
  }) + '\n';
}
