/** Axis steps for time axes and the data range that sets the other axis. */
import { describe, it, expect } from 'vitest';
import { hourStep, minMax, minuteStep } from '../../../src/output/charts/scales.ts';

describe('axis scales', () => {
  it('step a time axis in whole clock divisions with at most twelve intervals', () => {
    // 1, 2, 3, 6, 12 h and whole days; 5 … 720 min (common practice: divisions of the clock face)
    expect(hourStep(24)).toBe(2);
    expect(hourStep(12)).toBe(1);
    expect(hourStep(72)).toBe(6);
    expect(minuteStep(1440)).toBe(120);
    expect(minuteStep(60)).toBe(5);
  });

  it('take the data range from the finite values only', () => {
    expect(minMax([3, Number.NaN, -2, Infinity, 7])).toEqual({ lo: -2, hi: 7 });
    expect(minMax([])).toEqual({ lo: Infinity, hi: -Infinity });
  });
});
