/**
 * What an annual run writes beyond the others: the `annual` section of summary.json (absent from
 * every other run, so their files keep their bytes), monthly.csv and cycles.csv (tidy, the same
 * figures as the summary), the year's section of the console sheet and the report, and four charts
 * (the date × hour margin map at the top, the monthly bars, the cycle histogram) drawn from the
 * statistics: each checked against the figures it shows. The run: the annual scenario cut to 2
 * segments and 2 + 2 + 1 cells, 6 weeks from 20 January at an hourly output interval (two months
 * and a bit, a few hundred milliseconds).
 */
import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { validateModelInputs } from '../../src/input/scenario/validate.ts';
import { runScenario, finalArtefacts } from '../../src/index.ts';
import { annualMarginMap, cycleHistogram, monthlyDewHours, monthlyHeatLoss, renderChartPng } from '../../src/output/charts/index.ts';
import { resultSheet } from '../../src/output/console.ts';
import { renderReportHtml } from '../../src/output/report.ts';
import { cyclesCsv, monthlyCsv } from '../../src/output/annualCsv.ts';
import { governingCycles, regroup } from '../../src/analysis/annual/index.ts';

const raw = parse(readFileSync('scenarios/annual.yaml', 'utf8'));
raw.stack.segments = 2;
raw.stack.layers.forEach((l: { cells?: number }, j: number) => (l.cells = [2, 2, 1][j]));
raw.site.first_day = '2026-01-20';
raw.run = { last_day: '2026-03-02', output_interval: '1 h', initial: 'steady' };
const run = runScenario(validateModelInputs(raw, { baseDir: 'scenarios' }));
const annual = run.summary.annual!;
const parts = run.annual!;
type Bars = { labels: string[]; datasets: { label: string; data: (number | null)[] }[] };

describe('the annual section of summary.json', () => {
  it('covers the dates asked for, month by month', () => {
    expect([annual.first_day, annual.last_day, annual.days]).toEqual(['2026-01-20', '2026-03-02', 42]);
    expect(annual.months.map((m) => [m.month, m.days])).toEqual([
      ['2026-01', 12],
      ['2026-02', 28],
      ['2026-03', 2],
    ]);
    // the months add up to the run (hours to within their rounding to 0.01 h)
    const sum = annual.months.reduce((s, m) => s + m.hours_below_acid_dew[1]!.hours, 0);
    expect(Math.abs(sum - annual.hours_below_acid_dew[1]!.hours)).toBeLessThanOrEqual(0.015);
    expect(annual.months.reduce((s, m) => s + m.heat_loss_kwh, 0)).toBeCloseTo(annual.heat_loss_kwh, 0);
  });

  it('is absent from a run that is not annual', () => {
    const s = parse(readFileSync('scenarios/demo.yaml', 'utf8'));
    s.stack.segments = 2;
    s.run = { days: 1, output_interval: '1 h' };
    expect('annual' in runScenario(validateModelInputs(s)).summary).toBe(false);
  });

  it('lists the annual verdicts with the others and counts them in all_limits_pass', () => {
    const acid = run.summary.verdicts.find((v) => v.limit === 'acid_dew_hours_per_year')!;
    expect(acid.status).toBe(acid.governing_value! <= 500 ? 'pass' : 'fail');
    expect(run.summary.verdicts.map((v) => v.limit)).toEqual(['shell_touch', 'lining_service', 'allowable_stress', 'acid_dew_margin', 'water_dew_margin', 'acid_dew_hours_per_year', 'water_dew_hours_per_year', 'cycles_above']);
    expect('verdicts' in annual).toBe(false);
    expect(run.summary.all_limits_pass).toBe(run.summary.verdicts.every((v) => v.status !== 'fail'));
  });
});

describe('monthly.csv and cycles.csv', () => {
  it('monthly.csv holds a row per month and height with the summary\'s figures', () => {
    const lines = monthlyCsv(annual).trimEnd().split('\n');
    expect(lines).toHaveLength(1 + 3 * 2);
    expect(lines[0]!.split(',').slice(0, 5)).toEqual(['month', 'days', 'height_m', 'hours_below_water_dew', 'hours_below_acid_dew']);
    const feb = lines.find((l) => l.startsWith('2026-02,28,33.75,'))!.split(',');
    const m = annual.months[1]!;
    expect(Number(feb[4])).toBe(m.hours_below_acid_dew[1]!.hours);
    expect(Number(feb[5])).toBe(m.heat_loss_kwh);
  });

  it('cycles.csv holds every difference at every height, its bins adding up to the counts', () => {
    const rows = cyclesCsv(annual, parts).trimEnd().split('\n').slice(1).map((l) => l.split(','));
    expect(new Set(rows.map((r) => r[0]))).toEqual(new Set(['whole wall', 'lining', 'insulation', 'shell']));
    for (const a of annual.cycles.across)
      for (const h of a.by_height) {
        const total = rows.filter((r) => r[0] === a.across && Number(r[1]) === h.height_m).reduce((s, r) => s + Number(r[4]), 0);
        expect(total).toBeCloseTo(h.cycles, 6);
      }
  });

  it('are written with summary.json for an annual run', async () => {
    const names = (await finalArtefacts(run, { charts: false })).map((a) => a.fileName);
    expect(names).toEqual(['summary.json', 'state.json', 'monthly.csv', 'cycles.csv']);
  });
});

describe('the annual charts', () => {
  it('map every hour of every date at the top, flagging exactly the cells whose lowest margin is below the dew point', () => {
    const c = annualMarginMap(run.summary, parts, run.inputs);
    const cells = (c.options!.plugins as unknown as { stackdayCells: { colors: string[]; flagged: boolean[]; xEdges: number[]; yEdges: number[] } }).stackdayCells;
    expect(cells.xEdges).toHaveLength(42 + 1);
    expect(cells.yEdges).toHaveLength(24 + 1);
    // cell (date d, hour h) at h · 42 + d; the grid holds d · 24 + h
    let below = 0;
    for (let d = 0; d < 42; d++)
      for (let h = 0; h < 24; h++) {
        const m = parts.grid.lowestK[d * 24 + h]!;
        expect(cells.flagged[h * 42 + d]).toBe(m < 0);
        if (m < 0) below++;
      }
    expect(below).toBeGreaterThan(0); // the winter nights at low fire go below the acid dew point
  });

  it('bar the hours below each dew point and the heat lost, month by month, as the summary states them', () => {
    const hours = monthlyDewHours(annual).data as unknown as Bars;
    expect(hours.labels).toEqual(['Jan 2026 (12 d)', 'Feb 2026', 'Mar 2026 (2 d)']);
    const top = annual.hours_below_acid_dew[1]!.hours >= annual.hours_below_acid_dew[0]!.hours ? 1 : 0;
    expect(hours.datasets[0]!.data).toEqual(annual.months.map((m) => Math.round(m.hours_below_acid_dew[top]!.hours * 10) / 10));
    const heat = monthlyHeatLoss(annual).data as unknown as Bars;
    expect(heat.datasets[0]!.data).toEqual(annual.months.map((m) => Math.round(m.heat_loss_kwh / 10) / 100));
  });

  it('histogram the cycles of the wall and each layer in common bins that add up to each one\'s count', () => {
    const h = cycleHistogram(annual, parts).data as unknown as Bars;
    expect(h.datasets.map((d) => d.label.split(' at ')[0])).toEqual(['Across the whole wall', 'Across the lining', 'Across the insulation', 'Across the shell']);
    governingCycles(parts).forEach((g, j) => {
      const bars = h.datasets[j]!.data.reduce<number>((s, v) => s + (v ?? 0), 0);
      expect(bars).toBeCloseTo(g.cycles.histogram.total, 6);
      expect(regroup(g.cycles.histogram, 1000)).toEqual([g.cycles.histogram.total]);
    });
  });

  it('render at the requested size', () => {
    for (const c of [annualMarginMap(run.summary, parts, run.inputs), monthlyDewHours(annual), monthlyHeatLoss(annual), cycleHistogram(annual, parts)]) {
      const png = renderChartPng(c, { width: 500, height: 300 });
      // PNG IHDR width and height (ISO/IEC 15948:2004 § 11.2.2)
      expect([png.readUInt32BE(16), png.readUInt32BE(20)]).toEqual([500, 300]);
    }
  });
});

describe('the console sheet and the report', () => {
  it('show the year: months, cycles, the annual verdicts', () => {
    const sheet = resultSheet(run.summary).join('\n');
    expect(sheet).toContain('THE YEAR  2026-01-20 to 2026-03-02, 42 days (less than a year)');
    for (const m of annual.months) expect(sheet).toContain(`  ${m.month}`);
    expect(sheet).toMatch(/Hours a year below the acid dew point/);
    expect(sheet).toMatch(/whole wall\s+\d/);
    const html = renderReportHtml(run.summary, run.inputs, []);
    expect(html).toContain('<section id="year">');
    expect(html).toContain('data-limit="cycles_above"');
    expect(html).toContain('A plant calendar by local date');
  });
});
