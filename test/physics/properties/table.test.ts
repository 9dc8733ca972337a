import { describe, it, expect } from 'vitest';
import { interpolateTable, integrateTable, makeTableLookup, validateTable } from '../../../src/physics/properties/table.ts';
import type { PropertyTable } from '../../../src/physics/materials/types.ts';

// A hand-made table; every expected value below is worked out by hand from these points
// (linear interpolation / trapezoid areas), independent of the code.
const TABLE: PropertyTable = { temperatureK: [300, 500, 900], values: [10, 20, 40] };
const SINGLE: PropertyTable = { temperatureK: [400], values: [7] };

describe('interpolateTable', () => {
  it('returns the tabulated values at the points', () => {
    expect(interpolateTable(TABLE, 300)).toBe(10);
    expect(interpolateTable(TABLE, 500)).toBe(20);
    expect(interpolateTable(TABLE, 900)).toBe(40);
  });

  it('interpolates linearly between points', () => {
    // Hand: 10 + (20−10)·(400−300)/200 = 15; 20 + (40−20)·(700−500)/400 = 30; 20 + 20·(600−500)/400 = 25.
    // Tolerance 1e-12: floating-point rounding only.
    expect(interpolateTable(TABLE, 400)).toBeCloseTo(15, 12);
    expect(interpolateTable(TABLE, 700)).toBeCloseTo(30, 12);
    expect(interpolateTable(TABLE, 600)).toBeCloseTo(25, 12);
  });

  it('holds the end values constant beyond the ends', () => {
    expect(interpolateTable(TABLE, 100)).toBe(10);
    expect(interpolateTable(TABLE, -50)).toBe(10);
    expect(interpolateTable(TABLE, 2000)).toBe(40);
    expect(interpolateTable(TABLE, Infinity)).toBe(40);
  });

  it('returns the only value of a single-point table at any temperature', () => {
    expect(interpolateTable(SINGLE, 1)).toBe(7);
    expect(interpolateTable(SINGLE, 400)).toBe(7);
    expect(interpolateTable(SINGLE, 5000)).toBe(7);
  });

  it('propagates NaN', () => {
    expect(interpolateTable(TABLE, NaN)).toBeNaN();
  });
});

describe('makeTableLookup', () => {
  it('agrees with interpolateTable on sweeps up, down and with jumps (the interval cache never leaks)', () => {
    const lookup = makeTableLookup(TABLE);
    const temps: number[] = [];
    for (let T = 200; T <= 1000; T += 7.3) temps.push(T);
    for (let T = 1000; T >= 200; T -= 11.1) temps.push(T);
    temps.push(899.9, 300.1, 900, 300, 500, 499.999, 650, 250, 950, 600);
    for (const T of temps) {
      // Tolerance 1e-12: the two routes round differently (precomputed slope vs. ratio).
      expect(lookup(T)).toBeCloseTo(interpolateTable(TABLE, T), 12);
    }
  });

  it('handles single-point tables and NaN like interpolateTable', () => {
    expect(makeTableLookup(SINGLE)(123)).toBe(7);
    const lookup = makeTableLookup(TABLE);
    expect(lookup(NaN)).toBeNaN();
    expect(lookup(400)).toBeCloseTo(15, 12); // still correct after a NaN call
  });

  it('is not affected by later changes to the source arrays', () => {
    const t = [300, 500];
    const v = [1, 3];
    const lookup = makeTableLookup({ temperatureK: t, values: v });
    v[1] = 100;
    expect(lookup(400)).toBeCloseTo(2, 12); // hand: midpoint of 1 and 3
  });
});

describe('integrateTable', () => {
  it('equals the hand-computed trapezoid areas inside the table', () => {
    // Hand: ∫300→900 = 200·(10+20)/2 + 400·(20+40)/2 = 3000 + 12000 = 15000.
    expect(integrateTable(TABLE, 300, 900)).toBeCloseTo(15000, 9);
    // Hand: f(400)=15, f(700)=30: ∫400→700 = 100·(15+20)/2 + 200·(20+30)/2 = 1750 + 5000 = 6750.
    expect(integrateTable(TABLE, 400, 700)).toBeCloseTo(6750, 9);
    // Within one interval: ∫550→650, f = 22.5 and 27.5: 100·25 = 2500.
    expect(integrateTable(TABLE, 550, 650)).toBeCloseTo(2500, 9);
  });

  it('adds rectangles for the clamped parts beyond the ends', () => {
    // Hand: ∫200→1000 = 100·10 + 15000 + 100·40 = 20000.
    expect(integrateTable(TABLE, 200, 1000)).toBeCloseTo(20000, 9);
    // Entirely below the first point: 150·10; entirely above the last: 200·40.
    expect(integrateTable(TABLE, 100, 250)).toBeCloseTo(1500, 9);
    expect(integrateTable(TABLE, 1000, 1200)).toBeCloseTo(8000, 9);
    // Straddling the first point only: ∫250→400 = 50·10 + 100·(10+15)/2 = 500 + 1250 = 1750.
    expect(integrateTable(TABLE, 250, 400)).toBeCloseTo(1750, 9);
  });

  it('changes sign when the limits are reversed, and is zero for equal limits', () => {
    expect(integrateTable(TABLE, 700, 400)).toBeCloseTo(-6750, 9);
    expect(integrateTable(TABLE, 1000, 200)).toBeCloseTo(-20000, 9);
    expect(integrateTable(TABLE, 555, 555)).toBe(0);
  });

  it('integrates a single-point table as a constant', () => {
    expect(integrateTable(SINGLE, 300, 800)).toBeCloseTo(3500, 9); // hand: 7·500
  });

  it('matches an independent fine midpoint-rule quadrature of interpolateTable', () => {
    // The midpoint rule is exact on each linear piece except the two pieces holding a kink, so
    // with 100 000 panels the error is below ~(ΔT)²·|Δslope| ≈ 1e-4; tolerance 1e-3.
    const a = 123.4;
    const b = 987.6;
    const panels = 100_000;
    const h = (b - a) / panels;
    let sum = 0;
    for (let i = 0; i < panels; i++) sum += interpolateTable(TABLE, a + (i + 0.5) * h) * h;
    expect(Math.abs(integrateTable(TABLE, a, b) - sum)).toBeLessThan(1e-3);
  });

  it('is additive over adjacent ranges', () => {
    // ∫a→c = ∫a→b + ∫b→c for any b, including b outside [a, c]; tolerance: rounding only.
    for (const [a, b, c] of [[250, 480, 950], [320, 1100, 610], [100, 50, 1000]]) {
      expect(integrateTable(TABLE, a, b) + integrateTable(TABLE, b, c)).toBeCloseTo(integrateTable(TABLE, a, c), 8);
    }
  });
});

describe('validateTable', () => {
  it('accepts a good table and a single-point table', () => {
    expect(validateTable(TABLE, 'good')).toEqual([]);
    expect(validateTable(SINGLE, 'single')).toEqual([]);
  });

  it('reports lengths that differ, naming the table', () => {
    const problems = validateTable({ temperatureK: [300, 400], values: [1] }, 'brick conductivity');
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatch(/^brick conductivity: 2 temperatures but 1 values/);
  });

  it('reports an empty table', () => {
    expect(validateTable({ temperatureK: [], values: [] }, 'x').join('\n')).toMatch(/no points/);
  });

  it('reports temperatures that are not strictly increasing', () => {
    expect(validateTable({ temperatureK: [300, 300], values: [1, 2] }, 'x').join('\n')).toMatch(/strictly increasing/);
    expect(validateTable({ temperatureK: [500, 300], values: [1, 2] }, 'x').join('\n')).toMatch(/strictly increasing/);
  });

  it('reports non-finite numbers, non-positive values and temperatures at or below 0 K', () => {
    expect(validateTable({ temperatureK: [300, NaN], values: [1, 2] }, 'x').join('\n')).toMatch(/temperature #2 is not a finite number/);
    expect(validateTable({ temperatureK: [300, 400], values: [1, Infinity] }, 'x').join('\n')).toMatch(/value #2 is not a finite number/);
    expect(validateTable({ temperatureK: [300, 400], values: [0, 2] }, 'x').join('\n')).toMatch(/value #1 is 0; property values must be positive/);
    expect(validateTable({ temperatureK: [300, 400], values: [1, -2] }, 'x').join('\n')).toMatch(/value #2 is -2/);
    expect(validateTable({ temperatureK: [-10, 400], values: [1, 2] }, 'x').join('\n')).toMatch(/must be above 0/);
  });
});
