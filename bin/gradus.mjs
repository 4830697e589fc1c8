#!/usr/bin/env node
// Starts gradus from its TypeScript sources (tsx compiles them on the fly).
import { fileURLToPath } from 'node:url';
import { register } from 'tsx/esm/api';

// A reader that closes the pipe early (`gradus show | head`) ends the run quietly; output that
// cannot be written (a full disk) is one line on stderr and exit code 2, never a stack trace.
for (const stream of [process.stdout, process.stderr]) {
  stream.on('error', (e) => {
    if (e && e.code === 'EPIPE') process.exit(0);
    if (stream === process.stdout) {
      try {
        process.stderr.write(`gradus: cannot write the output (${e && e.code === 'ENOSPC' ? 'the disk is full' : (e && e.code) || String(e)})\n`);
      } catch {
        // stderr is gone too: the exit code says it
      }
    }
    process.exit(2);
  });
}

// The project's tsconfig (JSX runtime and all), wherever gradus is started from.
register({ tsconfig: fileURLToPath(new URL('../tsconfig.json', import.meta.url)) });
const { main } = await import('../src/cli/main.ts');
const code = await main(process.argv.slice(2));
process.exitCode = code;
