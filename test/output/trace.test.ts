/**
 * The overlay charts' trace of a run is the same whether taken from the run in memory or read back
 * from the CSV files the run wrote (what `stackday collect` does), and it matches the summary.
 */
import { describe, it, expect } from 'vitest';
import { traceOfCsv, traceOfSeries } from '../../src/output/trace.ts';
import { segmentsCsv, timeseriesCsv } from '../../src/output/write.ts';
import { runScenario } from '../../src/index.ts';
import { shortDemo } from '../support/shortScenario.ts';

describe('run traces', () => {
  it('read back from timeseries.csv and segments.csv equal the trace of the run in memory, for a daily cycle, a warm-up and a wall with sectors', () => {
    for (const edit of [(s: any) => (s.run.days = 2), (s: any) => Object.assign(s.run, { mode: 'warmup', firing_start: '05:30', days: 1 }), (s: any) => Object.assign(s.stack, { sectors: 4 })]) {
      const run = runScenario(shortDemo(edit));
      const mode = run.inputs.run.mode;
      const fromMemory = traceOfSeries(run.result.series, mode);
      const fromFiles = traceOfCsv(timeseriesCsv(run.result.series), segmentsCsv(run.result.series), mode);
      expect(fromFiles).toEqual(fromMemory);
      // a cycle draws its last day only (25 hourly instants, 0 → 24 h); a warm-up the whole run
      if (mode === 'cycle') {
        expect(fromMemory.hours).toHaveLength(25);
        expect([fromMemory.hours[0], fromMemory.hours[24]]).toEqual([0, 24]);
      } else expect(fromMemory.hours).toHaveLength(run.result.series.t.length);
    }
  });

  it('agrees with the summary: the shell trace peaks at the hottest shell, the top margin is never below the lowest margin', () => {
    const run = runScenario(shortDemo());
    const t = traceOfSeries(run.result.series, 'cycle');
    // the summary rounds to 2 decimals, the trace to 3 (the CSV's)
    expect(Math.max(...t.shellC)).toBeCloseTo(run.summary.peak_shell_c, 2);
    expect(Math.min(...t.acidMarginTopK.map((m) => m!))).toBeGreaterThanOrEqual(run.summary.lowest_acid_dew_margin_k! - 0.005);
    expect(t.topHeightM).toBeCloseTo(run.result.series.heightM[2]!, 3);
  });

  it("with sectors: the shell trace peaks at the hottest sector, the inner surface is the top's coldest sector", () => {
    const run = runScenario(shortDemo((s: any) => Object.assign(s.stack, { sectors: 4 })));
    const t = traceOfSeries(run.result.series, 'cycle');
    expect(Math.max(...t.shellC)).toBeCloseTo(run.summary.peak_shell_c, 2);
    // the top margin is the coldest sector's inner surface minus the acid dew point
    const dewC = run.summary.acid_dew_point_c!;
    t.innerTopC.forEach((c, k) => expect(Math.abs(c - dewC - t.acidMarginTopK[k]!)).toBeLessThan(0.05));
  });
});
