/**
 * The margin map: the inner surface's margin above the acid dew point over height and time, in
 * classes from far below the dew point (unsafe) to well above it.
 */
import type { ChartConfiguration } from 'chart.js';
import type { ModelInputs } from '../../model/inputs.ts';
import type { TimeSeries } from '../../model/timeseries.ts';
import type { Summary } from '../../analysis/summary.ts';
import { evaluationInstants } from '../../analysis/metrics/index.ts';
import { celsius, fixed } from '../format.ts';
import { chartTypography, FONT_FAMILY, INK, MARGIN_CLASS_COLORS, MARGIN_MAP_BOUNDARY, MARGIN_MAP_HATCH, type Typography } from './look.ts';
import { hourStep, localHours, niceStep } from './scales.ts';
import { axis, baseOptions, timeAxisTitle, type ChartBuildOptions, type Point } from './parts.ts';
import type { CellHatch, CellsOptions } from './render.ts';

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
  if (m > 0) classes.push({ key: 'caution', label: `Above dew point by less than the ${fixed(m, 0)} K margin (caution, hatched)`, fromK: 0, color: MARGIN_CLASS_COLORS.caution, hatch: 1, unsafe: false });
  classes.push({ key: 'safe', label: `Margin ${fixed(m, 0)}–${fixed(m + 30, 0)} K (safe)`, fromK: m, color: MARGIN_CLASS_COLORS.safe, hatch: 0, unsafe: false });
  classes.push({ key: 'wellAbove', label: `Margin over ${fixed(m + 30, 0)} K (safe)`, fromK: m + 30, color: MARGIN_CLASS_COLORS.wellAbove, hatch: 0, unsafe: false });
  return classes;
}

/** The class a margin (K) falls in: the last class whose lower bound it reaches. */
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
  const dewC = celsius(acid ? series.acidDewPointK! : series.waterDewPointK);
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
  const datasets = marginKey(classes, f);
  const dewName = acid ? 'acid' : 'water';
  const lowest = acid ? summary.lowest_acid_dew_margin_k : summary.lowest_water_dew_margin_k;
  const subtitle = `Dew point ${fixed(dewC)} °C; required margin ${fixed(required, 0)} K; lowest margin ${fixed(lowest)} K; ${unsafeCells === 0 ? 'no cell below the dew point' : 'outlined cells are BELOW the dew point'}`;
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
      plugins: marginMapPlugins(base, f, { xEdges, yEdges, colors, hatch, flagged }),
    },
  } as ChartConfiguration;
}

/** The key of a margin map: one empty dataset per class, drawn by the legend as a filled square. */
export function marginKey(classes: readonly MarginClass[], f: Typography) {
  return classes.map((c) => ({
    type: 'scatter' as const,
    label: c.label,
    data: [] as Point[],
    pointStyle: 'rect' as const,
    pointRadius: f.pointRadius * 1.4,
    backgroundColor: c.color,
    borderColor: INK,
    borderWidth: 1,
  }));
}

/** The plugins of a margin map: the base ones, a legend of small squares, and the cells with their hatching and the outline of unsafe cells. */
export function marginMapPlugins(base: ReturnType<typeof baseOptions>, f: Typography, cells: Pick<CellsOptions, 'xEdges' | 'yEdges' | 'colors' | 'hatch' | 'flagged'>) {
  return {
    ...base.plugins,
    legend: { ...base.plugins.legend, labels: { ...base.plugins.legend.labels, boxWidth: Math.round(18 * f.scale), font: { size: Math.max(13, Math.round(13 * f.scale)), family: FONT_FAMILY } } },
    stackdayCells: { ...cells, hatchColors: MARGIN_MAP_HATCH, boundaryColor: MARGIN_MAP_BOUNDARY },
  };
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
