/**
 * `npm run bench`: how fast stackday is, and where the time goes. A benchmark, not a test: it
 * prints figures and never fails on them.
 *
 * 1. Compute time, as medians of repeated runs after JIT warm-up runs: one simulated day of the
 *    steel-shell benchmark (scenarios/bench-steel.yaml: 12 segments, brick, wool, an air gap and a
 *    6 mm steel shell); the demo until its periodic state; microseconds per step per unknown; and
 *    the cost of a 1-minute output interval against a 10-minute one.
 * 2. The stiff 6 mm steel shell: TR-BDF2 against Dormand–Prince RK45 at equal accuracy (both
 *    measured against a tight-tolerance reference run).
 * 3. Where the time goes: the same day with the outside correlations and sun switched off, and
 *    with the inside correlation switched off; the differences are their costs.
 * 4. Charts: the time to render every chart of the demo.
 * 5. The demo's default run with and without its accuracy check, against the same run on the
 *    earlier defaults (equal cells of an eighth of the daily penetration depth, 2 to 24 per layer;
 *    rtol 1e-5, atol 0.01 K; no check), as the compute the defaults cost.
 * 6. Start-up of the compiled command (bench/startup.ts).
 * 7. Memory: peak memory and time of a 365-day run of the demo (bench/memory.ts).
 * 8. A year of the demo with its typical year and plant calendar: compute, peak memory (bench/annual.ts).
 * 9. Sweeps: where the pool of worker threads pays, and a 100-point sweep serially against the pool (bench/sweep.ts).
 *
 * It runs the compiled package (dist/, built by `npm run bench` first), as users do: the
 * development loader adds overhead of its own to every module access.
 */
import { loadScenarioFile } from '../dist/input/scenario/load.js';
import { simulate } from '../dist/model/simulate.js';
import { simulateWithAccuracy, largestKelvinEstimate } from '../dist/analysis/metrics/accuracy.js';
import { thermalDiffusivity } from '../dist/physics/wall/mesh.js';
import type { ModelInputs } from '../dist/model/inputs.js';
import type { RunResult } from '../dist/model/timeseries.js';
import { benchStartup } from './startup.ts';
import { benchMemory } from './memory.ts';
import { benchAnnual } from './annual.ts';
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

// ---- 1. compute ----
const day = timeRuns(oneDay, 15);
const r = day.result;
const unknowns = r.series.segments * r.series.nodes;
console.log(`1. steel-shell benchmark: one day, ${r.series.segments} segments × ${r.series.nodes} nodes = ${unknowns} unknowns, output every ${oneDay.run.outputInterval / 60} min`);
console.log(`   compute per simulated day: ${day.ms.toFixed(1)} ms (median of 15 after ${WARM_UP_RUNS} warm-up runs; ${day.initialMs.toFixed(1)} ms of it the steady initial state), target ≤ 15 ms`);
console.log(`   ${r.integrator.steps} steps (${r.integrator.rejected} rejected), ${r.integrator.rhsEvaluations} rhs, ${r.integrator.jacobianEvaluations} Jacobians, ${r.integrator.newtonIterations} Newton iterations (${r.integrator.newtonFailures} failures)`);
console.log(`   ${((1000 * (day.ms - day.initialMs)) / r.integrator.steps / unknowns).toFixed(3)} µs per step per unknown`);
const week = timeRuns({ ...oneDay, run: { ...oneDay.run, length: { kind: 'days', days: 7 } } }, 3);
console.log(`   a 7-day run: ${(week.ms / 7).toFixed(1)} ms per simulated day in all; energy residual ${r.energy.run.residualPercent.toExponential(2)} %`);
const perOutput = (minutes: number) => timeRuns({ ...oneDay, run: { ...oneDay.run, outputInterval: minutes * 60 } }, 7).ms;
const tenMinutes = perOutput(10);
const oneMinute = perOutput(1);
console.log(`   output every 1 min: ${oneMinute.toFixed(1)} ms against ${tenMinutes.toFixed(1)} ms every 10 min = ${(oneMinute / tenMinutes).toFixed(2)}×, target ≤ 1.5×`);
const demoInputs = loadScenarioFile('scenarios/demo.yaml').inputs;
const demo = timeRuns(demoInputs, 7);
console.log(`   demo until periodic: ${demo.ms.toFixed(1)} ms compute (median of 7), ${demo.result.daysSimulated} days, ${demo.result.integrator.steps} steps, target ≤ 100 ms`);
const demoDay: ModelInputs = { ...demoInputs, run: { ...demoInputs.run, length: { kind: 'days', days: 1 }, initial: 'steady-at-start' } };
const oneSector = timeRuns(demoDay, 5).ms;
const sixteen = timeRuns({ ...demoDay, stack: { ...demoDay.stack, sectors: 16 } }, 5).ms;
console.log(`   demo day with 16 sectors: ${sixteen.toFixed(1)} ms against ${oneSector.toFixed(1)} ms with one = ${(sixteen / oneSector).toFixed(1)}×, target ≤ 20×`);
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
  const { renderAllCharts } = await import('../dist/output/charts/index.js');
  const { summariseRun } = await import('../dist/analysis/metrics/index.js');
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
// ---- 5. the demo's default run and its accuracy check ----
{
  const demo = loadScenarioFile('scenarios/demo.yaml').inputs;
  // the earlier automatic cells: an eighth of the daily penetration depth √(α P/π) at 400 K, 2 to 24
  const earlierCells = (l: ModelInputs['layers'][number]) =>
    l.material.kind === 'gap' ? l.cells : Math.min(24, Math.max(2, Math.ceil(l.thickness / (Math.sqrt((thermalDiffusivity(l.material, 400) * 86400) / Math.PI) / 8))));
  const earlier: ModelInputs = { ...demo, layers: demo.layers.map((l) => ({ ...l, cells: earlierCells(l) })), run: { ...demo.run, rtol: 1e-5, atol: 0.01, accuracy: { kind: 'off' } } };
  const plain: ModelInputs = { ...demo, run: { ...demo.run, accuracy: { kind: 'off' } } };
  const variants = { earlier: () => simulate(earlier), plain: () => simulate(plain), checked: () => simulateWithAccuracy(demo) } as const;
  const ms: Record<keyof typeof variants, number[]> = { earlier: [], plain: [], checked: [] };
  for (const v of Object.values(variants)) for (let i = 0; i < 3; i++) v();
  // interleaved rounds, process CPU time (the machine is shared: wall time counts the waits too)
  for (let round = 0; round < 9; round++) {
    for (const [name, v] of Object.entries(variants) as [keyof typeof variants, () => unknown][]) {
      const c = process.cpuUsage();
      v();
      const d = process.cpuUsage(c);
      ms[name].push((d.user + d.system) / 1000);
    }
  }
  const e = median(ms.earlier);
  const nodes = (r: RunResult) => r.series.nodes;
  const checked = simulateWithAccuracy(demo);
  console.log('5. the demo (until periodic) — CPU time, median of 9 interleaved rounds');
  console.log(`   earlier defaults (${nodes(simulate(earlier))} nodes, rtol 1e-5, atol 0.01 K, no check)   ${e.toFixed(0)} ms`);
  console.log(`   default run without its check (${nodes(checked.result)} nodes, rtol ${demo.run.rtol.toExponential()}, atol ${demo.run.atol} K)   ${median(ms.plain).toFixed(0)} ms (${(median(ms.plain) / e).toFixed(2)}×)`);
  console.log(`   default run with its accuracy check (${nodes(checked.accuracy.check!)} nodes, one day)   ${median(ms.checked).toFixed(0)} ms (${(median(ms.checked) / e).toFixed(2)}×); largest estimate ± ${largestKelvinEstimate(checked.accuracy.estimates!).toFixed(3)} K`);
  console.log('');
}

benchStartup();
console.log('');
benchMemory();
console.log('');
benchAnnual();
console.log('');
benchSweep();
