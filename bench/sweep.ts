/**
 * Sweeps: where a pool of worker threads pays, and the 100-point sweep of the demo on this
 * machine's cores, serially against the pool. End-to-end wall times of the compiled command
 * (`stackday sweep … --no-charts`, a fresh process each time, as a person meets it), median of
 * interleaved rounds; the files both write are checked to be the same. A benchmark: it prints
 * and returns figures and never fails on them. On a shared machine the figures are noisy.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const middle = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

export interface SweepTimes {
  /** Points of the sweep → median wall times (ms) serially and on the pool. */
  readonly byPoints: readonly { points: number; serialMs: number; pooledMs: number }[];
  /** The 100-point sweep: pooled / serial wall time (target ≤ 0.6 on 2 cores). */
  readonly ratio100: number;
  readonly threads: number;
}

/** Wall time of one sweep of `points` insulation thicknesses of the demo, ms. */
function sweepMs(points: number, threads: number, out: string): number {
  const vary = `stack.layers[1].thickness=20 mm..${20 + points - 1} mm step 1 mm`;
  const t0 = performance.now();
  const r = spawnSync(process.execPath, ['bin/stackday.js', 'sweep', 'scenarios/demo.yaml', '--vary', vary, '--threads', String(threads), '--no-charts', '--quiet', '--out', out], { cwd: ROOT, encoding: 'utf8' });
  const ms = performance.now() - t0;
  if (r.status !== 0) throw new Error(`sweep of ${points} points on ${threads} thread(s) exited with ${r.status}: ${r.stderr}`);
  return ms;
}

/** Measure, print as section 6 of the benchmark, and return the figures. */
export function benchSweep(rounds = 3, sizes: readonly number[] = [3, 6, 12, 24, 50, 100]): SweepTimes | null {
  console.log('');
  if (!existsSync(join(ROOT, 'dist', 'cli', 'main.js'))) {
    console.log('6. sweeps: not measured (dist/ is missing: run `npm run build`)');
    return null;
  }
  const threads = availableParallelism();
  const dir = mkdtempSync(join(tmpdir(), 'stackday-bench-sweep-'));
  const byPoints: { points: number; serialMs: number; pooledMs: number }[] = [];
  console.log(`6. sweeps of the demo (insulation thickness 20 mm, 21 mm, …): the compiled command end to end, 1 thread against ${threads}, median of ${rounds} interleaved rounds; load average at start ${loadavg()[0]!.toFixed(1)}`);
  try {
    for (const points of sizes) {
      const serial: number[] = [];
      const pooled: number[] = [];
      for (let i = 0; i < rounds; i++) {
        serial.push(sweepMs(points, 1, join(dir, `s${points}`)));
        pooled.push(sweepMs(points, threads, join(dir, `p${points}`)));
      }
      const same = readFileSync(join(dir, `s${points}`, 'sweep.json')).equals(readFileSync(join(dir, `p${points}`, 'sweep.json')));
      const row = { points, serialMs: middle(serial), pooledMs: middle(pooled) };
      byPoints.push(row);
      console.log(
        `   ${String(points).padStart(4)} points: serial ${(row.serialMs / 1000).toFixed(2).padStart(6)} s, pool ${(row.pooledMs / 1000).toFixed(2).padStart(6)} s, ratio ${(row.pooledMs / row.serialMs).toFixed(2)}${same ? '' : '  (FILES DIFFER)'}`,
      );
    }
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
  const last = byPoints.find((r) => r.points === 100) ?? byPoints[byPoints.length - 1]!;
  const ratio100 = last.pooledMs / last.serialMs;
  const firstPaying = byPoints.find((r) => r.pooledMs < r.serialMs);
  console.log(`   ${last.points} points on ${threads} threads: ${ratio100.toFixed(2)} of the serial time (target ≤ 0.6 on 2 cores); the pool first pays at ${firstPaying ? `${firstPaying.points} points` : 'none of these sizes'}`);
  return { byPoints, ratio100, threads };
}
