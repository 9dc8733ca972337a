/**
 * Every chart of a run, configured and rendered: what the output writer saves as PNG files and
 * embeds in report.html.
 */
import type { ChartConfiguration } from 'chart.js';
import type { ModelInputs } from '../../model/inputs.ts';
import type { TimeSeries } from '../../model/timeseries.ts';
import type { Summary } from '../../analysis/summary.ts';
import type { SummaryLocations } from '../../analysis/metrics/index.ts';
import { DEFAULT_CHART_HEIGHT, DEFAULT_CHART_WIDTH } from './look.ts';
import { segmentNearest } from './parts.ts';
import { temperaturesThroughDay } from './temperaturesThroughDay.ts';
import { wallProfile } from './wallProfile.ts';
import { acidMarginMap } from './acidMarginMap.ts';
import { gasAlongHeight } from './gasAlongHeight.ts';
import { outsideHeatFlows } from './outsideHeatFlows.ts';
import { warmupInnerSurface } from './warmupInnerSurface.ts';
import { renderChartPng } from './render.ts';
import { shellRoundTheCircumference } from './shellRound.ts';
import { shellSunnyAndShadySides } from './sectorsThroughDay.ts';
import { annualMarginMap } from './annualMarginMap.ts';
import { monthlyDewHours } from './monthlyDewHours.ts';
import { monthlyHeatLoss } from './monthlyHeatLoss.ts';
import { cycleHistogram } from './cycleHistogram.ts';
import type { AnnualParts } from '../../analysis/annual/index.ts';
import { decimals } from '../format.ts';

export { renderChartPng } from './render.ts';
export { DEFAULT_CHART_HEIGHT, DEFAULT_CHART_WIDTH, INK, FONT_FAMILY, MARGIN_CLASS_COLORS, chartTypography } from './look.ts';
export { localHours, niceBounds, niceStep } from './scales.ts';
export { positionName, segmentNearest, type ChartBuildOptions, type SegmentChartOptions } from './parts.ts';
export { clockHours } from '../format.ts';
export { temperaturesThroughDay } from './temperaturesThroughDay.ts';
export { wallProfile } from './wallProfile.ts';
export { acidMarginMap, marginClasses, marginClassOf, type MarginClass } from './acidMarginMap.ts';
export { gasAlongHeight, type GasAlongHeightOptions } from './gasAlongHeight.ts';
export { outsideHeatFlows } from './outsideHeatFlows.ts';
export { warmupInnerSurface } from './warmupInnerSurface.ts';
export { annualMarginMap } from './annualMarginMap.ts';
export { monthlyDewHours } from './monthlyDewHours.ts';
export { monthlyHeatLoss } from './monthlyHeatLoss.ts';
export { cycleHistogram } from './cycleHistogram.ts';
export { monthLabel } from './bars.ts';
export { overlayShell } from './overlayShell.ts';
export { overlayInnerSurfaceTop } from './overlayInnerSurfaceTop.ts';
export { overlayAcidMarginTop } from './overlayAcidMarginTop.ts';
export { overlayHeatLoss } from './overlayHeatLoss.ts';
export { OVERLAY_MAX_LINES, type OverlayCase, type OverlayOptions } from './overlayParts.ts';
export { sweepFigure, SWEEP_FIGURES, type SweepFigure } from './sweepFigure.ts';
export { sweepPassMap } from './sweepPassMap.ts';

export interface RenderAllChartsOptions {
  /** Chart width, px (default 1000). */
  readonly width?: number;
  /** Chart height, px (default 600). */
  readonly height?: number;
  /** Heights (m) at which temperatures are charted, each to the nearest segment; default the top and the bottom segment. */
  readonly heightsToPlot?: readonly number[];
  /** Where the summary's figures occur (from summariseRun); found again from the series when absent. */
  readonly locations?: SummaryLocations;
  /** An annual run's statistics (the margin grid and cycle counts): with them and summary.annual, the annual charts are drawn too. */
  readonly annual?: AnnualParts | null;
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
  return `at-${decimals(series.heightM[seg]!, 1).replace('.', '_')}m`;
}

/** Configure and render every chart that applies to the run (the warm-up chart only for warm-up studies). */
export function renderAllCharts(series: TimeSeries, summary: Summary, inputs: ModelInputs, options: RenderAllChartsOptions = {}): RenderedChart[] {
  const width = options.width ?? DEFAULT_CHART_WIDTH;
  const height = options.height ?? DEFAULT_CHART_HEIGHT;
  const size = { width, height };
  const common = { ...size, locations: options.locations };
  const segments = options.heightsToPlot && options.heightsToPlot.length > 0 ? [...new Set(options.heightsToPlot.map((h) => segmentNearest(series, h)))].sort((a, b) => b - a) : [...new Set([series.segments - 1, 0])];
  const configs: { name: string; config: ChartConfiguration }[] = [];
  for (const seg of segments) configs.push({ name: `temperatures-${segmentName(series, seg)}`, config: temperaturesThroughDay(series, summary, inputs, { ...common, segment: seg }) });
  configs.push({ name: 'wall-profile', config: wallProfile(series, summary, inputs, common) });
  configs.push({ name: 'acid-margin-map', config: acidMarginMap(series, summary, inputs, common) });
  configs.push({ name: 'gas-along-height', config: gasAlongHeight(series, summary, inputs, common) });
  configs.push({ name: 'outside-heat-flows', config: outsideHeatFlows(series, summary, inputs, { ...common, segment: series.segments - 1 }) });
  const warm = warmupInnerSurface(series, summary, inputs, common);
  if (warm !== null) configs.push({ name: 'warmup-inner-surface', config: warm });
  const sides = options.locations?.sectors;
  if (series.sectors > 1 && options.locations && sides) {
    configs.push({ name: 'shell-round-the-circumference', config: shellRoundTheCircumference(series, summary, inputs, options.locations.peakShell, common) });
    configs.push({ name: 'shell-sunny-and-shady-sides', config: shellSunnyAndShadySides(series, summary, inputs, sides, common) });
  }
  if (summary.annual && options.annual) {
    configs.push({ name: 'year-margin-map', config: annualMarginMap(summary, options.annual, inputs, size) });
    configs.push({ name: 'monthly-dew-hours', config: monthlyDewHours(summary.annual, size) });
    configs.push({ name: 'monthly-heat-loss', config: monthlyHeatLoss(summary.annual, size) });
    configs.push({ name: 'cycle-histogram', config: cycleHistogram(summary.annual, options.annual, size) });
  }
  return configs.map(({ name, config }) => ({ name, fileName: `${name}.png`, title: chartTitle(config), config, png: renderChartPng(config, size) }));
}
