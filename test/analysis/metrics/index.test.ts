/** The summary as a whole: run warnings, and where its located figures occur. */
import { describe, it, expect } from 'vitest';
import { simulate } from '../../../src/model/simulate.ts';
import { locateFigures, summarise, summariseRun, type Location } from '../../../src/analysis/metrics/index.ts';
import type { ModelInputs } from '../../../src/model/inputs.ts';
import { loadScenarioFile } from '../../../src/input/scenario/load.ts';
import { KELVIN_OFFSET } from '../../../src/physics/constants.ts';
import { demoStudy } from '../../support/demoStudy.ts';

describe('run warnings', () => {
  const loaded = loadScenarioFile('scenarios/demo.yaml').inputs;

  it('list a correlation used beyond its published range where the literature accepts it once, as an assumption, not a warning (Churchill–Chu on a tall stack, Ra_H > 1e12)', () => {
    // Ra_H ~ 1e14 on every real stack; the turbulent Ra^(1/3) asymptote is the accepted extrapolation
    // (common practice), so a warning there would fire on every run and teach users to ignore warnings.
    const inputs: ModelInputs = { ...loaded, stack: { ...loaded.stack, segments: 2 }, run: { ...loaded.run, length: { kind: 'days', days: 1 }, outputInterval: 3600 } };
    const result = simulate(inputs);
    expect(result.warnings.some((w) => /Churchill–Chu/.test(w))).toBe(false);
    expect(result.assumptions.filter((a) => /Churchill–Chu \(1975\) is used above its published range \(ra > 1\.00e\+12/.test(a))).toHaveLength(1);
    const summary = summarise({ inputs, result, version: 'test' });
    expect(summary.warnings).toEqual(expect.arrayContaining([...result.warnings]));
    expect(summary.assumptions).toEqual(expect.arrayContaining([...result.assumptions]));
  });

  it('say plainly when the periodic state was not reached, and still give every figure', () => {
    const inputs: ModelInputs = {
      ...loaded,
      stack: { ...loaded.stack, segments: 2 },
      run: { ...loaded.run, length: { kind: 'until-periodic', toleranceK: 1e-6, maxDays: 2 }, outputInterval: 3600 },
    };
    const result = simulate(inputs);
    expect(result.daysSimulated).toBe(2);
    expect(result.periodic?.reached).toBe(false);
    const summary = summarise({ inputs, result, version: 'test' });
    expect(summary.run.periodic_reached).toBe(false);
    expect(summary.warnings.some((w) => /periodic state was NOT reached in 2 days/.test(w))).toBe(true);
    expect(Number.isFinite(summary.peak_shell_c)).toBe(true);
  });
});

describe('locations of the located figures', () => {
  // Bookkeeping consistency (the same run read two ways), not an outside reference: each location
  // must index the instant and height the summary states in words, and the value found there must
  // round to the summary's figure.
  const studies = (['cycle', 'warmup'] as const).map((mode) => {
    const s = demoStudy(mode);
    return { mode, ...s, ...summariseRun({ inputs: s.inputs, result: s.result, version: 'test' }) };
  });

  it.each(studies)('point at the instant and height the $mode summary states, where the value is the stated one', ({ result, summary, locations }) => {
    const s = result.series;
    const S = s.segments;
    const N = s.nodes;
    const T = (at: Location, node: number) => s.temperatureK[(at.instant * S + at.segment) * N + node]! - KELVIN_OFFSET;
    const stated = (at: Location) => ({ time: s.isoLocal[at.instant], height: Math.round(s.heightM[at.segment]! * 100) / 100 });
    const r2 = (v: number) => Math.round(v * 100) / 100; // the summary rounds these figures to 0.01
    expect(stated(locations.peakShell)).toEqual({ time: summary.peak_shell_time, height: summary.peak_shell_height_m });
    expect(r2(T(locations.peakShell, N - 1))).toBe(summary.peak_shell_c);
    expect(stated(locations.minInnerSurface)).toEqual({ time: summary.min_inner_surface_time, height: summary.min_inner_surface_height_m });
    expect(r2(T(locations.minInnerSurface, 0))).toBe(summary.min_inner_surface_c);
    expect(stated(locations.peakLining)).toEqual({ time: summary.peak_lining_time, height: summary.peak_lining_height_m });
    expect(stated(locations.throughWallMaxDeltaT)).toEqual({ time: summary.through_wall_max_delta_t_time, height: summary.through_wall_max_delta_t_height_m });
    expect(r2(Math.abs(T(locations.throughWallMaxDeltaT, 0) - T(locations.throughWallMaxDeltaT, N - 1)))).toBe(summary.through_wall_max_delta_t_k);
    expect(locations.layerMaxDeltaT.map(stated)).toEqual(summary.layers.map((l) => ({ time: l.max_delta_t_time, height: l.max_delta_t_height_m })));
    expect(locations.positionSwing.map((p) => [s.nodeLabel[p.node], Math.round(s.heightM[p.segment]! * 100) / 100])).toEqual(summary.positions.map((p) => [p.position, p.swing_height_m]));
    const water = locations.lowestWaterDewMargin;
    expect(stated(water)).toEqual({ time: summary.lowest_water_dew_margin_time, height: summary.lowest_water_dew_margin_height_m });
    expect(r2(s.segment.waterDewMarginK[water.instant * S + water.segment]!)).toBe(summary.lowest_water_dew_margin_k);
    const acid = locations.lowestAcidDewMargin!;
    expect(stated(acid)).toEqual({ time: summary.lowest_acid_dew_margin_time, height: summary.lowest_acid_dew_margin_height_m });
  });

  it('name the firing start only for a warm-up study', () => {
    const [cycle, warm] = studies;
    expect(cycle!.locations.firingStart).toBeNull();
    expect(warm!.result.series.isoLocal[warm!.locations.firingStart!]).toBe(warm!.summary.warmup!.firing_start_local);
  });

  it.each(studies)('are found again from the $mode time series alone, and summarise gives the same summary', ({ mode, inputs, result, summary, locations }) => {
    expect(locateFigures(result.series, mode)).toEqual(locations);
    expect(summarise({ inputs, result, version: 'test' })).toEqual(summary);
  });
});
