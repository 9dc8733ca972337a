/**
 * `npm run bench`: how fast stackday is, and where the time goes. A benchmark, not a test: it
 * prints figures and never fails on them.
 *
 * 1. One simulated day of the 12-segment, ~30-node wall (scenarios/bench-steel.yaml): compute time
 *    per day (median of repeated runs after a warm-up run, so JIT compilation is not counted).
 * 2. The stiff 6 mm steel shell: TR-BDF2 against Dormand–Prince RK45 at equal accuracy (both
 *    measured against a tight-tolerance reference run).
 * 3. Where the time goes: the same day with the outside correlations and sun switched off, and
 *    with the inside correlation switched off; the differences are their costs.
 * 4. Charts: the time to render every chart of the demo.
 * 5. Start-up of the compiled command (startup.ts).
 * 6. Sweeps: where the pool of worker threads pays, and a 100-point sweep serially against the pool (sweep.ts).
 */
import { loadScenarioFile } from '../src/input/scenario/load.ts';
import { simulate } from '../src/model/simulate.ts';
import type { ModelInputs } from '../src/model/inputs.ts';
import type { RunResult } from '../src/model/timeseries.ts';
import { benchStartup } from './startup.ts';
import { benchSweep } from './sweep.ts';

/** Runs before timing: V8 needs about this many one-day runs before its optimised code settles. */
const WARM_UP_RUNS = 10;
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

function timeRuns(inputs: ModelInputs, repeats: number): { ms: number; bestMs: number; initialMs: number; result: RunResult } {
  for (let i = 0; i < WARM_UP_RUNS; i++) simulate(inputs); // warm-up: let the JIT compile the hot paths first
  const times: number[] = [];
  const initial: number[] = [];
  let result!: RunResult;
  for (let i = 0; i < repeats; i++) {
    result = simulate(inputs);
    times.push(result.integrator.computeMs);
    initial.push(result.integrator.initialStateMs);
  }
  return { ms: median(times), bestMs: Math.min(...times.map((t, i) => t - initial[i]!)), initialMs: median(initial), result };
}

function maxDifference(a: RunResult, b: RunResult): number {
  let worst = 0;
  for (let i = 0; i < a.series.temperatureK.length; i++) worst = Math.max(worst, Math.abs(a.series.temperatureK[i]! - b.series.temperatureK[i]!));
  return worst;
}

const base = loadScenarioFile('scenarios/bench-steel.yaml').inputs;
const oneDay: ModelInputs = { ...base, run: { ...base.run, initial: 'steady-at-start' } };

console.log('stackday benchmark');
console.log(`machine: Node ${process.version}, ${process.arch}`);
console.log('');

// ---- 1. one day ----
const day = timeRuns(oneDay, 15);
const r = day.result;
console.log(`1. one day, ${r.series.segments} segments × ${r.series.nodes} nodes = ${r.series.segments * r.series.nodes} unknowns, output every ${oneDay.run.outputInterval / 60} min`);
console.log(`   implicit TR-BDF2: ${(day.ms - day.initialMs).toFixed(1)} ms for the day's integration (median of 15 after ${WARM_UP_RUNS} warm-up runs; best ${day.bestMs.toFixed(1)} ms), ${r.integrator.steps} steps, ${r.integrator.rhsEvaluations} rhs evaluations`);
console.log(`   plus ${day.initialMs.toFixed(1)} ms to find the steady initial state: ${day.ms.toFixed(1)} ms per run in all`);
const week = timeRuns({ ...oneDay, run: { ...oneDay.run, length: { kind: 'days', days: 7 } } }, 3);
console.log(`   a 7-day run: ${(week.ms / 7).toFixed(1)} ms per simulated day in all`);
console.log(`   energy residual ${r.energy.run.residualPercent.toExponential(2)} %`);
console.log('');

// ---- 2. implicit vs explicit at equal accuracy on the stiff steel shell ----
// One segment of the same wall (the shell's 1.5 mm steel cells have time constants of a fraction of
// a second, so RK45 is held to tiny steps by stability, not accuracy).
const single = (integrator: 'implicit' | 'rk45', rtol: number): ModelInputs => ({
  ...oneDay,
  stack: { ...oneDay.stack, segments: 1 },
  run: { ...oneDay.run, integrator, rtol, atol: rtol * 10 },
});
const reference = simulate(single('implicit', 1e-10));
console.log('2. 6 mm steel shell (4 cells), 1 segment, one day, against a reference run (TR-BDF2, rtol 1e-10)');
const implicitRows = [1e-4, 1e-5, 1e-6, 1e-7, 1e-8].map((tol) => {
  const t = timeRuns(single('implicit', tol), 3);
  return { tol, ms: t.ms, err: maxDifference(t.result, reference), steps: t.result.integrator.steps };
});
const rk = (() => {
  const t0 = performance.now();
  const result = simulate(single('rk45', 1e-5));
  return { tol: 1e-5, ms: performance.now() - t0, err: maxDifference(result, reference), steps: result.integrator.steps };
})();
for (const row of implicitRows) console.log(`   implicit rtol ${row.tol.toExponential(0)}: ${row.ms.toFixed(1).padStart(9)} ms, ${String(row.steps).padStart(7)} steps, max error ${row.err.toExponential(2)} K`);
console.log(`   rk45     rtol ${rk.tol.toExponential(0)}: ${rk.ms.toFixed(1).padStart(9)} ms, ${String(rk.steps).padStart(7)} steps, max error ${rk.err.toExponential(2)} K`);
const asGood = implicitRows.filter((x) => x.err <= rk.err);
const match = asGood.length ? asGood.reduce((a, b) => (b.ms < a.ms ? b : a)) : implicitRows[implicitRows.length - 1]!;
console.log(
  `   equal accuracy: implicit at rtol ${match.tol.toExponential(0)} (error ${match.err.toExponential(1)} K${asGood.length ? ' ≤' : ' >'} RK45's ${rk.err.toExponential(1)} K) is ${(rk.ms / match.ms).toFixed(0)}× faster than RK45`,
);
console.log('');

// ---- 3. where the time goes ----
const noOutside: ModelInputs = { ...oneDay, outside: { filmCoefficient: 10, radiation: { kind: 'none' }, sun: false } };
const noInside: ModelInputs = { ...oneDay, flue: { ...oneDay.flue, filmCoefficient: 15 } };
const neither: ModelInputs = { ...noOutside, flue: noInside.flue };
// interleaved rounds, so that every variant meets the same JIT state and machine load
const variants = { full: oneDay, noOutside, noInside, neither } as const;
const perRhs: Record<keyof typeof variants, number[]> = { full: [], noOutside: [], noInside: [], neither: [] };
for (const v of Object.values(variants)) for (let i = 0; i < WARM_UP_RUNS; i++) simulate(v);
for (let round = 0; round < 7; round++) {
  for (const [name, v] of Object.entries(variants) as [keyof typeof variants, ModelInputs][]) {
    const res = simulate(v);
    perRhs[name].push((1000 * (res.integrator.computeMs - res.integrator.initialStateMs)) / res.integrator.rhsEvaluations);
  }
}
const us = (name: keyof typeof variants) => median(perRhs[name]);
console.log('3. where the time goes (µs per rhs evaluation of the whole stack, median of 7 interleaved rounds)');
console.log(`   full physics                               ${us('full').toFixed(1)} µs`);
console.log(`   outside correlations, sky, sun off         ${us('noOutside').toFixed(1)} µs  → outside physics ≈ ${(us('full') - us('noOutside')).toFixed(1)} µs`);
console.log(`   inside correlation off                     ${us('noInside').toFixed(1)} µs  → inside physics ≈ ${(us('full') - us('noInside')).toFixed(1)} µs`);
console.log(`   both off (conduction + gas march + solver) ${us('neither').toFixed(1)} µs`);
console.log('');

// ---- 4. charts ----
try {
  const { renderAllCharts } = await import('../src/output/charts/index.ts');
  const { summariseRun } = await import('../src/analysis/metrics/index.ts');
  const demo = loadScenarioFile('scenarios/demo.yaml').inputs;
  const result = simulate(demo);
  const { summary, locations } = summariseRun({ inputs: demo, result, version: 'bench' });
  renderAllCharts(result.series, summary, demo, { width: 1000, height: 600, locations });
  const t0 = performance.now();
  const charts = renderAllCharts(result.series, summary, demo, { width: 1000, height: 600, locations });
  console.log(`4. charts: ${charts.length} PNG charts of the demo at 1000×600 in ${(performance.now() - t0).toFixed(0)} ms`);
} catch (e) {
  console.log(`4. charts: not measured (${(e as Error).message})`);
}
benchStartup();
benchSweep();
