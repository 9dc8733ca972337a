/**
 * Sizing on a grid: the search ends with two neighbours one step apart, the one passing and the
 * other failing, in few runs. The runs here are stand-ins with a known answer (an invented linear
 * figure against one limit), so the search itself is checked exactly.
 */
import { describe, it, expect } from 'vitest';
import { sizeOnGrid, sizingReport, type SizingProbe } from '../../src/analysis/sizing.ts';
import { verdictMargin } from '../../src/analysis/margins.ts';
import { rangePoints, parseRange, type SweptValue } from '../../src/input/scenario/sweep.ts';
import type { Summary, Verdict } from '../../src/analysis/summary.ts';

/** A stand-in summary: one upper limit (°C) with the figure as given. */
function standIn(limit: string, figure: number, limitValue: number): Summary {
  const pass = figure <= limitValue;
  const v: Verdict = { limit, title: limit, status: pass ? 'pass' : 'fail', limit_value: limitValue, governing_value: figure, unit: '°C', time_local: null, height_m: null, detail: '' };
  return { all_limits_pass: pass, verdicts: [v] } as unknown as Summary;
}

/** Evaluate stand-ins: figure(x) against the limit, counting the runs and the rounds. */
function evaluator(figure: (x: number) => number, limitValue: number, limit = 'shell_touch') {
  const calls: number[][] = [];
  const evaluate = async (values: readonly SweptValue[]): Promise<SizingProbe[]> => {
    calls.push(values.map((v) => v.x!));
    return values.map((value) => ({ value, status: 'ran' as const, summary: standIn(limit, figure(value.x!), limitValue) }));
  };
  return { evaluate, calls };
}

const grid = rangePoints(parseRange('5 mm..200 mm', '--vary')!, 5, '--vary'); // 40 values

describe('sizeOnGrid', () => {
  it('finds the smallest passing value, one step below it fails, in 2 + ⌈log2 n⌉ runs', async () => {
    // invented: shell peak 80 − 0.5·t °C against a 60 °C limit passes from t = 40 mm
    const { evaluate, calls } = evaluator((t) => 80 - 0.5 * t, 60);
    const r = await sizeOnGrid(grid, 'smallest', evaluate);
    expect(r.status).toBe('found');
    expect(r.value!.text).toBe('40 mm');
    expect(r.beyond!.value.text).toBe('35 mm');
    expect(r.beyond!.summary!.all_limits_pass).toBe(false);
    expect(r.governing).toEqual([{ limit: 'shell_touch', title: 'shell_touch', unit: 'K', margin: 0, margin_one_step_beyond: -2.5 }]);
    expect(calls.flat().length).toBeLessThanOrEqual(2 + Math.ceil(Math.log2(grid.length)));
    expect(r.contradictions).toEqual([]);
  });

  it('with two threads evaluates two values per round and needs fewer rounds for the same answer', async () => {
    const one = evaluator((t) => 80 - 0.5 * t, 60);
    const two = evaluator((t) => 80 - 0.5 * t, 60);
    const a = await sizeOnGrid(grid, 'smallest', one.evaluate, 1);
    const b = await sizeOnGrid(grid, 'smallest', two.evaluate, 2);
    expect(b.value).toEqual(a.value);
    expect(b.beyond!.value).toEqual(a.beyond!.value);
    expect(two.calls.slice(1).every((c) => c.length <= 2)).toBe(true);
    expect(two.calls.length).toBeLessThan(one.calls.length);
  });

  it('finds the largest passing value searching from the top, one step above it fails', async () => {
    // invented: lining peak 100 + 2·t °C against a 300 °C limit passes up to t = 100 mm
    const { evaluate } = evaluator((t) => 100 + 2 * t, 300, 'lining_service');
    const r = await sizeOnGrid(grid, 'largest', evaluate);
    expect(r.status).toBe('found');
    expect(r.value!.text).toBe('100 mm');
    expect(r.beyond!.value.text).toBe('105 mm');
  });

  it('says when the first value already passes, and when none passes (with the limit that fails)', async () => {
    const allPass = await sizeOnGrid(grid, 'smallest', evaluator(() => 10, 60).evaluate);
    expect(allPass.status).toBe('range-end-passes');
    expect(allPass.value!.text).toBe('5 mm');
    const nonePass = await sizeOnGrid(grid, 'smallest', evaluator(() => 90, 60).evaluate);
    expect(nonePass.status).toBe('none-passes');
    expect(nonePass.value).toBeNull();
    expect(nonePass.governing.map((g) => [g.limit, g.margin_one_step_beyond])).toEqual([['shell_touch', -30]]);
  });

  it('stops when a value is not a valid scenario, and reports a verdict that changes more than once', async () => {
    const invalid = await sizeOnGrid(grid, 'smallest', async (values) => values.map((value) => ({ value, status: 'invalid' as const, problems: ['bad'] })));
    expect(invalid.status).toBe('not-run');
    // invented: passes only between 40 and 60 mm, and again from 150 mm
    const { evaluate } = evaluator((t) => (t >= 40 && t <= 60) || t >= 150 ? 50 : 70, 60);
    const r = await sizeOnGrid(grid, 'smallest', evaluate, 3);
    expect(r.status).toBe('found');
    expect(r.beyond!.summary!.all_limits_pass).toBe(false);
    expect(r.contradictions.length).toBeGreaterThan(0);
  });

  it('reports as plain data without the summaries', async () => {
    const r = await sizeOnGrid(grid, 'smallest', evaluator((t) => 80 - 0.5 * t, 60).evaluate);
    const report = sizingReport(r, 'stack.layers[1].thickness', '5 mm');
    expect(report.value).toBe('40 mm');
    expect(report.one_step_beyond).toEqual({ value: '35 mm', status: 'ran', all_limits_pass: false, failed_limits: ['shell_touch'], problems: [] });
    expect(JSON.stringify(report)).not.toMatch(/verdicts/);
  });
});

describe('verdictMargin', () => {
  const v = (limit: string, found: number | null, allowed: number | null, unit = '°C', status: Verdict['status'] = 'pass'): Verdict => ({ limit, title: '', status, limit_value: allowed, governing_value: found, unit, time_local: null, height_m: null, detail: '' });
  it('is limit − figure for upper limits and found − required for dew-point margins; null when not set or counted in minutes', () => {
    expect(verdictMargin(v('shell_touch', 55, 60))).toBe(5);
    expect(verdictMargin(v('allowable_stress', 3.5, 3, 'MPa', 'fail'))).toBe(-0.5);
    expect(verdictMargin(v('acid_dew_margin', 4, 10, 'K', 'fail'))).toBe(-6);
    expect(verdictMargin(v('water_dew_margin', 31.35, 5, 'K'))).toBe(26.35);
    expect(verdictMargin(v('acid_dew_margin', null, 10, 'K', 'not-set'))).toBeNull();
    expect(verdictMargin(v('water_dew_margin', 42, null, 'min'))).toBeNull();
  });

  it('treats the annual limits (hours a year below a dew point, cycles a year) as upper limits', () => {
    expect(verdictMargin(v('acid_dew_hours_per_year', 600, 500, 'h', 'fail'))).toBe(-100);
    expect(verdictMargin(v('water_dew_hours_per_year', 20, 50, 'h'))).toBe(30);
    expect(verdictMargin(v('cycles_above', 234, 500, 'cycles'))).toBe(266);
  });
});
