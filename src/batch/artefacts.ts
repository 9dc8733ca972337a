/**
 * The files of a design question — a comparison of variants or build-ups, or a sweep: the table
 * (JSON and CSV), the charts of the key figures against the swept values, and the overlay charts
 * of the runs. Every file is a function of the runs' summaries and traces only (no timings, no
 * paths), so a batch writes the same bytes whichever way it ran: serially, on a pool of threads,
 * or as separate runs collected afterwards.
 */
import { comparisonCsv, type Comparison, type NotRun } from '../analysis/compare.ts';
import { sweepCsv, type SweepTable } from '../analysis/sweep.ts';
import type { Artefact } from '../output/write.ts';
import type { OverlayCase } from '../output/charts/overlayParts.ts';

export interface ChartSizeOptions {
  readonly charts?: boolean;
  readonly width?: number;
  readonly height?: number;
}

/** The overlay charts of several runs, as PNG artefacts. */
async function overlayCharts(cases: readonly OverlayCase[], ordered: boolean, options: ChartSizeOptions): Promise<Artefact[]> {
  if (options.charts === false || cases.length === 0) return [];
  const [{ renderChartPng }, { overlayShell }, { overlayInnerSurfaceTop }, { overlayAcidMarginTop }, { overlayHeatLoss }] = await Promise.all([
    import('../output/charts/render.ts'),
    import('../output/charts/overlayShell.ts'),
    import('../output/charts/overlayInnerSurfaceTop.ts'),
    import('../output/charts/overlayAcidMarginTop.ts'),
    import('../output/charts/overlayHeatLoss.ts'),
  ]);
  const size = { width: options.width ?? 1000, height: options.height ?? 600 };
  const o = { ...size, ordered };
  const configs = [
    { name: 'overlay-shell', config: overlayShell(cases, o) },
    { name: 'overlay-inner-surface-top', config: overlayInnerSurfaceTop(cases, o) },
    ...(cases.some((c) => c.summary.acid_dew_point_c !== null) ? [{ name: 'overlay-acid-margin-top', config: overlayAcidMarginTop(cases, o) }] : []),
    { name: 'overlay-heat-loss', config: overlayHeatLoss(cases, o) },
  ];
  return configs.map((c) => ({ fileName: `${c.name}.png`, content: renderChartPng(c.config, size) }));
}

/** comparison.json (the comparison and the cases that did not run), comparison.csv and the overlay charts. */
export async function comparisonArtefacts(comparison: Comparison, notRun: readonly NotRun[], cases: readonly OverlayCase[], options: ChartSizeOptions = {}): Promise<Artefact[]> {
  return [
    { fileName: 'comparison.json', content: `${JSON.stringify({ ...comparison, not_run: notRun }, null, 2)}\n` },
    { fileName: 'comparison.csv', content: comparisonCsv(comparison) },
    ...(await overlayCharts(cases, false, options)),
  ];
}

/** sweep.json, sweep.csv, a chart per key figure against the swept values, the pass/fail map of a two-value sweep, and the overlay charts. */
export async function sweepArtefacts(table: SweepTable, cases: readonly OverlayCase[], options: ChartSizeOptions = {}): Promise<Artefact[]> {
  const out: Artefact[] = [
    { fileName: 'sweep.json', content: `${JSON.stringify(table, null, 2)}\n` },
    { fileName: 'sweep.csv', content: sweepCsv(table) },
  ];
  if (options.charts === false || table.rows.every((r) => r.figures === null)) return out;
  const [{ renderChartPng }, { sweepFigure, SWEEP_FIGURES }, { sweepPassMap }] = await Promise.all([import('../output/charts/render.ts'), import('../output/charts/sweepFigure.ts'), import('../output/charts/sweepPassMap.ts')]);
  const size = { width: options.width ?? 1000, height: options.height ?? 600 };
  for (const figure of SWEEP_FIGURES) {
    if (table.rows.every((r) => r.figures === null || r.figures[figure.column] === null)) continue;
    out.push({ fileName: `${figure.name}.png`, content: renderChartPng(sweepFigure(table, figure, size), size) });
  }
  const map = sweepPassMap(table, size);
  if (map) out.push({ fileName: 'sweep-pass-map.png', content: renderChartPng(map, size) });
  out.push(...(await overlayCharts(cases, true, options)));
  return out;
}
