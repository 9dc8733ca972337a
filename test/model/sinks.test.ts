/**
 * Sinks see every reported instant as it is computed, in time order, with the run day each belongs
 * to; the result's series keeps only the days the figures need (the last day of cycling, a warm-up's
 * first days up to its memory budget), and replaying a series hands sinks the same views.
 */
import { describe, it, expect } from 'vitest';
import { loadScenarioFile } from '../../src/input/scenario/load.ts';
import { simulate } from '../../src/model/simulate.ts';
import { replaySeries, type InstantSink } from '../../src/model/sinks.ts';
import type { ModelInputs } from '../../src/model/inputs.ts';

const base = loadScenarioFile('scenarios/demo.yaml').inputs;
/** The demo cut to 2 segments at an hourly output interval (a fast run). */
const small = (run: Partial<ModelInputs['run']>): ModelInputs => ({ ...base, stack: { ...base.stack, segments: 2 }, run: { ...base.run, outputInterval: 3600, ...run } });

/** A sink that notes what it sees. */
function recorder() {
  const seen: { t: number; runDay: number; dayEnd: boolean; inner: number }[] = [];
  let started = 0;
  let finished = 0;
  const sink: InstantSink = {
    start: () => void started++,
    instant: (v) => seen.push({ t: v.t, runDay: v.runDay, dayEnd: v.dayEnd, inner: v.temperatureK[0]! }),
    finish: () => void finished++,
  };
  return { sink, seen, calls: () => ({ started, finished }) };
}

describe('sinks', () => {
  it('see every instant of a 3-day run once, in order, each day closed by its end', () => {
    const r = recorder();
    const result = simulate(small({ length: { kind: 'days', days: 3 } }), { sinks: [r.sink] });
    expect(r.calls()).toEqual({ started: 1, finished: 1 });
    expect(r.seen).toHaveLength(3 * 24 + 1);
    expect(r.seen.map((s) => s.t)).toEqual(Array.from({ length: 73 }, (_, k) => k * 3600));
    expect(r.seen.filter((s) => s.dayEnd).map((s) => s.t / 3600)).toEqual([24, 48, 72]);
    expect(r.seen.map((s) => s.runDay)).toEqual([0, ...Array.from({ length: 72 }, (_, k) => Math.floor(k / 24))]);
    // the series keeps the last day and the instant that opens it, the same values the sink saw
    expect(result.retained).toEqual({ firstDay: 2, days: 1, truncated: false });
    expect(Array.from(result.series.t)).toEqual(r.seen.slice(48).map((s) => s.t));
    expect(result.series.temperatureK[0]).toBe(r.seen[48]!.inner);
  });

  it('see only the settled day of a periodic study, on the first day\'s clock', () => {
    const r = recorder();
    const result = simulate(small({ length: { kind: 'until-periodic', toleranceK: 0.05, maxDays: 20 } }), { sinks: [r.sink] });
    expect(r.seen.map((s) => s.t)).toEqual(Array.from(result.series.t));
    expect(r.seen[0]!.t).toBe(0);
    expect(r.seen.every((s) => s.runDay === result.daysSimulated - 1)).toBe(true);
    expect(r.seen.map((s) => s.dayEnd)).toEqual(r.seen.map((_, k) => k === r.seen.length - 1));
  });

  it('get the same views again when a kept series is replayed', () => {
    const live = recorder();
    const result = simulate(small({ length: { kind: 'days', days: 2 } }), { sinks: [live.sink], retainAll: true });
    const again = recorder();
    replaySeries(result.series, [again.sink]);
    expect(again.seen).toEqual(live.seen);
    expect(again.calls()).toEqual({ started: 1, finished: 1 });
  });
});

describe('what the series keeps', () => {
  it('of a warm-up study: the whole run, or its first days when the run outgrows its memory budget', () => {
    const warm = small({ mode: 'warmup', initial: 'cold', firingStartClockS: 5 * 3600, length: { kind: 'days', days: 3 } });
    const whole = simulate(warm);
    expect(whole.retained).toEqual({ firstDay: 0, days: 3, truncated: false });
    expect(whole.series.t.length).toBe(3 * 24 + 1);
    // a budget too small for any day still keeps the first day (the warm-up figures need it)
    const oneDay = simulate(warm, { warmupSeriesBudgetBytes: 1 });
    expect(oneDay.retained).toEqual({ firstDay: 0, days: 1, truncated: true });
    expect(Array.from(oneDay.series.t)).toEqual(Array.from(whole.series.t.subarray(0, 25)));
  });
});
