/**
 * Annual runs in the scenario: `run.days: year` (a year of local days from site.first_day) or
 * `run.last_day` (a range of dates), their thinned files by default, and the annual limits that
 * only they may carry. Day counts follow the Gregorian calendar (2024 is a leap year, 2026 is not).
 */
import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { validateModelInputs } from '../../../src/input/scenario/validate.ts';
import { problemsOf } from '../../support/scenarioProblems.ts';

const demo = () => parse(readFileSync('scenarios/demo.yaml', 'utf8'));

/** The demo from `first` with the run section given. */
function withRun(first: string, run: Record<string, unknown>, limits: Record<string, unknown> = {}) {
  const s = demo();
  s.site.first_day = first;
  s.run = { output_interval: '1 h', ...run };
  s.limits = { ...s.limits, ...limits };
  return s;
}


describe('run.days: year', () => {
  it.each([
    ['2026-01-01', '2026-12-31', 365],
    ['2024-01-01', '2024-12-31', 366], // a leap year
    ['2024-03-01', '2025-02-28', 365], // after 29 February: a year of 365 days
    ['2024-02-29', '2025-02-28', 366], // from 29 February: the span holds it
    ['2026-07-15', '2027-07-14', 365],
  ])('from %s runs to %s, %i days', (first, last, days) => {
    const { inputs } = validateModelInputs(withRun(first, { days: 'year' }));
    expect(inputs.run.length).toEqual({ kind: 'days', days });
    expect(inputs.annual).toEqual({ firstDay: first, lastDay: last, given: 'year' });
  });

  it('writes daily extremes by default, and every instant when asked', () => {
    expect(validateModelInputs(withRun('2026-01-01', { days: 'year' })).inputs.output).toEqual({
      timeseries: { content: 'daily-extremes', intervalS: undefined },
      segments: { content: 'daily-extremes', intervalS: undefined },
    });
    const s = withRun('2026-01-01', { days: 'year' });
    s.output = { timeseries: 'all' };
    expect(validateModelInputs(s).inputs.output?.timeseries.content).toBe('all');
  });

  it('is refused for a warm-up study', () => {
    expect(problemsOf(withRun('2026-01-01', { days: 'year', mode: 'warmup', firing_start: '05:00' }))).toEqual([
      'run.days: found an annual run with run.mode warmup; expected run.mode cycle (an annual run follows the plant through its year from a settled start)',
    ]);
  });

  it('can be asked for on the command line', () => {
    const { inputs } = validateModelInputs(withRun('2026-01-01', {}), { overrides: [{ path: ['run', 'days'], value: 'year', option: '--days' }] });
    expect(inputs.annual?.lastDay).toBe('2026-12-31');
  });
});

describe('run.last_day', () => {
  it('runs from site.first_day to that day, inclusive', () => {
    const { inputs } = validateModelInputs(withRun('2026-01-30', { last_day: '2026-03-01' }));
    expect(inputs.run.length).toEqual({ kind: 'days', days: 31 }); // 2 days of January, 28 of February, 1 of March
    expect(inputs.annual).toEqual({ firstDay: '2026-01-30', lastDay: '2026-03-01', given: 'last-day' });
  });

  it('must not come before the first day, span more than 366 days, or be given with run.days', () => {
    expect(problemsOf(withRun('2026-03-01', { last_day: '2026-02-28' }))[0]).toMatch(/^run\.last_day: found "2026-02-28", before site\.first_day "2026-03-01"/);
    expect(problemsOf(withRun('2026-01-01', { last_day: '2027-01-02' }))[0]).toMatch(/^run\.last_day: found "2027-01-02", 367 days after "2026-01-01"/);
    expect(problemsOf(withRun('2026-01-01', { last_day: '2026-02-30' }))).toEqual(['run.last_day: found "2026-02-30"; expected a calendar date "YYYY-MM-DD"']);
    expect(problemsOf(withRun('2026-01-01', { days: 3, last_day: '2026-01-03' }))).toEqual(['run.last_day: found "2026-01-03" with run.days 3; expected one of them (the last day sets the number of days)']);
  });
});

describe('annual limits', () => {
  const limits = { acid_dew_hours_per_year: 200, water_dew_hours_per_year: 10, cycles_above: { range: '50 K', count: 500 } };

  it('are read for an annual run', () => {
    const { inputs } = validateModelInputs(withRun('2026-01-01', { days: 'year' }, limits));
    expect(inputs.limits).toMatchObject({ acidDewHoursPerYear: 200, waterDewHoursPerYear: 10, cyclesAbove: { rangeK: 50, count: 500 } });
  });

  it('are refused in a run that is not annual, each by its key', () => {
    expect(problemsOf(withRun('2026-01-01', { days: 3 }, limits))).toEqual(
      ['acid_dew_hours_per_year', 'water_dew_hours_per_year', 'cycles_above'].map((k) => `limits.${k}: found a limit per year in a run that is not annual; expected run.days: year or run.last_day (or remove the limit)`),
    );
  });
});
