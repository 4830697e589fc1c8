/** RSK row insertion on words: a word ↦ its insertion tableau P, semistandard with the word's content. */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { Tableau, Word } from '../types.js';
import { rsk } from './rsk.js';

export const wordRskInsertion: Transform<Word, Tableau> = {
  id: 'word-rsk-insertion',
  from: 'words',
  to: 'semistandard-tableaux',
  description: 'the insertion tableau P of RSK row insertion (a letter bumps the leftmost strictly larger one)',
  source: 'Knuth, Pacific J. Math. 34 (1970); Stanley, EC2 §7.11; Fulton, Young Tableaux §1.1',
  examples: [
    [[2, 1, 1, 2], [[1, 1, 2], [2]]],
    [[1, 2, 1], [[1, 1], [2]]],
    [[3, 2, 1], [[1], [2], [3]]],
  ],
  apply: (w) => rsk(w)[0],
};
