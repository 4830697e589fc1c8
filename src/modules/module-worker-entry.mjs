// Worker entry: register the TypeScript loader in this thread, then run the worker body.
import { register } from 'tsx/esm/api';

register();
await import('./module-worker.ts');
