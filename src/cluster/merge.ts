/**
 * Merge a finished plan: every shard must be present, belong to this plan and come from the
 * plan's code, or nothing is written and the refusal names the shards. Modules and quotients
 * become exactly the JSON document the one-machine run prints (the engine assembles it from the
 * shards' ranks or cells and confirms the two primes); catalogue builds become catalogue units.
 */
import { readFileSync, statSync } from 'node:fs';
import { hostname } from 'node:os';
import { resolve } from 'node:path';
import { z } from 'zod';
import { InputError } from '../core/errors.js';
import { toJsonText } from '../core/json-text.js';
import type { ModuleResult } from '../modules/module-result.js';
import { documentOf } from '../requests/index.js';
import { replaceFile } from './atomic-file.js';
import { mergeCatalogue } from './catalogue-split.js';
import { codeVersion } from './code-version.js';
import { idRanges } from './id-ranges.js';
import { mergeModule } from './module-split.js';
import { mergeQuotient } from './quotient-split.js';
import { requestOf } from './request-of.js';
import { readShard, type ShardFile, type ShardResult } from './shard-file.js';
import { checkCode, type WorkFolder } from './work-folder.js';

const MERGED = z.object({ format: z.literal('gradus-cluster-merged'), version: z.literal(1), plan: z.string(), time: z.string(), output: z.string(), confirmation: z.string().optional() });
export type MergeRecord = z.infer<typeof MERGED>;

export interface MergeOptions {
  readonly cwd: string;
  /** Also write the document here (module, quotient). */
  readonly out?: string;
  readonly force?: boolean;
}

export interface MergeReport {
  readonly output: string;
  readonly shards: number;
  readonly shardSeconds: number;
  readonly confirmation?: string;
  readonly units?: number;
  readonly rows?: number;
}

/**
 * Every shard of the plan, checked; InputError naming the missing and the unusable ones. With
 * `keep` false only their headers are kept (a large catalogue plan is read again shard by shard).
 */
export function finishedShards(folder: WorkFolder, keep = true): ShardFile[] {
  const m = folder.manifest;
  const missing: number[] = [];
  const bad: string[] = [];
  const files: ShardFile[] = [];
  for (const s of m.shards) {
    const r = readShard(folder, s.id);
    if (r.state === 'done') files.push(keep ? r.file : { ...r.file, result: { type: 'prime', prime: 2, cells: [] } });
    else if (r.state === 'missing') missing.push(s.id);
    else bad.push(r.why);
  }
  if (missing.length || bad.length) {
    const parts = [
      ...(missing.length ? [`shard${missing.length > 1 ? 's' : ''} ${idRanges(missing)} of ${m.shards.length} missing (not finished)`] : []),
      ...(bad.length ? [`${bad.length} shard file${bad.length > 1 ? 's' : ''} not of this set: ${bad.slice(0, 3).join('; ')}${bad.length > 3 ? '; …' : ''}`] : []),
    ];
    throw new InputError(`cannot merge ${folder.dir}: ${parts.join('; ')}. Nothing was written; \`gradus cluster status ${folder.dir}\` tells more, \`gradus cluster submit ${folder.dir}\` runs the missing shards`, 'folder');
  }
  return files;
}

function checkOut(path: string, force: boolean): void {
  let st;
  try {
    st = statSync(path);
  } catch {
    return;
  }
  if (st.isDirectory()) throw new InputError(`--out: ${path} is a folder; give a file name`, 'out');
  if (!force) throw new InputError(`${path} exists; not overwritten (add --force to replace it)`, 'out');
}

export function mergePlan(folder: WorkFolder, o: MergeOptions): MergeReport {
  const m = folder.manifest;
  checkCode(m.code, codeVersion(), `${folder.dir} was planned by`);
  const out = o.out !== undefined ? resolve(o.cwd, o.out) : undefined;
  if (out) checkOut(out, o.force ?? false);
  const files = finishedShards(folder, m.kind !== 'catalogue');
  const results = files.map((f) => f.result);
  const shardSeconds = files.reduce((s, f) => s + f.seconds, 0);
  const t0 = performance.now();
  let report: MergeReport;
  if (m.kind === 'catalogue') {
    const read = (id: number): ShardResult => {
      const r = readShard(folder, id);
      if (r.state !== 'done') throw new InputError(`shard ${id} changed during the merge (${r.state === 'invalid' ? r.why : 'it is gone'}); the units written so far are kept, merge again`, 'folder');
      return r.file.result;
    };
    const r = mergeCatalogue(m, m.shards.map((x) => x.id), read, m.catalogue!);
    report = { output: m.catalogue!, shards: files.length, shardSeconds, units: r.units, rows: r.rows };
  } else {
    const request = requestOf(m, o.cwd);
    const result: ModuleResult = request.kind === 'module' ? mergeModule(request, results) : mergeQuotient(request, results);
    const hosts = new Set(files.map((f) => f.host));
    const note = `computed on a cluster: ${files.length} shards of plan ${m.id} (${m.route}) on ${hosts.size} host${hosts.size > 1 ? 's' : ''}, ${shardSeconds.toFixed(1)} s in the shards; merged on ${hostname()} in ${((performance.now() - t0) / 1000).toFixed(1)} s`;
    const merged = { ...result, provenance: { ...result.provenance, seconds: shardSeconds + (performance.now() - t0) / 1000, notes: [...result.provenance.notes, note] } };
    const text = `${toJsonText(documentOf(request, merged))}\n`;
    replaceFile(folder.resultPath, text);
    if (out) replaceFile(out, text);
    report = { output: out ?? folder.resultPath, shards: files.length, shardSeconds, confirmation: result.provenance.confirmation };
  }
  const record: MergeRecord = { format: 'gradus-cluster-merged', version: 1, plan: m.id, time: new Date().toISOString(), output: report.output, ...(report.confirmation ? { confirmation: report.confirmation } : {}) };
  replaceFile(folder.mergedPath, `${JSON.stringify(record)}\n`);
  return report;
}

/** The merge record of this plan, when it was merged. */
export function readMerged(folder: WorkFolder): MergeRecord | undefined {
  try {
    const r = MERGED.safeParse(JSON.parse(readFileSync(folder.mergedPath, 'utf8')));
    return r.success && r.data.plan === folder.manifest.id ? r.data : undefined;
  } catch {
    return undefined;
  }
}
