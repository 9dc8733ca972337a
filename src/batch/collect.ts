/**
 * Collecting a plan (plan.ts) after its runs: each point's summary.json, timeseries.csv and
 * segments.csv read back from runs/<point>/, as the outcome the same point gives when run in this
 * process. A point whose results are missing is reported as not run; the others are collected.
 */
import { existsSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { ScenarioError } from '../input/scenario/errors.ts';
import type { Summary } from '../analysis/summary.ts';
import { traceOfCsv } from '../output/trace.ts';
import type { CaseOutcome } from './outcome.ts';
import { MANIFEST, type PlanManifest } from './plan.ts';

/** Read a plan's manifest; ScenarioError (bad input) when the folder holds none. */
export function readManifest(dir: string): PlanManifest {
  const file = join(resolve(dir), MANIFEST);
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch {
    throw new ScenarioError([`${dir}: no ${MANIFEST}; expected a folder written by \`stackday sweep --plan\``]);
  }
  const m = JSON.parse(text) as PlanManifest;
  if (m.tool !== 'stackday' || m.kind !== 'sweep' || !Array.isArray(m.points)) throw new ScenarioError([`${file}: not a stackday plan manifest`]);
  return m;
}

/** The outcome of every point of a plan, in the plan's order. */
export function collectOutcomes(dir: string, manifest: PlanManifest): CaseOutcome[] {
  const root = resolve(dir);
  return manifest.points.map((p): CaseOutcome => {
    if (p.status === 'invalid') return { name: p.name, status: 'invalid', problems: p.problems };
    const out = join(root, p.out);
    const files = ['summary.json', 'timeseries.csv', 'segments.csv'].map((f) => join(out, f));
    const missing = files.filter((f) => !existsSync(f));
    if (missing.length > 0) return { name: p.name, status: 'failed', problems: [`no results in ${p.out}/ (not run yet, or its run failed: see the batch system's log)`] };
    const [summaryText, timeseries, segments] = files.map((f) => readFileSync(f, 'utf8'));
    const summary = JSON.parse(summaryText!) as Summary;
    return { name: p.name, status: 'ran', summary, trace: traceOfCsv(timeseries!, segments!, summary.run.mode) };
  });
}
