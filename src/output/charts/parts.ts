/**
 * Parts every chart is built from: build options, axes, the base options (title, subtitle,
 * legend), line datasets with their markers, horizontal and vertical reference lines, the limit
 * and dew-point lines with the y bounds that make room for them, and lookups in the series
 * (segments, named wall positions, where the summary's figures occur).
 */
import type { ChartDataset } from 'chart.js';
import type { ModelInputs } from '../../model/inputs.ts';
import type { TimeSeries } from '../../model/timeseries.ts';
import type { Summary } from '../../analysis/summary.ts';
import { locateFigures, type SummaryLocations } from '../../analysis/metrics/index.ts';
import { celsius, fixed, isoMinute } from '../format.ts';
import { FONT_FAMILY, GRID, INK, LOOK, type LineLook, type Typography } from './look.ts';
import { niceBounds } from './scales.ts';

export interface ChartBuildOptions {
  /** Chart width, px (default 1000). */
  readonly width?: number;
  /** Chart height, px (default 600). */
  readonly height?: number;
  /** Where the summary's figures occur (from summariseRun); found again from the series when absent. */
  readonly locations?: SummaryLocations;
}

export interface SegmentChartOptions extends ChartBuildOptions {
  /** Axial segment (0 = bottom); default the top segment. */
  readonly segment?: number;
}

export type Point = { x: number; y: number };

/** Where the summary's figures occur: as given, or found from the series by the same search the summary made. */
export function figureLocations(series: TimeSeries, inputs: ModelInputs, options: ChartBuildOptions): SummaryLocations {
  return options.locations ?? locateFigures(series, inputs.run.mode);
}

/** Points at which markers are drawn: about eight per line, offset per line so markers do not pile up. */
function markerRadii(n: number, radius: number, lineIndex: number): number[] {
  const every = Math.max(1, Math.ceil(n / 8));
  const offset = Math.floor(((lineIndex * 0.37) % 1) * every);
  return Array.from({ length: n }, (_, i) => ((i + offset) % every === 0 ? radius : 0));
}

/** The segment a chart is drawn at: the one asked for (checked), or the top segment. */
export function clampSegment(series: TimeSeries, segment: number | undefined): number {
  const top = series.segments - 1;
  if (segment === undefined) return top;
  if (!Number.isInteger(segment) || segment < 0 || segment > top) throw new RangeError(`segment must be a whole number 0–${top}, got ${segment}`);
  return segment;
}

/** Segment whose mid-height is nearest `heightM`. */
export function segmentNearest(series: TimeSeries, heightM: number): number {
  let best = 0;
  for (let s = 1; s < series.segments; s++) if (Math.abs(series.heightM[s]! - heightM) < Math.abs(series.heightM[best]! - heightM)) best = s;
  return best;
}

/** Plain words for a wall position: "inner surface", "lining | insulation interface", "outer surface". */
export function positionName(series: TimeSeries, node: number): string {
  if (node === 0) return `Inner surface (${series.layers[0]?.label ?? 'wall'})`;
  if (node === series.nodes - 1) return `Outer surface (${series.layers[series.layers.length - 1]?.label ?? 'wall'})`;
  const next = series.layers.findIndex((l, j) => j > 0 && l.firstNode === node);
  if (next > 0) return `Interface ${series.layers[next - 1]!.label} | ${series.layers[next]!.label}`;
  const prev = series.layers.findIndex((l) => l.lastNode === node);
  if (prev >= 0 && prev + 1 < series.layers.length) return `Interface ${series.layers[prev]!.label} | ${series.layers[prev + 1]!.label}`;
  return (series.nodeLabel[node] ?? `node ${node}`).replace(/_/g, ' ');
}

/** Nodes reported as surfaces and interfaces (the named positions), inside → outside. */
export function namedNodes(series: TimeSeries): number[] {
  const out: number[] = [];
  series.nodeLabel.forEach((label, i) => {
    if (!label.startsWith('node_')) out.push(i);
  });
  if (!out.includes(0)) out.unshift(0);
  if (!out.includes(series.nodes - 1)) out.push(series.nodes - 1);
  return out;
}

// ---------------------------------------------------------------- axes, options, datasets

/** A linear axis titled with its quantity and unit; `extra` adds to or overrides its settings (ticks are merged). */
export function axis(title: string, f: Typography, extra: Record<string, unknown> = {}) {
  const { ticks, ...rest } = extra as { ticks?: Record<string, unknown> };
  return {
    type: 'linear' as const,
    title: { display: true, text: title, color: INK, font: { size: f.axisTitle, weight: 'bold' as const, family: FONT_FAMILY } },
    ticks: { color: INK, font: { size: f.tick, family: FONT_FAMILY }, ...(ticks ?? {}) },
    grid: { color: GRID },
    border: { color: INK },
    ...rest,
  };
}

/** Options every chart shares: fixed size, no animation, title, subtitle and legend in the chart's typography. */
export function baseOptions(title: string, subtitle: string | null, f: Typography, legendPosition: 'top' | 'right' | 'bottom' = 'bottom') {
  return {
    responsive: false,
    animation: false as const,
    // tick labels are formatted by Intl in this locale, never the machine's (a German machine would write decimal commas)
    locale: 'en-US',
    devicePixelRatio: 1,
    parsing: false as const,
    layout: { padding: { top: 4, right: Math.round(16 * f.scale), bottom: 4, left: 4 } },
    plugins: {
      title: { display: true, text: title, color: INK, font: { size: f.title, weight: 'bold' as const, family: FONT_FAMILY }, padding: { top: 6, bottom: subtitle ? 2 : 10 } },
      subtitle: { display: subtitle !== null, text: subtitle ?? '', color: INK, font: { size: f.tick, family: FONT_FAMILY }, padding: { bottom: 8 } },
      legend: {
        display: true,
        position: legendPosition,
        labels: { color: INK, font: { size: f.legend, family: FONT_FAMILY }, usePointStyle: true, boxWidth: Math.round(40 * f.scale), boxHeight: Math.round(12 * f.scale), padding: Math.round(12 * f.scale) },
      },
      tooltip: { enabled: false },
    },
  };
}

/** A data line in its look; markers on about eight of its points (none when the look has no marker). */
export function lineDataset(label: string, data: Point[], look: LineLook, f: Typography, index: number, width = f.lineWidth): ChartDataset<'line', Point[]> {
  const markers = look.point !== false;
  return {
    label,
    data,
    borderColor: look.color,
    backgroundColor: look.color,
    borderWidth: width,
    borderDash: [...look.dash].map((d) => d * Math.max(1, f.scale)),
    // marker-less lines show in the legend as a short line in their own dash pattern
    pointStyle: markers ? look.point : 'line',
    pointRadius: markers ? markerRadii(data.length, f.pointRadius, index) : 0,
    pointBorderWidth: 1.5,
    pointBackgroundColor: '#ffffff',
    pointBorderColor: look.color,
    fill: false,
    tension: 0,
    spanGaps: false,
  };
}

type ReferenceLook = { readonly color: string; readonly dash: readonly number[] };

export { nodeTemperatureK } from '../../model/timeseries.ts';

/** A straight reference line between two points, without markers. */
function referenceLine(label: string, from: Point, to: Point, look: ReferenceLook, f: Typography): ChartDataset<'line', Point[]> {
  return { ...lineDataset(label, [from, to], { ...look, point: false }, f, 0, Math.max(1.5, 2 * f.scale)), pointRadius: 0 };
}

/** A horizontal reference line across [x0, x1]. */
export function levelDataset(label: string, x0: number, x1: number, y: number, look: ReferenceLook, f: Typography): ChartDataset<'line', Point[]> {
  return referenceLine(label, { x: x0, y }, { x: x1, y }, look, f);
}

/** A vertical reference line at x across [y0, y1]. */
export function verticalDataset(label: string, x: number, y0: number, y1: number, look: ReferenceLook, f: Typography): ChartDataset<'line', Point[]> {
  return referenceLine(label, { x, y: y0 }, { x, y: y1 }, look, f);
}

/** A limit or dew point drawn as a horizontal line, °C. */
export interface Limit {
  readonly label: string;
  readonly valueC: number;
  readonly look: ReferenceLook;
}

/**
 * Y bounds for temperature data with reference lines: a line far outside the data (more than 60 %
 * of the data's span beyond it) would squash the curves, so it is left off the scale and its
 * legend entry says so.
 */
export function boundsWithLimits(dataLo: number, dataHi: number, limits: readonly Limit[]): { min: number; max: number; step: number; onScale: (l: Limit) => boolean } {
  const span = Math.max(dataHi - dataLo, 10);
  const onScale = (l: Limit) => l.valueC >= dataLo - 0.6 * span && l.valueC <= dataHi + 0.6 * span;
  let lo = dataLo;
  let hi = dataHi;
  for (const l of limits)
    if (onScale(l)) {
      lo = Math.min(lo, l.valueC);
      hi = Math.max(hi, l.valueC);
    }
  const pad = 0.04 * (hi - lo);
  return { ...niceBounds(lo - pad, hi + pad), onScale };
}

/** The limit lines across [x0, x1], each labelled with its value (in `unit`, °C unless given) and whether it is off the scale. */
export function limitDatasets(limits: readonly Limit[], x0: number, x1: number, bounds: { onScale: (l: Limit) => boolean }, f: Typography, unit = '°C'): ChartDataset<'line', Point[]>[] {
  return limits.map((l) => {
    const on = bounds.onScale(l);
    return levelDataset(`${l.label} ${fixed(l.valueC)} ${unit}${on ? '' : ' (off scale)'}`, x0, x1, l.valueC, l.look, f);
  });
}

/** The limits and dew points a temperature chart shows, °C: shell touch and lining service (as asked), each dew point (unless `dews` is false), and each dew point plus its margin (as asked). */
export function temperatureLimits(series: TimeSeries, inputs: ModelInputs, which: { shell: boolean; lining: boolean; margins: boolean; dews?: boolean }): Limit[] {
  const out: Limit[] = [];
  const lim = inputs.limits;
  if (which.shell && lim.shellTouchK !== undefined) out.push({ label: 'Shell touch limit', valueC: celsius(lim.shellTouchK), look: LOOK.shellTouch });
  if (which.lining && lim.liningServiceK !== undefined) out.push({ label: `${series.layers[0]?.label ?? 'Lining'} service limit`.replace(/^./, (c) => c.toUpperCase()), valueC: celsius(lim.liningServiceK), look: LOOK.liningService });
  if (which.dews === false) return out;
  if (series.acidDewPointK !== null) {
    out.push({ label: 'Acid dew point', valueC: celsius(series.acidDewPointK), look: LOOK.acidDew });
    if (which.margins && lim.acidDewMarginK) out.push({ label: `Acid dew point + ${fixed(lim.acidDewMarginK, 0)} K margin`, valueC: celsius(series.acidDewPointK + lim.acidDewMarginK), look: LOOK.acidDewMargin });
  }
  out.push({ label: 'Water dew point', valueC: celsius(series.waterDewPointK), look: LOOK.waterDew });
  if (which.margins && lim.waterDewMarginK) out.push({ label: `Water dew point + ${fixed(lim.waterDewMarginK, 0)} K margin`, valueC: celsius(series.waterDewPointK + lim.waterDewMarginK), look: LOOK.waterDewMargin });
  return out;
}

/** Title of the time axis in hours. */
export function timeAxisTitle(summary: Summary): string {
  return summary.run.mode === 'warmup' ? 'Local time from midnight of the first day (h)' : 'Local time of day (h)';
}

/** The evaluated period in words, with its first and last instant and the time zone. */
export function periodWords(summary: Summary, series: TimeSeries, ks: readonly number[]): string {
  const first = series.isoLocal[ks[0] ?? 0] ?? '';
  const last = series.isoLocal[ks[ks.length - 1] ?? 0] ?? '';
  return `${summary.run.evaluated_over}, ${isoMinute(first)} – ${isoMinute(last)} (${summary.scenario.time_zone})`;
}
