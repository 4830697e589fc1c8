// Entry of a distribution worker thread: load TypeScript through tsx, then the worker.
// (Plain .mjs so that it starts the same way from the command line and under vitest.)
import { register } from 'tsx/esm/api';

register();
await import('./shard-worker.ts');
