/**
 * The wall profile: temperature against radius through the wall at the instants and heights where
 * the summary's peaks and minimum occur, with the layers shaded behind.
 */
import type { ChartConfiguration } from 'chart.js';
import type { ModelInputs } from '../../model/inputs.ts';
import type { TimeSeries } from '../../model/timeseries.ts';
import type { Summary } from '../../analysis/summary.ts';
import { celsius, fixed, isoClock, round } from '../format.ts';
import { chartTypography, FONT_FAMILY, GAP_BAND_FILL, INK, LAYER_BAND_FILLS, PROFILE_LOOKS } from './look.ts';
import { minMax, niceBounds } from './scales.ts';
import { axis, baseOptions, figureLocations, lineDataset, type ChartBuildOptions } from './parts.ts';
import { nodeTemperatureK } from './parts.ts';
import type { BandSpec } from './render.ts';

/**
 * Temperature against radius through the wall at the hottest instant (peak lining), at the peak
 * shell instant and at the coldest instant (lowest inner surface), each at the height where it
 * occurs (as located by the summary); the layers are shaded and labelled behind the curves.
 */
export function wallProfile(series: TimeSeries, summary: Summary, inputs: ModelInputs, options: ChartBuildOptions = {}): ChartConfiguration {
  const f = chartTypography(options.width, options.height);
  const N = series.nodes;
  const at = figureLocations(series, inputs, options);
  const wanted = [
    { what: 'Hottest lining', at: at.peakLining },
    { what: 'Hottest shell', at: at.peakShell },
    { what: 'Coldest inner surface', at: at.minInnerSurface },
  ];
  const seen = new Set<string>();
  const profiles = wanted
    .map((w) => ({ what: w.what, k: w.at.instant, seg: w.at.segment, sector: w.at.sector }))
    .filter((p) => {
      const key = `${p.k}/${p.seg}/${p.sector}`;
      if (seen.has(key)) return false;
      seen.add(key);
      return true;
    });
  const datasets = profiles.map((p, j) => {
    const data = Array.from({ length: N }, (_, i) => ({ x: round(series.nodeRadius[i]!, 5), y: round(celsius(nodeTemperatureK(series, p.k, p.seg, i, p.sector))) }));
    const facing = p.sector === undefined ? '' : `, facing ${fixed((360 * p.sector) / series.sectors, 0)}°`;
    const ds = lineDataset(`${p.what}: ${isoClock(series.isoLocal[p.k]!)} at ${fixed(series.heightM[p.seg]!)} m${facing}`, data, PROFILE_LOOKS[j % PROFILE_LOOKS.length]!, f, j);
    return { ...ds, pointRadius: f.pointRadius };
  });
  const r0 = series.nodeRadius[0]!;
  const r1 = series.nodeRadius[N - 1]!;
  const bands: BandSpec[] = series.layers.map((l, j) => ({
    from: series.nodeRadius[Math.max(0, Math.min(N - 1, l.firstNode))]!,
    to: series.nodeRadius[Math.max(0, Math.min(N - 1, l.lastNode))]!,
    label: `${l.label} (${fixed(l.thickness * 1000, 0)} mm)`,
    fill: l.kind === 'gap' ? GAP_BAND_FILL : LAYER_BAND_FILLS[j % LAYER_BAND_FILLS.length]!,
    hatch: l.kind === 'gap',
  }));
  const data = minMax(datasets.flatMap((d) => d.data.map((p) => p.y)));
  const y = niceBounds(data.lo - 0.05 * (data.hi - data.lo), data.hi + 0.15 * (data.hi - data.lo));
  const xb = { min: r0 - 0.01 * (r1 - r0), max: r1 + 0.01 * (r1 - r0) };
  const base = baseOptions('Temperature through the wall', `Flue side on the left, outside on the right; ${summary.run.evaluated_over}`, f, 'bottom');
  return {
    type: 'line',
    data: { datasets },
    options: {
      ...base,
      scales: {
        x: axis('Radius from the stack axis (m)', f, { min: xb.min, max: xb.max, ticks: { maxTicksLimit: 10 } }),
        y: axis('Temperature (°C)', f, { min: y.min, max: y.max, ticks: { stepSize: y.step } }),
      },
      plugins: { ...base.plugins, stackdayBands: { bands, labelColor: INK, fontSize: f.tick, fontFamily: FONT_FAMILY } },
    },
  } as ChartConfiguration;
}
