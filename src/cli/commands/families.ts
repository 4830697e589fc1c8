/** `gradus families [--json]`: the combinatorial families, their parameters and plug-ins. */
import { FAMILIES } from '../../../objects/index.js';
import { transformsFrom } from '../../../objects/transforms/index.js';
import { statisticsOfFamily } from '../../../statistics/index.js';
import type { ParamSpec } from '../../enumerate/plugin.js';
import type { CommandSpec } from '../command.js';
import { toJsonText } from '../../core/json-text.js';

function paramText(p: ParamSpec): string {
  const range = p.kind === 'int' ? `${p.min ?? 0}..${p.max ?? '∞'}` : p.kind === 'partition' ? `partition, size ≤ ${p.max ?? '∞'}` : `list, sum ≤ ${p.max ?? '∞'}`;
  return `--${p.name}${p.optional ? ' (optional)' : ''}: ${p.description} [${range}]`;
}

export const familiesCommand: CommandSpec = {
  name: 'families',
  summary: 'list the families of combinatorial objects, with their parameters',
  usage: 'families [--json]',
  options: [],
  producesData: true,
  details: 'Draw objects of a family with `gradus show <family> --n N …`.',
  run(args, io) {
    const rows = FAMILIES.map((f) => ({
      id: f.id,
      description: f.description,
      source: f.source,
      params: f.params.map((p) => ({ ...p })),
      statistics: statisticsOfFamily(f.id).map((s) => s.id),
      transforms: transformsFrom(f.id).map((t) => t.id),
      hasShape: Boolean(f.shape),
      hasReadingWord: Boolean(f.readingWord),
    }));
    if (args.options['json']) {
      io.out(toJsonText(rows));
      return;
    }
    for (const r of rows) {
      io.out(`${r.id} — ${r.description}`);
      for (const p of FAMILIES.find((f) => f.id === r.id)!.params) io.out(`    ${paramText(p)}`);
      io.out(`    statistics: ${r.statistics.length ? r.statistics.join(', ') : '(none yet)'}`);
      if (r.transforms.length) io.out(`    transforms: ${r.transforms.join(', ')}`);
    }
    io.out(`${rows.length} families. Example: gradus show permutations --n 4 --limit 5`);
  },
};
