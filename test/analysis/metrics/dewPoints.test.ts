/** Dew-point bookkeeping: the share of a linearly interpolated interval spent below zero margin. */
import { describe, it, expect } from 'vitest';
import { fractionBelowZero } from '../../../src/analysis/metrics/index.ts';

describe('fraction helpers', () => {
  it('interpolate crossings linearly', () => {
    expect(fractionBelowZero(-1, 1)).toBe(0.5);
    expect(fractionBelowZero(1, -3)).toBe(0.75);
  });
});
