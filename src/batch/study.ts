/**
 * Design questions over batches of cases: a comparison of a file's base case and variants (or of
 * several files), and a sweep of one or two values. Each runs its cases (serially or on the pool),
 * then turns the outcomes into the table and the overlay cases the output files are made of; the
 * same functions turn the outcomes of a collected plan into the same files.
 */
import { readScenarioFile } from '../input/scenario/load.ts';
import { validateCase, type ScenarioCase } from '../input/scenario/cases.ts';
import { axisLeaf, type SweepAxis, type SweepPoint } from '../input/scenario/sweep.ts';
import { compareBuildUps, type Comparison } from '../analysis/compare.ts';
import { sweepTable, type SweepTable } from '../analysis/sweep.ts';
import type { NotRun } from '../analysis/compare.ts';
import type { OverlayCase } from '../output/charts/overlayParts.ts';
import { dirname, resolve } from 'node:path';
import { hasRun, type CaseOutcome } from './outcome.ts';
import { chooseThreads, runCases, type ProgressCallback } from './pool.ts';

export interface BatchOptions {
  /** Threads: a number (1 = serially in this thread) or `auto` (the pool when the batch is long enough to pay for it). */
  readonly threads?: number | 'auto';
  readonly onProgress?: ProgressCallback;
}

/** Run the cases with the thread count asked for (or chosen); outcomes in the order of the cases. */
export async function runBatch(cases: readonly ScenarioCase[], options: BatchOptions = {}): Promise<{ outcomes: CaseOutcome[]; threads: number }> {
  const threads = chooseThreads(cases.length, options.threads ?? 'auto');
  return { outcomes: await runCases(cases, threads, options.onProgress), threads };
}

/** The cases that did not run, with their problems. */
export function notRunOf(outcomes: readonly CaseOutcome[]): NotRun[] {
  return outcomes.flatMap((o) => (o.status === 'ran' ? [] : [{ scenario: o.name, status: o.status, problems: o.problems }]));
}

export interface ComparisonStudy {
  readonly comparison: Comparison;
  readonly notRun: readonly NotRun[];
  readonly overlay: readonly OverlayCase[];
}

/** The comparison of the outcomes that ran, the ones that did not, and the runs to overlay (labelled by name). */
export function comparisonStudy(outcomes: readonly CaseOutcome[]): ComparisonStudy {
  const ran = outcomes.filter(hasRun);
  return { comparison: compareBuildUps(ran.map((o) => o.summary)), notRun: notRunOf(outcomes), overlay: ran.map((o) => ({ label: o.name, summary: o.summary, trace: o.trace })) };
}

export interface SweepStudy {
  readonly table: SweepTable;
  readonly notRun: readonly NotRun[];
  readonly overlay: readonly OverlayCase[];
}

/** The label of a sweep point in overlay legends: each swept key's last name and its value as written, `thickness 40 mm, emissivity 0.9`. */
export const pointLabel = (axes: readonly SweepAxis[], p: Pick<SweepPoint, 'values'>): string => p.values.map((v, i) => `${axisLeaf(axes[i]!)} ${v.text}`).join(', ');

/** The table of a sweep from its points' outcomes (in the order of the points), and the runs to overlay (labelled by value). */
export function sweepStudy(axes: readonly SweepAxis[], points: readonly Pick<SweepPoint, 'name' | 'values'>[], outcomes: readonly CaseOutcome[]): SweepStudy {
  const table = sweepTable(
    axes,
    points.map((p, i) => {
      const o = outcomes[i]!;
      return o.status === 'ran' ? { name: p.name, values: p.values, status: o.status, summary: o.summary } : { name: p.name, values: p.values, status: o.status, problems: o.problems };
    }),
  );
  const overlay = points.flatMap((p, i) => {
    const o = outcomes[i]!;
    return hasRun(o) ? [{ label: pointLabel(axes, p), summary: o.summary, trace: o.trace }] : [];
  });
  return { table, notRun: notRunOf(outcomes), overlay };
}

/**
 * The cases of a sweep of a scenario file: one per point. The file itself is validated first (with
 * its variants section, which a sweep leaves out), so a file that cannot run is bad input
 * (ScenarioError) before anything runs.
 */
export function sweepCases(file: string, points: readonly SweepPoint[]): ScenarioCase[] {
  return casesOfBase(sweepBase(file), points);
}

/** A sweep's base scenario, read and validated once (throws ScenarioError for a file that cannot run). */
export interface SweepBase {
  readonly raw: unknown;
  readonly baseDir: string;
  readonly file: string;
}

export function sweepBase(file: string): SweepBase {
  const raw = readScenarioFile(file);
  const baseDir = dirname(resolve(file));
  validateCase({ name: 'base', raw, baseDir, file, overrides: [], problems: [] });
  return { raw, baseDir, file };
}

/** The cases of `points` on a base already read and validated. */
export function casesOfBase({ raw, baseDir, file }: SweepBase, points: readonly SweepPoint[]): ScenarioCase[] {
  return points.map((p) => ({ name: p.name, raw, baseDir, file, overrides: p.overrides, problems: [] }));
}
