/**
 * Parts of the bar charts (the monthly bars of an annual run, the cycle histogram): a category x
 * axis of labels and bar datasets. chart.js parses plain number arrays against the labels, so the
 * bar charts turn parsing on (the line charts give parsed {x, y} points and leave it off).
 */
import type { ChartConfiguration, ChartDataset } from 'chart.js';
import { FONT_FAMILY, GRID, INK, type Typography } from './look.ts';
import { baseOptions } from './parts.ts';

/**
 * A bar chart: its title and subtitle, one category per label along x (titled `xTitle`), the bar
 * datasets, and the y axis as given. The options are those of every chart, except that chart.js
 * parses the bars' plain values against the labels.
 */
export function barChart(p: { title: string; subtitle: string; labels: readonly string[]; datasets: readonly ChartDataset<'bar', (number | null)[]>[]; xTitle: string; y: object }, f: Typography): ChartConfiguration {
  const { parsing: _off, ...base } = baseOptions(p.title, p.subtitle, f, 'bottom');
  return {
    type: 'bar',
    data: { labels: [...p.labels], datasets: [...p.datasets] },
    options: { ...base, scales: { x: categoryAxis(p.xTitle, f), y: p.y } },
  } as ChartConfiguration;
}

/** A category axis of labels, titled with its quantity and unit. */
export function categoryAxis(title: string, f: Typography) {
  return {
    type: 'category' as const,
    title: { display: true, text: title, color: INK, font: { size: f.axisTitle, weight: 'bold' as const, family: FONT_FAMILY } },
    ticks: { color: INK, font: { size: f.tick, family: FONT_FAMILY }, autoSkip: false, maxRotation: 0 },
    grid: { display: false, color: GRID },
    border: { color: INK },
  };
}

/** A bar dataset: one value per label (null: no bar), filled with `fill` and outlined in `border`. */
export function barDataset(label: string, values: readonly (number | null)[], look: { readonly fill: string; readonly border: string }, f: Typography): ChartDataset<'bar', (number | null)[]> {
  return {
    label,
    data: [...values],
    backgroundColor: look.fill,
    borderColor: look.border,
    borderWidth: Math.max(1, f.scale),
    barPercentage: 0.9,
    categoryPercentage: 0.8,
  };
}

/** Short month names, January first (the charts' month labels; English, as the rest of the output). */
export const MONTH_NAMES = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'] as const;

/** A month label `Jan 2026` from `YYYY-MM`, with the days counted when the month is not whole in the run (`Jul 2026 (12 d)`). */
export function monthLabel(month: string, days: number): string {
  const y = Number(month.slice(0, 4));
  const m = Number(month.slice(5, 7));
  const inMonth = new Date(Date.UTC(y, m, 0)).getUTCDate();
  return `${MONTH_NAMES[m - 1]} ${y}${days === inMonth ? '' : ` (${days} d)`}`;
}
