/**
 * `gradus sweep run|plan|list|show|export`: scan a family of seeds (monomials up to a degree,
 * superspace Vandermonde heights, θ-staircases, typed polynomials with integer parameters)
 * over n (and k) and operator sets; rank what is remarkable; keep modules and sweep in the
 * catalogue; export the findings table with the commands that reproduce each row.
 */
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { InputError } from '../../core/errors.js';
import { toJsonText } from '../../core/json-text.js';
import { atomicWrite, checkWritable } from '../../export/atomicWrite.js';
import { latexText } from '../../export/latexText.js';
import { TaskCancelled } from '../../pool/pool.js';
import { Catalogue } from '../../store/catalogue.js';
import { cataloguePath } from '../../store/cataloguePath.js';
import {
  countsText,
  findSweep,
  listSweeps,
  planDocument,
  planSweep,
  renderSweep,
  runSweep,
  stateText,
  SWEEP_EXPORT_FORMATS,
  SWEEP_FAMILIES,
  SWEEP_OPTIONS,
  sweepFromArgs,
  sweepText,
  type SweepExportFormat,
} from '../../sweep/index.js';
import { flagOpt, intOpt, strOpt, type CommandIO, type CommandSpec, type ParsedArgs } from '../command.js';
import { progressReporter } from '../progress.js';
import { CATALOGUE_OPTION } from './catalogue.js';

const ACTIONS = ['run', 'plan', 'list', 'show', 'export'] as const;
type Action = (typeof ACTIONS)[number];

const OUTPUT_OPTIONS = ['format', 'out', 'force'];
const DEFINITION_OPTIONS = SWEEP_OPTIONS.map((o) => o.name);

function checkOptions(action: Action, args: ParsedArgs): void {
  const defines = action === 'run' || action === 'plan';
  for (const [name, v] of Object.entries(args.options)) {
    if (v === undefined) continue;
    if (!defines && DEFINITION_OPTIONS.includes(name)) throw new InputError(`--${name} defines a sweep: it goes with sweep run or sweep plan, not ${action}`, name);
    if (action !== 'export' && OUTPUT_OPTIONS.includes(name)) throw new InputError(`--${name} goes with sweep export`, name);
    if (name === 'limit' && (action === 'plan' || action === 'list')) throw new InputError(`--limit goes with sweep run, show and export`, 'limit');
  }
  const wantsRef = action === 'show' || action === 'export';
  if (wantsRef && args.positionals.length < 2) throw new InputError(`sweep ${action} needs the sweep: sweep:ID (gradus sweep list names them)`, 'sweep');
  if (!wantsRef && args.positionals.length > 1) throw new InputError(`sweep ${action} takes no sweep id (got "${args.positionals[1]!.slice(0, 40)}")`, 'sweep');
}

async function run(args: ParsedArgs, io: CommandIO, path: string): Promise<void> {
  const { spec, limits } = sweepFromArgs(args);
  const cat = Catalogue.open(path);
  const stop = new AbortController();
  const onSignal = () => stop.abort();
  process.once('SIGINT', onSignal);
  process.once('SIGTERM', onSignal);
  try {
    const report = progressReporter(io.progress);
    let doc;
    try {
      doc = await runSweep(spec, limits, {
        catalogue: cat,
        signal: stop.signal,
        progress: (label, done, total) => report(`sweep: ${label}`, done, total),
        onPlan: (plan) => io.err(`gradus: sweep of ${plan.counts.modules} distinct modules (${plan.lines.length} seeds × operator sets)`),
      });
    } catch (e) {
      if (e instanceof TaskCancelled) throw new InputError('sweep interrupted: the modules finished so far are kept; run the same command again to finish it', 'sweep');
      throw e;
    } finally {
      io.progress.finish();
    }
    if (flagOpt(args, 'json')) io.out(toJsonText(doc));
    else for (const line of sweepText(doc, intOpt(args, 'limit') ?? 20)) io.out(line);
    if (!flagOpt(args, 'json') && cat.writable) io.out(`kept as sweep:${doc.id} (gradus sweep export sweep:${doc.id} --format latex --out FILE)`);
    if (doc.counts.failed > 0) {
      const first = doc.rows.flatMap((r) => r.missing).find((m) => !/estimated work|limit/.test(m.why));
      throw new Error(`${doc.counts.failed} module${doc.counts.failed === 1 ? '' : 's'} failed${first ? ` (first: ${first.key}: ${first.why})` : ''}`);
    }
  } finally {
    process.off('SIGINT', onSignal);
    process.off('SIGTERM', onSignal);
    cat.close();
  }
}

function plan(args: ParsedArgs, io: CommandIO, path: string): void {
  const { spec, limits } = sweepFromArgs(args);
  const p = planSweep(spec, limits);
  // the plan only reads: a catalogue that is not there is not created
  const cat = existsSync(path) ? Catalogue.open(path, { existing: true }) : undefined;
  try {
    const kept = (key: string) => cat?.getResult(key) !== undefined;
    const doc = planDocument(p, kept);
    if (flagOpt(args, 'json')) return io.out(toJsonText(doc));
    const keptCount = p.modules.filter((m) => kept(m.key)).length;
    io.out(`gradus ${p.key}`);
    io.out(`${p.counts.raw} seeds listed (${p.counts.vanishing} vanish, ${p.counts.duplicates} equal to one before${p.counts.undefinedPlaces ? `, ${p.counts.undefinedPlaces} not defined` : ''}) → ${p.counts.modules} distinct modules, ${keptCount} of them kept already; ${p.lines.length} seed${p.lines.length === 1 ? '' : 's'} × operator sets`);
    const seconds = p.modules.reduce((s, m) => s + m.seconds, 0);
    io.out(`estimated enumeration (a lower bound, both primes): ${seconds.toFixed(1)} s of processor time`);
    for (const m of p.modules) io.out(`${kept(m.key) ? 'kept ' : 'to do'}  gradus ${m.key}`);
  } finally {
    cat?.close();
  }
}

function withCatalogue<T>(path: string, f: (cat: Catalogue) => T): T {
  const cat = Catalogue.open(path, { existing: true });
  try {
    return f(cat);
  } finally {
    cat.close();
  }
}

export const sweepCommand: CommandSpec = {
  name: 'sweep',
  summary: 'scan a family of seeds over n, k and operator sets, and rank the modules by what is remarkable',
  usage:
    'sweep run|plan --family F [family options] --n a..b [--k a..b] --ops x,theta [--ops …] [--max-work W] [--max-modules M] [--limit M] [--catalogue PATH] [--json] | sweep list | sweep show sweep:ID [--limit M] [--json] | sweep export sweep:ID --format markdown|latex|json --out FILE [--force] [--limit M]',
  positionals: [
    { name: 'action', description: ACTIONS.join(', ') },
    { name: 'sweep', description: 'sweep:ID (show, export)', optional: true },
  ],
  options: [
    ...SWEEP_OPTIONS,
    { name: 'limit', type: 'int', description: 'rows to print or export (default 20 printed, all exported)', placeholder: 'M', min: 1, max: 1_000_000 },
    { name: 'format', type: 'string', description: `export: ${SWEEP_EXPORT_FORMATS.join(', ')} (LaTeX: a fragment needing no package; JSON: the sweep, format gradus-sweep)`, placeholder: 'F' },
    { name: 'out', type: 'string', description: 'export: the file to write (atomically)', placeholder: 'FILE' },
    { name: 'force', type: 'flag', description: 'export: replace an existing file' },
    CATALOGUE_OPTION,
  ],
  producesData: true,
  details: [
    `Families (--family): ${SWEEP_FAMILIES.join(', ')}`,
    '  monomials  x^a θ_S with total x-degree ≤ --max-degree and --thetas θ variables, antisymmetrized',
    '             (or --symmetrize); equal column multisets are one seed, vanishing ones are counted',
    '  heights    δ_{n,k} with --height 0..3,k-1 (k-1 is the published height), every k = 1..n or --k',
    '  staircase  the θ-staircase seed, every k = 1..n or --k',
    '  poly       --poly "x1^{a}*x2^{b+1}*th1" with --param a=0..3 --param b=0..2 ({n}, {k} are the sizes)',
    'Each module is one `gradus module … --frobenius` request, kept in the catalogue: a module computed once',
    'is never computed again, and an interrupted sweep resumes when run again. `plan` lists the requests',
    '(--json: format gradus-sweep-plan) without computing. Examples:',
    '  gradus sweep run --family monomials --max-degree 4 --thetas 1 --n 3..4 --ops x,theta',
    '  gradus sweep run --family heights --height 0..2,k-1 --n 1..5 --ops x',
  ].join('\n'),
  async run(args: ParsedArgs, io) {
    const action = args.positionals[0]!;
    if (!(ACTIONS as readonly string[]).includes(action)) throw new InputError(`sweep: the action must be one of ${ACTIONS.join(', ')} (got "${action.slice(0, 40)}")`, 'action');
    checkOptions(action as Action, args);
    const path = cataloguePath(strOpt(args, 'catalogue'), io.env, io.cwd);
    const json = flagOpt(args, 'json');
    switch (action as Action) {
      case 'run':
        return run(args, io, path);
      case 'plan':
        return plan(args, io, path);
      case 'list':
        return withCatalogue(path, (cat) => {
          const all = listSweeps(cat);
          if (json) return io.out(toJsonText(all.map((d) => ({ id: `sweep:${d.id}`, key: d.key, state: d.state, counts: d.counts, time: d.provenance.time }))));
          if (all.length === 0) return io.out(`no sweeps kept in ${cat.path}`);
          for (const d of all) io.out(`sweep:${d.id}  ${d.state === 'done' ? 'done      ' : 'unfinished'}  ${d.counts.modules} modules  gradus ${d.key}`);
        });
      case 'show':
        return withCatalogue(path, (cat) => {
          const d = findSweep(cat, args.positionals[1]!);
          if (json) return io.out(toJsonText(d));
          for (const line of sweepText(d, intOpt(args, 'limit') ?? 20)) io.out(line);
        });
      case 'export': {
        const format = strOpt(args, 'format');
        if (!format || !(SWEEP_EXPORT_FORMATS as readonly string[]).includes(format)) {
          throw new InputError(`--format must be one of ${SWEEP_EXPORT_FORMATS.join(', ')} (got ${format === undefined ? 'nothing' : `"${format.slice(0, 20)}"`})`, 'format');
        }
        const out = strOpt(args, 'out');
        if (!out) throw new InputError('sweep export needs --out FILE', 'out');
        const file = resolve(io.cwd, out);
        if (/[/\\]$/.test(out)) throw new InputError(`--out: ${out} names a folder; give a file name`, 'out');
        checkWritable(file, flagOpt(args, 'force'));
        return withCatalogue(path, (cat) => {
          const d = findSweep(cat, args.positionals[1]!);
          atomicWrite(file, renderSweep(d, format as SweepExportFormat, intOpt(args, 'limit') ?? d.rows.length, latexText), flagOpt(args, 'force'));
          io.out(`written ${file} (${format}, sweep:${d.id}, ${stateText(d)}; ${countsText(d)})`);
        });
      }
    }
  },
};
