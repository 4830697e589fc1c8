/**
 * `gradus catalogue build|rebuild|info`: fill, rebuild and describe the catalogue. Every
 * option is checked, and the plan sized against the limit, before any file is touched; a
 * rebuild is written beside the old file and replaces it only when it is complete.
 */
import { existsSync, renameSync, rmSync } from 'node:fs';
import { InputError } from '../../core/errors.js';
import { toJsonText } from '../../core/json-text.js';
import { buildExpressionLibrary, restoreUserFamilies, userFamiliesOf, type ExpressionBuildReport } from '../../match/buildExpressions.js';
import { buildCatalogue, type BuildOptions, type BuildReport } from '../../store/buildCatalogue.js';
import { buildCatalogueParallel } from '../../store/buildParallel.js';
import { Catalogue } from '../../store/catalogue.js';
import { ForeignFileError, GRADUS_APPLICATION_ID, inspectCatalogueFile } from '../../store/catalogue-file.js';
import { cataloguePath } from '../../store/cataloguePath.js';
import { expressionCounts, expressionFamilies } from '../../store/expressionStore.js';
import { planUnits } from '../../store/planUnits.js';
import { flagOpt, intOpt, listOpt, strOpt, type CommandIO, type CommandSpec, type ParsedArgs } from '../command.js';

const ACTIONS = ['build', 'rebuild', 'info'] as const;
const DEFAULT_REBUILD_N = 6;
// n ≤ 8 visits about 91 million objects (about 10 minutes of one core); n ≤ 9 is refused unless raised
const DEFAULT_MAX_OBJECTS = 200_000_000n;

export const CATALOGUE_OPTION = {
  name: 'catalogue',
  type: 'string',
  description: 'catalogue file (default $GRADUS_CATALOGUE, else $XDG_DATA_HOME/gradus/catalogue.sqlite or ~/.local/share/gradus/catalogue.sqlite)',
  placeholder: 'PATH',
} as const;

/** The build options from the command line, checked and sized before any file is opened. */
function buildOptions(args: ParsedArgs, io: CommandIO, rebuild: boolean): BuildOptions & { workers: number } {
  const nMax = intOpt(args, 'n-max') ?? (rebuild ? DEFAULT_REBUILD_N : undefined);
  if (nMax === undefined) throw new InputError('catalogue build needs --n-max N (1..12)', 'n-max');
  const families = listOpt(args, 'families');
  const maxObjects = BigInt(intOpt(args, 'max-objects') ?? DEFAULT_MAX_OBJECTS);
  const plan = planUnits(nMax, families); // unknown or uncatalogued family names: InputError here
  const total = plan.units.reduce((s, u) => s + u.objects, 0n);
  // a rebuild starts from nothing: the whole plan must fit the limit before the old file is touched
  if (rebuild && total > maxObjects) {
    throw new InputError(`rebuilding up to n = ${nMax} visits ${total} objects, above the limit ${maxObjects}; raise it with --max-objects`, 'max-objects');
  }
  return { nMax, maxObjects, ...(families ? { families } : {}), progress: io.progress, workers: intOpt(args, 'workers') ?? 2 };
}

/** The size the expression library is built to with the catalogue (beyond: gradus expressions build). */
const EXPRESSIONS_WITH_CATALOGUE = 6;

async function runBuild(cat: Catalogue, o: BuildOptions & { workers: number }): Promise<BuildReport & { expressions?: ExpressionBuildReport }> {
  const report = await (o.workers > 1 ? buildCatalogueParallel(cat, o) : buildCatalogue(cat, o));
  // a whole build also fills the expression library (a build of named families leaves it alone)
  if (o.families) return report;
  const expressions = await buildExpressionLibrary(cat, { nMax: Math.min(o.nMax, EXPRESSIONS_WITH_CATALOGUE), workers: o.workers, progress: o.progress });
  return { ...report, expressions };
}

function printReport(io: CommandIO, path: string, nMax: number, report: BuildReport & { expressions?: ExpressionBuildReport }, json: boolean, extra: Record<string, unknown> = {}): void {
  if (json) return io.out(toJsonText({ catalogue: path, nMax, ...report, ...extra }));
  io.out(`catalogue ${path}: ${report.units} units built (${report.skippedDone} already there), ${report.rows} distributions from ${report.objects} objects in ${report.seconds.toFixed(1)}s`);
  const e = report.expressions;
  if (e) io.out(`expression library: ${e.units} units built (${e.skippedDone} already there) over ${e.families} families, ${e.values} values in ${e.seconds.toFixed(1)}s (n ≤ ${Math.min(nMax, EXPRESSIONS_WITH_CATALOGUE)}; beyond: gradus expressions build --n-max N)`);
  for (const s of report.familiesLeftOut) io.out(`  left out ${s.family}: ${s.why}`);
}

/** Rebuild: into PATH.rebuilding (resumed when a killed rebuild left it), then swap; the old file is kept aside. */
async function rebuild(path: string, args: ParsedArgs, io: CommandIO): Promise<void> {
  const o = buildOptions(args, io, true);
  const json = flagOpt(args, 'json');
  const force = flagOpt(args, 'force');
  let present: ReturnType<typeof inspectCatalogueFile>;
  try {
    present = inspectCatalogueFile(path); // a folder is refused here
  } catch (e) {
    // a file gradus did not write is set aside only when asked by name
    if (!(e instanceof ForeignFileError)) throw e;
    if (!force) throw new InputError(`${e.message.replace(/ \(give another --catalogue path\)$/, '')}; rebuild sets it aside only when asked by name: add --force`, 'force');
    present = { kind: 'empty' };
  }
  if (present.kind === 'sqlite' && present.applicationId !== GRADUS_APPLICATION_ID && present.applicationId !== 0 && !force) {
    throw new InputError(`${path} is not a gradus catalogue; rebuild sets it aside only when asked by name: add --force`, 'force');
  }
  if (present.kind === 'sqlite' && present.applicationId === 0 && !force) {
    // an old catalogue of ours (perhaps damaged), or another program's database: opening tells them apart
    try {
      Catalogue.open(path, { existing: true }).close();
    } catch (e) {
      if (e instanceof ForeignFileError) throw new InputError(`${e.message.replace(/ \(give another --catalogue path\)$/, '')}; rebuild sets it aside only when asked by name: add --force`, 'force');
    }
  }
  const fresh = `${path}.rebuilding`;
  // the expression families the user added are evaluated again into the new file
  const userFamilies = present.kind === 'sqlite' ? userFamiliesOf(() => Catalogue.open(path, { existing: true })) : [];
  const cat = Catalogue.open(fresh);
  let report: BuildReport & { expressions?: ExpressionBuildReport };
  try {
    report = await runBuild(cat, o);
    const kept = new Set(expressionFamilies(cat).map((f) => f.id));
    await restoreUserFamilies(cat, userFamilies.filter((f) => !kept.has(f.id)), o.workers, o.progress);
  } finally {
    cat.close();
  }
  let aside: string | undefined;
  if (present.kind !== 'missing') {
    aside = `${path}.aside-${new Date().toISOString().replace(/[:.]/g, '-')}`;
    for (const suffix of ['', '-wal', '-shm', '-journal']) if (existsSync(path + suffix)) renameSync(path + suffix, aside + suffix);
    io.err(`gradus: the previous catalogue is kept as ${aside}`);
  }
  renameSync(fresh, path);
  rmSync(`${fresh}-journal`, { force: true });
  printReport(io, path, o.nMax, report, json, aside ? { previous: aside } : {});
}

export const catalogueCommand: CommandSpec = {
  name: 'catalogue',
  summary: 'fill, rebuild or describe the catalogue of distributions the search looks in',
  usage: 'catalogue build|rebuild|info [--n-max N] [--families A,B] [--workers W] [--max-objects M] [--force] [--check] [--catalogue PATH] [--json]',
  positionals: [{ name: 'action', description: ACTIONS.join(', ') }],
  options: [
    { name: 'n-max', type: 'int', description: 'largest size n to enumerate (build; rebuild defaults to 6)', placeholder: 'N', min: 1, max: 12 },
    { name: 'families', type: 'list', description: 'only these family ids', placeholder: 'A,B' },
    { name: 'workers', type: 'int', description: 'worker threads (default 2; 1 works in this thread)', placeholder: 'W', min: 1, max: 16 },
    { name: 'max-objects', type: 'int', description: 'refuse a build visiting more objects than this (default 200000000)', placeholder: 'M', min: 1 },
    { name: 'force', type: 'flag', description: 'rebuild: also set aside a file that is not a gradus catalogue' },
    { name: 'check', type: 'flag', description: "info: also run SQLite's check of every page (slow on a large file)" },
    CATALOGUE_OPTION,
  ],
  producesData: true,
  details: [
    'build    enumerate every family × statistic (pairs, sums, Frobenius-level sums) up to n, and (without',
    `         --families) evaluate the expression library up to n ≤ ${EXPRESSIONS_WITH_CATALOGUE} (gradus expressions);`,
    '         finished units are kept, so an interrupted build resumes where it stopped',
    'rebuild  build a fresh catalogue beside the present one and swap them when it is complete',
    '         (the present file is kept as PATH.aside-<time>)',
    'info     what the catalogue holds, and whether its last build finished',
  ].join('\n'),
  async run(args: ParsedArgs, io) {
    const action = args.positionals[0]!;
    if (!(ACTIONS as readonly string[]).includes(action)) throw new InputError(`catalogue: the action must be one of ${ACTIONS.join(', ')} (got "${action.slice(0, 40)}")`, 'action');
    const path = cataloguePath(strOpt(args, 'catalogue'), io.env, io.cwd);
    const json = flagOpt(args, 'json');
    if (action !== 'rebuild' && flagOpt(args, 'force')) throw new InputError('--force goes with catalogue rebuild', 'force');
    if (action !== 'info' && flagOpt(args, 'check')) throw new InputError('--check goes with catalogue info', 'check');
    if (action === 'info') {
      const cat = Catalogue.open(path, { existing: true });
      try {
        const info = cat.info();
        const check = flagOpt(args, 'check') ? cat.integrityCheck() : undefined;
        const expressions = expressionCounts(cat);
        if (json) return io.out(toJsonText({ ...info, expressions, ...(check !== undefined ? { check } : {}) }));
        io.out(`catalogue ${info.path} (schema ${info.schema}${info.writable ? '' : ', read-only'})`);
        if (info.unfinished) io.out(`warning: ${info.unfinished}`);
        io.out(`${info.units} units, ${info.distributions} distributions, ${info.results.map((r) => `${r.count} ${r.kind} results`).join(', ') || 'no kept results'}, ${info.searches} saved searches`);
        for (const f of info.families) io.out(`  ${f.family.padEnd(28)} n ≤ ${f.nMax}  ${f.rows} distributions`);
        io.out(`expression library: ${expressions.families} families, ${expressions.values} values, ${expressions.series} distinct series (gradus expressions list)`);
        if (check !== undefined) io.out(`SQLite check: ${check}`);
      } finally {
        cat.close();
      }
      return;
    }
    if (action === 'rebuild') return rebuild(path, args, io);
    const o = buildOptions(args, io, false);
    const cat = Catalogue.open(path);
    try {
      printReport(io, path, o.nMax, await runBuild(cat, o), json);
    } finally {
      cat.close();
    }
  },
};
