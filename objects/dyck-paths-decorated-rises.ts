/**
 * Dyck paths (unlabelled) with n − k decorated double rises. Σ q^{dinv} t^{area of the
 * undecorated rows} = ⟨Δ′_{e_{k−1}} e_n, e_n⟩: each path carries exactly one labelling whose
 * reading word is decreasing, and its labelled dinv is the plain dinv (rise version of
 * the Delta theorem, Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018); the tests
 * check it against the symmetric-function engine).
 */
import type { Family } from '../src/enumerate/plugin.js';
import { decoratedUnlabelledFamily } from './support/decorated-unlabelled.js';
import { decorationParams, riseRows } from './support/decorations.js';
import type { DecoratedDyckPath } from './types.js';

export const dyckPathsDecoratedRises: Family<DecoratedDyckPath> = decoratedUnlabelledFamily({
  id: 'dyck-paths-decorated-rises',
  description: 'Dyck paths with n − k decorated double rises (unlabelled; ⟨Δ′_{e_{k−1}} e_n, e_n⟩)',
  source: 'Haglund–Remmel–Wilson, "The Delta Conjecture", Trans. Amer. Math. Soc. 370 (2018), rise version',
  params: decorationParams(12, 'double rises'),
  rows: riseRows,
  rowsOfPeaks: (n, p) => n - p,
});
