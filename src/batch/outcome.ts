/**
 * What became of one case of a batch: it ran (its summary as summary.json holds it, and the trace
 * the overlay charts draw), it is not a valid scenario, or its run could not be computed. Plain
 * data: outcomes cross from worker threads and are read back from a plan's files.
 */
import type { Summary } from '../analysis/summary.ts';
import type { RunTrace } from '../output/trace.ts';

export type CaseOutcome =
  | { readonly name: string; readonly status: 'ran'; readonly summary: Summary; readonly trace: RunTrace }
  | { readonly name: string; readonly status: 'invalid' | 'failed'; readonly problems: readonly string[] };

/** The outcomes that ran, with their summaries and traces. */
export type RanOutcome = Extract<CaseOutcome, { status: 'ran' }>;

export const hasRun = (o: CaseOutcome): o is RanOutcome => o.status === 'ran';
