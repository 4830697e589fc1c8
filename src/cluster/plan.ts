/**
 * Plan a run into a work folder: a module or quotient request (as typed after `gradus`), or a
 * catalogue build (`catalogue build --n-max N [--families …] [--catalogue PATH]`). The request
 * is checked as the command itself checks it, split by its kind, and the plan written as the
 * folder's manifest. Planning the same request again into its folder changes nothing.
 */
import { InputError } from '../core/errors.js';
import { formatDuration } from '../core/progress.js';
import { shown } from '../core/shown.js';
import { DATA_COMMANDS, requestFromWords, requestKey, type ModuleRequest, type QuotientRequest } from '../requests/index.js';
import { intOpt, listOpt, parseArgs, strOpt, type OptionSpec } from '../requests/options.js';
import { cataloguePath } from '../store/cataloguePath.js';
import { catalogueKey, planCatalogue } from './catalogue-split.js';
import { codeVersion } from './code-version.js';
import { makeManifest, MAX_SHARDS, type Manifest, type ManifestBody } from './manifest.js';
import { planModule } from './module-split.js';
import { planQuotient } from './quotient-split.js';
import { WorkFolder } from './work-folder.js';

export interface PlanOptions {
  readonly cwd: string;
  readonly env: Readonly<Record<string, string | undefined>>;
  /** At most this many shards. */
  readonly shards?: number;
  /** Catalogue builds: units above this many objects are cut into pieces (default 20 million). */
  readonly objectsPerShard?: bigint;
}

export interface PlanReport {
  readonly folder: WorkFolder;
  /** False when the folder already held this plan. */
  readonly fresh: boolean;
  /** What the plan means in work, for the user. */
  readonly lines: readonly string[];
}

const DEFAULT_OBJECTS_PER_SHARD = 20_000_000n;

const CATALOGUE_BUILD_OPTIONS: readonly OptionSpec[] = [
  { name: 'n-max', type: 'int', description: 'largest size n', placeholder: 'N', min: 1, max: 12 },
  { name: 'families', type: 'list', description: 'only these family ids', placeholder: 'A,B' },
  { name: 'max-objects', type: 'int', description: 'refuse a build visiting more objects than this', placeholder: 'M', min: 1 },
  { name: 'catalogue', type: 'string', description: 'catalogue file', placeholder: 'PATH' },
];

function catalogueBody(words: readonly string[], o: PlanOptions): { key: string; body: Omit<ManifestBody, 'key'>; lines: string[] } {
  if (words[1] !== 'build') throw new InputError(`the cluster runs \`catalogue build\` (got catalogue ${shown(words[1] ?? 'nothing', 20)})`, 'request');
  const args = parseArgs({ name: 'catalogue build', usage: 'catalogue build --n-max N [--families A,B] [--max-objects M] [--catalogue PATH]', options: CATALOGUE_BUILD_OPTIONS }, words.slice(2).filter((w) => w !== '--json'));
  const nMax = intOpt(args, 'n-max');
  if (nMax === undefined) throw new InputError('catalogue build needs --n-max N (1..12)', 'n-max');
  const families = listOpt(args, 'families');
  const maxObjects = intOpt(args, 'max-objects');
  const catalogue = cataloguePath(strOpt(args, 'catalogue'), o.env, o.cwd);
  const b = { nMax, ...(families ? { families } : {}), catalogue, ...(maxObjects !== undefined ? { maxObjects: BigInt(maxObjects) } : {}), objectsPerPiece: o.objectsPerShard ?? DEFAULT_OBJECTS_PER_SHARD, ...(o.shards ? { shards: o.shards } : {}), maxShards: MAX_SHARDS };
  const p = planCatalogue(b);
  return { key: catalogueKey(b), body: p.body, lines: [`${p.units} units to build (${p.objects} objects) into ${catalogue}`] };
}

export function planRun(dir: string, words: readonly string[], o: PlanOptions): PlanReport {
  const w = words[0] === 'gradus' ? words.slice(1) : words;
  if (w.length === 0) throw new InputError('cluster plan needs the command to run after --, e.g. `gradus cluster plan work -- module --seed vandermonde --n 9 --ops x --frobenius`', 'request');
  let key: string;
  let body: Omit<ManifestBody, 'key'>;
  let lines: string[];
  if (w[0] === 'catalogue') {
    ({ key, body, lines } = catalogueBody(w, o));
  } else {
    if (w[0] !== 'module' && w[0] !== 'quotient') {
      const known = (DATA_COMMANDS as readonly string[]).includes(w[0]!);
      throw new InputError(`the cluster runs module, quotient and catalogue build${known ? `; ${w[0]} takes seconds on one machine` : ` (got "${shown(w[0]!, 30)}")`}`, 'request');
    }
    const request = requestFromWords(w, o.cwd, 'request') as ModuleRequest | QuotientRequest;
    key = requestKey(request);
    if (request.kind === 'module') {
      const p = planModule(request, Math.min(o.shards ?? MAX_SHARDS, MAX_SHARDS));
      body = p.body;
      lines = [`estimated work ${p.estimate.units.toExponential(2)} units (about ${formatDuration(p.estimate.seconds)} of processor time on one core, both primes)`];
    } else {
      body = planQuotient(request);
      lines = [];
    }
  }
  const manifest: Manifest = makeManifest({ ...body, key }, codeVersion());
  const { folder, fresh } = WorkFolder.create(dir, o.cwd, manifest);
  folder.ensureDirs();
  return { folder, fresh, lines };
}
