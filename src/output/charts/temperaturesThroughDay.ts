/** Temperatures through the day: gas, every wall position and air at one height, with the limit and dew-point lines. */
import type { ChartConfiguration, ChartDataset } from 'chart.js';
import type { ModelInputs } from '../../model/inputs.ts';
import type { TimeSeries } from '../../model/timeseries.ts';
import type { Summary } from '../../analysis/summary.ts';
import { evaluationInstants } from '../../analysis/metrics/index.ts';
import { celsius, fixed, round } from '../format.ts';
import { chartTypography, LOOK, wallRamp } from './look.ts';
import { hourStep, localHours, minMax } from './scales.ts';
import { axis, baseOptions, boundsWithLimits, clampSegment, limitDatasets, lineDataset, namedNodes, periodWords, positionName, temperatureLimits, timeAxisTitle, type Point, type SegmentChartOptions } from './parts.ts';
import { nodeTemperatureK } from './parts.ts';

/**
 * Temperatures through the evaluated period at one height: gas, inner surface, every interface,
 * outer surface and air, with the shell touch and lining service limits and both dew points as
 * horizontal lines.
 */
export function temperaturesThroughDay(series: TimeSeries, summary: Summary, inputs: ModelInputs, options: SegmentChartOptions = {}): ChartConfiguration {
  const f = chartTypography(options.width, options.height);
  const seg = clampSegment(series, options.segment);
  const S = series.segments;
  const ks = evaluationInstants(series, inputs.run.mode);
  const hours = localHours(series, ks);
  const nodes = namedNodes(series);
  const looks = wallRamp(nodes.length);
  const datasets: ChartDataset<'line', Point[]>[] = [];
  const gas = ks.map((k, q) => ({ x: hours[q]!, y: round(celsius((series.segment.gasInK[k * S + seg]! + series.segment.gasOutK[k * S + seg]!) / 2)) }));
  datasets.push(lineDataset('Flue gas (segment mean)', gas, LOOK.gas, f, 0, f.lineWidth * 1.3));
  nodes.forEach((i, j) => {
    const data = ks.map((k, q) => ({ x: hours[q]!, y: round(celsius(nodeTemperatureK(series, k, seg, i))) }));
    datasets.push(lineDataset(positionName(series, i), data, looks[j]!, f, j + 1));
  });
  const air = ks.map((k, q) => ({ x: hours[q]!, y: round(celsius(series.instant.airTemperatureK[k]!)) }));
  datasets.push(lineDataset('Outside air', air, LOOK.air, f, nodes.length + 1));
  const data = minMax(datasets.flatMap((d) => d.data.map((p) => p.y)));
  const limits = temperatureLimits(series, inputs, { shell: true, lining: true, margins: false });
  const y = boundsWithLimits(data.lo, data.hi, limits);
  const x0 = hours[0] ?? 0;
  const x1 = hours[hours.length - 1] ?? 24;
  datasets.push(...limitDatasets(limits, x0, x1, y, f));
  const where = seg === S - 1 ? 'top segment' : seg === 0 ? 'bottom segment' : `segment ${seg + 1} of ${S}`;
  return {
    type: 'line',
    data: { datasets },
    options: {
      ...baseOptions(`Temperatures at ${fixed(series.heightM[seg]!)} m (${where})`, `${periodWords(summary, series, ks)}${series.sectors > 1 ? `; wall: mean of ${series.sectors} sectors round the circumference` : ""}`, f, 'bottom'),
      scales: {
        x: axis(timeAxisTitle(summary), f, { min: x0, max: x1, ticks: { stepSize: hourStep(x1 - x0) } }),
        y: axis('Temperature (°C)', f, { min: y.min, max: y.max, ticks: { stepSize: y.step } }),
      },
    },
  } as ChartConfiguration;
}
