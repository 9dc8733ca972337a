/** Monthly bars of the heat the wall loses to the outside, net of sun (an annual run). */
import type { ChartConfiguration } from 'chart.js';
import type { AnnualSummary } from '../../analysis/summary.ts';
import { fixed, round } from '../format.ts';
import { ANNUAL_LOOKS, chartTypography } from './look.ts';
import { niceBounds } from './scales.ts';
import { axis, type ChartBuildOptions } from './parts.ts';
import { barChart, barDataset, monthLabel } from './bars.ts';

/** Heat lost through the whole stack wall to the outside (convection + radiation − sun absorbed), month by month, MWh. */
export function monthlyHeatLoss(annual: AnnualSummary, options: ChartBuildOptions = {}): ChartConfiguration {
  const f = chartTypography(options.width, options.height);
  const labels = annual.months.map((m) => monthLabel(m.month, m.days));
  const values = annual.months.map((m) => round(m.heat_loss_kwh / 1000, 2));
  const yb = niceBounds(Math.min(0, ...values), Math.max(1, ...values) * 1.05);
  const subtitle = `Whole stack, net of sun absorbed; ${fixed(annual.heat_loss_kwh / 1000, 1)} MWh over the ${annual.days} days (${annual.first_day} to ${annual.last_day})`;
  return barChart(
    {
      title: 'Heat lost to the outside, month by month',
      subtitle,
      labels,
      datasets: [barDataset('Heat lost, net of sun', values, ANNUAL_LOOKS.heatLoss, f)],
      xTitle: 'Month (local time)',
      y: axis('Heat lost (MWh)', f, { min: Math.min(...values) < 0 ? yb.min : 0, max: yb.max, ticks: { stepSize: yb.step } }),
    },
    f,
  );
}
