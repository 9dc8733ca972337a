/**
 * Comparing wall build-ups: the same question asked of several scenarios — which meets every
 * limit, and at what heat loss? Pure: summaries in, rows and a recommendation out.
 */
import type { Summary } from './summary.ts';
import { round } from './rounding.ts';

export interface ComparisonRow {
  readonly scenario: string;
  /** Layers inside → outside, e.g. `50 mm dense-castable | 40 mm calcium-silicate | 8 mm carbon-steel`. */
  readonly build_up: string;
  readonly all_limits_pass: boolean;
  /** Limits that fail (empty when all pass). */
  readonly failed_limits: readonly string[];
  readonly peak_shell_c: number;
  readonly peak_lining_c: number;
  readonly lowest_acid_dew_margin_k: number | null;
  readonly lowest_water_dew_margin_k: number;
  readonly max_stress_indicator_mpa: number | null;
  readonly heat_loss_kwh_per_day: number;
}

export interface Comparison {
  readonly rows: readonly ComparisonRow[];
  /** The build-up that meets every limit at the least heat loss (null when none meets them all). */
  readonly recommended: string | null;
  readonly rule: string;
}

/** A case of a batch that did not run: its name and why (not a valid scenario, or a run that could not be computed). */
export interface NotRun {
  readonly scenario: string;
  readonly status: 'invalid' | 'failed';
  readonly problems: readonly string[];
}

/**
 * A row of the comparison: the figures the verdicts judged. Over the reported day as a rule; for a
 * run whose verdicts judge every simulated day (several days, not periodic: a year) the worst of
 * every day (the verdicts' governing figures) and the mean heat loss per day over the run, so that
 * a row never passes a figure its verdict failed, nor ranks a year by its last day.
 */
export function comparisonRow(summary: Summary): ComparisonRow {
  const stresses = summary.layers.map((l) => l.stress_indicator_mpa).filter((v): v is number => v !== null);
  const wide = summary.run.verdicts_over !== summary.run.evaluated_over;
  const governing = (limit: string, reported: number | null): number | null => (wide ? (summary.verdicts.find((v) => v.limit === limit)?.governing_value ?? reported) : reported);
  const dailyLoss = summary.daily.map((d) => d.heat_loss_kwh).filter((v): v is number => v !== null);
  return {
    scenario: summary.scenario.name,
    build_up: summary.layers.map((l) => `${l.thickness_mm} mm ${l.material}`).join(' | '),
    all_limits_pass: summary.all_limits_pass,
    failed_limits: summary.verdicts.filter((v) => v.status === 'fail').map((v) => v.limit),
    peak_shell_c: governing('shell_touch', summary.peak_shell_c)!,
    peak_lining_c: governing('lining_service', summary.peak_lining_c)!,
    lowest_acid_dew_margin_k: governing('acid_dew_margin', summary.lowest_acid_dew_margin_k),
    lowest_water_dew_margin_k: governing('water_dew_margin', summary.lowest_water_dew_margin_k)!,
    max_stress_indicator_mpa: governing('allowable_stress', stresses.length ? Math.max(...stresses) : null),
    heat_loss_kwh_per_day: wide && dailyLoss.length > 0 ? round(dailyLoss.reduce((a, b) => a + b, 0) / dailyLoss.length, 2) : summary.heat_loss_kwh_per_day,
  };
}

/** Rows for every summary and the recommendation: every limit met, then the least heat loss per day. */
export function compareBuildUps(summaries: readonly Summary[]): Comparison {
  const rows = summaries.map(comparisonRow);
  const passing = rows.filter((r) => r.all_limits_pass);
  const best = passing.reduce<ComparisonRow | null>((a, b) => (a === null || b.heat_loss_kwh_per_day < a.heat_loss_kwh_per_day ? b : a), null);
  return { rows, recommended: best ? best.scenario : null, rule: 'meets every limit that is set, then the least heat loss per day' };
}

/** A CSV cell: empty for a missing value, quoted when it holds a quote, a comma or a line break. */
export const csvCell = (v: unknown): string => (v === null || v === undefined ? '' : /[",\n]/.test(String(v)) ? `"${String(v).replace(/"/g, '""')}"` : String(v));

/** comparison.csv text. */
export function comparisonCsv(c: Comparison): string {
  const head = 'scenario,build_up,all_limits_pass,failed_limits,peak_shell_c,peak_lining_c,lowest_acid_dew_margin_k,lowest_water_dew_margin_k,max_stress_indicator_mpa,heat_loss_kwh_per_day,recommended\n';
  const cell = csvCell;
  return (
    head +
    c.rows
      .map((r) =>
        [r.scenario, r.build_up, r.all_limits_pass, r.failed_limits.join(' '), r.peak_shell_c, r.peak_lining_c, r.lowest_acid_dew_margin_k, r.lowest_water_dew_margin_k, r.max_stress_indicator_mpa, r.heat_loss_kwh_per_day, r.scenario === c.recommended]
          .map(cell)
          .join(','),
      )
      .join('\n') +
    '\n'
  );
}
