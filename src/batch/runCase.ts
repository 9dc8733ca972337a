/**
 * One case of a batch, run: validated by the one validation path, simulated and summarised exactly
 * as `stackday run` does it (runScenario), and cut down to what a comparison needs — the summary
 * and the trace the overlay charts draw. A case that is not a valid scenario, or whose run cannot
 * be computed, comes back with its problems instead, so the rest of the batch still runs.
 */
import { validateCase, type ScenarioCase } from '../input/scenario/cases.ts';
import { ScenarioError } from '../input/scenario/errors.ts';
import { SimulationError } from '../model/errors.ts';
import type { Summary } from '../analysis/summary.ts';
import { traceOfSeries } from '../output/trace.ts';
import { summaryJson } from '../output/write.ts';
import { runScenario } from '../index.ts';
import type { CaseOutcome } from './outcome.ts';

/** Run one case (in whichever thread calls it). */
export function runCase(c: ScenarioCase): CaseOutcome {
  let loaded;
  try {
    loaded = validateCase(c);
  } catch (e) {
    if (e instanceof ScenarioError) return { name: c.name, status: 'invalid', problems: e.problems };
    throw e;
  }
  try {
    const run = runScenario(loaded);
    // the summary as summary.json holds it (non-finite numbers as null), as a collected run reads it back
    const summary = JSON.parse(summaryJson(run.summary)) as Summary;
    return { name: c.name, status: 'ran', summary, trace: traceOfSeries(run.result.series, run.inputs.run.mode) };
  } catch (e) {
    if (e instanceof SimulationError) return { name: c.name, status: 'failed', problems: [`the run could not be computed: ${e.message}`] };
    throw e;
  }
}
