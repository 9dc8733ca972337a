/**
 * The size of a run is known before it starts: nodes through the wall, unknowns, recorded
 * temperatures and the explicit reference's steps each have a limit, checked up front with a message
 * that names the limit; the shipped scenarios stay well inside them.
 */
import { describe, it, expect } from 'vitest';
import { validateModelInputs } from '../../../src/input/scenario/validate.ts';
import { demoScenario, problemsOf } from './helpers.ts';
import { recordedInstants, recordedValuesPerInstant, sizeProblems } from '../../../src/input/scenario/limits.ts';
import { simulate } from '../../../src/model/simulate.ts';

const demo = demoScenario;

describe('recorded values, estimated before the run', () => {
  it('equal what a run records: 49 instants for one day at 30-minute output, and every value of them', () => {
    const s = demo();
    s.run.output_interval = 30;
    s.stack.segments = 2;
    const { inputs } = validateModelInputs(s);
    expect(recordedInstants(inputs)).toBe(49);
    const { series } = simulate(inputs);
    expect(series.t.length).toBe(49);
    // the limit's count (limits.ts) against the arrays the recorder filled
    const sum = (arrays: readonly ArrayLike<number>[]) => arrays.reduce((n, a) => n + a.length, 0);
    const stored = series.temperatureK.length + sum(Object.values(series.segment)) + sum(Object.values(series.instant));
    expect(stored).toBe(recordedValuesPerInstant(inputs, series.nodes) * 49);
  });
});

describe('size limits', () => {
  it('more than 1000 nodes through the wall', () => {
    const lines = problemsOf({ ...demo(), stack: { ...demo().stack, layers: Array.from({ length: 6 }, () => ({ material: 'carbon-steel', thickness: '10 mm', cells: 200 })) } });
    expect(lines).toEqual(['stack.layers: found 1 201 nodes through the wall (the cells of every layer); expected at most 1 000 (a limit of stackday): use fewer cells']);
  });

  it('200 segments × 200 cells per layer (the memory exhaustion of the issue) is refused up front', () => {
    const s = demo();
    s.stack.segments = 200;
    for (const l of s.stack.layers) l.cells = 200;
    expect(problemsOf(s)).toEqual(['stack.segments: found 200 segments × 601 nodes through the wall = 120 200 unknowns; expected at most 40 000 (a limit of stackday): use fewer segments or cells']);
  });

  it('a year at 10-minute output of 200 segments is refused; the 365-day demo (12 segments) is not', () => {
    const big = demo();
    big.run.days = 365;
    big.stack.segments = 200;
    expect(problemsOf(big)[0]).toMatch(/^run\.days: found a run recording 52 561 output instants × [\d ]+ values \([\d ]+ temperatures and the boundary quantities of 200 segments\) = [\d ]+ values; expected at most 40 000 000 \(a limit of stackday, about 320 MB\)/);
    const year = demo();
    year.run.days = 365;
    const { inputs } = validateModelInputs(year);
    expect(sizeProblems(inputs)).toEqual([]);
  });
});

describe('the explicit RK45 reference refuses a run it would need hours for', () => {
  it('a 50-cell steel shell: exit-2 problem with the estimated steps, found at once', () => {
    const s = demo();
    s.stack.layers = [{ material: 'carbon-steel', thickness: '8 mm', cells: 50 }];
    s.run.integrator = 'rk45';
    const started = performance.now();
    const lines = problemsOf(s);
    expect(performance.now() - started).toBeLessThan(5000); // generous for a shared machine; the run itself took six minutes
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/^run\.integrator: found "rk45" for 1 day: the explicit reference would need about [\d ]+ steps, its step being held to [\d.e-]+ s by stability at \w+ \([\d.]+ m\); expected at most 200 000 steps \(a limit of stackday\): use the implicit integrator/);
    // 8 mm / 50 cells = 0.16 mm; α of steel about 1.2e-5 m²/s (from memory): λ ≈ 4α/Δx² ≈ 1900 /s, so a day needs
    // about 86 400 · 1900 / 3.3 ≈ 5e7 steps; the estimate must be of that order (within a factor of 3 for α)
    const steps = Number(/about ([\d ]+) steps/.exec(lines[0]!)![1]!.replace(/ /g, ''));
    expect(steps).toBeGreaterThan(5e7 / 3);
    expect(steps).toBeLessThan(5e7 * 3);
  });

  it('the demo wall for one day (about 1.1e5 steps, measured: 1.1e5 taken) is accepted', () => {
    const s = demo();
    s.run.integrator = 'rk45';
    expect(problemsOf(s)).toEqual([]);
  });
});
