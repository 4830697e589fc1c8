/** `gradus qanalog <name> --n N [--k K]`: the q-analogs of src/core/qanalogs. */
import { QANALOG_KINDS, qanalogKind } from '../../requests/qanalog-request.js';
import { dataCommand } from '../data-command.js';

export const qanalogCommand = dataCommand(qanalogKind, {
  summary: 'q-integers, q-factorials, q-binomials, q-multinomials and q-Stirling numbers',
  details: ['names:', ...QANALOG_KINDS.map((k) => `  ${k.name.padEnd(17)}${k.description}`)].join('\n'),
  print(_r, result, io) {
    io.out(`${result.title} = ${result.series.toString()}`);
    io.out(`coefficients (q^0 up): ${result.series.toQArray().join(' ')}`);
    io.out(`value at q = 1: ${result.series.sumCoefficients()}`);
  },
});
