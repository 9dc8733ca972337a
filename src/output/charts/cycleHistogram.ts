/**
 * The thermal cycles of an annual run by range: for the whole wall and each layer, the rainflow
 * cycles (ASTM E1049) of the temperature difference across it at its governing height, as grouped
 * bars over bins of range on a logarithmic count axis (many small cycles, few large ones).
 */
import type { ChartConfiguration } from 'chart.js';
import type { AnnualSummary } from '../../analysis/summary.ts';
import { governingCycles, regroup, reportBinWidth, type AnnualParts } from '../../analysis/annual/index.ts';
import { fixed, round } from '../format.ts';
import { chartTypography, FONT_FAMILY, GRID, INK, wallRamp } from './look.ts';
import type { ChartBuildOptions } from './parts.ts';
import { barChart, barDataset } from './bars.ts';

/** Bins of the histogram: one width for every difference, wide enough for the largest range of any. */
export function cycleHistogram(annual: AnnualSummary, parts: AnnualParts, options: ChartBuildOptions = {}): ChartConfiguration {
  const f = chartTypography(options.width, options.height);
  const governing = governingCycles(parts);
  const largest = Math.max(0, ...governing.map((g) => g.cycles.histogram.largestRange));
  const width = reportBinWidth(largest, 20);
  const bins = Math.max(1, Math.floor(largest / width + 1e-9) + 1);
  const digits = width < 1 ? 1 : 0;
  const labels = Array.from({ length: bins }, (_, j) => `${fixed(j * width, digits)}–${fixed((j + 1) * width, digits)}`);
  const looks = [{ color: INK }, ...wallRamp(governing.length - 1)];
  const heights = annual.cycles.across.map((a) => a.governing_height_m);
  const datasets = governing.map((g, j) => {
    const counts = regroup(g.cycles.histogram, width);
    const values = labels.map((_, b) => (counts[b] ? round(counts[b], 1) : null));
    return barDataset(`Across the ${g.across} at ${fixed(heights[j] ?? 0)} m`, values, { fill: looks[j]!.color, border: INK }, f);
  });
  const threshold = annual.cycles.threshold_k;
  const above = threshold === null ? '' : `; above ${fixed(threshold, 0)} K: ${annual.cycles.across.map((a) => `${a.across} ${fixed(a.cycles_above_threshold ?? 0, 0)}`).join(', ')}`;
  const subtitle = `Rainflow (ASTM E1049) over the ${annual.days} days, each at its height with the most cycles${threshold === null ? '' : ' above the threshold'}${above}`;
  return barChart(
    {
      title: 'Thermal cycles of the temperature difference, by range',
      subtitle,
      labels,
      datasets,
      xTitle: 'Range of the temperature difference (K)',
      y: {
        type: 'logarithmic',
        title: { display: true, text: 'Cycles counted (count)', color: INK, font: { size: f.axisTitle, weight: 'bold', family: FONT_FAMILY } },
        // counts are whole or half cycles: no more than one decimal on the ticks
        ticks: { color: INK, font: { size: f.tick, family: FONT_FAMILY }, format: { minimumFractionDigits: 0, maximumFractionDigits: 1 } },
        grid: { color: GRID },
        border: { color: INK },
      },
    },
    f,
  );
}
