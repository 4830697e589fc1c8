/**
 * Counts of the Delta/Shuffle and superspace families (part A of the statistics library),
 * generated and by each family's own formula, against outside references named beside each.
 */
import { bellNumbers, catalan, combinations, det, factorial, fraction, matrix, multiply, stirlingS2 } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import type { Params } from '../../src/enumerate/plugin.js';
import { SymFun } from '../../src/symfun/symfun.js';

function streamed(id: string, p: Params): number {
  let c = 0;
  for (const _ of familyById(id).generate(p)) c++;
  return c;
}
function both(id: string, p: Params): [number, number] {
  return [streamed(id, p), Number(familyById(id).count(p))];
}
function compositions(n: number): number[][] {
  if (n === 0) return [[]];
  const out: number[][] = [];
  for (let f = 1; f <= n; f++) for (const r of compositions(n - f)) out.push([f, ...r]);
  return out;
}

describe('ordered multiset partitions', () => {
  it('content 1^n: k!·S(n,k) (mathjs factorial, stirlingS2)', () => {
    for (let n = 1; n <= 6; n++) {
      for (let k = 1; k <= n; k++) {
        const ref = Number(factorial(k)) * Number(stirlingS2(n, k));
        expect(both('ordered-multiset-partitions', { content: new Array<number>(n).fill(1), k })).toEqual([ref, ref]);
      }
    }
  });
  it('content α: the coefficient of x^α in (e_1 + e_2 + …)^k, i.e. ⟨(Σ_j e_j)^k, h_α⟩ (each block is a set: common practice; computed with the symmetric-function engine)', () => {
    for (let n = 2; n <= 5; n++) {
      const blocks = Array.from({ length: n }, (_, j) => SymFun.basisElement('e', [j + 1])).reduce((a, b) => a.add(b));
      let power = SymFun.one;
      for (let k = 1; k <= n; k++) {
        power = power.mul(blocks);
        const degreeN = power.homogeneousPart(n);
        for (const alpha of compositions(n)) {
          const h = SymFun.basisElement('h', [...alpha].sort((a, b) => b - a));
          const ref = Number(degreeN.hallInner(h).toPoly().constantTerm());
          expect(both('ordered-multiset-partitions', { content: alpha, k }), `α=${alpha} k=${k}`).toEqual([ref, ref]);
        }
      }
    }
  });
});

describe('decorated Dyck paths', () => {
  it('labelled, decorated valleys: no decoration gives the (n+1)^(n−1) parking functions (Konheim–Weiss); n − 1 decorations give one object (Δ′_{e_0} e_n = e_n, Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018))', () => {
    for (let n = 1; n <= 5; n++) {
      expect(both('valley-decorated-dyck-paths', { n, k: n })).toEqual([(n + 1) ** (n - 1), (n + 1) ** (n - 1)]);
      expect(both('valley-decorated-dyck-paths', { n, k: 1 })).toEqual([1, 1]);
    }
    for (const k of [2, 3]) expect(streamed('valley-decorated-dyck-paths', { n: 6, k })).toBe(Number(familyById('valley-decorated-dyck-paths').count({ n: 6, k })));
  });
  it('unlabelled, decorated rises or valleys: Σ_p N(n,p)·C(n−p, d) and Σ_p N(n,p)·C(p−1, d) with Narayana numbers N(n,p) = C(n,p)C(n,p−1)/n (Narayana numbers, from memory; mathjs combinations); Catalan at d = 0 (mathjs catalan)', () => {
    for (let n = 1; n <= 8; n++) {
      for (let d = 0; d < n; d++) {
        let rises = 0;
        let valleys = 0;
        for (let p = 1; p <= n; p++) {
          const nar = (combinations(n, p) * combinations(n, p - 1)) / n;
          if (n - p >= d) rises += nar * combinations(n - p, d);
          if (p - 1 >= d) valleys += nar * combinations(p - 1, d);
        }
        expect(both('dyck-paths-decorated-rises', { n, k: n - d }), `rises n=${n} d=${d}`).toEqual([rises, rises]);
        expect(both('dyck-paths-decorated-valleys', { n, k: n - d }), `valleys n=${n} d=${d}`).toEqual([valleys, valleys]);
      }
      expect(Number(familyById('dyck-paths-decorated-rises').count({ n, k: n }))).toBe(catalan(n));
    }
  });
});

describe('Schröder paths', () => {
  it('large Schröder numbers 1, 2, 6, 22, 90, 394, 1806, 8558 (from memory), and the same by (n+1)S_n = 3(2n−1)S_{n−1} − (n−2)S_{n−2} (from memory; two recollections that must agree)', () => {
    const known = [1, 2, 6, 22, 90, 394, 1806, 8558];
    const rec = [1, 2];
    for (let n = 2; n <= 10; n++) rec.push((3 * (2 * n - 1) * rec[n - 1]! - (n - 2) * rec[n - 2]!) / (n + 1));
    known.forEach((v, n) => expect(rec[n]).toBe(v));
    for (let n = 0; n <= 7; n++) expect(both('schroder-paths', { n })).toEqual([rec[n], rec[n]]);
    expect(Number(familyById('schroder-paths').count({ n: 10 }))).toBe(rec[10]);
  });
  it('with d diagonal steps: C(2n−d, d)·Catalan(n−d) (mathjs combinations, catalan)', () => {
    for (let n = 1; n <= 6; n++) {
      for (let d = 0; d <= n; d++) {
        const ref = combinations(2 * n - d, d) * catalan(n - d);
        expect(both('schroder-paths', { n, d })).toEqual([ref, ref]);
      }
    }
  });
});

describe('Motzkin paths and noncrossing partitions', () => {
  it('Motzkin numbers 1, 1, 2, 4, 9, 21, 51, 127, 323, 835 (from memory) and (n+2)M_n = (2n+1)M_{n−1} + 3(n−1)M_{n−2} (from memory; the two must agree)', () => {
    const known = [1, 1, 2, 4, 9, 21, 51, 127, 323, 835];
    const rec = [1, 1];
    for (let n = 2; n <= 14; n++) rec.push(((2 * n + 1) * rec[n - 1]! + 3 * (n - 1) * rec[n - 2]!) / (n + 2));
    known.forEach((v, n) => expect(rec[n]).toBe(v));
    for (let n = 0; n <= 9; n++) expect(both('motzkin-paths', { n })).toEqual([rec[n], rec[n]]);
    expect(Number(familyById('motzkin-paths').count({ n: 14 }))).toBe(rec[14]);
  });
  it('Motzkin paths with k up steps: C(n, 2k)·Catalan(k) (mathjs combinations, catalan)', () => {
    for (let n = 0; n <= 9; n++) for (let k = 0; 2 * k <= n; k++) expect(both('motzkin-paths', { n, k })).toEqual([combinations(n, 2 * k) * catalan(k), combinations(n, 2 * k) * catalan(k)]);
  });
  it('noncrossing partitions: Catalan numbers, and Narayana numbers C(n,k)C(n,k−1)/n by blocks (mathjs catalan, combinations; Kreweras 1972)', () => {
    for (let n = 0; n <= 9; n++) {
      expect(both('noncrossing-partitions', { n })).toEqual([catalan(n), catalan(n)]);
      for (let k = 1; k <= n; k++) {
        const nar = (combinations(n, k) * combinations(n, k - 1)) / n;
        expect(both('noncrossing-partitions', { n, k })).toEqual([nar, nar]);
      }
    }
  });
});

describe('skew standard tableaux', () => {
  /** Aitken's formula f^{λ/μ} = n!·det[1/(λ_i − μ_j − i + j)!] (Stanley, EC2 Cor. 7.16.3, numbering from memory), exact with mathjs fractions. */
  function aitken(outer: number[], inner: number[]): number {
    const l = outer.length;
    const n = outer.reduce((a, b) => a + b, 0) - inner.reduce((a, b) => a + b, 0);
    if (l === 0) return 1;
    const rows = outer.map((li, i) => outer.map((_, j) => {
      const m = li - (inner[j] ?? 0) - i + j;
      return m < 0 ? fraction(0) : fraction(1, Number(factorial(m)));
    }));
    return Number(multiply(det(matrix(rows)), factorial(n)));
  }
  it("Aitken's determinant (Stanley, EC2 Cor. 7.16.3, numbering from memory; mathjs det over fractions)", () => {
    const cases: [number[], number[]][] = [[[2, 1], [1]], [[3, 2], [1]], [[3, 3, 1], [2, 1]], [[2, 2], [1, 1]], [[4, 3, 2], [2, 1]], [[4, 4, 2, 1], [2, 1]], [[3, 3, 3], [2, 1]], [[5, 3, 1], []], [[3, 1], [3, 1]]];
    for (const [outer, inner] of cases) {
      const ref = aitken(outer, inner);
      expect(both('skew-standard-tableaux', { outer, inner }), `${outer}/${inner}`).toEqual([ref, ref]);
    }
  });
});

describe('rook placements', () => {
  it('staircase of size n with k rooks: S(n, n−k); all placements: Bell numbers (set partitions by their arcs; mathjs stirlingS2, bellNumbers)', () => {
    for (let n = 1; n <= 7; n++) {
      expect(both('rook-placements', { n })).toEqual([bellNumbers(n), bellNumbers(n)]);
      for (let k = 0; k < n; k++) expect(both('rook-placements', { n, k })).toEqual([stirlingS2(n, n - k), stirlingS2(n, n - k)]);
    }
  });
  it('m × m square board with k rooks: C(m,k)²·k! (common practice; mathjs combinations, factorial)', () => {
    for (let m = 1; m <= 4; m++) {
      for (let k = 0; k <= m; k++) {
        const ref = combinations(m, k) ** 2 * Number(factorial(k));
        expect(both('rook-placements', { shape: new Array<number>(m).fill(m), k })).toEqual([ref, ref]);
      }
    }
  });
});

describe('Tesler matrices', () => {
  it('1, 2, 7, 40, 357, 4820 generated and by the recursion, and 96030, 2766572 for n = 7, 8 by the recursion (from memory; no closed formula is known)', () => {
    const known = [1, 2, 7, 40, 357, 4820, 96030, 2766572];
    for (let n = 1; n <= 6; n++) expect(both('tesler-matrices', { n })).toEqual([known[n - 1], known[n - 1]]);
    for (const n of [7, 8]) expect(Number(familyById('tesler-matrices').count({ n }))).toBe(known[n - 1]);
  });
});

describe('superpartitions', () => {
  it('the coefficient of q^n z^m in Π_{i≥0}(1 + z q^i) / Π_{i≥1}(1 − q^i), expanded here as a power series (Desrosiers–Lapointe–Mathieu, J. Algebraic Combin. 24 (2006) §2, from memory)', () => {
    const N = 9;
    // series[m][n], truncated at degree N.
    let series: number[][] = [[1, ...new Array<number>(N).fill(0)]];
    for (let i = 0; i <= N; i++) {
      const next = Array.from({ length: series.length + 1 }, () => new Array<number>(N + 1).fill(0));
      series.forEach((row, m) => row.forEach((c, n) => {
        next[m]![n]! += c;
        if (n + i <= N) next[m + 1]![n + i]! += c;
      }));
      series = next;
    }
    for (let i = 1; i <= N; i++) {
      const prev = series;
      series = prev.map((row, m) =>
        row.map((_, n) => {
          let s = 0;
          for (let j = 0; j * i <= n; j++) s += prev[m]![n - j * i]!; // 1/(1 − q^i) = Σ_j q^{ij}
          return s;
        }),
      );
    }
    for (let n = 0; n <= 6; n++) {
      let total = 0;
      for (let m = 0; m < series.length; m++) {
        const ref = series[m]![n]!;
        total += ref;
        if (m <= 4) expect(both('superpartitions', { n, k: m }), `n=${n} m=${m}`).toEqual([ref, ref]);
      }
      expect(both('superpartitions', { n })).toEqual([total, total]);
    }
    expect(Number(familyById('superpartitions').count({ n: N }))).toBe(series.reduce((s, row) => s + row[N]!, 0));
  });
});

describe('ordered set superpartitions', () => {
  it('k!·S(n,k)·2^{n−k} (each non-minimal element barred or not; mathjs factorial, stirlingS2)', () => {
    for (let n = 1; n <= 6; n++) {
      for (let k = 1; k <= n; k++) {
        const ref = Number(factorial(k)) * Number(stirlingS2(n, k)) * 2 ** (n - k);
        expect(both('ordered-set-superpartitions', { n, k })).toEqual([ref, ref]);
      }
    }
  });
});

describe('parallelogram polyominoes', () => {
  it('semiperimeter n: Catalan(n−1); width k: Narayana C(n−1,k)C(n−1,k−1)/(n−1) (Delest–Viennot 1984, from memory; mathjs catalan, combinations)', () => {
    for (let n = 2; n <= 9; n++) {
      expect(both('parallelogram-polyominoes', { n })).toEqual([catalan(n - 1), catalan(n - 1)]);
      for (let k = 1; k < n; k++) {
        const ref = (combinations(n - 1, k) * combinations(n - 1, k - 1)) / (n - 1);
        expect(both('parallelogram-polyominoes', { n, k })).toEqual([ref, ref]);
      }
    }
  });
});
