/**
 * A key figure of a sweep (a peak, a lowest margin, the stress indicator, the heat loss) against
 * the first swept value, with its limit drawn; for a sweep of two values, one line per value of
 * the second. Points that did not run leave a gap.
 */
import type { ChartConfiguration, ChartDataset } from 'chart.js';
import type { SweepTable, SweepRow, LimitValues } from '../../analysis/sweep.ts';
import { axisHeading } from '../../analysis/sweep.ts';
import type { ComparisonRow } from '../../analysis/compare.ts';
import { fixed } from '../format.ts';
import { chartTypography, FONT_FAMILY, INK, LOOK, sequenceRamp, type LineLook } from './look.ts';
import { minMax, niceBounds } from './scales.ts';
import { axis, baseOptions, boundsWithLimits, lineDataset, type ChartBuildOptions, type Limit, type Point } from './parts.ts';
import { overlayPick } from './overlayParts.ts';

/** A figure a sweep charts: which column, in words, its unit, and the limit drawn with it. */
export interface SweepFigure {
  /** Chart name, e.g. `sweep-peak-shell`. */
  readonly name: string;
  readonly column: 'peak_shell_c' | 'peak_lining_c' | 'lowest_acid_dew_margin_k' | 'lowest_water_dew_margin_k' | 'max_stress_indicator_mpa' | 'heat_loss_kwh_per_day';
  readonly title: string;
  readonly yTitle: string;
  readonly unit: string;
  /** The limit line: which limit, in words, and its look (none for the heat loss). */
  readonly limit: { readonly key: keyof LimitValues; readonly label: string; readonly look: { readonly color: string; readonly dash: readonly number[] } } | null;
  /** Whether 0 is drawn as a reference (the dew point itself for a margin). */
  readonly zeroLabel?: string;
}

/** The figures every sweep charts, one chart each. */
export const SWEEP_FIGURES: readonly SweepFigure[] = [
  { name: 'sweep-peak-shell', column: 'peak_shell_c', title: 'Hottest shell', yTitle: 'Peak outer-surface temperature (°C)', unit: '°C', limit: { key: 'shell_touch_c', label: 'Shell touch limit', look: LOOK.shellTouch } },
  { name: 'sweep-peak-lining', column: 'peak_lining_c', title: 'Hottest lining', yTitle: 'Peak lining temperature (°C)', unit: '°C', limit: { key: 'lining_service_c', label: 'Lining service limit', look: LOOK.liningService } },
  {
    name: 'sweep-acid-margin',
    column: 'lowest_acid_dew_margin_k',
    title: 'Lowest margin above the acid dew point',
    yTitle: 'Lowest acid dew-point margin (K)',
    unit: 'K',
    limit: { key: 'acid_dew_margin_k', label: 'Required margin', look: LOOK.acidDewMargin },
    zeroLabel: 'Acid dew point (margin 0)',
  },
  {
    name: 'sweep-water-margin',
    column: 'lowest_water_dew_margin_k',
    title: 'Lowest margin above the water dew point',
    yTitle: 'Lowest water dew-point margin (K)',
    unit: 'K',
    limit: { key: 'water_dew_margin_k', label: 'Required margin', look: LOOK.waterDewMargin },
    zeroLabel: 'Water dew point (margin 0)',
  },
  { name: 'sweep-stress', column: 'max_stress_indicator_mpa', title: 'Thermal-stress indicator', yTitle: 'Largest stress indicator (MPa)', unit: 'MPa', limit: { key: 'allowable_stress_mpa', label: 'Allowable stress', look: LOOK.liningService } },
  { name: 'sweep-heat-loss', column: 'heat_loss_kwh_per_day', title: 'Heat lost to the outside', yTitle: 'Heat loss (kWh per day)', unit: 'kWh/day', limit: null },
];

/** Rows grouped into lines: one line for a sweep of one value; one per value of the second for two. */
function linesOf(t: SweepTable): { label: string | null; rows: SweepRow[] }[] {
  if (t.axes.length < 2) return [{ label: null, rows: [...t.rows] }];
  const second = t.axes[1]!;
  return second.values.map((v, j) => ({ label: `${second.key} = ${v}`, rows: t.rows.filter((r) => r.values[1] === second.values[j]) }));
}

/** The x of a row on the first axis: its number, or its position among the first axis's values. */
function xOf(t: SweepTable, r: SweepRow): number {
  const a = t.axes[0]!;
  return a.numeric ? r.x[0]! : a.values.indexOf(r.values[0]!);
}

/** A line through the points of a figure (gaps where a point did not run or has no figure). */
function figurePoints(t: SweepTable, rows: readonly SweepRow[], column: SweepFigure['column']): (Point | { x: number; y: null })[] {
  return rows.map((r) => {
    const v = r.figures ? (r.figures[column as keyof ComparisonRow] as number | null) : null;
    return { x: xOf(t, r), y: v };
  });
}

/** The figure's limit along the first axis (horizontal when the limit is the same at every point). */
function limitPoints(t: SweepTable, figure: SweepFigure): { values: number[]; points: Point[] } {
  if (!figure.limit) return { values: [], points: [] };
  const key = figure.limit.key;
  const points = t.rows.flatMap((r) => (r.limits && r.limits[key] !== null && (t.axes.length < 2 || r.values[1] === t.axes[1]!.values[0]) ? [{ x: xOf(t, r), y: r.limits[key]! }] : []));
  return { values: points.map((p) => p.y), points };
}

/** The chart of one figure of a sweep against the first swept value. */
export function sweepFigure(t: SweepTable, figure: SweepFigure, options: ChartBuildOptions = {}): ChartConfiguration {
  const f = chartTypography(options.width, options.height);
  const { picked: lines, note } = overlayPick(linesOf(t));
  const looks: LineLook[] = lines.length === 1 ? [{ color: '#1d4e7a', dash: [], point: 'circle' }] : sequenceRamp(lines.length);
  const datasets: ChartDataset<'line', (Point | { x: number; y: null })[]>[] = lines.map((line, j) => {
    const d = lineDataset(line.label ?? figure.title, figurePoints(t, line.rows, figure.column) as Point[], looks[j]!, f, j);
    // every swept point carries a marker: the points are the data, the lines only join them
    return { ...d, pointRadius: f.pointRadius, spanGaps: false };
  });
  const limit = limitPoints(t, figure);
  const refs: Limit[] = [];
  if (figure.zeroLabel) refs.push({ label: figure.zeroLabel, valueC: 0, look: figure.limit?.key === 'water_dew_margin_k' ? LOOK.waterDew : LOOK.acidDew });
  const ys = minMax(datasets.flatMap((d) => d.data.map((p) => p.y ?? Number.NaN)));
  const lo = Number.isFinite(ys.lo) ? ys.lo : 0;
  const hi = Number.isFinite(ys.hi) ? ys.hi : 1;
  const limitLevels: Limit[] = figure.limit ? [...new Set(limit.values)].map((v) => ({ label: figure.limit!.label, valueC: v, look: figure.limit!.look })) : [];
  const y = boundsWithLimits(lo, hi, [...refs, ...limitLevels]);
  const xr = minMax(t.rows.map((r) => xOf(t, r)));
  const a = t.axes[0]!;
  // a numeric axis on whole ticks with room beyond the first and the last point; a category axis ± ½ around its positions
  const pad = a.numeric ? 0.04 * (xr.hi - xr.lo || 1) : 0.5;
  const xb = a.numeric ? niceBounds(xr.lo - pad, xr.hi + pad) : { min: -0.5, max: xr.hi + 0.5, step: 1 };
  const [x0, x1] = [xb.min, xb.max];
  const within = (v: number) => v >= y.min && v <= y.max;
  for (const r of refs) if (within(r.valueC)) datasets.push({ ...lineDataset(r.label, [{ x: x0, y: r.valueC }, { x: x1, y: r.valueC }], { ...r.look, point: false }, f, 0, Math.max(1.5, 2 * f.scale)), pointRadius: 0 });
  if (figure.limit && limit.points.length > 0) {
    const constant = limitLevels.length === 1;
    const shown = constant ? [{ x: x0, y: limit.values[0]! }, { x: x1, y: limit.values[0]! }] : limit.points;
    const on = limitLevels.every((l) => within(l.valueC));
    const label = `${figure.limit.label}${constant ? ` ${fixed(limit.values[0]!)} ${figure.unit}` : ' (as set at each point)'}${on ? '' : ' (off scale)'}`;
    datasets.push({ ...lineDataset(label, shown, { ...figure.limit.look, point: false }, f, 0, Math.max(1.5, 2 * f.scale)), pointRadius: 0 });
  }
  const base = baseOptions(`${figure.title} against ${a.key}`, note, f, 'bottom');
  return {
    type: 'line',
    data: { datasets },
    options: {
      ...base,
      scales: {
        x: a.numeric
          ? axis(axisHeading(a), f, { min: x0, max: x1, ticks: { stepSize: xb.step } })
          : { type: 'category', labels: [...a.values], offset: true, title: { display: true, text: a.key, color: INK, font: { size: f.axisTitle, weight: 'bold', family: FONT_FAMILY } }, ticks: { color: INK, font: { size: f.tick, family: FONT_FAMILY } } },
        y: axis(figure.yTitle, f, { min: y.min, max: y.max, ticks: { stepSize: y.step } }),
      },
    },
  } as ChartConfiguration;
}
