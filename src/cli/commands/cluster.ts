/**
 * `gradus cluster plan|submit|run-shard|status|merge FOLDER`: long runs cut into shards in a
 * work folder, run as a Slurm job array (or by hand), and merged into the one-machine result.
 */
import { InputError } from '../../core/errors.js';
import { toJsonText } from '../../core/json-text.js';
import { idRanges, mergePlan, planRun, planStatus, runShard, submitPlan, WorkFolder, type PlanStatus } from '../../cluster/index.js';
import { flagOpt, intOpt, strOpt, type CommandIO, type CommandSpec, type OptionSpec, type ParsedArgs } from '../command.js';

const ACTIONS = ['plan', 'submit', 'run-shard', 'status', 'merge'] as const;
type Action = (typeof ACTIONS)[number];

const OPTIONS: readonly (OptionSpec & { readonly for: readonly Action[] })[] = [
  { name: 'shards', type: 'int', description: 'plan: at most N shards (default: one per subgroup task, or per 20 million catalogue objects)', placeholder: 'N', min: 1, max: 1000, for: ['plan'] },
  { name: 'objects-per-shard', type: 'int', description: 'plan (catalogue): cut units above M objects into pieces of about M', placeholder: 'M', min: 1, for: ['plan'] },
  { name: 'partition', type: 'string', description: 'submit: Slurm partition', placeholder: 'P', for: ['submit'] },
  { name: 'time', type: 'string', description: 'submit: time limit of each task and of the merge (Slurm syntax, e.g. 2:00:00)', placeholder: 'T', for: ['submit'] },
  { name: 'mem', type: 'string', description: 'submit: memory of each task and of the merge (e.g. 8G)', placeholder: 'M', for: ['submit'] },
  { name: 'cpus-per-task', type: 'int', description: 'submit: CPUs of each array task (its pieces run side by side)', placeholder: 'C', min: 1, max: 256, for: ['submit'] },
  { name: 'account', type: 'string', description: 'submit: Slurm account', placeholder: 'A', for: ['submit'] },
  { name: 'qos', type: 'string', description: 'submit: Slurm quality of service', placeholder: 'Q', for: ['submit'] },
  { name: 'sbatch-arg', type: 'string', repeatable: true, description: 'submit: one more sbatch option as name=value, e.g. constraint=avx2 (repeatable)', placeholder: 'OPT', for: ['submit'] },
  { name: 'setup', type: 'string', description: 'submit: a shell line run before gradus in each job (e.g. "module load nodejs")', placeholder: 'LINE', for: ['submit'] },
  { name: 'max-parallel', type: 'int', description: 'submit: at most K array tasks at once', placeholder: 'K', min: 1, max: 100_000, for: ['submit'] },
  { name: 'print', type: 'flag', description: 'submit: write and print the batch scripts, submit nothing', for: ['submit'] },
  { name: 'shard', type: 'int', description: 'run-shard: the shard (default $SLURM_ARRAY_TASK_ID)', placeholder: 'I', min: 0, max: 1000, for: ['run-shard'] },
  { name: 'threads', type: 'int', description: 'run-shard: pieces run at once (default $SLURM_CPUS_PER_TASK, else 1)', placeholder: 'T', min: 1, max: 256, for: ['run-shard'] },
  { name: 'out', type: 'string', description: 'merge: also write the JSON document to FILE', placeholder: 'FILE', for: ['merge'] },
  { name: 'force', type: 'flag', description: 'merge: replace an existing --out file', for: ['merge'] },
];

function checkOptions(action: Action, args: ParsedArgs): void {
  for (const o of OPTIONS) if (args.options[o.name] !== undefined && !o.for.includes(action)) throw new InputError(`--${o.name} goes with cluster ${o.for.join(', ')}`, o.name);
  if (action !== 'plan' && args.positionals.length > 2) throw new InputError(`cluster ${action} takes one folder (got "${args.positionals[2]!.slice(0, 40)}" too)`);
}

function printStatus(s: PlanStatus, io: CommandIO): void {
  const c = s.counts;
  io.out(`plan ${s.plan.id} (${s.plan.kind}): ${s.plan.key}`);
  io.out(`  ${s.plan.route}; ${s.plan.code}`);
  io.out(`shards: ${s.plan.shards} — ${c.done} done, ${c.running} running, ${c.pending} pending, ${c.failed} failed, ${c.missing} missing${c.unusable ? `, ${c.unusable} unusable` : ''}`);
  const open = s.shards.filter((x) => x.state !== 'done');
  for (const x of open.slice(0, 20)) io.out(`  shard ${x.id} ${x.state}${x.detail ? `: ${x.detail}` : ''}${x.job ? ` (job ${x.job}${x.state === 'failed' || x.state === 'missing' ? `, log ${x.log}` : ''})` : ''}`);
  if (open.length > 20) io.out(`  … and ${open.length - 20} more`);
  const m = s.merge;
  io.out(`merge: ${m.state}${m.job ? ` (job ${m.job}${m.detail ? `: ${m.detail}` : ''})` : ''}${m.output ? ` into ${m.output}` : ''}`);
  if (!s.scheduler.queue) io.out('  (no answer from squeue here: running and pending shards show as missing)');
  const again = s.shards.filter((x) => x.state === 'failed' || x.state === 'missing').map((x) => x.id);
  if (m.state !== 'merged' && again.length) io.out(`next: gradus cluster submit ${s.folder}   (runs shard${again.length > 1 ? 's' : ''} ${idRanges(again)} again)`);
  else if (m.state !== 'merged' && c.done === s.plan.shards && m.state !== 'queued' && m.state !== 'running') io.out(`next: gradus cluster merge ${s.folder}`);
}

async function run(args: ParsedArgs, io: CommandIO): Promise<void> {
  const action = args.positionals[0] as Action;
  if (!(ACTIONS as readonly string[]).includes(action)) throw new InputError(`cluster: the action must be one of ${ACTIONS.join(', ')} (got "${String(action).slice(0, 40)}")`, 'action');
  checkOptions(action, args);
  const dir = args.positionals[1];
  if (dir === undefined) throw new InputError(`cluster ${action} needs the work folder`, 'folder');
  const json = flagOpt(args, 'json');
  if (action === 'plan') {
    const shards = intOpt(args, 'shards');
    const per = intOpt(args, 'objects-per-shard');
    const r = planRun(dir, args.positionals.slice(2), { cwd: io.cwd, env: io.env, ...(shards ? { shards } : {}), ...(per ? { objectsPerShard: BigInt(per) } : {}) });
    const m = r.folder.manifest;
    if (json) return io.out(toJsonText({ folder: r.folder.dir, fresh: r.fresh, plan: m.id, kind: m.kind, key: m.key, route: m.route, shards: m.shards.map((s) => ({ id: s.id, label: s.label })) }));
    io.out(r.fresh ? `planned ${m.shards.length} shard${m.shards.length > 1 ? 's' : ''} in ${r.folder.dir} (plan ${m.id})` : `${r.folder.dir} already holds this plan (${m.shards.length} shards, plan ${m.id}); nothing changed`);
    io.out(`  ${m.key}`);
    io.out(`  ${m.route}`);
    for (const l of r.lines) io.out(`  ${l}`);
    io.out(`next: gradus cluster submit ${r.folder.dir} [--partition P --time T --mem M]   (or --print for the batch scripts)`);
    return;
  }
  const folder = WorkFolder.open(dir, io.cwd);
  if (action === 'submit') {
    const r = submitPlan(folder, {
      ...(strOpt(args, 'partition') ? { partition: strOpt(args, 'partition')! } : {}),
      ...(strOpt(args, 'time') ? { time: strOpt(args, 'time')! } : {}),
      ...(strOpt(args, 'mem') ? { mem: strOpt(args, 'mem')! } : {}),
      ...(intOpt(args, 'cpus-per-task') ? { cpusPerTask: intOpt(args, 'cpus-per-task')! } : {}),
      ...(strOpt(args, 'account') ? { account: strOpt(args, 'account')! } : {}),
      ...(strOpt(args, 'qos') ? { qos: strOpt(args, 'qos')! } : {}),
      sbatchArgs: (args.options['sbatch-arg'] as string[] | undefined) ?? [],
      ...(strOpt(args, 'setup') ? { setup: strOpt(args, 'setup')! } : {}),
      ...(intOpt(args, 'max-parallel') ? { maxParallel: intOpt(args, 'max-parallel')! } : {}),
      print: flagOpt(args, 'print'),
    });
    if (json) return io.out(toJsonText(r.state === 'printed' ? { ...r, text: undefined } : r));
    if (r.state === 'merged') io.out(`already merged into ${r.output}; nothing submitted`);
    else if (r.state === 'waiting') io.out(`shards ${idRanges(r.queued)} are queued and the merge (job ${r.merge}) waits for them; nothing submitted`);
    else if (r.state === 'printed') io.out(r.text);
    else {
      if (r.array) io.out(`submitted shard${r.shards.length > 1 ? 's' : ''} ${idRanges(r.shards)} as array job ${r.array}`);
      if (r.queued.length) io.out(`shards ${idRanges(r.queued)} were queued already`);
      if (r.cancelled) io.out(`the merge job ${r.cancelled} of the earlier submit was cancelled`);
      io.out(`merge: job ${r.merge}${r.array || r.queued.length ? ' (starts when every shard has finished well)' : ''}`);
      io.out(`follow with: gradus cluster status ${folder.dir}`);
    }
    return;
  }
  if (action === 'run-shard') {
    const fromEnv = io.env['SLURM_ARRAY_TASK_ID'];
    const id = intOpt(args, 'shard') ?? (fromEnv !== undefined && /^\d+$/.test(fromEnv) ? Number(fromEnv) : undefined);
    if (id === undefined) throw new InputError('cluster run-shard needs --shard I (or $SLURM_ARRAY_TASK_ID, as in an array task)', 'shard');
    const cpus = io.env['SLURM_CPUS_PER_TASK'];
    const threads = intOpt(args, 'threads') ?? (cpus && /^\d+$/.test(cpus) ? Number(cpus) : 1);
    const stop = new AbortController();
    const onSignal = (sig: NodeJS.Signals): void => stop.abort(sig);
    process.once('SIGTERM', onSignal);
    process.once('SIGINT', onSignal);
    try {
      const r = await runShard(folder, id, { cwd: io.cwd, threads, signal: stop.signal, log: (t) => io.err(`[${new Date().toISOString()}] ${t}`) });
      io.out(r.state === 'already' ? `shard ${id} was finished already; nothing to do` : `shard ${id} finished in ${r.seconds.toFixed(1)} s`);
    } catch (e) {
      if (stop.signal.aborted) throw new InputError(`shard ${id} was stopped by ${String(stop.signal.reason)} before it finished; nothing of it was kept (submit again to rerun it)`, 'shard');
      throw e;
    } finally {
      process.off('SIGTERM', onSignal);
      process.off('SIGINT', onSignal);
    }
    return;
  }
  if (action === 'status') {
    const s = planStatus(folder);
    return json ? io.out(toJsonText(s)) : printStatus(s, io);
  }
  const out = strOpt(args, 'out');
  const r = mergePlan(folder, { cwd: io.cwd, ...(out !== undefined ? { out } : {}), force: flagOpt(args, 'force') });
  if (json) return io.out(toJsonText(r));
  io.out(`merged ${r.shards} shards of plan ${folder.manifest.id} into ${r.output}${r.units !== undefined ? ` (${r.units} units, ${r.rows} distributions)` : ''}`);
  if (r.confirmation) io.out(`  ${r.confirmation}`);
}

export const clusterCommand: CommandSpec = {
  name: 'cluster',
  summary: 'run a long module, quotient or catalogue build as shards on a Slurm cluster, then merge',
  usage: 'cluster plan FOLDER [--shards N] -- <command> | submit FOLDER [--partition P] [--time T] [--mem M] [--print] | run-shard FOLDER [--shard I] | status FOLDER | merge FOLDER [--out FILE]',
  positionals: [
    { name: 'action', description: ACTIONS.join(', ') },
    { name: 'folder', description: 'the work folder (on a file system every node sees)', optional: true },
    { name: 'command', description: 'plan: the command to run, after --', optional: true, variadic: true },
  ],
  options: OPTIONS.map(({ for: _f, ...o }) => o),
  producesData: true,
  details: [
    'plan       cut a command into shards in FOLDER (a new or empty folder):',
    '             gradus cluster plan run9 -- module --seed vandermonde --n 9 --ops x --frobenius',
    '             gradus cluster plan cat9 --shards 200 -- catalogue build --n-max 9 --catalogue cat.sqlite',
    'submit     the missing shards as a Slurm job array, and a merge job after it (afterok);',
    '           --print writes the batch scripts and prints them for submitting by hand',
    'run-shard  compute one shard (what each array task runs); a finished shard is not redone',
    'status     done, running, pending, failed and missing shards, and the merge',
    'merge      check every shard and write the one-machine result: FOLDER/result.json',
    '           (module, quotient) or the catalogue\'s units; an incomplete or mixed set is refused',
  ].join('\n'),
  run,
};
