#!/usr/bin/env node
// Starts gradus from its TypeScript sources (tsx compiles them on the fly).
import { register } from 'tsx/esm/api';

register();
const { main } = await import('../src/cli/main.ts');
const code = await main(process.argv.slice(2));
process.exitCode = code;
