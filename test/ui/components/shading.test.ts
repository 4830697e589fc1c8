import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { barLength } from '../../../src/ui/components/BarChart.js';
import { progressText } from '../../../src/ui/components/ProgressBar.js';
import { shadeOf } from '../../../src/ui/components/ShadedGrid.js';

const ORDER = [' ', '░', '▒', '▓', '█'];

describe('drawing helpers', () => {
  it('shades grow with the value, zero is blank and the maximum is full', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: 1n, max: 10n ** 30n }), fc.bigInt({ min: 0n, max: 10n ** 30n }), fc.bigInt({ min: 0n, max: 10n ** 30n }), (max, a, b) => {
        const x = a % (max + 1n);
        const y = b % (max + 1n);
        const [lo, hi] = x <= y ? [x, y] : [y, x];
        expect(ORDER.indexOf(shadeOf(lo, max))).toBeLessThanOrEqual(ORDER.indexOf(shadeOf(hi, max)));
        expect(shadeOf(0n, max)).toBe(' ');
        expect(shadeOf(max, max)).toBe('█');
        if (x > 0n) expect(shadeOf(x, max)).not.toBe(' ');
      }),
    );
  });

  it('bars are exact integer scalings, and a nonzero count is never invisible', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: 1n, max: 10n ** 40n }), fc.bigInt({ min: 0n, max: 10n ** 40n }), fc.integer({ min: 1, max: 200 }), (max, v, width) => {
        const value = v % (max + 1n);
        const len = barLength(value, max, width);
        expect(len).toBeLessThanOrEqual(width);
        if (value === 0n) expect(len).toBe(0);
        else expect(len).toBeGreaterThanOrEqual(1);
        if (value === max) expect(len).toBe(width);
      }),
    );
  });

  it('estimates the time left from the rate so far, or from the estimate the engine gave', () => {
    expect(progressText({ label: 'x', done: 25, total: 100, elapsedMs: 10_000 })).toBe('25/100  25%  10s elapsed  ~30s left');
    expect(progressText({ label: 'x', done: 0, total: 100, elapsedMs: 10 })).toBe('0/100  0%  0.0s elapsed');
    // Eleven of twelve tasks done in 3 s says little when the last task is the big one:
    // the engine's estimate of the whole run is shown instead of a rate.
    expect(progressText({ label: 'x', done: 11, total: 12, elapsedMs: 3000, estimateSeconds: 18 })).toBe('11/12  92%  3.0s elapsed  estimate ~18s in all (~15s left)');
    expect(progressText({ label: 'x', done: 11, total: 12, elapsedMs: 20_000, estimateSeconds: 18 })).toBe('11/12  92%  20s elapsed  over the estimate of ~18s');
  });
});
