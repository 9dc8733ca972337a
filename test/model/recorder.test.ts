/**
 * The recorder range-checks the correlations of a reported instant at most once every
 * RANGE_CHECK_SPACING_S of run time: every instant at a 10-minute output, every tenth at 1 minute.
 */
import { describe, expect, it } from 'vitest';
import { loadScenarioFile } from '../../src/input/scenario/load.ts';
import { simulate } from '../../src/model/simulate.ts';
import { RANGE_CHECK_SPACING_S, Recorder } from '../../src/model/recorder.ts';
import { assembleModel } from '../../src/model/assemble.ts';
import { makeSegmentDiagnostics } from '../../src/model/system.ts';
import type { ModelInputs } from '../../src/model/inputs.ts';

const base = loadScenarioFile('scenarios/demo.yaml').inputs;
/** The demo cut to 2 segments, one day from its steady state (a fast run). */
const day = (outputInterval: number): ModelInputs => ({
  ...base,
  stack: { ...base.stack, segments: 2 },
  run: { ...base.run, outputInterval, length: { kind: 'days', days: 1 }, initial: 'steady-at-start' },
});

describe('range checks of the reported instants', () => {
  it('are spaced by RANGE_CHECK_SPACING_S whatever the output interval', () => {
    expect(RANGE_CHECK_SPACING_S).toBe(600);
    // the accepted Churchill–Chu extrapolation on a tall stack is noted at the points checked
    // (issue: "listed once in the assumptions"): its line is there at both intervals
    const tenMinutes = simulate(day(600));
    const oneMinute = simulate(day(60));
    const line = (r: typeof tenMinutes) => r.assumptions.find((a) => a.startsWith('Churchill–Chu'));
    expect(line(tenMinutes)).toBeDefined();
    expect(line(oneMinute)).toBe(line(tenMinutes));
    // and the results are those of the same solve (only the instants reported differ)
    const at = (r: typeof tenMinutes, tS: number) => r.series.temperatureK[r.series.t.indexOf(tS) * r.series.nodes * 2]!;
    expect(Math.abs(at(oneMinute, 43_200) - at(tenMinutes, 43_200))).toBeLessThan(0.01);
  });

  it('count one checked instant in ten at a 1-minute output, every instant at 10 minutes', () => {
    const checked = (interval: number) => {
      const model = assembleModel(day(interval));
      const rec = new Recorder(model);
      const diag = makeSegmentDiagnostics(model.geometry.segments);
      const y = new Float64Array(model.system.size).fill(400);
      for (let t = 0; t < 7200; t += interval) {
        model.system.boundaries(t, y, diag);
        rec.observe(t, 0, false, y, diag, model.system.driversAt(t));
      }
      // Churchill–Chu is noted twice per segment at each instant checked (natural convection inside and outside)
      return rec.ranges.counts('nuVerticalPlateChurchillChu').checked;
    };
    const segments = 2;
    expect(checked(600)).toBe((7200 / 600) * segments * 2); // inside and outside natural convection both use Churchill–Chu
    expect(checked(60)).toBe(checked(600));
    expect(checked(3600)).toBe((7200 / 3600) * segments * 2);
  });
});
