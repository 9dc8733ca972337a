/**
 * The charts of design questions: overlays of several runs and the figures of a sweep against the
 * swept values. Each line differs from the others in marker and dash as well as colour, limits are
 * drawn and labelled in their unit, and the PNG bytes are the same every time.
 */
import { describe, it, expect, beforeAll } from 'vitest';
import type { ChartConfiguration } from 'chart.js';
import { runScenario } from '../../../src/index.ts';
import { traceOfSeries } from '../../../src/output/trace.ts';
import { overlayShell } from '../../../src/output/charts/overlayShell.ts';
import { overlayInnerSurfaceTop } from '../../../src/output/charts/overlayInnerSurfaceTop.ts';
import { overlayAcidMarginTop } from '../../../src/output/charts/overlayAcidMarginTop.ts';
import { overlayHeatLoss } from '../../../src/output/charts/overlayHeatLoss.ts';
import { OVERLAY_MAX_LINES, type OverlayCase } from '../../../src/output/charts/overlayParts.ts';
import { sweepFigure, SWEEP_FIGURES } from '../../../src/output/charts/sweepFigure.ts';
import { sweepPassMap } from '../../../src/output/charts/sweepPassMap.ts';
import { renderChartPng } from '../../../src/output/charts/render.ts';
import { VERDICT_COLORS } from '../../../src/output/charts/look.ts';
import { sweepTable } from '../../../src/analysis/sweep.ts';
import { parseVary, sweepPoints } from '../../../src/input/scenario/sweep.ts';
import type { Summary } from '../../../src/analysis/summary.ts';
import { shortDemo } from '../../support/shortScenario.ts';

type Ds = { label: string; data: { x: number; y: number | null }[]; borderDash?: number[]; pointStyle?: unknown; borderColor?: string; backgroundColor?: unknown };
const datasets = (c: ChartConfiguration) => c.data.datasets as unknown as Ds[];
const size = { width: 600, height: 360 };

let base: OverlayCase;
/** `n` invented cases: the run's trace shifted by 2 K per case, its heat loss by 10 kWh, every other one failing. */
function cases(n: number): OverlayCase[] {
  return Array.from({ length: n }, (_, j) => ({
    label: `case-${j}`,
    summary: { ...base.summary, heat_loss_kwh_per_day: base.summary.heat_loss_kwh_per_day + 10 * j, all_limits_pass: j % 2 === 0 },
    trace: { ...base.trace, shellC: base.trace.shellC.map((v) => v - 2 * j), innerTopC: base.trace.innerTopC.map((v) => v + 2 * j), acidMarginTopK: base.trace.acidMarginTopK.map((v) => v! + 2 * j) },
  }));
}

beforeAll(() => {
  const run = runScenario(shortDemo());
  base = { label: 'demo', summary: run.summary, trace: traceOfSeries(run.result.series, 'cycle') };
});

describe('overlay charts', () => {
  it('draw one line per run, each with its own marker and dash, and the limits once, labelled in their unit', () => {
    const shell = overlayShell(cases(3), size);
    const lines = datasets(shell).filter((d) => d.label.startsWith('case-'));
    expect(lines.map((d) => d.label)).toEqual(['case-0', 'case-1', 'case-2']);
    expect(new Set(lines.map((d) => String(d.pointStyle))).size).toBe(3);
    expect(new Set(lines.map((d) => JSON.stringify(d.borderDash))).size).toBe(3);
    expect(new Set(lines.map((d) => d.borderColor)).size).toBe(3);
    expect(datasets(shell).filter((d) => d.label.startsWith('Shell touch limit'))).toHaveLength(1);
    expect(datasets(shell).find((d) => d.label.startsWith('Shell touch limit'))!.label).toBe('Shell touch limit 60.0 °C');
    expect(datasets(overlayAcidMarginTop(cases(2), size)).map((d) => d.label)).toContain('Required margin 10.0 K');
    const dew = datasets(overlayInnerSurfaceTop(cases(2), size)).map((d) => d.label);
    expect(dew.filter((l) => l.startsWith('Acid dew point'))).toHaveLength(1);
    expect(dew.filter((l) => l.startsWith('Water dew point'))).toHaveLength(1);
  });

  it('draw at most eight runs, evenly spaced from the first to the last, and say so', () => {
    const c = overlayShell(cases(20), size);
    const labels = datasets(c).filter((d) => d.label.startsWith('case-')).map((d) => d.label);
    expect(labels).toHaveLength(OVERLAY_MAX_LINES);
    expect([labels[0], labels[labels.length - 1]]).toEqual(['case-0', 'case-19']);
    expect(String(c.options?.plugins?.subtitle?.text)).toMatch(/8 of 20 runs drawn/);
  });

  it('draw the heat loss as one bar per run, filled by verdict', () => {
    const c = overlayHeatLoss(cases(3), size);
    const [pass, fail] = datasets(c);
    expect(c.data.labels).toEqual(['case-0', 'case-1', 'case-2']);
    expect(pass!.backgroundColor).toBe(VERDICT_COLORS.pass);
    expect((pass!.data as unknown as (number | null)[])[1]).toBeNull();
    expect((fail!.data as unknown as (number | null)[])[1]).toBeCloseTo(base.summary.heat_loss_kwh_per_day + 10, 1); // rounded to 0.1 kWh for the bar
  });

  it('render to the same PNG bytes every time, at the size asked for', () => {
    for (const make of [overlayShell, overlayInnerSurfaceTop, overlayAcidMarginTop, overlayHeatLoss]) {
      const config = make(cases(3), size);
      const a = renderChartPng(config, size);
      const b = renderChartPng(config, size);
      expect(a.equals(b)).toBe(true);
      expect([a.readUInt32BE(16), a.readUInt32BE(20)]).toEqual([600, 360]); // PNG IHDR width, height
    }
  });
});

describe('sweep charts', () => {
  /** A sweep table of invented figures: peak shell falling with thickness, every other point failing. */
  function table(varies: string[]) {
    const axes = varies.map((v) => parseVary(v));
    const points = sweepPoints(axes);
    return sweepTable(
      axes,
      points.map((p, i) => ({ name: p.name, values: p.values, status: 'ran' as const, summary: { ...base.summary, scenario: { ...base.summary.scenario, name: p.name }, peak_shell_c: 70 - 5 * i, all_limits_pass: i % 2 === 1 } as Summary })),
    );
  }

  it('draw a figure against the swept value with its limit, labelled with the value and unit', () => {
    const t = table(['stack.layers[1].thickness=20 mm..60 mm step 20 mm']);
    const shell = sweepFigure(t, SWEEP_FIGURES.find((f) => f.name === 'sweep-peak-shell')!, size);
    const [line, limit] = datasets(shell);
    expect(line!.data.map((p) => [p.x, p.y])).toEqual([[20, 70], [40, 65], [60, 60]]);
    expect(limit!.label).toBe('Shell touch limit 60.0 °C');
    const x = (shell.options?.scales as Record<string, { title: { text: string } }>)['x']!;
    expect(x.title.text).toBe('stack.layers[1].thickness (mm)');
    const stress = sweepFigure(t, SWEEP_FIGURES.find((f) => f.name === 'sweep-stress')!, size);
    expect(datasets(stress).some((d) => /^Allowable stress 3\.0 MPa/.test(d.label))).toBe(true);
  });

  it('draw one line per value of the second swept key, and a map with a cell per point', () => {
    const t = table(['stack.layers[1].thickness=20 mm,40 mm,60 mm', 'surface.solar_absorptance=0.3,0.9']);
    const lines = datasets(sweepFigure(t, SWEEP_FIGURES[0]!, size)).filter((d) => d.label.startsWith('surface.'));
    expect(lines.map((d) => d.label)).toEqual(['surface.solar_absorptance = 0.3', 'surface.solar_absorptance = 0.9']);
    const map = sweepPassMap(t, size)!;
    const cells = map.options!.plugins!.stackdayCells as { colors: string[]; xEdges: number[]; yEdges: number[] };
    expect(cells.xEdges).toEqual([10, 30, 50, 70]);
    // midpoints in binary floating point: 0.3 − 0.3 may come out as −5.6e−17
    [0, 0.6, 1.2].forEach((v, i) => expect(cells.yEdges[i]).toBeCloseTo(v, 12));
    // points in sweep order (thickness outer): pass where the index is odd; cells in map order (row by row of absorptance)
    expect(cells.colors).toEqual([VERDICT_COLORS.fail, VERDICT_COLORS.fail, VERDICT_COLORS.fail, VERDICT_COLORS.pass, VERDICT_COLORS.pass, VERDICT_COLORS.pass]);
    expect(sweepPassMap(table(['surface.emissivity=0.5,0.9']), size)).toBeNull();
    expect(renderChartPng(map, size).equals(renderChartPng(map, size))).toBe(true);
  });

  it('draw a list of words as a category axis', () => {
    const t = table(['outside.sky=berdahl-martin,swinbank']);
    const c = sweepFigure(t, SWEEP_FIGURES[0]!, size);
    expect((c.options?.scales as Record<string, { type: string; labels: string[] }>)['x']).toMatchObject({ type: 'category', labels: ['berdahl-martin', 'swinbank'] });
    expect(renderChartPng(c, size).length).toBeGreaterThan(1000);
  });
});
