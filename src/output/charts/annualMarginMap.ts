/**
 * The year at the top of the stack: the inner surface's margin above the acid dew point (the water
 * dew point when the gas carries no SO₃) as a map of local date × local clock hour, each cell the
 * lowest margin within that hour, in the classes of the daily margin map (acidMarginMap.ts): cells
 * below the dew point are dark red, cross-hatched and outlined.
 */
import type { ChartConfiguration } from 'chart.js';
import type { ModelInputs } from '../../model/inputs.ts';
import type { Summary } from '../../analysis/summary.ts';
import { epochDayOf, monthsBetween, type AnnualParts } from '../../analysis/annual/index.ts';
import { fixed } from '../format.ts';
import { ANNUAL_LOOKS, chartTypography } from './look.ts';
import { niceStep } from './scales.ts';
import { axis, baseOptions, type ChartBuildOptions, type Point } from './parts.ts';
import { marginClasses, marginClassOf, marginKey, marginMapPlugins } from './acidMarginMap.ts';
import type { CellHatch } from './render.ts';

/** Colour of a cell no instant fell in (the hour skipped when the clocks go forward). */
const EMPTY_CELL = '#ffffff';

/** Date × hour map of the top's lowest margin above the dew point over an annual run. */
export function annualMarginMap(summary: Summary, parts: AnnualParts, inputs: ModelInputs, options: ChartBuildOptions = {}): ChartConfiguration {
  const f = chartTypography(options.width, options.height);
  const annual = summary.annual!;
  const grid = parts.grid;
  const acid = grid.acid;
  const required = (acid ? inputs.limits.acidDewMarginK : inputs.limits.waterDewMarginK) ?? 0;
  const classes = marginClasses(required);
  const days = grid.days;
  const colors: string[] = [];
  const hatch: CellHatch[] = [];
  const flagged: boolean[] = [];
  let unsafeHours = 0;
  for (let h = 0; h < 24; h++)
    for (let d = 0; d < days; d++) {
      const m = grid.lowestK[d * 24 + h]!;
      if (Number.isNaN(m)) {
        colors.push(EMPTY_CELL);
        hatch.push(0);
        flagged.push(false);
        continue;
      }
      const c = marginClassOf(m, classes);
      colors.push(c.color);
      hatch.push(c.hatch);
      flagged.push(c.unsafe);
      if (c.unsafe) unsafeHours++;
    }
  const xEdges = Array.from({ length: days + 1 }, (_, d) => d);
  const yEdges = Array.from({ length: 25 }, (_, h) => h);
  // thin dashed lines where months begin, one dataset broken between months
  const first = epochDayOf(annual.first_day);
  const monthLines: Point[] = [];
  for (const month of monthsBetween(annual.first_day, annual.last_day).slice(1)) {
    const x = epochDayOf(`${month}-01`) - first;
    monthLines.push({ x, y: 0 }, { x, y: 24 }, { x, y: Number.NaN });
  }
  const key = marginKey(classes, f);
  const lines = {
    type: 'line' as const,
    label: 'First day of a month',
    data: monthLines,
    borderColor: ANNUAL_LOOKS.monthLine.color,
    borderDash: [...ANNUAL_LOOKS.monthLine.dash],
    borderWidth: Math.max(1, f.scale),
    pointRadius: 0,
    pointStyle: 'line' as const,
    spanGaps: false,
    fill: false,
  };
  const topHeight = parts.layout.heightM[parts.layout.segments - 1]!;
  const dewName = acid ? 'acid' : 'water';
  const dewC = acid ? summary.acid_dew_point_c : summary.water_dew_point_c;
  // (kept short: it must fit the chart width on one line)
  const subtitle = `At ${fixed(topHeight)} m; dew point ${fixed(dewC)} °C, margin ${fixed(required, 0)} K; ${unsafeHours === 0 ? 'no hour below it' : `${unsafeHours} h with an instant BELOW it (outlined)`}; a cell: its hour's lowest margin`;
  const xTitle = annual.first_day.endsWith('-01-01') ? `Day of the year ${annual.first_day.slice(0, 4)} (d)` : `Day of the run from ${annual.first_day} (d)`;
  const base = baseOptions(`The year at the top: inner surface margin above the ${dewName} dew point`, subtitle, f, 'bottom');
  return {
    type: 'scatter',
    data: { datasets: [...key, lines] },
    options: {
      ...base,
      scales: {
        // (no tick at the last day itself: it would crowd the last whole step)
        x: axis(xTitle, f, { min: 0, max: days, ticks: { stepSize: niceStep(days, 12), includeBounds: false }, grid: { display: false } }),
        y: axis('Local clock hour (h)', f, { min: 0, max: 24, ticks: { stepSize: 3 }, grid: { display: false } }),
      },
      plugins: marginMapPlugins(base, f, { xEdges, yEdges, colors, hatch, flagged }),
    },
  } as ChartConfiguration;
}
