/**
 * The shell through the day at the top of the stack on its sunniest and its shadiest side (walls
 * cut into sectors), with the circumferential mean and the touch limit.
 */
import type { ChartConfiguration } from 'chart.js';
import type { ModelInputs } from '../../model/inputs.ts';
import type { TimeSeries } from '../../model/timeseries.ts';
import type { Summary } from '../../analysis/summary.ts';
import { evaluationInstants } from '../../analysis/metrics/index.ts';
import { celsius, fixed, round } from '../format.ts';
import { chartTypography, LOOK } from './look.ts';
import { hourStep, localHours, minMax } from './scales.ts';
import { axis, baseOptions, boundsWithLimits, limitDatasets, lineDataset, periodWords, temperatureLimits, timeAxisTitle, type ChartBuildOptions } from './parts.ts';

export function shellSunnyAndShadySides(series: TimeSeries, summary: Summary, inputs: ModelInputs, sides: { sunniest: number; shadiest: number }, options: ChartBuildOptions = {}): ChartConfiguration {
  const f = chartTypography(options.width, options.height);
  const { segments: S, sectors: ns, nodes: n } = series;
  const seg = S - 1;
  const ks = evaluationInstants(series, inputs.run.mode);
  const hours = localHours(series, ks);
  const shell = (k: number, j: number) => celsius(series.temperatureK[((k * S + seg) * ns + j) * n + n - 1]!);
  const line = (j: number) => ks.map((k, q) => ({ x: hours[q]!, y: round(shell(k, j), 2) }));
  const mean = ks.map((k, q) => {
    let sum = 0;
    for (let j = 0; j < ns; j++) sum += shell(k, j);
    return { x: hours[q]!, y: round(sum / ns, 2) };
  });
  const az = (j: number) => fixed((360 * j) / ns, 0);
  const datasets = [
    lineDataset(`Sunniest side (facing ${az(sides.sunniest)}°)`, line(sides.sunniest), LOOK.sunniest, f, 0),
    lineDataset(`Shadiest side (facing ${az(sides.shadiest)}°)`, line(sides.shadiest), LOOK.shadiest, f, 1),
    lineDataset('Mean round the circumference', mean, LOOK.roundMean, f, 2),
  ];
  const y = minMax(datasets.flatMap((d) => d.data.map((p) => p.y)));
  const limits = temperatureLimits(series, inputs, { shell: true, lining: false, margins: false, dews: false });
  const bounds = boundsWithLimits(y.lo, y.hi, limits);
  const x0 = hours[0] ?? 0;
  const x1 = hours[hours.length - 1] ?? 24;
  return {
    type: 'line',
    data: { datasets: [...datasets, ...limitDatasets(limits, x0, x1, bounds, f)] },
    options: {
      ...baseOptions(`Shell at ${fixed(series.heightM[seg]!)} m on its sunniest and shadiest side`, periodWords(summary, series, ks), f, 'bottom'),
      scales: {
        x: axis(timeAxisTitle(summary), f, { min: x0, max: x1, ticks: { stepSize: hourStep(x1 - x0) } }),
        y: axis('Shell temperature (°C)', f, { min: bounds.min, max: bounds.max, ticks: { stepSize: bounds.step } }),
      },
    },
  } as ChartConfiguration;
}
