import { describe, it, expect, beforeAll } from 'vitest';
import type { ChartConfiguration } from 'chart.js';
import { KELVIN_OFFSET } from '../../../src/physics/constants.ts';
import {
  acidMarginMap, chartTypography, clockHours, gasAlongHeight, marginClassOf, marginClasses, niceBounds, outsideHeatFlows,
  temperaturesThroughDay, wallProfile, warmupInnerSurface,
} from '../../../src/output/charts/index.ts';

import { demoStudy, type Study } from '../../support/demoStudy.ts';

type AnyConfig = ChartConfiguration;
type Pt = { x: number; y: number };
const scales = (c: AnyConfig) => Object.entries((c.options?.scales ?? {}) as Record<string, { title?: { display?: boolean; text?: string; font?: { size?: number } }; ticks?: { font?: { size?: number } } }>);
const datasets = (c: AnyConfig) => c.data.datasets as unknown as { label: string; data: Pt[]; borderDash?: number[]; pointStyle?: unknown; type?: string }[];
const byLabel = (c: AnyConfig, start: string) => datasets(c).find((d) => d.label.startsWith(start))!;

function allConfigs(s: Study, size: { width?: number; height?: number } = {}): [string, AnyConfig][] {
  const out: [string, AnyConfig][] = [
    ['temperatures-top', temperaturesThroughDay(s.result.series, s.summary, s.inputs, size)],
    ['temperatures-bottom', temperaturesThroughDay(s.result.series, s.summary, s.inputs, { ...size, segment: 0 })],
    ['wall-profile', wallProfile(s.result.series, s.summary, s.inputs, size)],
    ['acid-margin-map', acidMarginMap(s.result.series, s.summary, s.inputs, size)],
    ['gas-along-height', gasAlongHeight(s.result.series, s.summary, s.inputs, size)],
    ['outside-heat-flows', outsideHeatFlows(s.result.series, s.summary, s.inputs, size)],
  ];
  const w = warmupInnerSurface(s.result.series, s.summary, s.inputs, size);
  if (w) out.push(['warmup-inner-surface', w]);
  return out;
}

describe('chart configurations', () => {
  let cycle: Study;
  let warm: Study;
  beforeAll(() => {
    cycle = demoStudy('cycle');
    warm = demoStudy('warmup');
  });

  it('title every axis with its quantity and a unit in brackets', () => {
    // units the charts use: °C, K, m, W/m, h, min (SI and the glossary's display units)
    const unit = /\((°C|K|m|W\/m|h|min)\)$/;
    for (const s of [cycle, warm])
      for (const [name, c] of allConfigs(s)) {
        const axes = scales(c);
        expect(axes.length, name).toBe(2);
        for (const [id, a] of axes) {
          expect(a.title?.display, `${name} ${id}`).toBe(true);
          expect(a.title?.text ?? '', `${name} ${id}`).toMatch(unit);
          expect((a.title?.text ?? '').replace(unit, '').trim().length, `${name} ${id} names a quantity`).toBeGreaterThan(2);
        }
      }
  });

  it('use fonts readable at 100 % at the default size (ticks ≥ 13 px, axis titles ≥ 15 px) and scale them with the chart', () => {
    // thresholds from the brief: 13 px ticks / 15 px titles at 1000 × 600 (common practice for screen legibility)
    for (const [name, c] of allConfigs(cycle))
      for (const [, a] of scales(c)) {
        expect(a.ticks?.font?.size ?? 0, name).toBeGreaterThanOrEqual(13);
        expect(a.title?.font?.size ?? 0, name).toBeGreaterThanOrEqual(15);
      }
    expect(chartTypography(2000, 1200).tick).toBe(2 * chartTypography(1000, 600).tick);
    expect(chartTypography(500, 300).tick).toBeLessThan(chartTypography(1000, 600).tick);
  });

  it('never tell two lines of a chart apart by hue alone: each has its own dash pattern or marker', () => {
    for (const s of [cycle, warm])
      for (const [name, c] of allConfigs(s)) {
        const lines = datasets(c).filter((d) => d.data.length > 0);
        const looks = lines.map((d) => JSON.stringify([d.borderDash ?? [], d.pointStyle ?? null]));
        expect(new Set(looks).size, `${name}: ${looks.join(' ')}`).toBe(looks.length);
      }
  });

  it('show temperatures in °C: the dew-point lines sit at the dew points of the summary', () => {
    const c = temperaturesThroughDay(cycle.result.series, cycle.summary, cycle.inputs);
    // T[°C] = T[K] − 273.15 (SI brochure, 9th ed., §2.3.1); summary values are rounded to 0.01 → tolerance 0.006
    expect(byLabel(c, 'Acid dew point').data[0]!.y).toBeCloseTo(cycle.summary.acid_dew_point_c!, 2);
    expect(byLabel(c, 'Water dew point').data[0]!.y).toBeCloseTo(cycle.summary.water_dew_point_c, 2);
    expect(byLabel(c, 'Water dew point').data[0]!.y).toBeCloseTo(cycle.result.series.waterDewPointK - KELVIN_OFFSET, 2);
    // shell touch limit 60 °C as written in scenarios/demo.yaml
    expect(byLabel(c, 'Shell touch limit').data[0]!.y).toBeCloseTo(60, 6);
  });

  it('put the lowest inner-surface temperature of the summary on the inner-surface curve at its height', () => {
    // consistency with metrics.ts (same series): regression-style cross-check, not an outside reference
    const seg = cycle.result.series.heightM.findIndex((h) => Math.abs(h - cycle.summary.min_inner_surface_height_m) < 0.01);
    const c = temperaturesThroughDay(cycle.result.series, cycle.summary, cycle.inputs, { segment: seg });
    const inner = byLabel(c, 'Inner surface');
    const lowest = Math.min(...inner.data.map((p) => p.y));
    expect(lowest).toBeCloseTo(cycle.summary.min_inner_surface_c, 1); // both rounded to 0.01 °C
  });

  it('run the daily time axis over the local day, 0 to 24 h, for a one-day cycle', () => {
    const c = temperaturesThroughDay(cycle.result.series, cycle.summary, cycle.inputs);
    const x = c.options!.scales!['x'] as { min: number; max: number; title: { text: string } };
    expect([x.min, x.max]).toEqual([0, 24]);
    expect(x.title.text).toBe('Local time of day (h)');
  });

  it('read clock hours from ISO local times', () => {
    // 05:30 is 5.5 h after midnight; 23:45:36 is 23 + 45/60 + 36/3600 = 23.76 h
    expect(clockHours('2026-07-15T05:30:00+02:00')).toBe(5.5);
    expect(clockHours('2026-07-15T23:45:36+02:00')).toBeCloseTo(23.76, 10);
  });

  it('choose axis bounds on whole nice steps that enclose the data', () => {
    // 1-2-2.5-5 × 10ⁿ steps (common practice for axis ticks)
    expect(niceBounds(12.3, 187.9)).toEqual({ min: 0, max: 200, step: 50 });
    expect(niceBounds(-38.5, 61.2)).toEqual({ min: -40, max: 80, step: 20 });
  });

  it('classify margins: below 0 K is unsafe, below the required margin is caution, above it safe', () => {
    const classes = marginClasses(10);
    expect(marginClassOf(-25, classes).key).toBe('farBelow');
    expect(marginClassOf(-0.01, classes).unsafe).toBe(true);
    expect(marginClassOf(0, classes).key).toBe('caution');
    expect(marginClassOf(9.99, classes).key).toBe('caution');
    expect(marginClassOf(10, classes).key).toBe('safe');
    expect(marginClassOf(45, classes).key).toBe('wellAbove');
    // with no required margin there is no caution band: 0 K and above is safe
    expect(marginClasses(0).some((c) => c.key === 'caution')).toBe(false);
    expect(marginClassOf(0, marginClasses(0)).key).toBe('safe');
  });

  it('map every height and instant, flagging exactly the cells whose margin is negative', () => {
    const s = cycle.result.series;
    const c = acidMarginMap(s, cycle.summary, cycle.inputs);
    const cells = (c.options!.plugins as unknown as { stackdayCells: { xEdges: number[]; yEdges: number[]; flagged: boolean[]; hatch: number[] } }).stackdayCells;
    const K = s.t.length; // one-day cycle: every instant is evaluated
    expect(cells.xEdges).toHaveLength(K + 1);
    expect(cells.yEdges).toEqual(expect.arrayContaining([0, cycle.inputs.stack.height]));
    expect(cells.yEdges).toHaveLength(s.segments + 1);
    const negatives = Array.from(s.segment.acidDewMarginK).filter((m) => m < 0).length;
    expect(cells.flagged.filter(Boolean)).toHaveLength(negatives);
    expect(cells.hatch.filter((h) => h === 2)).toHaveLength(negatives);
    // the key has one entry per class
    expect(datasets(c).map((d) => d.label).join(' | ')).toMatch(/unsafe.*unsafe.*caution.*safe.*safe/);
  });

  it('draw the gas from the inlet at the base to the exit at the top', () => {
    const s = cycle.result.series;
    const c = gasAlongHeight(s, cycle.summary, cycle.inputs);
    const sets = datasets(c);
    expect(sets).toHaveLength(6);
    for (const d of sets) {
      expect(d.data[0]!.y).toBe(0);
      expect(d.data[d.data.length - 1]!.y).toBeCloseTo(cycle.inputs.stack.height, 6);
    }
    // the first instant is local midnight: inlet 60 °C (burner off in scenarios/demo.yaml)
    expect(sets[0]!.data[0]!.x).toBeCloseTo(60, 1);
  });

  it('shade and label every layer of the wall behind the profile', () => {
    const c = wallProfile(cycle.result.series, cycle.summary, cycle.inputs);
    const bands = (c.options!.plugins as unknown as { stackdayBands: { bands: { label: string; from: number; to: number }[] } }).stackdayBands.bands;
    expect(bands.map((b) => b.label)).toEqual(['lining (50 mm)', 'insulation (40 mm)', 'shell (8 mm)']);
    // demo: inner diameter 1.4 m → inner radius 0.7 m; 50 + 40 + 8 mm → outer radius 0.798 m
    expect(bands[0]!.from).toBeCloseTo(0.7, 9);
    expect(bands[2]!.to).toBeCloseTo(0.798, 9);
  });

  it('draw the net outside loss as convection plus radiation minus sun', () => {
    const c = outsideHeatFlows(cycle.result.series, cycle.summary, cycle.inputs);
    const [sun, conv, rad, net] = ['Sun', 'Convection', 'Radiation', 'Net'].map((l) => byLabel(c, l));
    for (let q = 0; q < net!.data.length; q += 7) expect(net!.data[q]!.y).toBeCloseTo(conv!.data[q]!.y + rad!.data[q]!.y - sun!.data[q]!.y, 0); // each term rounded to 0.1 W/m
  });

  it('give the warm-up chart only for warm-up studies, in minutes from firing with the dew points plus margins', () => {
    expect(warmupInnerSurface(cycle.result.series, cycle.summary, cycle.inputs)).toBeNull();
    const c = warmupInnerSurface(warm.result.series, warm.summary, warm.inputs)!;
    const inner = byLabel(c, 'Inner surface at the top');
    expect(inner.data[0]!.x).toBe(0);
    // one day from firing = 1440 min
    expect(inner.data[inner.data.length - 1]!.x).toBeCloseTo(1440, 6);
    // margins from scenarios/demo.yaml: acid 10 K, water 5 K
    expect(byLabel(c, 'Acid dew point + 10 K margin').data[0]!.y).toBeCloseTo(warm.summary.acid_dew_point_c! + 10, 2);
    expect(byLabel(c, 'Water dew point + 5 K margin').data[0]!.y).toBeCloseTo(warm.summary.water_dew_point_c + 5, 2);
  });
});

describe('the sector charts', () => {
  it('draw the shell touch limit and nothing else as a limit: no dew point stands in for an unset touch limit', async () => {
    const { runScenario } = await import('../../../src/index.ts');
    const { shortDemo } = await import('../../support/shortScenario.ts');
    const { shellRoundTheCircumference } = await import('../../../src/output/charts/shellRound.ts');
    const { shellSunnyAndShadySides } = await import('../../../src/output/charts/sectorsThroughDay.ts');
    for (const touch of [60, undefined]) {
      const run = runScenario(shortDemo((s: any) => {
        s.stack.sectors = 4;
        if (touch === undefined) delete s.limits.shell_touch;
        else s.limits.shell_touch = touch;
      }));
      const sides = run.locations.sectors!;
      for (const c of [shellRoundTheCircumference(run.result.series, run.summary, run.inputs, run.locations.peakShell), shellSunnyAndShadySides(run.result.series, run.summary, run.inputs, sides)]) {
        const labels = datasets(c).map((d) => d.label);
        expect(labels.some((l) => /dew point/i.test(l))).toBe(false);
        expect(labels.some((l) => l.startsWith('Shell touch limit'))).toBe(touch !== undefined);
      }
    }
  });
});
