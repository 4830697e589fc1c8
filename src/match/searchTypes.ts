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
  /** For a marked union: how the marking variable's degree gives k (absent otherwise). */
  readonly marker?: string;
}

/** A family of the expression library matching the target (the first question: which known function is this?). */
export interface ExpressionMatch {
  readonly family: string;
  readonly title: string;
  readonly source: string;
  readonly origin: 'built-in' | 'user';
  /** The match in the language of `gradus sym`, with the family's placeholders ({n}, {k}, {λ}). */
  readonly expression: string;
  /** The same at the anchor place, evaluable as it is (`gradus sym "<example>"`). */
  readonly example: string;
  readonly exampleAt: string;
  readonly specialisation: string;
  readonly projection: 'frobenius' | 'hilbert';
  readonly variant: string;
  readonly mapping: string;
  readonly verified: string;
  readonly verifiedEntries: readonly { n: number; k?: number }[];
  readonly unchecked: readonly { n: number; k?: number }[];
  readonly complete: boolean;
  readonly cost: number;
  readonly marker?: string;
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
  /** The expression library: families held and its largest n. */
  readonly expressions?: { readonly families: number; readonly maxN: number };
  /** Other readings of the target tried (a marked union). */
  readonly readings?: readonly string[];
}

export interface SearchOutcome {
  readonly matches: readonly SearchMatch[];
  readonly expressions: readonly ExpressionMatch[];
  readonly tried: SearchTried;
}
