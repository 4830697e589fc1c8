/** `gradus families` and `gradus show` as users meet them (child process). */
import { describe, expect, it } from 'vitest';
import { FAMILIES } from '../../objects/index.js';
import { statisticsOfFamily } from '../../statistics/index.js';
import { runCli } from '../helpers/cli.js';

describe('gradus families', { timeout: 60_000 }, () => {
  it('--json lists every family with id, description and params', () => {
    const r = runCli(['families', '--json']);
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.stdout) as { id: string; description: string; params: { name: string }[] }[];
    expect(doc.map((f) => f.id).sort()).toEqual(FAMILIES.map((f) => f.id).sort());
    for (const f of doc) {
      expect(f.description.length).toBeGreaterThan(0);
      expect(Array.isArray(f.params)).toBe(true);
    }
    expect(doc.find((f) => f.id === 'ordered-set-partitions')!.params.map((p) => p.name)).toEqual(['n', 'k']);
  });
  it('text lists ids with parameters and ranges', () => {
    const r = runCli(['families']);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('permutations — ');
    expect(r.stdout).toContain('--n: size n [0..20]');
  });
});

describe('gradus show', { timeout: 120_000 }, () => {
  it('draws the first objects in generation order with statistic values (JSON)', () => {
    const stats = statisticsOfFamily('permutations').slice(0, 2);
    const r = runCli(['show', 'permutations', '--n', '3', '--limit', '4', ...stats.flatMap((s) => ['--stat', s.id]), '--json']);
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(doc.count).toBe(6); // 3! (common practice)
    expect(doc.shown).toBe(4);
    expect(doc.objects.map((o: { key: string }) => o.key)).toEqual(['1,2,3', '1,3,2', '2,1,3', '2,3,1']); // lexicographic order
    for (const o of doc.objects) for (const s of stats) expect(o.stats[s.id]).toBe(s.compute(o.object));
  });
  it('--stat T:S reads the statistic S after the transform T', () => {
    const s = statisticsOfFamily('permutations')[0];
    if (!s) return;
    const r = runCli(['show', 'permutations', '--n', '4', '--limit', '24', '--stat', `inverse:${s.id}`, '--json']);
    expect(r.code).toBe(0);
    for (const o of JSON.parse(r.stdout).objects) {
      const w = o.object as number[];
      const inv = w.map((_, i) => w.indexOf(i + 1) + 1);
      expect(o.stats[`inverse:${s.id}`]).toBe(s.compute(inv));
    }
  });
  it('draws blocks as 13|2|45 and tableaux as rows (text)', () => {
    const osp = runCli(['show', 'ordered-set-partitions', '--n', '3', '--k', '2']);
    expect(osp.code).toBe(0);
    expect(osp.stdout).toContain('6 objects; showing all'); // 2!·S(3,2) = 6 (Stanley EC1 §1.9)
    expect(osp.stdout.split('\n')).toContain('13|2');
    const syt = runCli(['show', 'standard-tableaux', '--shape', '2,1']);
    expect(syt.code).toBe(0);
    expect(syt.stdout).toContain('1 2\n3');
    expect(syt.stdout).toContain('1 3\n2');
  });
  it('--sample with a seed repeats, and samples are objects of the family', () => {
    const a = runCli(['show', 'parking-functions', '--n', '4', '--sample', '--seed', '7', '--limit', '5', '--json']);
    const b = runCli(['show', 'parking-functions', '--n', '4', '--sample', '--seed', '7', '--limit', '5', '--json']);
    expect(a.code).toBe(0);
    expect(a.stdout).toBe(b.stdout);
    const doc = JSON.parse(a.stdout);
    expect(doc.count).toBe(125); // (n+1)^(n−1) (Konheim–Weiss)
    for (const o of doc.objects) expect([...o.object.labels].sort()).toEqual([1, 2, 3, 4]);
  });
  it('unknown family, unknown statistic, wrong and out-of-range parameters: one line, exit 2, nearest names', () => {
    const cases: [string[], RegExp][] = [
      [['show', 'permutation', '--n', '3'], /nearest: permutations/],
      [['show', 'permutations', '--n', '3', '--stat', 'no-such-stat'], /statistic/],
      [['show', 'permutations', '--n', '3', '--stat', 'fota:x'], /nearest: foata/],
      [['show', 'permutations', '--n', '3', '--k', '2'], /takes no --k/],
      [['show', 'permutations', '--n', '99'], /n must be an integer from 0 to 20/],
      [['show', 'standard-tableaux', '--shape', '1,2'], /shape/],
      [['show', 'ordered-set-partitions', '--n', '3', '--k', '5'], /k must be at most n/],
    ];
    for (const [args, msg] of cases) {
      const r = runCli(args);
      expect(r.code, args.join(' ')).toBe(2);
      expect(r.stderr).toMatch(msg);
      expect(r.stderr.trim().split('\n')).toHaveLength(1);
    }
  });
});
