/**
 * The warm-up chart: the inner surface against the dew points from firing start (warm-up studies only).
 */
import type { ChartConfiguration, ChartDataset } from 'chart.js';
import type { ModelInputs } from '../../model/inputs.ts';
import type { TimeSeries } from '../../model/timeseries.ts';
import type { Summary } from '../../analysis/summary.ts';
import { evaluationInstants } from '../../analysis/metrics/index.ts';
import { celsius, fixed, isoMinute, round } from '../format.ts';
import { chartTypography, WARMUP_LOOKS } from './look.ts';
import { minMax, minuteStep } from './scales.ts';
import { axis, baseOptions, boundsWithLimits, figureLocations, limitDatasets, lineDataset, temperatureLimits, verticalDataset, type ChartBuildOptions, type Point } from './parts.ts';
import { nodeTemperatureK } from './parts.ts';

/**
 * Warm-up studies: inner-surface temperature at the top (and, for comparison, at the bottom)
 * against minutes since firing started, with both dew points and the dew points plus their
 * required margins, and vertical lines at the times the summary reports. Null for a cycle study.
 */
export function warmupInnerSurface(series: TimeSeries, summary: Summary, inputs: ModelInputs, options: ChartBuildOptions = {}): ChartConfiguration | null {
  if (summary.warmup === null) return null;
  const f = chartTypography(options.width, options.height);
  const S = series.segments;
  const ks = evaluationInstants(series, inputs.run.mode);
  const kFiring = figureLocations(series, inputs, options).firingStart ?? ks[0] ?? 0;
  const t0 = series.t[kFiring]!;
  const after = ks.filter((k) => series.t[k]! >= t0 - 1e-6);
  const minutes = after.map((k) => round((series.t[k]! - t0) / 60, 4));
  const top = S - 1;
  const inner = (seg: number) => after.map((k, q) => ({ x: minutes[q]!, y: round(celsius(nodeTemperatureK(series, k, seg, 0))) }));
  const datasets: ChartDataset<'line', Point[]>[] = [
    lineDataset(`Inner surface at the top (${fixed(series.heightM[top]!)} m)`, inner(top), WARMUP_LOOKS.top, f, 0, f.lineWidth * 1.3),
  ];
  if (S > 1) datasets.push(lineDataset(`Inner surface at the bottom (${fixed(series.heightM[0]!)} m)`, inner(0), WARMUP_LOOKS.bottom, f, 1));
  const limits = temperatureLimits(series, inputs, { shell: false, lining: false, margins: true });
  const data = minMax(datasets.flatMap((d) => d.data.map((p) => p.y)));
  const y = boundsWithLimits(data.lo, data.hi, limits);
  const x0 = 0;
  const x1 = minutes[minutes.length - 1] ?? 60;
  datasets.push(...limitDatasets(limits, x0, x1, y, f));
  const topTimes = summary.warmup.top;
  const marks: { label: string; minutes: number | null; look: { color: string; dash: readonly number[] } }[] = [
    { label: 'water dew point + margin', minutes: topTimes.minutes_to_water_dew, look: WARMUP_LOOKS.waterMark },
    { label: 'acid dew point + margin', minutes: topTimes.minutes_to_acid_dew, look: WARMUP_LOOKS.acidMark },
  ];
  for (const m of marks)
    if (m.minutes !== null && m.minutes >= x0 && m.minutes <= x1) datasets.push(verticalDataset(`Top stays above ${m.label} after ${fixed(m.minutes)} min`, m.minutes, y.min, y.max, m.look, f));
  const notReached = marks.filter((m) => m.minutes === null && (m.label.startsWith('water') || series.acidDewPointK !== null)).map((m) => m.label);
  const subtitle = `Firing started ${isoMinute(summary.warmup.firing_start_local)}${notReached.length ? `; the top does NOT stay above the ${notReached.join(' nor the ')} within the run` : ''}`;
  return {
    type: 'line',
    data: { datasets },
    options: {
      ...baseOptions('Warm-up: inner surface against the dew points', subtitle, f, 'bottom'),
      scales: {
        x: axis('Time since firing started (min)', f, { min: x0, max: x1, ticks: { stepSize: minuteStep(x1 - x0) } }),
        y: axis('Temperature (°C)', f, { min: y.min, max: y.max, ticks: { stepSize: y.step } }),
      },
    },
  } as ChartConfiguration;
}
