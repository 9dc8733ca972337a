/**
 * The scenario's output section: what the per-instant files hold (every instant by default), an
 * interval that thins them, and clear messages for a form or an interval that cannot be used.
 */
import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { validateModelInputs } from '../../../src/input/scenario/validate.ts';

const demo = () => parse(readFileSync('scenarios/demo.yaml', 'utf8'));

/** The problem lines of a scenario that does not validate. */
function problems(s: unknown): string {
  try {
    validateModelInputs(s);
  } catch (e) {
    return (e as Error).message;
  }
  throw new Error('the scenario validated');
}

describe('output section', () => {
  it('writes every instant of both files when it is left out', () => {
    expect(validateModelInputs(demo()).inputs.output).toEqual({ timeseries: { content: 'all', intervalS: undefined }, segments: { content: 'all', intervalS: undefined } });
  });

  it('takes a form per file and an interval with a unit', () => {
    const s = { ...demo(), output: { timeseries: 'last-day', timeseries_interval: '1 h', segments: 'daily-extremes' } };
    expect(validateModelInputs(s).inputs.output).toEqual({ timeseries: { content: 'last-day', intervalS: 3600 }, segments: { content: 'daily-extremes', intervalS: undefined } });
  });

  it('names every allowed form for an unknown one', () => {
    expect(problems({ ...demo(), output: { timeseries: 'hourly' } })).toMatch(/output\.timeseries: .*"all".*"last-day".*"daily-extremes".*"off"/);
  });

  it('wants an interval that is a whole multiple of the output interval, and only where it thins rows', () => {
    // the demo writes every 10 minutes: 15 minutes is not a whole multiple
    expect(problems({ ...demo(), output: { timeseries_interval: '15 min' } })).toMatch(/output\.timeseries_interval: found 15 min; expected a whole multiple of run\.output_interval \(10 min\)/);
    expect(problems({ ...demo(), output: { segments: 'off', segments_interval: '1 h' } })).toMatch(/output\.segments_interval: found an interval with output\.segments off; expected output\.segments all or last-day/);
  });
});
