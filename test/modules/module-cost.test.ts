import { describe, expect, it } from 'vitest';
import { multisetsUpTo } from '../../src/modules/module-cost.js';

describe('cost estimate helpers', () => {
  it('counts multisets of parts with bounded sum (listed by hand)', () => {
    // {}, {1}, {2}, {1,1}, {1,2}, {1,1,1}
    expect(multisetsUpTo([1, 2], 3)).toBe(6);
    // partitions of 0..5 into parts ≤ 5: 1+1+2+3+5+7 (common practice)
    expect(multisetsUpTo([1, 2, 3, 4, 5], 5)).toBe(19);
    expect(multisetsUpTo([2, 2], 4)).toBe(3);
  });
});
