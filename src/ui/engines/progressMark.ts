/**
 * A pool task's progress carries a label, a count and a total. A task that knows its engine's
 * estimate of the whole run adds it to the label after this mark ("label" + mark + seconds);
 * workerJob.ts takes it off again.
 */
export const ESTIMATE_MARK = '\u0000';
