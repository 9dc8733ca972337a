/** Comparing build-ups: the choice is the build-up that meets every limit at the least heat loss. */
import { describe, it, expect } from 'vitest';
import { compareBuildUps, comparisonCsv } from '../../src/analysis/compare.ts';
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
