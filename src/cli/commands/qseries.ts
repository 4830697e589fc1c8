/** `gradus qseries <name> --n N [--k K]`: the q-analogs of src/core/qanalogs. */
import { QSERIES_KINDS, qseriesKind } from '../../requests/qseries-request.js';
import { dataCommand } from '../data-command.js';

export const qseriesCommand = dataCommand(qseriesKind, {
  summary: 'q-integers, q-factorials, q-binomials, q-multinomials and q-Stirling numbers',
  details: ['names:', ...QSERIES_KINDS.map((k) => `  ${k.name.padEnd(17)}${k.description}`)].join('\n'),
  print(_r, result, io) {
    io.out(`${result.title} = ${result.series.toString()}`);
    io.out(`coefficients (q^0 up): ${result.series.toQArray().join(' ')}`);
    io.out(`value at q = 1: ${result.series.sumCoefficients()}`);
  },
});
