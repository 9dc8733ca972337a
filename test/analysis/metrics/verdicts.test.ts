/** Verdicts that fail exactly the limit a scenario was built to fail. */
import { describe, it, expect } from 'vitest';
import { simulate } from '../../../src/model/simulate.ts';
import { summarise } from '../../../src/analysis/metrics/index.ts';
import type { ModelInputs, LimitsInput } from '../../../src/model/inputs.ts';
import { loadScenarioFile } from '../../../src/input/scenario/load.ts';
import { runScenario } from '../../../src/index.ts';

describe('verdicts', () => {
  // Invented demo plant, run hot and clean so that every limit passes; then each limit in turn is
  // set just beyond the governing figure of that run, and exactly that limit must fail.
  const loaded = loadScenarioFile('scenarios/demo.yaml').inputs;
  const inputs: ModelInputs = {
    ...loaded,
    stack: { ...loaded.stack, segments: 4 },
    flue: {
      ...loaded.flue,
      composition: { N2: 0.74, O2: 0.04, CO2: 0.1, H2O: 0.12 - 2e-6, SO2: 0, SO3: 2e-6 },
      schedule: { daily: [{ clockS: 0, inletTemperatureK: 593.15, massFlow: 3 }] },
    },
    run: { ...loaded.run, length: { kind: 'days', days: 1 }, outputInterval: 1800 },
    limits: { shellTouchK: 400, liningServiceK: 1000, allowableStressPa: 100e6, acidDewMarginK: 5, waterDewMarginK: 5 },
  };
  const result = simulate(inputs);
  const verdictsWith = (limits: LimitsInput) => summarise({ inputs: { ...inputs, limits }, result, version: 'test' }).verdicts;

  it('a scenario built to pass them all passes', () => {
    const v = verdictsWith(inputs.limits);
    expect(v.map((x) => x.status)).toEqual(['pass', 'pass', 'pass', 'pass', 'pass']);
  });

  it.each([
    ['shell_touch', (g: number) => ({ shellTouchK: g + 273.15 - 0.5 })],
    ['lining_service', (g: number) => ({ liningServiceK: g + 273.15 - 0.5 })],
    ['allowable_stress', (g: number) => ({ allowableStressPa: g * 1e6 * 0.9 })],
    ['acid_dew_margin', (g: number) => ({ acidDewMarginK: g + 0.5 })],
    ['water_dew_margin', (g: number) => ({ waterDewMarginK: g + 0.5 })],
  ] as const)('a scenario built to fail %s fails exactly that limit', (limit, failing) => {
    const governing = verdictsWith(inputs.limits).find((v) => v.limit === limit)!.governing_value!;
    const v = verdictsWith({ ...inputs.limits, ...failing(governing) });
    for (const x of v) expect(x.status, x.limit).toBe(x.limit === limit ? 'fail' : 'pass');
  });

  it('a limit that is not set is reported as not set, never as a pass', () => {
    const v = verdictsWith({});
    expect(v.find((x) => x.limit === 'shell_touch')!.status).toBe('not-set');
  });
});

describe('verdicts of a run of several days that is not periodic', () => {
  // The invented demo plant started with its wall at 150 °C (shell far above the day's) and run two
  // days, not to a periodic state: the hottest shell is at the start of day 1, not on day 2, and a
  // verdict judged on the last day alone would miss it (as a year judged on 31 December misses June).
  const loaded = loadScenarioFile('scenarios/demo.yaml').inputs;
  const inputs: ModelInputs = {
    ...loaded,
    stack: { ...loaded.stack, segments: 3 },
    run: { ...loaded.run, length: { kind: 'days', days: 2 }, outputInterval: 1800, initial: { kind: 'uniform', temperatureK: 423.15 }, accuracy: { kind: 'off' } },
  };
  const run = runScenario(inputs);
  const s = run.summary;
  const verdict = (limit: string) => s.verdicts.find((v) => v.limit === limit)!;

  it('judge the worst of every day, with when and where, and say so', () => {
    expect(s.run.verdicts_over).toBe('all 2 simulated days');
    expect(s.run.evaluated_over).toBe('the last simulated day');
    const firstDayShell = s.daily[0]!.shell_max_c;
    expect(firstDayShell).toBeGreaterThan(s.peak_shell_c + 50);
    expect(verdict('shell_touch').governing_value).toBe(firstDayShell);
    expect(verdict('shell_touch').time_local!.slice(0, 10)).toBe(s.daily[0]!.date);
    expect(verdict('shell_touch').detail).toMatch(/over all 2 simulated days$/);
    // the lowest margins are the lowest of any day's
    const lowestAcid = Math.min(...s.daily.map((d) => d.lowest_acid_dew_margin_k!));
    expect(verdict('acid_dew_margin').governing_value).toBe(lowestAcid);
    // the stress indicator at the largest difference of the run is at least the last day's
    expect(verdict('allowable_stress').governing_value!).toBeGreaterThanOrEqual(Math.max(...s.layers.map((l) => l.stress_indicator_mpa ?? 0)));
  });

  it('a periodic run is judged on its settled day, as its figures are', () => {
    const periodic = runScenario({ ...inputs, run: { ...inputs.run, length: { kind: 'until-periodic', toleranceK: 0.05, maxDays: 10 }, initial: 'steady-daily-mean' } }).summary;
    expect(periodic.run.verdicts_over).toBe(periodic.run.evaluated_over);
    expect(periodic.verdicts.find((v) => v.limit === 'shell_touch')!.governing_value).toBe(periodic.peak_shell_c);
  });
});
