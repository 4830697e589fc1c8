/**
 * `gradus demo`: a short tour computed live. The terminal app (when present) opens on
 * a richer demo session; this command is the scriptable, non-interactive version.
 */
import { qFactorial, qOrderedStirling } from '../../core/qanalogs.js';
import type { CommandSpec } from '../command.js';

export const demoCommand: CommandSpec = {
  name: 'demo',
  summary: 'a short tour of what gradus computes, printed as text',
  usage: 'demo',
  options: [],
  producesData: false,
  run(_args, io) {
    io.out('gradus demo: q-analogs that Hilbert series of S_n-modules reduce to');
    for (let n = 1; n <= 4; n++) io.out(`  [${n}]_q! = ${qFactorial(n).toString()}`);
    io.out('  ordered set partitions of [4] into k blocks, q-counted by [k]_q! Stir_q(4,k):');
    for (let k = 1; k <= 4; k++) io.out(`    k = ${k}: ${qOrderedStirling(4, k).toString()}`);
    io.out('See gradus --help for every command.');
  },
};
