/**
 * stackday as a library: everything the command does, as typed calls.
 *
 *   const run = runScenario(scenarioObject);                          // compute only
 *   const { run, files } = await runToFolder('my.yaml', 'out/my-stack'); // compute and write, as the CLI does
 *   const files = await writeRun(run, 'out/my-stack');                // write a computed run's files from memory
 *
 * The chain is one-way: scenario → model inputs → mesh → integrator → time series → metrics → reports.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { validateScenario, loadScenarioFile, type LoadedScenario } from './input/scenario/load.ts';
import type { SimulateOptions } from './model/simulate.ts';
import type { InstantSink } from './model/sinks.ts';
import { DailyExtremes, summariseRun, simulateWithAccuracy, type SummaryLocations } from './analysis/metrics/index.ts';
import { AnnualRecorder, annualSummary, type AnnualParts } from './analysis/annual/index.ts';
import { summaryJson, writeArtefacts, writeArtefactsAtomically, type Artefact } from './output/write.ts';
import { DEFAULT_SERIES_FILE, seriesFileArtefacts, segmentsCsv, sizeNotice, timeseriesCsv } from './output/csv.ts';
import { StagedFolder, pauseForTest } from './output/folder.ts';
import { cyclesCsv, monthlyCsv } from './output/annualCsv.ts';
import { BufferedFileWriter } from './output/textOut.ts';
import { stateJson } from './output/state.ts';
import type { ModelInputs } from './model/inputs.ts';
import type { RunResult } from './model/timeseries.ts';
import type { Summary } from './analysis/summary.ts';

export { loadScenarioFile, readScenarioFile, validateScenario, validateModelInputs, type ScenarioOverride } from './input/scenario/load.ts';
export { ScenarioError } from './input/scenario/errors.ts';
export { scenarioSchema, scenarioJsonSchema, type Scenario } from './input/scenario/schema.ts';
export { simulate, SimulationError } from './model/simulate.ts';
export { CORRELATIONS, describeCorrelation } from './physics/correlations/registry.ts';
export { CORRELATIONS_IN_USE } from './model/correlations.ts';
export { summarise, summariseRun, simulateWithAccuracy, type AccuracyOutcome, type CheckedRun } from './analysis/metrics/index.ts';
export { thermalStressIndicator } from './physics/wall/stress.ts';
export { resultSheet } from './output/console.ts';
export { MATERIALS, findMaterial, materialNames } from './physics/materials/index.ts';
export { OutputFolderError } from './output/folder.ts';
export type { InstantSink, InstantView } from './model/sinks.ts';
export type { ModelInputs } from './model/inputs.ts';
export type { RunResult, TimeSeries, EnergyAccount } from './model/timeseries.ts';
export type { Summary, Verdict, AnnualSummary, MonthFigures, WallCycles } from './analysis/summary.ts';
export { AnnualRecorder, annualSummary } from './analysis/annual/index.ts';
export type { WallState } from './model/wallState.ts';
export { readStateFile, parseStateJson, StateFileError } from './input/state.ts';
export { stateJson } from './output/state.ts';
export type { SummaryLocations, Location as FigureLocation } from './analysis/metrics/index.ts';

/** The tool's version, from package.json. */
export const VERSION: string = (JSON.parse(readFileSync(new URL('../package.json', import.meta.url), 'utf8')) as { version: string }).version;

export interface Run {
  readonly inputs: ModelInputs;
  readonly result: RunResult;
  readonly summary: Summary;
  /** Where each located figure of the summary occurs, as output-instant and segment indices. */
  readonly locations: SummaryLocations;
  readonly description: string | null;
  /** An annual run's statistics as gathered (the margin grid and the cycle counts behind summary.annual); null for other runs. */
  readonly annual: AnnualParts | null;
}

/** Validated inputs and description of a scenario given as a file path, a scenario object, a loaded scenario or model inputs. */
function resolveScenario(scenario: string | Record<string, unknown> | LoadedScenario | ModelInputs): Resolved {
  const of = (loaded: LoadedScenario): Resolved => ({ inputs: loaded.inputs, description: loaded.scenario.description ?? null, warnings: loaded.warnings ?? [] });
  if (typeof scenario === 'string') return of(loadScenarioFile(scenario));
  if ('inputs' in scenario && 'scenario' in scenario) return of(scenario as LoadedScenario);
  // validated model inputs carry the layers at the top level (a scenario file nests them under stack)
  if (Array.isArray((scenario as { layers?: unknown }).layers)) return { inputs: scenario as unknown as ModelInputs, description: null, warnings: [] };
  return of(validateScenario(scenario));
}

/** A scenario ready to run, with what validation found odd (reported with the run's warnings). */
interface Resolved {
  readonly inputs: ModelInputs;
  readonly description: string | null;
  readonly warnings: readonly string[];
}

/**
 * Run a scenario: a file path, a scenario object (as parsed from YAML/JSON), or validated model
 * inputs. `options.sinks` receive every reported instant as it is computed; the result's series
 * holds the days the summary covers (every day with `options.retainAll`).
 */
export function runScenario(scenario: string | Record<string, unknown> | LoadedScenario | ModelInputs, options: SimulateOptions = {}): Run {
  return runResolved(resolveScenario(scenario), options);
}

function runResolved({ inputs, description, warnings }: Resolved, options: SimulateOptions): Run {
  const daily = new DailyExtremes();
  const annual = inputs.annual ? new AnnualRecorder({ annual: inputs.annual, cycleThresholdK: inputs.limits.cyclesAbove?.rangeK ?? null }) : undefined;
  // the run and its accuracy check (run.accuracy: estimate by default, off, or a target); the sinks see the reported run only
  const { result: simulated, accuracy } = simulateWithAccuracy(inputs, { ...options, sinks: [daily, ...(annual ? [annual] : []), ...(options.sinks ?? [])] });
  // what validation found odd (e.g. a gas velocity above usual practice) is reported with the run's warnings
  const result = warnings.length ? { ...simulated, warnings: [...warnings, ...simulated.warnings] } : simulated;
  const parts = annual ? annual.parts() : null;
  const annualFigures = parts ? annualSummary(parts, result.energy.byDay, inputs) : undefined;
  const { summary, locations } = summariseRun({ inputs, result, version: VERSION, description, daily, annual: annualFigures, accuracy });
  return { inputs, result, summary, locations, description, annual: parts };
}

export interface WriteOptions {
  /** Render PNG charts and report.html (default true). */
  readonly charts?: boolean;
  /** Chart size in pixels (default 1000 × 600). */
  readonly chartWidth?: number;
  readonly chartHeight?: number;
  /** Heights (m) for the temperature-through-the-day charts (default: top and bottom segments). */
  readonly chartHeightsM?: readonly number[];
}

/**
 * The files made once a run is complete: summary.json, state.json (the wall at the end, to start a
 * later run from), for an annual run monthly.csv and cycles.csv, then (unless `charts` is false) the PNG charts and report.html. A new file of this
 * kind is one more entry here.
 */
export async function finalArtefacts(run: Run, options: WriteOptions = {}): Promise<Artefact[]> {
  const artefacts: Artefact[] = [
    { fileName: 'summary.json', content: summaryJson(run.summary) },
    { fileName: 'state.json', content: stateJson(run.result.finalState, run.inputs.name, VERSION) },
  ];
  if (run.summary.annual && run.annual) {
    artefacts.push({ fileName: 'monthly.csv', content: monthlyCsv(run.summary.annual) });
    artefacts.push({ fileName: 'cycles.csv', content: cyclesCsv(run.summary.annual, run.annual) });
  }
  if (options.charts !== false) {
    const { renderAllCharts } = await import('./output/charts/index.ts');
    const { renderReportHtml } = await import('./output/report.ts');
    const charts = renderAllCharts(run.result.series, run.summary, run.inputs, {
      width: options.chartWidth ?? 1000,
      height: options.chartHeight ?? 600,
      heightsToPlot: options.chartHeightsM,
      locations: run.locations,
      annual: run.annual,
    });
    for (const c of charts) artefacts.push({ fileName: c.fileName, content: c.png });
    artefacts.push({ fileName: 'report.html', content: renderReportHtml(run.summary, run.inputs, charts) });
  }
  return artefacts;
}

/**
 * The files of a run, in memory: the per-instant CSV files made from the run's series (which holds
 * the days the summary covers, or every day of a run made with `retainAll`) and the final files.
 */
export async function runArtefacts(run: Run, options: WriteOptions = {}): Promise<Artefact[]> {
  const output = run.inputs.output ?? { timeseries: DEFAULT_SERIES_FILE, segments: DEFAULT_SERIES_FILE };
  const [summary, ...rest] = await finalArtefacts(run, options);
  const csv: Artefact[] = [];
  if (output.timeseries.content !== 'off') csv.push({ fileName: 'timeseries.csv', content: timeseriesCsv(run.result.series, output.timeseries) });
  if (output.segments.content !== 'off') csv.push({ fileName: 'segments.csv', content: segmentsCsv(run.result.series, output.segments) });
  return [summary!, ...csv, ...rest];
}

/** Write the files of a computed run into `dir`, replacing it whole; returns the paths written. */
export async function writeRun(run: Run, dir: string, options: WriteOptions = {}): Promise<string[]> {
  return writeArtefactsAtomically(dir, await runArtefacts(run, options));
}

export interface RunToFolderOptions extends WriteOptions {
  /** Called now and then with the fraction of the run done (0–1). */
  readonly onProgress?: (fraction: number) => void;
  /** Told, before the run is computed, when its files will be large (a line for the user; never written to a file). */
  readonly onNotice?: (message: string) => void;
}

/**
 * Run a scenario and write its files into `dir` as the command line does: the per-instant files are
 * written while the run goes (memory stays flat however many days it runs), the others when it is
 * complete, all into a fresh folder beside `dir` that then replaces `dir` whole. A bad scenario
 * throws before anything is written; a failed run leaves `dir` as it was.
 */
export async function runToFolder(scenario: string | Record<string, unknown> | LoadedScenario | ModelInputs, dir: string, options: RunToFolderOptions = {}): Promise<{ run: Run; files: string[] }> {
  const resolved = resolveScenario(scenario);
  const folder = StagedFolder.open(dir);
  const writers: BufferedFileWriter[] = [];
  try {
    const streamed = seriesFileArtefacts(resolved.inputs);
    const sinks: InstantSink[] = streamed.map((a) => {
      const writer = new BufferedFileWriter(join(folder.path, a.fileName));
      writers.push(writer);
      return a.sink(writer);
    });
    const notice: InstantSink = {
      start(layout) {
        const message = sizeNotice(streamed, layout);
        if (message !== null) options.onNotice?.(message);
      },
      instant() {},
    };
    const run = runResolved(resolved, { onProgress: options.onProgress, sinks: [notice, ...sinks] });
    for (const w of writers) w.close();
    const files = streamed.map((a) => join(dir, a.fileName));
    pauseForTest('between-files');
    files.push(...writeArtefacts(folder, await finalArtefacts(run, options)));
    folder.commit();
    return { run, files };
  } catch (e) {
    for (const w of writers) w.abandon();
    folder.abandon();
    throw e;
  }
}
