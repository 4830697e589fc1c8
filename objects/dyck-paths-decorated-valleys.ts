/**
 * Dyck paths (unlabelled) with n − k decorated valleys. With the labelling whose reading
 * word is decreasing every valley is contractible, so Σ q^{dinv} t^{area} over these paths
 * is ⟨Δ′_{e_{k−1}} e_n, e_n⟩ by the valley version of the Delta conjecture (Haglund–Remmel–
 * Wilson, Trans. Amer. Math. Soc. 370 (2018)); the tests check it against the engine.
 */
import type { Family } from '../src/enumerate/plugin.js';
import { decoratedUnlabelledFamily } from './support/decorated-unlabelled.js';
import { decorationParams, valleyRows } from './support/decorations.js';
import type { DecoratedDyckPath } from './types.js';

export const dyckPathsDecoratedValleys: Family<DecoratedDyckPath> = decoratedUnlabelledFamily({
  id: 'dyck-paths-decorated-valleys',
  description: 'Dyck paths with n − k decorated valleys (unlabelled; ⟨Δ′_{e_{k−1}} e_n, e_n⟩)',
  source: 'Haglund–Remmel–Wilson, "The Delta Conjecture", Trans. Amer. Math. Soc. 370 (2018), valley version',
  params: decorationParams(12, 'valleys'),
  rows: valleyRows,
  rowsOfPeaks: (_n, p) => p - 1,
});
