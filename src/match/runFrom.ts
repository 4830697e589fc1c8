/**
 * `--from "<gradus data command with {n} and {k}>"`: run the command in-process for every
 * n in the range (and every k = 1..n where {k} appears), capturing its JSON on stdout.
 */
import { InputError } from '../core/errors.js';
import type { CommandIO } from '../cli/command.js';
import { silentProgress } from '../core/progress.js';
import { seriesFromDocument, type Take } from '../series/fromDocument.js';
import { makeTarget, type Target, type TargetEntry } from '../series/target.js';

/** Split a command line into words: spaces separate, single or double quotes group. */
export function splitWords(text: string): string[] {
  const out: string[] = [];
  const re = /"([^"]*)"|'([^']*)'|(\S+)/g;
  let m: RegExpExecArray | null;
  while ((m = re.exec(text))) out.push(m[1] ?? m[2] ?? m[3]!);
  return out;
}

/** Where results of data commands are kept and found again (the catalogue). */
export interface ResultCache {
  get(argv: readonly string[]): unknown | undefined;
  put(argv: readonly string[], doc: unknown, n: number, k: number | undefined): void;
}

export async function targetFromCommand(template: string, nFrom: number, nTo: number, take: Take, env: CommandIO['env'], cwd: string, cache?: ResultCache, onStep?: (text: string) => void): Promise<Target> {
  if (!template.includes('{n}')) throw new InputError('--from needs {n} in the command (and {k} where it has a second parameter)', 'from');
  const words = splitWords(template);
  if (words[0] === 'gradus') words.shift();
  if (words[0] === 'search') throw new InputError('--from cannot run search itself', 'from');
  const { main } = await import('../cli/main.js');
  const hasK = template.includes('{k}');
  const entries: TargetEntry[] = [];
  for (let n = nFrom; n <= nTo; n++) {
    for (const k of hasK ? Array.from({ length: n }, (_, i) => i + 1) : [undefined]) {
      const argv = words.map((w) => w.replaceAll('{n}', String(n)).replaceAll('{k}', String(k ?? '')));
      if (!argv.includes('--json')) argv.push('--json');
      const kept = cache?.get(argv);
      if (kept !== undefined) {
        entries.push({ n, ...(k === undefined ? {} : { k }), series: seriesFromDocument(kept, take, `gradus ${argv.join(' ')}`) });
        continue;
      }
      const out: string[] = [];
      const err: string[] = [];
      const io: CommandIO = { out: (s) => out.push(s), err: (s) => err.push(s), progress: silentProgress, env, cwd };
      onStep?.(`gradus ${argv.join(' ')}`);
      const code = await main(argv, io);
      if (code !== 0) throw new InputError(`--from: \`gradus ${argv.join(' ')}\` failed: ${err.join(' ').replace(/^gradus: /, '') || `exit ${code}`}`, 'from');
      let doc: unknown;
      try {
        doc = JSON.parse(out.join('\n'));
      } catch {
        throw new InputError(`--from: \`gradus ${argv.join(' ')}\` did not print one JSON document`, 'from');
      }
      entries.push({ n, ...(k === undefined ? {} : { k }), series: seriesFromDocument(doc, take, `gradus ${argv.join(' ')}`) });
      cache?.put(argv, doc, n, k);
    }
  }
  return makeTarget(`gradus ${template}${take === 'auto' ? '' : ` (--take ${take})`}, n = ${nFrom}..${nTo}`, entries);
}
