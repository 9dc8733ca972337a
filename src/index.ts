/**
 * stackday as a library: everything the command does, as typed calls.
 *
 *   const { summary, result } = runScenario(scenarioObject);          // compute only
 *   const files = writeRun(run, 'out/my-stack', { charts: true });    // write the same files as the CLI
 *
 * The chain is one-way: scenario → model inputs → mesh → integrator → time series → metrics → reports.
 */
import { readFileSync } from 'node:fs';
import { validateScenario, loadScenarioFile, type LoadedScenario } from './input/scenario/load.ts';
import type { SimulateOptions } from './model/simulate.ts';
import { summariseRun, simulateWithAccuracy, type SummaryLocations } from './analysis/metrics/index.ts';
import { summaryJson, timeseriesCsv, segmentsCsv, writeArtefactsAtomically, type Artefact } from './output/write.ts';
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
export type { ModelInputs } from './model/inputs.ts';
export type { RunResult, TimeSeries, EnergyAccount } from './model/timeseries.ts';
export type { WallState } from './model/wallState.ts';
export { readStateFile, parseStateJson, StateFileError } from './input/state.ts';
export { stateJson } from './output/state.ts';
export type { Summary, Verdict } from './analysis/summary.ts';
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
}

/** Run a scenario: a file path, a scenario object (as parsed from YAML/JSON), or validated model inputs. */
export function runScenario(scenario: string | Record<string, unknown> | LoadedScenario | ModelInputs, options: SimulateOptions = {}): Run {
  let inputs: ModelInputs;
  let description: string | null = null;
  if (typeof scenario === 'string') {
    const loaded = loadScenarioFile(scenario);
    inputs = loaded.inputs;
    description = loaded.scenario.description ?? null;
  } else if ('inputs' in scenario && 'scenario' in scenario) {
    inputs = (scenario as LoadedScenario).inputs;
    description = (scenario as LoadedScenario).scenario.description ?? null;
  } else if (Array.isArray((scenario as { layers?: unknown }).layers)) {
    // validated model inputs carry the layers at the top level (a scenario file nests them under stack)
    inputs = scenario as unknown as ModelInputs;
  } else {
    const loaded = validateScenario(scenario);
    inputs = loaded.inputs;
    description = loaded.scenario.description ?? null;
  }
  // the run and its accuracy check (run.accuracy: estimate by default, off, or a target)
  const { result, accuracy } = simulateWithAccuracy(inputs, options);
  const { summary, locations } = summariseRun({ inputs, result, version: VERSION, description, accuracy });
  return { inputs, result, summary, locations, description };
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

/** The files of a run, in memory. */
export async function runArtefacts(run: Run, options: WriteOptions = {}): Promise<Artefact[]> {
  const artefacts: Artefact[] = [
    { fileName: 'summary.json', content: summaryJson(run.summary) },
    { fileName: 'timeseries.csv', content: timeseriesCsv(run.result.series) },
    { fileName: 'segments.csv', content: segmentsCsv(run.result.series) },
    { fileName: 'state.json', content: stateJson(run.result.finalState, run.inputs.name, VERSION) },
  ];
  if (options.charts !== false) {
    const { renderAllCharts } = await import('./output/charts/index.ts');
    const { renderReportHtml } = await import('./output/report.ts');
    const charts = renderAllCharts(run.result.series, run.summary, run.inputs, {
      width: options.chartWidth ?? 1000,
      height: options.chartHeight ?? 600,
      heightsToPlot: options.chartHeightsM,
      locations: run.locations,
    });
    for (const c of charts) artefacts.push({ fileName: c.fileName, content: c.png });
    artefacts.push({ fileName: 'report.html', content: renderReportHtml(run.summary, run.inputs, charts) });
  }
  return artefacts;
}

/** Write the files of a run into `dir` atomically; returns the paths written. */
export async function writeRun(run: Run, dir: string, options: WriteOptions = {}): Promise<string[]> {
  return writeArtefactsAtomically(dir, await runArtefacts(run, options));
}
