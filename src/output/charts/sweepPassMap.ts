/**
 * The pass/fail map of a sweep of two values: one cell per point, dark where the run meets every
 * limit, light and hatched where a limit fails (the failing region outlined), grey and
 * cross-hatched where the point did not run.
 */
import type { ChartConfiguration } from 'chart.js';
import type { SweepTable } from '../../analysis/sweep.ts';
import { axisHeading } from '../../analysis/sweep.ts';
import { chartTypography, INK, MARGIN_MAP_BOUNDARY, MARGIN_MAP_HATCH, VERDICT_COLORS } from './look.ts';
import { axis, baseOptions, type ChartBuildOptions, type Point } from './parts.ts';
import type { CellHatch } from './render.ts';

/** Cell edges around the axis's values: midpoints between neighbours, half a spacing beyond the ends; positions ± ½ on a category axis. */
function edges(axis: SweepTable['axes'][number], xs: readonly number[]): number[] {
  if (!axis.numeric || xs.length < 2) return Array.from({ length: xs.length + 1 }, (_, i) => i - 0.5);
  const out = [xs[0]! - (xs[1]! - xs[0]!) / 2];
  for (let i = 1; i < xs.length; i++) out.push((xs[i - 1]! + xs[i]!) / 2);
  out.push(xs[xs.length - 1]! + (xs[xs.length - 1]! - xs[xs.length - 2]!) / 2);
  return out;
}

/** The axis's values as numbers: their numbers in the axis unit, or their positions on a category axis. */
function positions(t: SweepTable, a: 0 | 1): number[] {
  const axis = t.axes[a]!;
  return axis.values.map((v, i) => (axis.numeric ? (t.rows.find((r) => r.values[a] === v)?.x[a] ?? i) : i));
}

/** The pass/fail map of a two-value sweep (null for a sweep of one value). */
export function sweepPassMap(t: SweepTable, options: ChartBuildOptions = {}): ChartConfiguration | null {
  if (t.axes.length !== 2) return null;
  const f = chartTypography(options.width, options.height);
  const [ax, ay] = [t.axes[0]!, t.axes[1]!];
  const xs = positions(t, 0);
  const ys = positions(t, 1);
  const xEdges = edges(ax, xs);
  const yEdges = edges(ay, ys);
  const colors: string[] = [];
  const hatch: CellHatch[] = [];
  const flagged: boolean[] = [];
  let passing = 0;
  for (const vy of ay.values)
    for (const vx of ax.values) {
      const r = t.rows.find((row) => row.values[0] === vx && row.values[1] === vy);
      const state = !r || !r.figures ? 'notRun' : r.figures.all_limits_pass ? 'pass' : 'fail';
      if (state === 'pass') passing++;
      colors.push(VERDICT_COLORS[state]);
      hatch.push(state === 'pass' ? 0 : state === 'fail' ? 1 : 2);
      flagged.push(state !== 'pass');
    }
  const key = (label: string, color: string) => ({ type: 'scatter' as const, label, data: [] as Point[], pointStyle: 'rect' as const, pointRadius: f.pointRadius * 1.4, backgroundColor: color, borderColor: INK, borderWidth: 1 });
  const datasets = [key('Meets every limit', VERDICT_COLORS.pass), key('A limit fails (hatched, outlined)', VERDICT_COLORS.fail), key('Did not run (cross-hatched)', VERDICT_COLORS.notRun)];
  const base = baseOptions('Where every limit is met', `${passing} of ${t.rows.length} points meet every limit`, f, 'bottom');
  // ticks at the cells' centres (the swept values), labelled with the values as written
  const scale = (a: SweepTable['axes'][number], e: number[], at: readonly number[]) =>
    axis(axisHeading(a), f, {
      min: e[0]!,
      max: e[e.length - 1]!,
      afterBuildTicks: (s: { ticks: { value: number }[] }) => {
        s.ticks = at.map((value) => ({ value }));
      },
      ticks: { autoSkip: true, callback: (_v: number | string, i: number) => a.values[i] ?? '' },
      grid: { display: false },
    });
  return {
    type: 'scatter',
    data: { datasets },
    options: {
      ...base,
      scales: { x: scale(ax, xEdges, xs), y: scale(ay, yEdges, ys) },
      plugins: { ...base.plugins, stackdayCells: { xEdges, yEdges, colors, hatch, flagged, hatchColors: MARGIN_MAP_HATCH, boundaryColor: MARGIN_MAP_BOUNDARY } },
    },
  } as ChartConfiguration;
}
