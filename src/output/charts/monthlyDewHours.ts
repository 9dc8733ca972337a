/** Monthly bars of the hours the inner surface spends below the acid and the water dew points, at the height with the most (an annual run). */
import type { ChartConfiguration } from 'chart.js';
import type { AnnualSummary, HeightHours } from '../../analysis/summary.ts';
import { fixed, round } from '../format.ts';
import { ANNUAL_LOOKS, chartTypography } from './look.ts';
import { niceBounds } from './scales.ts';
import { axis, type ChartBuildOptions } from './parts.ts';
import { barChart, barDataset, monthLabel } from './bars.ts';

/** Index of the height with the most hours (the first of equals; 0 for an empty list). */
function mostHoursAt(rows: readonly HeightHours[]): number {
  let best = 0;
  rows.forEach((r, j) => {
    if (r.hours > rows[best]!.hours) best = j;
  });
  return best;
}

/**
 * Hours below the acid dew point (when the gas has one) and below the water dew point, month by
 * month, at the height that spends the most hours below the acid dew point over the run (the water
 * dew point's, without SO₃).
 */
export function monthlyDewHours(annual: AnnualSummary, options: ChartBuildOptions = {}): ChartConfiguration {
  const f = chartTypography(options.width, options.height);
  const acid = annual.hours_below_acid_dew.length > 0;
  const seg = mostHoursAt(acid ? annual.hours_below_acid_dew : annual.hours_below_water_dew);
  const height = annual.hours_below_water_dew[seg]?.height_m ?? 0;
  const labels = annual.months.map((m) => monthLabel(m.month, m.days));
  const at = (rows: readonly HeightHours[]) => round(rows[seg]?.hours ?? 0, 1);
  const datasets = [
    ...(acid ? [barDataset('Below the acid dew point', annual.months.map((m) => at(m.hours_below_acid_dew)), ANNUAL_LOOKS.acidHours, f)] : []),
    barDataset('Below the water dew point', annual.months.map((m) => at(m.hours_below_water_dew)), ANNUAL_LOOKS.waterHours, f),
  ];
  const most = Math.max(1, ...datasets.flatMap((d) => d.data.map((v) => v ?? 0)));
  const yb = niceBounds(0, most * 1.05);
  const yearAcid = acid ? `${fixed(annual.hours_below_acid_dew[seg]!.hours, 0)} h below the acid dew point, ` : '';
  const subtitle = `At ${fixed(height)} m, the height with the most hours; over the ${annual.days} days: ${yearAcid}${fixed(annual.hours_below_water_dew[seg]!.hours, 0)} h below the water dew point`;
  return barChart(
    {
      title: 'Hours of the inner surface below the dew points, month by month',
      subtitle,
      labels,
      datasets,
      xTitle: 'Month (local time)',
      y: axis('Time below the dew point (h)', f, { min: 0, max: yb.max, ticks: { stepSize: yb.step } }),
    },
    f,
  );
}
