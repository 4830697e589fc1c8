/** Worker body: one closure computation for one prime (computeModuleAsync runs two of these). */
import { parentPort, workerData } from 'node:worker_threads';
import { computeModule, type ModuleOptions, type ModuleSpec } from './compute-module.js';

const { spec, options } = workerData as { spec: ModuleSpec; options: ModuleOptions };
parentPort!.postMessage(computeModule(spec, options).cells);
