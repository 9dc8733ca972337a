/** Gas along the height: the flue gas temperature from inlet to exit at several instants. */
import type { ChartConfiguration } from 'chart.js';
import type { ModelInputs } from '../../model/inputs.ts';
import type { TimeSeries } from '../../model/timeseries.ts';
import type { Summary } from '../../analysis/summary.ts';
import { evaluationInstants } from '../../analysis/metrics/index.ts';
import { celsius, fixed, isoClock, round } from '../format.ts';
import { chartTypography, sequenceRamp } from './look.ts';
import { minMax, niceBounds, niceStep } from './scales.ts';
import { axis, baseOptions, lineDataset, periodWords, type ChartBuildOptions, type Point } from './parts.ts';

export interface GasAlongHeightOptions extends ChartBuildOptions {
  /** Number of instants drawn, spread evenly over the evaluated period (default 6). */
  readonly instants?: number;
}

/** Gas temperature against height at several instants spread evenly over the evaluated period. */
export function gasAlongHeight(series: TimeSeries, summary: Summary, inputs: ModelInputs, options: GasAlongHeightOptions = {}): ChartConfiguration {
  const f = chartTypography(options.width, options.height);
  const S = series.segments;
  const ks = evaluationInstants(series, inputs.run.mode);
  const n = Math.max(1, Math.min(options.instants ?? 6, ks.length));
  // a settled day ends where it starts, so the cycle's instants leave the last one out
  const divisor = inputs.run.mode === 'cycle' ? n : Math.max(1, n - 1);
  const picks = [...new Set(Array.from({ length: n }, (_, j) => ks[Math.min(ks.length - 1, Math.round((j * (ks.length - 1)) / divisor))]!))];
  const looks = sequenceRamp(picks.length);
  const dz = inputs.stack.height / S;
  const datasets = picks.map((k, j) => {
    const data: Point[] = [{ x: round(celsius(series.segment.gasInK[k * S]!)), y: 0 }];
    for (let s = 0; s < S; s++) data.push({ x: round(celsius(series.segment.gasOutK[k * S + s]!)), y: round((s + 1) * dz, 4) });
    const firing = series.instant.firing[k] ? 'firing' : 'burner off';
    return { ...lineDataset(`${isoClock(series.isoLocal[k]!)} (${firing}, ${fixed(series.instant.massFlow[k]!, 2)} kg/s)`, data, looks[j]!, f, j), pointRadius: f.pointRadius, showLine: true };
  });
  const x = minMax(datasets.flatMap((d) => d.data.map((p) => p.x)));
  const xb = niceBounds(x.lo - 0.03 * (x.hi - x.lo), x.hi + 0.03 * (x.hi - x.lo));
  return {
    type: 'scatter',
    data: { datasets },
    options: {
      ...baseOptions('Flue gas temperature along the height', `Inlet at the base to exit at the top; ${periodWords(summary, series, ks)}`, f, 'bottom'),
      scales: {
        x: axis('Gas temperature (°C)', f, { min: xb.min, max: xb.max, ticks: { stepSize: xb.step } }),
        y: axis('Height above the stack base (m)', f, { min: 0, max: inputs.stack.height, ticks: { stepSize: niceStep(inputs.stack.height, 8) } }),
      },
    },
  } as ChartConfiguration;
}
