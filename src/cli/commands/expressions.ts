/**
 * `gradus expressions build|add|list|remove`: the expression library in the catalogue —
 * families of symmetric-function expressions the search identifies a target with. Options are
 * checked before the catalogue is opened; `add` evaluates every place first and stores the
 * family in one transaction, or nothing.
 */
import { InputError } from '../../core/errors.js';
import { toJsonText } from '../../core/json-text.js';
import { addExpressionFamily, buildExpressionLibrary, EXPRESSION_N_MAX, type ExpressionBuildReport } from '../../match/buildExpressions.js';
import { BUILT_IN_EXPRESSIONS, SPECIALISATIONS, userFamily } from '../../match/expressionFamilies.js';
import { Catalogue } from '../../store/catalogue.js';
import { cataloguePath } from '../../store/cataloguePath.js';
import { expressionCounts, expressionFamilies, removeExpressionFamily } from '../../store/expressionStore.js';
import { flagOpt, intOpt, listOpt, strOpt, type CommandIO, type CommandSpec, type ParsedArgs } from '../command.js';
import { CATALOGUE_OPTION } from './catalogue.js';

const ACTIONS = ['build', 'add', 'list', 'remove'] as const;
const DEFAULT_N_MAX = 6;
/** The twists the search tries on the target (so every stored value is also found under them). */
export const TWISTS_TEXT = 'ω, q-reversal (revq), ω with q-reversal, q ↔ t (swap), ω with q ↔ t';

function report(io: CommandIO, path: string, r: ExpressionBuildReport, json: boolean): void {
  if (json) return io.out(toJsonText({ catalogue: path, ...r }));
  io.out(`expression library in ${path}: ${r.units} units built (${r.skippedDone} already there) over ${r.families} families, ${r.values} values in ${r.seconds.toFixed(1)}s`);
}

function onlyFor(args: ParsedArgs, action: string, allowed: readonly string[]): void {
  for (const o of ['template', 'source', 'title', 'families', 'n-max', 'workers']) {
    if (!allowed.includes(o) && args.options[o] !== undefined) throw new InputError(`--${o} does not go with expressions ${action}`, o);
  }
}

export const expressionsCommand: CommandSpec = {
  name: 'expressions',
  summary: 'build, add to, list or remove from the library of symmetric-function expressions the search names targets with',
  usage: 'expressions build|add|list|remove [NAME] [--template "…{n}…"] [--source TEXT] [--title TEXT] [--n-max N] [--families A,B] [--workers W] [--catalogue PATH] [--json]',
  positionals: [
    { name: 'action', description: ACTIONS.join(', ') },
    { name: 'name', description: 'the family name (add, remove)', optional: true },
  ],
  options: [
    { name: 'template', type: 'string', description: 'add: the expression in the language of gradus sym, with {n}, {k} (k = 1..n) or {λ} (a partition of n)', placeholder: 'EXPR' },
    { name: 'source', type: 'string', description: 'add: where the family comes from (a paper or book), shown with its matches and in exports', placeholder: 'TEXT' },
    { name: 'title', type: 'string', description: 'add: a short name shown with its matches (default: the template)', placeholder: 'TEXT' },
    { name: 'n-max', type: 'int', description: `largest n (build, add; default ${DEFAULT_N_MAX})`, placeholder: 'N', min: 1, max: EXPRESSION_N_MAX },
    { name: 'families', type: 'list', description: 'build: only these families', placeholder: 'A,B' },
    { name: 'workers', type: 'int', description: 'worker threads (default 2; 1 works in this thread)', placeholder: 'W', min: 1, max: 16 },
    CATALOGUE_OPTION,
  ],
  producesData: true,
  details: [
    'build   evaluate every family (built in, and the ones added) for n = 1..N; finished sizes are kept',
    'add     a family of your own: gradus expressions add my-delta --template "delta(e({k}-1), e({n}))" --n-max 5',
    '        every place is evaluated first; a failure (division by zero, an unknown function, a limit)',
    '        names the place and the reason, exits 2, and stores nothing',
    'list    the families with their templates, sources and sizes, the specialisations stored and the twists searched',
    'remove  a family you added',
    `Each value is stored as it is and at ${SPECIALISATIONS.slice(1).map((s) => s.id).join(', ')} (q = 0 and q = 1 read back in q),`,
    `with its Hilbert series; the search also tries the twists ${TWISTS_TEXT} of the target.`,
    `Built-in families: ${BUILT_IN_EXPRESSIONS.map((f) => f.id).join(', ')}.`,
  ].join('\n'),
  async run(args: ParsedArgs, io) {
    const action = args.positionals[0]!;
    if (!(ACTIONS as readonly string[]).includes(action)) throw new InputError(`expressions: the action must be one of ${ACTIONS.join(', ')} (got "${action.slice(0, 40)}")`, 'action');
    const name = args.positionals[1];
    if ((action === 'add' || action === 'remove') && name === undefined) throw new InputError(`expressions ${action} needs the family name`, 'name');
    if ((action === 'build' || action === 'list') && name !== undefined) throw new InputError(`expressions ${action} takes no name (got "${name.slice(0, 40)}")`, 'name');
    const json = flagOpt(args, 'json');
    const path = cataloguePath(strOpt(args, 'catalogue'), io.env, io.cwd);
    const nMax = intOpt(args, 'n-max') ?? DEFAULT_N_MAX;
    const workers = intOpt(args, 'workers') ?? 2;
    if (action === 'build') {
      onlyFor(args, action, ['families', 'n-max', 'workers']);
      const families = listOpt(args, 'families');
      const cat = Catalogue.open(path);
      try {
        return report(io, path, await buildExpressionLibrary(cat, { nMax, ...(families ? { families } : {}), workers, progress: io.progress }), json);
      } finally {
        cat.close();
      }
    }
    if (action === 'add') {
      onlyFor(args, action, ['template', 'source', 'title', 'n-max', 'workers']);
      const template = strOpt(args, 'template');
      if (template === undefined) throw new InputError('expressions add needs --template "<expression with {n}>"', 'template');
      const family = userFamily(name!, template, strOpt(args, 'source'), strOpt(args, 'title'));
      const cat = Catalogue.open(path);
      try {
        return report(io, path, await addExpressionFamily(cat, family, nMax, workers, io.progress), json);
      } finally {
        cat.close();
      }
    }
    onlyFor(args, action, []);
    const cat = Catalogue.open(path, { existing: true });
    try {
      if (action === 'remove') {
        const f = expressionFamilies(cat).find((x) => x.id === name);
        if (!f) throw new InputError(`no expression family ${name} in ${path}`, 'name');
        if (f.origin !== 'user') throw new InputError(`${name} is built in; only families you added can be removed`, 'name');
        removeExpressionFamily(cat, name!);
        return json ? io.out(toJsonText({ removed: name })) : io.out(`removed ${name} from ${path}`);
      }
      const families = expressionFamilies(cat);
      const counts = expressionCounts(cat);
      const specialisations = SPECIALISATIONS.map((s) => s.id);
      if (json) return io.out(toJsonText({ catalogue: path, ...counts, specialisations, twists: TWISTS_TEXT.split(', '), families }));
      io.out(`expression library in ${path}: ${counts.families} families, ${counts.values} values, ${counts.series} distinct series`);
      io.out(`specialisations stored: ${specialisations.join(', ')} (each with its Hilbert series); twists searched: ${TWISTS_TEXT}`);
      if (families.length === 0) io.out('empty: fill it with gradus expressions build --n-max N (or gradus catalogue build)');
      for (const f of families) {
        const sizes = f.sizes.length ? `n = ${f.sizes[0]}..${f.sizes[f.sizes.length - 1]}` : 'nothing built';
        io.out(`  ${f.id.padEnd(18)} ${f.title}  [${f.origin}, by ${f.index === 'partition' ? 'λ ⊢ n' : f.index}, ${sizes}]`);
        io.out(`  ${''.padEnd(18)} gradus sym "${f.template}"`);
        io.out(`  ${''.padEnd(18)} source: ${f.source}`);
      }
    } finally {
      cat.close();
    }
  },
};
