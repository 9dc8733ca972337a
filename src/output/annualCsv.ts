/**
 * The files of an annual run besides summary.json: monthly.csv (tidy: one row per month × height,
 * the hours below each dew point at that height and the month's figures for the whole stack) and
 * cycles.csv (tidy: one row per temperature difference × height (× sector) × range bin, the
 * rainflow cycles counted there, in the bins summary.json uses for that difference). Numbers are
 * written by toFixed, the same in every locale.
 */
import type { AnnualSummary } from '../analysis/summary.ts';
import { regroup, type AnnualParts } from '../analysis/annual/index.ts';
import { decimals } from './format.ts';

const cell = (v: number | null, digits: number) => decimals(v, digits, '');

/** monthly.csv: `month,days,height_m,hours_below_water_dew,hours_below_acid_dew,` then the month's figures for the whole stack. */
export function monthlyCsv(annual: AnnualSummary): string {
  const header = [
    'month', 'days', 'height_m', 'hours_below_water_dew', 'hours_below_acid_dew', 'heat_loss_kwh', 'gas_to_wall_kwh',
    'shell_min_c', 'shell_max_c', 'lining_min_c', 'lining_max_c', 'inner_surface_min_c', 'lowest_water_dew_margin_k', 'lowest_acid_dew_margin_k',
  ];
  let text = `${header.join(',')}\n`;
  for (const m of annual.months) {
    const whole = [cell(m.heat_loss_kwh, 1), cell(m.gas_to_wall_kwh, 1), cell(m.shell_min_c, 2), cell(m.shell_max_c, 2), cell(m.lining_min_c, 2), cell(m.lining_max_c, 2), cell(m.inner_surface_min_c, 2), cell(m.lowest_water_dew_margin_k, 2), cell(m.lowest_acid_dew_margin_k, 2)].join(',');
    m.hours_below_water_dew.forEach((w, s) => {
      text += `${m.month},${m.days},${cell(w.height_m, 2)},${cell(w.hours, 2)},${cell(m.hours_below_acid_dew[s]?.hours ?? null, 2)},${whole}\n`;
    });
  }
  return text;
}

/** cycles.csv: `across,height_m[,azimuth_deg],from_k,to_k,cycles`, every column of the wall, bins up to its largest range. */
export function cyclesCsv(annual: AnnualSummary, parts: AnnualParts): string {
  const { layout } = parts;
  const sectors = layout.sectors > 1;
  let text = `${['across', 'height_m', ...(sectors ? ['azimuth_deg'] : []), 'from_k', 'to_k', 'cycles'].join(',')}\n`;
  parts.cycles.differences.forEach((d, j) => {
    const width = annual.cycles.across[j]!.bin_width_k;
    const digits = width < 1 ? 1 : 0;
    for (const col of parts.cycles.of(j)) {
      const lead = `${d.across},${cell(layout.heightM[col.segment]!, 2)},${sectors ? `${cell((360 * col.sector) / layout.sectors, 1)},` : ''}`;
      regroup(col.histogram, width).forEach((n, b) => {
        text += `${lead}${cell(b * width, digits)},${cell((b + 1) * width, digits)},${cell(n, 1)}\n`;
      });
    }
  });
  return text;
}
