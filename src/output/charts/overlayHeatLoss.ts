/** Overlay: heat lost to the outside per day, one bar per run, filled by whether the run meets every limit. */
import type { ChartConfiguration } from 'chart.js';
import { round } from '../format.ts';
import { chartTypography, FONT_FAMILY, GRID, INK, VERDICT_BORDERS, VERDICT_COLORS } from './look.ts';
import { niceBounds } from './scales.ts';
import { axis, baseOptions } from './parts.ts';
import type { OverlayCase, OverlayOptions } from './overlayParts.ts';
import { comparisonRow } from '../../analysis/compare.ts';

/** Net heat lost to the outside per day of each run as bars (dark: meets every limit; light with a dark red edge: a limit fails). */
export function overlayHeatLoss(cases: readonly OverlayCase[], options: OverlayOptions = {}): ChartConfiguration {
  const f = chartTypography(options.width, options.height);
  const labels = cases.map((c) => c.label);
  // the figure the comparison ranks by (a year's mean day, not its last)
  const loss = cases.map((c) => round(comparisonRow(c.summary).heat_loss_kwh_per_day, 1));
  const bars = (pass: boolean, label: string) => ({
    label,
    data: cases.map((c, i) => (c.summary.all_limits_pass === pass ? loss[i]! : null)),
    backgroundColor: pass ? VERDICT_COLORS.pass : VERDICT_COLORS.fail,
    borderColor: pass ? VERDICT_BORDERS.pass : VERDICT_BORDERS.fail,
    borderWidth: pass ? 1 : 2.5,
    skipNull: true,
  });
  const hi = Math.max(0, ...loss);
  const y = niceBounds(0, hi * 1.05);
  const base = baseOptions('Heat lost to the outside per day', 'Net of convection and radiation less the sun absorbed', f, 'bottom');
  return {
    type: 'bar',
    data: { labels, datasets: [bars(true, 'Meets every limit'), bars(false, 'A limit fails')] },
    options: {
      ...base,
      parsing: true,
      plugins: { ...base.plugins, legend: { ...base.plugins.legend, labels: { ...base.plugins.legend.labels, usePointStyle: false } } },
      scales: {
        x: { type: 'category', ticks: { color: INK, font: { size: f.tick, family: FONT_FAMILY }, autoSkip: false, maxRotation: 60 }, grid: { display: false }, border: { color: INK } },
        y: axis('Heat loss (kWh per day)', f, { min: 0, max: y.max, ticks: { stepSize: y.step }, grid: { color: GRID } }),
      },
    },
  } as unknown as ChartConfiguration;
}
