/**
 * The Sweep screen as a user meets it (ink-testing-library, 80×24, no colour): a sweep typed
 * in the options of `gradus sweep run`, run with progress, the ranked seeds with their
 * findings, one module opened, the table exported; modules kept in the user's catalogue.
 */
import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, expect, it } from 'vitest';
import { stopPool } from '../../src/pool/pool.js';
import { Catalogue } from '../../src/store/catalogue.js';
import { fits, frame, KEYS, press, renderApp, unwrapped, waitForFrame } from './helpers.js';

afterAll(() => stopPool());

it('runs a sweep, ranks its seeds, opens a module, exports the table, and keeps the modules', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'gradus-sweep-ui-'));
  const cat = join(dir, 'catalogue.sqlite');
  Catalogue.open(cat).close();
  const env = { NO_COLOR: '1', GRADUS_CATALOGUE: cat };
  const r = renderApp({ env, cwd: dir, initialScreen: 'sweep' }, 80, 24);
  await press(r, 'e');
  await press(r, '\u0015', '--family heights --height 1,k-1 --n 1..4 --ops x', KEYS.enter);
  const f = await waitForFrame(r, (x) => x.includes('seeds listed'), 60_000);
  expect(fits(f, 80, 24), f).toBe(true);
  expect(f).toMatch(/▶ {2}1\. δ_\{n,k\} with height k-1 \[x\] n = 1\.\.4, all k = 1\.\.n — q-analog/);
  expect(f).toContain('· Hilbert series by x-degree = [k]_q!·Stir_q(n,k)');
  await press(r, KEYS.down);
  expect(frame(r)).toMatch(/▶ {2}2\. δ_\{n,k\} with height 1/);
  await press(r, KEYS.up, 'o');
  expect(frame(r)).toMatch(/1\. δ_\{n,k\} with height k-1 \[x\] at n = 1, k = 1 \(1 of 10\): dimension 1/);
  await press(r, KEYS.left);
  expect(frame(r)).toMatch(/at n = 4, k = 4 \(10 of 10\): dimension 24/);
  expect(frame(r)).toContain('gradus module --seed superspace-vandermonde --n 4 --k 4 --ops x --frobenius');
  await press(r, KEYS.escape, 'w');
  const written = join(dir, /written (\S+)/.exec(unwrapped(frame(r)))![1]!.split('/').at(-1)!);
  expect(readFileSync(written, 'utf8')).toContain('[k]\\_q!');
  expect(written.endsWith('.md')).toBe(true);
  await press(r, 'w');
  expect(unwrapped(frame(r))).toMatch(/exists; W overwrites it/);
  await press(r, 'f', 'w');
  expect(existsSync(written.replace(/\.md$/, '.tex'))).toBe(true);
  // the modules are in the user's catalogue under their command-line keys
  const c = Catalogue.open(cat, { existing: true });
  expect(c.getResult('module --seed superspace-vandermonde --n 4 --k 2 --ops x --frobenius')).toBeDefined();
  c.close();
  r.unmount();
});
