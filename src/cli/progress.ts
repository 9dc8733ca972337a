/**
 * The progress bar of a batch: shown on a terminal only, and only once the batch has run for a
 * second (a short batch prints nothing). With a pool the main thread is free and a timer shows the
 * bar on time; a serial batch shows it at the first case that ends after the second.
 */
import { SingleBar, Presets } from 'cli-progress';

/** A batch shorter than this shows no bar, ms. */
export const PROGRESS_AFTER_MS = 1000;

export interface BatchProgress {
  readonly onProgress: (done: number, total: number) => void;
  /** Show the bar now if the batch has run long enough (for the timer), and remember the total. */
  start(total: number): void;
  stop(): void;
}

export function batchProgress(enabled: boolean, label: string): BatchProgress {
  const started = Date.now();
  let bar: SingleBar | null = null;
  let done = 0;
  let total = 0;
  let timer: NodeJS.Timeout | null = null;
  const show = () => {
    if (bar || !enabled || Date.now() - started < PROGRESS_AFTER_MS) return;
    bar = new SingleBar({ format: `${label} |{bar}| {value}/{total} runs`, stream: process.stderr, hideCursor: true }, Presets.shades_classic);
    bar.start(total, done);
  };
  return {
    onProgress: (d, t) => {
      done = d;
      total = t;
      show();
      bar?.update(d);
    },
    start(t) {
      total = t;
      if (enabled) {
        timer = setTimeout(show, PROGRESS_AFTER_MS);
        timer.unref();
      }
    },
    stop() {
      if (timer) clearTimeout(timer);
      bar?.stop();
    },
  };
}
