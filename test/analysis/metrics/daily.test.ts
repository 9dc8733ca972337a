/**
 * Figures of every simulated day, gathered while the run goes: checked against a direct search of
 * the whole series kept in memory (min and max over each day's instants, written out here without
 * the day splitter), the days' heat against the run's energy account (the day integrals add up to
 * the run's), and the splitting of instants into closed days against its documented example.
 */
import { describe, it, expect } from 'vitest';
import { loadScenarioFile } from '../../../src/input/scenario/load.ts';
import { simulate } from '../../../src/model/simulate.ts';
import { DaySplitter, type InstantView } from '../../../src/model/sinks.ts';
import { DailyExtremes, summarise } from '../../../src/analysis/metrics/index.ts';
import type { ModelInputs } from '../../../src/model/inputs.ts';

const DAY = 86400;

describe('DaySplitter', () => {
  it('gives each day its instants from start to end, the instant at a day end to both days (its doc example)', () => {
    const view = (hours: number): InstantView => ({ t: hours * 3600, isoLocal: `2026-01-0${1 + Math.floor((hours - 1e-9) / 24)}T00:00`, runDay: Math.max(0, Math.ceil(hours / 24) - 1), dayEnd: hours > 0 && hours % 24 === 0 } as unknown as InstantView);
    const days: { day: number; hours: number[] }[] = [];
    const splitter = new DaySplitter<number[]>(
      () => [],
      (acc, v) => acc.push(v.t / 3600),
      (acc, day) => days.push({ day, hours: acc }),
    );
    for (const h of [0, 12, 24, 36, 48]) splitter.instant(view(h));
    expect(days).toEqual([
      { day: 0, hours: [0, 12, 24] },
      { day: 1, hours: [24, 36, 48] },
    ]);
    expect(splitter.dayInProgress).toBe(false);
  });
});

describe('daily figures of a multi-day run', () => {
  const base = loadScenarioFile('scenarios/demo.yaml').inputs;
  // the demo cut to 3 segments, 3 days from a cold start (the days differ) at a 20-minute output interval
  const inputs: ModelInputs = { ...base, stack: { ...base.stack, segments: 3 }, run: { ...base.run, initial: 'cold', length: { kind: 'days', days: 3 }, outputInterval: 1200 } };
  const daily = new DailyExtremes();
  const result = simulate(inputs, { sinks: [daily], retainAll: true });
  const figures = daily.figures(result.energy.byDay);
  const s = result.series;
  const C = (k: number) => k - 273.15;

  it('has one row per day, dated by the local date', () => {
    expect(figures.map((d) => [d.day, d.date])).toEqual([
      [1, '2026-07-15'],
      [2, '2026-07-16'],
      [3, '2026-07-17'],
    ]);
  });

  it('states each day the extremes a direct search of that day finds (shell, lining, inner surface, margins)', () => {
    const N = s.nodes;
    const lining = s.layers[0]!;
    figures.forEach((f, d) => {
      let shellMax = -Infinity;
      let liningMin = Infinity;
      let innerMin = Infinity;
      let acidMin = Infinity;
      for (let k = 0; k < s.t.length; k++) {
        if (s.t[k]! < d * DAY - 1e-6 || s.t[k]! > (d + 1) * DAY + 1e-6) continue;
        for (let seg = 0; seg < s.segments; seg++) {
          const at = (i: number) => s.temperatureK[(k * s.segments + seg) * N + i]!;
          shellMax = Math.max(shellMax, at(N - 1));
          innerMin = Math.min(innerMin, at(0));
          for (let i = lining.firstNode; i <= lining.lastNode; i++) liningMin = Math.min(liningMin, at(i));
          acidMin = Math.min(acidMin, s.segment.acidDewMarginK[k * s.segments + seg]!);
        }
      }
      // the summary rounds to 0.01 (src/analysis/rounding.ts): half a unit of the last place
      expect(Math.abs(f.shell_max_c - C(shellMax))).toBeLessThanOrEqual(0.005 + 1e-9);
      expect(Math.abs(f.lining_min_c - C(liningMin))).toBeLessThanOrEqual(0.005 + 1e-9);
      expect(Math.abs(f.inner_surface_min_c - C(innerMin))).toBeLessThanOrEqual(0.005 + 1e-9);
      expect(Math.abs(f.lowest_acid_dew_margin_k! - acidMin)).toBeLessThanOrEqual(0.005 + 1e-9);
    });
    // a cold start warms up: the first day's coldest inner surface is the coldest of the run
    expect(figures[0]!.inner_surface_min_c).toBeLessThan(figures[2]!.inner_surface_min_c);
  });

  it("adds up the days' heat to the run's (the integrals of the heat flows over the days make the run's)", () => {
    const e = result.energy.run;
    const runLossKwh = (e.convectionJ + e.radiationJ - e.sunJ) / 3.6e6;
    const sum = figures.reduce((a, f) => a + f.heat_loss_kwh!, 0);
    // three day figures each rounded to 0.01 kWh
    expect(Math.abs(sum - runLossKwh)).toBeLessThan(0.015 + 1e-9);
  });

  it("ends with the day the summary covers: its last row carries the summary's peaks", () => {
    const summary = summarise({ inputs, result, version: 'test', daily });
    const last = summary.daily[summary.daily.length - 1]!;
    expect(last.shell_max_c).toBeCloseTo(summary.peak_shell_c, 9);
    expect(last.lining_max_c).toBeCloseTo(summary.peak_lining_c, 9);
    expect(last.inner_surface_min_c).toBeCloseTo(summary.min_inner_surface_c, 9);
    expect(last.heat_loss_kwh).toBeCloseTo(summary.heat_loss_kwh_per_day, 9);
  });
});

describe('daily figures of a wall cut into sectors', () => {
  const base = loadScenarioFile('scenarios/demo.yaml').inputs;
  // the demo cut to 2 segments and 4 sectors (the sun-facing side runs hotter), one day at 1 h
  const inputs: ModelInputs = { ...base, stack: { ...base.stack, segments: 2, sectors: 4 }, run: { ...base.run, length: { kind: 'days', days: 1 }, outputInterval: 3600 } };
  const daily = new DailyExtremes();
  const result = simulate(inputs, { sinks: [daily] });
  const [f] = daily.figures(result.energy.byDay);
  const s = result.series;

  it('take the extremes over every sector of every segment (a direct search of the whole wall)', () => {
    const N = s.nodes;
    const perInstant = s.segments * s.sectors * N;
    let shellMax = -Infinity;
    let innerMin = Infinity;
    for (let k = 0; k < s.t.length; k++)
      for (let col = 0; col < s.segments * s.sectors; col++) {
        shellMax = Math.max(shellMax, s.temperatureK[k * perInstant + col * N + N - 1]!);
        innerMin = Math.min(innerMin, s.temperatureK[k * perInstant + col * N]!);
      }
    // rounding to 0.01 in the summary
    expect(Math.abs(f!.shell_max_c - (shellMax - 273.15))).toBeLessThanOrEqual(0.005 + 1e-9);
    expect(Math.abs(f!.inner_surface_min_c - (innerMin - 273.15))).toBeLessThanOrEqual(0.005 + 1e-9);
    // and agree with the summary's peak over the same day (searched over every column)
    expect(f!.shell_max_c).toBeCloseTo(summarise({ inputs, result, version: 'test', daily }).peak_shell_c, 9);
  });
});
