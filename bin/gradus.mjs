#!/usr/bin/env node
// Starts gradus from its TypeScript sources (tsx compiles them on the fly).
import { register } from 'tsx/esm/api';

// A reader that closes the pipe early (`gradus show … | head`) ends the run quietly.
for (const stream of [process.stdout, process.stderr]) {
  stream.on('error', (e) => {
    if (e && e.code === 'EPIPE') process.exit(0);
    throw e;
  });
}

register();
const { main } = await import('../src/cli/main.ts');
const code = await main(process.argv.slice(2));
process.exitCode = code;
