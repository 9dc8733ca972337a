/** Outside heat flows: sun, convection, radiation and the net loss per metre of height through the period, at one height. */
import type { ChartConfiguration } from 'chart.js';
import type { ModelInputs } from '../../model/inputs.ts';
import type { TimeSeries } from '../../model/timeseries.ts';
import type { Summary } from '../../analysis/summary.ts';
import { evaluationInstants } from '../../analysis/metrics/index.ts';
import { fixed, round } from '../format.ts';
import { chartTypography, LOOK } from './look.ts';
import { hourStep, localHours, minMax, niceBounds } from './scales.ts';
import { axis, baseOptions, clampSegment, lineDataset, periodWords, timeAxisTitle, type SegmentChartOptions } from './parts.ts';

/**
 * Heat flows per metre of height through the evaluated period at one height: sun absorbed by the
 * outer surface, convection and radiation lost from it, the net loss, and the heat from the gas
 * into the wall for comparison.
 */
export function outsideHeatFlows(series: TimeSeries, summary: Summary, inputs: ModelInputs, options: SegmentChartOptions = {}): ChartConfiguration {
  const f = chartTypography(options.width, options.height);
  const seg = clampSegment(series, options.segment);
  const S = series.segments;
  const ks = evaluationInstants(series, inputs.run.mode);
  const hours = localHours(series, ks);
  const pick = (arr: Float64Array) => ks.map((k, q) => ({ x: hours[q]!, y: round(arr[k * S + seg]!, 1) }));
  const sun = pick(series.segment.sunPerMetre);
  const conv = pick(series.segment.convectionPerMetre);
  const rad = pick(series.segment.radiationPerMetre);
  const net = ks.map((k, q) => ({ x: hours[q]!, y: round(series.segment.convectionPerMetre[k * S + seg]! + series.segment.radiationPerMetre[k * S + seg]! - series.segment.sunPerMetre[k * S + seg]!, 1) }));
  const gas = pick(series.segment.gasToWallPerMetre);
  const datasets = [
    lineDataset('Sun absorbed (gain)', sun, LOOK.sun, f, 0),
    lineDataset('Convection to the air (loss)', conv, LOOK.convection, f, 1),
    lineDataset('Radiation to sky and ground (loss)', rad, LOOK.radiation, f, 2),
    lineDataset('Net loss = convection + radiation − sun', net, LOOK.net, f, 3, f.lineWidth * 1.2),
    lineDataset('From the gas into the wall', gas, LOOK.gasToWall, f, 4),
  ];
  const y = minMax(datasets.flatMap((d) => d.data.map((p) => p.y)));
  const yb = niceBounds(Math.min(0, y.lo), y.hi + 0.05 * (y.hi - y.lo));
  const x0 = hours[0] ?? 0;
  const x1 = hours[hours.length - 1] ?? 24;
  return {
    type: 'line',
    data: { datasets },
    options: {
      ...baseOptions(`Heat flows per metre of height at ${fixed(series.heightM[seg]!)} m`, `Outer surface, circumferentially averaged; ${periodWords(summary, series, ks)}`, f, 'bottom'),
      scales: {
        x: axis(timeAxisTitle(summary), f, { min: x0, max: x1, ticks: { stepSize: hourStep(x1 - x0) } }),
        y: axis('Heat flow per metre of height (W/m)', f, { min: yb.min, max: yb.max, ticks: { stepSize: yb.step } }),
      },
    },
  } as ChartConfiguration;
}
