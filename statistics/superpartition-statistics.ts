/**
 * Statistics on superpartitions Λ = (Λ_1, …, Λ_m; Λ_{m+1}, …) (Desrosiers–Lapointe–Mathieu,
 * "Classical symmetric functions in superspace", J. Algebraic Combin. 24 (2006) §2). Λ* is
 * the partition with every fermionic part raised by one (the circles counted as cells).
 */
import { diagramRows } from '../objects/support/superpartition.js';
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Superpartition } from '../objects/types.js';

const FAMILY = 'superpartitions';
const DLM = 'Desrosiers–Lapointe–Mathieu, J. Algebraic Combin. 24 (2006) §2';
const S1: Superpartition = { fermionic: [3, 0], bosonic: [2, 2] };
const S2: Superpartition = { fermionic: [1], bosonic: [1] };
const S3: Superpartition = { fermionic: [], bosonic: [3, 1] };

export const superFermionicDegree: Statistic<Superpartition> = {
  id: 'superpartition-fermionic-degree',
  family: FAMILY,
  description: 'fermionic degree m: the number of fermionic (circled) parts',
  source: DLM,
  examples: [
    [S1, 2],
    [S2, 1],
    [S3, 0],
  ],
  compute: (s) => s.fermionic.length,
};

export const superBosonicParts: Statistic<Superpartition> = {
  id: 'superpartition-bosonic-parts',
  family: FAMILY,
  description: 'number of bosonic (ordinary) parts',
  source: DLM,
  examples: [
    [S1, 2],
    [S2, 1],
    [S3, 2],
  ],
  compute: (s) => s.bosonic.length,
};

export const superRows: Statistic<Superpartition> = {
  id: 'superpartition-rows',
  family: FAMILY,
  description: 'rows of the diagram Λ*: all parts, a fermionic 0 included (its row is a lone circle)',
  source: DLM,
  examples: [
    [S1, 4],
    [S2, 2],
    [{ fermionic: [0], bosonic: [] }, 1],
  ],
  compute: (s) => s.fermionic.length + s.bosonic.length,
};

export const superLargestPart: Statistic<Superpartition> = {
  id: 'superpartition-largest-part',
  family: FAMILY,
  description: 'largest part, fermionic or bosonic',
  source: 'common practice',
  examples: [
    [S1, 3],
    [S2, 1],
    [S3, 3],
  ],
  compute: (s) => Math.max(0, ...s.fermionic, ...s.bosonic),
};

export const superZeroPart: Statistic<Superpartition> = {
  id: 'superpartition-zero-part',
  family: FAMILY,
  description: '1 when 0 is a fermionic part, else 0',
  source: DLM,
  examples: [
    [S1, 1],
    [S2, 0],
    [{ fermionic: [0], bosonic: [] }, 1],
  ],
  compute: (s) => (s.fermionic[s.fermionic.length - 1] === 0 ? 1 : 0),
};

export const superFermionicSum: Statistic<Superpartition> = {
  id: 'superpartition-fermionic-sum',
  family: FAMILY,
  description: 'sum of the fermionic parts',
  source: 'common practice',
  examples: [
    [S1, 3],
    [S2, 1],
    [S3, 0],
  ],
  compute: (s) => s.fermionic.reduce((a, b) => a + b, 0),
};

export const superNStar: Statistic<Superpartition> = {
  id: 'superpartition-n-star',
  family: FAMILY,
  description: 'n(Λ*) = Σ (i − 1)·Λ*_i over the rows of Λ* (circles counted as cells), rows top-down',
  source: `${DLM}; n(λ) as in Macdonald, Symmetric Functions, I.1`,
  examples: [
    [S1, 9],
    [S2, 1],
    [S3, 1],
  ],
  compute: (s) =>
    diagramRows(s)
      .map((r) => r.length + (r.circle ? 1 : 0))
      .sort((a, b) => b - a)
      .reduce((acc, len, i) => acc + i * len, 0),
};

export const superNPlain: Statistic<Superpartition> = {
  id: 'superpartition-n-plain',
  family: FAMILY,
  description: 'n(Λ⊛) = Σ (i − 1)·Λ⊛_i over all parts sorted decreasingly (circles not counted)',
  source: `${DLM}; n(λ) as in Macdonald, Symmetric Functions, I.1`,
  examples: [
    [S1, 6],
    [S2, 1],
    [S3, 1],
  ],
  compute: (s) =>
    [...s.fermionic, ...s.bosonic]
      .sort((a, b) => b - a)
      .reduce((acc, len, i) => acc + i * len, 0),
};

export const superLargestFermionic: Statistic<Superpartition> = {
  id: 'superpartition-largest-fermionic',
  family: FAMILY,
  description: 'largest fermionic part (0 when there is none)',
  source: 'common practice',
  examples: [
    [S1, 3],
    [S2, 1],
    [S3, 0],
  ],
  compute: (s) => s.fermionic[0] ?? 0,
};
