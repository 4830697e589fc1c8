// The one worker entry of gradus: register the TypeScript loader in this thread, then run the
// task named in each message (an export of an engine module) with a throttled progress port.
// Plain .mjs so that workers start the same way from the command line and under vitest.
import { fileURLToPath } from 'node:url';
import { register } from 'tsx/esm/api';

// The project's tsconfig, whatever the working folder of the program that started the pool.
register({ tsconfig: fileURLToPath(new URL('../../tsconfig.json', import.meta.url)) });

const modules = new Map();

export default async function runPooled({ module, name, input, port }) {
  let last = 0;
  let pending;
  const progress = (label, done, total) => {
    if (!port) return;
    const now = Date.now();
    pending = { label, done, total };
    // at most ~20 messages a second; the last one is always sent (at the end below)
    if (now - last < 50 && done !== total) return;
    last = now;
    port.postMessage(pending);
    pending = undefined;
  };
  try {
    let mod = modules.get(module);
    if (!mod) {
      mod = await import(module);
      modules.set(module, mod);
    }
    const fn = mod[name];
    if (typeof fn !== 'function') throw new Error(`no task ${name} in ${module}`);
    const value = await fn(input, progress);
    if (pending && port) port.postMessage(pending);
    return { ok: true, value };
  } catch (e) {
    const err = e instanceof Error ? e : new Error(String(e));
    return { ok: false, error: { name: err.name, message: err.message, argument: err.argument, option: err.option, stack: err.stack } };
  } finally {
    port?.close();
  }
}
