/** `gradus export <result> --format latex|markdown|json --out FILE [--force]`. */
import { resolve } from 'node:path';
import { InputError } from '../../core/errors.js';
import { readJsonFile } from '../../core/schema.js';
import { atomicWrite, checkWritable } from '../../export/atomicWrite.js';
import { exportModel } from '../../export/exportModel.js';
import { renderJson } from '../../export/renderJson.js';
import { renderLatex } from '../../export/renderLatex.js';
import { renderMarkdown } from '../../export/renderMarkdown.js';
import { checkSearchDocument, type SearchDocument } from '../../match/searchDocument.js';
import { Catalogue } from '../../store/catalogue.js';
import { cataloguePath } from '../../store/cataloguePath.js';
import { flagOpt, intOpt, strOpt, type CommandIO, type CommandSpec, type ParsedArgs } from '../command.js';
import { CATALOGUE_OPTION } from './catalogue.js';

/** A saved search is a few megabytes at most; larger files are refused before reading. */
const MAX_SAVED_SEARCH_BYTES = 64 * 1024 * 1024;

const FORMATS = { latex: renderLatex, markdown: renderMarkdown, json: renderJson } as const;

function readResult(ref: string, args: ParsedArgs, io: CommandIO): SearchDocument {
  const m = /^search:(\d+)$/.exec(ref);
  if (m) {
    const cat = Catalogue.open(cataloguePath(strOpt(args, 'catalogue'), io.env, io.cwd), { existing: true });
    try {
      const doc = cat.getSearch(Number(m[1]));
      if (doc === undefined) throw new InputError(`<result>: no saved search ${ref} in ${cat.path} (each gradus search prints its id)`, 'result');
      return checkSearchDocument(doc, ref);
    } finally {
      cat.close();
    }
  }
  const path = resolve(io.cwd, ref);
  return checkSearchDocument(readJsonFile(path, 'result', MAX_SAVED_SEARCH_BYTES, 'a saved search (gradus search --save FILE) or search:ID'), path);
}

export const exportCommand: CommandSpec = {
  name: 'export',
  summary: 'write a search result as LaTeX, Markdown or JSON (formula, statistics with sources, range, values)',
  usage: 'export <result> --format latex|markdown|json --out FILE [--force] [--limit M] [--catalogue PATH]',
  positionals: [{ name: 'result', description: 'a saved-search file (gradus search --save FILE) or search:ID from the catalogue' }],
  options: [
    { name: 'format', type: 'string', description: 'latex (a fragment needing no package), markdown or json (schema gradus-export, version 1)', placeholder: 'F' },
    { name: 'out', type: 'string', description: 'file to write (atomically)', placeholder: 'FILE' },
    { name: 'force', type: 'flag', description: 'replace an existing file' },
    { name: 'limit', type: 'int', description: 'matches to include (default 5)', placeholder: 'M', min: 1, max: 1000 },
    CATALOGUE_OPTION,
  ],
  producesData: false,
  run(args: ParsedArgs, io) {
    const format = strOpt(args, 'format');
    if (!format || !(format in FORMATS)) throw new InputError(`--format must be one of ${Object.keys(FORMATS).join(', ')} (got ${format === undefined ? 'nothing' : `"${format}"`})`, 'format');
    const out = strOpt(args, 'out');
    if (!out) throw new InputError('export needs --out FILE', 'out');
    if (/[/\\]$/.test(out)) throw new InputError(`--out: ${out} names a folder; give a file name`, 'out');
    const path = resolve(io.cwd, out);
    checkWritable(path, flagOpt(args, 'force'));
    const doc = readResult(args.positionals[0]!, args, io);
    const text = FORMATS[format as keyof typeof FORMATS](exportModel(doc, intOpt(args, 'limit') ?? 5));
    atomicWrite(path, text, flagOpt(args, 'force'));
    io.out(`wrote ${path} (${format}, ${Math.min(doc.matches.length, intOpt(args, 'limit') ?? 5)} of ${doc.matches.length} matches)`);
  },
};
