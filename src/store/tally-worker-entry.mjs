// Entry of a catalogue worker thread: load TypeScript through tsx, then the worker.
import { register } from 'tsx/esm/api';

register();
await import('./tallyWorker.ts');
