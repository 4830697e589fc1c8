/** `gradus catalogue build|rebuild|info`: fill, rebuild and describe the catalogue. */
import { existsSync, renameSync } from 'node:fs';
import { InputError } from '../../core/errors.js';
import { buildCatalogue } from '../../store/buildCatalogue.js';
import { buildCatalogueParallel } from '../../store/buildParallel.js';
import { Catalogue } from '../../store/catalogue.js';
import { cataloguePath } from '../../store/cataloguePath.js';
import { flagOpt, intOpt, listOpt, strOpt, type CommandSpec, type ParsedArgs } from '../command.js';
import { toJsonText } from '../../core/json-text.js';

const ACTIONS = ['build', 'rebuild', 'info'] as const;
const DEFAULT_REBUILD_N = 6;
const DEFAULT_MAX_OBJECTS = 50_000_000n;

export const CATALOGUE_OPTION = {
  name: 'catalogue',
  type: 'string',
  description: 'catalogue file (default $GRADUS_CATALOGUE, else $XDG_DATA_HOME/gradus/catalogue.sqlite or ~/.local/share/gradus/catalogue.sqlite)',
  placeholder: 'PATH',
} as const;

export const catalogueCommand: CommandSpec = {
  name: 'catalogue',
  summary: 'fill, rebuild or describe the catalogue of distributions the search looks in',
  usage: 'catalogue build|rebuild|info [--n-max N] [--families A,B] [--workers W] [--catalogue PATH] [--json]',
  positionals: [{ name: 'action', description: ACTIONS.join(', ') }],
  options: [
    { name: 'n-max', type: 'int', description: 'largest size n to enumerate (build; rebuild defaults to 6)', placeholder: 'N', min: 1, max: 12 },
    { name: 'families', type: 'list', description: 'only these family ids', placeholder: 'A,B' },
    { name: 'workers', type: 'int', description: 'worker threads (default 2; 1 works in this thread)', placeholder: 'W', min: 1, max: 16 },
    { name: 'max-objects', type: 'int', description: 'refuse a build visiting more objects than this (default 50000000)', placeholder: 'M', min: 1 },
    CATALOGUE_OPTION,
  ],
  producesData: true,
  details: [
    'build    enumerate every family × statistic (pairs, sums, Frobenius-level sums) up to n;',
    '         finished units are kept, so an interrupted build resumes where it stopped',
    'rebuild  set the present file aside (as PATH.aside-<time>) and build a fresh one',
    'info     what the catalogue holds',
  ].join('\n'),
  async run(args: ParsedArgs, io) {
    const action = args.positionals[0]!;
    if (!(ACTIONS as readonly string[]).includes(action)) throw new InputError(`catalogue: the action must be one of ${ACTIONS.join(', ')} (got "${action}")`, 'action');
    const path = cataloguePath(strOpt(args, 'catalogue'), io.env, io.cwd);
    const json = flagOpt(args, 'json');
    if (action === 'info') {
      const cat = Catalogue.open(path, { readonly: true });
      try {
        const info = cat.info();
        if (json) return io.out(toJsonText(info));
        io.out(`catalogue ${info.path} (schema ${info.schema})`);
        io.out(`${info.units} units, ${info.distributions} distributions, ${info.modules} module results, ${info.syms} symmetric-function results, ${info.searches} saved searches`);
        for (const f of info.families) io.out(`  ${f.family.padEnd(28)} n ≤ ${f.nMax}  ${f.rows} distributions`);
      } finally {
        cat.close();
      }
      return;
    }
    let nMax = intOpt(args, 'n-max');
    if (action === 'rebuild') {
      nMax ??= DEFAULT_REBUILD_N;
      if (existsSync(path)) {
        const aside = `${path}.aside-${new Date().toISOString().replace(/[:.]/g, '-')}`;
        for (const suffix of ['', '-wal', '-shm']) if (existsSync(path + suffix)) renameSync(path + suffix, aside + suffix);
        io.err(`gradus: the previous catalogue is kept as ${aside}`);
      }
    }
    if (nMax === undefined) throw new InputError('catalogue build needs --n-max N (1..12)', 'n-max');
    const maxObjects = BigInt(intOpt(args, 'max-objects') ?? DEFAULT_MAX_OBJECTS);
    const cat = Catalogue.open(path);
    try {
      const families = listOpt(args, 'families');
      const workers = intOpt(args, 'workers') ?? 2;
      const options = { nMax, maxObjects, ...(families ? { families } : {}), progress: io.progress };
      const report = workers > 1 ? await buildCatalogueParallel(cat, { ...options, workers }) : buildCatalogue(cat, options);
      if (json) return io.out(toJsonText({ catalogue: path, nMax, ...report }));
      io.out(`catalogue ${path}: ${report.units} units built (${report.skippedDone} already there), ${report.rows} distributions from ${report.objects} objects in ${report.seconds.toFixed(1)}s`);
      for (const s of report.familiesLeftOut) io.out(`  left out ${s.family}: ${s.why}`);
    } finally {
      cat.close();
    }
  },
};
