/** Help texts: the command list, and one command's usage with its options. */
import type { CommandSpec } from './command.js';
import { optionsOf } from './parse-args.js';

export function mainHelp(commands: readonly CommandSpec[], version: string): string {
  const width = Math.max(...commands.map((c) => c.name.length));
  return [
    `gradus ${version} — graded S_n-modules, symmetric functions and statistics, exactly`,
    '',
    'usage: gradus <command> [arguments] [--json]',
    '       gradus              (no command: open the terminal app on the demo session)',
    '',
    'commands:',
    ...commands.map((c) => `  ${c.name.padEnd(width)}  ${c.summary}`),
    '',
    'gradus <command> --help shows the arguments of one command.',
    'Bad input prints one line to stderr and exits with code 2.',
  ].join('\n');
}

export function commandHelp(spec: CommandSpec): string {
  const opts = optionsOf(spec);
  const flag = (o: (typeof opts)[number]): string =>
    `--${o.name}${o.type === 'flag' ? '' : ` ${o.placeholder ?? (o.type === 'int' ? 'N' : o.type === 'list' ? 'A,B,…' : 'TEXT')}`}`;
  const width = Math.max(0, ...opts.map((o) => flag(o).length), ...(spec.positionals ?? []).map((p) => p.name.length + 2));
  const lines = [`usage: gradus ${spec.usage}`, '', spec.summary];
  if (spec.positionals?.length) {
    lines.push('', 'arguments:');
    for (const p of spec.positionals) lines.push(`  ${`<${p.name}>`.padEnd(width)}  ${p.description}`);
  }
  if (opts.length) {
    lines.push('', 'options:');
    for (const o of opts) {
      const range = o.type === 'int' && (o.min !== undefined || o.max !== undefined) ? ` (${o.min ?? '…'}..${o.max ?? '…'})` : '';
      lines.push(`  ${flag(o).padEnd(width)}  ${o.description}${range}`);
    }
  }
  if (spec.details) lines.push('', spec.details.trimEnd());
  return lines.join('\n');
}
