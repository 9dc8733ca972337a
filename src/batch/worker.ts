/**
 * A worker thread of the batch pool (pool.ts): it loads the model once, then runs the cases it is
 * sent, one at a time, and posts each outcome back with the case's index in the batch.
 */
import { parentPort } from 'node:worker_threads';
import { runCase } from './runCase.ts';
import type { ScenarioCase } from '../input/scenario/cases.ts';
import type { CaseOutcome } from './outcome.ts';

/** A case for a worker, with its index in the batch. */
export interface WorkerJob {
  readonly index: number;
  readonly case: ScenarioCase;
}

/** A worker's answer: the outcome of the job, or the error that stopped it (a defect, not bad input). */
export type WorkerReply = { readonly index: number; readonly outcome: CaseOutcome } | { readonly index: number; readonly error: string };

if (parentPort) {
  const port = parentPort;
  port.on('message', (job: WorkerJob) => {
    let reply: WorkerReply;
    try {
      reply = { index: job.index, outcome: runCase(job.case) };
    } catch (e) {
      reply = { index: job.index, error: (e as Error).stack ?? String(e) };
    }
    port.postMessage(reply);
  });
}
