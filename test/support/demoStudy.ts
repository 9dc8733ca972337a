/** The demo scenario shortened to one day at a 20-minute output interval, as a cycle or a warm-up study (keeps tests fast). */
import { loadScenarioFile } from '../../src/input/scenario/load.ts';
import { simulate } from '../../src/model/simulate.ts';
import { summarise } from '../../src/analysis/metrics/index.ts';
import type { ModelInputs } from '../../src/model/inputs.ts';
import type { RunResult } from '../../src/model/timeseries.ts';
import type { Summary } from '../../src/analysis/summary.ts';

export interface Study {
  inputs: ModelInputs;
  result: RunResult;
  summary: Summary;
}

export function demoStudy(mode: 'cycle' | 'warmup'): Study {
  const { inputs: base } = loadScenarioFile('scenarios/demo.yaml');
  const run = mode === 'cycle'
    ? { ...base.run, length: { kind: 'days' as const, days: 1 }, outputInterval: 1200 }
    : { ...base.run, mode: 'warmup' as const, initial: 'cold' as const, firingStartClockS: 5 * 3600, length: { kind: 'days' as const, days: 1 }, outputInterval: 1200 };
  const inputs: ModelInputs = { ...base, run };
  const result = simulate(inputs);
  return { inputs, result, summary: summarise({ inputs, result, version: 'test' }) };
}
