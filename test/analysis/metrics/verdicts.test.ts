/** Verdicts that fail exactly the limit a scenario was built to fail. */
import { describe, it, expect } from 'vitest';
import { simulate } from '../../../src/model/simulate.ts';
import { summarise } from '../../../src/analysis/metrics/index.ts';
import type { ModelInputs, LimitsInput } from '../../../src/model/inputs.ts';
import { loadScenarioFile } from '../../../src/input/scenario/load.ts';

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
