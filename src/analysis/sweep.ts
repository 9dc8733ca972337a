/**
 * The table of a sweep: one row per point (the swept values, then the key figures of its run, or
 * why it did not run), the limits each run was judged against, and the point that meets every
 * limit at the least heat loss. Pure: points in, table out.
 */
import type { SweepAxis, SweptValue } from '../input/scenario/sweep.ts';
import type { Summary } from './summary.ts';
import { compareBuildUps, comparisonRow, csvCell, type ComparisonRow } from './compare.ts';

/** What became of one point of the sweep. */
export interface SweepPointResult {
  readonly name: string;
  readonly values: readonly SweptValue[];
  readonly status: 'ran' | 'invalid' | 'failed';
  readonly summary?: Summary;
  readonly problems?: readonly string[];
}

/** The limits a run was judged against, in the units of the summary (null: not set). */
export interface LimitValues {
  readonly shell_touch_c: number | null;
  readonly lining_service_c: number | null;
  readonly allowable_stress_mpa: number | null;
  readonly acid_dew_margin_k: number | null;
  readonly water_dew_margin_k: number | null;
}

export interface SweepRow {
  readonly name: string;
  /** The swept values as written, one per axis. */
  readonly values: readonly string[];
  /** The swept values as numbers in each axis's unit (null on a category axis). */
  readonly x: readonly (number | null)[];
  readonly status: 'ran' | 'invalid' | 'failed';
  /** The key figures (null when the point did not run). */
  readonly figures: ComparisonRow | null;
  readonly limits: LimitValues | null;
  /** Why the point did not run (empty when it ran). */
  readonly problems: readonly string[];
}

export interface SweepTable {
  readonly axes: readonly { readonly key: string; readonly unit: string; readonly numeric: boolean; readonly values: readonly string[] }[];
  readonly rows: readonly SweepRow[];
  /** The point that meets every limit at the least heat loss (null when none does). */
  readonly recommended: string | null;
  readonly rule: string;
}

/** The limits of a run from its verdicts. */
export function limitValues(summary: Summary): LimitValues {
  const of = (limit: string) => summary.verdicts.find((v) => v.limit === limit && v.status !== 'not-set')?.limit_value ?? null;
  return {
    shell_touch_c: of('shell_touch'),
    lining_service_c: of('lining_service'),
    allowable_stress_mpa: of('allowable_stress'),
    acid_dew_margin_k: of('acid_dew_margin'),
    water_dew_margin_k: of('water_dew_margin'),
  };
}

/** The table of a sweep over `axes`, one row per point in order. */
export function sweepTable(axes: readonly SweepAxis[], points: readonly SweepPointResult[]): SweepTable {
  const rows: SweepRow[] = points.map((p) => ({
    name: p.name,
    values: p.values.map((v) => v.text),
    x: p.values.map((v, i) => (axes[i]!.numeric ? v.x : null)),
    status: p.status,
    figures: p.summary ? comparisonRow(p.summary) : null,
    limits: p.summary ? limitValues(p.summary) : null,
    problems: p.problems ?? [],
  }));
  // each point's scenario is named after the point, so the choice names the point
  const choice = compareBuildUps(points.flatMap((p) => (p.summary ? [p.summary] : [])));
  return { axes: axes.map((a) => ({ key: a.key, unit: a.unit, numeric: a.numeric, values: a.values.map((v) => v.text) })), rows, recommended: choice.recommended, rule: choice.rule };
}

/** Heading of an axis's column: the key path, with the unit of its numbers. */
export function axisHeading(axis: SweepTable['axes'][number]): string {
  return axis.numeric && axis.unit !== '' ? `${axis.key} (${axis.unit})` : axis.key;
}

const FIGURE_COLUMNS = ['all_limits_pass', 'failed_limits', 'peak_shell_c', 'peak_lining_c', 'lowest_acid_dew_margin_k', 'lowest_water_dew_margin_k', 'max_stress_indicator_mpa', 'heat_loss_kwh_per_day'] as const;

/** sweep.csv text: the swept values (numbers in the axis unit, or the text), the name, the status, the figures, the choice and any problems. */
export function sweepCsv(t: SweepTable): string {
  const head = [...t.axes.map(axisHeading), 'name', 'status', ...FIGURE_COLUMNS, 'recommended', 'problems'];
  const lines = t.rows.map((r) => {
    const axisCells = t.axes.map((a, i) => (a.numeric ? r.x[i] : r.values[i]));
    const f = r.figures;
    const figureCells = FIGURE_COLUMNS.map((c) => (f === null ? null : c === 'failed_limits' ? f.failed_limits.join(' ') : f[c]));
    return [...axisCells, r.name, r.status, ...figureCells, r.name === t.recommended, r.problems.join(' | ')].map(csvCell).join(',');
  });
  return `${head.map(csvCell).join(',')}\n${lines.join('\n')}\n`;
}
