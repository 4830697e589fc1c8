/** `gradus search`: find statistics whose distributions equal a target family of series. */
import { resolve } from 'node:path';
import { InputError } from '../../core/errors.js';
import { toJsonText } from '../../core/json-text.js';
import { makeProvenance } from '../../core/provenance.js';
import { atomicWrite, checkWritable } from '../../export/atomicWrite.js';
import { flagsText } from '../../export/flagsText.js';
import { recognise } from '../../match/recognise.js';
import { catalogueResultCache } from '../../match/resultCache.js';
import { searchCatalogue } from '../../match/search.js';
import { searchDocument, type SearchDocument } from '../../match/searchDocument.js';
import { targetFromTemplate, templatePlaces } from '../../match/targetFromTemplate.js';
import { parseTake, TAKE_CHOICES } from '../../series/fromDocument.js';
import { parseCoeffs } from '../../series/parseCoeffs.js';
import { rangeText, type Target } from '../../series/target.js';
import { readTargetFile } from '../../series/targetFile.js';
import { Catalogue } from '../../store/catalogue.js';
import { cataloguePath } from '../../store/cataloguePath.js';
import { flagOpt, intOpt, strOpt, type CommandIO, type CommandSpec, type ParsedArgs } from '../command.js';
import { progressReporter } from '../progress.js';
import { CATALOGUE_OPTION } from './catalogue.js';

const N_MAX = 12;

export function parseRange(text: string | undefined): [number, number] | undefined {
  if (text === undefined) return undefined;
  const m = /^\s*(\d{1,3})\s*\.\.\s*(\d{1,3})\s*$/.exec(text);
  if (!m) throw new InputError(`--n-range must be a..b with integers 1 ≤ a ≤ b ≤ ${N_MAX} (got "${text.slice(0, 40)}")`, 'n-range');
  const a = Number(m[1]);
  const b = Number(m[2]);
  if (a < 1 || b < a || b > N_MAX) throw new InputError(`--n-range must be a..b with integers 1 ≤ a ≤ b ≤ ${N_MAX} (got "${text}")`, 'n-range');
  return [a, b];
}

async function readTarget(args: ParsedArgs, io: CommandIO, range: [number, number] | undefined, cat: Catalogue): Promise<Target> {
  const sources = ['target-file', 'from', 'coeffs'].filter((s) => strOpt(args, s) !== undefined);
  if (sources.length !== 1) throw new InputError('search needs exactly one of --target-file F, --from "<command>", --coeffs "n=…:…"', sources[1] ?? 'from');
  const take = parseTake(strOpt(args, 'take'));
  let t: Target;
  if (sources[0] === 'from') {
    if (!range) throw new InputError('--from needs --n-range a..b (the sizes n to run the command for)', 'n-range');
    const template = strOpt(args, 'from')!;
    const report = progressReporter(io.progress);
    const total = templatePlaces(template, range[0], range[1]).length;
    t = await targetFromTemplate(template, range[0], range[1], take, {
      cwd: io.cwd,
      cache: catalogueResultCache(cat),
      onStep: (_key, i) => report('computing the target', i, total),
    });
    io.progress.finish();
    return t;
  }
  t = sources[0] === 'coeffs' ? parseCoeffs(strOpt(args, 'coeffs')!) : readTargetFile(resolve(io.cwd, strOpt(args, 'target-file')!));
  if (range) {
    const entries = t.entries.filter((e) => e.n >= range[0] && e.n <= range[1]);
    if (entries.length === 0) throw new InputError(`--n-range ${range[0]}..${range[1]} leaves no entry of the target (it has ${rangeText(t.entries)})`, 'n-range');
    t = { ...t, entries };
  }
  return t;
}

export const searchCommand: CommandSpec = {
  name: 'search',
  summary: 'find statistics (and pairs, sums, Frobenius-level sums) whose distribution equals a target',
  usage: 'search [--n-range a..b] (--target-file F | --from "<command with {n} {k}>" | --coeffs "n=3:1,2,2,1;…") [--take T] [--save FILE] [--catalogue PATH] [--json]',
  options: [
    { name: 'n-range', type: 'string', description: 'sizes n of the target (needed with --from)', placeholder: 'a..b' },
    { name: 'target-file', type: 'string', description: 'a target file in our format (README "Target files")', placeholder: 'F' },
    { name: 'from', type: 'string', description: 'a gradus data command, run for each n (and k = 1..n) with {n}, {k} replaced', placeholder: 'CMD' },
    { name: 'coeffs', type: 'string', description: 'coefficients typed: "n=3:1,2,2,1;n=4,k=2:…" (q,t rows separated by |)', placeholder: 'TEXT' },
    { name: 'take', type: 'string', description: `what to read from --from documents: ${TAKE_CHOICES.join(', ')} (sign = coefficient of s_(1^n) = ⟨F,e_n⟩)`, placeholder: 'T' },
    { name: 'limit', type: 'int', description: 'show at most this many matches (default 10)', placeholder: 'M', min: 1, max: 10000 },
    { name: 'save', type: 'string', description: 'also write the result as a saved-search file (for gradus export)', placeholder: 'FILE' },
    { name: 'force', type: 'flag', description: 'let --save replace an existing file' },
    CATALOGUE_OPTION,
  ],
  producesData: true,
  details: [
    'The catalogue (gradus catalogue build) is searched for the target and its variants (q-reversed, ω,',
    'q and t swapped): first its expression library (gradus expressions: which known symmetric function',
    'it is, written so that gradus sym evaluates it again), then the statistics; each match says the range',
    'it was verified on. A target over n with a second grading is also read as a marked union',
    'Σ_k t^{n−k} F(n,k), and one with three gradings (x, y, θ) by its θ-degree. Every search is kept in the',
    'catalogue with an id that gradus export accepts (as search:ID). Example:',
    '  gradus search --n-range 1..6 --from "qanalog ordered-stirling --n {n} --k {k}"',
  ].join('\n'),
  async run(args: ParsedArgs, io) {
    const range = parseRange(strOpt(args, 'n-range'));
    // --save is checked before any work: an existing file (without --force) or a missing folder fails now
    const saveText = strOpt(args, 'save');
    if (saveText !== undefined && /[/\\]$/.test(saveText)) throw new InputError(`--save: ${saveText} names a folder; give a file name`, 'save');
    const save = saveText === undefined ? undefined : resolve(io.cwd, saveText);
    if (save) checkWritable(save, flagOpt(args, 'force'), 'save');
    else if (flagOpt(args, 'force')) throw new InputError('--force goes with --save', 'force');
    const path = cataloguePath(strOpt(args, 'catalogue'), io.env, io.cwd);
    const cat = Catalogue.open(path, { existing: true });
    try {
      const target = await readTarget(args, io, range, cat);
      const t0 = Date.now();
      const outcome = searchCatalogue(cat, target);
      const rec = recognise(target);
      const unfinished = cat.unfinishedNote();
      const prov = makeProvenance({
        request: `search ${target.label}`,
        method: 'exact look-up of series hashes in the catalogue, then exact comparison on every entry',
        seconds: (Date.now() - t0) / 1000,
        notes: [`catalogue ${path}`, ...(unfinished ? [unfinished] : [])],
      });
      const doc = searchDocument(target, rangeText(target.entries), rec, outcome, prov);
      const id = cat.writable ? cat.saveSearch(target.label, doc, prov) : undefined;
      if (save) atomicWrite(save, toJsonText(doc) + '\n', flagOpt(args, 'force'), 'save');
      if (flagOpt(args, 'json')) return io.out(toJsonText({ ...doc, ...(id !== undefined ? { id: `search:${id}` } : {}) }));
      printText(io, doc, id, intOpt(args, 'limit') ?? 10, unfinished, save);
    } finally {
      cat.close();
    }
  },
};

function printText(io: CommandIO, d: SearchDocument, id: number | undefined, limit: number, unfinished: string | undefined, save: string | undefined): void {
  if (unfinished) io.out(`warning: ${unfinished}`);
  io.out(`target: ${String((d.target as { label?: string }).label)} (${d.range})`);
  const r = d.recognition;
  if (r.formula) io.out(`formula: f = ${r.formula}  (verified on ${d.range})`);
  for (const x of r.recurrences) io.out(`recurrence: ${x.text}${x.name ? `  [${x.name}]` : ''}  (checked on ${x.checked} entries)`);
  io.out(flagsText(r));
  const t = d.tried;
  const readings = t.readings?.length ? `; also read ${t.readings.join('; ')}` : '';
  const triedLine = `tried ${t.candidates} candidates at n = ${t.anchor?.n ?? '-'}${t.anchor?.k === undefined ? '' : `, k = ${t.anchor.k}`} (whole distributions: ${t.sameCount} with the same count at q = 1, ${t.exactAtAnchor} equal there${t.combines.includes('slice') ? '; slices of joint distributions by their second statistic checked apart' : ''}) over ${t.families.length} families [${t.families.join(', ')}], ${t.statistics.length} statistics, forms ${t.combines.join('/')}, variants ${t.variants.join(', ')}; catalogue n ≤ ${t.catalogueMaxN}${readings}`;
  printExpressions(io, d, limit);
  if (d.matches.length === 0) {
    io.out('no match: no distribution in the catalogue equals the target or any of its variants.');
    if ((d.target as { kind?: string }).kind === 'multi' && !t.readings?.length) io.out('the target is a table with three or more varying gradings; the catalogue holds series in q, in q and t, and Frobenius series');
    else if (!t.anchor) io.out(`the catalogue holds n ≤ ${t.catalogueMaxN}, below every n of the target; extend it with gradus catalogue build --n-max N`);
    io.out(triedLine);
  } else {
    io.out(`${d.matches.length} statistic match${d.matches.length === 1 ? '' : 'es'}, simplest first:`);
    d.matches.slice(0, limit).forEach((m, i) => {
      io.out(`${String(i + 1).padStart(3)}. ${m.marker ? `Σ_k ${m.marker} · ` : ''}${m.formula}`);
      io.out(`     family ${m.family}, statistics ${m.statistics.join(' & ')} (${m.combine}${m.transform ? `, via ${m.transform}` : ''}), ${m.mapping}, variant ${m.variant}${m.marker ? `; the coefficient of ${m.marker.replace(/\^.*/, '')}^j is the entry k = n − j` : ''}`);
      io.out(`     verified ${m.verified}${m.complete ? '' : `; not checked (outside the catalogue or the family): ${m.unchecked.map((p) => `(${p.n}${p.k === undefined ? '' : `,${p.k}`})`).join(' ')}`}`);
    });
    if (d.matches.length > limit) io.out(`… ${d.matches.length - limit} more (--limit, or --json for all)`);
    io.out(triedLine);
  }
  if (id !== undefined) io.out(`saved as search:${id} (gradus export search:${id} --format latex --out FILE)`);
  else io.out(`not kept in the catalogue (it is read-only)${save ? `; written to ${save}` : '; keep it with --save FILE'}`);
  if (save && id !== undefined) io.out(`written to ${save}`);
}

/** Expressions first: which known symmetric function the target is, written to be evaluated again. */
function printExpressions(io: CommandIO, d: SearchDocument, limit: number): void {
  const lib = d.tried.expressions;
  if (!lib || lib.families === 0) {
    io.out('expressions: the library is empty; fill it with gradus expressions build --n-max N');
    return;
  }
  if (d.expressions.length === 0) {
    io.out(`expressions: none of the ${lib.families} families of the library (n ≤ ${lib.maxN}) equals the target or its variants`);
    return;
  }
  io.out(`${d.expressions.length} expression${d.expressions.length === 1 ? '' : 's'} of the library, simplest first:`);
  d.expressions.slice(0, limit).forEach((m, i) => {
    io.out(`${String(i + 1).padStart(3)}. ${m.marker ? `Σ_k ${m.marker} · ` : ''}${m.expression}`);
    io.out(`     ${m.title} (${m.family}, ${m.origin}); ${m.mapping}; specialisation ${m.specialisation}${m.projection === 'hilbert' ? ', Hilbert series' : ''}; variant ${m.variant}${m.marker ? `; the coefficient of ${m.marker.replace(/\^.*/, '')}^j is the entry k = n − j` : ''}`);
    io.out(`     at ${m.exampleAt}: gradus sym "${m.example}"`);
    io.out(`     verified ${m.verified}${m.complete ? '' : `; not checked (outside the library): ${m.unchecked.map((p) => `(${p.n}${p.k === undefined ? '' : `,${p.k}`})`).join(' ')}`}`);
    io.out(`     source: ${m.source}`);
  });
  if (d.expressions.length > limit) io.out(`… ${d.expressions.length - limit} more (--limit, or --json for all)`);
}
