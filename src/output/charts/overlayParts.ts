/**
 * Parts of the overlay charts, which draw several runs (variants, build-ups, sweep points) in one
 * chart: the cases and their looks, the choice of at most eight lines, and a chart of one trace
 * channel through the day per case with horizontal reference lines.
 */
import type { ChartConfiguration, ChartDataset } from 'chart.js';
import type { Summary } from '../../analysis/summary.ts';
import type { RunTrace } from '../trace.ts';
import { chartTypography, caseLooks, sequenceRamp, type LineLook } from './look.ts';
import { hourStep, minMax } from './scales.ts';
import { axis, baseOptions, boundsWithLimits, limitDatasets, lineDataset, timeAxisTitle, type ChartBuildOptions, type Limit, type Point } from './parts.ts';

/** One run in an overlay chart. */
export interface OverlayCase {
  /** Legend label, e.g. the variant's name or the swept value. */
  readonly label: string;
  readonly summary: Summary;
  readonly trace: RunTrace;
}

export interface OverlayOptions extends ChartBuildOptions {
  /** The cases are points of a sweep, in order (ordered looks); otherwise separate designs (qualitative looks). */
  readonly ordered?: boolean;
}

/** Most lines an overlay draws; beyond this, evenly spaced cases are drawn (the first and the last among them). */
export const OVERLAY_MAX_LINES = 8;

/** The cases drawn: all, or OVERLAY_MAX_LINES evenly spaced ones; with a note saying which when not all. */
export function overlayPick<T>(cases: readonly T[]): { picked: T[]; note: string | null } {
  if (cases.length <= OVERLAY_MAX_LINES) return { picked: [...cases], note: null };
  const idx = [...new Set(Array.from({ length: OVERLAY_MAX_LINES }, (_, j) => Math.round((j * (cases.length - 1)) / (OVERLAY_MAX_LINES - 1))))];
  return { picked: idx.map((i) => cases[i]!), note: `${idx.length} of ${cases.length} runs drawn, evenly spaced` };
}

/** Looks for `n` cases: ordered along a ramp for sweep points, qualitative for separate designs. */
export function overlayLooks(n: number, ordered: boolean): LineLook[] {
  return ordered ? sequenceRamp(n) : caseLooks(n);
}

/** Reference lines with distinct values only (the same limit set in every case is drawn once). */
export function distinctLimits(limits: readonly Limit[]): Limit[] {
  const seen = new Set<string>();
  return limits.filter((l) => {
    const key = `${l.label}|${l.valueC}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

/** What one overlay chart of a trace channel shows. */
export interface TraceOverlaySpec {
  readonly title: string;
  readonly yTitle: string;
  /** Unit of the values and reference lines, for the legend. */
  readonly unit: string;
  /** The channel's values of a case (null where missing). */
  readonly values: (c: OverlayCase) => readonly (number | null)[];
  /** Reference lines of a case (limits, dew points); equal ones across cases are drawn once. */
  readonly limits: (c: OverlayCase) => Limit[];
  readonly subtitle: string;
}

/** One line per case of a trace channel through the evaluated day, with the reference lines. */
export function traceOverlay(cases: readonly OverlayCase[], spec: TraceOverlaySpec, options: OverlayOptions = {}): ChartConfiguration {
  const f = chartTypography(options.width, options.height);
  const { picked, note } = overlayPick(cases);
  const looks = overlayLooks(picked.length, options.ordered === true);
  const datasets: ChartDataset<'line', Point[]>[] = picked.map((c, j) => {
    const ys = spec.values(c);
    const data = c.trace.hours.flatMap((x, q) => (ys[q] === null || ys[q] === undefined ? [] : [{ x, y: ys[q]! }]));
    return lineDataset(c.label, data, looks[j]!, f, j);
  });
  const limits = distinctLimits(picked.flatMap(spec.limits));
  const data = minMax(datasets.flatMap((d) => d.data.map((p) => p.y)));
  const y = boundsWithLimits(Number.isFinite(data.lo) ? data.lo : 0, Number.isFinite(data.hi) ? data.hi : 1, limits);
  const xs = minMax(picked.flatMap((c) => c.trace.hours));
  const x0 = Number.isFinite(xs.lo) ? xs.lo : 0;
  const x1 = Number.isFinite(xs.hi) ? xs.hi : 24;
  datasets.push(...limitDatasets(limits, x0, x1, y, f, spec.unit));
  const subtitle = note ? `${spec.subtitle}; ${note}` : spec.subtitle;
  return {
    type: 'line',
    data: { datasets },
    options: {
      ...baseOptions(spec.title, subtitle, f, 'bottom'),
      scales: {
        x: axis(picked[0] ? timeAxisTitle(picked[0].summary) : 'Local time of day (h)', f, { min: x0, max: x1, ticks: { stepSize: hourStep(x1 - x0) } }),
        y: axis(spec.yTitle, f, { min: y.min, max: y.max, ticks: { stepSize: y.step } }),
      },
    },
  } as ChartConfiguration;
}
