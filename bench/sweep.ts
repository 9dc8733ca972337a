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

interface PointsRow {
  readonly points: number;
  /** Median wall times, ms. */
  readonly serialMs: number;
  readonly pooledMs: number;
  /** Median CPU times (user + system), ms; null without GNU time. */
  readonly serialCpuMs: number | null;
  readonly pooledCpuMs: number | null;
}

export interface SweepTimes {
  /** Points of the sweep → median wall and CPU times serially and on the pool. */
  readonly byPoints: readonly PointsRow[];
  /** The 100-point sweep: pooled / serial wall time (target ≤ 0.6 on 2 cores). */
  readonly ratio100: number;
  readonly threads: number;
}

/** GNU time, where present: it reports the CPU time of the command (user + system), which the load of other processes changes far less than the wall time. */
const GNU_TIME = '/usr/bin/time';

/** Wall time and, where GNU time is present, CPU time of one sweep of `points` insulation thicknesses of the demo, ms. */
function sweepMs(points: number, threads: number, out: string): { wallMs: number; cpuMs: number | null } {
  const vary = `stack.layers[1].thickness=20 mm..${20 + points - 1} mm step 1 mm`;
  const args = ['bin/stackday.js', 'sweep', 'scenarios/demo.yaml', '--vary', vary, '--threads', String(threads), '--no-charts', '--quiet', '--out', out];
  const timed = existsSync(GNU_TIME);
  const t0 = performance.now();
  const r = timed ? spawnSync(GNU_TIME, ['-f', 'cpu %U %S', process.execPath, ...args], { cwd: ROOT, encoding: 'utf8' }) : spawnSync(process.execPath, args, { cwd: ROOT, encoding: 'utf8' });
  const wallMs = performance.now() - t0;
  if (r.status !== 0) throw new Error(`sweep of ${points} points on ${threads} thread(s) exited with ${r.status}: ${r.stderr}`);
  const cpu = /cpu ([\d.]+) ([\d.]+)\s*$/.exec(r.stderr ?? '');
  return { wallMs, cpuMs: cpu ? (Number(cpu[1]) + Number(cpu[2])) * 1000 : null };
}

/** Measure, print as section 6 of the benchmark, and return the figures. */
export function benchSweep(rounds = 3, sizes: readonly number[] = [3, 6, 12, 24, 50, 100]): SweepTimes | null {
  console.log('');
  if (!existsSync(join(ROOT, 'dist', 'cli', 'main.js'))) {
    console.log('9. sweeps: not measured (dist/ is missing: run `npm run build`)');
    return null;
  }
  const threads = availableParallelism();
  const dir = mkdtempSync(join(tmpdir(), 'stackday-bench-sweep-'));
  const byPoints: PointsRow[] = [];
  console.log(`9. sweeps of the demo (insulation thickness 20 mm, 21 mm, …): the compiled command end to end, 1 thread against ${threads}, median of ${rounds} interleaved rounds; load average at start ${loadavg()[0]!.toFixed(1)}`);
  try {
    for (const points of sizes) {
      const serial: { wallMs: number; cpuMs: number | null }[] = [];
      const pooled: { wallMs: number; cpuMs: number | null }[] = [];
      for (let i = 0; i < rounds; i++) {
        serial.push(sweepMs(points, 1, join(dir, `s${points}`)));
        pooled.push(sweepMs(points, threads, join(dir, `p${points}`)));
      }
      const same = readFileSync(join(dir, `s${points}`, 'sweep.json')).equals(readFileSync(join(dir, `p${points}`, 'sweep.json')));
      const cpu = (xs: { cpuMs: number | null }[]) => (xs.every((x) => x.cpuMs !== null) ? middle(xs.map((x) => x.cpuMs!)) : null);
      const row: PointsRow = { points, serialMs: middle(serial.map((x) => x.wallMs)), pooledMs: middle(pooled.map((x) => x.wallMs)), serialCpuMs: cpu(serial), pooledCpuMs: cpu(pooled) };
      byPoints.push(row);
      // with a core for each thread, the pool's wall time is about its CPU time shared among the threads
      const cpuNote =
        row.serialCpuMs !== null && row.pooledCpuMs !== null
          ? `; CPU ${(row.serialCpuMs / 1000).toFixed(2)} s against ${(row.pooledCpuMs / 1000).toFixed(2)} s (ratio with a free core per thread ≈ ${(row.pooledCpuMs / threads / row.serialCpuMs).toFixed(2)})`
          : '';
      console.log(
        `   ${String(points).padStart(4)} points: serial ${(row.serialMs / 1000).toFixed(2).padStart(6)} s, pool ${(row.pooledMs / 1000).toFixed(2).padStart(6)} s, ratio ${(row.pooledMs / row.serialMs).toFixed(2)}${cpuNote}${same ? '' : '  (FILES DIFFER)'}`,
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
