/**
 * Sweeps: scan a family of seeds over n (and k) and operator sets, rank what is remarkable.
 * Entry points for the command line and the app (nothing else imports src/sweep).
 */
export { SWEEP_OPTIONS, SWEEP_FAMILIES, sweepFromArgs, sweepKey, type SweepSpec, type SweepLimits } from './sweepSpec.js';
export { planSweep, type SweepPlan, type SweepLine, type PlannedModule } from './plan.js';
export { planDocument } from './planDocument.js';
export { runSweep, type SweepRunOptions } from './runSweep.js';
export type { ModuleOutcome } from './computeModules.js';
export type { SweepRow } from './analyse.js';
export type { SweepFinding, FindingKind } from './findings.js';
export { FINDING_WEIGHT } from './findings.js';
export { checkSweepDocument, sweepId, type SweepDocument } from './sweepDocument.js';
export { findSweep, listSweeps, readSweep } from './sweepStore.js';
export { sweepText } from './renderText.js';
export { renderSweep, SWEEP_EXPORT_FORMATS, type SweepExportFormat } from './exportSweep.js';
export { countsText, rowDimensionsText, rowKindsText, rowPlacesText, stateText, KIND_LABEL } from './summary.js';
