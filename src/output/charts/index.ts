/**
 * Every chart of a run, configured and rendered: what the output writer saves as PNG files and
 * embeds in report.html.
 */
import type { ChartConfiguration } from 'chart.js';
import type { ModelInputs } from '../../model/inputs.ts';
import type { TimeSeries } from '../../model/timeseries.ts';
import type { Summary } from '../../analysis/summary.ts';
import { acidMarginMap, DEFAULT_CHART_HEIGHT, DEFAULT_CHART_WIDTH, gasAlongHeight, outsideHeatFlows, segmentNearest, temperaturesThroughDay, wallProfile, warmupInnerSurface } from './configs.ts';
import { renderChartPng } from './render.ts';

export { renderChartPng } from './render.ts';
export * from './configs.ts';
export { clockHours } from '../format.ts';

export interface RenderAllChartsOptions {
  /** Chart width, px (default 1000). */
  readonly width?: number;
  /** Chart height, px (default 600). */
  readonly height?: number;
  /** Heights (m) at which temperatures are charted, each to the nearest segment; default the top and the bottom segment. */
  readonly heightsToPlot?: readonly number[];
}

export interface RenderedChart {
  /** Short name, e.g. `temperatures-top`. */
  readonly name: string;
  /** `<name>.png`. */
  readonly fileName: string;
  /** The chart's title in words (for captions and alt text). */
  readonly title: string;
  readonly config: ChartConfiguration;
  readonly png: Buffer;
}

/** The chart's title text as set in its configuration. */
export function chartTitle(config: ChartConfiguration): string {
  const text = config.options?.plugins?.title?.text;
  return Array.isArray(text) ? text.join(' ') : String(text ?? '');
}

/** Name of the temperature chart at a segment: `top`, `bottom`, or `at-<height>m`. */
function segmentName(series: TimeSeries, seg: number): string {
  if (seg === series.segments - 1) return 'top';
  if (seg === 0) return 'bottom';
  return `at-${series.heightM[seg]!.toFixed(1).replace('.', '_')}m`;
}

/** Configure and render every chart that applies to the run (the warm-up chart only for warm-up studies). */
export function renderAllCharts(series: TimeSeries, summary: Summary, inputs: ModelInputs, options: RenderAllChartsOptions = {}): RenderedChart[] {
  const width = options.width ?? DEFAULT_CHART_WIDTH;
  const height = options.height ?? DEFAULT_CHART_HEIGHT;
  const size = { width, height };
  const segments = options.heightsToPlot && options.heightsToPlot.length > 0 ? [...new Set(options.heightsToPlot.map((h) => segmentNearest(series, h)))].sort((a, b) => b - a) : [...new Set([series.segments - 1, 0])];
  const configs: { name: string; config: ChartConfiguration }[] = [];
  for (const seg of segments) configs.push({ name: `temperatures-${segmentName(series, seg)}`, config: temperaturesThroughDay(series, summary, inputs, { ...size, segment: seg }) });
  configs.push({ name: 'wall-profile', config: wallProfile(series, summary, inputs, size) });
  configs.push({ name: 'acid-margin-map', config: acidMarginMap(series, summary, inputs, size) });
  configs.push({ name: 'gas-along-height', config: gasAlongHeight(series, summary, inputs, size) });
  configs.push({ name: 'outside-heat-flows', config: outsideHeatFlows(series, summary, inputs, { ...size, segment: series.segments - 1 }) });
  const warm = warmupInnerSurface(series, summary, inputs, size);
  if (warm !== null) configs.push({ name: 'warmup-inner-surface', config: warm });
  return configs.map(({ name, config }) => ({ name, fileName: `${name}.png`, title: chartTitle(config), config, png: renderChartPng(config, size) }));
}
