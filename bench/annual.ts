/**
 * A year of the demo (part of `npm run bench`; a benchmark, not a test: it prints and never fails):
 * scenarios/annual.yaml — the demo stack at the demo site through the invented typical year with
 * its plant calendar, 12 segments, output every 10 minutes — against the targets of the annual-run
 * issue: at most 10 s of compute and under 500 MB peak memory.
 *
 * 1. Compute, in this process on the compiled package: the year run as the library runs it (the
 *    daily and annual statistics gathered by their sinks while it goes), after two 30-day runs of
 *    JIT warm-up; interleaved with the same year without any sink, so the statistics' own share
 *    shows. Medians of three rounds; the machine is shared, so single runs vary by tens of per cent.
 * 2. Peak memory and wall time of the compiled command on the same file in a child process, with
 *    and without charts (its files at the annual default: daily extremes).
 */
import { loadScenarioFile } from '../dist/input/scenario/load.js';
import { simulate } from '../dist/model/simulate.js';
import { runScenario } from '../dist/index.js';
import type { ModelInputs } from '../dist/model/inputs.js';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { measure } from './memory.ts';

const ROUNDS = 3;
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

export function benchAnnual(): void {
  const inputs: ModelInputs = loadScenarioFile('scenarios/annual.yaml').inputs;
  const annual = inputs.annual!;
  const month: ModelInputs = { ...inputs, run: { ...inputs.run, length: { kind: 'days', days: 30 } }, annual: { ...annual, lastDay: '2026-01-30' } };
  for (let i = 0; i < 2; i++) runScenario(month); // JIT warm-up
  const withStats = { wall: [] as number[], cpu: [] as number[] };
  const bare = { wall: [] as number[], cpu: [] as number[] };
  let steps = 0;
  let rhs = 0;
  /** Wall time (the run's own compute time, ms) and CPU time of this process over the call (ms, every thread: the collector's too). */
  const timed = (into: { wall: number[]; cpu: number[] }, run: () => { integrator: { computeMs: number; steps: number; rhsEvaluations: number } }) => {
    const c0 = process.cpuUsage();
    const r = run();
    const c = process.cpuUsage(c0);
    into.wall.push(r.integrator.computeMs);
    into.cpu.push((c.user + c.system) / 1000);
    steps = r.integrator.steps;
    rhs = r.integrator.rhsEvaluations;
  };
  for (let round = 0; round < ROUNDS; round++) {
    timed(withStats, () => runScenario(inputs).result);
    timed(bare, () => simulate(inputs));
  }
  const s = (ms: number) => `${(ms / 1000).toFixed(2)} s`;
  const line = (x: { wall: number[]; cpu: number[] }) => `${s(median(x.wall))} wall, ${s(median(x.cpu))} CPU (medians of ${ROUNDS}; wall ${x.wall.map(s).join(', ')})`;
  console.log(`8. a year of the demo (scenarios/annual.yaml: ${inputs.stack.segments} segments, typical year, plant calendar, output every ${inputs.run.outputInterval / 60} min), compiled package`);
  console.log(`   compute with the daily and annual statistics: ${line(withStats)}; target ≤ 10 s`);
  console.log(`   the same year without any sink:             ${line(bare)}`);
  console.log(`   ${steps} steps, ${rhs} rhs evaluations (${(steps / 365).toFixed(0)} steps a day); the statistics' share of the CPU time ≈ ${s(median(withStats.cpu) - median(bare.cpu))}`);
  const dir = mkdtempSync(join(tmpdir(), 'stackday-bench-annual-'));
  try {
    for (const charts of [false, true]) {
      const r = measure(['run', 'scenarios/annual.yaml', ...(charts ? [] : ['--no-charts']), '--quiet', '--out', join(dir, `out-${charts}`)]);
      console.log(`   compiled command ${charts ? 'with charts and report' : 'without charts'}: peak RSS ${r.peakMb.toFixed(0)} MB (target < 500 MB), ${r.seconds.toFixed(1)} s wall time${r.code === 0 ? '' : ` (exit ${r.code})`}`);
    }
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
