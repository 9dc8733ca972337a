/**
 * chart.js configurations built from a run (pure data, no drawing): what each picture shows, its
 * axes (every one titled with its quantity and unit), its colours and line styles. Drawing lives
 * in ./render.ts. Temperatures are converted from kelvin to °C for display through ../format.ts.
 *
 * Colour scheme: every series differs from its neighbours in lightness AND in dash pattern and
 * point style, so the charts still read when printed in greyscale. Fonts scale with the chart
 * size; at the default 1000 × 600 px ticks are 14 px and axis titles 16 px.
 */
import type { ChartConfiguration, ChartDataset, PointStyle } from 'chart.js';
import type { ModelInputs } from '../../model/inputs.ts';
import type { TimeSeries } from '../../model/timeseries.ts';
import type { Summary } from '../../analysis/summary.ts';
import { evaluationInstants } from '../../analysis/metrics/index.ts';
import { celsius as toC, clockHours, fixed as fmt, isoClock, isoMinute, round } from '../format.ts';
import type { BandSpec, CellHatch } from './render.ts';

export interface ChartBuildOptions {
  /** Chart width, px (default 1000). */
  readonly width?: number;
  /** Chart height, px (default 600). */
  readonly height?: number;
}

export interface SegmentChartOptions extends ChartBuildOptions {
  /** Axial segment (0 = bottom); default the top segment. */
  readonly segment?: number;
}

export interface GasAlongHeightOptions extends ChartBuildOptions {
  /** Number of instants drawn, spread evenly over the evaluated period (default 6). */
  readonly instants?: number;
}

export const DEFAULT_CHART_WIDTH = 1000;
export const DEFAULT_CHART_HEIGHT = 600;

// ---------------------------------------------------------------- look

/** Text and frame colour. */
export const INK = '#1f2328';
const GRID = '#dcdcdc';
export const FONT_FAMILY = "'DejaVu Sans', 'Liberation Sans', 'Helvetica Neue', Arial, sans-serif";

/** Font sizes for a chart of the given size: ≥ 13 px ticks and ≥ 15 px titles at 1000 × 600. */
export function chartTypography(width = DEFAULT_CHART_WIDTH, height = DEFAULT_CHART_HEIGHT) {
  const s = Math.max(0.6, Math.min(width / DEFAULT_CHART_WIDTH, height / DEFAULT_CHART_HEIGHT));
  const px = (v: number) => Math.round(v * s);
  return { scale: s, tick: px(14), axisTitle: px(16), title: px(19), legend: px(14), lineWidth: Math.max(1.5, 2.5 * s), pointRadius: Math.max(3, 5 * s) };
}
type Typography = ReturnType<typeof chartTypography>;

interface LineLook {
  readonly color: string;
  readonly dash: readonly number[];
  readonly point: PointStyle;
}

/** Wall positions from the flue side outward: dark → light, warm hues, each with its own dash and marker. */
function wallRamp(n: number): LineLook[] {
  const dashes: number[][] = [[], [12, 5], [6, 4], [14, 4, 3, 4], [3, 3], [10, 3, 2, 3, 2, 3]];
  const points: PointStyle[] = ['circle', 'triangle', 'rect', 'rectRot', 'crossRot', 'star'];
  return Array.from({ length: n }, (_, j) => {
    const f = n === 1 ? 0 : j / (n - 1);
    return { color: hsl(12 + 28 * f, 70 - 10 * f, 30 + 32 * f), dash: dashes[j % dashes.length]!, point: points[j % points.length]! };
  });
}

/** A sequence (e.g. instants through the day): dark blue → light amber, lightness rising monotonically. */
function sequenceRamp(n: number): LineLook[] {
  const dashes: number[][] = [[], [12, 5], [6, 4], [14, 4, 3, 4], [3, 3], [10, 3, 2, 3, 2, 3]];
  const points: PointStyle[] = ['circle', 'triangle', 'rect', 'rectRot', 'crossRot', 'star'];
  return Array.from({ length: n }, (_, j) => {
    const f = n === 1 ? 0 : j / (n - 1);
    return { color: hsl(225 - 190 * f, 55 + 15 * f, 22 + 40 * f), dash: dashes[j % dashes.length]!, point: points[j % points.length]! };
  });
}

const hsl = (h: number, s: number, l: number) => `hsl(${Math.round(h)}, ${Math.round(s)}%, ${Math.round(l)}%)`;

/** Fixed looks for reference lines (limits and dew points). */
const LOOK = {
  gas: { color: '#2a0f05', dash: [], point: 'rectRounded' },
  air: { color: '#3b78a8', dash: [2, 4], point: 'crossRot' },
  shellTouch: { color: '#7a2e8e', dash: [9, 4], point: false },
  liningService: { color: '#8c1b1b', dash: [7, 3, 2, 3], point: false },
  acidDew: { color: '#4b2a84', dash: [5, 3], point: false },
  acidDewMargin: { color: '#9a86c4', dash: [2, 2], point: false },
  waterDew: { color: '#1d5c8a', dash: [6, 2, 2, 2], point: false },
  waterDewMargin: { color: '#86b3d6', dash: [1, 3], point: false },
  sun: { color: '#c98a00', dash: [10, 4], point: 'star' },
  convection: { color: '#1d4e7a', dash: [], point: 'circle' },
  radiation: { color: '#8a5a9e', dash: [3, 3], point: 'triangle' },
  net: { color: '#222222', dash: [14, 4, 3, 4], point: 'rect' },
  gasToWall: { color: '#a33b1a', dash: [6, 4], point: 'rectRot' },
} as const;

/** Map-cell classes, in order of margin (the key of the acid-margin map). */
export const MARGIN_CLASS_COLORS = {
  farBelow: '#5a0a1e',
  below: '#c63a2f',
  caution: '#f3c94f',
  safe: '#b5d4e9',
  wellAbove: '#2f6d9f',
} as const;

// ---------------------------------------------------------------- small helpers

/** Hours of the local day for each evaluated instant: clock time of the first, then elapsed time (so a day runs 0 → 24). */
export function localHours(series: TimeSeries, ks: readonly number[]): number[] {
  if (ks.length === 0) return [];
  const k0 = ks[0]!;
  const h0 = clockHours(series.isoLocal[k0]!);
  return ks.map((k) => round(h0 + (series.t[k]! - series.t[k0]!) / 3600, 6));
}

/** A "nice" tick step (1, 2, 2.5, 5 × 10ⁿ) giving about `target` intervals over `span`. */
export function niceStep(span: number, target = 6): number {
  if (!(span > 0)) return 1;
  const raw = span / target;
  const p = 10 ** Math.floor(Math.log10(raw));
  const m = raw / p;
  return (m <= 1 ? 1 : m <= 2 ? 2 : m <= 2.5 ? 2.5 : m <= 5 ? 5 : 10) * p;
}

/** Axis bounds on whole steps enclosing [lo, hi] with a little room. */
export function niceBounds(lo: number, hi: number, target = 6): { min: number; max: number; step: number } {
  if (!(hi > lo)) {
    lo -= 1;
    hi += 1;
  }
  const step = niceStep(hi - lo, target);
  return { min: Math.floor(lo / step - 1e-9) * step, max: Math.ceil(hi / step + 1e-9) * step, step };
}

/** Step for a time axis in hours (1, 2, 3, 6, 12 h or whole days). */
function hourStep(spanH: number): number {
  for (const s of [1, 2, 3, 6, 12, 24, 48]) if (spanH / s <= 12) return s;
  return niceStep(spanH, 10);
}

/** Step for a time axis in minutes (10, 15, 30, 60, 120, 180, 240, 360 min …). */
function minuteStep(spanMin: number): number {
  for (const s of [5, 10, 15, 30, 60, 120, 180, 240, 360, 720]) if (spanMin / s <= 12) return s;
  return niceStep(spanMin, 10);
}

function minMax(values: Iterable<number>): { lo: number; hi: number } {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  return { lo, hi };
}

/** Points at which markers are drawn: about eight per line, offset per line so markers do not pile up. */
function markerRadii(n: number, radius: number, lineIndex: number): number[] {
  const every = Math.max(1, Math.ceil(n / 8));
  const offset = Math.floor(((lineIndex * 0.37) % 1) * every);
  return Array.from({ length: n }, (_, i) => ((i + offset) % every === 0 ? radius : 0));
}

function clampSegment(series: TimeSeries, segment: number | undefined): number {
  const top = series.segments - 1;
  if (segment === undefined) return top;
  if (!Number.isInteger(segment) || segment < 0 || segment > top) throw new RangeError(`segment must be a whole number 0–${top}, got ${segment}`);
  return segment;
}

/** Index of the output instant whose ISO local time equals `iso` (nearest in `ks` by string order otherwise). */
function instantAt(series: TimeSeries, ks: readonly number[], iso: string | null | undefined): number {
  if (iso) {
    const k = ks.find((q) => series.isoLocal[q] === iso);
    if (k !== undefined) return k;
  }
  return ks[0] ?? 0;
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
function namedNodes(series: TimeSeries): number[] {
  const out: number[] = [];
  series.nodeLabel.forEach((label, i) => {
    if (!label.startsWith('node_')) out.push(i);
  });
  if (!out.includes(0)) out.unshift(0);
  if (!out.includes(series.nodes - 1)) out.push(series.nodes - 1);
  return out;
}

// ---------------------------------------------------------------- common chart parts

function axis(title: string, f: Typography, extra: Record<string, unknown> = {}) {
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

function baseOptions(title: string, subtitle: string | null, f: Typography, legendPosition: 'top' | 'right' | 'bottom' = 'bottom') {
  return {
    responsive: false,
    animation: false as const,
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

type Point = { x: number; y: number };

function lineDataset(label: string, data: Point[], look: LineLook | { color: string; dash: readonly number[]; point: PointStyle | false }, f: Typography, index: number, width = f.lineWidth): ChartDataset<'line', Point[]> {
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

/** A horizontal reference line across [x0, x1]. */
function levelDataset(label: string, x0: number, x1: number, y: number, look: { color: string; dash: readonly number[] }, f: Typography): ChartDataset<'line', Point[]> {
  return { ...lineDataset(label, [{ x: x0, y }, { x: x1, y }], { ...look, point: false }, f, 0, Math.max(1.5, 2 * f.scale)), pointRadius: 0 };
}

/** A vertical reference line at x across [y0, y1]. */
function verticalDataset(label: string, x: number, y0: number, y1: number, look: { color: string; dash: readonly number[] }, f: Typography): ChartDataset<'line', Point[]> {
  return { ...lineDataset(label, [{ x, y: y0 }, { x, y: y1 }], { ...look, point: false }, f, 0, Math.max(1.5, 2 * f.scale)), pointRadius: 0 };
}

interface Limit {
  readonly label: string;
  readonly valueC: number;
  readonly look: { color: string; dash: readonly number[] };
}

/**
 * Y bounds for temperature data with reference lines: a line far outside the data (more than 60 %
 * of the data's span beyond it) would squash the curves, so it is left off the scale and its
 * legend entry says so.
 */
function boundsWithLimits(dataLo: number, dataHi: number, limits: readonly Limit[]): { min: number; max: number; step: number; onScale: (l: Limit) => boolean } {
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

function limitDatasets(limits: readonly Limit[], x0: number, x1: number, bounds: { onScale: (l: Limit) => boolean }, f: Typography): ChartDataset<'line', Point[]>[] {
  return limits.map((l) => {
    const on = bounds.onScale(l);
    return levelDataset(`${l.label} ${fmt(l.valueC)} °C${on ? '' : ' (off scale)'}`, x0, x1, l.valueC, l.look, f);
  });
}

function temperatureLimits(series: TimeSeries, inputs: ModelInputs, which: { shell: boolean; lining: boolean; margins: boolean }): Limit[] {
  const out: Limit[] = [];
  const lim = inputs.limits;
  if (which.shell && lim.shellTouchK !== undefined) out.push({ label: 'Shell touch limit', valueC: toC(lim.shellTouchK), look: LOOK.shellTouch });
  if (which.lining && lim.liningServiceK !== undefined) out.push({ label: `${series.layers[0]?.label ?? 'Lining'} service limit`.replace(/^./, (c) => c.toUpperCase()), valueC: toC(lim.liningServiceK), look: LOOK.liningService });
  if (series.acidDewPointK !== null) {
    out.push({ label: 'Acid dew point', valueC: toC(series.acidDewPointK), look: LOOK.acidDew });
    if (which.margins && lim.acidDewMarginK) out.push({ label: `Acid dew point + ${fmt(lim.acidDewMarginK, 0)} K margin`, valueC: toC(series.acidDewPointK + lim.acidDewMarginK), look: LOOK.acidDewMargin });
  }
  out.push({ label: 'Water dew point', valueC: toC(series.waterDewPointK), look: LOOK.waterDew });
  if (which.margins && lim.waterDewMarginK) out.push({ label: `Water dew point + ${fmt(lim.waterDewMarginK, 0)} K margin`, valueC: toC(series.waterDewPointK + lim.waterDewMarginK), look: LOOK.waterDewMargin });
  return out;
}

function timeAxisTitle(summary: Summary): string {
  return summary.run.mode === 'warmup' ? 'Local time from midnight of the first day (h)' : 'Local time of day (h)';
}

function periodWords(summary: Summary, series: TimeSeries, ks: readonly number[]): string {
  const first = series.isoLocal[ks[0] ?? 0] ?? '';
  const last = series.isoLocal[ks[ks.length - 1] ?? 0] ?? '';
  return `${summary.run.evaluated_over}, ${isoMinute(first)} – ${isoMinute(last)} (${summary.scenario.time_zone})`;
}

// ---------------------------------------------------------------- 1. temperatures through the day

/**
 * Temperatures through the evaluated period at one height: gas, inner surface, every interface,
 * outer surface and air, with the shell touch and lining service limits and both dew points as
 * horizontal lines.
 */
export function temperaturesThroughDay(series: TimeSeries, summary: Summary, inputs: ModelInputs, options: SegmentChartOptions = {}): ChartConfiguration {
  const f = chartTypography(options.width, options.height);
  const seg = clampSegment(series, options.segment);
  const S = series.segments;
  const N = series.nodes;
  const ks = evaluationInstants(series, inputs.run.mode);
  const hours = localHours(series, ks);
  const nodes = namedNodes(series);
  const looks = wallRamp(nodes.length);
  const datasets: ChartDataset<'line', Point[]>[] = [];
  const gas = ks.map((k, q) => ({ x: hours[q]!, y: round(toC((series.segment.gasInK[k * S + seg]! + series.segment.gasOutK[k * S + seg]!) / 2)) }));
  datasets.push(lineDataset('Flue gas (segment mean)', gas, LOOK.gas, f, 0, f.lineWidth * 1.3));
  nodes.forEach((i, j) => {
    const data = ks.map((k, q) => ({ x: hours[q]!, y: round(toC(series.temperatureK[(k * S + seg) * N + i]!)) }));
    datasets.push(lineDataset(positionName(series, i), data, looks[j]!, f, j + 1));
  });
  const air = ks.map((k, q) => ({ x: hours[q]!, y: round(toC(series.instant.airTemperatureK[k]!)) }));
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
      ...baseOptions(`Temperatures at ${fmt(series.heightM[seg]!)} m (${where})`, periodWords(summary, series, ks), f, 'bottom'),
      scales: {
        x: axis(timeAxisTitle(summary), f, { min: x0, max: x1, ticks: { stepSize: hourStep(x1 - x0) } }),
        y: axis('Temperature (°C)', f, { min: y.min, max: y.max, ticks: { stepSize: y.step } }),
      },
    },
  } as ChartConfiguration;
}

// ---------------------------------------------------------------- 2. wall profile

/**
 * Temperature against radius through the wall at the hottest instant (peak lining), at the peak
 * shell instant and at the coldest instant (lowest inner surface), each at the height where it
 * occurs; the layers are shaded and labelled behind the curves.
 */
export function wallProfile(series: TimeSeries, summary: Summary, inputs: ModelInputs, options: ChartBuildOptions = {}): ChartConfiguration {
  const f = chartTypography(options.width, options.height);
  const S = series.segments;
  const N = series.nodes;
  const ks = evaluationInstants(series, inputs.run.mode);
  const wanted = [
    { what: 'Hottest lining', time: summary.peak_lining_time, height: summary.peak_lining_height_m },
    { what: 'Hottest shell', time: summary.peak_shell_time, height: summary.peak_shell_height_m },
    { what: 'Coldest inner surface', time: summary.min_inner_surface_time, height: summary.min_inner_surface_height_m },
  ];
  const seen = new Set<string>();
  const profiles = wanted
    .map((w) => ({ ...w, k: instantAt(series, ks, w.time), seg: segmentNearest(series, w.height) }))
    .filter((p) => {
      const key = `${p.k}/${p.seg}`;
      if (seen.has(key)) return false;
      seen.add(key);
      return true;
    });
  const looks: LineLook[] = [
    { color: '#8c1b1b', dash: [], point: 'circle' },
    { color: '#d0792c', dash: [10, 4], point: 'triangle' },
    { color: '#2b5d8c', dash: [4, 3], point: 'rect' },
  ];
  const datasets = profiles.map((p, j) => {
    const data = Array.from({ length: N }, (_, i) => ({ x: round(series.nodeRadius[i]!, 5), y: round(toC(series.temperatureK[(p.k * S + p.seg) * N + i]!)) }));
    const ds = lineDataset(`${p.what}: ${isoClock(series.isoLocal[p.k]!)} at ${fmt(series.heightM[p.seg]!)} m`, data, looks[j % looks.length]!, f, j);
    return { ...ds, pointRadius: f.pointRadius };
  });
  const r0 = series.nodeRadius[0]!;
  const r1 = series.nodeRadius[N - 1]!;
  const bandFills = ['#f1dfcf', '#e3ecf2', '#ececec', '#efe6d6', '#dfe9e0'];
  const bands: BandSpec[] = series.layers.map((l, j) => ({
    from: series.nodeRadius[Math.max(0, Math.min(N - 1, l.firstNode))]!,
    to: series.nodeRadius[Math.max(0, Math.min(N - 1, l.lastNode))]!,
    label: `${l.label} (${fmt(l.thickness * 1000, 0)} mm)`,
    fill: l.kind === 'gap' ? '#ffffff' : bandFills[j % bandFills.length]!,
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

// ---------------------------------------------------------------- 3. acid margin map

export interface MarginClass {
  readonly key: keyof typeof MARGIN_CLASS_COLORS;
  readonly label: string;
  /** Lower bound of the class, K (−∞ for the first). */
  readonly fromK: number;
  readonly color: string;
  readonly hatch: CellHatch;
  readonly unsafe: boolean;
}

/**
 * Classes of the inner surface's margin to the dew point, K: far below (< −20 K) and below
 * (−20…0 K) are unsafe and cross-hatched; caution (0 to the required margin) is hatched with
 * single lines; safe (margin to margin + 30 K) and well above are plain.
 */
export function marginClasses(requiredMarginK: number): MarginClass[] {
  const m = Math.max(0, requiredMarginK);
  const classes: MarginClass[] = [
    { key: 'farBelow', label: 'Below dew point by more than 20 K (unsafe, cross-hatched)', fromK: -Infinity, color: MARGIN_CLASS_COLORS.farBelow, hatch: 2, unsafe: true },
    { key: 'below', label: 'Below dew point by 0–20 K (unsafe, cross-hatched)', fromK: -20, color: MARGIN_CLASS_COLORS.below, hatch: 2, unsafe: true },
  ];
  if (m > 0) classes.push({ key: 'caution', label: `Above dew point by less than the ${fmt(m, 0)} K margin (caution, hatched)`, fromK: 0, color: MARGIN_CLASS_COLORS.caution, hatch: 1, unsafe: false });
  classes.push({ key: 'safe', label: `Margin ${fmt(m, 0)}–${fmt(m + 30, 0)} K (safe)`, fromK: m, color: MARGIN_CLASS_COLORS.safe, hatch: 0, unsafe: false });
  classes.push({ key: 'wellAbove', label: `Margin over ${fmt(m + 30, 0)} K (safe)`, fromK: m + 30, color: MARGIN_CLASS_COLORS.wellAbove, hatch: 0, unsafe: false });
  return classes;
}

export function marginClassOf(marginK: number, classes: readonly MarginClass[]): MarginClass {
  let out = classes[0]!;
  for (const c of classes) if (marginK >= c.fromK) out = c;
  return out;
}

/**
 * Height × time map of the inner surface's margin above the acid dew point (the water dew point
 * when the gas carries no SO₃), in classes: unsafe cells are dark red, cross-hatched and outlined.
 */
export function acidMarginMap(series: TimeSeries, summary: Summary, inputs: ModelInputs, options: ChartBuildOptions = {}): ChartConfiguration {
  const f = chartTypography(options.width, options.height);
  const S = series.segments;
  const ks = evaluationInstants(series, inputs.run.mode);
  const hours = localHours(series, ks);
  const acid = series.acidDewPointK !== null;
  const margin = acid ? series.segment.acidDewMarginK : series.segment.waterDewMarginK;
  const dewC = toC(acid ? series.acidDewPointK! : series.waterDewPointK);
  const required = (acid ? inputs.limits.acidDewMarginK : inputs.limits.waterDewMarginK) ?? 0;
  const classes = marginClasses(required);

  const xEdges = edgesFromCentres(hours, hours[0] ?? 0, hours[hours.length - 1] ?? 24);
  const H = inputs.stack.height;
  const yEdges = edgesFromCentres(Array.from(series.heightM), 0, H);
  const nx = ks.length;
  const colors: string[] = [];
  const hatch: CellHatch[] = [];
  const flagged: boolean[] = [];
  let unsafeCells = 0;
  for (let s = 0; s < S; s++)
    for (let q = 0; q < nx; q++) {
      const c = marginClassOf(margin[ks[q]! * S + s]!, classes);
      colors.push(c.color);
      hatch.push(c.hatch);
      flagged.push(c.unsafe);
      if (c.unsafe) unsafeCells++;
    }
  const x0 = xEdges[0]!;
  const x1 = xEdges[xEdges.length - 1]!;
  // the key: one empty dataset per class, drawn by the legend as a filled square
  const datasets = classes.map((c) => ({
    type: 'scatter' as const,
    label: c.label,
    data: [] as Point[],
    pointStyle: 'rect' as const,
    pointRadius: f.pointRadius * 1.4,
    backgroundColor: c.color,
    borderColor: INK,
    borderWidth: 1,
  }));
  const dewName = acid ? 'acid' : 'water';
  const lowest = acid ? summary.lowest_acid_dew_margin_k : summary.lowest_water_dew_margin_k;
  const subtitle = `Dew point ${fmt(dewC)} °C; required margin ${fmt(required, 0)} K; lowest margin ${fmt(lowest)} K; ${unsafeCells === 0 ? 'no cell below the dew point' : 'outlined cells are BELOW the dew point'}`;
  const yb = { min: 0, max: H };
  const base = baseOptions(`Inner surface margin above the ${dewName} dew point`, subtitle, f, 'bottom');
  return {
    type: 'scatter',
    data: { datasets },
    options: {
      ...base,
      scales: {
        x: axis(timeAxisTitle(summary), f, { min: x0, max: x1, ticks: { stepSize: hourStep(x1 - x0) }, grid: { display: false } }),
        y: axis('Height above the stack base (m)', f, { min: yb.min, max: yb.max, ticks: { stepSize: niceStep(H, 8) }, grid: { display: false } }),
      },
      plugins: {
        ...base.plugins,
        legend: { ...base.plugins.legend, labels: { ...base.plugins.legend.labels, boxWidth: Math.round(18 * f.scale), font: { size: Math.max(13, Math.round(13 * f.scale)), family: FONT_FAMILY } } },
        stackdayCells: { xEdges, yEdges, colors, hatch, flagged, hatchColors: { diagonal: 'rgba(60,40,0,0.55)', cross: 'rgba(255,255,255,0.8)' }, boundaryColor: '#000000' },
      },
    },
  } as ChartConfiguration;
}

/** Cell edges around centres: midpoints between neighbours, with the given outer ends. */
function edgesFromCentres(centres: readonly number[], first: number, last: number): number[] {
  const n = centres.length;
  if (n === 0) return [first, last];
  const out = [first];
  for (let i = 1; i < n; i++) out.push((centres[i - 1]! + centres[i]!) / 2);
  out.push(last);
  return out;
}

// ---------------------------------------------------------------- 4. gas along the height

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
    const data: Point[] = [{ x: round(toC(series.segment.gasInK[k * S]!)), y: 0 }];
    for (let s = 0; s < S; s++) data.push({ x: round(toC(series.segment.gasOutK[k * S + s]!)), y: round((s + 1) * dz, 4) });
    const firing = series.instant.firing[k] ? 'firing' : 'burner off';
    return { ...lineDataset(`${isoClock(series.isoLocal[k]!)} (${firing}, ${fmt(series.instant.massFlow[k]!, 2)} kg/s)`, data, looks[j]!, f, j), pointRadius: f.pointRadius, showLine: true };
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

// ---------------------------------------------------------------- 5. outside heat flows

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
      ...baseOptions(`Heat flows per metre of height at ${fmt(series.heightM[seg]!)} m`, `Outer surface, circumferentially averaged; ${periodWords(summary, series, ks)}`, f, 'bottom'),
      scales: {
        x: axis(timeAxisTitle(summary), f, { min: x0, max: x1, ticks: { stepSize: hourStep(x1 - x0) } }),
        y: axis('Heat flow per metre of height (W/m)', f, { min: yb.min, max: yb.max, ticks: { stepSize: yb.step } }),
      },
    },
  } as ChartConfiguration;
}

// ---------------------------------------------------------------- 6. warm-up

/**
 * Warm-up studies: inner-surface temperature at the top (and, for comparison, at the bottom)
 * against minutes since firing started, with both dew points and the dew points plus their
 * required margins, and vertical lines at the times the summary reports. Null for a cycle study.
 */
export function warmupInnerSurface(series: TimeSeries, summary: Summary, inputs: ModelInputs, options: ChartBuildOptions = {}): ChartConfiguration | null {
  if (summary.warmup === null) return null;
  const f = chartTypography(options.width, options.height);
  const S = series.segments;
  const N = series.nodes;
  const ks = evaluationInstants(series, inputs.run.mode);
  const kFiring = instantAt(series, ks, summary.warmup.firing_start_local);
  const t0 = series.t[kFiring]!;
  const after = ks.filter((k) => series.t[k]! >= t0 - 1e-6);
  const minutes = after.map((k) => round((series.t[k]! - t0) / 60, 4));
  const top = S - 1;
  const inner = (seg: number) => after.map((k, q) => ({ x: minutes[q]!, y: round(toC(series.temperatureK[(k * S + seg) * N]!)) }));
  const datasets: ChartDataset<'line', Point[]>[] = [
    lineDataset(`Inner surface at the top (${fmt(series.heightM[top]!)} m)`, inner(top), { color: '#7a1f0a', dash: [], point: 'circle' }, f, 0, f.lineWidth * 1.3),
  ];
  if (S > 1) datasets.push(lineDataset(`Inner surface at the bottom (${fmt(series.heightM[0]!)} m)`, inner(0), { color: '#d98a4a', dash: [10, 4], point: 'triangle' }, f, 1));
  const limits = temperatureLimits(series, inputs, { shell: false, lining: false, margins: true });
  const data = minMax(datasets.flatMap((d) => d.data.map((p) => p.y)));
  const y = boundsWithLimits(data.lo, data.hi, limits);
  const x0 = 0;
  const x1 = minutes[minutes.length - 1] ?? 60;
  datasets.push(...limitDatasets(limits, x0, x1, y, f));
  const topTimes = summary.warmup.top;
  const marks: { label: string; minutes: number | null; look: { color: string; dash: readonly number[] } }[] = [
    { label: 'water dew point + margin', minutes: topTimes.minutes_to_water_dew, look: { color: LOOK.waterDew.color, dash: [3, 1] } },
    { label: 'acid dew point + margin', minutes: topTimes.minutes_to_acid_dew, look: { color: LOOK.acidDew.color, dash: [1, 1] } },
  ];
  for (const m of marks)
    if (m.minutes !== null && m.minutes >= x0 && m.minutes <= x1) datasets.push(verticalDataset(`Top stays above ${m.label} after ${fmt(m.minutes)} min`, m.minutes, y.min, y.max, m.look, f));
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
