/**
 * The design commands: `compare` (build-ups in several files, or the variants in one), `sweep`
 * (one or two values over lists or ranges, or a plan for a batch system), `size` (the smallest or
 * largest value that meets every limit) and `collect` (a plan's runs gathered into the sweep's
 * table and charts). Thin: the batch layer runs, the analysis and output layers tabulate and draw.
 */
import { join, resolve } from 'node:path';
import { fileCases } from '../input/scenario/cases.ts';
import { parseRange, parseVary, rangePoints, splitAssignment, splitNumber, sweepPoints, SweepSpecError, type SweepAxis, type SweptValue } from '../input/scenario/sweep.ts';
import { sizeOnGrid, sizingReport, type SizingProbe } from '../analysis/sizing.ts';
import { comparisonSheet } from '../output/console.ts';
import { comparisonArtefacts, sweepArtefacts } from '../batch/artefacts.ts';
import type { NotRun } from '../analysis/compare.ts';
import { notRunLines, sizingSheet, sweepSheet } from '../output/designSheets.ts';
import { writeArtefactsAtomically } from '../output/write.ts';
import { checkReplaceable } from '../output/folder.ts';
import { casesOfBase, comparisonStudy, runBatch, sweepBase, sweepCases, sweepStudy, type SweepStudy } from '../batch/study.ts';
import { CasePool, chooseThreads, runCasesSerially } from '../batch/pool.ts';
import { holdsPlan, writePlan, SCENARIO_LIST } from '../batch/plan.ts';
import { collectOutcomes, readManifest } from '../batch/collect.ts';
import type { CaseOutcome } from '../batch/outcome.ts';
import { batchProgress } from './progress.ts';
import { VERSION } from './version.ts';
import { parseChartSize, parseThreads } from './options.ts';
import { BadInput, EXIT_BAD_INPUT, EXIT_LIMIT_FAILED, EXIT_OK, EXIT_SOME_NOT_RUN } from './errors.ts';

export interface BatchCommandOptions {
  out?: string;
  threads?: string;
  charts: boolean;
  chartSize: string;
  json?: boolean;
  quiet?: boolean;
  strict?: boolean;
}

/** Turn a sweep grammar error into bad input (exit code 2). */
function spec<T>(make: () => T): T {
  try {
    return make();
  } catch (e) {
    if (e instanceof SweepSpecError) throw new BadInput(e.message);
    throw e;
  }
}

/** Run a batch (on `pool` when given, else as `--threads` says) with a progress bar on a terminal (after a second). */
async function runWithProgress(cases: Parameters<typeof runBatch>[0], opts: BatchCommandOptions, label: string, pool: CasePool | null = null): Promise<CaseOutcome[]> {
  const progress = batchProgress(!opts.quiet && !opts.json && process.stderr.isTTY === true, label);
  progress.start(cases.length);
  try {
    return pool ? await pool.run(cases, progress.onProgress) : (await runBatch(cases, { threads: parseThreads(opts.threads), onProgress: progress.onProgress })).outcomes;
  } finally {
    progress.stop();
  }
}

/** The one-line note on stderr about cases that did not run. */
function reportNotRun(notRun: readonly NotRun[], total: number): void {
  if (notRun.length === 0) return;
  process.stderr.write(`stackday: ${notRun.length} of ${total} cases did not run: ${notRun.map((n) => `${n.scenario} (${n.status === 'invalid' ? 'not a valid scenario' : 'could not be computed'})`).join(', ')}\n`);
}

/** An output folder that cannot be written or replaced is reported before a batch runs, not after it. */
function ensureWritable(dir: string): void {
  const obstacle = checkReplaceable(resolve(dir));
  if (obstacle) throw obstacle;
}

/** Exit code of a batch: some not run (5) before a limit failing everywhere under --strict (3). */
function batchExit(notRun: readonly NotRun[], strict: boolean | undefined, recommended: string | null): number {
  if (notRun.length > 0) return EXIT_SOME_NOT_RUN;
  return strict && recommended === null ? EXIT_LIMIT_FAILED : EXIT_OK;
}

export async function compareCommand(files: readonly string[], opts: BatchCommandOptions): Promise<number> {
  const size = parseChartSize(opts.chartSize);
  parseThreads(opts.threads);
  // every file's base case is validated before anything runs: a file that cannot run at all is bad input
  const cases = files.flatMap((f) => fileCases(f));
  if (opts.out) ensureWritable(resolve(opts.out));
  const outcomes = await runWithProgress(cases, opts, 'comparing');
  const study = comparisonStudy(outcomes);
  reportNotRun(study.notRun, cases.length);
  if (study.comparison.rows.length === 0) {
    process.stderr.write(`${notRunLines(study.notRun).join('\n')}\nNothing ran; nothing was written.\n`);
    return EXIT_BAD_INPUT;
  }
  if (opts.out) writeArtefactsAtomically(resolve(opts.out), await comparisonArtefacts(study.comparison, study.notRun, study.overlay, { charts: opts.charts, ...size }));
  if (opts.json) process.stdout.write(`${JSON.stringify({ ...study.comparison, not_run: study.notRun }, null, 2)}\n`);
  else if (!opts.quiet) process.stdout.write(`${[...comparisonSheet(study.comparison, study.overlay[0]!.summary.cautions), ...notRunLines(study.notRun)].join('\n')}\n`);
  return batchExit(study.notRun, opts.strict, study.comparison.recommended);
}

/** Write a sweep's files, print its sheet, and say how it ended. */
async function finishSweep(study: SweepStudy, outDir: string, opts: BatchCommandOptions): Promise<number> {
  reportNotRun(study.notRun, study.table.rows.length);
  if (study.table.rows.every((r) => r.figures === null)) {
    process.stderr.write(`${notRunLines(study.notRun).join('\n')}\nNothing ran; nothing was written.\n`);
    return EXIT_BAD_INPUT;
  }
  writeArtefactsAtomically(outDir, await sweepArtefacts(study.table, study.overlay, { charts: opts.charts, ...parseChartSize(opts.chartSize) }));
  if (opts.json) process.stdout.write(`${JSON.stringify(study.table, null, 2)}\n`);
  else if (!opts.quiet) process.stdout.write(`${[...sweepSheet(study.table), ...notRunLines(study.notRun), '', `Results written to ${outDir}`].join('\n')}\n`);
  return batchExit(study.notRun, opts.strict, study.table.recommended);
}

export interface SweepCommandOptions extends BatchCommandOptions {
  vary: string[];
  plan?: string;
}

/** Write a plan of the sweep for a batch system, and say how to run and collect it. */
function planSweep(file: string, opts: SweepCommandOptions, plan: string, axes: readonly SweepAxis[], points: ReturnType<typeof sweepPoints>): number {
  if (holdsPlan(plan)) throw new BadInput(`--plan: ${plan} holds a plan already (manifest.json); choose a new folder`);
  const manifest = writePlan(plan, file, axes, points, sweepCases(file, points), VERSION);
  const planned = manifest.points.filter((p) => p.status === 'planned').length;
  const notRun: NotRun[] = manifest.points.filter((p) => p.status === 'invalid').map((p) => ({ scenario: p.name, status: 'invalid', problems: p.problems }));
  reportNotRun(notRun, points.length);
  const dir = resolve(plan);
  if (!opts.quiet)
    process.stdout.write(
      [
        `Planned ${planned} runs in ${dir} (manifest.json, ${SCENARIO_LIST}, scenarios/).`,
        'Run them with any of:',
        `  ${join(dir, 'run-parallel.sh')}     (GNU parallel)`,
        `  ${join(dir, 'run-xargs.sh')}        (xargs -P)`,
        `  cd ${dir} && sbatch slurm-array.sh   (Slurm job array)`,
        `then: stackday collect ${dir}`,
        ...notRunLines(notRun),
        '',
      ].join('\n'),
    );
  return notRun.length > 0 ? EXIT_SOME_NOT_RUN : EXIT_OK;
}

export async function sweepCommand(file: string, opts: SweepCommandOptions): Promise<number> {
  parseChartSize(opts.chartSize);
  const requested = parseThreads(opts.threads);
  const axes = spec(() => opts.vary.map((v) => parseVary(v)));
  const points = spec(() => sweepPoints(axes));
  if (opts.plan) return planSweep(file, opts, opts.plan, axes, points);
  // the pool starts first, so that its workers load the model while this thread validates the file
  const threads = chooseThreads(points.length, requested);
  const pool = threads > 1 ? new CasePool(threads) : null;
  try {
    const cases = sweepCases(file, points);
    const name = String((cases[0]?.raw as { name?: unknown } | undefined)?.name ?? 'scenario');
    const outDir = resolve(opts.out ?? join('out', `${name}-sweep`));
    ensureWritable(outDir);
    const outcomes = await runWithProgress(cases, opts, 'sweeping', pool);
    return await finishSweep(sweepStudy(axes, points, outcomes), outDir, opts);
  } finally {
    await pool?.close();
  }
}

/** Where `collect` writes by default, inside the plan folder. */
export const COLLECTED_FOLDER = 'results';

export async function collectCommand(dir: string, opts: BatchCommandOptions): Promise<number> {
  parseChartSize(opts.chartSize);
  const manifest = readManifest(dir);
  // into a folder of its own: an output folder is replaced whole, and the plan's files must stay
  const outDir = resolve(opts.out ?? join(dir, COLLECTED_FOLDER));
  ensureWritable(outDir);
  const outcomes = collectOutcomes(dir, manifest);
  return finishSweep(sweepStudy(manifest.axes, manifest.points, outcomes), outDir, opts);
}

export interface SizeCommandOptions {
  vary: string;
  resolution?: string;
  largest?: boolean;
  threads?: string;
  out?: string;
  json?: boolean;
  quiet?: boolean;
}

/** The grid of a sizing: the range of `--vary` at the resolution (or the range's own step). */
function sizingGrid(opts: SizeCommandOptions): { axis: SweepAxis; resolution: string } {
  return spec(() => {
    const { key, path, rest } = splitAssignment(opts.vary, '--vary');
    const range = parseRange(rest, '--vary');
    if (!range) throw new SweepSpecError(`--vary: found "${rest}"; expected a range FROM..TO, e.g. "20 mm..200 mm", with --resolution "5 mm"`);
    const res = opts.resolution === undefined ? (range.step === null ? null : { n: range.step, unit: range.unit }) : splitNumber(opts.resolution);
    if (res === null) throw new SweepSpecError(`--resolution: ${opts.resolution === undefined ? 'missing' : `found "${opts.resolution}"`}; expected the step of the answer in the range's unit, e.g. --resolution "5 ${range.unit || 'mm'}"`);
    if (!(res.n > 0) || (res.unit !== '' && res.unit !== range.unit)) throw new SweepSpecError(`--resolution: found "${opts.resolution}"; expected a positive step in the range's unit${range.unit ? ` (${range.unit})` : ''}`);
    const values = rangePoints(range, res.n, '--vary');
    return { axis: { key, path, unit: range.unit, numeric: true, values }, resolution: `${res.n}${range.unit ? ` ${range.unit}` : ''}` };
  });
}

export async function sizeCommand(file: string, opts: SizeCommandOptions): Promise<number> {
  const { axis, resolution } = sizingGrid(opts);
  const requested = parseThreads(opts.threads);
  const base = sweepBase(file); // the file itself must be valid before anything runs (read and checked once)
  if (opts.out) ensureWritable(resolve(opts.out));
  const expectedRuns = 2 + Math.ceil(Math.log2(Math.max(2, axis.values.length)));
  const threads = chooseThreads(expectedRuns, requested);
  const pool = threads > 1 ? new CasePool(threads) : null;
  const evaluate = async (values: readonly SweptValue[]): Promise<SizingProbe[]> => {
    const points = sweepPoints([{ ...axis, values }]);
    const cases = casesOfBase(base, points);
    const outcomes = pool ? await pool.run(cases) : await runCasesSerially(cases);
    return outcomes.map((o, i) => (o.status === 'ran' ? { value: values[i]!, status: 'ran', summary: o.summary } : { value: values[i]!, status: o.status, problems: o.problems }));
  };
  let result;
  try {
    result = await sizeOnGrid(axis.values, opts.largest ? 'largest' : 'smallest', evaluate, threads);
  } finally {
    await pool?.close();
  }
  const report = sizingReport(result, axis.key, resolution);
  // nothing ran (every probe invalid): bad input, and nothing is written (exit 2 promises it)
  const nothingRan = result.status === 'not-run';
  if (opts.out && !nothingRan) writeArtefactsAtomically(resolve(opts.out), [{ fileName: 'sizing.json', content: `${JSON.stringify(report, null, 2)}\n` }]);
  if (opts.json) process.stdout.write(`${JSON.stringify(report, null, 2)}\n`);
  else if (!opts.quiet) process.stdout.write(`${sizingSheet(result, axis.key, resolution).join('\n')}\n`);
  if (nothingRan) return EXIT_BAD_INPUT;
  return result.status === 'none-passes' ? EXIT_LIMIT_FAILED : EXIT_OK;
}
