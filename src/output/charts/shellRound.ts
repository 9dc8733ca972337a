/**
 * The shell round the circumference (walls cut into sectors): at the instant of the hottest shell,
 * its temperature against the outward azimuth of each sector, unrolled from north through east,
 * south and west, at the height of the peak, the top and the bottom; with the touch limit and the
 * sun's azimuth at that instant.
 */
import type { ChartConfiguration } from 'chart.js';
import type { ModelInputs } from '../../model/inputs.ts';
import type { TimeSeries } from '../../model/timeseries.ts';
import type { Summary } from '../../analysis/summary.ts';
import type { Location } from '../../analysis/metrics/index.ts';
import { celsius, fixed, isoMinute, round } from '../format.ts';
import { chartTypography, ROUND_LOOKS, LOOK } from './look.ts';
import { minMax } from './scales.ts';
import { axis, baseOptions, boundsWithLimits, limitDatasets, lineDataset, temperatureLimits, verticalDataset, type ChartBuildOptions } from './parts.ts';

export function shellRoundTheCircumference(series: TimeSeries, _summary: Summary, inputs: ModelInputs, peak: Location, options: ChartBuildOptions = {}): ChartConfiguration {
  const f = chartTypography(options.width, options.height);
  const { segments: S, sectors: ns, nodes: n } = series;
  const k = peak.instant;
  const heights = [...new Set([peak.segment, S - 1, 0])];
  const shell = (seg: number, j: number) => celsius(series.temperatureK[((k * S + seg) * ns + j) * n + n - 1]!);
  const azimuth = (j: number) => (360 * j) / ns;
  // closed round: the first sector again at 360°
  const datasets = heights.map((seg, q) =>
    lineDataset(
      `${fixed(series.heightM[seg]!)} m${seg === peak.segment ? ' (hottest)' : ''}`,
      Array.from({ length: ns + 1 }, (_, j) => ({ x: azimuth(j), y: round(shell(seg, j % ns), 2) })),
      ROUND_LOOKS[q % ROUND_LOOKS.length]!,
      f,
      q,
    ),
  );
  const y = minMax(datasets.flatMap((d) => d.data.map((p) => p.y)));
  const limits = temperatureLimits(series, inputs, { shell: true, lining: false, margins: false, dews: false });
  const bounds = boundsWithLimits(y.lo, y.hi, limits);
  const sunAz = series.instant.sunAzimuthDeg[k]!;
  const sunUp = series.instant.sunAltitudeDeg[k]! > 0;
  return {
    type: 'line',
    data: {
      datasets: [
        ...datasets,
        ...limitDatasets(limits, 0, 360, bounds, f),
        ...(sunUp ? [verticalDataset(`Sun's azimuth ${fixed(sunAz, 0)}°`, sunAz, bounds.min, bounds.max, LOOK.sun, f)] : []),
      ],
    },
    options: {
      ...baseOptions('Shell temperature round the circumference', `At the hottest instant, ${isoMinute(series.isoLocal[k]!)}; ${ns} sectors; north 0°, east 90°, south 180°, west 270°`, f, 'bottom'),
      scales: {
        x: axis('Outward azimuth of the sector (degrees clockwise from north)', f, { min: 0, max: 360, ticks: { stepSize: 45 } }),
        y: axis('Shell temperature (°C)', f, { min: bounds.min, max: bounds.max, ticks: { stepSize: bounds.step } }),
      },
    },
  } as ChartConfiguration;
}
