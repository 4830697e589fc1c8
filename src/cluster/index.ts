/** Sharded runs on a Slurm cluster: plan, submit, run one shard, status, merge (the command line's entry points). */
export { planRun, type PlanOptions, type PlanReport } from './plan.js';
export { submitPlan, type SubmitOptions, type SubmitReport } from './submit.js';
export { runShard, type ShardOutcome } from './run-shard.js';
export { planStatus, type PlanStatus } from './status.js';
export { mergePlan, type MergeReport } from './merge.js';
export { WorkFolder } from './work-folder.js';
export { idRanges } from './id-ranges.js';
