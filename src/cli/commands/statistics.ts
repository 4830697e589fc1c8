/** `gradus statistics [--family F] [--json]`: the statistics with their descriptions and sources. */
import { familyById } from '../../../objects/index.js';
import { STATISTICS } from '../../../statistics/index.js';
import { strOpt, type CommandSpec } from '../command.js';
import { toJsonText } from '../../core/json-text.js';

export const statisticsCommand: CommandSpec = {
  name: 'statistics',
  summary: 'list the statistics (id, family, description, source), all or of one family',
  usage: 'statistics [--family F] [--json]',
  options: [{ name: 'family', type: 'string', description: 'only the statistics of this family', placeholder: 'F' }],
  producesData: true,
  run(args, io) {
    const familyId = strOpt(args, 'family');
    if (familyId !== undefined) familyById(familyId); // unknown family: InputError with the nearest ids
    const list = STATISTICS.filter((s) => familyId === undefined || s.family === familyId);
    if (args.options['json']) {
      io.out(toJsonText(list.map((s) => ({ id: s.id, family: s.family, description: s.description, source: s.source, fastPath: s.step !== undefined }))));
      return;
    }
    const families = [...new Set(list.map((s) => s.family))].sort();
    if (list.length === 0) io.out(`no statistics on ${familyId} yet`);
    for (const f of families) {
      io.out(`${f}:`);
      const own = list.filter((s) => s.family === f);
      const width = Math.max(...own.map((s) => s.id.length));
      for (const s of own) io.out(`  ${s.id.padEnd(width)}  ${s.description}  [${s.source}]`);
    }
  },
};
