/** RSK row insertion on words: a word ↦ its recording tableau Q (standard; Des(w) is the descent set of Q). */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { Tableau, Word } from '../types.js';
import { rsk } from './rsk.js';

export const wordRskRecording: Transform<Word, Tableau> = {
  id: 'word-rsk-recording',
  from: 'words',
  to: 'standard-tableaux',
  description: 'the recording tableau Q of RSK row insertion (i is placed where the i-th insertion ended)',
  source: 'Knuth, Pacific J. Math. 34 (1970); Stanley, EC2 §7.11 and Lemma 7.23.1 (descents of Q, from memory)',
  examples: [
    [[2, 1, 1, 2], [[1, 3, 4], [2]]],
    [[1, 2, 1], [[1, 2], [3]]],
    [[3, 2, 1], [[1], [2], [3]]],
  ],
  apply: (w) => rsk(w)[1],
};
