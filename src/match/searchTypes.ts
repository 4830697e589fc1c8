/** What a search returns: the matches, simplest first, and what was tried. */
import type { MatchCombine } from '../store/catalogue.js';

export interface SearchMatch {
  readonly family: string;
  readonly statistics: readonly string[];
  readonly combine: MatchCombine;
  readonly transform: string;
  readonly variant: string;
  readonly mapping: string;
  readonly formula: string;
  readonly verified: string;
  readonly verifiedEntries: readonly { n: number; k?: number }[];
  /** Target entries the catalogue could not check (outside its range or the family's). */
  readonly unchecked: readonly { n: number; k?: number }[];
  readonly complete: boolean;
  readonly cost: number;
}

export interface SearchTried {
  readonly anchor: { n: number; k?: number } | null;
  readonly catalogueMaxN: number;
  readonly candidates: number;
  readonly sameCount: number;
  readonly exactAtAnchor: number;
  readonly families: readonly string[];
  readonly statistics: readonly string[];
  readonly variants: readonly string[];
  readonly combines: readonly string[];
}

export interface SearchOutcome {
  readonly matches: readonly SearchMatch[];
  readonly tried: SearchTried;
}
