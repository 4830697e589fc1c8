import { defineConfig } from 'vitest/config';

// Child-process tests start the real CLI (tsx compiles on the fly), which takes a second or
// more on a busy 2-core machine: allow generous per-test time; timings are never asserted.
export default defineConfig({
  test: {
    testTimeout: 120_000,
    hookTimeout: 120_000,
  },
});
