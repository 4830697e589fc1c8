/** What the Search screen shows of a search, as plain data from the worker. */

export interface SearchCandidateView {
  /** An expression of the library (which function the target is) or a statistic (which objects count it). */
  readonly kind?: 'expression' | 'statistic';
  /** One line: statistics, family, transforms. */
  readonly title: string;
  /** The exact range verified, e.g. "n = 1..4, all k = 1..n". */
  readonly range: string;
  /** A one-line formula (empty when none). */
  readonly formula: string;
  /** Definitions and sources, a few lines. */
  readonly detail: readonly string[];
}

export interface SearchOutcome {
  readonly targetLabel: string;
  readonly candidates: readonly SearchCandidateView[];
  /** What was searched, said plainly (shown above all when nothing matched). */
  readonly tried: string;
  /** Formula recognition and flags for the target itself. */
  readonly recognition: readonly string[];
  readonly elapsedMs: number;
  /** The engine's JSON document (the `--json` output of `gradus search`). */
  readonly json: unknown;
}
