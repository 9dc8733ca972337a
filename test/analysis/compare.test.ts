/** Comparing build-ups: the choice is the build-up that meets every limit at the least heat loss. */
import { describe, it, expect } from 'vitest';
import { compareBuildUps, comparisonCsv, comparisonRow } from '../../src/analysis/compare.ts';
import type { Summary } from '../../src/analysis/summary.ts';
import { demoStudy } from '../support/demoStudy.ts';

const base = demoStudy('cycle').summary;
/** A copy of the demo summary with a different name, verdict and heat loss (invented figures for the rule). */
function variant(name: string, pass: boolean, loss: number): Summary {
  return {
    ...base,
    scenario: { ...base.scenario, name },
    all_limits_pass: pass,
    verdicts: base.verdicts.map((v) => ({ ...v, status: pass ? (v.status === 'not-set' ? 'not-set' : 'pass') : v.status })),
    heat_loss_kwh_per_day: loss,
  };
}

describe('compareBuildUps', () => {
  it('recommends the passing build-up with the least heat loss, never a failing one however cheap', () => {
    const c = compareBuildUps([variant('a', true, 500), variant('b', false, 100), variant('c', true, 300)]);
    expect(c.recommended).toBe('c');
    expect(c.rows.map((r) => r.scenario)).toEqual(['a', 'b', 'c']);
  });

  it('recommends nothing when no build-up meets every limit', () => {
    expect(compareBuildUps([variant('a', false, 500), variant('b', false, 100)]).recommended).toBeNull();
  });

  it('names the failed limits and the build-up, and writes a CSV row per build-up', () => {
    const c = compareBuildUps([base]);
    expect(c.rows[0]!.failed_limits).toEqual(base.verdicts.filter((v) => v.status === 'fail').map((v) => v.limit));
    expect(c.rows[0]!.build_up).toBe('50 mm dense-castable | 40 mm calcium-silicate | 8 mm carbon-steel');
    const csv = comparisonCsv(c).trimEnd().split('\n');
    expect(csv).toHaveLength(2);
    expect(csv[1]).toMatch(/^demo,50 mm dense-castable \| 40 mm calcium-silicate \| 8 mm carbon-steel,/);
  });
});

describe('a row of a run judged over every day (several days, not periodic)', () => {
  it('holds the figures the verdicts judged and the mean heat loss per day, not the last day alone', async () => {
    const { runScenario } = await import('../../src/index.ts');
    const { loadScenarioFile } = await import('../../src/input/scenario/load.ts');
    const loaded = loadScenarioFile('scenarios/demo.yaml').inputs;
    // the invented demo plant from a wall at 150 °C, two days: day 1 is the hotter one
    const s = runScenario({ ...loaded, stack: { ...loaded.stack, segments: 3 }, run: { ...loaded.run, length: { kind: 'days', days: 2 }, outputInterval: 1800, initial: { kind: 'uniform', temperatureK: 423.15 }, accuracy: { kind: 'off' } } }).summary;
    const row = comparisonRow(s);
    const governing = (limit: string) => s.verdicts.find((v) => v.limit === limit)!.governing_value;
    expect(row.peak_shell_c).toBe(governing('shell_touch'));
    expect(row.peak_shell_c).toBeGreaterThan(s.peak_shell_c);
    expect(row.lowest_acid_dew_margin_k).toBe(governing('acid_dew_margin'));
    expect(row.max_stress_indicator_mpa).toBe(governing('allowable_stress'));
    const days = s.daily.map((d) => d.heat_loss_kwh!);
    expect(row.heat_loss_kwh_per_day).toBeCloseTo((days[0]! + days[1]!) / 2, 2);
    expect(row.heat_loss_kwh_per_day).not.toBe(s.heat_loss_kwh_per_day);
  });
});
