/** `gradus show <family> …`: draws objects of a family with the values of chosen statistics (the request kind of src/requests). */
import type { Params } from '../../enumerate/plugin.js';
import { showKind } from '../../requests/show-request.js';
import { dataCommand } from '../data-command.js';

function describeParams(p: Params): string {
  return Object.entries(p)
    .map(([k, v]) => `${k}=${typeof v === 'number' ? v : v!.join(',')}`)
    .join(' ');
}

export const showCommand = dataCommand(showKind, {
  summary: 'draw objects of a family with the values of chosen statistics',
  details: "Objects come in the family's generation order (or at random with --sample). See `gradus families` for ids and parameters.",
  print(r, result, io) {
    const rows = result.objects;
    const how = r.sample !== undefined ? `${rows.length} drawn at random (seed ${r.sample})` : `showing ${BigInt(rows.length) === result.count ? 'all' : `the first ${rows.length}`}`;
    io.out(`${result.family} ${describeParams(result.params)}: ${result.count} object${result.count === 1n ? '' : 's'}; ${how}`);
    const multiLine = rows.some((x) => x.text.includes('\n'));
    const width = Math.max(0, ...rows.map((x) => x.text.length));
    for (const row of rows) {
      const values = result.statistics.map((id) => `${id}=${row.stats[id]}`).join('  ');
      if (multiLine) {
        io.out('');
        io.out(row.text);
        if (values) io.out(values);
      } else io.out(values ? `${row.text.padEnd(width)}    ${values}` : row.text);
    }
  },
});
