/**
 * Catalogue builds on a cluster: the units still missing from the catalogue (a family at one
 * size), large ones cut into pieces as the worker-thread build cuts them, dealt into shards.
 * A shard tallies its pieces into raw tallies; the merge adds the pieces of each unit, forms
 * its distributions and writes it into the catalogue in one transaction, between beginBuild and
 * finishBuild, as the one-machine build does.
 */
import { InputError, LimitError } from '../core/errors.js';
import { Catalogue } from '../store/catalogue.js';
import { inspectCatalogueFile } from '../store/catalogue-file.js';
import { planUnits, statsSignature, unitProvenance, type Unit } from '../store/planUnits.js';
import { mergeRaw, type RawTally } from '../store/rawTally.js';
import { rowsOfTally } from '../store/tallyUnit.js';
import { signatureHash, type Manifest, type ManifestBody, type PlannedUnit, type TallyPiece } from './manifest.js';
import { packByCost } from './pack.js';
import { rawTallyFromJson } from './raw-tally-json.js';
import type { ShardResult } from './shard-file.js';

export interface CatalogueBuild {
  readonly nMax: number;
  readonly families?: readonly string[];
  /** The catalogue file (absolute). */
  readonly catalogue: string;
  readonly maxObjects?: bigint;
  /** Units with more objects are cut into pieces of about this many. */
  readonly objectsPerPiece: bigint;
  /** At most this many shards; default about one per objectsPerPiece objects. */
  readonly shards?: number;
  readonly maxShards: number;
}

/** The one-line form of a build, the plan's key. */
export function catalogueKey(b: Pick<CatalogueBuild, 'nMax' | 'families'>): string {
  return `catalogue build --n-max ${b.nMax}${b.families?.length ? ` --families ${[...b.families].sort().join(',')}` : ''}`;
}

/** Units not yet in the catalogue with the same statistics (the catalogue is only read here). */
function pendingUnits(b: CatalogueBuild): Unit[] {
  const plan = planUnits(b.nMax, b.families);
  if (inspectCatalogueFile(b.catalogue).kind !== 'sqlite') return [...plan.units];
  const cat = Catalogue.open(b.catalogue, { existing: true });
  try {
    return plan.units.filter((u) => !cat.isUnitDone(u.family.id, u.params, statsSignature(u)));
  } finally {
    cat.close();
  }
}

export function planCatalogue(b: CatalogueBuild): { body: Omit<ManifestBody, 'key'>; objects: bigint; units: number } {
  const todo = pendingUnits(b);
  if (todo.length === 0) throw new InputError(`nothing to build: ${b.catalogue} holds every unit up to n = ${b.nMax}${b.families ? ` of ${b.families.join(', ')}` : ''}`, 'n-max');
  const objects = todo.reduce((s, u) => s + u.objects, 0n);
  if (b.maxObjects !== undefined && objects > b.maxObjects) throw new LimitError(`building up to n = ${b.nMax} visits ${objects} objects, above the limit ${b.maxObjects}; raise it with --max-objects`, 'max-objects');
  const pieces: { cost: number; item: TallyPiece }[] = [];
  const units = todo.map((u) => {
    const count = u.family.visit && u.objects > b.objectsPerPiece ? Number((u.objects + b.objectsPerPiece - 1n) / b.objectsPerPiece > 256n ? 256n : (u.objects + b.objectsPerPiece - 1n) / b.objectsPerPiece) : 1;
    // each object costs its statistics and their pairs; every piece a start-up
    const cost = (Number(u.objects) / count) * (u.stats.length + (u.stats.length * u.stats.length) / 4) + 1e4;
    for (let index = 0; index < count; index++) pieces.push({ cost, item: { family: u.family.id, params: { ...u.params }, ...(count > 1 ? { shard: { index, count } } : {}) } });
    return { family: u.family.id, params: { ...u.params }, statistics: signatureHash(statsSignature(u)), objects: u.objects.toString(), pieces: count };
  });
  const wanted = b.shards ?? Number((objects + b.objectsPerPiece - 1n) / b.objectsPerPiece);
  const shards = packByCost(pieces, Math.max(1, Math.min(wanted, b.maxShards))).map((bin, id) => ({
    id,
    label: bin.length === 1 ? pieceLabel(bin[0]!) : `${bin.length} pieces: ${pieceLabel(bin[0]!)} … ${pieceLabel(bin[bin.length - 1]!)}`,
    work: { type: 'tally' as const, pieces: bin },
  }));
  return {
    body: {
      kind: 'catalogue',
      route: `catalogue units (${todo.length} to build; units above ${b.objectsPerPiece} objects in pieces), raw tallies per shard`,
      catalogue: b.catalogue,
      build: { nMax: b.nMax, ...(b.families ? { families: [...b.families].sort() } : {}) },
      units,
      shards,
    },
    objects,
    units: todo.length,
  };
}

function pieceLabel(p: TallyPiece): string {
  return `${p.family} ${Object.entries(p.params).map(([k, v]) => `${k}=${v}`).join(' ')}${p.shard ? ` [${p.shard.index + 1}/${p.shard.count}]` : ''}`;
}

export const unitKey = (family: string, params: Readonly<Record<string, number | readonly number[] | undefined>>): string => `${family} ${JSON.stringify(Object.entries(params).sort())}`;

/**
 * Write the units of a finished plan into the catalogue, reading the shards one at a time: a
 * unit is written as soon as its last piece is in (its pieces added in their index order), so
 * memory holds only the units under way. The plan's units are checked against this code's
 * statistics before anything is written.
 */
export function mergeCatalogue(m: Manifest, shardIds: readonly number[], read: (id: number) => ShardResult, path: string): { units: number; rows: number } {
  const build = m.build!;
  const plan = planUnits(build.nMax, build.families);
  const byKey = new Map(plan.units.map((u) => [unitKey(u.family.id, u.params), u]));
  const wanted = new Map<string, { unit: Unit; planned: PlannedUnit; raws: Map<number, RawTally>; seconds: number }>(
    m.units!.map((pu) => {
      const k = unitKey(pu.family, pu.params);
      const unit = byKey.get(k);
      if (!unit || signatureHash(statsSignature(unit)) !== pu.statistics) throw new InputError(`the statistics of ${k} differ from the plan's: plan again in a new folder`, 'folder');
      return [k, { unit, planned: pu, raws: new Map<number, RawTally>(), seconds: 0 }];
    }),
  );
  const cat = Catalogue.open(path);
  let rows = 0;
  let written = 0;
  try {
    cat.beginBuild({ nMax: build.nMax, ...(build.families ? { families: build.families } : {}), units: plan.units.length });
    for (const id of shardIds) {
      const x = read(id);
      if (x.type !== 'tally') throw new Error('a catalogue plan holds tally shards only');
      for (const p of x.pieces) {
        const k = unitKey(p.family, p.params);
        const w = wanted.get(k);
        if (!w) throw new InputError(`shard ${id} holds ${k}, which the plan does not build`, 'folder');
        w.raws.set(p.shard?.index ?? 0, rawTallyFromJson(p.raw));
        w.seconds += p.seconds;
        if (w.raws.size < w.planned.pieces) continue;
        const raw = [...w.raws.keys()].sort((a, b) => a - b).map((i) => w.raws.get(i)!).reduce((a, b) => mergeRaw(a, b));
        w.raws.clear();
        if (BigInt(raw.objects) !== BigInt(w.planned.objects)) throw new InputError(`the pieces of ${k} hold ${raw.objects} objects, the plan counted ${w.planned.objects}`, 'folder');
        const r = rowsOfTally(w.unit, w.unit.stats, raw);
        const how = `exhaustive enumeration, exact integer tallies (cluster plan ${m.id}, ${w.planned.pieces} piece${w.planned.pieces > 1 ? 's' : ''})`;
        cat.writeUnit(w.unit.family.id, w.unit.params, r.objects, w.seconds, r.rows, unitProvenance(w.unit, how, w.seconds), statsSignature(w.unit));
        rows += r.rows.length;
        written++;
      }
    }
    if (written < wanted.size) throw new InputError(`the shards hold ${written} of the plan's ${wanted.size} units whole; the units written are kept, the build stays unfinished`, 'folder');
    cat.finishBuild();
  } finally {
    cat.close();
  }
  return { units: written, rows };
}
