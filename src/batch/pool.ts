/**
 * Running a batch of cases: serially in this thread, or on a pool of threads — worker threads that
 * each load the model once, and this thread — that take cases from one queue. Outcomes come back
 * in the order of the cases, and a case's figures do not depend on the thread that ran it (the same
 * code on the same inputs), so the files a batch writes are byte-identical whatever the thread count.
 *
 * A fresh worker costs its start-up (loading the model's modules) and, more, its JIT warm-up: its
 * first few runs are several times slower than the same runs in a warmed-up thread. So the main
 * thread runs cases too (with N threads, N − 1 workers start), and a pool is used only when the
 * batch is long enough to amortise a worker; `chooseThreads` holds the measured break-even
 * (bench/sweep.ts measures it again).
 *
 * Workers run the compiled JavaScript (dist/batch/worker.js). Run from the TypeScript sources (tsx,
 * vitest), a worker first registers tsx's loader, then loads worker.ts.
 */
import { Worker } from 'node:worker_threads';
import { availableParallelism, loadavg } from 'node:os';
import { createRequire } from 'node:module';
import { pathToFileURL } from 'node:url';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import type { ScenarioCase } from '../input/scenario/cases.ts';
import type { CaseOutcome } from './outcome.ts';
import type { WorkerJob, WorkerReply } from './worker.ts';

/**
 * Fewest cases for which the pool is used when the thread count is left to the program: below
 * this, a worker's start-up and JIT warm-up (about a second of CPU for the demo) cost more than
 * they save. An estimate from the CPU times bench/sweep.ts measures on 2 cores (see the README).
 */
export const POOL_BREAK_EVEN_CASES = 8;

/** Called after each case with the number done and the total. */
export type ProgressCallback = (done: number, total: number) => void;

/**
 * Threads to use for `count` cases: as asked (1 = serial), or, when `auto`, one per core for a
 * batch of at least POOL_BREAK_EVEN_CASES on a machine with a core to spare — not when the load
 * average already reaches the number of cores: the other work then holds the cores (and the
 * scheduler shares them among sessions, not threads), so a pool would only add its start-up.
 */
export function chooseThreads(count: number, requested: number | 'auto', cores = availableParallelism(), load = loadavg()[0]!): number {
  if (requested !== 'auto') return Math.max(1, Math.min(requested, count));
  return count >= POOL_BREAK_EVEN_CASES && cores > 1 && load < cores ? Math.min(cores, count) : 1;
}

/** Whether this module runs from the TypeScript sources (tsx, vitest) rather than from dist/. */
const FROM_SOURCES = import.meta.url.endsWith('.ts');

/** URL of tsx's ESM API module (`tsx/esm/api`, import condition), whose `register()` adds tsx's loader hooks in the calling thread. */
function tsxEsmApi(): string {
  const pkgFile = createRequire(import.meta.url).resolve('tsx/package.json');
  const pkg = JSON.parse(readFileSync(pkgFile, 'utf8')) as { exports: Record<string, { import: { default: string } }> };
  return pathToFileURL(join(dirname(pkgFile), pkg.exports['./esm/api']!.import.default)).href;
}

/** Start one worker thread on the worker module (compiled, or through tsx from the sources). */
function startWorker(): Worker {
  if (!FROM_SOURCES) return new Worker(new URL('./worker.js', import.meta.url));
  const entry = new URL('./worker.ts', import.meta.url).href;
  const boot = `const { register } = await import(${JSON.stringify(tsxEsmApi())});\nregister();\nawait import(${JSON.stringify(entry)});\n`;
  return new Worker(new URL(`data:text/javascript,${encodeURIComponent(boot)}`));
}

/** Jobs a worker holds at once (the one it runs and the next), so it never waits for the main thread to hand it work. */
const WORKER_DEPTH = 2;

/**
 * A pool of threads that run cases from one queue: `threads − 1` worker threads, each loading the
 * model once, and this (the main) thread, which runs cases between handing them out. Reuse it for
 * several batches, then close it.
 */
export class CasePool {
  private readonly workers: Worker[];
  private busy = false;

  constructor(readonly threads: number) {
    this.workers = Array.from({ length: Math.max(0, threads - 1) }, startWorker);
  }

  /** Run the cases on the pool's threads; outcomes in the order of the cases. */
  async run(cases: readonly ScenarioCase[], onProgress?: ProgressCallback): Promise<CaseOutcome[]> {
    if (this.busy) throw new Error('the pool is already running a batch');
    this.busy = true;
    const { runCase } = await import('./runCase.ts');
    const outcomes: CaseOutcome[] = new Array(cases.length);
    let next = 0;
    let done = 0;
    let stopped = false;
    const listeners: { w: Worker; message: (reply: WorkerReply) => void; error: (e: Error) => void; exit: (code: number) => void }[] = [];
    const finished = new Promise<CaseOutcome[]>((resolve, reject) => {
      const fail = (e: Error) => {
        stopped = true;
        reject(e);
      };
      const record = (index: number, outcome: CaseOutcome) => {
        outcomes[index] = outcome;
        done++;
        onProgress?.(done, cases.length);
        if (done === cases.length) resolve(outcomes);
      };
      const feed = (w: Worker) => {
        if (next >= cases.length) return;
        const job: WorkerJob = { index: next, case: cases[next]! };
        next++;
        w.postMessage(job);
      };
      if (cases.length === 0) resolve(outcomes);
      for (const w of this.workers) {
        const message = (reply: WorkerReply) => {
          if ('error' in reply) fail(new Error(`a worker thread failed on case "${cases[reply.index]?.name}": ${reply.error}`));
          else {
            record(reply.index, reply.outcome);
            feed(w);
          }
        };
        const error = (e: Error) => fail(new Error(`a worker thread stopped: ${e.message}`));
        const exit = (code: number) => fail(new Error(`a worker thread exited with code ${code}`));
        w.on('message', message);
        w.on('error', error);
        w.on('exit', exit);
        listeners.push({ w, message, error, exit });
        for (let k = 0; k < WORKER_DEPTH; k++) feed(w);
      }
      // this thread takes the next case whenever it is free, and lets the workers' answers in between
      const step = () => {
        if (stopped || next >= cases.length) return;
        const index = next++;
        try {
          record(index, runCase(cases[index]!));
        } catch (e) {
          fail(e as Error);
          return;
        }
        setImmediate(step);
      };
      setImmediate(step);
    });
    try {
      return await finished;
    } finally {
      for (const l of listeners) {
        l.w.off('message', l.message);
        l.w.off('error', l.error);
        l.w.off('exit', l.exit);
      }
      this.busy = false;
    }
  }

  /** Stop every worker thread. */
  async close(): Promise<void> {
    await Promise.all(this.workers.map((w) => w.terminate()));
  }
}

/** Run the cases in this thread, one after another. */
export async function runCasesSerially(cases: readonly ScenarioCase[], onProgress?: ProgressCallback): Promise<CaseOutcome[]> {
  const { runCase } = await import('./runCase.ts');
  return cases.map((c, i) => {
    const outcome = runCase(c);
    onProgress?.(i + 1, cases.length);
    return outcome;
  });
}

/** Run a batch of cases on `threads` threads (1: in this thread); outcomes in the order of the cases. */
export async function runCases(cases: readonly ScenarioCase[], threads: number, onProgress?: ProgressCallback): Promise<CaseOutcome[]> {
  if (threads <= 1 || cases.length <= 1) return runCasesSerially(cases, onProgress);
  const pool = new CasePool(Math.min(threads, cases.length));
  try {
    return await pool.run(cases, onProgress);
  } finally {
    await pool.close();
  }
}
