// Worker entry: registers tsx so the TypeScript engine files load, then runs the task
// (jobWorkerMain.ts). A plain .mjs because a worker's own entry cannot be TypeScript on Node 20.
import { register } from 'tsx/esm/api';

register();
await import('./jobWorkerMain.ts');
